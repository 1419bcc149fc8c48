using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Fluids;

/// <summary>An immutable pure fluid: identity, critical point, acentric factor, molar mass and
/// the reference temperatures, each constant with its source.</summary>
/// <remarks>All values are SI: temperatures in K, pressures in Pa, molar mass in kg/mol,
/// critical density in mol/m³.</remarks>
public sealed record Fluid
{
    /// <summary>Canonical name, lower case (for example "propane").</summary>
    public required string Name { get; init; }

    /// <summary>Other names the fluid is found by (for example "R-290").</summary>
    public IReadOnlyList<string> Synonyms { get; init; } = [];

    /// <summary>Chemical formula, or null.</summary>
    public string? Formula { get; init; }

    /// <summary>CAS registry number, or null.</summary>
    public string? CasNumber { get; init; }

    /// <summary>Family (for example "alkane", "refrigerant", "inorganic"), or null.</summary>
    public string? Family { get; init; }

    /// <summary>Molar mass in kg/mol, or null when not given (then nothing on a mass basis is
    /// available: mass densities, per-kilogram units, the speed of sound; see
    /// <see cref="RequireMolarMass"/>).</summary>
    public SourcedValue? MolarMass { get; init; }

    /// <summary>Critical temperature in K.</summary>
    public required SourcedValue CriticalTemperature { get; init; }

    /// <summary>Critical pressure in Pa.</summary>
    public required SourcedValue CriticalPressure { get; init; }

    /// <summary>Acentric factor (dimensionless).</summary>
    public required SourcedValue AcentricFactor { get; init; }

    /// <summary>Critical molar density in mol/m³, or null when not given.</summary>
    public SourcedValue? CriticalDensity { get; init; }

    /// <summary>Normal boiling point (saturation at 101325 Pa) in K, or null (for example carbon
    /// dioxide, whose triple-point pressure is above one atmosphere).</summary>
    public SourcedValue? NormalBoilingPoint { get; init; }

    /// <summary>Triple-point temperature in K, or null when not known.</summary>
    public SourcedValue? TriplePointTemperature { get; init; }

    /// <summary>Triple-point pressure in Pa, or null when not known: below it no liquid exists.</summary>
    public SourcedValue? TriplePointPressure { get; init; }

    /// <summary>Molar enthalpy of fusion at the triple point, J/mol, or null.</summary>
    public SourcedValue? EnthalpyOfFusion { get; init; }

    /// <summary>The solid's molar density at the triple point, mol/m³, or null.</summary>
    public SourcedValue? SolidDensity { get; init; }

    /// <summary>The liquid's molar density at the triple point, mol/m³, or null (given with
    /// <see cref="SolidDensity"/> to form <see cref="FusionVolumeChange"/>).</summary>
    public SourcedValue? TriplePointLiquidDensity { get; init; }

    /// <summary>Δv_fus = v_liquid − v_solid at the triple point, m³/mol (negative for water), or null:
    /// given directly or formed from <see cref="TriplePointLiquidDensity"/> and <see cref="SolidDensity"/>.</summary>
    public SourcedValue? FusionVolumeChange { get; init; }

    /// <summary>The solid's molar isobaric heat capacity near the triple point, J/(mol·K), or null
    /// (with the ideal-gas cp° it gives the temperature dependence of the sublimation enthalpy).</summary>
    public SourcedValue? SolidHeatCapacity { get; init; }

    /// <summary>A published melting-pressure equation, or null.</summary>
    public SolidLineEquation? MeltingPressureEquation { get; init; }

    /// <summary>A published sublimation-pressure equation, or null.</summary>
    public SolidLineEquation? SublimationPressureEquation { get; init; }

    /// <summary>Ideal-gas isobaric heat capacity cp°(T), or null when the file gives none (then
    /// only residual and coexistence properties are available, not absolute caloric ones).</summary>
    public IdealGasHeatCapacity? IdealGasHeatCapacity { get; init; }

    /// <summary>Fluid-specific alpha-function parameters from the literature (for example
    /// Twu or Mathias–Copeman constants fitted for one cubic model); empty when none are given.</summary>
    public IReadOnlyList<AlphaParameterSet> AlphaParameters { get; init; } = [];

    /// <summary>The fluid's own volume translations c (m³/mol, v = v_cubic − c) per cubic model, fitted to
    /// its liquid densities (for example by <c>phaseslope tune</c>); empty when none are given.</summary>
    public IReadOnlyList<FluidVolumeShift> VolumeShifts { get; init; } = [];

    /// <summary>The fluid's published vapour-pressure equation, or null when the file gives none.</summary>
    public PublishedVapourPressure? VapourPressureEquation { get; init; }

    /// <summary>The alpha function the model uses when none is chosen (<see cref="AlphaForm.Default"/>):
    /// a tuned fluid names its tuned form here, so that its parameters are used wherever the fluid
    /// is given; <see cref="AlphaForm.Default"/> (the model's own correlation in ω) when not set.</summary>
    public AlphaForm PreferredAlpha { get; init; } = AlphaForm.Default;

    /// <summary>How the fluid's tuned values were obtained (data file and checksum, date, method,
    /// fit statistics), or null for a fluid that was not tuned.</summary>
    public string? Provenance { get; init; }

    /// <summary>Free-text remarks from the fluid file, or null.</summary>
    public string? Remarks { get; init; }

    /// <summary>The sourced hazard classification (<c>hazard_class</c>), or null when the file
    /// gives none.</summary>
    public HazardClass? Hazard { get; init; }

    /// <summary>Where the record was read from: a catalog resource name, a file path, or
    /// <see cref="InlineFluid.Origin"/> for a fluid given on the command line.</summary>
    public string Origin { get; init; } = "";

    /// <summary>The molar mass in kg/mol, for a use that cannot do without it.</summary>
    /// <param name="purpose">What needs it, for the message (e.g. "a density in kg/m3").</param>
    /// <exception cref="FluidDataException">The fluid gives no molar mass.</exception>
    public double RequireMolarMass(string purpose)
        => MolarMass?.Value ?? throw new FluidDataException(Origin, 0, "molar_mass",
            $"fluid '{Name}' gives no molar mass, which {purpose} needs");
}

/// <summary>A fluid's own volume translation for one cubic model.</summary>
/// <param name="Model">The cubic model (Peng–Robinson or Soave–Redlich–Kwong form).</param>
/// <param name="Shift">c in m³/mol with its source and standard uncertainty.</param>
public sealed record FluidVolumeShift(CubicModelKind Model, SourcedValue Shift);
