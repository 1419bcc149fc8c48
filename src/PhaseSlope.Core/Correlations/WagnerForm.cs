namespace PhaseSlope.Core.Correlations;

/// <summary>Wagner-type forms, ln(P/Pc) = (Tc/T)·Σ a_i·τ^(e_i) with τ = 1 − T/Tc, for a given Tc
/// and Pc: the 3-6 form (exponents 1, 1.5, 3, 6; Wagner, Cryogenics 13, 470 (1973)), the 2.5-5
/// form (1, 1.5, 2.5, 5; Ambrose, J. Chem. Thermodyn. 18, 45 (1986)) and the six-term form of the
/// IAPWS saturation equation for water (1, 1.5, 3, 3.5, 4, 7.5; Wagner &amp; Pruss, J. Phys. Chem.
/// Ref. Data 22, 783 (1993)).</summary>
/// <remarks>With S = Σ a_i τ^(e_i): d ln P/dT = −Tc·S/T² − S′/T and
/// d² ln P/dT² = 2Tc·S/T³ + 2S′/T² + S″/(Tc·T), where ′ is d/dτ. Defined below Tc only.</remarks>
public sealed class WagnerForm : VapourPressureForm
{
    private readonly double[] _exponents;

    private WagnerForm(string id, string label, double[] exponents, double criticalTemperature, double criticalPressure)
    {
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Id = id;
        _label = label;
        _exponents = exponents;
        CriticalTemperature = criticalTemperature;
        CriticalPressure = criticalPressure;
        ParameterNames = [.. exponents.Select((_, i) => ((char)('a' + i)).ToString())];
        string terms = string.Join(" + ", exponents.Select((e, i) => $"{(char)('a' + i)} tau^{e.ToString(System.Globalization.CultureInfo.InvariantCulture)}"));
        Description = $"ln(P/Pc) = (Tc/T)({terms}), tau = 1 - T/Tc, Tc = {Preconditions.Format(criticalTemperature)} K, Pc = {Preconditions.Format(criticalPressure)} Pa ({label})";
    }

    /// <summary>The 3-6 form.</summary>
    public static WagnerForm ThreeSix(double criticalTemperature, double criticalPressure)
        => new("wagner-3-6", "Wagner 1973, 3-6 form", ExponentsOf("wagner-3-6"), criticalTemperature, criticalPressure);

    private readonly string _label;

    /// <inheritdoc />
    public override bool UsesCriticalPoint => true;

    /// <inheritdoc />
    public override VapourPressureForm WithCriticalPoint(double criticalTemperature, double criticalPressure)
        => new WagnerForm(Id, _label, _exponents, criticalTemperature, criticalPressure);

    /// <summary>The 2.5-5 form.</summary>
    public static WagnerForm TwoHalfFive(double criticalTemperature, double criticalPressure)
        => new("wagner-2.5-5", "Wagner 2.5-5 form", ExponentsOf("wagner-2.5-5"), criticalTemperature, criticalPressure);

    /// <summary>A published equation of the Wagner type with its own exponents, ln(P/Pc) =
    /// (Tc/T)·Σ a_i·τ^t_i (the ancillary equations of the reference equations of state).</summary>
    public static WagnerForm WithExponents(IReadOnlyList<double> exponents, double criticalTemperature, double criticalPressure)
    {
        ArgumentNullException.ThrowIfNull(exponents);
        return new("wagner-published", "published Wagner-type equation", [.. exponents], criticalTemperature, criticalPressure);
    }

    /// <summary>The six-term form of the IAPWS saturation-pressure equation.</summary>
    public static WagnerForm SixTerm(double criticalTemperature, double criticalPressure)
        => new("wagner-6", "six-term form of Wagner & Pruss 1993", ExponentsOf("wagner-6"), criticalTemperature, criticalPressure);

    /// <summary>The exponents e_i of a Wagner form by its identifier (wagner-3-6, wagner-2.5-5, wagner-6).</summary>
    /// <exception cref="ArgumentException">Not a Wagner form.</exception>
    public static double[] ExponentsOf(string id) => id switch
    {
        "wagner-3-6" => [1, 1.5, 3, 6],
        "wagner-2.5-5" => [1, 1.5, 2.5, 5],
        "wagner-6" => [1, 1.5, 3, 3.5, 4, 7.5],
        _ => throw new ArgumentException($"'{id}' is not a Wagner form", nameof(id)),
    };

    /// <inheritdoc />
    public override string Id { get; }

    /// <inheritdoc />
    public override string Description { get; }

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; }

    /// <summary>Tc of the form, K.</summary>
    public double CriticalTemperature { get; }

    /// <summary>Pc of the form, Pa.</summary>
    public double CriticalPressure { get; }

    /// <summary>The exponents e_i.</summary>
    public IReadOnlyList<double> Exponents => _exponents;

    /// <inheritdoc />
    public override double UpperLimit => CriticalTemperature;

    /// <inheritdoc/>
    public override double UpperPressureLimit => CriticalPressure;

    /// <inheritdoc />
    /// <remarks>Linear in the a_i because Tc and Pc are given, not fitted.</remarks>
    public override bool IsLinearInParameters => true;

    /// <summary>S = Σ a_i τ^(e_i): all ln P needs (it is evaluated at every point several times
    /// per fit), so the derivative sums are left to <see cref="Sums"/>.</summary>
    private double Sum(double t, IReadOnlyList<double> p)
    {
        double tau = 1 - t / CriticalTemperature;
        double s = 0;
        for (int i = 0; i < _exponents.Length; i++)
        {
            s += p[i] * Math.Pow(tau, _exponents[i]);
        }

        return s;
    }

    /// <summary>S with S′ = dS/dτ and S″ = d²S/dτ².</summary>
    private (double S, double S1, double S2) Sums(double t, IReadOnlyList<double> p)
    {
        double tau = 1 - t / CriticalTemperature;
        double s1 = 0, s2 = 0;
        for (int i = 0; i < _exponents.Length; i++)
        {
            double e = _exponents[i];
            s1 += p[i] * e * Math.Pow(tau, e - 1);
            s2 += p[i] * e * (e - 1) * Math.Pow(tau, e - 2);
        }

        return (Sum(t, p), s1, s2);
    }

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p)
        => Math.Log(CriticalPressure) + CriticalTemperature / t * Sum(t, p);

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p)
    {
        var (s, s1, _) = Sums(t, p);
        return -CriticalTemperature * s / (t * t) - s1 / t;
    }

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p)
    {
        var (s, s1, s2) = Sums(t, p);
        double tc = CriticalTemperature;
        return 2 * tc * s / (t * t * t) + 2 * s1 / (t * t) + s2 / (tc * t);
    }

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double tau = 1 - t / CriticalTemperature;
        for (int i = 0; i < _exponents.Length; i++)
        {
            g[i] = CriticalTemperature / t * Math.Pow(tau, _exponents[i]);
        }
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double tau = 1 - t / CriticalTemperature;
        for (int i = 0; i < _exponents.Length; i++)
        {
            double e = _exponents[i];
            g[i] = -CriticalTemperature * Math.Pow(tau, e) / (t * t) - e * Math.Pow(tau, e - 1) / t;
        }
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
    {
        // Linear in the a_i: ln(P/Pc) = Σ a_i (Tc/T) τ^(e_i).
        double lnPc = Math.Log(CriticalPressure);
        var y = lnP.Select(v => v - lnPc).ToArray();
        var basis = _exponents.Select(e => (Func<double, double>)(x => CriticalTemperature / x * Math.Pow(1 - x / CriticalTemperature, e))).ToArray();
        return LinearFit(t, y, w, basis);
    }
}
