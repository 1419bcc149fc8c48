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

    // The residual properties below are written here once; every state and solver uses them.
    // Each takes the pressure explicitly: for a dense liquid at low reduced temperature P
    // recomputed from ρ is a small difference of large terms, while a solver knows P exactly.

    /// <summary>Z = P/(ρRT) at the given pressure (Pa).</summary>
    public double CompressibilityFactor(double pressure) => pressure / (Density * R * Temperature);

    /// <summary>ln φ = A_r/(RT) + Z − 1 − ln Z at the given pressure (Pa).</summary>
    public double LnFugacityCoefficient(double pressure)
    {
        double z = CompressibilityFactor(pressure);
        return Value / (R * Temperature) + z - 1 - Math.Log(z);
    }

    /// <summary>Residual internal energy u_r = A_r − T·A_r,T in J/mol.</summary>
    public double ResidualInternalEnergy => Value - Temperature * DT;

    /// <summary>Residual enthalpy h_r = u_r + RT(Z − 1) at the given pressure, J/mol.</summary>
    public double ResidualEnthalpy(double pressure) => ResidualInternalEnergy + R * Temperature * (CompressibilityFactor(pressure) - 1);

    /// <summary>Residual entropy s_r = −A_r,T + R·ln Z at the given pressure (departure at equal T
    /// and P), J/(mol·K).</summary>
    public double ResidualEntropy(double pressure) => -DT + R * Math.Log(CompressibilityFactor(pressure));
}
