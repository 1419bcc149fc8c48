using System.Globalization;

namespace PhaseSlope.Core.Units;

/// <summary>One unit of the unit table: its spellings, its dimension, its exact affine
/// conversion to the SI unit of that dimension, and the published source of the conversion.</summary>
/// <remarks>
/// <para>The conversion is SI = (x + <see cref="Offset"/>) × <see cref="Numerator"/> /
/// <see cref="Denominator"/>, with the three constants held as exact decimals. A value given as
/// text is converted in decimal arithmetic and rounded to a double once, so 40.70 degC is the
/// double nearest to 313.85 and 101.325 kPa is exactly 101325 Pa (see
/// <see cref="ToSi(decimal)"/>). Values outside decimal's range fall back to double arithmetic,
/// where the result is within a few units in the last place of the exact value.</para>
/// <para>Only the temperature scales have an offset; every other unit is a pure factor.</para>
/// </remarks>
/// <param name="Symbol">The canonical spelling, ASCII only (<c>degC</c>, <c>MPa</c>,
/// <c>mol/m3</c>); it is what messages and tables print.</param>
/// <param name="Dimension">The dimension the unit measures.</param>
/// <param name="Offset">Added to the value before scaling (zero except for temperature scales).</param>
/// <param name="Numerator">Numerator of the scale factor to the SI unit.</param>
/// <param name="Denominator">Denominator of the scale factor to the SI unit (one for most units).</param>
/// <param name="Source">Where the conversion comes from (a standard, with section where known,
/// or "from memory").</param>
/// <param name="Aliases">Other accepted spellings of the same unit (typographic forms such as
/// <c>°C</c> or <c>mol/m³</c>); matched case-sensitively like the symbol.</param>
public sealed record Unit(
    string Symbol,
    Dimension Dimension,
    decimal Offset,
    decimal Numerator,
    decimal Denominator,
    string Source,
    IReadOnlyList<string> Aliases)
{
    /// <summary>Whether the conversion is a pure factor (no offset): true for every unit but the
    /// Celsius and Fahrenheit scales.</summary>
    public bool IsLinear => Offset == 0m;

    /// <summary>Every spelling of the unit, the symbol first.</summary>
    public IEnumerable<string> Spellings => Aliases.Prepend(Symbol);

    /// <summary>Converts an exact decimal value in this unit to the SI unit, in decimal
    /// arithmetic, rounded to the nearest double once at the end.</summary>
    /// <param name="value">The value in this unit.</param>
    /// <returns>The SI value; null when the decimal arithmetic overflows (the caller then uses
    /// <see cref="ToSi(double)"/>).</returns>
    public double? ToSi(decimal value)
    {
        try
        {
            return Nearest((value + Offset) * Numerator / Denominator);
        }
        catch (OverflowException)
        {
            return null;
        }
    }

    /// <summary>Converts a double value in this unit to the SI unit.</summary>
    /// <remarks>The value is read back as decimal from its shortest round-trip text, so a value
    /// that came from typed text (44.09562 g/mol, 25 degC) converts as that text does; values
    /// whose decimal reading is not the same double (beyond about 1e-10 … 7.9e28) are converted
    /// in double arithmetic.</remarks>
    /// <param name="value">The value in this unit.</param>
    /// <returns>The SI value (infinite when the value overflows a double).</returns>
    public double ToSi(double value)
    {
        if (ExactDecimal(value) is decimal exact && ToSi(exact) is double fromDecimal)
        {
            return fromDecimal;
        }

        return (value + (double)Offset) * (double)Numerator / (double)Denominator;
    }

    /// <summary>Converts an SI value to this unit (for display), exactly in decimal where the
    /// value fits, in double otherwise.</summary>
    /// <param name="si">The value in the SI unit of <see cref="Dimension"/>.</param>
    /// <returns>The value in this unit.</returns>
    public double FromSi(double si)
    {
        if (ExactDecimal(si) is decimal exact)
        {
            try
            {
                return Nearest(exact * Denominator / Numerator - Offset);
            }
            catch (OverflowException)
            {
                // fall through to double arithmetic
            }
        }

        return si * (double)Denominator / (double)Numerator - (double)Offset;
    }

    /// <summary>The decimal whose nearest double is <paramref name="value"/>, read from the
    /// double's shortest round-trip text; null when decimal cannot hold it to that precision.</summary>
    internal static decimal? ExactDecimal(double value)
    {
        if (!double.IsFinite(value))
        {
            return null;
        }

        if (value == 0.0)
        {
            return 0m;
        }

        return ExactDecimal(value.ToString("R", CultureInfo.InvariantCulture), value);
    }

    /// <summary>The decimal reading of number text, when it rounds to the same double as
    /// <paramref name="asDouble"/> (the text's double reading); null otherwise (too large, or
    /// too small for decimal's 28 fractional digits to keep its precision).</summary>
    internal static decimal? ExactDecimal(string text, double asDouble)
    {
        if (!decimal.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out decimal exact))
        {
            return null;
        }

        return (exact == 0m) != (asDouble == 0.0) || Nearest(exact) != asDouble ? null : exact;
    }

    /// <summary>The double nearest to a decimal. double.Parse rounds correctly, so the decimal's
    /// exact text is parsed; + 0.0 turns a negative zero into zero.</summary>
    private static double Nearest(decimal value)
        => double.Parse(value.ToString(CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture) + 0.0;

    /// <summary>The symbol.</summary>
    public override string ToString() => Symbol;
}
