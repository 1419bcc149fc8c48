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

    /// <summary>Tc, K.</summary>
    public double CriticalTemperature { get; }

    /// <summary>Pc, Pa.</summary>
    public double CriticalPressure { get; }

    /// <summary>ω.</summary>
    public double AcentricFactor { get; }

    /// <inheritdoc />
    public override double UpperLimit => CriticalTemperature;

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
            // f0 = 5.92714 − 6.09648/Tr − 1.28862 ln Tr + 0.169347 Tr⁶ (and f1 likewise).
            var (f0, f1) = CorrespondingStates.LeeKeslerTerms(tr);
            double d0 = 6.09648 / (tr * tr) - 1.28862 / tr + 6 * 0.169347 * Math.Pow(tr, 5);
            double d1 = 15.6875 / (tr * tr) - 13.4721 / tr + 6 * 0.43577 * Math.Pow(tr, 5);
            double dd0 = -2 * 6.09648 / (tr * tr * tr) + 1.28862 / (tr * tr) + 30 * 0.169347 * Math.Pow(tr, 4);
            double dd1 = -2 * 15.6875 / (tr * tr * tr) + 13.4721 / (tr * tr) + 30 * 0.43577 * Math.Pow(tr, 4);
            return (f0 + w * f1, d0 + w * d1, dd0 + w * dd1);
        }

        // f_k = g_k(τ)/Tr with g_k = Σ c τ^e, τ = 1 − Tr: f′ = −g′/Tr − g/Tr², f″ = g″/Tr + 2g′/Tr² + 2g/Tr³.
        double[] e = [1, 1.5, 2.5, 5];
        double[][] c =
        [
            [-5.97616, 1.29874, -0.60394, -1.06841],
            [-5.03365, 1.11505, -5.41217, -7.46628],
            [-0.64771, 2.41539, -4.26979, 3.25259],
        ];
        double tau = 1 - tr;
        double value = 0, first = 0, second = 0;
        double[] weight = [1, w, w * w];
        for (int k = 0; k < 3; k++)
        {
            double g = 0, g1 = 0, g2 = 0;
            for (int i = 0; i < 4; i++)
            {
                g += c[k][i] * Math.Pow(tau, e[i]);
                g1 += c[k][i] * e[i] * Math.Pow(tau, e[i] - 1);
                g2 += c[k][i] * e[i] * (e[i] - 1) * Math.Pow(tau, e[i] - 2);
            }

            value += weight[k] * g / tr;
            first += weight[k] * (-g1 / tr - g / (tr * tr));
            second += weight[k] * (g2 / tr + 2 * g1 / (tr * tr) + 2 * g / (tr * tr * tr));
        }

        return (value, first, second);
    }
}
