using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>P–x–y and T–x–y diagrams, azeotropes and the Clapeyron slope of bubble lines.</summary>
public sealed class BinaryDiagramTests
{
    private static Fluid F(string name) => FluidCatalog.Embedded.Find(name);

    private static MixtureEquilibrium Engine(string a, string b, double kij)
        => MixtureEquilibrium.For([F(a), F(b)], CubicModelKind.PengRobinson, [0, kij, kij, 0]);

    [Fact]
    public void AtTemperature_Ends_AreThePureSaturationPressures()
    {
        // The pure ends of the P–x–y diagram are each component's own saturation point, solved by
        // the pure-fluid solver with other formulas; both converge to ~1e-12, so 1e-10 relative.
        const double t = 300;
        var diagram = BinaryDiagram.AtTemperature(Engine("propane", "n-butane", 0), t);
        foreach (var (name, index) in new[] { ("n-butane", 0), ("propane", diagram.Points.Count - 1) })
        {
            var model = CubicModel.For(CubicModelKind.PengRobinson, F(name));
            var pure = new CoexistenceSolver(model, CoexistenceSolver.LowestValidTemperature(F(name))).AtTemperature(t);
            AssertClose.Relative(pure.Pressure, diagram.Points[index].Pressure, 1e-10, $"{name} end");
        }

        Assert.Equal(BinaryDiagram.DefaultPoints, diagram.Points.Count);
    }

    [Fact]
    public void HydrocarbonPair_HasNoAzeotrope_AndLighterComponentEnriched()
    {
        // Propane–n-butane forms no azeotrope (a near-ideal pair of homologues; common knowledge of
        // the GPSA Engineering Data Book's K-value charts, from memory): y_1 > x_1 everywhere inside.
        var diagram = BinaryDiagram.AtPressure(Engine("propane", "n-butane", 0), 1e6);
        Assert.Null(diagram.Azeotrope);
        Assert.All(diagram.Points.Where(p => p.LiquidFraction is > 0 and < 1), p => Assert.True(p.VapourFraction > p.LiquidFraction));
        // The isobaric bubble temperature falls from the heavy end to the light end.
        Assert.True(diagram.Points[0].Temperature > diagram.Points[^1].Temperature);
    }

    [Fact]
    public void BenzeneCyclohexane_AzeotropeAtOneAtmosphere_NearHandbookValue()
    {
        // Benzene–cyclohexane azeotrope at 101.325 kPa: 77.6 °C, about 55 % benzene by mass
        // (x_benzene ≈ 0.57) (CRC Handbook of Chemistry and Physics, azeotrope table; from memory).
        // k_ij = 0.02 is a typical Peng–Robinson value for this aromatic–naphthene pair (from memory).
        // Tolerances: the cubic's vapour pressures of the pure fluids are good to ~1 % near their
        // boiling points (0.3 K in T); the azeotrope's composition is very sensitive in a pair boiling
        // 0.7 K apart (a 1 % error in the ratio of vapour pressures moves it by ~0.1), so 0.5 K and 0.1.
        var diagram = BinaryDiagram.AtPressure(Engine("benzene", "cyclohexane", 0.02), BinaryVleData.Atmosphere);
        var azeotrope = Assert.IsType<Azeotrope>(diagram.Azeotrope);
        Assert.Equal(AzeotropeKind.MaximumPressure, azeotrope.Kind);
        AssertClose.Absolute(77.6 + 273.15, azeotrope.Temperature, 0.5, "azeotrope temperature");
        AssertClose.Absolute(0.57, azeotrope.MoleFraction, 0.1, "azeotrope composition");
        // Brent converged: y = x to its tolerance (times the slope of y − x, below 1).
        Assert.True(azeotrope.Residual < 1e-9, $"|y - x| = {azeotrope.Residual}");
        // A minimum-boiling azeotrope is the lowest bubble temperature of the diagram.
        Assert.All(diagram.Points, p => Assert.True(p.Temperature >= azeotrope.Temperature - 1e-9));
    }

