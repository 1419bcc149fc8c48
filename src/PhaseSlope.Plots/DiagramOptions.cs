using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Plots;

/// <summary>What a diagram shows beyond its kind and fluids.</summary>
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
}
