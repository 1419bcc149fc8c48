using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Core.Properties;

/// <summary>An equilibrium state of a pure fluid anywhere: a single phase (<see cref="Single"/>)
/// or a liquid–vapour mixture on or inside the dome (<see cref="Liquid"/>, <see cref="Vapour"/>
/// and the <see cref="Quality"/>), as returned by <see cref="PropertyModel.Flash"/>.</summary>
/// <remarks>Molar SI units. Inside the dome the mixture's molar volume, enthalpy, entropy and
/// internal energy are the lever rule on the saturated phases: v = (1 − x)·vL + x·vV and likewise
/// for h, s and u; its Gibbs energy equals each phase's. Properties that a two-phase mixture does
/// not have as a single phase (cp, w, κT, …) are only on <see cref="Single"/>.</remarks>
public sealed record FluidState
{
    /// <summary>Where the state lies.</summary>
    public required FluidRegion Region { get; init; }

    /// <summary>Temperature, K.</summary>
    public required double Temperature { get; init; }

    /// <summary>Pressure, Pa.</summary>
    public required double Pressure { get; init; }

    /// <summary>Molar density, mol/m³ (of the mixture inside the dome).</summary>
    public required double Density { get; init; }

    /// <summary>Molar volume, m³/mol.</summary>
    public double MolarVolume => 1 / Density;

    /// <summary>Molar mass, kg/mol, or null when the fluid gives none.</summary>
    public required double? MolarMass { get; init; }

    /// <summary>Vapour fraction (mole = mass fraction for a pure fluid) on or inside the dome;
    /// null for a single phase.</summary>
    public double? Quality { get; init; }

    /// <summary>Molar enthalpy, J/mol; null without cp°.</summary>
    public double? Enthalpy { get; init; }

    /// <summary>Molar entropy, J/(mol·K); null without cp°.</summary>
    public double? Entropy { get; init; }

    /// <summary>Molar internal energy, J/mol; null without cp°.</summary>
    public double? InternalEnergy { get; init; }

    /// <summary>Molar Helmholtz energy u − Ts, J/mol; null without cp°.</summary>
    public double? HelmholtzEnergy => InternalEnergy - Temperature * Entropy;

    /// <summary>Molar Gibbs energy h − Ts, J/mol; null without cp°.</summary>
    public double? GibbsEnergy => Enthalpy - Temperature * Entropy;

    /// <summary>The single phase with all its properties: the state itself outside the dome, the
    /// saturated phase on its edge (quality 0 or 1); null inside it.</summary>
    public ThermodynamicState? Single { get; init; }

    /// <summary>The saturated liquid on or inside the dome; null outside it.</summary>
    public ThermodynamicState? Liquid { get; init; }

    /// <summary>The saturated vapour on or inside the dome; null outside it.</summary>
    public ThermodynamicState? Vapour { get; init; }

    /// <summary>The coexistence point on or inside the dome (with its solver report); null for a single phase.</summary>
    public CoexistencePoint? Coexistence { get; init; }

    /// <summary>Both saturated phases with their slopes along the line (null without cp° and for a single phase).</summary>
    public CoexistenceProperties? Saturation { get; init; }

    /// <summary>The saturation temperature at the state's pressure, K, for a single phase below the
    /// critical pressure (null above it, and below the saturation pressure at the lowest valid
    /// temperature).</summary>
    public double? SaturationTemperature { get; init; }

    /// <summary>T − Tsat(P), K, for a vapour or gas; null otherwise.</summary>
    public double? Superheat => SaturationTemperature is double ts && Region is FluidRegion.SuperheatedVapour or FluidRegion.Gas or FluidRegion.MetastableVapour
        ? Temperature - ts : null;

    /// <summary>Tsat(P) − T, K, for a liquid (negative for a metastable liquid above its boiling point); null otherwise.</summary>
    public double? Subcooling => SaturationTemperature is double ts && Region is FluidRegion.CompressedLiquid or FluidRegion.MetastableLiquid
        ? ts - Temperature : null;

    /// <summary>The value of a property that can specify a state (null where the state has none:
    /// caloric values without cp°, the quality of a single phase).</summary>
    public double? Get(StateProperty property) => property switch
    {
        StateProperty.Temperature => Temperature,
        StateProperty.Pressure => Pressure,
        StateProperty.Density => Density,
        StateProperty.Enthalpy => Enthalpy,
        StateProperty.Entropy => Entropy,
        StateProperty.InternalEnergy => InternalEnergy,
        StateProperty.Quality => Quality,
        _ => throw new ArgumentOutOfRangeException(nameof(property), property, "unknown property"),
    };
}
