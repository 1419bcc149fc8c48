using System.Globalization;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Core.Fluids;

/// <summary>A fluid defined in one argument from its critical constants, such as
/// <c>inline:tc=369.89K±0.05K,pc=4.2512MPa,omega=0.152,molar_mass=44.1g/mol,name=my-propane</c>.</summary>
/// <remarks>
/// <para>The text starts with <see cref="Prefix"/> (so it is never a catalog name, none of which
/// starts with it, nor a path, which is read only when the prefix is absent) and holds
/// <c>key=value</c> pairs separated by commas, in any order, each key once: <c>tc</c>,
/// <c>pc</c> and <c>omega</c> are required, <c>molar_mass</c> and <c>name</c> optional. Keys are
/// matched without regard to case. A value is a number with its unit written on (<c>369.89K</c>)
/// or after a space, optionally followed by <c>±</c> (or <c>+/-</c>) and a standard uncertainty
/// with its own unit of the same kind (<c>4.2512MPa±0.5kPa</c>; no unit: the value's unit).</para>
/// <para>The pairs are read by the fluid-file reader itself (<see cref="FluidFile"/>) as the
/// entries critical_temperature, critical_pressure, acentric_factor, molar_mass and name, so
/// every check of a fluid file applies unchanged: the units a file allows (K only for
/// temperatures), the ranges, the lower-case name. Each value's source is
/// <see cref="Source"/>; the fluid's <see cref="Fluid.Origin"/> is <see cref="Origin"/>.</para>
/// </remarks>
public static class InlineFluid
{
    /// <summary>The prefix that marks an inline definition.</summary>
    public const string Prefix = "inline:";

    /// <summary>The source recorded for every value of an inline definition.</summary>
    public const string Source = "given on the command line";

    /// <summary>The <see cref="Fluid.Origin"/> of an inline fluid, used in error messages.</summary>
    public const string Origin = "inline fluid";

    /// <summary>The name of an inline fluid that does not give one.</summary>
    public const string DefaultName = "inline-fluid";

    /// <summary>The keys of an inline definition and the fluid-file keys they stand for, in the
    /// order the documentation lists them.</summary>
    public static IReadOnlyList<(string Key, string FileKey)> Keys { get; } =
    [
        ("tc", "critical_temperature"),
        ("pc", "critical_pressure"),
        ("omega", "acentric_factor"),
        ("molar_mass", "molar_mass"),
        ("name", "name"),
    ];

    /// <summary>Whether an argument is an inline definition (starts with <see cref="Prefix"/>).</summary>
    public static bool IsInline(string argument)
        => argument is not null && argument.TrimStart().StartsWith(Prefix, StringComparison.OrdinalIgnoreCase);

    /// <summary>Reads an inline definition into a validated fluid.</summary>
    /// <param name="argument">The text, with its prefix.</param>
    /// <returns>The fluid, every value in SI units with the source <see cref="Source"/>.</returns>
    /// <exception cref="FluidDataException">The definition is malformed or a value fails the
    /// fluid-file checks; <see cref="FluidDataException.Field"/> is the inline key (null when the
    /// problem is not one key's) and <see cref="FluidDataException.Problem"/> says what is wrong.</exception>
    public static Fluid Parse(string argument)
    {
        ArgumentNullException.ThrowIfNull(argument);
        if (!IsInline(argument))
        {
            throw Fail(null, $"an inline fluid starts with '{Prefix}'");
        }

        string body = argument.TrimStart()[Prefix.Length..];
        if (body.Trim().Length == 0)
        {
            throw Fail(null, $"no values after '{Prefix}'; give at least tc, pc and omega, e.g. '{Prefix}tc=369.89K,pc=4.2512MPa,omega=0.152'");
        }

        var entries = new List<(string Key, string Text)>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        bool named = false;
        foreach (string piece in body.Split(','))
        {
            string pair = piece.Trim();
            if (pair.Length == 0)
            {
                throw Fail(null, "empty entry (two commas in a row, or a comma at an end)");
            }

            int equals = pair.IndexOf('=');
            if (equals < 0)
            {
                throw Fail(pair, "expected key=value");
            }

            string key = pair[..equals].Trim().ToLowerInvariant();
            string value = pair[(equals + 1)..].Trim();
            string fileKey = FileKey(key) ?? throw Fail(key, UnknownKey(key));
            if (!seen.Add(key))
            {
                throw Fail(key, "given twice");
            }

            if (value.Length == 0)
            {
                throw Fail(key, "no value given");
            }

            if (key == "name")
            {
                named = true;
                entries.Add((fileKey, value));
            }
            else
            {
                entries.Add((fileKey, $"{Quantity(key, value)} | {Source}"));
            }
        }

        if (!named)
        {
            entries.Add(("name", DefaultName));
        }

        try
        {
            return new FluidFileParser(Origin).RunEntries(entries);
        }
        catch (FluidDataException ex)
        {
            string? key = ex.Field is null ? null : Keys.FirstOrDefault(k => k.FileKey == ex.Field).Key ?? ex.Field;
            throw Fail(key, ex.Problem.Replace("required value is missing", "required key is missing", StringComparison.Ordinal));
        }
    }

