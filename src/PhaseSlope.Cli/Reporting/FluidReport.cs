using System.Globalization;
using OxyPlot;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Solids;
using PhaseSlope.Core.Uncertainty;
using PhaseSlope.Plots;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Cli.Reporting;

/// <summary>The report of a pure fluid: every number comes from the code path of the command
/// that prints it (<c>fluids show</c>, <c>curve</c>, <c>fit</c>, <c>latent</c>, <c>audit</c>,
/// <c>plot</c>), laid out as one HTML page by <see cref="HtmlReport"/>.</summary>
internal static class FluidReport
{
    /// <summary>Figure size in pixels (the SVG scales to the page).</summary>
    private const int FigureWidth = 900, FigureHeight = 600;

    /// <summary>Builds the page (<paramref name="io"/> for progress messages only).</summary>
    public static string Build(ReportRequest request, CliIo io)
    {
        var fluid = request.Fluid ?? throw new ArgumentException("a pure-fluid report needs a fluid", nameof(request));
        var model = request.Model.For(fluid);
        var plotFluid = new PlotFluid(fluid, model) { Alpha = request.Model.Alpha };
        var context = CoexistenceContext.Create(fluid, model, ReferenceState.IdealGas);
        var report = new HtmlReport($"{plotFluid.Name}: coexistence report");
        report.Lead($"Made by: {request.Command}");
        report.Lead($"Model: {ModelText.Describe(model)}. Units: {(request.Units == UnitSystem.Si ? "SI (molar)" : "engineering (mass-based)")}. "
            + "Uncertainties are standard uncertainties (one standard deviation). A source marked 'from memory' was recalled, not read from the publication.");

        Constants(report, fluid, request.Units);
        ModelSection(report, fluid, model, context, request);
        var rows = Saturation(report, fluid, context, plotFluid, request, io);
        LatentAndSlope(report, rows, plotFluid, request);
        VapourLineSection(report, context, request.Units);
        SolidPhases(report, fluid, model, plotFluid, request.Units);
        Figures(report, fluid, plotFluid, request);
        if (request.Data is { } data)
        {
            MeasuredData(report, fluid, context.Solver, plotFluid, data, request);
        }

        return report.Render();
    }

    private static void Constants(HtmlReport report, Fluid fluid, UnitSystem units)
    {
        var section = report.Section("constants", "Fluid and constants");
        section.Facts(FluidWriter.IdentityLines(fluid));
        var table = FluidWriter.ConstantsTable(fluid, units);
        section.Table(table, "Constants with their standard uncertainties and sources (as 'fluids show' prints them)");
        if (table.Rows.Any(r => r[^1].Contains(HtmlReport.FromMemory, StringComparison.OrdinalIgnoreCase)))
        {
            section.Note("Values whose source says 'from memory' were recalled rather than read from the publication named; check them against it before relying on them.");
        }

        var inputs = new TextTable(["input", "value", "standard uncertainty", "basis"], [false, true, true, false]);
        foreach (var input in FamilyUncertainty.CriticalConstants(fluid))
        {
            inputs.Add(input.Name, NumberText.Table(input.Value), NumberText.Uncertainty(input.StandardUncertainty), input.UncertaintySource);
        }

        section.Table(inputs, "The uncertainties the tool propagates (--uncertainty): stated in the file where given, else the family default (SI units)");
        if (IsInvented(fluid))
        {
            section.Caution("This fluid is invented for the examples; its numbers describe no real substance.");
        }
        else
        {
            section.Caution(FluidWriter.HazardCaution(fluid));
        }
    }

    private static bool IsInvented(Fluid fluid)
        => (fluid.Remarks ?? "").Contains("invented", StringComparison.OrdinalIgnoreCase) || (fluid.Family ?? "").Contains("fictional", StringComparison.OrdinalIgnoreCase);

    private static void ModelSection(HtmlReport report, Fluid fluid, CubicModel model, CoexistenceContext context, ReportRequest request)
    {
        var section = report.Section("model", "Model and its choices");
        section.Facts([
            $"equation of state: {model.Identity.Describe(withAlpha: true)}",
            $"--eos {request.Model.Kind.Id()}, --alpha {AlphaText(request.Model.Alpha)}, --volume-shift {request.Model.VolumeShiftText}",
            $"h and s: {context.Reference.Description}" + (context.Engine is null ? " (not shown: the fluid has no ideal-gas heat capacity cp°)" : ""),
        ]);
        section.Subheading("Model data of the fluid");
        section.Facts(FluidWriter.ModelDataLines(fluid, request.Units));
        KnownLimits(section, fluid, model, context.Solver);
        if (fluid.Provenance is not null)
        {
            Tuning(section, fluid);
        }
    }

