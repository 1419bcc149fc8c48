namespace PhaseSlope.Core.Properties;

/// <summary>Where an equilibrium state lies, named as the trade names it.</summary>
public enum FluidRegion
{
    /// <summary>A liquid below the critical temperature at a pressure above its saturation pressure.</summary>
    CompressedLiquid,

    /// <summary>The liquid on the saturation line (quality 0).</summary>
    SaturatedLiquid,

    /// <summary>Liquid and vapour in equilibrium (0 &lt; quality &lt; 1).</summary>
    TwoPhase,

    /// <summary>The vapour on the saturation line (quality 1).</summary>
    SaturatedVapour,

    /// <summary>A vapour below the critical temperature at a pressure below its saturation pressure.</summary>
    SuperheatedVapour,

    /// <summary>Above the critical temperature and below the critical pressure.</summary>
    Gas,

    /// <summary>Above both the critical temperature and the critical pressure.</summary>
    SupercriticalFluid,

    /// <summary>The model's critical point itself.</summary>
    CriticalPoint,

    /// <summary>A liquid beyond its saturation line that has not boiled (chosen with a phase).</summary>
    MetastableLiquid,

    /// <summary>A vapour beyond its saturation line that has not condensed (chosen with a phase).</summary>
    MetastableVapour,
}

/// <summary>Names of <see cref="FluidRegion"/> members in output.</summary>
public static class FluidRegions
{
    /// <summary>The region's output name: lower case, words joined by hyphens ("two-phase",
    /// "compressed-liquid", "supercritical-fluid").</summary>
    public static string Id(this FluidRegion region) => region switch
    {
        FluidRegion.CompressedLiquid => "compressed-liquid",
        FluidRegion.SaturatedLiquid => "saturated-liquid",
        FluidRegion.TwoPhase => "two-phase",
        FluidRegion.SaturatedVapour => "saturated-vapour",
        FluidRegion.SuperheatedVapour => "superheated-vapour",
        FluidRegion.Gas => "gas",
        FluidRegion.SupercriticalFluid => "supercritical-fluid",
        FluidRegion.CriticalPoint => "critical-point",
        FluidRegion.MetastableLiquid => "metastable-liquid",
        FluidRegion.MetastableVapour => "metastable-vapour",
        _ => throw new ArgumentOutOfRangeException(nameof(region), region, "unknown region"),
    };

    /// <summary>Whether the state is on or inside the saturation dome (it has a quality).</summary>
    public static bool HasQuality(this FluidRegion region)
        => region is FluidRegion.SaturatedLiquid or FluidRegion.TwoPhase or FluidRegion.SaturatedVapour;
}
