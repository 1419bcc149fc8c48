using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Estimation.JobackTests;

namespace PhaseSlope.Core.Tests.Estimation;

/// <summary>Lydersen's method and its cross-check of Joback's critical constants.</summary>
public class LydersenTests
{
    [Fact]
    public void Estimate_NHexane_HandCalculationOfThePublishedFormulas()
    {
        // n-hexane = 2 -CH3 + 4 -CH2- with ΔT = 0.020, ΔP = 0.227, ΔV = 55 each (Reid, Prausnitz &
        // Sherwood 3rd ed. Table 2-1, from memory): ΣΔT = 0.12, ΣΔP = 1.362, ΣΔV = 330;
        // Tc = Tb/(0.567 + 0.12 − 0.0144); Pc = M/(0.34 + 1.362)² atm; Vc = 40 + 330 cm³/mol.
        // Tolerances: rounding only.
        double m = ChemicalFormula.MolarMass("C6H14");
        var estimate = Lydersen.Estimate(Groups(("CH3", 2), ("CH2", 4)), 341.88, m);

        AssertClose.Relative(341.88 / (0.567 + 0.12 - 0.0144), estimate.CriticalTemperature!.Value, 1e-12, "Tc");
        AssertClose.Relative(m * 1000 / (1.702 * 1.702) * 101325, estimate.CriticalPressure!.Value, 1e-12, "Pc");
        AssertClose.Relative(370e-6, estimate.CriticalVolume!.Value, 1e-12, "Vc");
        Assert.Null(estimate.Unavailable);
        // Against the measured n-hexane (Poling et al. 5th ed. Appendix A, from memory: 507.6 K,
        // 30.25 bar, 368 cm³/mol) within the method's average errors (Reid et al., from memory:
        // about 2 % in Tc, 4 % in Pc and Vc).
        AssertClose.Relative(507.6, estimate.CriticalTemperature.Value, 0.02, "Tc against measured");
        AssertClose.Relative(30.25e5, estimate.CriticalPressure.Value, 0.04, "Pc against measured");
        AssertClose.Relative(368e-6, estimate.CriticalVolume.Value, 0.04, "Vc against measured");
    }

    public static TheoryData<string, (string, int)[], string, double, double, double> MeasuredComparisons => new()
    {
        // fluid, groups, formula, measured Tb [K], Tc [K], Pc [bar] (Poling et al. 5th ed.
        // Appendix A, from memory). Lydersen's published average errors: about 2 % in Tc with a
        // measured Tb, 4 % in Pc (Reid et al. 3rd ed.; from memory); the test allows twice the
        // Pc average (8 %: single molecules spread about the average; acetone is 6.5 % high).
        { "toluene", [("ring=CH", 5), ("ring=C", 1), ("CH3", 1)], "C7H8", 383.78, 591.75, 41.08 },
        { "acetone", [("CH3", 2), ("C=O", 1)], "C3H6O", 329.22, 508.2, 47.01 },
        { "methanol", [("CH3", 1), ("OH", 1)], "CH4O", 337.69, 512.64, 80.97 },
        { "acetonitrile", [("CH3", 1), ("CN", 1)], "C2H3N", 354.8, 545.5, 48.3 },
        { "ethyl acetate", [("CH3", 2), ("CH2", 1), ("COO", 1)], "C4H8O2", 350.21, 523.3, 38.8 },
        { "diethyl ether", [("CH3", 2), ("CH2", 2), ("O", 1)], "C4H10O", 307.58, 466.7, 36.4 },
        { "dimethyl sulfide", [("CH3", 2), ("S", 1)], "C2H6S", 310.48, 503.04, 55.3 },
        { "chlorobenzene", [("ring=CH", 5), ("ring=C", 1), ("Cl", 1)], "C6H5Cl", 404.87, 632.35, 45.19 },
        { "nitromethane", [("CH3", 1), ("NO2", 1)], "CH3NO2", 374.35, 588.15, 63.1 },
        // Left out, not hidden behind a wide tolerance: acetic acid (Pc 12 % high with the -COOH
        // ΔP the book printed as based on few data).
    };