    private static string AlphaText(AlphaForm form) => form switch
    {
        AlphaForm.Twu => "twu",
        AlphaForm.MathiasCopeman => "mathias-copeman",
        _ => "default",
    };

    /// <summary>The model's measured error for this fluid: its normal boiling point (as
    /// <c>fluids check</c> computes it) and its vapour pressure against the fluid's published
    /// equation, where the file gives one.</summary>
    private static void KnownLimits(ReportSection section, Fluid fluid, CubicModel model, CoexistenceSolver solver)
    {
        section.Subheading("How far the model can be trusted for this fluid");
        var check = FluidCheck.Run(fluid, model);
        var facts = new List<string>();
        if (check.PredictedBoilingPoint is double tb && fluid.NormalBoilingPoint is { } given)
        {
            facts.Add($"normal boiling point: model {NumberText.Table(tb)} K, file {NumberText.Table(given.Value)} K ({given.Source}): "
                + $"{NumberText.Table(100 * check.BoilingPointDeviation!.Value)} % ({(check.BoilingPointConsistent ? "within" : "outside")} the {NumberText.Table(100 * FluidCheck.BoilingPointTolerance)} % consistency check of 'fluids check')");
        }
        else if (fluid.NormalBoilingPoint is null)
        {
            facts.Add("normal boiling point: not given in the file, so the model's cannot be checked against it");
        }
        else
        {
            facts.Add("normal boiling point: 1 atm is outside the model's coexistence range for this fluid");
        }

        facts.Add(check.SolvesToCriticalPoint ? "coexistence converges from the lowest valid temperature to within 1e-8 of Tc" : $"coexistence: {check.Failure}");
        section.Facts(facts);
        if (fluid.VapourPressureEquation is { } equation)
        {
            double tc = solver.CriticalTemperature;
            var table = new TextTable(["T [K]", "T/Tc", "P model [kPa]", "P equation [kPa]", "deviation [%]"], [true, true, true, true, true]);
            var temperatures = new[] { solver.MinimumTemperature, fluid.NormalBoilingPoint?.Value, 0.7 * tc, 0.9 * tc, 0.98 * tc }
                .OfType<double>().Where(t => t >= solver.MinimumTemperature && t < tc).Distinct().Order();
            foreach (double t in temperatures)
            {
                if (!solver.TryAtTemperature(t, out var point))
                {
                    continue;
                }

                double published = equation.Pressure(t);
                table.Add(NumberText.Table(t), NumberText.Table(t / equation.Form.CriticalTemperature), NumberText.Table(point!.Pressure / 1e3), NumberText.Table(published / 1e3),
                    NumberText.Table(100 * (point.Pressure - published) / published));
            }

            section.Table(table, $"Model vapour pressure against the fluid's published equation ({equation.Source})");
        }
        else
        {
            section.Note("The fluid file gives no published vapour-pressure equation, so the model's vapour pressure is checked here only at the normal boiling point.");
        }
    }

    private static void Tuning(ReportSection section, Fluid fluid)
    {
        section.Subheading("Tuning");
        section.Paragraph($"provenance: {fluid.Provenance}");
        foreach (var set in fluid.AlphaParameters.Where(s => s.Covariance is not null))
        {
            var names = CubicModel.AlphaParameterNames(set.Form);
            var table = new TextTable(["parameter", "value", "standard error"], [false, true, true]);
            for (int i = 0; i < set.Values.Count; i++)
            {
                double variance = set.Covariance![i, i];
                table.Add(names[i], NumberText.RoundTrip(set.Values[i]), variance >= 0 ? NumberText.Uncertainty(Math.Sqrt(variance)) : "-");
            }

            section.Table(table, $"{CubicModel.AlphaName(set.Form)} alpha ({set.Model.Title()}): {set.Source}");
        }

        section.Caution(TuneWriter.Caution);
    }

    private static IEnumerable<string> Lines(System.Text.StringBuilder text)
        => text.ToString().Split('\n', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);

