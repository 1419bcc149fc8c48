using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Correlations.Audit;

public class CorrelationAuditorTests
{
    // Antoine sets log10(P/mmHg) = A − B/(C + t/°C) as printed in Lange's Handbook of Chemistry
    // (from memory): water 1–100 °C, benzene 8–103 °C, toluene 6–137 °C.
    public static TheoryData<string, double, double, double, double, double> LangeSets() => new()
    {
        { "water", 8.07131, 1730.63, 233.426, 1, 100 },
        { "benzene", 6.90565, 1211.033, 220.790, 8, 103 },
        { "toluene", 6.95464, 1344.8, 219.482, 6, 137 },
    };

    private static AuditReport Audit(string fluid, PublishedCorrelation c, (double, double) range, LogBase? b = null, PublishedPressureUnit? p = null, PublishedTemperatureUnit? t = null)
    {
        var f = FluidCatalog.Embedded.Find(fluid);
        return CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = c, LogBase = b, PressureUnit = p, TemperatureUnit = t, Range = range, Fluid = f,
            Solver = CoexistenceSolver.For(f, CubicModelKind.PengRobinson),
        });
    }

    [Theory]
    [MemberData(nameof(LangeSets))]
    public void Lange_mmHg_Celsius_sets_are_recognised_when_the_convention_is_withheld(string fluid, double a, double b, double c, double t0, double t1)
    {
        var report = Audit(fluid, new PublishedCorrelation("antoine", [a, b, c]), (t0 + 273.15, t1 + 273.15));
        Assert.Equal(new PublishedConvention(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius), report.Convention);
        Assert.True(report.Detected);
        Assert.False(report.Failed, string.Join("; ", report.Findings));
        // The correct reading reproduces Tb to within 1 % (the boiling-point pass threshold):
        // these sets are fitted through the normal boiling point.
        Assert.Equal(AuditSeverity.Pass, report.Findings.Single(f => f.Check == "boiling-point").Severity);
    }

    [Fact]
    public void Conversion_to_SI_is_exact_for_the_Celsius_mmHg_water_set()
    {
        var c = new PublishedCorrelation("antoine", [8.07131, 1730.63, 233.426]);
        double[] si = c.SiCoefficients(new PublishedConvention(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius));
        double t = 60 + 273.15;
        // The mmHg is the conventional one, 133.322387415 Pa (the unit table's one value), not the torr.
        double printed = Math.Pow(10, 8.07131 - 1730.63 / (233.426 + 60)) * 133.322387415;
        // Same number by two routes: only rounding (1e-12 relative) separates them.
        Assert.Equal(printed, Math.Exp(new AntoineForm().LnPressure(t, si)), printed * 1e-12);
    }

    [Fact]
    public void Bridgeman_Aldrich_bar_kelvin_water_set_is_recognised_when_base_and_scale_are_withheld()
    {
        // log10(P/bar) = 5.40221 − 1838.675/(T/K − 31.737), 304–333 K, Bridgeman & Aldrich,
        // J. Heat Transfer 86, 279 (1964), from memory.
        var report = Audit("water", new PublishedCorrelation("antoine", [5.40221, 1838.675, -31.737]), (304, 333), p: PublishedPressureUnit.Bar);
        Assert.Equal(new PublishedConvention(LogBase.Ten, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin), report.Convention);
        Assert.False(report.Failed, string.Join("; ", report.Findings));
    }

    [Fact]
    public void Bar_and_atm_cannot_be_told_apart_for_the_Bridgeman_Aldrich_set_and_detection_refuses()
    {
        // 1 atm = 1.01325 bar: 1.3 % apart, less than the set's own 2.5 % drift at Tb (40 K
        // above its range) and far less than the model's error, so neither reading is clearly better.
        var report = Audit("water", new PublishedCorrelation("antoine", [5.40221, 1838.675, -31.737]), (304, 333));
        Assert.Null(report.Convention);
        var finding = report.Findings.Single();
        Assert.Equal(("convention", AuditSeverity.Fail), (finding.Check, finding.Severity));
        Assert.Contains("ambiguous", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Mmhg_water_set_declared_as_kPa_fails_with_the_deviation()
    {
        var report = Audit("water", new PublishedCorrelation("antoine", [8.07131, 1730.63, 233.426]), (274.15, 373.15), LogBase.Ten, PublishedPressureUnit.KPa, PublishedTemperatureUnit.Celsius);
        var boiling = report.Findings.Single(f => f.Check == "boiling-point");
        Assert.Equal(AuditSeverity.Fail, boiling.Severity);
        // 1 kPa / 1 mmHg = 7.50: +650 % at Tb.
        Assert.Contains("+649", boiling.Message, StringComparison.Ordinal);
        Assert.Equal(AuditSeverity.Fail, report.Findings.Single(f => f.Check == "model-deviation").Severity);
    }

    [Fact]
    public void Kirchhoff_set_whose_slope_changes_sign_in_the_range_fails_the_latent_heat_check()
    {
        // d ln P/dT = (C·T − B)/T² vanishes at T = B/C = 300 K, inside 250–350 K.
        var report = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = new PublishedCorrelation("kirchhoff", [60, -6000, -20]),
            LogBase = LogBase.E, PressureUnit = PublishedPressureUnit.Pa, TemperatureUnit = PublishedTemperatureUnit.Kelvin, Range = (250, 350),
        });
        Assert.Equal(AuditSeverity.Fail, report.Findings.Single(f => f.Check == "latent-heat-positive").Severity);
    }

    [Fact]
    public void Nothing_to_test_against_refuses_to_guess()
    {
        var report = CorrelationAuditor.Audit(new AuditRequest { Correlation = new PublishedCorrelation("antoine", [8.07131, 1730.63, 233.426]), Range = (274.15, 373.15) });
        Assert.Null(report.Convention);
        Assert.True(report.Failed);
    }

    [Fact]
    public void Antoine_pole_inside_the_range_fails()
    {
        var report = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = new PublishedCorrelation("antoine", [20, 1000, -280]),
            LogBase = LogBase.E, PressureUnit = PublishedPressureUnit.Pa, TemperatureUnit = PublishedTemperatureUnit.Kelvin, Range = (270, 330),
        });
        Assert.Equal(AuditSeverity.Fail, report.Findings.Single(f => f.Check == "pole").Severity);
    }
}
