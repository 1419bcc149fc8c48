using System.Globalization;
using System.Text;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Tests.Fluids;

public class FluidFileTests
{
    private static Fluid ParseText(string text, string origin = FluidFileTestData.Origin) =>
        FluidFile.Parse(new StringReader(text), origin);

    private static FluidDataException ParseFails(string text) =>
        Assert.Throws<FluidDataException>(() => ParseText(text));

    [Fact]
    public void Parse_ValidFile_ReadsEveryField()
    {
        Fluid fluid = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines()));

        Assert.Equal("propane", fluid.Name);
        Assert.Equal(new[] { "R-290", "n-propane" }, fluid.Synonyms);
        Assert.Equal("C3H8", fluid.Formula);
        Assert.Equal("74-98-6", fluid.CasNumber);
        Assert.Equal("alkane", fluid.Family);
        Assert.Equal("sample", fluid.Remarks);
        Assert.Equal(FluidFileTestData.Origin, fluid.Origin);
        Assert.Equal(369.89, fluid.CriticalTemperature.Value, 12);
        Assert.Equal(0.015, fluid.CriticalTemperature.StandardUncertainty!.Value, 12);
        Assert.Equal("Lemmon et al. 2009", fluid.CriticalTemperature.Source);
        Assert.Null(fluid.CriticalPressure.StandardUncertainty);
        Assert.Equal(0.152, fluid.AcentricFactor.Value, 12);
        Assert.Equal(231.036, fluid.NormalBoilingPoint!.Value, 12);
        Assert.Equal(85.525, fluid.TriplePointTemperature!.Value, 12);
    }

    [Fact]
    public void Parse_MegapascalAndGramsPerMole_ConvertsToSi()
    {
        Fluid fluid = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines()));

        Assert.Equal(4251200.0, fluid.CriticalPressure.Value, 6);
        Assert.Equal(0.04409562, fluid.MolarMass!.Value, 14);
        Assert.Equal(5000.0, fluid.CriticalDensity!.Value, 9);
    }

    [Theory]
    [InlineData("4251200 Pa")]
    [InlineData("4251.2 kPa")]
    [InlineData("4.2512 MPa")]
    [InlineData("42.512 bar")]
    [InlineData("4.2512e6 Pa")]
    public void Parse_PressureUnits_AllGiveSamePascals(string written)
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(11, $"critical_pressure {written} | s"));

        Assert.Equal(4251200.0, fluid.CriticalPressure.Value, 6);
    }

    [Theory]
    [InlineData("molar_mass 0.04409562 kg/mol | s", 9)]
    [InlineData("molar_mass 44.09562 g/mol | s", 9)]
    public void Parse_MolarMassUnits_AllGiveKilogramsPerMole(string line, int lineNumber)
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(lineNumber, line));

        Assert.Equal(0.04409562, fluid.MolarMass!.Value, 14);
    }

    [Theory]
    [InlineData("critical_density 5000 mol/m3 | s", 5000.0)]
    [InlineData("critical_density 5000 mol/m³ | s", 5000.0)]
    [InlineData("critical_density 5 mol/L | s", 5000.0)]
    [InlineData("critical_density 5 mol/dm3 | s", 5000.0)]
    // 220.4781 kg/m³ / 0.04409562 kg/mol = 5000 mol/m³
    [InlineData("critical_density 220.4781 kg/m3 | s", 5000.0)]
    [InlineData("critical_molar_volume 200 cm3/mol | s", 5000.0)]
    [InlineData("critical_molar_volume 0.2 L/mol | s", 5000.0)]
    [InlineData("critical_molar_volume 0.0002 m3/mol | s", 5000.0)]
    public void Parse_DensityUnits_ConvertToMolesPerCubicMetre(string line, double expected)
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(12, line));

        Assert.Equal(expected, fluid.CriticalDensity!.Value, 6);
    }

    [Fact]
    public void Parse_MassDensityWithUncertainty_DividesBothByMolarMass()
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(12, "critical_density 220.4781 kg/m3 ± 0.4409562 | s"));

        Assert.Equal(10.0, fluid.CriticalDensity!.StandardUncertainty!.Value, 9);
    }

    [Fact]
    public void Parse_MolarVolumeWithUncertainty_PropagatesToFirstOrder()
    {
        // u(ρ) = u(V)/V² = 2e-6 / (2e-4)² = 50 mol/m³
        Fluid fluid = ParseText(FluidFileTestData.WithLine(12, "critical_molar_volume 200 cm3/mol ± 2 | s"));

        Assert.Equal(50.0, fluid.CriticalDensity!.StandardUncertainty!.Value, 9);
    }

    [Theory]
    [InlineData("critical_pressure 4.2512 MPa ± 0.002 | s")]
    [InlineData("critical_pressure 4.2512 MPa +/- 0.002 | s")]
    [InlineData("critical_pressure 4.2512 MPa ±0.002 | s")]
    [InlineData("critical_pressure 4.2512 MPa+/-0.002|s")]
    public void Parse_UncertaintySpellings_ConvertWithValue(string line)
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(11, line));

        Assert.Equal(2000.0, fluid.CriticalPressure.StandardUncertainty!.Value, 9);
    }

    [Fact]
    public void Parse_AcentricFactorWithUncertainty_Reads()
    {
        Fluid fluid = ParseText(FluidFileTestData.WithLine(13, "acentric_factor 0.152 ± 0.001 | s"));

        Assert.Equal(0.152, fluid.AcentricFactor.Value, 12);
        Assert.Equal(0.001, fluid.AcentricFactor.StandardUncertainty!.Value, 12);
    }

    [Fact]
    public void Parse_CrlfLineEndings_SameAsLf()
    {
        Fluid lf = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines(), "\n"));
        Fluid crlf = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines(), "\r\n"));

        AssertSameFluid(lf, crlf);
        Assert.Equal("sample", crlf.Remarks);
    }

    [Fact]
    public void Parse_ExtraCommentsBlankLinesAndIndentation_SameFluid()
    {
        var noisy = new List<string> { "", "   # leading comment", "\t" };
        foreach (string line in FluidFileTestData.ValidLines())
        {
            noisy.Add("  " + line + "   ");
            noisy.Add("# comment between entries | with a bar and ± sign");
            noisy.Add("");
        }

        Fluid plain = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines()));
        Fluid padded = ParseText(FluidFileTestData.Join(noisy, "\r\n"));

        AssertSameFluid(plain, padded);
    }

    [Fact]
    public void Read_Utf8StreamWithByteOrderMark_ParsesAndLeavesStreamOpen()
    {
        byte[] bytes = new UTF8Encoding(encoderShouldEmitUTF8Identifier: true)
            .GetPreamble()
            .Concat(Encoding.UTF8.GetBytes(FluidFileTestData.Join(FluidFileTestData.ValidLines(), "\r\n")))
            .ToArray();
        using var stream = new MemoryStream(bytes);

        Fluid fluid = FluidFile.Read(stream, "stream-origin");

        Assert.Equal("propane", fluid.Name);
        Assert.Equal(0.015, fluid.CriticalTemperature.StandardUncertainty!.Value, 12);
        Assert.Equal("stream-origin", fluid.Origin);
        Assert.True(stream.CanRead);
    }

    [Fact]
    public void Read_InvalidUtf8_ThrowsFluidDataException()
    {
        byte[] bytes = [.. Encoding.UTF8.GetBytes("format phaseslope-fluid 1\nname pr"), 0xFF, 0xFE, (byte)'\n'];
        using var stream = new MemoryStream(bytes);

        var ex = Assert.Throws<FluidDataException>(() => FluidFile.Read(stream, "bad-bytes.fluid"));

        Assert.Contains("bad-bytes.fluid", ex.Message, StringComparison.Ordinal);
        Assert.Contains("UTF-8", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_CommaDecimalCulture_StillReadsPointDecimals()
    {
        // InvariantGlobalization is on for this repository, so the de-DE culture data is not
        // available; this culture carries the German number conventions (',' decimal, '.' group).
        var german = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        german.NumberFormat.NumberDecimalSeparator = ",";
        german.NumberFormat.NumberGroupSeparator = ".";
        CultureInfo saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = german;
            // The culture really would misread the text: "369.89" is 36989 under it.
            Assert.Equal(36989.0, double.Parse("369.89", CultureInfo.CurrentCulture));

            Fluid fluid = ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines()));

            Assert.Equal(369.89, fluid.CriticalTemperature.Value, 12);
            Assert.Equal(4251200.0, fluid.CriticalPressure.Value, 6);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void Parse_CarbonDioxideWithoutBoilingPoint_LeavesItNull()
    {
        string text = FluidFileTestData.Without("normal_boiling_point");

        Fluid fluid = ParseText(text);

        Assert.Null(fluid.NormalBoilingPoint);
    }

    [Fact]
    public void Parse_OnlyRequiredFields_OptionalOnesNull()
    {
        string text = FluidFileTestData.Join(
        [
            "format phaseslope-fluid 1",
            "name minimal",
            "critical_temperature 100 K | s",
            "critical_pressure 1 MPa | s",
            "acentric_factor 0 | s",
        ]);

        Fluid fluid = ParseText(text);

        Assert.Empty(fluid.Synonyms);
        Assert.Null(fluid.MolarMass);
        Assert.Null(fluid.IdealGasHeatCapacity);
        Assert.Null(fluid.Formula);
        Assert.Null(fluid.CasNumber);
        Assert.Null(fluid.Family);
        Assert.Null(fluid.CriticalDensity);
        Assert.Null(fluid.NormalBoilingPoint);
        Assert.Null(fluid.TriplePointTemperature);
        Assert.Null(fluid.Remarks);
    }

    public static TheoryData<string, string, int, string> InvalidFiles => new()
    {
        // description, file text, expected line, expected field
        { "unknown key", FluidFileTestData.WithExtraLine("critical_temp 369.89 K | s"), 17, "critical_temp" },
        { "duplicate key", FluidFileTestData.WithExtraLine("name butane"), 17, "name" },
        { "duplicate numeric key", FluidFileTestData.WithExtraLine("critical_temperature 369.89 K | s"), 17, "critical_temperature" },
        { "missing name", FluidFileTestData.Without("name"), 16, "name" },
        // The molar mass is optional, but a mass density cannot be converted without it.
        { "mass density without molar mass", FluidFileTestData.Join(FluidFileTestData.ValidLines().Select(l => l.StartsWith("molar_mass ", StringComparison.Ordinal) ? "" : l.StartsWith("critical_density ", StringComparison.Ordinal) ? "critical_density 220.4781 kg/m3 | s" : l)), 12, "critical_density" },
        { "missing critical temperature", FluidFileTestData.Without("critical_temperature"), 16, "critical_temperature" },
        { "missing critical pressure", FluidFileTestData.Without("critical_pressure"), 16, "critical_pressure" },
        { "missing acentric factor", FluidFileTestData.Without("acentric_factor"), 16, "acentric_factor" },
        { "missing format", FluidFileTestData.Without("format"), 3, "format" },
        { "format not first", FluidFileTestData.WithLine(1, "name propane"), 1, "format" },
        { "empty value", FluidFileTestData.WithLine(7, "family"), 7, "family" },
        { "comma decimal", FluidFileTestData.WithLine(10, "critical_temperature 369,89 K | s"), 10, "critical_temperature" },
        { "letters for number", FluidFileTestData.WithLine(10, "critical_temperature abc K | s"), 10, "critical_temperature" },
        { "NaN", FluidFileTestData.WithLine(10, "critical_temperature NaN K | s"), 10, "critical_temperature" },
        { "infinity", FluidFileTestData.WithLine(11, "critical_pressure Infinity Pa | s"), 11, "critical_pressure" },
        { "malformed uncertainty", FluidFileTestData.WithLine(10, "critical_temperature 369.89 K ± x | s"), 10, "critical_temperature" },
        { "dangling ±", FluidFileTestData.WithLine(10, "critical_temperature 369.89 K ± | s"), 10, "critical_temperature" },
        { "trailing text", FluidFileTestData.WithLine(10, "critical_temperature 369.89 K extra | s"), 10, "critical_temperature" },
        { "no value before bar", FluidFileTestData.WithLine(10, "critical_temperature | s"), 10, "critical_temperature" },
        { "celsius", FluidFileTestData.WithLine(10, "critical_temperature 96.74 C | s"), 10, "critical_temperature" },
        { "wrong case unit", FluidFileTestData.WithLine(11, "critical_pressure 4.2512 mpa | s"), 11, "critical_pressure" },
        { "pressure unit on temperature", FluidFileTestData.WithLine(10, "critical_temperature 369.89 Pa | s"), 10, "critical_temperature" },
        { "missing unit", FluidFileTestData.WithLine(10, "critical_temperature 369.89 | s"), 10, "critical_temperature" },
        { "missing molar mass unit", FluidFileTestData.WithLine(9, "molar_mass 44.09562 | s"), 9, "molar_mass" },
        { "unit on acentric factor", FluidFileTestData.WithLine(13, "acentric_factor 0.152 K | s"), 13, "acentric_factor" },
        { "missing source bar", FluidFileTestData.WithLine(11, "critical_pressure 4.2512 MPa"), 11, "critical_pressure" },
        { "empty source", FluidFileTestData.WithLine(11, "critical_pressure 4.2512 MPa |   "), 11, "critical_pressure" },
        { "zero critical temperature", FluidFileTestData.WithLine(10, "critical_temperature 0 K | s"), 10, "critical_temperature" },
        { "negative critical temperature", FluidFileTestData.WithLine(10, "critical_temperature -5 K | s"), 10, "critical_temperature" },
        { "zero critical pressure", FluidFileTestData.WithLine(11, "critical_pressure 0 MPa | s"), 11, "critical_pressure" },
        { "negative critical pressure", FluidFileTestData.WithLine(11, "critical_pressure -1 bar | s"), 11, "critical_pressure" },
        { "zero molar mass", FluidFileTestData.WithLine(9, "molar_mass 0 g/mol | s"), 9, "molar_mass" },
        { "negative molar mass", FluidFileTestData.WithLine(9, "molar_mass -44 g/mol | s"), 9, "molar_mass" },
        { "zero critical density", FluidFileTestData.WithLine(12, "critical_density 0 mol/L | s"), 12, "critical_density" },
        { "acentric factor too low", FluidFileTestData.WithLine(13, "acentric_factor -0.51 | s"), 13, "acentric_factor" },
        { "acentric factor too high", FluidFileTestData.WithLine(13, "acentric_factor 2.01 | s"), 13, "acentric_factor" },
        { "boiling point at Tc", FluidFileTestData.WithLine(14, "normal_boiling_point 369.89 K | s"), 14, "normal_boiling_point" },
        { "boiling point above Tc", FluidFileTestData.WithLine(14, "normal_boiling_point 400 K | s"), 14, "normal_boiling_point" },
        { "triple point at Tc", FluidFileTestData.Join(FluidFileTestData.ValidLines().Take(13).Append("triple_point_temperature 369.89 K | s")), 14, "triple_point_temperature" },
        { "triple point above boiling point", FluidFileTestData.WithLine(15, "triple_point_temperature 240 K | s"), 15, "triple_point_temperature" },
        { "negative uncertainty", FluidFileTestData.WithLine(10, "critical_temperature 369.89 K ± -0.015 | s"), 10, "critical_temperature" },
        { "unsupported version", FluidFileTestData.WithLine(2, "format phaseslope-fluid 2"), 2, "format" },
        { "foreign format tag", FluidFileTestData.WithLine(2, "format some-other-format 1"), 2, "format" },
        { "version not a number", FluidFileTestData.WithLine(2, "format phaseslope-fluid one"), 2, "format" },
        { "density and molar volume", FluidFileTestData.WithExtraLine("critical_molar_volume 200 cm3/mol | s"), 17, "critical_molar_volume" },
        { "upper-case name", FluidFileTestData.WithLine(3, "name Propane"), 3, "name" },
        { "empty synonym", FluidFileTestData.WithLine(4, "synonyms R-290;; n-propane"), 4, "synonyms" },
        { "synonyms equal once normalised", FluidFileTestData.WithLine(4, "synonyms R-290; r290"), 4, "synonyms" },
        { "synonym equal to name", FluidFileTestData.WithLine(4, "synonyms R-290; Pro-pane"), 4, "synonyms" },
        { "CAS check digit", FluidFileTestData.WithLine(6, "cas 74-98-5"), 6, "cas" },
        { "CAS shape", FluidFileTestData.WithLine(6, "cas 7498-6"), 6, "cas" },
    };

    [Theory]
    [MemberData(nameof(InvalidFiles))]
    public void Parse_InvalidFile_ThrowsWithOriginLineAndField(string description, string text, int line, string field)
    {
        FluidDataException ex = ParseFails(text);

        Assert.True(ex.Origin == FluidFileTestData.Origin, description);
        Assert.Equal(line, ex.Line);
        Assert.Equal(field, ex.Field);
        Assert.Contains($"{FluidFileTestData.Origin}:{line}:", ex.Message, StringComparison.Ordinal);
        Assert.Contains($"'{field}'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_UnknownKeyCloseToKnownOne_SuggestsIt()
    {
        FluidDataException ex = ParseFails(FluidFileTestData.WithExtraLine("critical_temprature 369.89 K | s"));

        Assert.Contains("did you mean 'critical_temperature'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_EmptyText_ThrowsNamingFormat()
    {
        FluidDataException ex = ParseFails("");

        Assert.Equal("format", ex.Field);
        Assert.Contains(FluidFileTestData.Origin, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_UnsupportedVersion_MessageNamesSupportedOne()
    {
        FluidDataException ex = ParseFails(FluidFileTestData.WithLine(2, "format phaseslope-fluid 2"));

        Assert.Contains("unsupported format version 2", ex.Message, StringComparison.Ordinal);
    }

    private static void AssertSameFluid(Fluid expected, Fluid actual)
    {
        Assert.Equal(expected.Name, actual.Name);
        Assert.Equal(expected.Synonyms, actual.Synonyms);
        Assert.Equal(expected.Formula, actual.Formula);
        Assert.Equal(expected.CasNumber, actual.CasNumber);
        Assert.Equal(expected.Family, actual.Family);
        Assert.Equal(expected.MolarMass, actual.MolarMass);
        Assert.Equal(expected.CriticalTemperature, actual.CriticalTemperature);
        Assert.Equal(expected.CriticalPressure, actual.CriticalPressure);
        Assert.Equal(expected.AcentricFactor, actual.AcentricFactor);
        Assert.Equal(expected.CriticalDensity, actual.CriticalDensity);
        Assert.Equal(expected.NormalBoilingPoint, actual.NormalBoilingPoint);
        Assert.Equal(expected.TriplePointTemperature, actual.TriplePointTemperature);
        Assert.Equal(expected.Remarks, actual.Remarks);
    }
}
