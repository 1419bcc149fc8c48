using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>Mixture enthalpy and entropy against the pure-fluid property engine and the ideal
/// entropy of mixing.</summary>
public sealed class MixturePropertiesTests
{
    [Theory]
    [InlineData("propane", 300.0, 1e5)]      // vapour
    [InlineData("propane", 250.0, 2e6)]      // compressed liquid
    [InlineData("r-134a", 350.0, 5e6)]       // dense fluid above Tc
    public void PureLimit_EqualsThePropertyModel(string name, double temperature, double pressure)
    {
        // One component present: h and s on the base convention (ideal gas at 298.15 K, 1 bar)
        // are PropertyModel's, computed there from ln(ρRT/P0) and −A_r,T instead of
        // −R ln(P/P0) + s_r; equal to 1e-10 of the scale of h (|h| + RT) and s (|s| + R).
        var fluid = FluidCatalog.Embedded.Find(name);
        var pure = PropertyModel.For(fluid, CubicModelKind.PengRobinson).AtPressure(temperature, pressure);
        var engine = Engine(0.03, name, "n-butane");
        double[] x = [1, 0];
        var residual = engine.Model.Residual(temperature, pure.Density, x);
        var caloric = engine.Properties.Caloric(residual, pressure, x)!.Value;
        double rt = Constants.GasConstant * temperature;
        AssertClose.Absolute(pure.Enthalpy!.Value, caloric.Enthalpy, 1e-10 * (Math.Abs(pure.Enthalpy.Value) + rt), "enthalpy");
        AssertClose.Absolute(pure.Entropy!.Value, caloric.Entropy, 1e-10 * (Math.Abs(pure.Entropy.Value) + Constants.GasConstant), "entropy");
    }

    [Fact]
    public void IdealGasLimit_AddsTheEntropyOfMixing()
    {
        // At 10 Pa the residual parts vanish (B·P/RT ~ 1e-6, so h_r, s_r ~ 1e-6 of RT and R): an
        // equimolar binary has s = mean of the pure s + R ln 2 and h = mean of the pure h, to
        // 1e-5 of R and of RT (the residual remainder).
        var engine = Engine(0, "propane", "n-butane");
        double t = 300, p = 10;
        double Phase(double[] x, out double h)
        {
            var flash = engine.Flash(t, p, x);
            h = flash.Enthalpy!.Value;
            return flash.Entropy!.Value;
        }

        var propane = PropertyModel.For(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson).AtPressure(t, p);
        var butane = PropertyModel.For(FluidCatalog.Embedded.Find("n-butane"), CubicModelKind.PengRobinson).AtPressure(t, p);
        double s = Phase([0.5, 0.5], out double hMix);
        double r = Constants.GasConstant;
        AssertClose.Absolute(0.5 * (propane.Entropy!.Value + butane.Entropy!.Value) + r * Math.Log(2), s, 1e-5 * r, "entropy of mixing");
        AssertClose.Absolute(0.5 * (propane.Enthalpy!.Value + butane.Enthalpy!.Value), hMix, 1e-5 * r * t, "enthalpy of mixing");
    }

    [Fact]
    public void WithoutHeatCapacity_CaloricIsNullWithTheReason()
    {
        var inline = InlineFluid.Parse("inline:tc=400K,pc=4e6Pa,omega=0.2");
        var components = new[] { FluidCatalog.Embedded.Find("propane"), inline };
        var properties = new MixtureProperties(components);
        Assert.NotNull(properties.UnavailableReason);
        var model = new CubicMixtureModel(components.Select(c => CubicModel.For(CubicModelKind.PengRobinson, c)).ToList());
        Assert.Null(properties.Caloric(model.Residual(300, 100, [0.5, 0.5]), 1e5, [0.5, 0.5]));
        var engine = new MixtureEquilibrium(model, components);
        Assert.Throws<Core.Errors.FluidDataException>(() => engine.FlashAtEnthalpy(1e5, 0, [0.5, 0.5]));
        Assert.Null(engine.Flash(300, 1e4, [0.5, 0.5]).Enthalpy);
    }
}
