using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>How a model's volume shift depends on the uncertain inputs.</summary>
public enum VolumeShiftRule
{
    /// <summary>A fixed c (0 for none): independent of Tc, Pc and ω.</summary>
    Fixed,

    /// <summary>The Péneloux correlation c = slope·(offset − Z_RA(ω))·R·Tc/Pc, recomputed from
    /// the inputs (<see cref="Models.VolumeShift.Peneloux"/>).</summary>
    Peneloux,
}

/// <summary>A cubic model as a function of its uncertain inputs: Tc, Pc and ω of the fluid, and
/// optionally alpha-function parameters with their covariance (<see cref="AlphaParameterUncertainty"/>).
/// It builds the model for any input vector (Monte Carlo) and gives the exact derivatives of the
/// model's structural constants b, a·α(T), a·α′(T) and c with respect to each input (linear
/// propagation).</summary>
/// <remarks>The derivatives are analytic: b = Ωb·R·Tc/Pc and a = Ωa·R²·Tc²/Pc; every alpha
/// function here is a function of T/Tc, so ∂α/∂Tc = −(T/Tc)·α′ and ∂α′/∂Tc = −(T/Tc)·α″ − α′/Tc;
/// ω enters the Soave-type functions through m(ω) (the published polynomials differentiated
/// here) and the generalised Twu function linearly, α = α0 + ω(α1 − α0). Fluid-specific Twu or
/// Mathias–Copeman constants do not use ω.</remarks>
public sealed class CubicParameterization
{
    private const double R = Constants.GasConstant;
    private readonly Fluid _fluid;
    private readonly AlphaForm _alpha;
    private readonly double _fixedShift;
    private readonly AlphaParameterUncertainty? _alphaParameters;

    /// <summary>Creates the parameterization of a fluid's model.</summary>
    /// <param name="fluid">The fluid; Tc, Pc and ω with their uncertainties come from
    /// <see cref="FamilyUncertainty.CriticalConstants"/>.</param>
    /// <param name="kind">The cubic model.</param>
    /// <param name="alpha">The alpha form (ignored when <paramref name="alphaParameters"/> is given).</param>
    /// <param name="shiftRule">How c depends on the inputs.</param>
    /// <param name="fixedShift">c in m³/mol for <see cref="VolumeShiftRule.Fixed"/>.</param>
    /// <param name="alphaParameters">Uncertain alpha parameters with a covariance, or null.</param>
    public CubicParameterization(Fluid fluid, CubicModelKind kind, AlphaForm alpha = AlphaForm.Default,
        VolumeShiftRule shiftRule = VolumeShiftRule.Fixed, double fixedShift = 0, AlphaParameterUncertainty? alphaParameters = null)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        _fluid = fluid;
        Kind = kind;
        _alpha = alpha;
        ShiftRule = shiftRule;
        _fixedShift = fixedShift;
        _alphaParameters = alphaParameters;
        var inputs = new List<UncertainInput>(FamilyUncertainty.CriticalConstants(fluid));
        int extra = alphaParameters?.Parameters.Count ?? 0;
        if (alphaParameters is not null)
        {
            if (alphaParameters.Covariance.RowCount != extra || alphaParameters.Covariance.ColumnCount != extra)
            {
                throw new InvalidInputException("alpha parameter covariance", alphaParameters.Covariance.RowCount,
                    $"the alpha-parameter covariance is {alphaParameters.Covariance.RowCount}x{alphaParameters.Covariance.ColumnCount}, expected {extra}x{extra}");
            }

            inputs.AddRange(alphaParameters.Parameters);
        }

        Inputs = inputs;
        var covariance = Matrix<double>.Build.Dense(inputs.Count, inputs.Count);
        for (int i = 0; i < 3; i++)
        {
            covariance[i, i] = inputs[i].StandardUncertainty * inputs[i].StandardUncertainty;
        }

        if (alphaParameters is not null)
        {
            covariance.SetSubMatrix(3, 3, alphaParameters.Covariance);
            if (alphaParameters.CriticalSensitivity is { } d)
            {
                // Tuned parameters follow Tc and Pc: θ = θ0 + D·(x − x0) + ε with ε the fit's own
                // scatter, so Cov(θ, x) = D·Σx and Cov(θ, θ) = Σfit + D·Σx·Dᵀ (x = Tc, Pc).
                for (int j = 0; j < extra; j++)
                {
                    for (int m = 0; m < 2; m++)
                    {
                        double cross = d[j, m] * covariance[m, m];
                        covariance[3 + j, m] = cross;
                        covariance[m, 3 + j] = cross;
                    }

                    for (int k = 0; k < extra; k++)
                    {
                        covariance[3 + j, 3 + k] += d[j, 0] * covariance[0, 0] * d[k, 0] + d[j, 1] * covariance[1, 1] * d[k, 1];
                    }
                }
            }
        }

