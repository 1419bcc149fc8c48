using System.Globalization;
using System.Text;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders a resolved mixture for <c>mixture</c>: components with mole and mass fractions,
/// the blend's molar mass, each component's model (alpha function, volume shift), the k_ij of
/// every pair with its source, and the pseudo-critical constants by Kay's rule.</summary>
internal static class MixtureWriter
{
    /// <summary>The note on an assumed zero k_ij.</summary>
    public const string AssumedZeroNote =
        "a pair marked 'assumed zero' has no given or published k_ij; 0 can be far from the fitted value (CO2 and N2 with hydrocarbons take about 0.03-0.13), "
        + "so give one with --kij or in a mixture file";

    /// <summary>The note on the pseudo-critical constants.</summary>
    public const string PseudoCriticalNote =
        "the pseudo-critical constants are a mole-fraction average for reduced conditions, not the mixture's critical point";

    /// <summary>Renders as a table or as JSON (CSV is not offered: the result is not one table).</summary>
    public static string Render(MixtureInput input, CubicMixtureModel model, OutputFormat format)
        => format == OutputFormat.Json ? Json(input, model) : Table(input, model);

    private static string OriginText(MixtureInput input) => input.Origin == MixtureResolver.CommandLineOrigin ? "given on the command line" : input.Origin;

