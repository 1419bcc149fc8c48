using OxyPlot;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

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
            DiagramKind.Phase => PhaseDiagram.Build(fluids[0], options),
            _ when kind.IsBinary() => throw new ArgumentException($"{kind.Id()} is a binary mixture's diagram: build it with BinaryDiagramChart", nameof(kind)),
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
            throw new InvalidInputException("log", 1, $"the {id} diagram has no log option (p-t and slope have; p-v, p-h and phase use log axes already)");
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

        CheckPropertyChart(kind, fluids[0], options);
    }

    /// <summary>Most lines of one family a user may list.</summary>
    public const int MaximumLines = 40;

    /// <summary>The options of the p-h and t-s charts: only there, and sensible for the fluid.
    /// Each failure names its field: reference, isotherms, isobars, isochores, temperature range,
    /// pressure range, enthalpy range, entropy range, cycle.</summary>
    private static void CheckPropertyChart(DiagramKind kind, PlotFluid fluid, DiagramOptions options)
    {
        string id = kind.Id();
        bool ph = kind == DiagramKind.PressureEnthalpy, ts = kind == DiagramKind.TemperatureEntropy, phase = kind == DiagramKind.Phase;
        void Only(bool given, bool allowed, string field, string where)
        {
            if (given && !allowed)
            {
                throw new InvalidInputException(field, 1, $"the {id} diagram has no {field} ({where})");
            }
        }

        Only(options.Reference != ReferenceState.IdealGas, ph || ts, "reference", "p-h and t-s draw enthalpy or entropy");
        Only(options.Isotherms is not null, ph, "isotherms", "p-h has; t-s draws isobars");
        Only(options.Isobars is not null, ts, "isobars", "t-s has; p-h draws isotherms");
        Only(options.Isochores is not null, ph || ts, "isochores", "p-h and t-s have");
        Only(options.TemperatureRange is not null, ph || ts || phase, "temperature range", "p-h, t-s and phase have");
        Only(options.PressureRange is not null, ph || phase, "pressure range", "p-h and phase have");
        Only(options.EnthalpyRange is not null, ph, "enthalpy range", "p-h has");
        Only(options.EntropyRange is not null, ts, "entropy range", "t-s has");
        Only(options.Cycle is not null, ph, "cycle", "p-h has");

        double lowest = CoexistenceSolver.LowestValidTemperature(fluid.Fluid);
        double tc = fluid.Model.CriticalTemperature;
        Lines(options.Isotherms, "isotherms", t => t < lowest ? $"the isotherm at {Chart.Number(t)} K is below the lowest valid temperature {Chart.Number(lowest)} K of {fluid.Name}" : null);
        Lines(options.Isobars, "isobars", _ => null);
        Lines(options.Isochores, "isochores", rho => rho >= fluid.Model.DensityBound(Core.Models.Composition.Pure)
            ? $"the isochore at {Chart.Number(rho)} mol/m³ is at or above the model's limit 1/b" : null, allowEmpty: true);
        foreach (var (range, field) in new[] { (options.TemperatureRange, "temperature range"), (options.PressureRange, "pressure range"),
            (options.EnthalpyRange, "enthalpy range"), (options.EntropyRange, "entropy range") })
        {
            if (range is { } r && !r.IsValid)
            {
                throw new InvalidInputException(field, r.Low, $"the {field} needs a low end below the high end, got {Chart.Number(r.Low)} to {Chart.Number(r.High)} (SI)");
            }
        }

        if (phase)
        {
            // Needs the fluid's triple point (a fluid-data error) before anything is computed; the
            // ranges must contain it, wherever the model's own limits are.
            PhaseDiagram.Require(fluid);
            PhaseDiagram.CheckRanges(fluid, options);
        }
        else if (options.TemperatureRange is { } tr)
        {
            if (tr.Low < lowest)
            {
                throw new InvalidInputException("temperature range", tr.Low, $"the temperature range starts at {Chart.Number(tr.Low)} K, below the lowest valid temperature {Chart.Number(lowest)} K of {fluid.Name}");
            }

            if (tr.Low >= tc)
            {
                throw new InvalidInputException("temperature range", tr.Low, $"the temperature range starts at {Chart.Number(tr.Low)} K, at or above the critical temperature {Chart.Number(tc)} K of {fluid.Name}: the chart needs part of the dome");
            }
        }

        if (options.PressureRange is { } pr && !(pr.Low > 0))
        {
            throw new InvalidInputException("pressure range", pr.Low, $"the pressure range must start above zero, got {Chart.Number(pr.Low)} Pa");
        }

        if (options.Cycle is { } cycle)
        {
            try
            {
                cycle.Validate();
            }
            catch (InvalidInputException ex)
            {
                throw new InvalidInputException("cycle", ex.Value, ex.Message);
            }

            if (cycle.CondensingTemperature >= tc)
            {
                throw new InvalidInputException("cycle", cycle.CondensingTemperature,
                    $"the condensing temperature {Chart.Number(cycle.CondensingTemperature)} K is at or above the critical temperature {Chart.Number(tc)} K of {fluid.Name} (a subcritical cycle needs a condenser)");
            }

            if (cycle.EvaporatingTemperature < lowest || cycle.CondensingTemperature - cycle.Subcooling < lowest)
            {
                throw new InvalidInputException("cycle", cycle.EvaporatingTemperature,
                    $"the evaporating or the condenser-outlet temperature is below the lowest valid temperature {Chart.Number(lowest)} K of {fluid.Name}");
            }
        }
    }

    /// <summary>A list of line values: not empty (unless allowed), at most <see cref="MaximumLines"/>, positive and finite, and
    /// each accepted by <paramref name="problem"/> (null for none).</summary>
    private static void Lines(IReadOnlyList<double>? values, string field, Func<double, string?> problem, bool allowEmpty = false)
    {
        if (values is null)
        {
            return;
        }

        if (values.Count == 0 && !allowEmpty)
        {
            throw new InvalidInputException(field, 0, $"no {field} given");
        }

        if (values.Count > MaximumLines)
        {
            throw new InvalidInputException(field, values.Count, $"at most {MaximumLines} {field}, got {values.Count}");
        }

        foreach (double v in values)
        {
            if (!(v > 0) || !double.IsFinite(v))
            {
                throw new InvalidInputException(field, v, $"{field} need positive finite values, got {Chart.Number(v)}");
            }

            if (problem(v) is string why)
            {
                throw new InvalidInputException(field, v, why);
            }
        }
    }
}
