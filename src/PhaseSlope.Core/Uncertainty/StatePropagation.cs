using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>Standard uncertainties of one single-phase state; all null with a reason where the
/// propagation does not apply.</summary>
/// <param name="Method">How they were propagated.</param>
/// <param name="Density">u(ρ), mol/m³ (0 when the density was given).</param>
/// <param name="Pressure">u(P), Pa (0 when the pressure was given).</param>
/// <param name="CompressibilityFactor">u(Z).</param>
/// <param name="ResidualEnthalpy">u(h_r), J/mol: the uncertainty of the enthalpy whenever the
/// reference state does not itself depend on the model (the ideal-gas reference).</param>
/// <param name="ResidualEntropy">u(s_r), J/(mol·K), likewise.</param>
/// <param name="Reason">Why the values are null, or null.</param>
public sealed record StateUncertainty(PropagationMethod Method, double? Density, double? Pressure, double? CompressibilityFactor,
    double? ResidualEnthalpy, double? ResidualEntropy, string? Reason)
{
    /// <summary>u(cp), J/(mol·K), or null (see <see cref="ResponseReason"/>).</summary>
    public double? IsobaricHeatCapacity { get; init; }

    /// <summary>u(cv), J/(mol·K), or null.</summary>
    public double? IsochoricHeatCapacity { get; init; }

    /// <summary>u(κT), 1/Pa, or null.</summary>
    public double? IsothermalCompressibility { get; init; }

    /// <summary>u(α), 1/K, or null.</summary>
    public double? IsobaricExpansivity { get; init; }

    /// <summary>u(μJT), K/Pa, or null.</summary>
    public double? JouleThomsonCoefficient { get; init; }

    /// <summary>Why the response functions (cp, cv, κT, α, μJT) have no uncertainty, or null.</summary>
    public string? ResponseReason { get; init; }
}

/// <summary>The residual quantities of one state that <see cref="StatePropagation"/> propagates.</summary>
/// <param name="Density">ρ, mol/m³.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="CompressibilityFactor">Z.</param>
/// <param name="ResidualEnthalpy">h_r, J/mol.</param>
/// <param name="ResidualEntropy">s_r, J/(mol·K).</param>
/// <param name="IsobaricHeatCapacity">cp, J/(mol·K), or null (no ideal-gas cp°, or not evaluated).</param>
/// <param name="IsochoricHeatCapacity">cv, J/(mol·K), or null.</param>
/// <param name="IsothermalCompressibility">κT, 1/Pa, or null.</param>
/// <param name="IsobaricExpansivity">α, 1/K, or null.</param>
/// <param name="JouleThomsonCoefficient">μJT, K/Pa, or null.</param>
public readonly record struct StateValues(double Density, double Pressure, double CompressibilityFactor, double ResidualEnthalpy, double ResidualEntropy,
    double? IsobaricHeatCapacity = null, double? IsochoricHeatCapacity = null, double? IsothermalCompressibility = null,
    double? IsobaricExpansivity = null, double? JouleThomsonCoefficient = null);

/// <summary>Propagation of the input uncertainties into one single-phase state at a given
/// (T, P) or (T, ρ).</summary>
/// <remarks>Linear: at fixed T and P, dρc/dp = −ρc²·A_ρp/(∂P/∂ρ)_T; at fixed T and ρ, the
/// cubic's density moves only with the volume shift, ρc = 1/(1/ρ + c), and
/// dP/dp = ρc²·A_ρp + (∂P/∂ρ)_T·dρc/dp. With a constant shift c, h_r of the translated model is
/// the cubic's h_r − P·c and s_r is the cubic's, so dh_r/dp = A_p − T·A_Tp + ρc·A_ρp
/// + (2A_ρ + ρcA_ρρ − T·A_Tρ)·dρc/dp − c·dP/dp − P·dc/dp and
/// ds_r/dp = −A_Tp − A_Tρ·dρc/dp + R·(dP/P − dρc/ρc) (s_r = −A_T + R ln Z_c). The parameter
/// derivatives of the Helmholtz function are those of <see cref="LinearPropagation"/>.</remarks>
public static class StatePropagation
{
    /// <summary>Why linear propagation gives no u(cp), u(cv), u(κT), u(α), u(μJT).</summary>
    public const string LinearResponseReason =
        "linear propagation covers rho, P, Z, h_r and s_r: cp, cv, kappa_T, alpha and the Joule-Thomson coefficient need second derivatives of the model with respect to its inputs, which are not implemented; --uncertainty monte-carlo gives them";

    private const double R = Constants.GasConstant;

