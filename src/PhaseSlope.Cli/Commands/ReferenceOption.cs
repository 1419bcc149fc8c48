using System.CommandLine;
using System.Globalization;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary>The --reference option: a built-in convention or a user-defined anchor.</summary>
internal static class ReferenceOption
{
    /// <summary>Creates the option.</summary>
    public static Option<string> Create() => new("--reference")
    {
        Description = "Zero of h and s: ideal-gas (h = s = 0 for the ideal gas at 298.15 K, 1 bar; default), "
            + "nbp (saturated liquid at the normal boiling point, h = s = 0), refrigeration (saturated liquid at 0 degC, "
            + "h = 200 kJ/kg, s = 1 kJ/(kg K)), minus40 (saturated liquid at -40 degC, h = s = 0), or 'T, P, h, s' "
            + "(bare numbers: T in K, P in Pa, h in J/mol, s in J/(mol K), at the stable state T, P; write 'sat' for P to mean the saturated liquid at T)",
        DefaultValueFactory = _ => ReferenceState.IdealGas.Id,
    };

    /// <summary>Parses the option value.</summary>
    public static ReferenceState Parse(string text)
    {
        if (ReferenceState.TryFind(text.Trim(), out var builtIn))
        {
            return builtIn!;
        }

        string[] parts = text.Split(',', StringSplitOptions.TrimEntries);
        if (parts.Length != 4)
        {
            throw new UsageException(
                $"--reference: unknown reference '{text}' (use ideal-gas, nbp, refrigeration, minus40, or 'T, P, h, s' such as '300 K, 1 bar, 0, 0')");
        }

        double t = QuantityParser.ParseTemperature(parts[0], "--reference temperature");
        double? p = string.Equals(parts[1], "sat", StringComparison.OrdinalIgnoreCase)
            ? null
            : QuantityParser.ParsePressure(parts[1], "--reference pressure");
        double h = Number(parts[2], "enthalpy (J/mol)");
        double s = Number(parts[3], "entropy (J/(mol K))");
        return ReferenceState.Custom(t, p, h, s);
    }

    private static double Number(string text, string what)
        => double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value)
            ? value
            : throw new UsageException($"--reference: the {what} '{text}' is not a number");
}
