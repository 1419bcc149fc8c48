using System.Globalization;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Core.Tests.Units;

/// <summary>The one unit table, row by row: each conversion against its published definition.</summary>
/// <remarks>The table promises the double nearest to the exact decimal result (decimal arithmetic,
/// one rounding at the end), so the expected values are compared for equality with the double
/// nearest to the exact value, written out as decimal text: a conversion one unit in the last
/// place off fails. Where the exact value does not terminate (1/1.8, 1/760) it is written to 30
/// significant digits, far more than the 17 that decide a double.</remarks>
public class UnitTableTests
{
    private static double D(string exact) => double.Parse(exact, NumberStyles.Float, CultureInfo.InvariantCulture);

    [Theory]
    // spelling, value, exact SI value                      // source of the conversion
    [InlineData("K", "300", "300")]                          // SI Brochure, 9th ed. (2019): kelvin, SI unit
    [InlineData("degC", "40.70", "313.85")]                  // SI Brochure 9th ed.; NIST SP 811 §4.2.1.1: T/K = t/°C + 273.15
    [InlineData("°C", "-40", "233.15")]                      // same definition, typographic spelling
    [InlineData("degC", "0.01", "273.16")]                   // same
    [InlineData("degF", "80", "299.816666666666666666666666667")] // NIST SP 811 B.9: T/K = (t/°F + 459.67)/1.8
    [InlineData("degF", "-40", "233.15")]                    // same
    [InlineData("degR", "491.67", "273.15")]                 // NIST SP 811 B.9: T/K = (T/°R)/1.8
    [InlineData("Pa", "101325", "101325")]                   // SI Brochure: pascal, SI unit
    [InlineData("mPa", "1", "0.001")]                        // SI Brochure prefixes: milli = 1e-3 (not mega)
    [InlineData("kPa", "8.005", "8005")]                     // SI prefixes: kilo = 1e3
    [InlineData("MPa", "4.2512", "4251200")]                 // SI prefixes: mega = 1e6
    [InlineData("GPa", "0.000101325", "101325")]             // SI prefixes: giga = 1e9
    [InlineData("bar", "1.2328", "123280")]                  // NIST SP 811 B.8: bar = 1e5 Pa exactly
    [InlineData("mbar", "1013.25", "101325")]                // NIST SP 811 B.8: millibar = 1e2 Pa
    [InlineData("psi", "1", "6894.75729316836133672267344535")] // NIST SP 811 B.8: 0.45359237 kg × 9.80665 m/s² / (0.0254 m)²
    [InlineData("psia", "14.7", "101352.932209574911649823299647")] // same unit, absolute spelled out
    [InlineData("atm", "1", "101325")]                       // NIST SP 811 B.8: standard atmosphere, exact
    [InlineData("mmHg", "1", "133.322387415")]               // conventional mmHg 13.5951 g/cm3 × 9.80665 m/s2 × 1 mm (from memory of the standard definition)
    [InlineData("mmHg", "760", "101325.0144354")]            // same: 760 mmHg is not exactly one atmosphere
    [InlineData("torr", "1", "133.322368421052631578947368421")] // NIST SP 811 B.8: torr = 101325/760 Pa
    [InlineData("torr", "760", "101325")]                    // same
    [InlineData("g/mol", "44.09562", "0.04409562")]          // SI prefixes: gram = 1e-3 kg
    [InlineData("kg/mol", "0.018015268", "0.018015268")]     // SI unit
    [InlineData("mol/L", "11.2", "11200")]                   // SI Brochure: litre = 1 dm³
    [InlineData("mol/dm³", "0.3", "300")]                    // SI prefixes: deci, cubed = 1e-3 m³
    [InlineData("kmol/m3", "5.5", "5500")]                   // SI prefixes: kilo
    [InlineData("g/cm3", "0.998", "998")]                    // SI prefixes: 1 g/cm³ = 1000 kg/m³
    [InlineData("cm3/mol", "200", "0.0002")]                 // SI prefixes: centi, cubed = 1e-6 m³
    [InlineData("L/mol", "0.2", "0.0002")]                   // SI Brochure: litre = 1e-3 m³
    [InlineData("kJ/kg", "350.5", "350500")]                 // SI prefixes: kilo
    [InlineData("kJ/(kg·K)", "2.1", "2100")]                 // SI prefixes: kilo
    [InlineData("bar/K", "0.35", "35000")]                   // NIST SP 811 B.8: bar = 1e5 Pa
    [InlineData("1/bar", "1", "0.00001")]                    // reciprocal of the bar
    [InlineData("K/bar", "0.25", "0.0000025")]               // K per bar
    public void ToSi_EachRow_GivesNearestDoubleOfExactValue(string spelling, string value, string exactSi)
    {
        Unit unit = UnitTable.Get(spelling);

        Assert.Equal(D(exactSi), unit.ToSi(decimal.Parse(value, NumberStyles.Float, CultureInfo.InvariantCulture)));
        if (!char.IsAsciiDigit(spelling[0])) // "1 1/bar" is not readable text; 1/bar is a display unit
        {
            Assert.True(QuantityText.TryParse($"{value} {spelling}", "value", [unit.Dimension], out ParsedQuantity parsed, out string problem, out _), problem);
            Assert.Equal(D(exactSi), parsed.Value);
            Assert.Same(unit, parsed.Unit);
        }
    }

