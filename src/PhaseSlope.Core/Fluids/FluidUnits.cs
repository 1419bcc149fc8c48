using System.Globalization;

namespace PhaseSlope.Core.Fluids;

/// <summary>The units a fluid file may use and their conversion to SI.</summary>
/// <remarks>Unit symbols are case-sensitive ("MPa" is not "mPa").</remarks>
internal static class FluidUnits
{
    internal enum Dimension
    {
        None,
        Temperature,
        Pressure,
        MolarMass,
        MolarDensity,
        MolarVolume,
    }

    internal enum ConversionKind
    {
        /// <summary>SI value = number × factor.</summary>
        Scale,

        /// <summary>A mass density: number × factor is kg/m³, divided by the molar mass gives mol/m³.</summary>
        MassDensity,

        /// <summary>A molar volume: number × factor is m³/mol, its reciprocal is the molar density.</summary>
        Reciprocal,
    }

    internal readonly record struct Conversion(Dimension Dimension, ConversionKind Kind, double Factor)
    {
        /// <summary>number × factor. The factors are powers of ten, so the product is formed in
        /// decimal arithmetic from the number's shortest round-trip text and rounded once:
        /// "44.09562 g/mol" becomes the double nearest to 0.04409562 rather than
        /// 0.044095619999999995 (binary 1e-3 is inexact). A factor of 1 leaves the number as it is;
        /// numbers outside decimal's range take the plain double product.</summary>
        public double Apply(double number)
        {
            if (Factor == 1)
            {
                return number;
            }

            return Math.Abs(number) is > 1e-20 and < 1e20
                ? (double)(decimal.Parse(number.ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture) * (decimal)Factor)
                : number * Factor;
        }
    }

    private static readonly (string Symbol, Conversion Conversion)[] Table =
    [
        ("K", new(Dimension.Temperature, ConversionKind.Scale, 1.0)),
        ("Pa", new(Dimension.Pressure, ConversionKind.Scale, 1.0)),
        ("kPa", new(Dimension.Pressure, ConversionKind.Scale, 1e3)),
        ("MPa", new(Dimension.Pressure, ConversionKind.Scale, 1e6)),
        ("bar", new(Dimension.Pressure, ConversionKind.Scale, 1e5)),
        ("g/mol", new(Dimension.MolarMass, ConversionKind.Scale, 1e-3)),
        ("kg/mol", new(Dimension.MolarMass, ConversionKind.Scale, 1.0)),
        ("mol/m3", new(Dimension.MolarDensity, ConversionKind.Scale, 1.0)),
        ("mol/m³", new(Dimension.MolarDensity, ConversionKind.Scale, 1.0)),
        ("mol/L", new(Dimension.MolarDensity, ConversionKind.Scale, 1e3)),
        ("mol/dm3", new(Dimension.MolarDensity, ConversionKind.Scale, 1e3)),
        ("mol/dm³", new(Dimension.MolarDensity, ConversionKind.Scale, 1e3)),
        ("kg/m3", new(Dimension.MolarDensity, ConversionKind.MassDensity, 1.0)),
        ("kg/m³", new(Dimension.MolarDensity, ConversionKind.MassDensity, 1.0)),
        ("m3/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1.0)),
        ("m³/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1.0)),
        ("L/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1e-3)),
        ("dm3/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1e-3)),
        ("dm³/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1e-3)),
        ("cm3/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1e-6)),
        ("cm³/mol", new(Dimension.MolarVolume, ConversionKind.Reciprocal, 1e-6)),
    ];

    /// <summary>Unit symbols allowed for a dimension, in table order; empty for <see cref="Dimension.None"/>.</summary>
    internal static string[] Allowed(Dimension dimension) =>
        [.. Table.Where(row => row.Conversion.Dimension == dimension).Select(row => row.Symbol)];

    /// <summary>The conversion of a known unit symbol.</summary>
    internal static Conversion Get(string symbol)
    {
        foreach ((string s, Conversion c) in Table)
        {
            if (s == symbol)
            {
                return c;
            }
        }

        throw new KeyNotFoundException($"unit '{symbol}' is not in the table");
    }
}
