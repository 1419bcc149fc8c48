using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>Bubble and dew points and the temperature glide: pure limits against the pure
/// coexistence solver, published blend data, and cross-checks against the flash.</summary>
public sealed class MixtureSaturationTests
{
    [Theory]
    [InlineData("propane", "n-butane", 250.0)]
    [InlineData("carbon-dioxide", "methane", 280.0)]
    [InlineData("r-32", "r-134a", 300.0)]
    [InlineData("n-butane", "propane", 400.0)]
    public void PureLimit_EqualsTheCoexistenceSolver(string name, string absent, double temperature)
    {
        // One component present (z = (1, 0)): the bubble and dew points are that component's
        // saturation point, solved by a different route (Newton on ln K and ln P with fugacities
        // against Newton on the two densities). Equal to 1e-10 relative: both converge to ~1e-12.
        var engine = Engine(0.05, name, absent);
        var solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson);
        var point = solver.AtTemperature(temperature);
        double[] z = [1, 0];
        foreach (var saturation in new[] { engine.BubbleAtTemperature(temperature, z), engine.DewAtTemperature(temperature, z) })
        {
            AssertClose.Relative(point.Pressure, saturation.Pressure, 1e-10, $"{saturation.Kind} pressure at T");
            AssertClose.Relative(point.Liquid.Density, saturation.Liquid.Density, 1e-10, $"{saturation.Kind} liquid density");
            AssertClose.Relative(point.Vapour.Density, saturation.Vapour.Density, 1e-10, $"{saturation.Kind} vapour density");
        }

