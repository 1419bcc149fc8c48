using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders a traced phase envelope for <c>envelope</c>: the bubble and dew branches, the
/// critical point (from the tracer, with the Heidemann–Khalil point beside it), the cricondenbar
/// and the cricondentherm, each with temperature_K and pressure_Pa.</summary>
internal static class EnvelopeWriter
{
    /// <summary>Renders as a table, as JSON, or as CSV: one row per traced point (the bubble
    /// branch, then the dew branch) with its branch and the point's JSON members flattened; the
    /// critical point, cricondenbar and cricondentherm are in the JSON and the table. Table and
    /// CSV follow --units (temperatures and pressures only: nothing here is per kilogram).</summary>
    public static string Render(MixtureInput input, PhaseEnvelope envelope, IReadOnlyList<MixtureCriticalPoint> criteria, OutputChoice output) => output.Format switch
    {
        OutputFormat.Json => Json(input, envelope, criteria),
        OutputFormat.Csv => Csv(Json(input, envelope, criteria), output.Units),
        _ => Table(input, envelope, criteria, output.Units),
    };

    private static string Csv(string json, UnitSystem units)
    {
        using var document = System.Text.Json.JsonDocument.Parse(json);
        var points = document.RootElement.GetProperty("points");
        var rows = new List<IReadOnlyList<FlatField>>();
        foreach (string branch in new[] { "bubble", "dew" })
        {
            foreach (var point in points.GetProperty(branch).EnumerateArray())
            {
                rows.Add([new FlatField("branch", [], System.Text.Json.JsonValueKind.String, branch), .. JsonFlattener.Flatten(point)]);
            }
        }

        // A row holds T, P and mole fractions: no per-kilogram value, so no molar mass is needed.
        return FlatCsv.Write(rows, units, molarMass: null);
    }

    /// <summary>The Heidemann–Khalil point nearest the envelope's critical point (or the least dense).</summary>
    private static MixtureCriticalPoint? Criteria(PhaseEnvelope envelope, IReadOnlyList<MixtureCriticalPoint> criteria)
        => criteria.Count == 0 ? null
            : envelope.CriticalPoint is { } c ? criteria.MinBy(p => Math.Abs(p.Temperature - c.Temperature)) : criteria[0];

    private static string StopName(EnvelopeStop stop) => stop switch
    {
        EnvelopeStop.EndPressure => "end_pressure",
        EnvelopeStop.PointLimit => "point_limit",
        _ => "step_too_small",
    };

    private static IEnumerable<string> Notes(MixtureInput input, PhaseEnvelope envelope)
    {
        if (envelope.StopReason != EnvelopeStop.EndPressure)
        {
            yield return envelope.StopReason == EnvelopeStop.StepTooSmall
                ? "the trace stopped before coming back to the minimum pressure (Newton failed at the smallest step); the points given are converged, the rest of the envelope is missing"
                : "the trace reached its point limit before coming back to the minimum pressure; the rest of the envelope is missing";
        }

        foreach (string note in MixtureWriter.InteractionNotes(input.Interactions))
        {
            yield return note;
        }

        if (envelope.Points.Count > 0)
        {
            // The trace's coldest point names every component it passes below the triple point of.
            double lowest = envelope.Points.Min(p => p.Temperature);
            foreach (string caution in Core.Solids.SolidCaution.BelowTriplePoints(input.Mixture.Components, lowest))
            {
                yield return $"the envelope's coldest point: {caution}";
            }
        }

        yield return "points are the feed at its bubble (liquid) or dew (vapour) point with the incipient phase; the critical point is where the two branches meet";
    }

