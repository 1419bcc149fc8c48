using System.Globalization;
using System.Net;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Tests.Commands;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Reporting;

/// <summary><c>report</c>: one self-contained page whose numbers are the other commands' own
/// (the same tables and texts, not a second computation), with every source shown, the
/// 'from memory' markings kept, cautions beside what they concern, and nothing fetched from
/// outside the file.</summary>
public sealed class ReportCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    private string Report(params string[] args)
    {
        string path = _folder.File($"report-{Guid.NewGuid():N}.html");
        var result = Run(["report", .. args, "--out", path]);
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        Assert.Equal($"phaseslope: wrote the report to {path}\n", result.Stderr);
        return File.ReadAllText(path);
    }

    [Fact]
    public void Propane_HasEverySectionItsFiguresAndNoExternalResource()
    {
        string html = Report("propane");
        foreach (string id in new[] { "constants", "model", "saturation", "latent", "vapour-line", "solid", "figures" })
        {
            _ = ReportHtml.Section(html, id);
        }

        // latent and slope figures, the phase diagram of the solid section, then p-T, T-rho and p-h (propane has cp°).
        Assert.Equal(6, CountOf(html, "<svg "));
        Assert.Equal(1, CountOf(ReportHtml.Section(html, "solid"), "<svg "));
        Assert.Empty(ReportHtml.ExternalReferences(html));
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("@media (prefers-color-scheme: dark)", html, StringComparison.Ordinal);
        Assert.Contains("@media print", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Propane_EveryConstantSource_IsShownWithItsFromMemoryMarking()
    {
        string html = ReportHtml.Section(Report("propane"), "constants");
        var fluid = FluidResolver.Resolve("propane");
        var sources = new[] { fluid.MolarMass, fluid.CriticalTemperature, fluid.CriticalPressure, fluid.AcentricFactor, fluid.CriticalDensity, fluid.NormalBoilingPoint, fluid.TriplePointTemperature }
            .OfType<Core.Fluids.SourcedValue>().Select(v => v.Source).ToArray();
        Assert.Equal(7, sources.Length);
        int recalled = 0;
        foreach (string source in sources)
        {
            string shown = WebUtility.HtmlEncode(source).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal);
            Assert.Contains(shown, html, StringComparison.Ordinal);
            recalled += source.Contains("from memory", StringComparison.Ordinal) ? 1 : 0;
        }

        // The catalog's propane file marks all seven values as recalled (fluids/propane.fluid).
        Assert.Equal(7, recalled);
    }

    [Fact]
    public void SaturationTable_IsCurvesTableAtTheSameTemperatures_SteppedInTheChosenUnit()
    {
        string html = Report("propane", "--units", "engineering", "--step", "10");
        var rows = ReportHtml.FirstTableRows(ReportHtml.Section(html, "saturation"));
        // Every row but the last (the critical point) is a multiple of the 10 K step in degC.
        foreach (var row in rows.Take(rows.Count - 1))
        {
            double t = double.Parse(row[0], CultureInfo.InvariantCulture);
            Assert.True(Math.Abs(t / 10 - Math.Round(t / 10)) < 1e-9, $"{row[0]} degC is not on the 10 K step");
        }

        // The same states through 'curve' (the temperatures as the table shows them, 6 digits, are
        // not the exact ones, so curve is run at the report's own first and step and compared cell by cell).
        string first = rows[0][0];
        string curve = RunText("curve", "propane", "--units", "engineering", "--from", $"{first} degC", "--step", "10", "--uncertainty", "linear");
        var curveRows = curve.Split('\n').SkipWhile(l => !l.StartsWith("---", StringComparison.Ordinal)).Skip(1)
            .TakeWhile(l => l.Trim().Length > 0).Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries)).ToList();
        Assert.Equal(14, curveRows[0].Length); // ten values and four standard uncertainties
        Assert.Equal(curveRows.Count, rows.Count);
        for (int i = 0; i < rows.Count; i++)
        {
            Assert.Equal(curveRows[i], rows[i]);
        }

        Assert.Contains("Model estimates. Before use for pressure equipment", ReportHtml.Section(html, "saturation"), StringComparison.Ordinal);
    }

    /// <summary>The part of the solid section under a subheading, up to the next one.</summary>
    private static string SolidPart(string solid, string subheading)
    {
        int start = solid.IndexOf($"<h3>{subheading}</h3>", StringComparison.Ordinal);
        Assert.True(start >= 0, $"no '{subheading}' in the solid section");
        int end = solid.IndexOf("<h3>", start + 4, StringComparison.Ordinal);
        return end < 0 ? solid[start..] : solid[start..end];
    }

    /// <summary>A JSON number (SI) as the report's SI table shows it, or "not given" for null.</summary>
    private static string Cell(JsonElement value, PhaseSlope.Cli.Units.DisplayQuantity quantity)
        => value.ValueKind == JsonValueKind.Null
            ? "not given"
            : PhaseSlope.Cli.Output.NumberText.Table(PhaseSlope.Cli.Units.UnitFormatter.Convert(quantity, value.GetDouble(), PhaseSlope.Cli.Units.UnitSystem.Si));

    [Theory]
    [InlineData("water", "sublimation", "Sublimation line")]
    [InlineData("water", "melting", "Melting line")]
    [InlineData("carbon dioxide", "sublimation", "Sublimation line")]
    [InlineData("carbon dioxide", "melting", "Melting line")]
    public void SolidSection_LineTable_IsCurvesLineOverItsDefaultRange(string fluid, string line, string subheading)
    {
        string part = SolidPart(ReportHtml.Section(Report(fluid), "solid"), subheading);
        var rows = ReportHtml.FirstTableRows(part);
        // The same line through 'curve --line' with its defaults, read as JSON (SI) and shown in the
        // report's SI units: every cell must be the same number, not a second computation.
        var json = RunJson("curve", fluid, "--line", line, "--format", "json");
        var points = json.GetProperty("points").EnumerateArray().ToArray();
        Assert.Equal(points.Length, rows.Count);
        for (int i = 0; i < rows.Count; i++)
        {
            var p = points[i];
            string[] expected =
            [
                Cell(p.GetProperty("temperature_K"), PhaseSlope.Cli.Units.DisplayQuantity.Temperature),
                Cell(p.GetProperty("pressure_Pa"), PhaseSlope.Cli.Units.DisplayQuantity.Pressure),
                Cell(p.GetProperty("slope_Pa_K"), PhaseSlope.Cli.Units.DisplayQuantity.Slope),
                Cell(p.GetProperty("enthalpy_change_J_mol"), PhaseSlope.Cli.Units.DisplayQuantity.MolarEnergy),
                Cell(p.GetProperty("volume_change_m3_mol"), PhaseSlope.Cli.Units.DisplayQuantity.MolarVolume),
            ];
            Assert.Equal(expected, rows[i]);
        }

        // The method line and the notes travel with the table (HTML-escaped, 'from memory' marked).
        string Shown(string text) => WebUtility.HtmlEncode(text).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal);
        Assert.Contains(Shown($"method: {json.GetProperty("method").GetString()}"), part, StringComparison.Ordinal);
        foreach (var note in json.GetProperty("notes").EnumerateArray())
        {
            Assert.Contains(Shown($"note: {note.GetString()}"), part, StringComparison.Ordinal);
        }

        if (json.GetProperty("volume_change_unavailable_reason").GetString() is { } reason)
        {
            Assert.Contains(Shown($"dh and dv not given: {reason}"), part, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void SolidSection_InEngineeringUnits_IsCurvesTextTable()
    {
        // The chosen --units reach the solid tables: the rows are those 'curve --line melting
        // --units engineering' prints (degC, bar, kJ/kg, m3/kg), header lines and all.
        string part = SolidPart(ReportHtml.Section(Report("carbon dioxide", "--units", "engineering"), "solid"), "Melting line");
        var rows = ReportHtml.FirstTableRows(part);
        string curve = RunText("curve", "carbon dioxide", "--line", "melting", "--units", "engineering");
        var curveRows = curve.Split('\n').SkipWhile(l => !l.StartsWith("---", StringComparison.Ordinal)).Skip(1)
            .TakeWhile(l => l.Trim().Length > 0).Select(l => l.Split("  ", StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).ToList();
        Assert.Equal(curveRows.Count, rows.Count);
        for (int i = 0; i < rows.Count; i++)
        {
            Assert.Equal(curveRows[i], rows[i]);
        }

        foreach (string line in curve.Split('\n').TakeWhile(l => l.Length > 0))
        {
            Assert.Contains(WebUtility.HtmlEncode(line).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal), part, StringComparison.Ordinal);
        }

        Assert.Contains("T [degC]", part, StringComparison.Ordinal);
    }

    [Fact]
    public void SolidSection_WaterMelting_SaysDhDvAreGivenOnlyNearTheTriplePoint()
    {
        // Water's published melting line (IAPWS R14-08) reaches far above 10 MPa, where the report
        // (as curve does) leaves dh and dv out and says why.
        string part = SolidPart(ReportHtml.Section(Report("water"), "solid"), "Melting line");
        Assert.Contains("dh and dv are given only within 10 MPa of the triple-point pressure", part, StringComparison.Ordinal);
        Assert.Contains("not given", part, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    public void SolidSection_TriplePointWithSourcesAndTheModelsCheck_CautionOnlyWhereTheDeviationIsLarge(string name)
    {
        string solid = ReportHtml.Section(Report(name), "solid");
        var fluid = FluidResolver.Resolve(name);
        foreach (var value in new[] { fluid.TriplePointTemperature!, fluid.TriplePointPressure!, fluid.EnthalpyOfFusion! })
        {
            Assert.Contains(WebUtility.HtmlEncode(value.Source).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal), solid, StringComparison.Ordinal);
        }

        // The check as 'fluids show' computes it (Peng-Robinson, the report's default model).
        var check = RunJson("fluids", "show", name, "--format", "json").GetProperty("triple_point_check");
        double deviation = check.GetProperty("relative_deviation").GetDouble();
        Assert.Contains($"{PhaseSlope.Cli.Output.NumberText.Table(100 * deviation)} %.", solid, StringComparison.Ordinal);
        // With the catalog data, 'fluids show' puts water's Peng-Robinson vapour pressure at 273.16 K
        // about 20 % low and carbon dioxide's at 216.592 K within 1 %: one on each side of the bound.
        bool cautioned = solid.Contains("The model&#39;s vapour pressure at the low end of its liquid range is off by about", StringComparison.Ordinal)
            || solid.Contains("The model's vapour pressure at the low end of its liquid range is off by about", StringComparison.Ordinal);
        Assert.Equal(Math.Abs(deviation) > FluidReportBound, cautioned);
    }

    /// <summary>The report's caution bound, the 1 % fluids check accepts at the normal boiling point.</summary>
    private const double FluidReportBound = PhaseSlope.Cli.Reporting.FluidReport.TriplePointCautionShare;

    [Fact]
    public void SolidSection_PropaneHasNoMeltingData_SublimationOnlyWithTheReason()
    {
        string solid = ReportHtml.Section(Report("propane"), "solid");
        _ = SolidPart(solid, "Sublimation line");
        string melting = SolidPart(solid, "Melting line");
        Assert.Contains("Sublimation only, no melting line", melting, StringComparison.Ordinal);
        Assert.Contains("fusion_volume_change", melting, StringComparison.Ordinal);
        Assert.DoesNotContain("<table", melting, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("r-32", "triple_point_pressure")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "triple_point_temperature and no triple_point_pressure")]
    public void SolidSection_FluidWithoutTriplePointData_SaysWhichKeysAreMissing(string fluid, string missing)
    {
        string html = Report(fluid);
        string solid = ReportHtml.Section(html, "solid");
        Assert.Contains($"has no {missing}, from which the sublimation and melting lines start", solid, StringComparison.Ordinal);
        Assert.DoesNotContain("<svg", solid, StringComparison.Ordinal);
        Assert.DoesNotContain("<table", solid, StringComparison.Ordinal);
        // The sections after it are still there.
        _ = ReportHtml.Section(html, "figures");
    }

    [Fact]
    public void Eos_ChangesTheSaturationTable()
    {
        var pr = ReportHtml.FirstTableRows(ReportHtml.Section(Report("propane"), "saturation"));
        var srk = ReportHtml.FirstTableRows(ReportHtml.Section(Report("propane", "--eos", "srk"), "saturation"));
        Assert.NotEqual(pr[1][1], srk[1][1]);
    }

    [Fact]
    public void WithData_ShowsFitLatentAndAuditAsTheirCommandsPrintThem()
    {
        string csv = FitData.ExampleCsv, fluid = FitData.ExampleFluid;
        string html = Report(fluid, "--data", csv);
        Assert.Empty(ReportHtml.ExternalReferences(html));
        // The data file's own label travels with it: the demo data are invented (docs/examples).
        string data = ReportHtml.Section(html, "data");
        Assert.Contains("INVENTED DATA", data, StringComparison.Ordinal);
        Assert.Contains("labelled invented", data, StringComparison.Ordinal);
        Assert.Contains("This fluid is invented", ReportHtml.Section(html, "constants"), StringComparison.Ordinal);

        string fit = RunText("fit", csv, "--fluid", fluid, "--log-base", "e", "--correlation-pressure-unit", "Pa", "--correlation-temperature-unit", "K");
        Assert.Equal(fit.TrimEnd(), ReportHtml.PreformattedText(ReportHtml.Section(html, "fit")));
        string latent = RunText("latent", csv, "--fluid", fluid);
        Assert.Equal(latent.TrimEnd(), ReportHtml.PreformattedText(ReportHtml.Section(html, "latent-data")));
        // The audit reads the fit's coefficients back: the command line fit prints for it.
        string arguments = fit.Split('\n').Single(l => l.Contains("--coefficients", StringComparison.Ordinal));
        string[] auditArgs = [.. arguments[arguments.IndexOf("--form", StringComparison.Ordinal)..].Trim().Split(' '), "--data", csv, "--fluid", fluid];
        var audit = Run(["audit", .. auditArgs]);
        Assert.True(audit.ExitCode is 0 or ExitCodes.AuditFailed, audit.ToString());
        Assert.Equal(audit.Stdout.TrimEnd(), ReportHtml.PreformattedText(ReportHtml.Section(html, "audit")));
        // residuals, latent with the data band, and the data on p-T.
        Assert.Equal(3, CountOf(ReportHtml.Section(html, "fit") + ReportHtml.Section(html, "latent-data") + data, "<svg "));
    }

    [Fact]
    public void TunedFluid_ShowsItsTuningStatisticsAndParameterErrors()
    {
        string tuned = _folder.File("tuned.fluid");
        var tune = Run("tune", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--alpha", "mathias-copeman", "--out", tuned);
        Assert.True(tune.ExitCode == 0, tune.ToString());
        string model = ReportHtml.Section(Report(tuned), "model");
        var fluid = FluidResolver.Resolve(tuned);
        Assert.Contains(WebUtility.HtmlEncode($"provenance: {fluid.Provenance}"), model, StringComparison.Ordinal);
        Assert.Contains("AAD of P", model, StringComparison.Ordinal);
        // The standard errors are the square roots of the covariance's diagonal the file carries.
        var set = fluid.AlphaParameters.Single(a => a.Covariance is not null);
        var rows = ReportHtml.FirstTableRows(model[model.IndexOf("<h3>Tuning</h3>", StringComparison.Ordinal)..]);
        Assert.Equal(3, rows.Count);
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(PhaseSlope.Cli.Output.NumberText.Uncertainty(Math.Sqrt(set.Covariance![i, i])), rows[i][2]);
        }

        Assert.Contains("a model tuned to vapour pressures is checked only where the data are", model, StringComparison.Ordinal);
    }

    [Fact]
    public void Mixture_ShowsTheEnvelopeAsEnvelopePrintsIt()
    {
        const string blend = "methane=0.8,ethane=0.15,propane=0.05";
        string html = Report(blend);
        Assert.Empty(ReportHtml.ExternalReferences(html));
        string envelope = ReportHtml.Section(html, "envelope");
        Assert.Equal(1, CountOf(envelope, "<svg "));
        Assert.Equal(RunText("envelope", blend).TrimEnd(), ReportHtml.PreformattedText(envelope));
        Assert.Equal(RunText("mixture", blend).TrimEnd(), ReportHtml.PreformattedText(ReportHtml.Section(html, "mixture")));
        // Each component's constants with their sources (methane's catalog file marks them recalled).
        Assert.Contains("<mark class=\"memory\">from memory</mark>", ReportHtml.Section(html, "components"), StringComparison.Ordinal);
    }

    /// <summary>The invented natural gas of docs/mixture-files.md (its composition is invented; its
    /// two k_ij name their publication, recalled).</summary>
    internal const string NaturalGasA = """
        # Natural gas A: an invented composition for this example.
        format      phaseslope-mixture 1
        name        natural gas A (invented)
        basis       mole
        component   methane = 0.85
        component   ethane = 0.05
        component   carbon dioxide = 0.07
        component   nitrogen = 0.03
        kij         methane, carbon dioxide = 0.0919 | Knapp, Döring, Oellrich, Plöcker & Prausnitz, DECHEMA Chemistry Data Series Vol. VI (1982), Peng-Robinson; from memory
        kij         ethane, nitrogen = 0.0515         | Knapp et al., DECHEMA Chemistry Data Series Vol. VI (1982), Peng-Robinson; from memory
        remarks     composition invented for the documentation

        """;

    [Fact]
    public void MixtureFile_ShowsItsInteractionSourcesMarkedAndItsInventedLabel()
    {
        string file = _folder.File("natural-gas-a.mixture");
        File.WriteAllText(file, NaturalGasA);
        string html = Report(file);
        string mixture = ReportHtml.Section(html, "mixture");
        Assert.Contains("methane, carbon dioxide   0.0919  given         Knapp, D&#246;ring, Oellrich, Pl&#246;cker &amp; Prausnitz, DECHEMA Chemistry Data Series Vol. VI (1982), Peng-Robinson; <mark class=\"memory\">from memory</mark>",
            mixture, StringComparison.Ordinal);
        Assert.Contains("This composition is invented", mixture, StringComparison.Ordinal);
        Assert.Equal(RunText("envelope", file).TrimEnd(), ReportHtml.PreformattedText(ReportHtml.Section(html, "envelope")));
    }

    [Fact]
    public void Text_IsEscaped_AMarkupLikeRemarkStaysText()
    {
        string fluid = _folder.File("markup.fluid");
        string text = File.ReadAllText(FitData.ExampleFluid).Replace("remarks                   Invented", "remarks                   <script>x</script> & <img src=http://example.invalid/a.png> Invented", StringComparison.Ordinal);
        Assert.Contains("<script>", text, StringComparison.Ordinal);
        File.WriteAllText(fluid, text);
        // A data file name with markup characters: it appears in the text and in the figures'
        // legends (the SVG writer escapes it there).
        string data = _folder.File("x<b>&y.csv");
        File.Copy(FitData.ExampleCsv, data);
        string html = Report(fluid, "--data", data);
        Assert.DoesNotContain("<b>", html, StringComparison.Ordinal);
        Assert.Contains("x&lt;b&gt;&amp;y.csv", ReportHtml.Section(html, "data"), StringComparison.Ordinal);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;script&gt;x&lt;/script&gt; &amp; &lt;img src=http://example.invalid/a.png&gt;", html, StringComparison.Ordinal);
        Assert.Empty(ReportHtml.ExternalReferences(html));
    }

    [Theory]
    [InlineData("<img src=\"http://example.invalid/a.png\">")]
    [InlineData("<p style=\"background: url(https://example.invalid/b.png)\">x</p>")]
    [InlineData("<a href=\"https://example.invalid/\">x</a>")]
    [InlineData("<style>@import 'x.css';</style>")]
    [InlineData("<svg><image xlink:href=\"c.png\"/></svg>")]
    [InlineData("<script>1</script>")]
    public void ExternalReferenceCheck_FindsEachKind(string markup)
        => Assert.NotEmpty(ReportHtml.ExternalReferences($"<!DOCTYPE html><html><body>{markup}</body></html>"));

    [Theory]
    [InlineData("<a href=\"#constants\">x</a>")]
    [InlineData("<g clip-path=\"url(#s1f1-cl_3)\"></g>")]
    [InlineData("<p>src=http://example.invalid written as text</p>")]
    public void ExternalReferenceCheck_AllowsAnchorsAndText(string markup)
        => Assert.Empty(ReportHtml.ExternalReferences($"<!DOCTYPE html><html><body>{markup}</body></html>"));

    [Fact]
    public void MissingOut_IsAUsageError()
        => AssertFailure(Run("report", "propane"), ExitCodes.Usage, "--out");

    [Fact]
    public void FailedReport_LeavesAnExistingFileAsItWas()
    {
        string path = _folder.File("kept.html");
        File.WriteAllText(path, "kept");
        var result = Run("report", "no-such-fluid", "--out", path);
        AssertFailure(result, ExitCodes.Fluid);
        Assert.Equal("kept", File.ReadAllText(path));
    }

    private static int CountOf(string text, string part)
    {
        int count = 0;
        for (int i = text.IndexOf(part, StringComparison.Ordinal); i >= 0; i = text.IndexOf(part, i + part.Length, StringComparison.Ordinal))
        {
            count++;
        }

        return count;
    }

    public void Dispose() => _folder.Dispose();
}