        foreach (var saturation in new[] { engine.BubbleAtPressure(point.Pressure, z), engine.DewAtPressure(point.Pressure, z) })
        {
            AssertClose.Relative(temperature, saturation.Temperature, 1e-10, $"{saturation.Kind} temperature at P");
        }
    }

    [Fact]
    public void Air_AtOneAtmosphere_MatchesItsPublishedBubbleAndDewPoints()
    {
        // Dry air (N2 0.7812, O2 0.2096, Ar 0.0092 mole fractions) at 101 325 Pa: bubble point
        // 78.90 K, dew point 81.72 K (Lemmon, Jacobsen, Penoncello & Friend, J. Phys. Chem. Ref.
        // Data 29, 331 (2000), from memory). Peng–Robinson with k_ij = 0 for every pair: its
        // vapour pressures of N2, O2 and Ar are within about 1 % (0.1 K) and the neglected k_ij
        // (about −0.01 for N2–O2) moves the points by a few tenths of a kelvin, so 0.6 K.
        var engine = Engine(0, "nitrogen", "oxygen", "argon");
        var glide = engine.Glide(101325, [0.7812, 0.2096, 0.0092]);
        AssertClose.Absolute(78.90, glide.Bubble.Temperature, 0.6, "bubble temperature of air");
        AssertClose.Absolute(81.72, glide.Dew.Temperature, 0.6, "dew temperature of air");
        AssertClose.Absolute(81.72 - 78.90, glide.Glide, 0.6, "glide of air");
    }

    [Fact]
    public void R407C_AtOneAtmosphere_HasItsPublishedGlide()
    {
        // R-407C = R-32/R-125/R-134a 23/25/52 % by mass: bubble −43.8 °C, dew −36.7 °C, glide
        // about 7 K at 101.325 kPa (ASHRAE Standard 34 refrigerant data and the ASHRAE Handbook,
        // Fundamentals, refrigerant tables; from memory). Peng–Robinson, k_ij = 0: the vapour
        // pressures of the three components are within about 2 % (0.3 K), and the blend's
        // non-ideality, unfitted here, within about 1 K of glide (the model's known accuracy
        // for HFC blends without fitted k_ij).
        var engine = Engine(0, "r-32", "r-125", "r-134a");
        var glide = engine.Glide(101325, FromMass(engine, 0.23, 0.25, 0.52));
        AssertClose.Absolute(-43.8 + 273.15, glide.Bubble.Temperature, 1.0, "bubble temperature of R-407C");
        AssertClose.Absolute(-36.7 + 273.15, glide.Dew.Temperature, 1.0, "dew temperature of R-407C");
        AssertClose.Absolute(7.1, glide.Glide, 1.0, "glide of R-407C");
    }

    [Fact]
    public void R410A_Binary_IsNearAzeotropic()
    {
        // R-410A = R-32/R-125 50/50 % by mass: normal bubble point −51.6 °C, glide below 0.2 K
        // (ASHRAE Standard 34 refrigerant data, from memory). Peng–Robinson, k_ij = 0: 1 K on the
        // bubble point (the components' vapour-pressure accuracy, about 2 %), and the glide must
        // stay below 0.2 K.
        var engine = Engine(0, "r-32", "r-125");
        var glide = engine.Glide(101325, FromMass(engine, 0.5, 0.5));
        AssertClose.Absolute(-51.6 + 273.15, glide.Bubble.Temperature, 1.0, "bubble temperature of R-410A");
        AssertClose.InRange(0, 0.2, glide.Glide, "glide of R-410A");
    }

    [Fact]
    public void BubblePoint_IsTheFlashOfItsOwnLiquidAtZeroVapour()
    {
        // Cross-check with a second method: the bubble point of methane/propane (0.2/0.8) at
        // 277.6 K, then flashes just inside and just outside it. 1e-6 below the bubble pressure the
        // flash splits with a vanishing vapour fraction whose vapour is the incipient vapour
        // (composition to 1e-4: the split moves linearly with the pressure offset); 1e-6 above it
        // the feed is one stable liquid.
        var engine = Engine(0.02, "methane", "propane");
        double[] z = [0.2, 0.8];
        var bubble = engine.BubbleAtTemperature(277.6, z);
        Assert.Equal(MixtureSaturationKind.Bubble, bubble.Kind);
        var inside = engine.Flash(277.6, bubble.Pressure * (1 - 1e-6), z);
        Assert.True(inside.IsTwoPhase);
        AssertClose.InRange(0, 1e-4, inside.VapourFraction, "vapour fraction just below the bubble pressure");
        AssertClose.Absolute(bubble.Vapour.MoleFractions[0], inside.Vapour!.MoleFractions[0], 1e-4, "incipient vapour methane fraction");
        var outside = engine.Flash(277.6, bubble.Pressure * (1 + 1e-6), z);
        Assert.False(outside.IsTwoPhase);
        Assert.Equal(0, outside.VapourFraction);

        var dew = engine.DewAtTemperature(277.6, z);
        var wet = engine.Flash(277.6, dew.Pressure * (1 + 1e-6), z);
        Assert.True(wet.IsTwoPhase);
        AssertClose.InRange(1 - 1e-4, 1, wet.VapourFraction, "vapour fraction just above the dew pressure");
        Assert.Equal(1, engine.Flash(277.6, dew.Pressure * (1 - 1e-6), z).VapourFraction);
    }

    [Fact]
    public void SaturationAtPressure_InvertsSaturationAtTemperature()
    {
        // The two routes solve the same equations with a different unknown (ln T against ln P):
        // equal to 1e-10 relative (both converge to steps of 1e-12).
        var engine = Engine(0, NaturalGasNames);
        var dew = engine.DewAtTemperature(250, NaturalGas);
        var back = engine.DewAtPressure(dew.Pressure, NaturalGas);
        AssertClose.Relative(250, back.Temperature, 1e-10, "dew temperature at the dew pressure");
        var bubble = engine.BubbleAtTemperature(150, NaturalGas);
        AssertClose.Relative(150, engine.BubbleAtPressure(bubble.Pressure, NaturalGas).Temperature, 1e-10, "bubble temperature at the bubble pressure");
        Assert.True(bubble.Report.NewtonSteps > 0 && bubble.Report.FugacityResidual < 1e-11, bubble.Report.ToString());
    }

    [Fact]
    public void OutsideTheEnvelope_NoBubblePointIsReported()
    {
        // 90 % methane with propane at 300 K is above the mixture's cricondentherm (both
        // components' critical loci lie below 300 K at this composition; methane Tc 190.6 K): no
        // bubble point exists, and the solver says so instead of returning the trivial solution.
        var engine = Engine(0, "methane", "propane");
        var error = Assert.Throws<ConvergenceException>(() => engine.BubbleAtTemperature(300, [0.9, 0.1]));
        Assert.Contains("bubble", error.Message);
    }

    [Fact]
    public void BadInput_IsRefusedWithTheField()
    {
        var engine = Engine(0, "methane", "propane");
        Assert.Throws<InvalidInputException>(() => engine.BubbleAtTemperature(-1, [0.5, 0.5]));
        Assert.Throws<InvalidInputException>(() => engine.BubbleAtTemperature(250, [0.5, 0.6]));
        Assert.Throws<InvalidInputException>(() => engine.BubbleAtTemperature(250, [1.0]));
        Assert.Throws<InvalidInputException>(() => engine.DewAtPressure(double.NaN, [0.5, 0.5]));
    }
}
