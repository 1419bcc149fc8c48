using System.Globalization;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Tests.Units;

public class QuantityParserTests
{
    private const string TOpt = "--temperature";
    private const string POpt = "--pressure";

    /// <summary>Pound-force per square inch to the 13 significant digits of the exact product
    /// 0.45359237 kg × 9.80665 m/s² / (0.0254 m)².</summary>
    private const double Psi = 6894.757293168;

    private static void AssertRelative(double expected, double actual, double tolerance = 1e-13)
    {
        Assert.True(Math.Abs(actual - expected) <= tolerance * Math.Abs(expected),
            $"expected {expected:R}, got {actual:R}");
    }

    // ---------------- temperature: accepted forms ----------------

    [Theory]
    [InlineData("300", 300.0)]
    [InlineData("300 K", 300.0)]
    [InlineData("300K", 300.0)]
    [InlineData("  300   K  ", 300.0)]
    [InlineData("26.85 degC", 300.0)]
    [InlineData("26.85degC", 300.0)]
    [InlineData("26.85 °C", 300.0)]
    [InlineData("26.85°C", 300.0)]
    [InlineData("0 degC", 273.15)]
    [InlineData("-40 degC", 233.15)]
    [InlineData("80 degF", 299.81666666666666)]
    [InlineData("80 °F", 299.81666666666666)]
    [InlineData("80degF", 299.81666666666666)]
    [InlineData("32 degF", 273.15)]
    [InlineData("-40 degF", 233.15)]
    [InlineData("212 degF", 373.15)]
    [InlineData("491.67 degR", 273.15)]
    [InlineData("540 °R", 300.0)]
    [InlineData("3e2 K", 300.0)]
    [InlineData("3.0E+02", 300.0)]
    [InlineData("+300 K", 300.0)]
    [InlineData(".5 K", 0.5)]
    [InlineData("\u221210 degC", 263.15)]
    public void ParseTemperature_AcceptedForm_ReturnsKelvin(string text, double expectedKelvin)
    {
        AssertRelative(expectedKelvin, QuantityParser.ParseTemperature(text, TOpt));
    }

    [Fact]
    public void ParseTemperature_Fahrenheit_MatchesExactScaleDefinition()
    {
        // T/K = (t/°F + 459.67) / 1.8 = 539.67/1.8 = 299.81666…, converted in decimal and rounded once.
        Assert.Equal(double.Parse("299.816666666666666666666667", CultureInfo.InvariantCulture),
            QuantityParser.ParseTemperature("80 degF", TOpt));
    }

    [Theory]
    [InlineData("40.70 degC", "313.85")]
    [InlineData("25 degC", "298.15")]
    [InlineData("0.01 degC", "273.16")]
    [InlineData("-40 degF", "233.15")]
    public void ParseTemperature_DecimalText_GivesNearestDoubleOfExactValue(string text, string exact)
    {
        // Exact decimal conversion at the edge: the same double as typing the kelvin value.
        Assert.Equal(double.Parse(exact, CultureInfo.InvariantCulture), QuantityParser.ParseTemperature(text, TOpt));
    }

