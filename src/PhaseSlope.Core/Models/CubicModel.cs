using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Models;

/// <summary>A two-parameter cubic equation of state for one fluid,
/// P = RT/(v − b) − a·α(T)/((v + δ1·b)(v + δ2·b)), expressed through its one residual
/// Helmholtz function A_r(T, ρ).</summary>
/// <remarks>
/// Integrating the pressure gives, with η = bρ,
/// A_r = −RT·ln(1 − η) − (a·α/b)·F(η), where F = ln[(1 + δ1η)/(1 + δ2η)]/(δ1 − δ2), or
/// F = η/(1 + δη) when δ1 = δ2 = δ (van der Waals: F = η). Then dF/dρ = b/D with
/// D = (1 + δ1η)(1 + δ2η). Every pressure, fugacity and caloric residual comes from
/// <see cref="Residual"/>; none is written a second time.
/// The model is valid for T &gt; 0 and 0 &lt; ρ &lt; 1/b.
/// </remarks>
public sealed class CubicModel
{
    private const double R = Constants.GasConstant;
    private readonly double _u;
    private readonly double _w;

    /// <summary>Builds a model from its form, alpha function and critical constants.</summary>
    /// <param name="kind">Which published model this is (for reports).</param>
    /// <param name="form">δ1, δ2 and the derived Ωa, Ωb.</param>
    /// <param name="alpha">α(T).</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    public CubicModel(CubicModelKind kind, CubicForm form, IAlphaFunction alpha, double criticalTemperature, double criticalPressure)
    {
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Kind = kind;
        Form = form;
        Alpha = alpha;
        CriticalTemperature = criticalTemperature;
        CriticalPressure = criticalPressure;
        CovolumeB = form.OmegaB * R * criticalTemperature / criticalPressure;
        AttractionA = form.OmegaA * R * R * criticalTemperature * criticalTemperature / criticalPressure;
        CriticalDensity = criticalPressure / (form.CriticalCompressibility * R * criticalTemperature);
        _u = form.Delta1 + form.Delta2;
        _w = form.Delta1 * form.Delta2;
    }

    /// <summary>Builds the chosen published model for a fluid from its Tc, Pc and ω.</summary>
    public static CubicModel For(CubicModelKind kind, Fluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        return For(kind, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value, fluid.AcentricFactor.Value);
    }

    /// <summary>Builds the chosen published model from Tc (K), Pc (Pa) and the acentric factor.</summary>
    public static CubicModel For(CubicModelKind kind, double criticalTemperature, double criticalPressure, double acentricFactor)
    {
        Preconditions.Finite(acentricFactor, "acentric factor");
        return kind switch
        {
            CubicModelKind.PengRobinson => new CubicModel(kind, CubicForm.PengRobinson,
                new SoaveAlpha(SoaveAlpha.PengRobinson1976Slope(acentricFactor), criticalTemperature, "Peng & Robinson 1976"),
                criticalTemperature, criticalPressure),
            CubicModelKind.PengRobinson1978 => new CubicModel(kind, CubicForm.PengRobinson,
                new SoaveAlpha(SoaveAlpha.PengRobinson1978Slope(acentricFactor), criticalTemperature, "Robinson & Peng 1978"),
                criticalTemperature, criticalPressure),
            CubicModelKind.SoaveRedlichKwong => new CubicModel(kind, CubicForm.RedlichKwong,
                new SoaveAlpha(SoaveAlpha.SoaveSlope(acentricFactor), criticalTemperature, "Soave 1972"),
                criticalTemperature, criticalPressure),
            CubicModelKind.RedlichKwong => new CubicModel(kind, CubicForm.RedlichKwong,
                new InverseRootAlpha(criticalTemperature), criticalTemperature, criticalPressure),
            CubicModelKind.VanDerWaals => new CubicModel(kind, CubicForm.VanDerWaals,
                new ConstantAlpha(), criticalTemperature, criticalPressure),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown cubic model"),
        };
    }

    /// <summary>Which published model this is.</summary>
    public CubicModelKind Kind { get; }

    /// <summary>The cubic form (δ1, δ2, Ωa, Ωb, Zc).</summary>
    public CubicForm Form { get; }

    /// <summary>The alpha function.</summary>
    public IAlphaFunction Alpha { get; }

    /// <summary>Input critical temperature Tc in K.</summary>
    public double CriticalTemperature { get; }

    /// <summary>Input critical pressure Pc in Pa.</summary>
    public double CriticalPressure { get; }

    /// <summary>The model's own critical molar density Pc/(Zc·R·Tc) in mol/m³.</summary>
    public double CriticalDensity { get; }

    /// <summary>Co-volume b = Ωb·R·Tc/Pc in m³/mol.</summary>
    public double CovolumeB { get; }

    /// <summary>Attraction parameter at Tc, a = Ωa·R²·Tc²/Pc, in Pa·m⁶/mol².</summary>
    public double AttractionA { get; }

    /// <summary>The highest density the model admits, 1/b, in mol/m³.</summary>
    public double MaximumDensity => 1 / CovolumeB;

    /// <summary>The residual Helmholtz energy and its derivatives at (T, ρ).</summary>
    /// <param name="temperature">T in K, positive.</param>
    /// <param name="density">ρ in mol/m³, in (0, 1/b).</param>
    public HelmholtzDerivatives Residual(double temperature, double density)
    {
        double b = CovolumeB;
        double eta = b * density;
        AlphaValue alpha = Alpha.Evaluate(temperature);
        double theta = AttractionA * alpha.Value / b;
        double thetaT = AttractionA * alpha.FirstDerivative / b;
        double thetaTT = AttractionA * alpha.SecondDerivative / b;

        double oneMinusEta = 1 - eta;
        double logRepulsive = Math.Log(oneMinusEta);
        double d1 = 1 + Form.Delta1 * eta;
        double d2 = 1 + Form.Delta2 * eta;
        double f = Form.Delta1 == Form.Delta2
            ? eta / d1
            : Math.Log(d1 / d2) / (Form.Delta1 - Form.Delta2);
        double d = d1 * d2;
        double dRho = b * (_u + 2 * _w * eta);   // dD/dρ
        double dRhoRho = 2 * _w * b * b;         // d²D/dρ²

        double rt = R * temperature;
        double value = -rt * logRepulsive - theta * f;
        double dT = -R * logRepulsive - thetaT * f;
        double dTT = -thetaTT * f;
        double aRho = rt * b / oneMinusEta - theta * b / d;
        double aRhoRho = rt * b * b / (oneMinusEta * oneMinusEta) + theta * b * dRho / (d * d);
        double aRhoRhoRho = 2 * rt * b * b * b / (oneMinusEta * oneMinusEta * oneMinusEta)
            + theta * b * (dRhoRho * d - 2 * dRho * dRho) / (d * d * d);
        double aTRho = R * b / oneMinusEta - thetaT * b / d;
        return new HelmholtzDerivatives(temperature, density, value, dT, dTT, aRho, aRhoRho, aRhoRhoRho, aTRho);
    }

    /// <summary>Pressure P(T, ρ) in Pa.</summary>
    public double Pressure(double temperature, double density) => Residual(temperature, density).Pressure;
}
