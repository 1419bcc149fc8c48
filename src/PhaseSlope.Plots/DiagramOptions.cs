using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Plots;

/// <summary>What a diagram shows beyond its kind and fluids.</summary>
/// <remarks>The members from <see cref="Reference"/> on apply to the p-h and t-s charts only
/// (<see cref="Diagrams.Diagram.Check"/> refuses them elsewhere); every quantity is in SI and molar
/// units (K, Pa, J/mol, J/(mol·K), mol/m³).</remarks>
public sealed record DiagramOptions
{
    /// <summary>Axis units (ignored for axes in reduced coordinates).</summary>
    public PlotUnits Units { get; init; } = PlotUnits.Si;

    /// <summary>Reduced coordinates T/Tc, P/Pc, ρ/ρc (with the model's critical constants), for
    /// corresponding-states comparison of several fluids.</summary>
    public bool Reduced { get; init; }

    /// <summary>A logarithmic pressure (or slope) axis on p-t and slope.</summary>
    public bool Logarithmic { get; init; }

    /// <summary>Points along each saturation curve (2 to 2000).</summary>
    public int Points { get; init; } = 80;

    /// <summary>Measured vapour pressures to overlay (p-t, lnp-invt) or to derive the latent heat
    /// from (latent); null for none.</summary>
    public IReadOnlyList<VapourPressurePoint>? Data { get; init; }

    /// <summary>The name of the measured data in legends (for example the file name).</summary>
    public string DataLabel { get; init; } = "data";

    /// <summary>The zero of h and s on p-h and t-s (default: the ideal gas at 298.15 K and 1 bar).</summary>
    public ReferenceState Reference { get; init; } = ReferenceState.IdealGas;

    /// <summary>Temperatures of the isotherms on p-h, K; null for round values in the display unit
    /// over the chart's temperature range.</summary>
    public IReadOnlyList<double>? Isotherms { get; init; }

    /// <summary>Pressures of the isobars on t-s, Pa; null for round values in the display unit over
    /// the chart's pressure range.</summary>
    public IReadOnlyList<double>? Isobars { get; init; }

    /// <summary>Molar densities of the isochores on p-h and t-s, mol/m³: null draws none, an empty
    /// list draws round values in the display unit from the saturated vapour at the chart's lowest
    /// temperature to the critical density.</summary>
    public IReadOnlyList<double>? Isochores { get; init; }

    /// <summary>The temperatures a chart spans, K: where the dome starts (the saturated states
    /// below it are not drawn) and the highest isotherm (p-h) or the temperature axis (t-s);
    /// null for the defaults (p-h: from 0.55 Tc or the lowest valid temperature to 1.2 Tc; t-s:
    /// from the lowest valid temperature to 1.35 Tc).</summary>
    public ValueRange? TemperatureRange { get; init; }

    /// <summary>The pressure axis of p-h, Pa; null for the saturation pressure at the lowest
    /// temperature up to 3 Pc.</summary>
    public ValueRange? PressureRange { get; init; }

    /// <summary>The enthalpy axis of p-h, J/mol on the chart's reference; null to fit the lines.</summary>
    public ValueRange? EnthalpyRange { get; init; }

    /// <summary>The entropy axis of t-s, J/(mol·K) on the chart's reference; null to fit the lines.</summary>
    public ValueRange? EntropyRange { get; init; }

    /// <summary>A vapour-compression cycle to draw on p-h (its states, lines and COP), computed on the
    /// chart's own property model; null for none.</summary>
    public VapourCompressionSpecification? Cycle { get; init; }
}
