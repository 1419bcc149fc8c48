namespace PhaseSlope.Core.Fluids;

/// <summary>Ideal-gas isobaric molar heat capacity of a fluid,
/// cp°/R = Σ c_k·(T/T_r)^(t_k) + Σ v_i·(u_i/T)²·e^(u_i/T)/(e^(u_i/T) − 1)²:
/// power terms (which cover the polynomial correlations of handbooks, T_r = 1 K, and the
/// reduced power forms of reference equations of state) plus Planck–Einstein terms (the form of
/// the reference equations of state), with analytic enthalpy and entropy integrals.</summary>
/// <remarks>
/// Integrals used (x = u/T):
/// ∫ (x²eˣ/(eˣ − 1)²) dT = u/(eˣ − 1);
/// ∫ (x²eˣ/(eˣ − 1)²)/T dT = x/(eˣ − 1) − ln(1 − e^(−x)) up to a constant (sign handled below);
/// ∫ (T/T_r)^t dT = T_r·(T/T_r)^(t+1)/(t + 1), or T_r·ln T for t = −1;
/// ∫ (T/T_r)^t/T dT = (T/T_r)^t/t, or ln T for t = 0.
/// Units: T in K, cp° in J/(mol·K), integrals in J/mol and J/(mol·K).
/// </remarks>
public sealed class IdealGasHeatCapacity
{
    private const double R = Constants.GasConstant;

    /// <summary>Creates the correlation.</summary>
    /// <param name="powerTerms">(c_k, t_k) pairs of the power terms.</param>
    /// <param name="reducingTemperature">T_r of the power terms in K (1 for handbook polynomials in T/K).</param>
    /// <param name="einsteinTerms">(v_i, u_i) pairs, u_i in K.</param>
    /// <param name="minimumTemperature">Lowest temperature of the stated range, K.</param>
    /// <param name="maximumTemperature">Highest temperature of the stated range, K.</param>
    /// <param name="source">Published source of the form and coefficients.</param>
    public IdealGasHeatCapacity(
        IReadOnlyList<(double Coefficient, double Exponent)> powerTerms,
        double reducingTemperature,
        IReadOnlyList<(double Coefficient, double Temperature)> einsteinTerms,
        double minimumTemperature,
        double maximumTemperature,
        string source)
    {
        ArgumentNullException.ThrowIfNull(powerTerms);
        ArgumentNullException.ThrowIfNull(einsteinTerms);
        Preconditions.Positive(reducingTemperature, "reducing temperature");
        Preconditions.Positive(minimumTemperature, "minimum temperature");
        Preconditions.Positive(maximumTemperature, "maximum temperature");
        foreach (var (c, t) in powerTerms)
        {
            Preconditions.Finite(c, "power-term coefficient");
            Preconditions.Finite(t, "power-term exponent");
        }

        foreach (var (v, u) in einsteinTerms)
        {
            Preconditions.Finite(v, "Planck-Einstein coefficient");
            Preconditions.Positive(u, "Planck-Einstein temperature");
        }

        PowerTerms = [.. powerTerms];
        ReducingTemperature = reducingTemperature;
        EinsteinTerms = [.. einsteinTerms];
        MinimumTemperature = minimumTemperature;
        MaximumTemperature = maximumTemperature;
        Source = source;
    }

    /// <summary>(c_k, t_k) of the power terms.</summary>
    public IReadOnlyList<(double Coefficient, double Exponent)> PowerTerms { get; }

    /// <summary>T_r of the power terms in K.</summary>
    public double ReducingTemperature { get; }

    /// <summary>(v_i, u_i) of the Planck–Einstein terms, u_i in K.</summary>
    public IReadOnlyList<(double Coefficient, double Temperature)> EinsteinTerms { get; }

    /// <summary>Lowest temperature of the range the source states, in K.</summary>
    public double MinimumTemperature { get; }

    /// <summary>Highest temperature of the range the source states, in K.</summary>
    public double MaximumTemperature { get; }

    /// <summary>Published source of the correlation.</summary>
    public string Source { get; }

    /// <summary>True when <paramref name="temperature"/> lies inside the stated range.</summary>
    public bool InRange(double temperature) => temperature >= MinimumTemperature && temperature <= MaximumTemperature;

