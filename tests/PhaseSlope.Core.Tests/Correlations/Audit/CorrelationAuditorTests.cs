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

    // Benzene, ln(P/bar) = 9.2806 − 2788.51/(T/K − 52.36), Reid, Prausnitz & Poling, The
    // Properties of Gases and Liquids, 4th ed. (1987), Appendix A (from memory). The same curve
    // as Lange's log10(P/mmHg) set above (2788.51/ln 10 = 1211.03), which checks the recollection.
    private static readonly double[] ReidBenzene = [9.2806, 2788.51, -52.36];

    [Fact]
    public void Reid_benzene_set_agrees_with_the_Lange_set()
    {
        var reid = new PublishedCorrelation("antoine", ReidBenzene).ToSi(new PublishedConvention(LogBase.E, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin));
        var lange = new PublishedCorrelation("antoine", [6.90565, 1211.033, 220.790]).ToSi(new PublishedConvention(LogBase.Ten, PublishedPressureUnit.MmHg, PublishedTemperatureUnit.Celsius));
        foreach (double t in new[] { 281.15, 320.0, 353.24, 376.15 })
        {
            // Both are printed to 5-6 significant figures (A to 1e-4 in ln P): 0.1 % is a few
            // units of their last digits, far below the 1.3 % between bar and atm.
            double dev = Math.Exp(reid.Form.LnPressure(t, reid.Parameters) - lange.Form.LnPressure(t, lange.Parameters)) - 1;
            Assert.True(Math.Abs(dev) < 1e-3, $"{t} K: {dev:P3}");
        }
    }

    [Fact]
    public void Benzene_bar_set_is_decided_by_the_boiling_point_known_to_its_uncertainty()
    {
        // At Tb = 353.24 K the set gives 1.0128 bar: −0.04 % of 101325 Pa read as bar, +1.28 %
        // read as atm. On the tolerance scale (σ = 1 %, which allows for a correlation's own error)
        // the atm reading is within one σ, and the rule before anchor uncertainties refused it as
        // ambiguous. The boiling point itself is known to 0.05 K (the documented default), i.e.
        // 0.15 % in ln P: the atm reading is 8.6 of those away, the bar reading inside one.
        var report = Audit("benzene", new PublishedCorrelation("antoine", ReidBenzene), (0.8 * 353.24, 353.24), LogBase.E, t: PublishedTemperatureUnit.Kelvin);
        Assert.Equal(new PublishedConvention(LogBase.E, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin), report.Convention);
        Assert.Equal(PublishedPressureUnit.Atm, report.RunnerUp!.Convention.PressureUnit);
        // The evidence: hand arithmetic above, to 0.005 percentage points (the last digit shown).
        Assert.Equal(-0.04, report.Best!.Evidence.Single(e => e.Anchor == "normal boiling point").Percent, 0.005);
        Assert.Equal(1.28, report.RunnerUp.Evidence.Single(e => e.Anchor == "normal boiling point").Percent, 0.005);
        // The tolerance scale alone would not separate them; the anchor's uncertainty does.
        Assert.True(report.RunnerUp.Score < Math.Max(CorrelationAuditor.AmbiguityRatio * report.Best.Score, 1));
        Assert.True(report.RunnerUp.Separation >= CorrelationAuditor.SeparationRatio * report.Best.Separation);
        Assert.Equal(AuditSeverity.Warn, report.Findings.Single(f => f.Check == "convention").Severity);
        Assert.False(report.Failed, string.Join("; ", report.Findings));
    }

    [Fact]
    public void Benzene_set_is_detected_with_every_part_of_the_convention_withheld()
    {
        var report = Audit("benzene", new PublishedCorrelation("antoine", ReidBenzene), (0.8 * 353.24, 353.24));
        Assert.Equal(new PublishedConvention(LogBase.E, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Kelvin), report.Convention);
    }

    [Fact]
    public void A_boiling_point_known_only_to_a_kelvin_makes_bar_and_atm_a_real_tie()
    {
        // The same set against a benzene whose Tb is stated as ±1 K (as an estimated boiling point
        // would be): 1 K is 3 % in ln P, and both readings (−0.04 %, +1.28 %) lie inside it.
        var benzene = FluidCatalog.Embedded.Find("benzene");
        var vague = benzene with { NormalBoilingPoint = benzene.NormalBoilingPoint! with { StandardUncertainty = 1.0 } };
        var report = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = new PublishedCorrelation("antoine", ReidBenzene), LogBase = LogBase.E, TemperatureUnit = PublishedTemperatureUnit.Kelvin,
            Range = (0.8 * 353.24, 353.24), Fluid = vague, Solver = CoexistenceSolver.For(vague, CubicModelKind.PengRobinson),
        });
        Assert.Null(report.Convention);
        var finding = report.Findings.Single();
        Assert.Equal(("convention", AuditSeverity.Fail), (finding.Check, finding.Severity));
        Assert.Contains("ambiguous", finding.Message, StringComparison.Ordinal);
    }

    // IAPWS saturation equation, Wagner & Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993), from
    // memory: a1…a6, Tc = 647.096 K, Pc = 22.064 MPa.
    private static readonly double[] IapwsWater = [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502, 647.096, 22.064];

    [Fact]
    public void Iapws_water_equation_audits_as_a_wagner_6_set_and_its_Pc_unit_is_detected()
    {
        var report = Audit("water", new PublishedCorrelation("wagner-6", IapwsWater), (280, 600), LogBase.E, t: PublishedTemperatureUnit.Kelvin);
        Assert.Equal(PublishedPressureUnit.MPa, report.Convention!.PressureUnit);
        Assert.False(report.Failed, string.Join("; ", report.Findings));
        // Tb of the catalog water (373.124 K, IAPWS-95) from the equation that defines it: the
        // equation reproduces IAPWS-95 to its stated 0.025 % (Wagner & Pruss 1993, from memory);
        // the boiling-point check passes below 1 %.
        Assert.Equal(AuditSeverity.Pass, report.Findings.Single(f => f.Check == "boiling-point").Severity);
    }

    [Fact]
    public void Wagner_Tc_in_degC_reads_the_same_curve()
    {
        // 647.096 K = 373.946 degC; Pc 22.064 MPa = 220.64 bar: the same correlation printed
        // otherwise must give the same SI form (Tc, Pc to rounding, 1e-12 relative).
        double[] celsius = [.. IapwsWater[..6], 373.946, 220.64];
        var (form, _) = new PublishedCorrelation("wagner-6", celsius).ToSi(new PublishedConvention(LogBase.E, PublishedPressureUnit.Bar, PublishedTemperatureUnit.Celsius));
        var wagner = Assert.IsType<WagnerForm>(form);
        Assert.Equal(647.096, wagner.CriticalTemperature, 1e-9);
        Assert.Equal(22.064e6, wagner.CriticalPressure, 1e-3);
    }

    [Fact]
    public void Perry_water_set_audits_as_antoine_extended_and_is_detected()
    {
        // ln(P/Pa) = 73.649 − 7258.2/T − 7.3037 ln T + 4.1653e-6 T², Perry's Chemical Engineers'
        // Handbook, 7th ed., Table 2-6 (from memory), written as the extended Antoine form with
        // C = D = 0 and G = 2.
        var perry = new PublishedCorrelation("antoine-extended", [73.649, -7258.2, 0, 0, -7.3037, 4.1653e-6, 2]);
        var report = Audit("water", perry, (280, 600));
        Assert.Equal(new PublishedConvention(LogBase.E, PublishedPressureUnit.Pa, PublishedTemperatureUnit.Kelvin), report.Convention);
        Assert.False(report.Failed, string.Join("; ", report.Findings));
    }

    [Theory]
    // ln(P/Pa) = 25 − B/T with ΔZ = 1 (no fluid): ΔH/T = R·B/T, largest at the 300 K end. The
    // Trouton-type bound is 350 J/(mol K) (common practice; LatentHeatEstimator): B = 12000 K
    // gives 332.6, B = 13000 K gives 360.3 (hand arithmetic with R = 8.314462618).
    [InlineData(12000, AuditSeverity.Pass)]
    [InlineData(13000, AuditSeverity.Fail)]
    public void Positive_but_absurd_latent_heat_fails_by_the_Trouton_type_bound(double b, AuditSeverity expected)
    {
        var report = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = new PublishedCorrelation("clausius-clapeyron", [25, b]),
            LogBase = LogBase.E, PressureUnit = PublishedPressureUnit.Pa, TemperatureUnit = PublishedTemperatureUnit.Kelvin, Range = (300, 350),
        });
        Assert.Equal(AuditSeverity.Pass, report.Findings.Single(f => f.Check == "latent-heat-positive").Severity);
        var magnitude = report.Findings.Single(f => f.Check == "latent-heat-magnitude");
        Assert.Equal(expected, magnitude.Severity);
        if (expected == AuditSeverity.Fail)
        {
            // The estimator's own text: one piece of code for the bound.
            Assert.StartsWith(LatentHeatEstimator.ImplausibilityFinding(300, Constants.GasConstant * b)!, magnitude.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void A_round_trip_through_a_stated_Fahrenheit_convention_reproduces_the_fit()
    {
        // Fit Antoine to noise-free IAPWS water (300-420 K), print it as log10/psi/degF, audit the
        // printed set with that convention stated: the audit's SI form gives the fit's pressures
        // to 1e-10 relative (conversion rounding ~1e-13, see PublishedConversionTests).
        var data = SyntheticSaturationData.Points(SyntheticSaturationData.WaterLnPressure, SyntheticSaturationData.Temperatures(300, 420, 13));
        var fit = VapourPressureFitter.Fit(new AntoineForm(), data);
        var convention = new PublishedConvention(LogBase.Ten, PublishedPressureUnit.Psi, PublishedTemperatureUnit.Fahrenheit);
        var printed = PublishedCorrelation.FromSi(fit.Form, fit.Parameters, convention);
        var report = CorrelationAuditor.Audit(new AuditRequest
        {
            Correlation = new PublishedCorrelation("antoine", [.. printed.Coefficients.Select(c => double.Parse(c.ToString("R", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture))]),
            LogBase = convention.LogBase, PressureUnit = convention.PressureUnit, TemperatureUnit = convention.TemperatureUnit, Data = data,
        });
        Assert.Equal(convention, report.Convention);
        foreach (var point in data)
        {
            TestSupport.AssertClose.Relative(fit.Pressure(point.Temperature), Math.Exp(new AntoineForm().LnPressure(point.Temperature, report.SiCoefficients!)), 1e-10, $"{point.Temperature} K");
        }
    }
}