    [Theory]
    [MemberData(nameof(MeasuredComparisons))]
    public void Estimate_AgainstMeasured_WithinTheMethodsPublishedErrors(string name, (string, int)[] groups, string formula, double tb, double tc, double pcBar)
    {
        var estimate = Lydersen.Estimate(Groups(groups), tb, ChemicalFormula.MolarMass(formula));
        AssertClose.Relative(tc, estimate.CriticalTemperature!.Value, 0.02, $"{name} Lydersen Tc");
        AssertClose.Relative(pcBar * 1e5, estimate.CriticalPressure!.Value, 0.08, $"{name} Lydersen Pc");
    }

    [Fact]
    public void Estimate_GroupWithoutIncrement_NoValuesAndTheReason()
    {
        var estimate = Lydersen.Estimate(Groups(("ring=CH", 5), ("ring=N", 1)), 388.41, ChemicalFormula.MolarMass("C5H5N"));
        Assert.Null(estimate.CriticalTemperature);
        Assert.Null(estimate.CriticalPressure);
        Assert.Contains("ring=N", estimate.Unavailable, StringComparison.Ordinal);
    }

    [Fact]
    public void Increments_OnlyForJobackGroups()
    {
        Assert.All(Lydersen.Increments.Keys, id => Assert.True(Joback.TryFindGroup(id, out _), id));
    }

    [Fact]
    public void CrossCheck_Methanol_FlagsJobacksKnownPressureOutlier()
    {
        // Joback's Pc of methanol is 67 bar against 80.97 bar measured (17 % low; Poling et al.
        // Appendix A, from memory), Lydersen's 82.6 bar: the cross-check must flag Pc (23 % apart,
        // threshold 13 %) and pass Tc (both relations are within 1 % of 512.6 K).
        var groups = Groups(("CH3", 1), ("OH", 1));
        var joback = Joback.Estimate(groups, 337.69);
        var lydersen = Lydersen.Estimate(groups, 337.69, joback.MolarMass);
        var items = EstimateCrossCheck.Compare(joback, lydersen);

        Assert.False(items.Single(i => i.Quantity == "critical_temperature").Exceeds);
        var pc = items.Single(i => i.Quantity == "critical_pressure");
        Assert.True(pc.Exceeds);
        AssertClose.Relative((lydersen.CriticalPressure!.Value - joback.CriticalPressure!.Value) / joback.CriticalPressure.Value, pc.Difference!.Value, 1e-14, "relative difference");
        // Measured Pc is on Lydersen's side: Joback's is the outlier.
        AssertClose.Relative(80.97e5, lydersen.CriticalPressure.Value, 0.04, "Lydersen Pc of methanol against measured");
    }

    [Theory]
    [InlineData("n-hexane")]
    [InlineData("toluene")]
    [InlineData("acetone")]
    public void CrossCheck_OrdinaryMolecules_NoFinding(string name)
    {
        // Molecules both methods were fitted on agree within the thresholds (no false alarm).
        (string, int)[] groups = name switch
        {
            "n-hexane" => [("CH3", 2), ("CH2", 4)],
            "toluene" => [("ring=CH", 5), ("ring=C", 1), ("CH3", 1)],
            _ => [("CH3", 2), ("C=O", 1)],
        };
        var joback = Joback.Estimate(Groups(groups));
        var lydersen = Lydersen.Estimate(Groups(groups), joback.NormalBoilingPoint, joback.MolarMass);
        Assert.All(EstimateCrossCheck.Compare(joback, lydersen), i => Assert.False(i.Exceeds, $"{name} {i.Quantity} {i.Difference}"));
    }

    [Fact]
    public void CrossCheck_AcentricFactor_AbsoluteDifferenceAndReason()
    {
        var item = EstimateCrossCheck.AcentricFactor(0.30, 0.36, null);
        AssertClose.Absolute(0.06, item.Difference!.Value, 1e-15, "Δω");
        Assert.True(item.Exceeds);
        Assert.False(item.Relative);
        var none = EstimateCrossCheck.AcentricFactor(0.30, null, "no Lydersen increment for ring=N");
        Assert.Null(none.Difference);
        Assert.False(none.Exceeds);
        Assert.Equal("no Lydersen increment for ring=N", none.Unavailable);
    }
}
