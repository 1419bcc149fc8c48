using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The fluid-file keys of the solid phase (triple-point pressure, fusion, the solid's
/// density and heat capacity, published melting and sublimation equations): each bad form is
/// refused naming the key and its line, and the writer keeps every value.</summary>
public class FluidFileSolidKeysTests
{
    private static Fluid ParseText(string text) => FluidFile.Parse(new StringReader(text), FluidFileTestData.Origin);

    /// <summary>The sample propane file without its triple_point_temperature (line 15 blanked)
    /// and with <paramref name="extra"/> as line 17.</summary>
    private static string WithoutTriplePoint(string extra)
    {
        string[] lines = FluidFileTestData.ValidLines();
        lines[14] = "";
        return FluidFileTestData.Join([.. lines, extra]);
    }

    // Each row: the line appended to the valid sample file (it becomes line 17), the key that
    // must be named, and a part of the problem text.
    public static TheoryData<string, string, string> BadLines => new()
    {
        { "triple_point_pressure     0.000172 Pa", "triple_point_pressure", "source" },
        { "triple_point_pressure     0.000172 K | Lemmon et al. 2009", "triple_point_pressure", "unit" },
        { "triple_point_pressure     5 MPa | s", "triple_point_pressure", "critical pressure" },
        { "enthalpy_of_fusion        3.5 kJ | s", "enthalpy_of_fusion", "unit" },
        { "enthalpy_of_fusion        -3.5 kJ/mol | s", "enthalpy_of_fusion", "greater than zero" },
        { "solid_heat_capacity       70 J/mol | s", "solid_heat_capacity", "unit" },
        { "fusion_volume_change      0 m3/mol | s", "fusion_volume_change", "zero" },
        { "solid_density             700 kg/m3 | s", "solid_density", "triple_point_liquid_density" },
        { "triple_point_liquid_density 730 kg/m3 | s", "triple_point_liquid_density", "solid_density" },
        { "melting_pressure_equation reduce 85.525 K | s", "melting_pressure_equation", "malformed equation" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form cubic terms 1000^1 range 85.525-100 K | s", "melting_pressure_equation", "unknown form 'cubic'" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms 1000 range 85.525-100 K | s", "melting_pressure_equation", "malformed term" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms 1000^1.5 range 100-90 K | s", "melting_pressure_equation", "malformed range" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms 1000^1.5 range 85.525-100 degC | s", "melting_pressure_equation", "malformed range" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 psi form powers terms 1000^1.5 range 85.525-100 K | s", "melting_pressure_equation", "pressure unit" },
        // (θ − 1)^1.5 is NaN below the reference temperature, inside the stated range 80-100 K.
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form excess terms 1000^1.5 range 80-100 K | s", "melting_pressure_equation", "no positive finite pressure" },
        { "melting_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms 1000^1.5 range 85.525-100 K", "melting_pressure_equation", "source" },
        { "sublimation_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms -10^1 range 50-90 K | s", "sublimation_pressure_equation", "above the triple point" },
    };

    [Theory]
    [MemberData(nameof(BadLines))]
    public void Parse_BadSolidKey_NamesKeyAndLine(string line, string key, string problem)
    {
        var ex = Assert.Throws<FluidDataException>(() => ParseText(FluidFileTestData.WithExtraLine(line)));

        Assert.Equal(key, ex.Field);
        Assert.Equal(17, ex.Line);
        Assert.Contains(problem, ex.Problem, StringComparison.Ordinal);
        Assert.StartsWith($"{FluidFileTestData.Origin}:17: field '{key}':", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("triple_point_pressure     0.000172 Pa | s", "triple_point_pressure")]
    [InlineData("enthalpy_of_fusion        3.5 kJ/mol | s", "enthalpy_of_fusion")]
    [InlineData("fusion_volume_change      1.2 cm3/mol | s", "fusion_volume_change")]
    [InlineData("solid_heat_capacity       70 J/(mol·K) | s", "solid_heat_capacity")]
    [InlineData("melting_pressure_equation reduce 85.525 K 0.000172 Pa form powers terms 1000^1.5 range 85.525-100 K | s", "melting_pressure_equation")]
    public void Parse_SolidKeyWithoutTriplePoint_Refused(string line, string key)
    {
        var ex = Assert.Throws<FluidDataException>(() => ParseText(WithoutTriplePoint(line)));

        Assert.Equal(key, ex.Field);
        Assert.Equal(17, ex.Line);
        Assert.Contains("triple_point_temperature", ex.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_BothDensitiesAndVolumeChange_Refused()
    {
        string text = FluidFileTestData.Join([.. FluidFileTestData.ValidLines(),
            "solid_density             700 kg/m3 | s", "triple_point_liquid_density 730 kg/m3 | s", "fusion_volume_change 1 cm3/mol | s"]);

        var ex = Assert.Throws<FluidDataException>(() => ParseText(text));

        Assert.Equal("fusion_volume_change", ex.Field);
        Assert.Equal(19, ex.Line);
    }

    [Fact]
    public void Parse_TwoDensities_GiveTheSignedVolumeChange()
    {
        string text = FluidFileTestData.Join([.. FluidFileTestData.ValidLines(),
            "solid_density             0.5 mol/L | s1", "triple_point_liquid_density 0.4 mol/L | s2"]);

        var fluid = ParseText(text);

        // Δv = 1/ρ_L − 1/ρ_S = 1/400 − 1/500 m³/mol = 5e-4 m³/mol (exact in binary to rounding).
        Assert.Equal(1 / 400.0 - 1 / 500.0, fluid.FusionVolumeChange!.Value, 15);
        Assert.Contains("s1", fluid.FusionVolumeChange.Source, StringComparison.Ordinal);
        Assert.Contains("s2", fluid.FusionVolumeChange.Source, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    public void Writer_RoundTrip_KeepsEverySolidValue(string name)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        var again = FluidFile.Parse(new StringReader(FluidFileWriter.Format(fluid)), "round-trip.fluid");

        foreach (var (what, get) in new (string, Func<Fluid, SourcedValue?>)[]
        {
            ("triple_point_pressure", f => f.TriplePointPressure),
            ("enthalpy_of_fusion", f => f.EnthalpyOfFusion),
            ("solid_density", f => f.SolidDensity),
            ("triple_point_liquid_density", f => f.TriplePointLiquidDensity),
            ("fusion_volume_change", f => f.FusionVolumeChange),
            ("solid_heat_capacity", f => f.SolidHeatCapacity),
        })
        {
            var (before, after) = (get(fluid), get(again));
            Assert.True((before is null) == (after is null), $"{name} {what}: present before and after");
            if (before is not null)
            {
                // The writer prints round-trip digits in SI units, so the value comes back bit for bit.
                Assert.True(before.Value == after!.Value, $"{name} {what}: {before.Value:R} became {after.Value:R}");
                Assert.Equal(before.Source, after.Source);
                Assert.Equal(before.StandardUncertainty, after.StandardUncertainty);
            }
        }

        Assert.NotNull(fluid.TriplePointPressure);
        Assert.NotNull(fluid.MeltingPressureEquation);
        Assert.NotNull(fluid.SublimationPressureEquation);
        foreach (var (before, after) in new[] { (fluid.MeltingPressureEquation, again.MeltingPressureEquation), (fluid.SublimationPressureEquation, again.SublimationPressureEquation) })
        {
            Assert.NotNull(after);
            Assert.Equal(before!.Kind, after.Kind);
            Assert.Equal(before.Form, after.Form);
            Assert.Equal(before.ReducingTemperature, after.ReducingTemperature);
            Assert.Equal(before.ReducingPressure, after.ReducingPressure);
            Assert.Equal(before.Coefficients, after.Coefficients);
            Assert.Equal(before.Exponents, after.Exponents);
            Assert.Equal(before.LowestTemperature, after.LowestTemperature);
            Assert.Equal(before.HighestTemperature, after.HighestTemperature);
            Assert.Equal(before.Source, after.Source);
        }
    }
}
