using OxyPlot;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>Builds a diagram of any kind after checking that the request makes sense for it.</summary>
public static class Diagram
{
    /// <summary>Most fluids on one chart (the palette has seven colours).</summary>
    public const int MaximumFluids = 7;

    /// <summary>Builds the diagram of <paramref name="kind"/> for <paramref name="fluids"/>.</summary>
    /// <exception cref="InvalidInputException">No fluid, too many, several for a single-fluid
    /// kind, or an option the kind does not have (reduced coordinates, a log axis, data).</exception>
    public static PlotModel Build(DiagramKind kind, IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        Check(kind, fluids, options);
        return kind switch
        {
            DiagramKind.PressureTemperature => PressureTemperatureDiagram.Build(fluids, options),
            DiagramKind.LnPressureInverseTemperature => LnPressureInverseTemperatureDiagram.Build(fluids, options),
            DiagramKind.TemperatureDensity => TemperatureDensityDiagram.Build(fluids, options),
            DiagramKind.Slope => SlopeDiagram.Build(fluids, options),
            DiagramKind.Latent => LatentDiagram.Build(fluids, options),
            DiagramKind.PressureVolume => PressureVolumeDiagram.Build(fluids[0], options),
            DiagramKind.TemperatureEntropy => TemperatureEntropyDiagram.Build(fluids[0], options),
            DiagramKind.Residuals => ResidualsDiagram.Build(fluids[0], options),
            DiagramKind.Deviations => DeviationsDiagram.Build(fluids, options),
            _ => PressureEnthalpyDiagram.Build(fluids[0], options),
        };
    }

    /// <summary>Checks the request without computing anything.</summary>
    /// <exception cref="InvalidInputException">As for <see cref="Build"/>.</exception>
    public static void Check(DiagramKind kind, IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        string id = kind.Id();
        if (fluids.Count == 0)
        {
            throw new InvalidInputException("fluids", 0, "a diagram needs at least one fluid");
        }

        if (fluids.Count > MaximumFluids)
        {
            throw new InvalidInputException("fluids", fluids.Count, $"a diagram shows at most {MaximumFluids} fluids, got {fluids.Count}");
        }

        if (fluids.Count > 1 && !kind.AllowsSeveralFluids())
        {
            throw new InvalidInputException("fluids", fluids.Count, $"the {id} diagram shows one fluid, got {fluids.Count}");
        }

        if (options.Reduced && !kind.AllowsReduced())
        {
            throw new InvalidInputException("reduced", 1, $"the {id} diagram has no reduced form (p-t, lnp-invt, t-rho, slope and p-v have)");
        }

        if (options.Logarithmic && !kind.AllowsLogScale())
        {
            throw new InvalidInputException("log", 1, $"the {id} diagram has no log option (p-t and slope have; p-v and p-h use log axes already)");
        }

        if (options.Data is not null && !kind.AllowsData())
        {
            throw new InvalidInputException("data", 1, $"the {id} diagram takes no data (p-t, lnp-invt, latent, residuals and deviations do)");
        }

        if (options.Data is null && kind is DiagramKind.Residuals or DiagramKind.Deviations)
        {
            throw new InvalidInputException("data", 0, $"the {id} diagram needs measured vapour pressures (--data)");
        }

        if (options.Data is not null && kind == DiagramKind.Latent && fluids.Count > 1)
        {
            throw new InvalidInputException("data", fluids.Count, "the latent diagram takes data for one fluid only");
        }

        if (options.Points < 2 || options.Points > 2000)
        {
            throw new InvalidInputException("points", options.Points, $"points along a curve must be 2 to 2000, got {options.Points}");
        }
    }
}