    private static string Table(MixtureInput input, PhaseEnvelope envelope, IReadOnlyList<MixtureCriticalPoint> criteria, UnitSystem units)
    {
        var text = new StringBuilder();
        string tUnit = UnitFormatter.TemperatureLabel(units), pUnit = UnitFormatter.PressureLabel(units);
        string T(double kelvin) => NumberText.Table(UnitFormatter.Temperature(kelvin, units));
        string P(double pascal) => NumberText.Table(UnitFormatter.Pressure(pascal, units));
        text.Append(CultureInfo.InvariantCulture, $"phase envelope of {input.DisplayName}\n");
        text.Append(CultureInfo.InvariantCulture, $"model: {input.Model.Kind.Title()}, van der Waals one-fluid mixing\n\n");
        var points = new TextTable(["branch", $"T ({tUnit})", $"P ({pUnit})"], [false, true, true]);
        foreach (var point in envelope.Points)
        {
            points.Add(point.Branch == EnvelopeBranch.Bubble ? "bubble" : "dew", T(point.Temperature), P(point.Pressure));
        }

        text.Append(points.Render());
        text.Append('\n');
        void Landmark(string name, EnvelopeLandmark? landmark, string missing)
            => text.Append(landmark is { } l
                ? string.Create(CultureInfo.InvariantCulture, $"{name}: T = {T(l.Temperature)} {tUnit}, P = {P(l.Pressure)} {pUnit}\n")
                : $"{name}: undefined ({missing})\n");
        Landmark("critical point", envelope.CriticalPoint, "the trace did not reach it");
        if (Criteria(envelope, criteria) is { } hk)
        {
            text.Append(CultureInfo.InvariantCulture, $"critical point (Heidemann-Khalil criteria): T = {T(hk.Temperature)} {tUnit}, P = {P(hk.Pressure)} {pUnit}\n");
        }

        Landmark("cricondenbar", envelope.Cricondenbar, "no pressure maximum on the traced part");
        Landmark("cricondentherm", envelope.Cricondentherm, "no temperature maximum on the traced part");
        text.Append('\n');
        foreach (string note in Notes(input, envelope))
        {
            text.Append(CultureInfo.InvariantCulture, $"note: {note}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"caution: {CoexistenceWriter.Caution}\n");
        return text.ToString();
    }

    private static string Json(MixtureInput input, PhaseEnvelope envelope, IReadOnlyList<MixtureCriticalPoint> criteria)
    {
        var names = input.Mixture.Components.Select(c => c.Name).ToList();
        var feed = input.Mixture.MoleFractions;
        void Fractions(Utf8JsonWriter json, string key, IReadOnlyList<double> x)
        {
            json.WriteStartObject(key);
            for (int i = 0; i < names.Count; i++)
            {
                json.WriteFinite(names[i], x[i]);
            }

            json.WriteEndObject();
        }

        void Landmark(Utf8JsonWriter json, string key, EnvelopeLandmark? landmark, string missing)
        {
            if (landmark is { } l)
            {
                json.WriteStartObject(key);
                json.WriteFinite("temperature_K", l.Temperature);
                json.WriteFinite("pressure_Pa", l.Pressure);
                json.WriteString("branch", l.Branch == EnvelopeBranch.Bubble ? "bubble" : "dew");
                json.WriteEndObject();
                json.WriteNull($"{key}_unavailable_reason");
            }
            else
            {
                json.WriteNull(key);
                json.WriteString($"{key}_unavailable_reason", missing);
            }
        }

        void Branch(Utf8JsonWriter json, string key, IEnumerable<EnvelopePoint> points, bool bubble)
        {
            json.WriteStartArray(key);
            foreach (var point in points)
            {
                json.WriteStartObject();
                json.WriteFinite("temperature_K", point.Temperature);
                json.WriteFinite("pressure_Pa", point.Pressure);
                Fractions(json, "liquid_mole_fractions", bubble ? feed : point.IncipientComposition);
                Fractions(json, "vapour_mole_fractions", bubble ? point.IncipientComposition : feed);
                json.WriteEndObject();
            }

            json.WriteEndArray();
        }

        return JsonText.WriteLine(json =>
        {
            json.WriteStartObject();
            json.WriteString("mixture", input.DisplayName);
            json.WriteString("eos", input.Model.Kind.Id());
            json.WriteString("model", $"{input.Model.Kind.Title()}, van der Waals one-fluid mixing");
            Fractions(json, "mole_fractions", feed);
            MixtureWriter.WriteInteractions(json, input.Mixture, input.Interactions);
            json.WriteStartObject("points");
            Branch(json, "bubble", envelope.BubblePoints, bubble: true);
            Branch(json, "dew", envelope.DewPoints, bubble: false);
            json.WriteEndObject();
            Landmark(json, "critical_point", envelope.CriticalPoint, "the trace did not reach the critical point");
            if (Criteria(envelope, criteria) is { } hk)
            {
                json.WriteStartObject("critical_point_criteria");
                json.WriteString("method", "Heidemann-Khalil (1980)");
                json.WriteFinite("temperature_K", hk.Temperature);
                json.WriteFinite("pressure_Pa", hk.Pressure);
                json.WriteFinite("density_mol_m3", hk.Density);
                json.WriteEndObject();
            }
            else
            {
                json.WriteNull("critical_point_criteria");
            }

            Landmark(json, "cricondenbar", envelope.Cricondenbar, "no pressure maximum on the traced part of the envelope");
            Landmark(json, "cricondentherm", envelope.Cricondentherm, "no temperature maximum on the traced part of the envelope");
            json.WriteString("stop_reason", StopName(envelope.StopReason));
            json.WriteStartArray("notes");
            foreach (string note in Notes(input, envelope))
            {
                json.WriteStringValue(note);
            }

            json.WriteEndArray();
            json.WriteString("caution", CoexistenceWriter.Caution);
            json.WriteEndObject();
        });
    }
}