    [Theory]
    [InlineData(230.0)]
    [InlineData(250.0)]
    [InlineData(270.0)]
    public void CarbonDioxideEthane_MaximumPressureAzeotrope_WithThePublishedKij(double t)
    {
        // Carbon dioxide–ethane forms a maximum-pressure azeotrope of about two-thirds carbon dioxide
        // that persists from low temperatures up to the critical line (Fredenslund and Mollerup,
        // J. Chem. Soc. Faraday Trans. 1 70, 1653 (1974); composition and its near-constancy from
        // memory). The k_ij is the catalog's Peng–Robinson value (Knapp et al. 1982, 0.1322; from
        // memory), fitted there to this pair's data. Tolerance on x: 0.08, the uncertainty of the
        // recalled "about two-thirds" plus the cubic's ~1 % error in the ratio of the pure vapour
        // pressures, which moves the azeotrope of a pair this close in volatility by a few
        // hundredths. Measured: 0.62 (230 K), 0.66 (250 K), 0.70 (270 K).
        Assert.True(PublishedInteractions.TryFind(F("carbon-dioxide"), F("ethane"), CubicModelKind.PengRobinson, out var published));
        double kij = published.Value;
        var engine = Engine("carbon-dioxide", "ethane", kij);
        var azeotrope = Assert.IsType<Azeotrope>(BinaryDiagram.AtTemperature(engine, t).Azeotrope);
        Assert.Equal(AzeotropeKind.MaximumPressure, azeotrope.Kind);
        AssertClose.Absolute(2.0 / 3, azeotrope.MoleFraction, 0.08, $"azeotrope composition at {t} K");
        // A maximum-pressure azeotrope lies above both pure vapour pressures (its definition;
        // each solved here by the pure-fluid solver).
        foreach (string name in new[] { "carbon-dioxide", "ethane" })
        {
            var pure = new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, F(name)), CoexistenceSolver.LowestValidTemperature(F(name))).AtTemperature(t);
            Assert.True(azeotrope.Pressure > pure.Pressure, $"{name}: azeotrope {azeotrope.Pressure} Pa vs pure {pure.Pressure} Pa");
        }

        // Without the interaction parameter the ideal-like model loses most of the positive deviation
        // from Raoult's law that makes this azeotrope: its pressure maximum falls or vanishes.
        var ideal = BinaryDiagram.AtTemperature(Engine("carbon-dioxide", "ethane", 0), t).Azeotrope;
        Assert.True(ideal is null || ideal.Pressure < azeotrope.Pressure, "k_ij = 0 gives a weaker azeotrope");
    }

    [Fact]
    public void Azeotrope_ClapeyronSlope_IsThePureFormAndTheSlopeOfItsLine()
    {
        // At an azeotrope (x = y) the generalized Clapeyron slope reduces to Δh/(TΔv) of the two
        // phases of one composition, as for a pure fluid. Δh and Δv from each phase's residual
        // enthalpy and density (other formulas than the partial molar sums): measured 2e-13 apart.
        // 1e-9 relative: x = y holds to the azeotrope's tolerance (1e-11), and the partial-molar
        // route sums terms ~10× larger than their weighted difference.
        var engine = Engine("benzene", "cyclohexane", 0.02);
        var azeotrope = BinaryDiagram.AtPressure(engine, BinaryVleData.Atmosphere).Azeotrope!;
        double t = azeotrope.Temperature, p = azeotrope.Pressure;
        double[] x = [.. azeotrope.Point.Liquid.MoleFractions];
        var liquid = engine.Model.Residual(t, azeotrope.Point.Liquid.Density, x);
        var vapour = engine.Model.Residual(t, azeotrope.Point.Vapour.Density, x);
        double dh = vapour.ResidualEnthalpy(p) - liquid.ResidualEnthalpy(p);
        double dv = 1 / azeotrope.Point.Vapour.Density - 1 / azeotrope.Point.Liquid.Density;
        AssertClose.Relative(dh / (t * dv), azeotrope.Clapeyron.Slope, 1e-9, "azeotrope slope against Δh/(TΔv)");
        var dew = MixtureClapeyron.DewLine(engine.Model, t, p, x, [.. azeotrope.Point.Vapour.MoleFractions]);
        AssertClose.Relative(azeotrope.Clapeyron.Slope, dew.Slope, 1e-9, "dew and bubble slopes meet at the azeotrope");

        // The azeotrope's own P–T line: azeotropes at P ± 0.5 %, central difference. Its
        // truncation error is ~(δP/P)²·(curvature of ln P in 1/T) ~ 1e-5; the azeotropes are located
        // to 1e-11 in x, which moves T by < 1e-9 K. Measured 6e-6; so 1e-4 relative.
        double dp = 0.005 * p;
        var up = BinaryDiagram.AtPressure(engine, p + dp).Azeotrope!;
        var down = BinaryDiagram.AtPressure(engine, p - dp).Azeotrope!;
        AssertClose.Relative(2 * dp / (up.Temperature - down.Temperature), azeotrope.Clapeyron.Slope, 1e-4, "slope of the azeotrope line");
    }

    [Theory]
    [InlineData("propane", "n-butane", 0.0, 300.0, 0.3)]
    [InlineData("carbon-dioxide", "propane", 0.13, 260.0, 0.4)]
    [InlineData("benzene", "cyclohexane", 0.02, 350.0, 0.6)]
    public void BubbleLineSlope_MatchesCentralDifferenceAtFixedLiquid(string a, string b, double kij, double t, double x1)
    {
        // dP/dT at fixed liquid composition from MixtureClapeyron.BubbleLine against a central
        // difference of the computed bubble pressure at T ± 0.01 K. The difference's truncation
        // error is h²/6·P'''/P' ~ 1e-8 relative (P varies on a scale of ~10 K); each bubble
        // pressure is converged to ~1e-12 relative, which adds ~1e-12·P/(2h·P') ~ 1e-10. So 1e-6.
        // Measured: 6e-9 (benzene-cyclohexane), 4e-9 (propane-n-butane), 8e-10 (CO2-propane).
        var engine = Engine(a, b, kij);
        double[] z = [x1, 1 - x1];
        const double h = 0.01;
        var point = engine.BubbleAtTemperature(t, z);
        var slope = MixtureClapeyron.BubbleLine(engine.Model, t, point.Pressure, z, [.. point.Vapour.MoleFractions]);
        double difference = (engine.BubbleAtTemperature(t + h, z).Pressure - engine.BubbleAtTemperature(t - h, z).Pressure) / (2 * h);
        AssertClose.Relative(difference, slope.Slope, 1e-6, $"{a}-{b} bubble slope at x1 = {x1}");
    }

    [Fact]
    public void AboveACriticalTemperature_IsRefused()
    {
        // Methane (Tc 190.6 K) cannot reach its pure end at 250 K.
        var ex = Assert.Throws<InvalidInputException>(() => BinaryDiagram.AtTemperature(Engine("methane", "propane", 0), 250));
        Assert.Contains("methane", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ThreeComponents_AreRefused()
    {
        var engine = MixtureEquilibrium.For([F("methane"), F("ethane"), F("propane")], CubicModelKind.PengRobinson);
        Assert.Throws<InvalidInputException>(() => BinaryDiagram.AtTemperature(engine, 150));
    }

    [Fact]
    public void Compositions_AreDenserAtTheEnds()
    {
        var x = BinaryDiagram.Compositions(41);
        Assert.Equal(0, x[0]);
        Assert.Equal(1, x[^1]);
        Assert.True(x[1] - x[0] < x[21] - x[20]);
    }
}
