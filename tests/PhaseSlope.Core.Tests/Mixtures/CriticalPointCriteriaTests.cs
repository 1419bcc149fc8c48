using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>Mixture critical points by the Heidemann–Khalil criteria against published critical
/// loci, the pure limits and the model's own critical point.</summary>
public sealed class CriticalPointCriteriaTests
{
    [Fact]
    public void MethaneEthane_CriticalLocusPeaksWhereMeasured()
    {
        // From memory: the measured methane–ethane critical locus (Bloomer, Gami & Parent, Inst. Gas
        // Technol. Res. Bull. 22 (1953)) rises from the pure critical pressures (4.60 and 4.87 MPa)
        // to a maximum of about 1000 psia (6.9 MPa) near 250 K, at roughly 60 % methane.
        // Peng–Robinson without k_ij reproduces critical pressures of light-hydrocarbon pairs to a
        // few percent (common practice, from memory): 5 % in P, 15 K in T, 0.1 in composition.
        var model = EnvelopeTracerTests.Mixture("methane", "ethane");
        var locus = Enumerable.Range(1, 19).Select(k => k * 0.05)
            .Select(x => (x, Point: Assert.Single(CriticalPointCriteria.Locate(model, [x, 1 - x])))).ToList();
        var peak = locus.MaxBy(p => p.Point.Pressure);
        AssertClose.Relative(6.9e6, peak.Point.Pressure, 0.05, "maximum critical pressure");
        AssertClose.InRange(235, 265, peak.Point.Temperature, "temperature of the maximum");
        AssertClose.InRange(0.5, 0.7, peak.x, "methane fraction of the maximum");
        // The locus runs monotonically in temperature between the pure critical points (a type I
        // system in the classification of van Konynenburg and Scott, Phil. Trans. R. Soc. A 298, 495 (1980)).
        for (int k = 1; k < locus.Count; k++)
        {
            Assert.True(locus[k].Point.Temperature < locus[k - 1].Point.Temperature, $"critical temperature not falling with methane at x = {locus[k].x}");
        }
    }

    [Theory]
    [InlineData("methane", "ethane")]
    [InlineData("carbon-dioxide", "n-butane")]
    public void NearlyPure_ApproachesThePureCriticalPoint(string first, string second)
    {
        // With 1e-5 of the second component the critical point moves from the first's by the
        // locus's initial slope (of order 100 K and 10 MPa per unit fraction here) times 1e-5:
        // about 1e-3 K and 1e-4 MPa, well inside 1e-4 relative; a wrong criterion misses by percent.
        var model = EnvelopeTracerTests.Mixture(first, second);
        var pure = model.Components[0].CriticalPoint(Composition.Pure);
        var point = Assert.Single(CriticalPointCriteria.Locate(model, [1 - 1e-5, 1e-5]));
        AssertClose.Relative(pure.Temperature, point.Temperature, 1e-4, "critical temperature");
        AssertClose.Relative(pure.Pressure, point.Pressure, 1e-4, "critical pressure");
        AssertClose.Relative(pure.Density, point.Density, 1e-3, "critical density (flat direction of the criteria: looser)");
    }

    [Fact]
    public void ModelCriticalPoint_IsTheCriteriaPoint()
    {
        // CubicMixtureModel.CriticalPoint returns the Heidemann–Khalil point for a mixture (same
        // computation: equal to rounding), and a pure component's for one component present.
        var model = EnvelopeTracerTests.Mixture(EnvelopeTracerTests.GasNames);
        var expected = Assert.Single(CriticalPointCriteria.Locate(model, EnvelopeTracerTests.GasComposition));
        var actual = model.CriticalPoint(EnvelopeTracerTests.GasComposition);
        AssertClose.Relative(expected.Temperature, actual.Temperature, 1e-14, "critical temperature");
        AssertClose.Relative(expected.Pressure, actual.Pressure, 1e-14, "critical pressure");
        Assert.Equal(0, Math.Abs(expected.QuadraticResidual), 1e-10);
        var pure = model.CriticalPoint([0, 1, 0, 0, 0, 0]);
        Assert.Equal(model.Components[1].CriticalTemperature, pure.Temperature);
    }

    [Fact]
    public void BadComposition_IsRefused()
    {
        var model = EnvelopeTracerTests.Mixture("methane", "ethane");
        Assert.Throws<InvalidInputException>(() => CriticalPointCriteria.Locate(model, [1.0]));
        Assert.Throws<InvalidInputException>(() => CriticalPointCriteria.Locate(model, [0.0, 0.0]));
        Assert.Throws<InvalidInputException>(() => CriticalPointCriteria.Locate(model, [double.NaN, 1.0]));
    }
}
