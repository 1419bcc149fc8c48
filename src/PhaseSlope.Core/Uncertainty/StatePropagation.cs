using PhaseSlope.Core.Models;
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

    /// <summary>u(w), m/s, or null.</summary>
    public double? SpeedOfSound { get; init; }

    /// <summary>Why the response functions (cp, cv, κT, α, μJT, w) have no uncertainty, or null.</summary>
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
/// <param name="SpeedOfSound">w, m/s, or null (no molar mass or cp°).</param>
public readonly record struct StateValues(double Density, double Pressure, double CompressibilityFactor, double ResidualEnthalpy, double ResidualEntropy,
    double? IsobaricHeatCapacity = null, double? IsochoricHeatCapacity = null, double? IsothermalCompressibility = null,
    double? IsobaricExpansivity = null, double? JouleThomsonCoefficient = null, double? SpeedOfSound = null);

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
    private const double R = Constants.GasConstant;

    /// <summary>The parameter derivatives of the untranslated cubic's A_ρρ and A_Tρ at one (T, ρ),
    /// as coefficients of ∂b, ∂g and ∂g_T, and A_Tρρ itself (for κT and α).</summary>
    /// <remarks>With η = bρ, D = (1 + δ1η)(1 + δ2η), u = δ1 + δ2 + 2δ1δ2η (so ∂D/∂ρ = b·u):
    /// A_ρρ = RT·b²/(1 − η)² + g·b·u/D², A_Tρ = R·b/(1 − η) − g_T/D, A_Tρρ = R·b²/(1 − η)² + g_T·b·u/D²;
    /// ∂A_ρρ/∂b = 2RT·b/(1 − η)³ + g·[(u + 2δ1δ2η)/D² − 2η·u²/D³], ∂A_ρρ/∂g = b·u/D²,
    /// ∂A_Tρ/∂b = R/(1 − η)² + g_T·ρ·u/D², ∂A_Tρ/∂g_T = −1/D.</remarks>
    private readonly struct SecondPartials
    {
        private readonly double _rhoRhoB, _rhoRhoG, _tRhoB, _tRhoGT, _ttB, _ttGTT, _ttRho;

        public SecondPartials(CubicModel model, double t, double rho, AlphaValue alpha)
        {
            double g = model.AttractionA * alpha.Value;
            double gT = model.AttractionA * alpha.FirstDerivative;
            double b = model.CovolumeB;
            double d1 = model.Form.Delta1, d2 = model.Form.Delta2;
            double eta = b * rho;
            double one = 1 - eta;
            double dd = (1 + d1 * eta) * (1 + d2 * eta);
            double u = d1 + d2 + 2 * d1 * d2 * eta;
            _rhoRhoB = 2 * R * t * b / (one * one * one) + g * ((u + 2 * d1 * d2 * eta) / (dd * dd) - 2 * eta * u * u / (dd * dd * dd));
            _rhoRhoG = b * u / (dd * dd);
            _tRhoB = R / (one * one) + gT * rho * u / (dd * dd);
            _tRhoGT = -1 / dd;
            TRhoRho = R * b * b / (one * one) + gT * b * u / (dd * dd);
            // A_TT = −(g_TT/b)·f(η) (the repulsive term is linear in T): ∂/∂b = g_TT·f/b² − g_TT·ρ/(b·D),
            // ∂/∂g_TT = −f/b, ∂/∂ρ = −g_TT/D (f′(η) = 1/D).
            double f = d1 == d2 ? eta / (1 + d1 * eta) : Math.Log((1 + d1 * eta) / (1 + d2 * eta)) / (d1 - d2);
            double gTT = model.AttractionA * alpha.SecondDerivative;
            _ttB = gTT * f / (b * b) - gTT * rho / (b * dd);
            _ttGTT = -f / b;
            _ttRho = -gTT / dd;
        }

        /// <summary>dA_TT/dp for one input, with the density moving by <paramref name="dRho"/>.</summary>
        public double TemperatureTemperature(StructuralDerivative s, double dRho)
            => _ttB * s.Covolume + _ttGTT * s.AttractionCurvature + _ttRho * dRho;

        /// <summary>A_Tρρ of the untranslated cubic.</summary>
        public double TRhoRho { get; }

        /// <summary>(∂A_ρρ/∂p, ∂A_Tρ/∂p) for one input.</summary>
        public (double RhoRho, double TRho) Along(StructuralDerivative s)
            => (_rhoRhoB * s.Covolume + _rhoRhoG * s.Attraction, _tRhoB * s.Covolume + _tRhoGT * s.AttractionSlope);
    }

    /// <summary>κT of the nominal (translated) model at (T, ρ), 1/Pa.</summary>
    private static double NominalCompressibility(CubicParameterization parameters, double temperature, double density)
        => 1 / (density * parameters.Nominal.Residual(temperature, density).PressureDRho);

    /// <summary>The sensitivities of (ρ, P, Z, h_r, s_r, κT, α) to each input, one row per input.</summary>
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
        var second = new SecondPartials(model, t, rhoC, alpha);
        // κT and α of the untranslated cubic at ρc; a translation scales both by vc/v = ρ/ρc.
        double pRho = d.PressureDRho, pT = d.PressureDT;
        double kappaC = 1 / (rhoC * pRho), expansivityC = pT / (rhoC * pRho);
        double ratio = density / rhoC;
        double heatCapacityDifference = t * pT * pT / (rhoC * rhoC * pRho);
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
            var (aRhoRhoP, aTRhoP) = second.Along(s);
            double dPRho = 2 * rhoC * aRhoP + rhoC * rhoC * aRhoRhoP + d.PressureDRhoRho * dRhoC;
            double dPT = rhoC * rhoC * aTRhoP + (R + 2 * rhoC * d.DTRho + rhoC * rhoC * second.TRhoRho) * dRhoC;
            double dKappaC = -kappaC * (dRhoC / rhoC + dPRho / pRho);
            double dExpansivityC = expansivityC * (dPT / pT - dRhoC / rhoC - dPRho / pRho);
            double dRatio = ratio * (dRho / density - dRhoC / rhoC);
            // cv = cv° − T·A_TT (a translation leaves A_TT as it is); cp − cv = T·P_T²/(ρc²·P_ρc) is the
            // same for the translated and the untranslated model.
            double dCv = -t * second.TemperatureTemperature(s, dRhoC);
            double dCp = dCv + heatCapacityDifference * (2 * dPT / pT - 2 * dRhoC / rhoC - dPRho / pRho);
            result[k] = new StateValues(dRho, dP, dZ, dH, dS,
                IsobaricHeatCapacity: dCp,
                IsochoricHeatCapacity: dCv,
                IsothermalCompressibility: ratio * dKappaC + kappaC * dRatio,
                IsobaricExpansivity: ratio * dExpansivityC + expansivityC * dRatio);
        }

        return result;
    }

    /// <summary>First-order standard uncertainties of one state.</summary>
    /// <param name="parameters">The inputs.</param>
    /// <param name="temperature">T, K.</param>
    /// <param name="density">The state's density, mol/m³.</param>
    /// <param name="densityGiven">True when the density was given, false when the pressure was.</param>
    /// <param name="isobaricHeatCapacity">The state's cp in J/(mol·K) (for u(μJT)), or null when the
    /// fluid has no ideal-gas heat capacity (then cp, cv and μJT have no uncertainty).</param>
    /// <param name="isobaricExpansivity">The state's α in 1/K (for u(μJT)), or null.</param>
    /// <param name="speedOfSound">The state's speed of sound w in m/s (for u(w)), or null.</param>
    public static StateUncertainty Linear(CubicParameterization parameters, double temperature, double density, bool densityGiven,
        double? isobaricHeatCapacity = null, double? isobaricExpansivity = null, double? speedOfSound = null)
    {
        var rows = Sensitivities(parameters, temperature, density, densityGiven);
        var sigma = parameters.Covariance;
        double U(Func<StateValues, double> pick) => LinearPropagation.Combine(rows.Select(pick).ToArray(), sigma);
        bool curvatureKnown = rows.All(r => double.IsFinite(r.IsochoricHeatCapacity!.Value));
        double? cv = null, cp = null, jouleThomson = null, sound = null;
        string? reason = null;
        if (isobaricHeatCapacity is not double cpNominal || isobaricExpansivity is not double expansivity)
        {
            reason = "cp, cv and the Joule-Thomson coefficient need the ideal-gas heat capacity, which the fluid does not give";
        }
        else if (!curvatureKnown)
        {
            reason = "the alpha parameters' effect on d2alpha/dT2 is not known for this input, so u(cp), u(cv) and u(mu_JT) are not propagated linearly; --uncertainty monte-carlo gives them";
        }
        else
        {
            cv = U(r => r.IsochoricHeatCapacity!.Value);
            cp = U(r => r.IsobaricHeatCapacity!.Value);
            // μJT = (T·α − 1)/(ρ·cp): dμ = T·dα/(ρ·cp) − μ·(dρ/ρ + dcp/cp).
            double mu = (temperature * expansivity - 1) / (density * cpNominal);
            jouleThomson = U(r => temperature * r.IsobaricExpansivity!.Value / (density * cpNominal) - mu * (r.Density / density + r.IsobaricHeatCapacity!.Value / cpNominal));
            if (speedOfSound is double w)
            {
                // w² = cp/(cv·κT·ρ·M): dw/w = ½(dcp/cp − dcv/cv − dκT/κT − dρ/ρ), with the nominal
                // cv = cp − T·α²/(ρ·κT) and κT from the same rows' model.
                double kappa = NominalCompressibility(parameters, temperature, density);
                double cvNominal = cpNominal - temperature * expansivity * expansivity / (density * kappa);
                sound = U(r => 0.5 * w * (r.IsobaricHeatCapacity!.Value / cpNominal - r.IsochoricHeatCapacity!.Value / cvNominal
                    - r.IsothermalCompressibility!.Value / kappa - r.Density / density));
            }
        }

        return new StateUncertainty(PropagationMethod.Linear, U(r => r.Density), U(r => r.Pressure), U(r => r.CompressibilityFactor),
            U(r => r.ResidualEnthalpy), U(r => r.ResidualEntropy), null)
        {
            IsothermalCompressibility = U(r => r.IsothermalCompressibility!.Value),
            IsobaricExpansivity = U(r => r.IsobaricExpansivity!.Value),
            IsochoricHeatCapacity = cv,
            IsobaricHeatCapacity = cp,
            JouleThomsonCoefficient = jouleThomson,
            SpeedOfSound = sound,
            ResponseReason = reason,
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
            SpeedOfSound = StdOrNull(v => v.SpeedOfSound),
        };
        return result with
        {
            ResponseReason = result.IsobaricHeatCapacity is null
                ? "u(cp), u(cv) and u(mu_JT) need the ideal-gas heat capacity in every sample (the fluid has none, or a sample's state has no finite value)"
                : null,
        };
    }
}