    private static IReadOnlyList<CoexistenceRow> Saturation(HtmlReport report, Fluid fluid, CoexistenceContext context, PlotFluid plotFluid, ReportRequest request, CliIo io)
    {
        var solver = context.Solver;
        double tc = solver.CriticalTemperature;
        string unit = UnitFormatter.Label(DisplayQuantity.Temperature, request.Units);
        var scale = Core.Units.UnitTable.Get(unit);
        double low = scale.FromSi(solver.MinimumTemperature), high = scale.FromSi(tc);
        double step = request.Step ?? RoundValues.Step((high - low) / ReportOptions.DefaultRows);
        if (!(step < high - low))
        {
            throw new UsageException($"--step: {NumberText.Table(step)} K is not below the range from {NumberText.Table(solver.MinimumTemperature)} K to Tc = {NumberText.Table(tc)} K");
        }

        // The first row is the first multiple of the step (in the table's unit) at or above the
        // lowest valid temperature, so the stepped values are round in the unit shown.
        double first = Math.Ceiling(low / step * (1 - 1e-12)) * step;
        double start = Math.Max(scale.ToSi(first), solver.MinimumTemperature);
        var temperatures = CurveCommand.Stepped(start, tc, step);
        var points = CoexistenceCurve.Through(solver, temperatures);
        // Standard uncertainties from Tc, Pc and omega (and a tuned alpha's covariance), as
        // 'curve --uncertainty linear' propagates them.
        var choice = new UncertaintyChoice(PropagationMethod.Linear, UncertaintyOptions.DefaultSamples, UncertaintyOptions.DefaultSeed);
        var parameters = UncertaintyRun.Parameters(request.Model, fluid);
        var values = UncertaintyRun.AtTemperatures(io, choice, parameters, points);
        var summary = UncertaintyRun.Summary(choice, parameters);
        var rows = points.Select((p, i) => context.Row(p) with { Uncertainty = values[i] }).ToArray();

        var section = report.Section("saturation", "Saturation table");
        section.Paragraph($"{rows.Length} states from {NumberText.Table(scale.FromSi(temperatures[0]))} {unit} in steps of {NumberText.Table(step)} K; the last one the critical point of the model. "
            + CoexistenceWriter.ReferenceLine(rows, context.Reference));
        var inputs = new System.Text.StringBuilder();
        UncertaintyText.DescribeInputs(inputs, summary);
        section.Facts(Lines(inputs));
        section.Table(CoexistenceWriter.CurveTableOf(rows, fluid, request.Units, summary), $"Saturation table of {plotFluid.Name}, {ModelText.Describe(solver.Model)} (as 'curve --uncertainty linear' prints it)");
        var reasons = new System.Text.StringBuilder();
        UncertaintyText.DescribeReasons(reasons, rows.Select(r => r.Uncertainty));
        section.Facts(Lines(reasons));
        section.Caution(CoexistenceWriter.Caution);
        return rows;
    }

    private static void LatentAndSlope(HtmlReport report, IReadOnlyList<CoexistenceRow> rows, PlotFluid plotFluid, ReportRequest request)
    {
        var section = report.Section("latent", "Latent heat and Clapeyron slope");
        section.Paragraph("The enthalpy of vaporization (dH_vap) and the slope dPsat/dT of each state are in the saturation table; they are tied by the Clapeyron equation, "
            + "dPsat/dT = dH_vap / (T dv), which the solver's states satisfy exactly (both come from the same Helmholtz function).");
        var mid = rows[rows.Count / 2].Point;
        double m = plotFluid.Fluid.MolarMass?.Value ?? double.NaN;
        section.Facts([
            $"at {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Temperature, mid.Temperature, request.Units))} {UnitFormatter.Label(DisplayQuantity.Temperature, request.Units)}: "
                + $"dH_vap = {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.MolarEnergy, mid.EnthalpyOfVaporization, request.Units, m))} {UnitFormatter.Label(DisplayQuantity.MolarEnergy, request.Units)}, "
                + $"dPsat/dT = {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Slope, mid.Slope, request.Units, m))} {UnitFormatter.Label(DisplayQuantity.Slope, request.Units)}",
        ]);
        var options = new DiagramOptions { Units = PlotUnitsOf(request.Units) };
        AddFigure(section, () => Diagram.Build(DiagramKind.Latent, [plotFluid], options), "Enthalpy of vaporization along the saturation line (model)");
        AddFigure(section, () => Diagram.Build(DiagramKind.Slope, [plotFluid], options), "Clapeyron slope dPsat/dT along the saturation line (model)");
    }

