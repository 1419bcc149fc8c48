namespace PhaseSlope.Core.Models;

/// <summary>The molar residual Helmholtz energy A_r(T, ρ) of a model and its partial derivatives
/// at one temperature and molar density.</summary>
/// <remarks>Units: A_r in J/mol; derivatives with respect to T in J/(mol·K^n); with respect to
/// ρ (mol/m³) in J·m³ⁿ/mol^(n+1). Every single-phase property is built from these.</remarks>
/// <param name="Temperature">T in K.</param>
/// <param name="Density">ρ in mol/m³.</param>
/// <param name="Value">A_r.</param>
/// <param name="DT">∂A_r/∂T at constant ρ.</param>
/// <param name="DTT">∂²A_r/∂T².</param>
/// <param name="DRho">∂A_r/∂ρ at constant T.</param>
/// <param name="DRhoRho">∂²A_r/∂ρ².</param>
/// <param name="DRhoRhoRho">∂³A_r/∂ρ³.</param>
/// <param name="DTRho">∂²A_r/∂T∂ρ.</param>
public readonly record struct HelmholtzDerivatives(
    double Temperature,
    double Density,
    double Value,
    double DT,
    double DTT,
    double DRho,
    double DRhoRho,
    double DRhoRhoRho,
    double DTRho)
{
    private const double R = Constants.GasConstant;

    /// <summary>Pressure P = ρRT + ρ²·∂A_r/∂ρ in Pa.</summary>
    public double Pressure => Density * (R * Temperature + Density * DRho);

    /// <summary>(∂P/∂ρ)_T = RT + 2ρ·A_r,ρ + ρ²·A_r,ρρ in Pa·m³/mol.</summary>
    public double PressureDRho => R * Temperature + Density * (2 * DRho + Density * DRhoRho);

    /// <summary>(∂²P/∂ρ²)_T = 2A_r,ρ + 4ρ·A_r,ρρ + ρ²·A_r,ρρρ.</summary>
    public double PressureDRhoRho => 2 * DRho + Density * (4 * DRhoRho + Density * DRhoRhoRho);

    /// <summary>(∂P/∂T)_ρ = ρR + ρ²·A_r,Tρ in Pa/K.</summary>
    public double PressureDT => Density * (R + Density * DTRho);
}
