using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Correlations;
using PhaseSlope.Core.Tests.Correlations.Audit;

namespace PhaseSlope.Validation.Sections;

internal static class Audit
{
    public static void Write(Page page)
    {
        page.Heading(2, "Published correlations (`audit`)");
        page.Paragraph("""
            Printed vapour-pressure sets read in their own convention (log base, pressure unit, temperature scale),
            converted exactly to SI and checked; method in [audit.md](audit.md). Tests: `Correlations/Audit/`,
            `Commands/ConventionRoundTripTests`.
            """);
        var rows = new List<string[]>();
        RoundTrip(rows);
        LangeFahrenheit(rows);
        foreach (object[] set in CorrelationAuditorTests.LangeSets())
        {
            string fluid = (string)set[0];
            double a = (double)set[1], b = (double)set[2], c = (double)set[3], t0 = (double)set[4], t1 = (double)set[5];
            var report = Run(fluid, new PublishedCorrelation("antoine", [a, b, c]), (t0 + 273.15, t1 + 273.15));
            rows.Add([$"Lange's {fluid} Antoine set ({a}, {b}, {c}; {t0}–{t1} °C), convention withheld", "log10, mmHg, degC (Lange's Handbook, from memory)",
                Describe(report), "detected; boiling point passes (1 %)", "`CorrelationAuditorTests`"]);
        }

        // The IAPWS saturation-pressure equation (Wagner & Pruß 1993, coefficients from memory) as a
        // wagner-6 set, with its Pc unit withheld; Perry's water set (Perry's Chemical Engineers'
        // Handbook, 7th ed., Table 2-6, from memory) in the extended Antoine form, all withheld. As in
        // CorrelationAuditorTests.
        double[] iapws = [.. SyntheticSaturationData.WaterCoefficients, 647.096, 22.064];
        var iapwsReport = Run("water", new PublishedCorrelation("wagner-6", iapws), (280, 600), LogBase.E, PublishedTemperatureUnit.Kelvin);
        rows.Add(["IAPWS water equation as a `wagner-6` set, Pc unit withheld", "MPa (Wagner & Pruß 1993, from memory)", Describe(iapwsReport), "Pc unit MPa; no failed check", "`CorrelationAuditorTests`"]);
        var perry = Run("water", new PublishedCorrelation("antoine-extended", [73.649, -7258.2, 0, 0, -7.3037, 4.1653e-6, 2]), (280, 600));
        rows.Add(["Perry's water set as `antoine-extended`, convention withheld", "ln, Pa, K (Perry's 7th ed., from memory)", Describe(perry), "detected; no failed check", "`CorrelationAuditorTests`"]);
        page.Table(["check", "reference", "result", "held to", "where"], rows);
    }

    private static AuditReport Run(string fluid, PublishedCorrelation correlation, (double, double) range, LogBase? logBase = null, PublishedTemperatureUnit? scale = null)
    {
        var f = FluidCatalog.Embedded.Find(fluid);
        return CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = correlation, LogBase = logBase, TemperatureUnit = scale, Range = range, Fluid = f,
            Solver = CoexistenceSolver.For(f, CubicModelKind.PengRobinson),
        });
    }

    private static string Describe(AuditReport report)
    {
        string convention = report.Convention?.ToString() ?? "none";
        var boiling = report.Findings.FirstOrDefault(f => f.Check == "boiling-point");
        return $"{(report.Detected ? "detected" : "taken as given")}: {convention}; boiling point {(boiling is null ? "not checked" : boiling.Severity.ToString().ToLowerInvariant())}; {(report.Failed ? "a check failed" : "no failed check")}";
    }

    /// <summary>The conventions of PublishedConversionTests: every log base, pressure unit and scale.</summary>
    private static readonly PublishedConvention[] Conventions =
    [
        new(LogBase.E, PublishedPressureUnit.Pa, PublishedTemperatureUnit.Kelvin),
        new(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius),
        new(LogBase.Ten, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin),
        new(LogBase.E, PublishedPressureUnit.KPa, PublishedTemperatureUnit.Fahrenheit),
        new(LogBase.Ten, PublishedPressureUnit.Psi, PublishedTemperatureUnit.Rankine),
        new(LogBase.E, PublishedPressureUnit.Atm, PublishedTemperatureUnit.Rankine),
        new(LogBase.Ten, PublishedPressureUnit.Torr, PublishedTemperatureUnit.Fahrenheit),
        new(LogBase.E, PublishedPressureUnit.MPa, PublishedTemperatureUnit.Celsius),
    ];

    private static void RoundTrip(List<string[]> rows)
    {
        double worst = 0;
        int sets = 0;
        foreach (var fit in SyntheticSaturationData.WaterFits())
        {
            double[] si = [.. fit.Parameters];
            foreach (var convention in Conventions)
            {
                if (PublishedCorrelation.Refusal(fit.Form.Id, convention.LogBase, convention.TemperatureUnit) is not null)
                {
                    continue;
                }

                var (back, parameters) = PublishedCorrelation.FromSi(fit.Form, si, convention).ToSi(convention);
                foreach (double t in SyntheticSaturationData.Temperatures(280, 600, 17))
                {
                    worst = Math.Max(worst, Math.Abs(Math.Exp(back.LnPressure(t, parameters) - fit.Form.LnPressure(t, si)) - 1));
                }

                sets++;
            }
        }

        rows.Add([$"every fitted form (fitted to IAPWS water data) printed in every convention its algebra admits and read back ({sets} form–convention pairs, 17 temperatures each)", "the SI form itself",
            "pressures " + Fmt.Below(worst) + " relative", "1e-10", "`PublishedConversionTests`"]);
    }

    private static void LangeFahrenheit(List<string[]> rows)
    {
        // Lange's water set, log10(P/mmHg) = 8.07131 − 1730.63/(t/°C + 233.426) (from memory), in °F by
        // hand: A = 8.07131, B = 1.8·1730.63 = 3115.134, C = 1.8·233.426 − 32 = 388.1668.
        var celsius = new PublishedConvention(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius);
        var fahrenheit = new PublishedConvention(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Fahrenheit);
        var (form, si) = new PublishedCorrelation("antoine", [8.07131, 1730.63, 233.426]).ToSi(celsius);
        var printed = PublishedCorrelation.FromSi(form, si, fahrenheit);
        double worst = new[] { printed.Coefficients[0] / 8.07131 - 1, printed.Coefficients[1] / (1.8 * 1730.63) - 1, printed.Coefficients[2] / (1.8 * 233.426 - 32) - 1 }.Max(Math.Abs);
        rows.Add(["Lange's water set converted from °C to °F", "A = 8.07131, B = 1.8·1730.63, C = 1.8·233.426 − 32 (hand algebra)",
            $"B = {Fmt.F(printed.Coefficients[1], 3)}, C = {Fmt.F(printed.Coefficients[2], 4)}; relative difference {Fmt.Below(worst)}", "1e-12", "`PublishedConversionTests`"]);
    }
}