    [Theory]
    [InlineData("K", 1.0, 0.0)]
    [InlineData("degC", 1.0, 273.15)]
    [InlineData("degF", 1.0 / 1.8, 459.67 / 1.8)]
    [InlineData("degR", 1.0 / 1.8, 0.0)]
    [InlineData("kPa", 1e3, 0.0)]
    [InlineData("psi", 0.45359237 * 9.80665 / (0.0254 * 0.0254), 0.0)]
    [InlineData("mmHg", 13595.1 * 9.80665 * 1e-3, 0.0)]
    [InlineData("torr", 101325.0 / 760.0, 0.0)]
    [InlineData("atm", 101325.0, 0.0)]
    public void ToSi_AgreesWithDoubleArithmeticOfTheDefinition(string spelling, double slope, double intercept)
    {
        // A second method: the defining formula in double arithmetic, SI = slope·x + intercept.
        // It rounds at each of its two or three operations, so it may differ from the decimal path
        // by a few units in the last place; 1e-14 relative allows that and no more.
        Unit unit = UnitTable.Get(spelling);
        foreach (double x in new[] { -12.5, 0.37, 1.0, 250.0, 6.02e5 })
        {
            double expected = slope * x + intercept;
            double actual = unit.ToSi(x);
            Assert.True(Math.Abs(actual - expected) <= 1e-14 * Math.Max(Math.Abs(expected), Math.Abs(intercept)),
                $"{x} {spelling}: expected {expected:R}, got {actual:R}, relative difference {Math.Abs(actual - expected) / Math.Abs(expected):G3}");
        }
    }

    [Fact]
    public void MillimetreOfMercury_IsTheConventionalOne_AndNotTheTorr()
    {
        // One value per unit: the conventional mmHg, 13.5951 g/cm³ × 9.80665 m/s² × 1 mm (from memory
        // of the standard definition); the torr, 101325/760 Pa, is a separate row, 1.4e-7 smaller.
        Assert.Equal(133.322387415m, UnitTable.MillimetreOfMercury);
        Assert.Equal(133.322387415, UnitTable.Get("mmHg").ToSi(1.0));
        double relative = UnitTable.Get("mmHg").ToSi(1.0) / UnitTable.Get("torr").ToSi(1.0) - 1.0;
        Assert.InRange(relative, 1.42e-7, 1.45e-7); // 0.0190744 Pa / 133.3224 Pa = 1.4307e-7
    }

    [Fact]
    public void Table_EverySpellingIsUnique_AndEveryUnitNamesItsSource()
    {
        var spellings = UnitTable.All.SelectMany(unit => unit.Spellings).ToList();
        Assert.Equal(spellings.Count, spellings.Distinct(StringComparer.Ordinal).Count());
        Assert.All(UnitTable.All, unit => Assert.False(string.IsNullOrWhiteSpace(unit.Source), unit.Symbol));
        Assert.All(UnitTable.All, unit => Assert.True(unit.Numerator > 0 && unit.Denominator > 0, unit.Symbol));
    }

