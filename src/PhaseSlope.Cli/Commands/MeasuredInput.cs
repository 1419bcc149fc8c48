using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary>The user's own values for <c>derive --from-measured</c>: α, κ_T, c_p from the
/// measured list, T, P, v and s from their options, the molar mass, each with an optional standard
/// uncertainty, in molar SI units.</summary>
/// <param name="Values">The values (with their standard uncertainties) of the quantities given.</param>
/// <param name="MolarMass">The molar mass in kg/mol (--molar-mass), or null.</param>
/// <param name="MolarMassUncertainty">Its standard uncertainty, or null.</param>
/// <param name="Given">The quantities given, in notation order.</param>
internal sealed record MeasuredInput(MeasuredValues Values, double? MolarMass, double? MolarMassUncertainty, IReadOnlyList<MeasurableQuantity> Given)
{
    /// <summary>Where each quantity is given on the command line, for messages.</summary>
    public static string Where(MeasurableQuantity quantity) => quantity switch
    {
        MeasurableQuantity.Temperature => "--temperature",
        MeasurableQuantity.Pressure => "--pressure",
        MeasurableQuantity.Volume => "--molar-volume",
        MeasurableQuantity.Entropy => "--entropy",
        MeasurableQuantity.Expansivity => "alpha= in --from-measured",
        MeasurableQuantity.Compressibility => "kappa_t= in --from-measured",
        _ => "cp= in --from-measured",
    };
}

/// <summary>Parses the values of <c>derive --from-measured</c>.</summary>
/// <remarks>Each value is <c>VALUE[ ± UNCERTAINTY][ UNIT]</c> (or <c>+/-</c> for ±); the unit may
/// follow the value, the uncertainty, or both (<c>298.15 ± 0.01 K</c>, <c>25 degC ± 0.02 K</c>); an
/// uncertainty in a temperature unit is a difference (no offset). A standard uncertainty is one
/// standard deviation (GUM), not an expanded one.</remarks>
internal static class MeasuredInputParser
{
    /// <summary>The keys of the measured list.</summary>
    public const string Keys = "alpha, kappa_t, cp";