    /// <summary>cp°(T) in J/(mol·K).</summary>
    public double HeatCapacity(double temperature)
    {
        double sum = 0;
        foreach (var (c, t) in PowerTerms)
        {
            sum += c * Math.Pow(temperature / ReducingTemperature, t);
        }

        foreach (var (v, u) in EinsteinTerms)
        {
            double x = u / temperature;
            double em1 = ExpM1(-x); // e^(−x) − 1, accurate for small x (see ExpM1)
            // x²eˣ/(eˣ − 1)² = x²e^(−x)/(1 − e^(−x))²
            sum += v * x * x * Math.Exp(-x) / (em1 * em1);
        }

        return R * sum;
    }

    /// <summary>dcp°/dT in J/(mol·K²).</summary>
    public double HeatCapacityDerivative(double temperature)
    {
        double sum = 0;
        foreach (var (c, t) in PowerTerms)
        {
            sum += c * t * Math.Pow(temperature / ReducingTemperature, t) / temperature;
        }

        foreach (var (v, u) in EinsteinTerms)
        {
            // E(x) = x²eˣ/(eˣ−1)², dE/dx = E·[2/x − (eˣ + 1)/(eˣ − 1)], dx/dT = −x/T
            double x = u / temperature;
            double em1 = ExpM1(-x);
            double e = x * x * Math.Exp(-x) / (em1 * em1);
            double coth = (1 + Math.Exp(-x)) / -em1;
            sum += v * e * (2 / x - coth) * (-x / temperature);
        }

        return R * sum;
    }

    /// <summary>cp°(T) and the antiderivatives H(T) = ∫cp° dT and S(T) = ∫cp°/T dT (J/mol,
    /// J/(mol·K), each up to its own constant) in one pass, sharing the exponentials of the
    /// Planck–Einstein terms: the ideal-gas part of a state costs one call.</summary>
    internal (double HeatCapacity, double Enthalpy, double Entropy) Terms(double temperature)
        => (HeatCapacity(temperature), EnthalpyAntiderivative(temperature), EntropyAntiderivative(temperature));

    /// <summary>Enthalpy integral ∫ from <paramref name="from"/> to <paramref name="to"/> of cp° dT, J/mol.</summary>
    public double EnthalpyIntegral(double from, double to) => EnthalpyAntiderivative(to) - EnthalpyAntiderivative(from);

    /// <summary>Entropy integral ∫ from <paramref name="from"/> to <paramref name="to"/> of cp°/T dT, J/(mol·K).</summary>
    public double EntropyIntegral(double from, double to) => EntropyAntiderivative(to) - EntropyAntiderivative(from);

    private double EnthalpyAntiderivative(double temperature)
    {
        double sum = 0;
        double tr = ReducingTemperature;
        foreach (var (c, t) in PowerTerms)
        {
            sum += t == -1
                ? c * tr * Math.Log(temperature)
                : c * tr * Math.Pow(temperature / tr, t + 1) / (t + 1);
        }

        foreach (var (v, u) in EinsteinTerms)
        {
            // ∫ E dT = u/(eˣ − 1) = u·e^(−x)/(1 − e^(−x))
            double x = u / temperature;
            sum += v * u * Math.Exp(-x) / -ExpM1(-x);
        }

        return R * sum;
    }

    private double EntropyAntiderivative(double temperature)
    {
        double sum = 0;
        double tr = ReducingTemperature;
        foreach (var (c, t) in PowerTerms)
        {
            sum += t == 0
                ? c * Math.Log(temperature)
                : c * Math.Pow(temperature / tr, t) / t;
        }

        foreach (var (v, u) in EinsteinTerms)
        {
            // ∫ E/T dT = x/(eˣ − 1) − ln(1 − e^(−x))
            double x = u / temperature;
            double oneMinus = -ExpM1(-x);
            sum += v * (x * Math.Exp(-x) / oneMinus - Math.Log(oneMinus));
        }

        return R * sum;
    }

    /// <summary>eˣ − 1 to a few units in the last place for every x, small |x| included.</summary>
    /// <remarks>.NET's double.ExpM1 is computed as Math.Exp(x) − 1, which loses about
    /// −log10|x| digits (1e-10 relative at x = 1e-6). Here u = eˣ is rounded and
    /// (u − 1)·x/ln u is formed: the rounding errors of u − 1 and ln u cancel in the ratio
    /// (Kahan's method, as given by Higham, Accuracy and Stability of Numerical Algorithms,
    /// 2nd ed. (2002); from memory).</remarks>
    private static double ExpM1(double x)
    {
        double u = Math.Exp(x);
        if (u == 1.0)
        {
            return x;
        }

        if (double.IsPositiveInfinity(u))
        {
            return u;
        }

        double um1 = u - 1.0;
        if (um1 == -1.0)
        {
            return -1.0;
        }

        return um1 * x / Math.Log(u);
    }
}
