using System.Globalization;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The two small pieces of text a mixture is written in, shared by the command line and
/// the mixture file: a component <c>NAME=FRACTION</c> and an interaction parameter
/// <c>A,B=VALUE</c>. Numbers use '.' as the decimal point whatever the computer's language.</summary>
public static class MixtureSyntax
{
    /// <summary>Splits <c>NAME=FRACTION</c> at its last '=' (a name may contain spaces and hyphens).</summary>
    /// <param name="text">The item, e.g. <c>methane=0.9</c> or <c>carbon dioxide = 0.1</c>.</param>
    /// <param name="name">The component name as written (trimmed).</param>
    /// <param name="fraction">The fraction as written (its range is checked by <see cref="Mixture"/>).</param>
    /// <param name="problem">What is wrong, when the text is malformed.</param>
    /// <returns>True when the text is well formed.</returns>
    public static bool TryParseComponent(string text, out string name, out double fraction, out string problem)
    {
        ArgumentNullException.ThrowIfNull(text);
        name = "";
        fraction = 0;
        int equals = text.LastIndexOf('=');
        if (equals < 0)
        {
            problem = $"'{text.Trim()}' is not NAME=FRACTION (e.g. methane=0.9)";
            return false;
        }

        name = text[..equals].Trim();
        string number = text[(equals + 1)..].Trim();
        if (name.Length == 0)
        {
            problem = $"'{text.Trim()}' has no component name before '='";
            return false;
        }

        if (!TryParseNumber(number, out fraction))
        {
            problem = $"the fraction of '{name}' is '{number}', not a number (write e.g. 0.25 with a '.' decimal point)";
            return false;
        }

        problem = "";
        return true;
    }

    /// <summary>Splits <c>A,B=VALUE</c>: two component names separated by a comma, '=', and k_ij.</summary>
    /// <param name="text">The item, e.g. <c>methane,carbon dioxide=0.0919</c>.</param>
    /// <param name="first">The first name (trimmed).</param>
    /// <param name="second">The second name (trimmed).</param>
    /// <param name="value">k_ij as written (its range is checked by <see cref="Mixture"/>).</param>
    /// <param name="problem">What is wrong, when the text is malformed.</param>
    /// <returns>True when the text is well formed.</returns>
    public static bool TryParseInteraction(string text, out string first, out string second, out double value, out string problem)
    {
        ArgumentNullException.ThrowIfNull(text);
        first = second = "";
        value = 0;
        int equals = text.LastIndexOf('=');
        string names = equals < 0 ? "" : text[..equals];
        string[] parts = names.Split(',');
        if (equals < 0 || parts.Length != 2)
        {
            problem = $"'{text.Trim()}' is not A,B=VALUE (two component names, a comma, '=' and k_ij, e.g. methane,nitrogen=0.0311)";
            return false;
        }

        first = parts[0].Trim();
        second = parts[1].Trim();
        string number = text[(equals + 1)..].Trim();
        if (first.Length == 0 || second.Length == 0)
        {
            problem = $"'{text.Trim()}' lacks a component name (A,B=VALUE)";
            return false;
        }

        if (!TryParseNumber(number, out value))
        {
            problem = $"the k_ij of '{first},{second}' is '{number}', not a number (write e.g. 0.0919 with a '.' decimal point)";
            return false;
        }

        problem = "";
        return true;
    }

    private static bool TryParseNumber(string text, out double value)
        => double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