        Covariance = covariance;
        Nominal = Build(inputs.Select(i => i.Value).ToArray());
        MinimumTemperature = Equilibrium.CoexistenceSolver.LowestValidTemperature(fluid);
    }

    /// <summary>The cubic model.</summary>
    public CubicModelKind Kind { get; }

    /// <summary>How c depends on the inputs.</summary>
    public VolumeShiftRule ShiftRule { get; }

    /// <summary>The uncertain inputs: Tc (K), Pc (Pa), ω, then any alpha parameters.</summary>
    public IReadOnlyList<UncertainInput> Inputs { get; }

    /// <summary>The covariance of the inputs (diagonal u² for Tc, Pc, ω, which are taken as
    /// independent; the alpha parameters' own block).</summary>
    public Matrix<double> Covariance { get; }

    /// <summary>The model at the nominal input values.</summary>
    public CubicModel Nominal { get; }

    /// <summary>The nominal fluid's lowest valid temperature, K.</summary>
    public double MinimumTemperature { get; }

    /// <summary>The model for one vector of input values (in the order of <see cref="Inputs"/>).</summary>
    /// <exception cref="InvalidInputException">The values give no valid model (Tc or Pc not
    /// positive, ω outside a range the alpha function allows).</exception>
    public CubicModel Build(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        double tc = values[0], pc = values[1], omega = values[2];
        Preconditions.Positive(tc, "critical temperature");
        Preconditions.Positive(pc, "critical pressure");
        double shift = ShiftRule == VolumeShiftRule.Peneloux
            ? Models.VolumeShift.Peneloux(Kind, tc, pc, Models.VolumeShift.RackettCompressibility(omega))
            : _fixedShift;
        if (_alphaParameters is not null)
        {
            var own = values.Skip(3).ToArray();
            return new CubicModel(Kind, Kind.Entry().Form, _alphaParameters.Alpha(tc, own), tc, pc, shift);
        }

        return CubicModel.For(Kind, FluidFor(values), _alpha, shift);
    }

    /// <summary>The fluid with Tc, Pc and ω replaced by the first three values and, for uncertain
    /// alpha parameters, its parameter set by the rest (everything else, such as the ideal-gas heat
    /// capacity, kept).</summary>
    public Fluid FluidFor(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var fluid = _fluid with
        {
            CriticalTemperature = _fluid.CriticalTemperature with { Value = values[0] },
            CriticalPressure = _fluid.CriticalPressure with { Value = values[1] },
            AcentricFactor = _fluid.AcentricFactor with { Value = values[2] },
        };
        if (_alphaParameters is not null && CubicModel.FindParameters(_fluid, Kind, _alpha) is { } set)
        {
            // The fluid's own parameter set takes the sampled values too, so that a property
            // engine built from this fluid uses the same model as Build.
            double[] own = [.. values.Skip(3)];
            fluid = fluid with { AlphaParameters = [.. _fluid.AlphaParameters.Select(s => ReferenceEquals(s, set) ? s with { Values = own } : s)] };
        }

        return fluid;
    }

    /// <summary>The exact derivatives of b, a·α(T), a·α′(T) and c of the nominal model with respect
    /// to each input, at temperature T.</summary>
    /// <param name="temperature">T in K.</param>
    /// <returns>One entry per input, in the order of <see cref="Inputs"/>.</returns>
    public StructuralDerivative[] Derivatives(double temperature)
    {
        var m = Nominal;
        double tc = m.CriticalTemperature, pc = m.CriticalPressure;
        double a = m.AttractionA, b = m.CovolumeB, c = m.VolumeShift;
        var alpha = m.Alpha.Evaluate(temperature);
        double tr = temperature / tc;
        bool peneloux = ShiftRule == VolumeShiftRule.Peneloux;
        var result = new StructuralDerivative[Inputs.Count];

        // Tc: a ∝ Tc², b ∝ Tc, α = f(T/Tc).
        double aTc = 2 * a / tc;
        double alphaTc = -tr * alpha.FirstDerivative;
        double alphaSlopeTc = -tr * alpha.SecondDerivative - alpha.FirstDerivative / tc;
        // α = f(T/Tc): ∂α″/∂Tc = −(2α″ + T·α‴)/Tc.
        double alphaCurvatureTc = -(2 * alpha.SecondDerivative + temperature * m.Alpha.ThirdDerivative(temperature)) / tc;
        result[0] = new StructuralDerivative(b / tc, aTc * alpha.Value + a * alphaTc,
            aTc * alpha.FirstDerivative + a * alphaSlopeTc, peneloux ? c / tc : 0, aTc * alpha.SecondDerivative + a * alphaCurvatureTc);

        // Pc: a and b ∝ 1/Pc.
        result[1] = new StructuralDerivative(-b / pc, -a * alpha.Value / pc, -a * alpha.FirstDerivative / pc, peneloux ? -c / pc : 0, -a * alpha.SecondDerivative / pc);

        // ω: through α (Soave-type m(ω), generalised Twu) and the Péneloux Z_RA = 0.29056 − 0.08775ω.
        var (alphaOmega, alphaSlopeOmega, alphaCurvatureOmega) = OmegaSensitivity(temperature);
        double cOmega = peneloux && Kind.Entry().Peneloux is { } coefficients
            ? coefficients.Slope * 0.08775 * R * tc / pc
            : 0;
        result[2] = new StructuralDerivative(0, a * alphaOmega, a * alphaSlopeOmega, cOmega, a * alphaCurvatureOmega);

        for (int k = 3; k < result.Length; k++)
        {
            var (value, slope) = _alphaParameters!.Sensitivity(temperature, k - 3);
            double curvature = _alphaParameters.CurvatureSensitivity is { } second ? second(temperature, k - 3) : double.NaN;
            result[k] = new StructuralDerivative(0, a * value, a * slope, 0, a * curvature);
        }

        return result;
    }

    /// <summary>∂α/∂ω, ∂α′/∂ω and ∂α″/∂ω at T for the nominal alpha function.</summary>
    private (double Value, double Slope, double Curvature) OmegaSensitivity(double temperature)
    {
        if (_alphaParameters is not null)
        {
            return (0, 0, 0);
        }

        double tc = Nominal.CriticalTemperature;
        double omega = Inputs[2].Value;
        switch (Nominal.Alpha)
        {
            case SoaveAlpha { FluidSpecific: false } soave:
            {
                // α = g², g = 1 + m·x, x = 1 − s, s = √(T/Tc); α′ = −m·g/(s·Tc).
                // ∂α/∂m = 2g·x; ∂α′/∂m = −(g + m·x)/(s·Tc).
                double slope = soave.Slope;
                double s = Math.Sqrt(temperature / tc);
                double x = 1 - s;
                double g = 1 + slope * x;
                double dm = SlopeDerivative(omega);
                // α″ = 2m²x′² + 2(1 + m·x)·m·x″ with x′ = −1/(2s·Tc), x″ = −x′/(2T):
                // ∂α″/∂m = 4m·x′² + 2x″·(1 + 2m·x).
                var (_, x1, x2, _) = RootTerm.At(temperature, tc);
                return (2 * g * x * dm, -(g + slope * x) / (s * tc) * dm, (4 * slope * x1 * x1 + 2 * x2 * (1 + 2 * slope * x)) * dm);
            }

            case GeneralisedTwuAlpha:
            {
                // α = α0 + ω(α1 − α0): ∂α/∂ω = α(ω = 1) − α(ω = 0), exactly.
                var one = new GeneralisedTwuAlpha(1, tc).Evaluate(temperature);
                var zero = new GeneralisedTwuAlpha(0, tc).Evaluate(temperature);
                return (one.Value - zero.Value, one.FirstDerivative - zero.FirstDerivative, one.SecondDerivative - zero.SecondDerivative);
            }

            default:
                return (0, 0, 0);
        }
    }

    /// <summary>dm/dω of the model's own Soave-type slope polynomial (see <see cref="SoaveAlpha"/>).</summary>
    private double SlopeDerivative(double omega) => Kind switch
    {
        CubicModelKind.SoaveRedlichKwong => 1.574 - 2 * 0.176 * omega,
        CubicModelKind.PengRobinson1978 when omega > 0.491 => 1.48503 + omega * (2 * -0.164423 + 3 * 0.016666 * omega),
        CubicModelKind.PengRobinson or CubicModelKind.PengRobinson1978 => 1.54226 - 2 * 0.26992 * omega,
        _ => throw new InvalidOperationException($"internal error: no slope polynomial for {Kind.Title()}"),
    };
}
