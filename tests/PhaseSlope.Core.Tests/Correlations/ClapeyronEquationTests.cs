using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

public class ClapeyronEquationTests(ITestOutputHelper output)
{
    // Saturated water in the IAPWS-95 steam tables (Wagner & Pruss, J. Phys. Chem. Ref. Data 31,
    // 387 (2002)), recalled from memory: °C, P in kPa, v_f and v_g in m³/kg, h_fg in kJ/kg.
    public static TheoryData<double, double, double, double, double> SteamTable() => new()
    {
        { 100, 101.42, 0.001043, 1.6720, 2256.4 },
        { 200, 1554.9, 0.001157, 0.12721, 1939.8 },
    };

    private const double WaterMolarMass = 0.018015268; // kg/mol, IAPWS-95 (same source, from memory)

    [Theory]
    [MemberData(nameof(SteamTable))]
    public void EnthalpyOfVaporization_SteamTableVolumesAndIapwsSlope_GiveTheTabulatedLatentHeat(double celsius, double kiloPascal, double vf, double vg, double hfg)
    {
        double t = celsius + 273.15;
        // d ln P/dT from the IAPWS saturation-pressure equation itself (published coefficients,
        // not a fit), and ΔZ = P·Δv·M/(RT) from the tabulated volumes.
        double slope = WagnerForm.SixTerm(WaterTc, WaterPc).Slope(t, WaterCoefficients);
        double dz = kiloPascal * 1e3 * (vg - vf) * WaterMolarMass / (Constants.GasConstant * t);
        double h = ClapeyronEquation.EnthalpyOfVaporization(t, slope, dz) / WaterMolarMass / 1e3;

        output.WriteLine($"{celsius} °C: ΔZ {dz:F5}, ΔH {h:F2} kJ/kg vs {hfg} ({100 * (h / hfg - 1):+0.000;-0.000} %)");
        // The relation is exact; the inputs are not: P and v_g printed to five significant
        // figures (≤ 5e-5 relative each), v_f to four (it enters Δv at 1e-3 or less of v_g), h_fg
        // to five, and the saturation equation's slope agrees with IAPWS-95 to about 1e-4. Their
        // sum stays below 3e-4; allow 1e-3, still far below the 1/ΔZ factor (≥ 1.6 %) an ideal
        // gas would give, or any slip of R, T² or a unit.
        AssertClose.Relative(hfg, h, 1e-3, $"ΔH at {celsius} °C, kJ/kg");
    }

    [Fact]
    public void LatentHeatEstimator_UsesTheOneRelation_ForTheValueAndItsUncertainty()
    {
        // The estimator's ΔH and u(ΔH) are the relation applied to the fitted slope and to its
        // standard uncertainty (the relation is linear in the slope), to the last bit.
        var fit = VapourPressureFitter.Fit(WagnerForm.ThreeSix(WaterTc, WaterPc), Points(WaterLnPressure, Temperatures(300, 600, 20), 1e-3, new Random(9)));
        var estimator = new LatentHeatEstimator(fit, VolumeChangeModel.Haggenmacher, null, WaterTc, WaterPc);
        foreach (double t in Temperatures(310, 590, 8))
        {
            var point = estimator.At(t);
            Assert.Equal(ClapeyronEquation.EnthalpyOfVaporization(t, fit.Form.Slope(t, fit.Parameters), point.CompressibilityChange), point.EnthalpyOfVaporization);
            Assert.Equal(ClapeyronEquation.EnthalpyOfVaporization(t, fit.SlopeStandardUncertainty(t), point.CompressibilityChange), point.StandardUncertainty);
        }
    }
}
