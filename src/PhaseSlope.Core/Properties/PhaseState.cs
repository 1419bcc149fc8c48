using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>A single-phase state of a model at (T, ρ): pressure, compressibility, fugacity
/// coefficient and the residual caloric properties, all from the one residual Helmholtz function.</summary>
/// <remarks>
/// Residual properties are departures from the ideal gas at the same T and P:
/// Z = 1 + ρ·A_r,ρ/(RT); ln φ = A_r/(RT) + Z − 1 − ln Z; u_r = A_r − T·A_r,T;
/// h_r = u_r + RT(Z − 1); s_r = −A_r,T + R·ln Z; g_r = h_r − T·s_r = RT·ln φ, each written once
/// in <see cref="HelmholtzDerivatives"/>.
/// Units: K, mol/m³, Pa, m³/mol, J/mol, J/(mol·K).
/// </remarks>
public sealed record PhaseState
{
    private const double R = Constants.GasConstant;

    /// <summary>Temperature in K.</summary>
    public required double Temperature { get; init; }

    /// <summary>Molar density in mol/m³.</summary>
    public required double Density { get; init; }

    /// <summary>Pressure in Pa.</summary>
    public required double Pressure { get; init; }

    /// <summary>Molar volume 1/ρ in m³/mol.</summary>
    public double MolarVolume => 1 / Density;

    /// <summary>Compressibility factor Z = P/(ρRT).</summary>
    public required double CompressibilityFactor { get; init; }

    /// <summary>Natural logarithm of the fugacity coefficient.</summary>
    public required double LnFugacityCoefficient { get; init; }

    /// <summary>Residual molar internal energy u − u_ig in J/mol.</summary>
    public required double ResidualInternalEnergy { get; init; }

    /// <summary>Residual molar enthalpy h − h_ig in J/mol.</summary>
    public required double ResidualEnthalpy { get; init; }

    /// <summary>Residual molar entropy s − s_ig(T, P) in J/(mol·K).</summary>
    public required double ResidualEntropy { get; init; }

    /// <summary>Residual molar Gibbs energy g − g_ig(T, P) = RT·ln φ in J/mol.</summary>
    public double ResidualGibbsEnergy => R * Temperature * LnFugacityCoefficient;

    /// <summary>(∂P/∂ρ)_T in Pa·m³/mol; positive for a mechanically stable phase.</summary>
    public required double PressureDensityDerivative { get; init; }

    /// <summary>(∂P/∂T)_ρ in Pa/K.</summary>
    public required double PressureTemperatureDerivative { get; init; }

    /// <summary>The model's residual Helmholtz derivatives at this state, from which every
    /// member above is computed (kept so that nothing is evaluated twice).</summary>
    public required HelmholtzDerivatives Helmholtz { get; init; }

    /// <summary>Evaluates the state of a pure-fluid model at (T, ρ), the pressure following from the model.</summary>
    public static PhaseState Evaluate(IResidualModel model, double temperature, double density)
    {
        ArgumentNullException.ThrowIfNull(model);
        var d = model.Residual(temperature, density, Composition.Pure);
        return From(d, d.Pressure);
    }

    /// <summary>The state from derivatives already evaluated at (T, ρ), where ρ is a root of
    /// P(T, ρ) = <paramref name="pressure"/>.</summary>
    /// <remarks>For a dense liquid at low reduced temperature, P recomputed from ρ loses digits
    /// (it is a small difference of large terms), while P is known exactly. Using the given P in
    /// Z and in every P-dependent residual keeps ln φ and h_r at full precision.</remarks>
    public static PhaseState From(in HelmholtzDerivatives d, double pressure) => new()
    {
        Temperature = d.Temperature,
        Density = d.Density,
        Pressure = pressure,
        CompressibilityFactor = d.CompressibilityFactor(pressure),
        LnFugacityCoefficient = d.LnFugacityCoefficient(pressure),
        ResidualInternalEnergy = d.ResidualInternalEnergy,
        ResidualEnthalpy = d.ResidualEnthalpy(pressure),
        ResidualEntropy = d.ResidualEntropy(pressure),
        PressureDensityDerivative = d.PressureDRho,
        PressureTemperatureDerivative = d.PressureDT,
        Helmholtz = d,
    };
}