    private static void VapourLineSection(HtmlReport report, CoexistenceContext context, UnitSystem units)
    {
        var section = report.Section("vapour-line", "Vapour-line class");
        if (context.Engine is null)
        {
            section.Note("Not determined: the class depends on the ideal-gas heat capacity cp°, which the fluid file does not give.");
            return;
        }

        var line = VapourLine.Classify(context.Engine);
        section.Paragraph(FluidWriter.VapourLineText(line, units, context.Solver.Model.Identity.Title));
        section.Paragraph(line.Class switch
        {
            VapourLineClass.Wet => "Wet: the saturated-vapour entropy falls as the temperature rises, so an isentropic expansion from saturated vapour enters the two-phase region.",
            VapourLineClass.Dry => "Dry: the saturated-vapour entropy rises with temperature, so an isentropic expansion from saturated vapour ends superheated.",
            _ => $"Isentropic: the saturated-vapour entropy is nearly constant (|(Tc/R) ds/dT| below {NumberText.Table(VapourLine.IsentropicBand)} at T/Tc = {NumberText.Table(VapourLine.ReadingReducedTemperature)}).",
        });
    }

    /// <summary>A model vapour pressure at the triple point further than this from the sourced
    /// triple-point pressure gets a caution: the same 1 % that <c>fluids check</c> accepts at the
    /// normal boiling point (<see cref="FluidCheck.BoilingPointTolerance"/>), beyond which the
    /// model's low end is worse than a cubic equation does in the range its ω was set in.</summary>
    internal const double TriplePointCautionShare = FluidCheck.BoilingPointTolerance;

