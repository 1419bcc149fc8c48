using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Plots;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Cli.Reporting;

/// <summary>The report of a mixture: the mixture as <c>mixture</c> shows it, each component's
/// constants with their sources (as <c>fluids show</c>), and the phase envelope as
/// <c>envelope</c> traces it, drawn as <c>plot --diagram envelope</c> draws it.</summary>
internal static class MixtureReport
{
    /// <summary>Builds the page.</summary>
    public static string Build(MixtureInput input, ReportRequest request)
    {
        var model = input.CreateModel();
        var report = new HtmlReport($"{input.DisplayName}: phase-envelope report");
        report.Lead($"Made by: {request.Command}");
        report.Lead($"Model: {input.Model.Kind.Title()}, van der Waals one-fluid mixing. Units: {(request.Units == UnitSystem.Si ? "SI (molar)" : "engineering (mass-based)")}. "
            + "A source marked 'from memory' was recalled, not read from the publication.");

        var mixture = report.Section("mixture", "Mixture, model and interaction parameters");
        mixture.Preformatted(MixtureWriter.Render(input, model, OutputFormat.Table));
        if ((input.Name ?? "").Contains("invented", StringComparison.OrdinalIgnoreCase) || (input.Remarks ?? "").Contains("invented", StringComparison.OrdinalIgnoreCase))
        {
            mixture.Caution("This composition is invented for an example; it describes no real stream.");
        }

        var components = report.Section("components", "Component constants");
        foreach (var fluid in input.Mixture.Components)
        {
            components.Subheading(fluid.Name);
            var table = FluidWriter.ConstantsTable(fluid, request.Units);
            components.Table(table, $"Constants of {fluid.Name} with their standard uncertainties and sources ({fluid.Origin})");
        }

        components.Subheading("Hazard classes of the components");
        components.Facts(FluidWriter.HazardLines(input.Mixture.Components));
        components.Caution(input.Mixture.Components.All(c => c.Hazard is not null)
            ? "A mixture can be flammable or toxic where a component is; equipment, charge limits, ventilation and relief follow local codes and licensed engineering practice, and the supplier's safety data sheet of the mixture governs."
            : FluidWriter.GenericHazardCaution);
        if (input.Mixture.Components.Any(c => FluidWriter.ConstantsTable(c, request.Units).Rows.Any(r => r[^1].Contains(HtmlReport.FromMemory, StringComparison.OrdinalIgnoreCase))))
        {
            components.Note("Values whose source says 'from memory' were recalled rather than read from the publication named; check them against it before relying on them.");
        }

        var section = report.Section("envelope", "Phase envelope");
        var tracer = new EnvelopeTracer(model);
        var composition = input.Mixture.MoleFractions;
        var envelope = tracer.Trace(composition);
        var criteria = CriticalPointCriteria.Locate(model, composition);
        var units = request.Units == UnitSystem.Engineering ? PlotUnits.Engineering : PlotUnits.Si;
        try
        {
            section.Figure(FluidReport.Svg(EnvelopeDiagram.Build(envelope, input.DisplayName, input.Model.Kind.Title(), new DiagramOptions { Units = units })),
                "Bubble and dew lines with the critical point, cricondenbar and cricondentherm");
        }
        catch (InvalidInputException ex)
        {
            section.Note($"The envelope figure is not drawn ({ex.Message}).");
        }

        section.Caution(CoexistenceWriter.Caution);
        section.Preformatted(EnvelopeWriter.Render(input, envelope, criteria, new OutputChoice(OutputFormat.Table, request.Units)));
        return report.Render();
    }
}