    /// <summary>The sensitivities of (ρ, P, Z, h_r, s_r) to each input, one row per input.</summary>
    /// <param name="parameters">The inputs.</param>
    /// <param name="temperature">T, K.</param>
    /// <param name="density">The state's density in the nominal (possibly translated) model, mol/m³.</param>
    /// <param name="densityGiven">True when the density was given (P moves), false when the pressure was.</param>
    public static StateValues[] Sensitivities(CubicParameterization parameters, double temperature, double density, bool densityGiven)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        var model = parameters.Nominal;
        double t = temperature;
        double c = model.VolumeShift;
        var bare = c == 0 ? model : model.WithVolumeShift(0);
        double rhoC = 1 / (1 / density + c);
        var d = bare.Residual(t, rhoC);
        double p = d.Pressure;
        double z = p / (density * R * t);
        var alpha = model.Alpha.Evaluate(t);
        var partials = new LinearPropagation.Partials(model, t, rhoC, model.AttractionA * alpha.Value, model.AttractionA * alpha.FirstDerivative);
        var structural = parameters.Derivatives(t);
        var result = new StateValues[structural.Length];
        for (int k = 0; k < structural.Length; k++)
        {
            var s = structural[k];
            var (aP, aRhoP, aTP) = partials.Along(s);
            double dRhoC, dP;
            if (densityGiven)
            {
                dRhoC = -rhoC * rhoC * s.VolumeShift;
                dP = rhoC * rhoC * aRhoP + d.PressureDRho * dRhoC;
            }
            else
            {
                dRhoC = -rhoC * rhoC * aRhoP / d.PressureDRho;
                dP = 0;
            }

            double dRho = LinearPropagation.Translated(rhoC, dRhoC, s.VolumeShift, c);
            double dH = aP - t * aTP + rhoC * aRhoP + LinearPropagation.HDensity(d) * dRhoC - c * dP - p * s.VolumeShift;
            double dS = -aTP - d.DTRho * dRhoC + R * (dP / p - dRhoC / rhoC);
            double dZ = z * (dP / p - dRho / density);
            result[k] = new StateValues(dRho, dP, dZ, dH, dS);
        }

        return result;
    }

    /// <summary>First-order standard uncertainties of one state.</summary>
    public static StateUncertainty Linear(CubicParameterization parameters, double temperature, double density, bool densityGiven)
    {
        var rows = Sensitivities(parameters, temperature, density, densityGiven);
        var sigma = parameters.Covariance;
        double U(Func<StateValues, double> pick) => LinearPropagation.Combine(rows.Select(pick).ToArray(), sigma);
        return new StateUncertainty(PropagationMethod.Linear, U(r => r.Density), U(r => r.Pressure), U(r => r.CompressibilityFactor),
            U(r => r.ResidualEnthalpy), U(r => r.ResidualEntropy), null)
        {
            ResponseReason = LinearResponseReason,
        };
    }

    /// <summary>Monte Carlo standard uncertainties of one state: every sample's model evaluates
    /// the state again (the same T and P or ρ, the same phase rule).</summary>
    /// <param name="parameters">The inputs.</param>
    /// <param name="evaluate">Evaluates the state for one sample's input values; throws
    /// <see cref="InvalidInputException"/> or <see cref="ConvergenceException"/> when the sample has no such state.</param>
    /// <param name="samples">Number of samples.</param>
    /// <param name="seed">Seed of the draws.</param>
    /// <param name="progress">Receives the number of samples done, or null.</param>
    public static StateUncertainty MonteCarlo(CubicParameterization parameters, Func<double[], StateValues> evaluate, int samples, int seed, IProgress<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(evaluate);
        var draws = MonteCarloPropagation.Draw(parameters, samples, seed);
        var values = new StateValues?[samples];
        int done = 0;
        Parallel.For(0, samples, s =>
        {
            try
            {
                values[s] = evaluate(draws[s]);
            }
            catch (Exception ex) when (ex is InvalidInputException or ConvergenceException)
            {
                values[s] = null;
            }

            progress?.Report(Interlocked.Increment(ref done));
        });

        int failed = values.Count(v => v is null);
        if (failed > 0)
        {
            return new StateUncertainty(PropagationMethod.MonteCarlo, null, null, null, null, null,
                $"{failed} of {samples} samples have no such state (the state lies too close to a phase boundary or the critical point of some samples)");
        }

        double Std(Func<StateValues, double> pick)
        {
            double mean = 0;
            for (int s = 0; s < samples; s++)
            {
                mean += pick(values[s]!.Value);
            }

            mean /= samples;
            double squares = 0;
            for (int s = 0; s < samples; s++)
            {
                double d = pick(values[s]!.Value) - mean;
                squares += d * d;
            }

            return Math.Sqrt(squares / (samples - 1));
        }

        double? StdOrNull(Func<StateValues, double?> pick)
            => values.All(v => pick(v!.Value) is double x && double.IsFinite(x)) ? Std(v => pick(v)!.Value) : null;

        var result = new StateUncertainty(PropagationMethod.MonteCarlo, Std(v => v.Density), Std(v => v.Pressure), Std(v => v.CompressibilityFactor),
            Std(v => v.ResidualEnthalpy), Std(v => v.ResidualEntropy), null)
        {
            IsobaricHeatCapacity = StdOrNull(v => v.IsobaricHeatCapacity),
            IsochoricHeatCapacity = StdOrNull(v => v.IsochoricHeatCapacity),
            IsothermalCompressibility = StdOrNull(v => v.IsothermalCompressibility),
            IsobaricExpansivity = StdOrNull(v => v.IsobaricExpansivity),
            JouleThomsonCoefficient = StdOrNull(v => v.JouleThomsonCoefficient),
        };
        return result with
        {
            ResponseReason = result.IsobaricHeatCapacity is null
                ? "u(cp), u(cv) and u(mu_JT) need the ideal-gas heat capacity in every sample (the fluid has none, or a sample's state has no finite value)"
                : null,
        };
    }
}