    [Fact]
    public void Table_TheFirstUnitOfEachDimensionIsItsSiUnit()
    {
        foreach (Dimension dimension in Enum.GetValues<Dimension>())
        {
            Unit si = UnitTable.Si(dimension);
            Assert.Equal((0m, 1m, 1m), (si.Offset, si.Numerator, si.Denominator));
        }
    }

    [Theory]
    [InlineData("mpa", Dimension.Pressure, new[] { "MPa", "mPa" })]
    [InlineData("MPA", Dimension.Pressure, new[] { "MPa", "mPa" })]
    [InlineData("kpa", Dimension.Pressure, new[] { "kPa" })]
    [InlineData("TORR", Dimension.Pressure, new[] { "torr" })]
    [InlineData("k", Dimension.Temperature, new[] { "K" })]
    [InlineData("degK", Dimension.Temperature, new[] { "degC", "degF", "degR" })]
    [InlineData("furlong", Dimension.Pressure, new string[0])]
    public void NearMatches_NamesTheUnitsAMisspellingCouldMean(string spelling, Dimension dimension, string[] expected)
    {
        Assert.Equal(expected, UnitTable.NearMatches(spelling, dimension));
        Assert.False(UnitTable.TryFind(spelling, out _, dimension));
    }

    [Fact]
    public void TryParse_AmbiguousCase_IsRefusedWithBothMeanings()
    {
        Assert.False(QuantityText.TryParse("1 mpa", "pressure", [Dimension.Pressure], out _, out string problem, out string? hint));
        Assert.Equal("unknown pressure unit 'mpa'; did you mean MPa or mPa?", problem + hint);
    }

    [Theory]
    [InlineData("degC", 313.85)]
    [InlineData("degF", 299.81666666666666)]
    [InlineData("kPa", 101325.0)]
    [InlineData("psi", 101352.93220957491)]
    [InlineData("mmHg", 101325.0144354)]
    [InlineData("kJ/kg", 350500.0)]
    public void FromSi_InvertsToSi(string spelling, double si)
    {
        Unit unit = UnitTable.Get(spelling);
        // Display and parse share the table: converting out and back in returns the same double.
        Assert.Equal(si, unit.ToSi(unit.FromSi(si)));
    }

    [Theory]
    [InlineData("1e-30", "kPa", 1e-27)]
    [InlineData("3e30", "kPa", 3e33)]
    [InlineData("1e200", "bar", 1e205)]
    public void TryParse_OutsideDecimalRange_FallsBackToDouble(string number, string spelling, double expected)
    {
        // Outside decimal's range the product is formed in double: one rounding of the factor and
        // one of the product, so within 2 units in the last place (4.4e-16 relative).
        Assert.True(QuantityText.TryParse($"{number} {spelling}", "pressure", [Dimension.Pressure], out ParsedQuantity parsed, out _, out _));
        Assert.True(Math.Abs(parsed.Value - expected) <= 4.5e-16 * expected, $"expected {expected:R}, got {parsed.Value:R}");
    }

    [Theory]
    [InlineData("1 psig")]
    [InlineData("2 BARG")]
    public void TryParse_GaugePressure_IsRefused(string text)
    {
        Assert.False(QuantityText.TryParse(text, "pressure", [Dimension.Pressure], out _, out string problem, out _));
        Assert.StartsWith("gauge pressures are not accepted", problem);
    }

    [Fact]
    public void TryParse_BareNumber_IsInTheSiUnitOfTheFirstDimension()
    {
        Assert.True(QuantityText.TryParse("123.456", "temperature", [Dimension.Temperature], out ParsedQuantity t, out _, out _));
        Assert.Equal(123.456, t.Value);
        Assert.Equal("K", t.Unit.Symbol);
        Assert.True(QuantityText.TryParse("500", "density", [Dimension.AmountDensity, Dimension.MassDensity], out ParsedQuantity d, out _, out _));
        Assert.Equal("mol/m3", d.Unit.Symbol);
    }
}