    /// <summary>The solid phases as <c>fluids show</c>, <c>curve --line sublimation|melting</c>
    /// and <c>plot --diagram phase</c> give them: the triple point and fusion data with their
    /// sources, the published solid-line equations, the model's vapour pressure at the triple
    /// point against the sourced one, both solid lines over their default ranges and the phase
    /// diagram. What the fluid file lacks is named (by its key) instead of a table.</summary>
    private static void SolidPhases(HtmlReport report, Fluid fluid, CubicModel model, PlotFluid plotFluid, UnitSystem units)
    {
        var section = report.Section("solid", "Solid phases: triple point, sublimation and melting");
        string[] missing = [.. new[] { ("triple_point_temperature", fluid.TriplePointTemperature), ("triple_point_pressure", fluid.TriplePointPressure) }
            .Where(k => k.Item2 is null).Select(k => k.Item1)];
        if (missing.Length > 0)
        {
            section.Note($"Not given: the fluid file of {fluid.Name} has no {string.Join(" and no ", missing)}, from which the sublimation and melting lines start "
                + "(curve --line sublimation|melting and plot --diagram phase refuse it for the same reason), so there is no triple-point check, no solid line and no phase diagram here.");
            return;
        }

        var constants = FluidWriter.SolidConstantsTable(fluid, units);
        section.Table(constants, "Triple point and fusion data with their standard uncertainties and sources (as 'fluids show' prints them)");
        if (constants.Rows.Any(r => r[^1].Contains(HtmlReport.FromMemory, StringComparison.OrdinalIgnoreCase)))
        {
            section.Note("Values whose source says 'from memory' were recalled rather than read from the publication named; check them against it before relying on them.");
        }

        var equations = FluidWriter.SolidEquationLines(fluid).ToArray();
        if (equations.Length > 0)
        {
            section.Facts(equations);
        }

        var lines = new SolidPhaseLines(fluid, new CoexistenceSolver(model, fluid));
        section.Subheading("Triple-point check of the model");
        var (check, reason) = FluidWriter.TriplePointCheckOf(fluid, lines);
        string pressureUnit = UnitFormatter.Label(DisplayQuantity.Pressure, units);
        string Pressure(double pa) => NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Pressure, pa, units));
        if (check is null)
        {
            section.Note($"Not available: {reason}.");
        }
        else
        {
            string deviation = NumberText.Table(100 * check.RelativeDeviation);
            section.Paragraph($"{ModelText.Describe(model)}: vapour pressure at the triple-point temperature {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Temperature, check.Temperature, units))} "
                + $"{UnitFormatter.Label(DisplayQuantity.Temperature, units)} is {Pressure(check.ModelPressure)} {pressureUnit}; the sourced triple-point pressure is {Pressure(check.SourcedPressure)} {pressureUnit} "
                + $"({fluid.TriplePointPressure!.Source}): {deviation} %.");
            if (Math.Abs(check.RelativeDeviation) > TriplePointCautionShare)
            {
                section.Caution($"The model's vapour pressure at the low end of its liquid range is off by about {deviation} % here (more than the {NumberText.Table(100 * TriplePointCautionShare)} % "
                    + "'fluids check' accepts at the normal boiling point): the first rows of the saturation table and the low end of the figures carry that error. "
                    + "Near the triple point use the fluid's published vapour-pressure equation or measured data instead.");
            }
        }

        bool sublimationGiven = false;
        foreach (var kind in new[] { PhaseLineKind.Sublimation, PhaseLineKind.Melting })
        {
            string name = kind == PhaseLineKind.Sublimation ? "sublimation" : "melting";
            section.Subheading(kind == PhaseLineKind.Sublimation ? "Sublimation line" : "Melting line");
            PhaseLineTable table;
            try
            {
                table = CurveCommand.SolidLine(fluid, model, kind, null, null, CoexistenceCurve.DefaultPoints, null, null);
            }
            catch (FluidDataException ex)
            {
                section.Note(kind == PhaseLineKind.Melting && sublimationGiven
                    ? $"Sublimation only, no melting line: {ex.Message}."
                    : $"No {name} line: {ex.Message}.");
                continue;
            }

            sublimationGiven |= kind == PhaseLineKind.Sublimation;
            section.Facts(PhaseLineWriter.HeaderLines(table, units));
            section.Table(PhaseLineWriter.Rows(table, units), $"The {name} line of {fluid.Name} over its default range (as 'curve {fluid.Name} --line {name}' prints it)");
            section.Facts(PhaseLineWriter.FooterLines(table));
        }

        section.Caution(CoexistenceWriter.Caution);
        var options = new DiagramOptions { Units = PlotUnitsOf(units) };
        AddFigure(section, () => Diagram.Build(DiagramKind.Phase, [plotFluid], options), "Phase diagram p-T: the solid lines the fluid file allows, the vaporization line, the triple and critical points (as 'plot --diagram phase' draws it)");
    }

    private static void Figures(HtmlReport report, Fluid fluid, PlotFluid plotFluid, ReportRequest request)
    {
        var section = report.Section("figures", "Phase diagrams");
        var options = new DiagramOptions { Units = PlotUnitsOf(request.Units) };
        AddFigure(section, () => Diagram.Build(DiagramKind.PressureTemperature, [plotFluid], options), "Vapour pressure p-T (model)");
        AddFigure(section, () => Diagram.Build(DiagramKind.TemperatureDensity, [plotFluid], options), "Coexistence dome T-rho (model)");
        if (fluid.IdealGasHeatCapacity is null)
        {
            section.Note("The p-h diagram needs the ideal-gas heat capacity cp°, which the fluid file does not give.");
        }
        else
        {
            AddFigure(section, () => Diagram.Build(DiagramKind.PressureEnthalpy, [plotFluid], options), "Pressure-enthalpy diagram p-h with isotherms (model)");
        }
    }

    private static void MeasuredData(HtmlReport report, Fluid fluid, CoexistenceSolver solver, PlotFluid plotFluid, IReadOnlyList<VapourPressurePoint> data, ReportRequest request)
    {
        var section = report.Section("data", "Measured vapour pressures");
        string path = request.DataPath!;
        section.Paragraph($"{data.Count} points from {Path.GetFileName(path)}, {NumberText.Table(data.Min(p => p.Temperature))} K to {NumberText.Table(data.Max(p => p.Temperature))} K.");
        var comments = request.DataDescription;
        if (comments.Count > 0)
        {
            section.Subheading("The data file's own description");
            section.Preformatted(string.Join('\n', comments));
        }

        if (comments.Any(c => c.Contains("invented", StringComparison.OrdinalIgnoreCase)))
        {
            section.Caution("These data are labelled invented by their file: they are not measurements of any real substance.");
        }

        var options = new DiagramOptions { Units = PlotUnitsOf(request.Units), Data = data, DataLabel = Path.GetFileName(path) };
        AddFigure(section, () => Diagram.Build(DiagramKind.PressureTemperature, [plotFluid], options), "The data against the model's vapour pressure");

        // The fit, as 'fit DATA --fluid FLUID' (form auto) prints it, with the coefficients also in
        // the convention audit reads (ln, Pa, K) where the chosen form has printable coefficients.
        var fits = CorrelationOptions.Fit(CorrelationOptions.AutoForms(fluid), auto: true, data);
        var fit = fits[0];
        var convention = new PublishedConvention(LogBase.E, PublishedPressureUnit.Pa, PublishedTemperatureUnit.Kelvin);
        bool printable = PublishedCorrelation.FormIds.Contains(fit.Form.Id) && fit.Form.ParameterCount > 0;
        var fitText = new StringWriter(CultureInfo.InvariantCulture);
        FitWriter.Fit(fitText, fit, fits, OutputFormat.Table, printable ? convention : null);
        var fitSection = report.Section("fit", "Fitted vapour-pressure correlation");
        fitSection.Paragraph($"Every candidate form fitted by weighted least squares in ln P; the one with the lowest AICc is reported (as 'fit {Path.GetFileName(path)} --fluid {fluid.Name}').");
        fitSection.Preformatted(fitText.ToString());
        AddFigure(fitSection, () => Diagram.Build(DiagramKind.Residuals, [plotFluid], options), "Residuals of the best forms against the data");

        // The latent heat from the data, as 'latent DATA --fluid FLUID' prints it: Clapeyron with
        // the model's volume change, and its linear band.
        var latentRequest = new LatentRequest(CorrelationOptions.AutoForms(fluid), true, data, VolumeChangeModel.EquationOfState, solver,
            fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value, new LatentTemperatures(null, null, null, LatentOptions.DefaultPoints), OutputFormat.Table, fluid, request.Model);
        var estimator = new LatentHeatEstimator(fit, VolumeChangeModel.EquationOfState, solver, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value);
        var (band, inputs) = LatentCommand.Band(latentRequest, estimator);
        var points = band.Linear(latentRequest.Temperatures.Resolve(fit.MinimumTemperature, fit.MaximumTemperature));
        var latentSection = report.Section("latent-data", "Latent heat from the data");
        latentSection.Preformatted(FitWriter.Latent(fit, VolumeChangeModel.EquationOfState, points, fits, OutputFormat.Table, solver.Model.Identity, new LatentBandText(null, inputs, band)));
        AddFigure(latentSection, () => Diagram.Build(DiagramKind.Latent, [plotFluid], options), "Latent heat: the model's line and the Clapeyron estimate from the data with its ±u band");

        var auditSection = report.Section("audit", "Audit of the fitted correlation");
        if (!printable)
        {
            auditSection.Note($"The {fit.Form.Id} form has no coefficients in a published convention, so it cannot be audited.");
            return;
        }

        var audit = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = PublishedCorrelation.FromSi(fit.Form, fit.Parameters, convention),
            LogBase = LogBase.E,
            PressureUnit = PublishedPressureUnit.Pa,
            TemperatureUnit = PublishedTemperatureUnit.Kelvin,
            Data = data,
            Fluid = fluid,
            Solver = solver,
        });
        auditSection.Paragraph("The fitted coefficients read back as a published correlation (ln, Pa, K) and checked against the data, the fluid and the model, as 'audit' does.");
        auditSection.Preformatted(AuditCommand.Table(audit));
        if (audit.Failed)
        {
            auditSection.Caution("At least one audit check failed: do not use this correlation as it stands.");
        }
    }

    private static PlotUnits PlotUnitsOf(UnitSystem units) => units == UnitSystem.Engineering ? PlotUnits.Engineering : PlotUnits.Si;

    /// <summary>Draws a figure into the section; a figure the model cannot draw for this fluid
    /// (out of its range, not converged) is replaced by a note saying why, never by a guess.</summary>
    private static void AddFigure(ReportSection section, Func<PlotModel> build, string caption)
    {
        string svg;
        try
        {
            svg = Svg(build());
        }
        catch (Exception ex) when (ex is InvalidInputException or ConvergenceException or FluidDataException)
        {
            section.Note($"{caption}: not drawn ({ex.Message}).");
            return;
        }

        section.Figure(svg, caption);
    }

    /// <summary>The figure as SVG text, exported as <c>plot</c> exports it.</summary>
    internal static string Svg(PlotModel model)
    {
        using var stream = new MemoryStream();
        FigureExporter.Export(model, stream, FigureFormat.Svg, FigureWidth, FigureHeight);
        return System.Text.Encoding.UTF8.GetString(stream.ToArray());
    }
}