    /// <summary>Parses the list "alpha=V[±U],kappa_t=V[±U],cp=V[±U]" and the state options.</summary>
    /// <exception cref="UsageException">A bad key, value, unit or uncertainty, a duplicate, or a
    /// value per kilogram without --molar-mass (each named).</exception>
    public static MeasuredInput Parse(string list, string? temperature, string? pressure, string? volume, string? entropy, string? molarMass)
    {
        const string option = "--from-measured";
        double? m = null, um = null;
        if (molarMass is not null)
        {
            (m, um) = Uncertain(molarMass, "--molar-mass",
                t => QuantityParser.ParseMolarMass(t, "--molar-mass"),
                t => QuantityParser.ParseQuantity(t, "--molar-mass", "molar mass", Dimension.MolarMass).Value);
        }

        var values = new MeasuredValues();
        var given = new List<MeasurableQuantity>();
        void Set(MeasurableQuantity q, (double Value, double? U) parsed)
        {
            values.Set(q, parsed.Value, parsed.U);
            given.Add(q);
        }

        if (string.IsNullOrWhiteSpace(list))
        {
            throw new UsageException($"{option}: empty list (give e.g. \"alpha=2.07e-4 1/K,kappa_t=4.52e-10 1/Pa,cp=75.3 J/(mol*K)\"; keys {Keys})");
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (string raw in list.Split(','))
        {
            string item = raw.Trim();
            int eq = item.IndexOf('=', StringComparison.Ordinal);
            if (eq <= 0)
            {
                throw new UsageException($"{option}: '{Clean(item)}' is not key=value (keys {Keys})");
            }

            string key = item[..eq].Trim().ToLowerInvariant();
            string text = item[(eq + 1)..].Trim();
            string where = $"{option} {key}";
            if (key is not ("alpha" or "kappa_t" or "cp"))
            {
                throw new UsageException($"{option}: unknown key '{Clean(item[..eq].Trim())}' (use {Keys}; T, P, v and s have their own options)");
            }

            if (!seen.Add(key))
            {
                throw new UsageException($"{option}: {key} is given twice");
            }

            if (text.Length == 0)
            {
                throw new UsageException($"{where}: no value after '='");
            }

            switch (key)
            {
                case "alpha":
                    Set(MeasurableQuantity.Expansivity, Uncertain(text, where,
                        t => Quantity(t, where, "expansivity", Dimension.InverseTemperature),
                        t => Quantity(t, where, "expansivity", Dimension.InverseTemperature)));
                    break;
                case "kappa_t":
                    Set(MeasurableQuantity.Compressibility, Uncertain(text, where,
                        t => Positive(Quantity(t, where, "compressibility", Dimension.InversePressure), where, t),
                        t => Quantity(t, where, "compressibility", Dimension.InversePressure)));
                    break;
                default:
                    Set(MeasurableQuantity.HeatCapacity, Uncertain(text, where,
                        t => Positive(PerMole(t, where, "heat capacity", Dimension.MolarEntropy, Dimension.SpecificEntropy, m), where, t),
                        t => PerMole(t, where, "heat capacity", Dimension.MolarEntropy, Dimension.SpecificEntropy, m)));
                    break;
            }
        }

        if (temperature is not null)
        {
            Set(MeasurableQuantity.Temperature, Uncertain(temperature, "--temperature",
                t => QuantityParser.ParseTemperature(t, "--temperature"),
                t => QuantityParser.ParseTemperatureDifference(t, "--temperature", allowZero: true)));
        }

        if (pressure is not null)
        {
            Set(MeasurableQuantity.Pressure, Uncertain(pressure, "--pressure",
                t => QuantityParser.ParsePressure(t, "--pressure"),
                t => QuantityParser.ParseQuantity(t, "--pressure", "pressure", Dimension.Pressure).Value));
        }

        if (volume is not null)
        {
            Set(MeasurableQuantity.Volume, Uncertain(volume, "--molar-volume",
                t => Positive(PerMole(t, "--molar-volume", "volume", Dimension.MolarVolume, Dimension.SpecificVolume, m), "--molar-volume", t),
                t => PerMole(t, "--molar-volume", "volume", Dimension.MolarVolume, Dimension.SpecificVolume, m)));
        }

        if (entropy is not null)
        {
            Set(MeasurableQuantity.Entropy, Uncertain(entropy, "--entropy",
                t => PerMole(t, "--entropy", "entropy", Dimension.MolarEntropy, Dimension.SpecificEntropy, m),
                t => PerMole(t, "--entropy", "entropy", Dimension.MolarEntropy, Dimension.SpecificEntropy, m)));
        }

        return new MeasuredInput(values, m, um, [.. MeasurableQuantities.All.Where(given.Contains)]);
    }

    /// <summary>Splits "VALUE ± U UNIT" and parses both parts (the unit written once applies to both).</summary>
    private static (double Value, double? U) Uncertain(string text, string where, Func<string, double> value, Func<string, double> uncertainty)
    {
        string t = text.Trim();
        int at = t.IndexOf('±', StringComparison.Ordinal);
        int length = 1;
        if (at < 0)
        {
            at = t.IndexOf("+/-", StringComparison.Ordinal);
            length = 3;
        }

        if (at < 0)
        {
            return (value(t), null);
        }

        string left = t[..at].Trim();
        string right = t[(at + length)..].Trim();
        if (!QuantityText.TrySplit(left, out string leftNumber, out string leftUnit) || leftNumber.Length == 0
            || !QuantityText.TrySplit(right, out string rightNumber, out string rightUnit) || rightNumber.Length == 0)
        {
            throw new UsageException($"{where}: expected VALUE ± UNCERTAINTY [UNIT] in '{Clean(text)}' (e.g. '298.15 ± 0.01 K')");
        }

        if (right.Contains('±', StringComparison.Ordinal) || right.Contains("+/-", StringComparison.Ordinal))
        {
            throw new UsageException($"{where}: more than one uncertainty in '{Clean(text)}'");
        }

        string valueText = leftUnit.Length > 0 || rightUnit.Length == 0 ? left : $"{leftNumber} {rightUnit}";
        string uncertaintyText = rightUnit.Length > 0 || leftUnit.Length == 0 ? right : $"{rightNumber} {leftUnit}";
        double v = value(valueText);
        double u = uncertainty(uncertaintyText);
        if (!(u >= 0) || !double.IsFinite(u))
        {
            throw new UsageException($"{where}: the standard uncertainty in '{Clean(text)}' must be a finite number >= 0");
        }

        return (v, u);
    }

    /// <summary>A value of a reciprocal quantity (1/K, 1/Pa, 1/MPa, 1/bar): the shared parser reads
    /// a unit starting with a digit as part of a malformed number, so the reciprocal unit is looked
    /// up here in the same table and the number converted by the same exact routine.</summary>
    private static double Quantity(string text, string where, string quantity, Dimension dimension)
    {
        string trimmed = text.Trim();
        if (QuantityText.TrySplit(trimmed, out string number, out string spelling) && number.Length > 0 && spelling.StartsWith("1/", StringComparison.Ordinal))
        {
            double bare = QuantityParser.ParseQuantity(number, where, quantity, dimension).Value;
            if (!UnitTable.TryFind(spelling, out Unit? unit, [dimension]))
            {
                throw new UsageException($"{where}: unknown {quantity} unit '{Clean(spelling)}' in '{Clean(text)}' (use {UnitTable.JoinOr([.. UnitTable.Of([dimension]).Select(u => u.Symbol)])})");
            }

            double converted = QuantityText.Convert(number, bare, unit!);
            return double.IsFinite(converted) ? converted : throw new UsageException($"{where}: {quantity} is too large in '{Clean(text)}'");
        }

        double value = QuantityParser.ParseQuantity(text, where, quantity, dimension).Value;
        return double.IsFinite(value) ? value : throw new UsageException($"{where}: {quantity} is too large in '{Clean(text)}'");
    }

    private static double PerMole(string text, string where, string quantity, Dimension molar, Dimension specific, double? molarMass)
    {
        var parsed = QuantityParser.ParseQuantity(text, where, quantity, molar, specific);
        if (parsed.Unit.Dimension == specific && molarMass is null)
        {
            throw new UsageException($"{where}: a value in {parsed.Unit.Symbol} needs --molar-mass (give it per mole, in {UnitTable.Si(molar).Symbol}, or give --molar-mass)");
        }

        double value = parsed.Unit.Dimension == specific ? parsed.Value * molarMass!.Value : parsed.Value;
        return double.IsFinite(value) ? value : throw new UsageException($"{where}: {quantity} is too large in '{Clean(text)}'");
    }

    private static double Positive(double value, string where, string text)
        => value > 0 ? value : throw new UsageException($"{where}: the value in '{Clean(text)}' must be above zero");

    private static string Clean(string text) => Input.DataFileException.OneLine(text);
}