    /// <summary>The value as fluid-file text, "number unit ± uncertainty" with the uncertainty
    /// converted to the value's unit through the unit table.</summary>
    private static string Quantity(string key, string value)
    {
        string[] parts = value.Split(["±", "+/-"], StringSplitOptions.None);
        if (parts.Length > 2)
        {
            throw Fail(key, "more than one '±'");
        }

        var (number, unit) = Split(key, parts[0], "value");
        if (parts.Length == 1)
        {
            return $"{number} {unit}".TrimEnd();
        }

        var (uNumber, uUnit) = Split(key, parts[1], "uncertainty");
        if (uUnit.Length == 0 || uUnit == unit)
        {
            return $"{number} {unit} ± {uNumber}";
        }

        if (unit.Length == 0)
        {
            throw Fail(key, $"the uncertainty has a unit '{uUnit}' but the value has none");
        }

        // The value's unit is checked by the fluid-file reader; here it need only be in the table.
        if (!UnitTable.TryFind(unit, out Unit? valueUnit) || valueUnit is null)
        {
            return $"{number} {unit} ± {uNumber}"; // the reader names the unknown unit
        }

        if (!UnitTable.TryFind(uUnit, out Unit? uncertaintyUnit, valueUnit.Dimension) || uncertaintyUnit is null)
        {
            throw Fail(key, $"the uncertainty's unit '{uUnit}' is not a unit of the same kind as '{unit}'");
        }

        // A standard uncertainty is a difference: offsets (degC, degF) cancel and only the scale
        // factors of the two units enter, each from the unit table, in decimal arithmetic where
        // the number fits (0.05 degC is then exactly 0.05 K).
        double u = double.Parse(uNumber, NumberStyles.Float, CultureInfo.InvariantCulture);
        double converted;
        try
        {
            decimal ratio = uncertaintyUnit.Numerator / uncertaintyUnit.Denominator / (valueUnit.Numerator / valueUnit.Denominator);
            converted = Unit.ExactDecimal(uNumber, u) is decimal exact ? (double)(exact * ratio) : u * (double)ratio;
        }
        catch (OverflowException)
        {
            throw Fail(key, $"the uncertainty '{parts[1].Trim()}' is too large");
        }

        return $"{number} {unit} ± {converted.ToString("R", CultureInfo.InvariantCulture)}";
    }

    private static (string Number, string Unit) Split(string key, string text, string what)
    {
        if (!QuantityText.TrySplit(text, out string number, out string unit))
        {
            throw Fail(key, $"the {what} '{text.Trim()}' does not start with a number (use a dot as the decimal separator, e.g. '369.89K')");
        }

        if (unit.Length > 0 && (char.IsAsciiDigit(unit[0]) || unit[0] is '.' or '+' or '-'))
        {
            throw Fail(key, $"malformed {what} '{text.Trim()}'");
        }

        return (number, unit);
    }

    private static string? FileKey(string key)
    {
        foreach (var (inline, file) in Keys)
        {
            if (inline == key)
            {
                return file;
            }
        }

        return null;
    }

    private static string UnknownKey(string key)
    {
        string? near = Keys.Select(k => k.Key).MinBy(k => FluidNames.EditDistance(key, k));
        string known = string.Join(", ", Keys.Select(k => k.Key));
        return near is not null && FluidNames.EditDistance(key, near) <= Math.Max(1, key.Length / 3)
            ? $"unknown key; did you mean '{near}'? (keys: {known})"
            : $"unknown key (keys: {known})";
    }

    private static FluidDataException Fail(string? key, string problem) => new(Origin, 0, key, problem);
}