    private static string Table(MixtureInput input, CubicMixtureModel model)
    {
        var mixture = input.Mixture;
        var interactions = input.Interactions;
        var mass = mixture.MassFractions;
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"mixture: {input.DisplayName} ({OriginText(input)})\n");
        if (input.Remarks is not null)
        {
            text.Append(CultureInfo.InvariantCulture, $"remarks: {input.Remarks}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"model: {input.Model.Kind.Title()}, van der Waals one-fluid mixing\n\n");
        var components = new TextTable(
            ["component", "mole fraction", "mass fraction", "M (g/mol)", "Tc (K)", "Pc (kPa)", "omega", "c (cm3/mol)", "alpha"],
            [false, true, true, true, true, true, true, true, false]);
        for (int i = 0; i < mixture.Count; i++)
        {
            var fluid = mixture.Components[i];
            var pure = model.Components[i];
            components.Add(
                fluid.Name,
                NumberText.Table(mixture.MoleFractions[i]),
                mass is null ? "n/a" : NumberText.Table(mass[i]),
                fluid.MolarMass is { } m ? NumberText.Table(m.Value * 1e3) : "n/a",
                NumberText.Table(fluid.CriticalTemperature.Value),
                NumberText.Table(fluid.CriticalPressure.Value / 1e3),
                NumberText.Table(fluid.AcentricFactor.Value),
                NumberText.Table(pure.VolumeShift * 1e6),
                pure.Alpha.Description);
        }

        text.Append(components.Render());
        text.Append('\n');
        text.Append(mixture.MolarMass is double blend
            ? string.Create(CultureInfo.InvariantCulture, $"molar mass of the blend: {NumberText.Table(blend * 1e3)} g/mol\n")
            : $"molar mass of the blend: n/a ({MassBasisNote(input)})\n");
        text.Append(CultureInfo.InvariantCulture,
            $"pseudo-critical (Kay's rule): Tpc = {NumberText.Table(mixture.PseudoCriticalTemperature)} K, Ppc = {NumberText.Table(mixture.PseudoCriticalPressure / 1e3)} kPa, omega = {NumberText.Table(mixture.PseudoAcentricFactor)}\n");
        if (interactions.Pairs.Count > 0)
        {
            text.Append(CultureInfo.InvariantCulture, $"\ninteraction parameters k_ij ({input.Model.Kind.Title()}):\n");
            var pairs = new TextTable(["pair", "k_ij", "origin", "source"], [false, true, false, false]);
            foreach (var pair in interactions.Pairs)
            {
                pairs.Add(
                    $"{mixture.Components[pair.First].Name}, {mixture.Components[pair.Second].Name}",
                    NumberText.Table(pair.Value),
                    OriginName(pair.Origin).Replace('_', ' '),
                    pair.Source);
            }

            text.Append(pairs.Render());
        }

        text.Append('\n');
        foreach (string note in Notes(interactions))
        {
            text.Append(CultureInfo.InvariantCulture, $"note: {note}\n");
        }

        return text.ToString();
    }

    private static string Json(MixtureInput input, CubicMixtureModel model)
    {
        var mixture = input.Mixture;
        var interactions = input.Interactions;
        var mass = mixture.MassFractions;
        return JsonText.WriteLine(json =>
        {
            json.WriteStartObject();
            json.WriteStringOrNull("name", input.Name);
            json.WriteString("origin", OriginText(input));
            json.WriteStringOrNull("remarks", input.Remarks);

            json.WriteString("eos", input.Model.Kind.Id());
            json.WriteString("model", $"{input.Model.Kind.Title()}, van der Waals one-fluid mixing");
            json.WriteStartArray("components");
            for (int i = 0; i < mixture.Count; i++)
            {
                var fluid = mixture.Components[i];
                var pure = model.Components[i];
                json.WriteStartObject();
                json.WriteString("name", fluid.Name);
                json.WriteFinite("mole_fraction", mixture.MoleFractions[i]);
                json.WriteNumberOrNull("mass_fraction", mass?[i]);
                json.WriteNumberOrNull("molar_mass_kg_mol", fluid.MolarMass?.Value);
                json.WriteFinite("critical_temperature_K", fluid.CriticalTemperature.Value);
                json.WriteFinite("critical_pressure_Pa", fluid.CriticalPressure.Value);
                json.WriteFinite("acentric_factor", fluid.AcentricFactor.Value);
                json.WriteString("alpha", pure.Alpha.Description);
                json.WriteFinite("volume_shift_m3_mol", pure.VolumeShift);
                json.WriteString("origin", fluid.Origin);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteNumberOrNull("molar_mass_kg_mol", mixture.MolarMass);
            if (mixture.MolarMass is null)
            {
                json.WriteString("molar_mass_unavailable_reason", MassBasisNote(input));
            }
            else
            {
                json.WriteNull("molar_mass_unavailable_reason");
            }

            WriteInteractions(json, mixture, interactions);
            json.WriteStartObject("pseudo_critical");
            json.WriteString("method", Mixture.KayRuleSource);
            json.WriteFinite("temperature_K", mixture.PseudoCriticalTemperature);
            json.WriteFinite("pressure_Pa", mixture.PseudoCriticalPressure);
            json.WriteFinite("acentric_factor", mixture.PseudoAcentricFactor);
            json.WriteEndObject();
            json.WriteStartArray("notes");
            foreach (string note in Notes(interactions))
            {
                json.WriteStringValue(note);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        });
    }

    /// <summary>Writes <c>"interaction_parameters"</c>: one object per pair with <c>first</c>,
    /// <c>second</c> (component names), <c>kij</c>, <c>origin</c> (given, published, assumed_zero)
    /// and <c>source</c>; every mixture command's JSON names its k_ij this way.</summary>
    public static void WriteInteractions(System.Text.Json.Utf8JsonWriter json, Mixture mixture, InteractionMatrix interactions)
    {
        json.WriteStartArray("interaction_parameters");
        foreach (var pair in interactions.Pairs)
        {
            json.WriteStartObject();
            json.WriteString("first", mixture.Components[pair.First].Name);
            json.WriteString("second", mixture.Components[pair.Second].Name);
            json.WriteFinite("kij", pair.Value);
            json.WriteString("origin", OriginName(pair.Origin));
            json.WriteString("source", pair.Source);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    /// <summary>The notes every mixture result carries about its k_ij: an assumed zero, and the
    /// recalled published values (none when neither applies).</summary>
    public static IEnumerable<string> InteractionNotes(InteractionMatrix interactions)
    {
        if (interactions.AnyAssumedZero)
        {
            yield return AssumedZeroNote;
        }

        if (interactions.Pairs.Any(p => p.Origin == InteractionOrigin.Published))
        {
            yield return RecalledNote;
        }
    }

    /// <summary>The note on published k_ij values, all recalled.</summary>
    public const string RecalledNote =
        "published k_ij values are recalled ('from memory' in their source); check them against the publication before relying on them for design";

    /// <summary>The JSON spelling of an origin: given, published or assumed_zero.</summary>
    public static string OriginName(InteractionOrigin origin) => origin switch
    {
        InteractionOrigin.Given => "given",
        InteractionOrigin.Published => "published",
        _ => "assumed_zero",
    };

    private static string MassBasisNote(MixtureInput input)
        => $"no molar mass for {string.Join(", ", input.Mixture.Components.Where(c => c.MolarMass is null).Select(c => c.Name))}";

    private static IEnumerable<string> Notes(InteractionMatrix interactions) => [.. InteractionNotes(interactions), PseudoCriticalNote];
}