    [Theory]
    [InlineData("300 k", "K")]
    [InlineData("26.85 DEGC", "degC")]
    [InlineData("26.85 degc", "degC")]
    public void ParseTemperature_WrongCase_RefusedNamingTheUnit(string text, string suggestion)
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature(text, TOpt));
        Assert.StartsWith(TOpt + ": unknown temperature unit", ex.Message);
        Assert.EndsWith($"; did you mean {suggestion}?", ex.Message);
    }

    [Fact]
    public void ParseTemperature_BareNumber_IsKelvinExactly()
    {
        Assert.Equal(123.456, QuantityParser.ParseTemperature("123.456", TOpt));
    }

    // ---------------- temperature: rejections ----------------

    [Theory]
    [InlineData("")]
    [InlineData("   ")]
    [InlineData("300 degK")]
    [InlineData("300 °K")]
    [InlineData("300 C")]
    [InlineData("0")]
    [InlineData("0 K")]
    [InlineData("-5")]
    [InlineData("-300 degC")]
    [InlineData("\u2212300 degC")]
    [InlineData("-273.15 degC")]
    [InlineData("-459.67 degF")]
    [InlineData("0 degR")]
    [InlineData("NaN")]
    [InlineData("nan K")]
    [InlineData("Infinity")]
    [InlineData("-inf")]
    [InlineData("\u221E K")]
    [InlineData("1,5 K")]
    [InlineData("300,0")]
    [InlineData("abc")]
    [InlineData("K")]
    [InlineData("K 300")]
    [InlineData("1e400")]
    [InlineData("300 5 K")]
    [InlineData("1.2.3 K")]
    [InlineData("1e K")]
    public void ParseTemperature_BadText_ThrowsUsageNamingOptionAndText(string text)
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature(text, TOpt));
        Assert.StartsWith(TOpt + ":", ex.Message);
        Assert.Contains($"'{text}'", ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
        Assert.DoesNotContain('\r', ex.Message);
    }

    [Fact]
    public void ParseTemperature_UnknownUnit_GivesExactOneLineMessage()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("300 degK", TOpt));
        Assert.Equal("--temperature: unknown temperature unit 'degK' in '300 degK'; did you mean degC, degF or degR?", ex.Message);
    }

    [Fact]
    public void ParseTemperature_BelowAbsoluteZero_MessageSaysAbsoluteZero()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("-300 degC", "--t-min"));
        Assert.StartsWith("--t-min:", ex.Message);
        Assert.Contains("-26.85 K", ex.Message);
        Assert.Contains("absolute zero", ex.Message);
    }

    [Fact]
    public void ParseTemperature_Comma_MessageAsksForDot()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("26,85 degC", TOpt));
        Assert.Contains("comma", ex.Message);
        Assert.Contains("dot", ex.Message);
    }

    [Fact]
    public void ParseTemperature_NaN_MessageSaysNotFinite()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("NaN", TOpt));
        Assert.Contains("NaN and infinity are not accepted", ex.Message);
    }

    [Fact]
    public void ParseTemperature_LineBreakInUnit_MessageStaysOnOneLine()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("300 K\nrm", TOpt));
        Assert.DoesNotContain('\n', ex.Message);
        Assert.Contains("\\u000A", ex.Message);
    }

    // ---------------- pressure: accepted forms ----------------

    [Theory]
    [InlineData("101325", 101325.0)]
    [InlineData("101325 Pa", 101325.0)]
    [InlineData("101325Pa", 101325.0)]
    [InlineData("101.325 kPa", 101325.0)]
    [InlineData("0.101325 MPa", 101325.0)]
    [InlineData("101325 mPa", 101.325)] // case-sensitive: mPa is the millipascal
    [InlineData("101.325kPa", 101325.0)]
    [InlineData("0.001 GPa", 1.0e6)]
    [InlineData("1.01325 bar", 101325.0)]
    [InlineData("1 bar", 1.0e5)]
    [InlineData("1013.25 mbar", 101325.0)]
    [InlineData("1 atm", 101325.0)]
    [InlineData("760 torr", 101325.0)]
    [InlineData("1 mmHg", 133.322387415)]
    [InlineData("760 mmHg", 101325.0144354)]
    [InlineData("1.2e5 Pa", 1.2e5)]
    [InlineData("1.2E+5Pa", 1.2e5)]
    [InlineData("12e-1 bar", 1.2e5)]
    [InlineData(".5 bar", 5.0e4)]
    [InlineData("+2 bar", 2.0e5)]
    public void ParsePressure_AcceptedForm_ReturnsPascal(string text, double expectedPa)
    {
        AssertRelative(expectedPa, QuantityParser.ParsePressure(text, POpt));
    }

    [Theory]
    [InlineData("14.7 psi")]
    [InlineData("14.7 psia")]
    [InlineData("14.7psia")]
    public void ParsePressure_PoundPerSquareInch_IsExactPsiFactor(string text)
    {
        AssertRelative(14.7 * Psi, QuantityParser.ParsePressure(text, POpt), 1e-12);
    }

    [Fact]
    public void ParsePressure_OneAtmosphere_IsExactly101325()
    {
        Assert.Equal(101325.0, QuantityParser.ParsePressure("1 atm", POpt));
    }

    [Fact]
    public void ParsePressure_OneBar_IsExactly1e5()
    {
        Assert.Equal(100000.0, QuantityParser.ParsePressure("1 bar", POpt));
    }

    [Theory]
    [InlineData("1 mpa", "MPa or mPa")]
    [InlineData("1 MPA", "MPa or mPa")]
    [InlineData("1 kpa", "kPa")]
    [InlineData("101325 pa", "Pa")]
    [InlineData("1 BAR", "bar")]
    [InlineData("2 ATM", "atm")]
    [InlineData("760 Torr", "torr")]
    [InlineData("14.7 PSI", "psi")]
    [InlineData("1 mmhg", "mmHg")]
    public void ParsePressure_WrongCase_RefusedWithNearMatches(string text, string suggestions)
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParsePressure(text, POpt));
        Assert.Equal($"{POpt}: unknown pressure unit '{text.Split(' ')[1]}' in '{text}'; did you mean {suggestions}?", ex.Message);
    }

    [Fact]
    public void ParsePressure_Millipascal_IsNotMegapascal()
    {
        // "1 mPa" used to mean 1 MPa on the command line; it is now the millipascal.
        Assert.Equal(0.001, QuantityParser.ParsePressure("1 mPa", POpt));
        Assert.Equal(1.0e6, QuantityParser.ParsePressure("1 MPa", POpt));
    }

    [Fact]
    public void ParseMolarMass_NeedsUnit()
    {
        Assert.Equal(0.04409562, QuantityParser.ParseMolarMass("44.09562 g/mol", "--molar-mass"));
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseMolarMass("44.1", "--molar-mass"));
        Assert.StartsWith("--molar-mass: no molar-mass unit", ex.Message);
    }

    // ---------------- pressure: rejections ----------------

    [Theory]
    [InlineData("")]
    [InlineData(" ")]
    [InlineData("1,5 bar")]
    [InlineData("101,325 kPa")]
    [InlineData("1.000,5 Pa")]
    [InlineData("14.7 psig")]
    [InlineData("2 barg")]
    [InlineData("2 BARG")]
    [InlineData("100 kPag")]
    [InlineData("0")]
    [InlineData("0 bar")]
    [InlineData("-1 atm")]
    [InlineData("-0 Pa")]
    [InlineData("NaN")]
    [InlineData("NaN Pa")]
    [InlineData("Infinity")]
    [InlineData("+Infinity bar")]
    [InlineData("1 foo")]
    [InlineData("1 hPa")]
    [InlineData("1 Pascal")]
    [InlineData("bar")]
    [InlineData("1e400 Pa")]
    [InlineData("1e300 GPa")]
    [InlineData("1 2 bar")]
    public void ParsePressure_BadText_ThrowsUsageNamingOptionAndText(string text)
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParsePressure(text, POpt));
        Assert.StartsWith(POpt + ":", ex.Message);
        Assert.Contains($"'{text}'", ex.Message);
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Theory]
    [InlineData("14.7 psig")]
    [InlineData("2 barg")]
    public void ParsePressure_GaugeUnit_MessageAsksForAbsoluteUnit(string text)
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParsePressure(text, "--p-max"));
        Assert.StartsWith("--p-max:", ex.Message);
        Assert.Contains("gauge pressures are not accepted", ex.Message);
        Assert.Contains("absolute", ex.Message);
    }

    [Fact]
    public void ParsePressure_UnknownUnit_MessageListsUnits()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParsePressure("1 foo", POpt));
        Assert.Equal("--pressure: unknown pressure unit 'foo' in '1 foo' "
            + "(use Pa, kPa, MPa, GPa, mPa, bar, mbar, psi, atm, mmHg or torr)", ex.Message);
    }

    [Fact]
    public void ParsePressure_Zero_MessageSaysAboveZero()
    {
        var ex = Assert.Throws<UsageException>(() => QuantityParser.ParsePressure("0 kPa", POpt));
        Assert.Contains("not above zero", ex.Message);
    }

    [Fact]
    public void ParsePressure_EmptyOptionName_ThrowsArgumentException()
    {
        Assert.ThrowsAny<ArgumentException>(() => QuantityParser.ParsePressure("1 bar", ""));
    }

    // ---------------- culture independence ----------------

    /// <summary>A culture whose decimal separator is a comma and group separator a dot. The
    /// build uses invariant globalization, where named cultures may be unavailable, so fall
    /// back to a clone of the invariant culture with German number separators.</summary>
    private static CultureInfo GermanNumberCulture()
    {
        CultureInfo culture;
        try
        {
            culture = (CultureInfo)new CultureInfo("de-DE").Clone();
        }
        catch (CultureNotFoundException)
        {
            culture = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        }
        culture.NumberFormat.NumberDecimalSeparator = ",";
        culture.NumberFormat.NumberGroupSeparator = ".";
        return culture;
    }

    [Fact]
    public void ParsePressure_UnderGermanCulture_StillUsesDotDecimal()
    {
        CultureInfo saved = CultureInfo.CurrentCulture;
        CultureInfo savedUi = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo german = GermanNumberCulture();
            CultureInfo.CurrentCulture = german;
            CultureInfo.CurrentUICulture = german;
            // Sanity: under this culture the framework's default parse reads "101.325" differently.
            Assert.NotEqual(101.325, double.Parse("101.325", CultureInfo.CurrentCulture));

            Assert.Equal(101325.0, QuantityParser.ParsePressure("101.325 kPa", POpt), 9);
            Assert.Equal(300.0, QuantityParser.ParseTemperature("26.85 degC", TOpt), 9);
            Assert.Throws<UsageException>(() => QuantityParser.ParsePressure("1,5 bar", POpt));
            var ex = Assert.Throws<UsageException>(() => QuantityParser.ParseTemperature("-300 degC", TOpt));
            Assert.Contains("-26.85 K", ex.Message);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
            CultureInfo.CurrentUICulture = savedUi;
        }
    }
}
