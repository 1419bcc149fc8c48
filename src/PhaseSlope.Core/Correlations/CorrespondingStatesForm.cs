using PhaseSlope.Core.Estimation;

namespace PhaseSlope.Core.Correlations;

/// <summary>The predictive Lee–Kesler (1975) and Ambrose–Walton (1989) relations as vapour-pressure
/// forms: ln(P/Pc) from Tc, Pc and ω alone, nothing fitted (see <see cref="CorrespondingStates"/>).</summary>
/// <remarks>Derivatives by the chain rule in Tr; d/dT = (1/Tc)·d/dTr.</remarks>
public sealed class CorrespondingStatesForm : VapourPressureForm
{
    private readonly bool _ambroseWalton;

    private CorrespondingStatesForm(bool ambroseWalton, double criticalTemperature, double criticalPressure, double acentricFactor)
    {
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Preconditions.Finite(acentricFactor, "acentric factor");
        _ambroseWalton = ambroseWalton;
        CriticalTemperature = criticalTemperature;
        CriticalPressure = criticalPressure;
        AcentricFactor = acentricFactor;
    }

    /// <summary>Lee–Kesler, AIChE J. 21, 510 (1975).</summary>
    public static CorrespondingStatesForm LeeKesler(double tc, double pc, double omega) => new(false, tc, pc, omega);

    /// <summary>Ambrose–Walton, Pure Appl. Chem. 61, 1395 (1989).</summary>
    public static CorrespondingStatesForm AmbroseWalton(double tc, double pc, double omega) => new(true, tc, pc, omega);

    /// <inheritdoc />
    public override string Id => _ambroseWalton ? "ambrose-walton" : "lee-kesler";

    /// <inheritdoc />
    public override string Description => _ambroseWalton
        ? $"ln(P/Pc) = f0 + omega f1 + omega^2 f2 (Ambrose & Walton 1989), Tc = {Preconditions.Format(CriticalTemperature)} K, Pc = {Preconditions.Format(CriticalPressure)} Pa, omega = {Preconditions.Format(AcentricFactor)}"
        : $"ln(P/Pc) = f0 + omega f1 (Lee & Kesler 1975), Tc = {Preconditions.Format(CriticalTemperature)} K, Pc = {Preconditions.Format(CriticalPressure)} Pa, omega = {Preconditions.Format(AcentricFactor)}";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = [];

    /// <inheritdoc />
    public override bool UsesCriticalPoint => true;

    /// <inheritdoc />
    public override VapourPressureForm WithCriticalPoint(double criticalTemperature, double criticalPressure)
        => new CorrespondingStatesForm(_ambroseWalton, criticalTemperature, criticalPressure, AcentricFactor);

    /// <summary>Tc, K.</summary>
    public double CriticalTemperature { get; }

    /// <summary>Pc, Pa.</summary>
    public double CriticalPressure { get; }

    /// <summary>ω.</summary>
    public double AcentricFactor { get; }

    /// <inheritdoc />
    public override double UpperLimit => CriticalTemperature;

    /// <inheritdoc/>
    public override double UpperPressureLimit => CriticalPressure;

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p) => Math.Log(CriticalPressure) + Reduced(t / CriticalTemperature).Value;

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p) => Reduced(t / CriticalTemperature).First / CriticalTemperature;

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p) => Reduced(t / CriticalTemperature).Second / (CriticalTemperature * CriticalTemperature);

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        // No fitted parameters.
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        // No fitted parameters.
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w) => [];

    /// <summary>ln Pr and its first two Tr-derivatives.</summary>
    private (double Value, double First, double Second) Reduced(double tr)
    {
        double w = AcentricFactor;
        if (!_ambroseWalton)
        {
            var (f0, d0, dd0) = CorrespondingStates.LeeKeslerTerm(0, tr);
            var (f1, d1, dd1) = CorrespondingStates.LeeKeslerTerm(1, tr);
            return (f0 + w * f1, d0 + w * d1, dd0 + w * dd1);
        }

        // f_k = g_k(τ)/Tr, τ = 1 − Tr: f′ = −g′/Tr − g/Tr², f″ = g″/Tr + 2g′/Tr² + 2g/Tr³.
        double tau = 1 - tr;
        double value = 0, first = 0, second = 0;
        double[] weight = [1, w, w * w];
        for (int k = 0; k < 3; k++)
        {
            var (g, g1, g2) = CorrespondingStates.AmbroseWaltonSeries(k, tau);
            value += weight[k] * g / tr;
            first += weight[k] * (-g1 / tr - g / (tr * tr));
            second += weight[k] * (g2 / tr + 2 * g1 / (tr * tr) + 2 * g / (tr * tr * tr));
        }

        return (value, first, second);
    }
}
