using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Core.Derivatives;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders the explanation of a derivative in measurable quantities (<c>derive
/// --explain</c>) and derivatives from measured values (<c>derive --from-measured</c>).</summary>
internal static class DerivativeWriter
{
    /// <summary>The note on how the uncertainty is propagated.</summary>
    public const string UncertaintyMethod = "first-order propagation of the standard uncertainties given (the GUM law of propagation of uncertainty), the inputs taken as uncorrelated";

    /// <summary>Writes "expression", "expression_origin", "value_from_expression" and "terms".</summary>
    public static void WriteExplanation(Utf8JsonWriter json, DerivativeExplanation explanation)
    {
        json.WriteString("expression", explanation.Text);
        json.WriteString("expression_origin", explanation.Origin);
        json.WriteNumberOrNull("value_from_expression", explanation.Value);
        if (explanation.Value is null)
        {
            var missing = explanation.Terms.Where(t => t.Value is null).Select(t => t.Symbol).ToList();
            json.WriteString("value_from_expression_unavailable_reason", missing.Count > 0
                ? "needs " + string.Join(", ", missing) + ", unavailable at this state (see terms)"
                : "undefined at this state (the expression's denominator vanishes)");
        }

        WriteTerms(json, explanation.Terms, withUncertainty: false);
        json.WriteStartArray("unavailable_quantities");
        foreach (var term in explanation.Unavailable)
        {
            json.WriteStartObject();
            json.WriteString("symbol", term.Symbol);
            json.WriteString("description", term.Description);
            json.WriteString("reason", term.UnavailableReason);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void WriteTerms(Utf8JsonWriter json, IReadOnlyList<DerivativeTerm> terms, bool withUncertainty)
    {
        json.WriteStartArray("terms");
        foreach (var term in terms)
        {
            json.WriteStartObject();
            json.WriteString("symbol", term.Symbol);
            json.WriteString("description", term.Description);
            json.WriteNumberOrNull("value", term.Value);
            if (withUncertainty)
            {
                json.WriteNumberOrNull("standard_uncertainty", term.Uncertainty);
            }

            json.WriteString("unit", term.Unit);
            if (term.UnavailableReason is string reason)
            {
                json.WriteString("unavailable_reason", reason);
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    /// <summary>The CSV columns an explanation adds (none without one).</summary>
    public static IEnumerable<string> CsvHeader(DerivativeExplanation? explanation)
        => explanation is null ? [] : ["expression", "value_from_expression", .. explanation.Terms.SelectMany(t => new[] { t.Symbol, t.Symbol + "_unit" })];

    /// <summary>The CSV cells of an explanation (an empty cell where a value is unavailable).</summary>
    public static IEnumerable<string> CsvCells(DerivativeExplanation? explanation)
        => explanation is null ? [] : [explanation.Text, NumberText.RoundTripOrEmpty(explanation.Value), .. explanation.Terms.SelectMany(t => new[] { NumberText.RoundTripOrEmpty(t.Value), t.Unit })];

    /// <summary>The table lines of an explanation of a model's derivative.</summary>
    public static string Table(DeriveTarget target, DerivativeExplanation explanation, double value, string unit)
    {
        var text = new StringBuilder();
        text.AppendLine();
        text.AppendLine($"in measurable quantities ({explanation.Origin}):");
        text.AppendLine($"  {Readable(target)} = {DerivativeExplanation.Readable(explanation.Text)}");
        text.AppendLine($"  plain text: {explanation.Text}");
        text.AppendLine();
        text.Append(Terms(explanation.Terms, withUncertainty: false));
        text.AppendLine();
        if (explanation.Value is double through)
        {
            text.AppendLine($"value through the expression:            {NumberText.Table(through)} {unit}");
            text.AppendLine($"value from the Helmholtz derivatives:    {NumberText.Table(value)} {unit}"
                + (value != 0 ? $" (relative difference {NumberText.Uncertainty(Math.Abs(through - value) / Math.Abs(value))})" : ""));
        }
        else
        {
            var missing = explanation.Terms.Where(t => t.Value is null).ToList();
            text.AppendLine(missing.Count > 0
                ? $"value through the expression: unavailable: {string.Join(", ", missing.Select(t => t.Symbol))} {(missing.Count == 1 ? "is" : "are")} not given by this state"
                : "value through the expression: undefined at this state (its denominator vanishes)");
        }

        foreach (var term in explanation.Unavailable)
        {
            text.AppendLine($"note: {term.Symbol} is unavailable at this state: {term.UnavailableReason}; a derivative whose expression uses it is refused");
        }

        return text.ToString();
    }

    /// <summary>Renders a derivative (or the speed of sound) from measured values.</summary>
    public static string Measured(DeriveTarget target, MeasurableExpression expression, MeasuredInput input, double value, double? uncertainty, OutputFormat format)
    {
        bool sound = target.Kind == DeriveKind.SpeedOfSound;
        var terms = expression.Quantities.Select(q => DerivativeExplanation.Term(q, input.Values.Value(q), input.Values.Uncertainty(q), null)).ToList();
        if (sound)
        {
            terms.Add(new DerivativeTerm("M", "the molar mass M (kg/mol)", input.MolarMass, input.MolarMassUncertainty, "kg/mol", null));
        }

        var unused = input.Given.Where(q => !expression.Quantities.Contains(q)).Select(MeasurableQuantities.Symbol).ToList();
        string formula = sound ? $"sqrt(({expression.Text})/M)" : expression.Text;
        bool anyUncertainty = terms.Any(t => t.Uncertainty is not null);
        switch (format)
        {
            case OutputFormat.Json:
                return JsonText.Write(json =>
                {
                    json.WriteStartObject();
                    json.WriteString("source", "measured");
                    json.WriteString("of", target.OfName);
                    json.WriteStringOrNull("by", sound ? null : target.By.ToString());
                    json.WriteStringOrNull("hold", sound ? null : target.Hold.ToString());
                    json.WriteString("expression", formula);
                    json.WriteString("expression_origin", sound
                        ? "M*w^2 = -v^2*(dP/dV)_S, with (dP/dV)_S derived by the Jacobian reduction in (T, P) (docs/derivatives.md)"
                        : DerivativeExplanation.Reduced);
                    WriteTerms(json, terms, withUncertainty: true);
                    json.WriteFinite("value", value);
                    json.WriteNumberOrNull("standard_uncertainty", uncertainty);
                    json.WriteString("unit", target.Unit);
                    json.WriteStringOrNull("uncertainty_method", anyUncertainty ? UncertaintyMethod : null);
                    json.WriteStartArray("unused_inputs");
                    foreach (var symbol in unused)
                    {
                        json.WriteStringValue(symbol);
                    }

                    json.WriteEndArray();
                    json.WriteEndObject();
                });
            case OutputFormat.Csv:
                return CsvText.Write(
                    ["of", "by", "hold", "expression", "value", "standard_uncertainty", "unit", .. terms.SelectMany(t => new[] { t.Symbol, t.Symbol + "_standard_uncertainty", t.Symbol + "_unit" })],
                    [[target.OfName, sound ? "" : target.By.ToString(), sound ? "" : target.Hold.ToString(), formula, NumberText.RoundTrip(value), NumberText.RoundTripOrEmpty(uncertainty), target.Unit,
                      .. terms.SelectMany(t => new[] { NumberText.RoundTripOrEmpty(t.Value), NumberText.RoundTripOrEmpty(t.Uncertainty), t.Unit })]]);
            default:
            {
                var text = new StringBuilder();
                text.AppendLine($"{target.Symbol} from measured values (no fluid or model; molar basis; SI units)");
                text.AppendLine($"  {Readable(target)} = {(sound ? $"√(({DerivativeExplanation.Readable(expression.Text)})/M)" : DerivativeExplanation.Readable(expression.Text))}");
                text.AppendLine($"  plain text: {formula}");
                text.AppendLine();
                text.Append(Terms(terms, withUncertainty: true));
                text.AppendLine();
                text.AppendLine(uncertainty is double u
                    ? $"{target.Symbol} = {NumberText.Table(value)} ± {NumberText.Uncertainty(u)} {target.Unit} (standard uncertainty)"
                    : $"{target.Symbol} = {NumberText.Table(value)} {target.Unit} (no uncertainty given on the inputs)");
                if (anyUncertainty)
                {
                    text.AppendLine($"note: {UncertaintyMethod}");
                }

                if (unused.Count > 0)
                {
                    text.AppendLine($"note: given but not used by this expression: {string.Join(", ", unused)}");
                }

                return text.ToString();
            }
        }
    }

    private static string Readable(DeriveTarget target) => target.Kind switch
    {
        DeriveKind.SpeedOfSound => "w",
        DeriveKind.IsobaricHeatCapacityByPressure => "(∂cp/∂P)_T",
        DeriveKind.IsochoricHeatCapacityByVolume => "(∂cv/∂V)_T",
        _ => $"(∂{target.Of}/∂{target.By})_{target.Hold}",
    };

    private static string Terms(IReadOnlyList<DerivativeTerm> terms, bool withUncertainty)
    {
        var table = withUncertainty
            ? new TextTable(["quantity", "value", "standard uncertainty", "unit", "what"], [false, true, true, false, false])
            : new TextTable(["quantity", "value", "unit", "what"], [false, true, false, false]);
        foreach (var t in terms)
        {
            string value = t.Value is double v ? NumberText.Table(v) : "unavailable";
            if (withUncertainty)
            {
                table.Add(t.Symbol, value, t.Uncertainty is double u ? NumberText.Uncertainty(u) : "-", t.Unit, t.Description);
            }
            else
            {
                table.Add(t.Symbol, value, t.Unit, t.Description);
            }
        }

        return table.Render();
    }
}
