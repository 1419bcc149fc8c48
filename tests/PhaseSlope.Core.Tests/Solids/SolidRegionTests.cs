using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Solids;

/// <summary>No state is reported as liquid (or any single phase) where the fluid's own data place
/// the solid: the flash and the (T, P) description refuse it with the reason.</summary>
public sealed class SolidRegionTests
{
    private static PropertyModel Engine(string name) => PropertyModel.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson);

    private static InvalidInputException Refused(string name, double t, double p)
        => Assert.Throws<InvalidInputException>(() => Engine(name).Flash(StateProperty.Temperature, t, StateProperty.Pressure, p));

    [Fact]
    public void Water_At260KAndOneAtmosphere_IsIceNotLiquid()
    {
        // Ice Ih: below the triple point 273.16 K and far above the IAPWS (2011) sublimation pressure
        // at 260 K (about 196 Pa) and below the ice Ih melting pressure there (about 138 MPa): solid.
        // Peng-Robinson alone calls it a compressed liquid.
        var ex = Refused("water", 260, 101325);

        Assert.Equal("state", ex.Field);
        Assert.StartsWith("water at 260 K and 101325 Pa is solid by its own data: below its triple point 273.16 K and above its sublimation pressure 195.8", ex.Message, StringComparison.Ordinal);
        Assert.Contains("this tool does not model solid phases", ex.Message, StringComparison.Ordinal);
        // The chosen liquid branch is refused too: it would be reported as an ordinary liquid.
        var engine = Engine("water");
        Assert.Throws<InvalidInputException>(() => engine.Describe(engine.AtPressure(260, 101325, PhaseChoice.Liquid)));
    }

    [Fact]
    public void Water_At265K_IsIceBelowTheMeltingPressureAndLiquidAboveIt()
    {
        // IAPWS R14-08(2011) ice Ih melting pressure at 265 K: 92.34 MPa by the equation in the
        // catalog (coefficients from memory; about 90 MPa). Ice Ih is less dense than water, so its
        // melting line runs from the triple point to lower temperatures: at 265 K ice Ih is stable
        // from the sublimation pressure up to the melting pressure and the liquid above it (up to
        // the ice V melting pressure, some 400 MPa, which the catalog does not give). So 50 MPa is
        // solid and 150 MPa is liquid.
        var ex = Refused("water", 265, 50e6);
        Assert.Contains("below its melting pressure 9.2336", ex.Message, StringComparison.Ordinal);

        var liquid = Engine("water").Flash(StateProperty.Temperature, 265, StateProperty.Pressure, 150e6);
        Assert.Equal(FluidRegion.CompressedLiquid, liquid.Region);
    }

    [Fact]
    public void Water_At300KAndOneAtmosphere_IsStillLiquid()
    {
        var state = Engine("water").Flash(StateProperty.Temperature, 300, StateProperty.Pressure, 101325);
        Assert.Equal(FluidRegion.CompressedLiquid, state.Region);
    }

    [Fact]
    public void WaterVapour_BelowTheSublimationLine_IsStillVapour()
    {
        // IAPWS (2011) sublimation pressure at 250 K is about 76 Pa (from memory): 50 Pa is vapour.
        var state = Engine("water").Flash(StateProperty.Temperature, 250, StateProperty.Pressure, 50);
        Assert.Equal(FluidRegion.SuperheatedVapour, state.Region);
    }

    [Fact]
    public void CarbonDioxide_At200K_IsSolidAt1MPaAndVapourAt01MPa()
    {
        // Span & Wagner (1996) sublimation pressure at 200 K: about 0.155 MPa (equation in the
        // catalog; handbook tables give about 0.16 MPa, from memory). Below the triple point
        // 216.592 K, above it is solid, below it vapour.
        var ex = Refused("carbon-dioxide", 200, 1e6);
        Assert.Contains("above its sublimation pressure 1550", ex.Message, StringComparison.Ordinal);

        var vapour = Engine("carbon-dioxide").Flash(StateProperty.Temperature, 200, StateProperty.Pressure, 1e5);
        Assert.Equal(FluidRegion.SuperheatedVapour, vapour.Region);
    }

    [Fact]
    public void CarbonDioxide_AboveItsMeltingPressure_IsSolid()
    {
        // Span & Wagner (1996) melting pressure at 250 K: P/Pt = 1 + 1955.539(T/Tt - 1) +
        // 2055.4593(T/Tt - 1)^2 = 352.5, about 182.6 MPa (coefficients from memory). 300 MPa is
        // solid; 100 MPa is the compressed liquid.
        var ex = Refused("carbon-dioxide", 250, 300e6);
        Assert.Contains("above its melting pressure 1.82", ex.Message, StringComparison.Ordinal);

        var liquid = Engine("carbon-dioxide").Flash(StateProperty.Temperature, 250, StateProperty.Pressure, 100e6);
        Assert.Equal(FluidRegion.CompressedLiquid, liquid.Region);
    }

    [Fact]
    public void BelowTheTriplePointWithoutSublimationData_TheModelsLiquidIsRefusedItsVapourIsNot()
    {
        // Propane with its triple-point temperature (85.525 K, Lemmon et al. 2009, from memory) and
        // no triple-point pressure or solid data (removed here, whatever the catalog gives): below
        // 85.525 K a liquid of the model is refused, a vapour cannot be placed and is given.
        var propane = FluidCatalog.Embedded.Find("propane");
        var fluid = propane with
        {
            TriplePointPressure = null, EnthalpyOfFusion = null, FusionVolumeChange = null, SolidDensity = null,
            MeltingPressureEquation = null, SublimationPressureEquation = null,
        };
        var engine = new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid));
        var ex = Assert.Throws<InvalidInputException>(() => engine.Flash(StateProperty.Temperature, 80, StateProperty.Pressure, 1e5));
        Assert.Contains("below its triple point 85.525 K, where the condensed phase is the solid", ex.Message, StringComparison.Ordinal);

        var vapour = engine.Flash(StateProperty.Temperature, 80, StateProperty.Pressure, 1e-9);
        Assert.Equal(FluidRegion.SuperheatedVapour, vapour.Region);
    }

    [Fact]
    public void ModelLiquidBelowTheTriplePointPressure_IsRefused()
    {
        // Peng-Robinson's own vapour pressure of water at 273.16 K is 486 Pa, below IAPWS-95's
        // 611.657 Pa (from memory): at 273.2 K and 550 Pa the model gives a liquid where only vapour
        // exists (below the triple-point pressure).
        var ex = Refused("water", 273.2, 550);
        Assert.StartsWith("no liquid exists below the triple-point pressure 611.657 Pa of water", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void QualityBelowTheTriplePoint_IsRefusedNamingIt()
    {
        var engine = Engine("water");
        var ex = Assert.Throws<InvalidInputException>(() => engine.Flash(StateProperty.Temperature, 260, StateProperty.Quality, 0.5));
        Assert.Contains("below the triple point 273.16 K of water", ex.Message, StringComparison.Ordinal);
        ex = Assert.Throws<InvalidInputException>(() => engine.Flash(StateProperty.Pressure, 500, StateProperty.Quality, 0.5));
        Assert.StartsWith("no liquid exists below the triple-point pressure 611.657 Pa", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void PressureEnthalpyFlash_OfAVapourBelowTheTriplePointPressure_StillWorks()
    {
        // Water vapour at 300 K and 500 Pa (below the triple-point pressure, far from the dome):
        // its (P, h) flash gives it back.
        var engine = Engine("water");
        var state = engine.Flash(StateProperty.Temperature, 300, StateProperty.Pressure, 500);
        var back = engine.Flash(StateProperty.Pressure, 500, StateProperty.Enthalpy, state.Enthalpy!.Value);
        // The flash's promise, 1e-10 relative in T (PropertyModel.FlashTolerance with margin).
        AssertClose.Relative(300, back.Temperature, 1e-10, "T from (P, h)");
        Assert.Equal(FluidRegion.SuperheatedVapour, back.Region);
    }
}
