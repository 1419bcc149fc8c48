using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Enthalpy and entropy of a mixture phase: the ideal-gas part of each component from its
/// cp° (<see cref="Fluid.IdealGasHeatCapacity"/>), the ideal entropy of mixing, and the residual
/// part of the mixture model at fixed composition.</summary>
/// <remarks>On the base convention of <see cref="PropertyModel"/> (h = s = 0 for each pure
/// component as ideal gas at T0 = 298.15 K and P0 = 1 bar, <see cref="ReferenceState.IdealGas"/>):
/// h = Σ x_i ∫_{T0}^{T} cp°_i dT + h_r, s = Σ x_i [∫_{T0}^{T} cp°_i/T dT − R ln(P/P0)] − R Σ x_i ln x_i + s_r,
/// with h_r = A_r − T·A_r,T + RT(Z − 1) and s_r = −A_r,T + R ln Z from the mixture's
/// <see cref="IResidualModel.Residual"/> (written once, in <see cref="HelmholtzDerivatives"/>).
/// For one component this is <see cref="PropertyModel"/>'s h and s on that convention.</remarks>
public sealed class MixtureProperties
{
    private const double R = Constants.GasConstant;
    private readonly IdealGasHeatCapacity?[] _heatCapacities;
    private readonly Fluid? _firstMissing;

    /// <summary>Builds the property rules for the mixture's components, in component order.</summary>
    public MixtureProperties(IReadOnlyList<Fluid> components)
    {
        ArgumentNullException.ThrowIfNull(components);
        _heatCapacities = components.Select(c => c.IdealGasHeatCapacity).ToArray();
        var missing = components.Where(c => c.IdealGasHeatCapacity is null).Select(c => c.Name).ToArray();
        _firstMissing = components.FirstOrDefault(c => c.IdealGasHeatCapacity is null);
        UnavailableReason = missing.Length == 0 ? null
            : $"enthalpy and entropy need the ideal-gas heat capacity cp° of every component; {string.Join(", ", missing)} {(missing.Length == 1 ? "does" : "do")} not give it";
    }

    /// <summary>Why h and s are null, or null when every component has cp°.</summary>
    public string? UnavailableReason { get; }

    /// <summary>Throws when h and s are unavailable.</summary>
    /// <param name="purpose">What needs them, for the message.</param>
    /// <exception cref="FluidDataException">A component has no cp° (the first such fluid's origin is named).</exception>
    public void Require(string purpose)
    {
        if (UnavailableReason is not null)
        {
            throw new FluidDataException(_firstMissing!.Origin, 0, "ideal_gas_cp", $"{purpose}: {UnavailableReason}");
        }
    }

    /// <summary>h (J/mol) and s (J/(mol·K)) of a phase of mole fractions <paramref name="moleFractions"/>
    /// at pressure <paramref name="pressure"/> from its residual Helmholtz derivatives (at the
    /// phase's T and ρ), or null when a component has no cp°.</summary>
    public (double Enthalpy, double Entropy)? Caloric(HelmholtzDerivatives residual, double pressure, ReadOnlySpan<double> moleFractions)
    {
        if (UnavailableReason is not null)
        {
            return null;
        }

        double t = residual.Temperature;
        double h = residual.ResidualEnthalpy(pressure);
        double s = residual.ResidualEntropy(pressure) - R * Math.Log(pressure / ReferenceState.IdealGasPressure);
        for (int i = 0; i < moleFractions.Length; i++)
        {
            double x = moleFractions[i];
            if (x == 0)
            {
                continue;
            }

            var cp = _heatCapacities[i]!;
            h += x * cp.EnthalpyIntegral(ReferenceState.IdealGasTemperature, t);
            s += x * (cp.EntropyIntegral(ReferenceState.IdealGasTemperature, t) - R * Math.Log(x));
        }

        return (h, s);
    }
}
