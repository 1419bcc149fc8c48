using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Output;

/// <summary>What was propagated: the method and the uncertain inputs.</summary>
/// <param name="Choice">Method, samples, seed.</param>
/// <param name="Inputs">The inputs with their standard uncertainties and sources.</param>
internal sealed record UncertaintySummary(UncertaintyChoice Choice, IReadOnlyList<UncertainInput> Inputs);

/// <summary>How a latent-heat band was made: the method (null: linear), the Tc and Pc inputs
/// (empty when none is known) and the band itself.</summary>
internal sealed record LatentBandText(UncertaintyChoice? Choice, IReadOnlyList<UncertainInput> Inputs, Core.Correlations.LatentHeatBand Band)
{
    public string MethodName => Choice?.MethodName ?? "linear";
}

/// <summary>Writes propagated standard uncertainties of coexistence states: the JSON member
/// <c>standard_uncertainty</c> (which the CSV carries flattened) and the table columns and lines.</summary>
internal static class UncertaintyText
{
    /// <summary>One quantity: key (as the value's own key), table title, display quantity, value.</summary>
    public sealed record Quantity(string Key, string Title, DisplayQuantity Display, Func<CoexistenceUncertainty, double?> Value);

    public static IReadOnlyList<Quantity> Quantities { get; } =
    [
        new("temperature_K", "u(T)", DisplayQuantity.Temperature, u => u.Temperature),
        new("pressure_Pa", "u(P)", DisplayQuantity.Pressure, u => u.Pressure),
        new("enthalpy_of_vaporization_J_mol", "u(dH_vap)", DisplayQuantity.MolarEnergy, u => u.EnthalpyOfVaporization),
        new("liquid_density_mol_m3", "u(rho_L)", DisplayQuantity.Density, u => u.LiquidDensity),
        new("vapour_density_mol_m3", "u(rho_V)", DisplayQuantity.Density, u => u.VapourDensity),
    ];

    /// <summary>The JSON member <c>standard_uncertainty</c> of one state.</summary>
    public static void WriteJson(Utf8JsonWriter json, CoexistenceUncertainty values, UncertaintySummary summary)
    {
        StartObject(json, summary.Choice);

        foreach (var q in Quantities)
        {
            json.WriteNumberOrNull(q.Key, Checked(q.Value(values), q.Key));
        }

        if (values.Reason is string reason)
        {
            json.WriteString("undefined_reason", reason);
        }
        else
        {
            json.WriteNull("undefined_reason");
        }

        WriteInputs(json, summary.Inputs);
        json.WriteEndObject();
    }

    /// <summary>Opens the <c>standard_uncertainty</c> object with the method (and, for Monte Carlo,
    /// the samples and seed), as every state's uncertainty begins.</summary>
    public static void StartObject(Utf8JsonWriter json, UncertaintyChoice choice)
    {
        json.WriteStartObject("standard_uncertainty");
        json.WriteString("method", choice.MethodName);
        if (choice.Method == PropagationMethod.MonteCarlo)
        {
            json.WriteNumber("samples", choice.Samples);
            json.WriteNumber("seed", choice.Seed);
        }
    }

    /// <summary>The array <c>inputs</c>: each uncertain input with its value, u and source.</summary>
    public static void WriteInputs(Utf8JsonWriter json, IReadOnlyList<UncertainInput> inputs, string key = "inputs")
    {
        json.WriteStartArray(key);
        foreach (var input in inputs)
        {
            json.WriteStartObject();
            json.WriteString("name", input.Name);
            json.WriteFinite("value", input.Value);
            json.WriteFinite("standard_uncertainty", input.StandardUncertainty);
            json.WriteString("uncertainty_source", input.UncertaintySource);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    /// <summary>Table header of a u column; u(T) is a temperature difference and shown in K.</summary>
    public static string Header(Quantity q, UnitSystem units)
        => $"{q.Title} [{(q.Display == DisplayQuantity.Temperature ? "K" : UnitFormatter.Label(q.Display, units))}]";

    /// <summary>Table cell of a u column ("undefined" when null).</summary>
    public static string Cell(Quantity q, CoexistenceUncertainty? values, UnitSystem units, double molarMass)
        => values is not null && Checked(q.Value(values), q.Key) is double v
            ? NumberText.Uncertainty(q.Display == DisplayQuantity.Temperature ? v : UnitFormatter.Convert(q.Display, v, units, molarMass))
            : "undefined";

    /// <summary>Lines naming the method and each input with its uncertainty and source.</summary>
    public static void DescribeInputs(StringBuilder text, UncertaintySummary summary)
    {
        text.AppendLine($"standard uncertainties (u): {summary.Choice.Describe()}, from "
            + string.Join(", ", summary.Inputs.Select(i => $"{i.Name} = {NumberText.Given(i.Value)} +/- {NumberText.Given(i.StandardUncertainty)}")));
        foreach (string source in summary.Inputs.Select(i => i.UncertaintySource).Distinct())
        {
            string names = string.Join(", ", summary.Inputs.Where(i => i.UncertaintySource == source).Select(i => i.Name));
            text.AppendLine($"  u of {names}: {source}");
        }
    }

    /// <summary>Distinct reasons for undefined uncertainties, one note line each.</summary>
    public static void DescribeReasons(StringBuilder text, IEnumerable<CoexistenceUncertainty?> values)
    {
        foreach (string reason in values.Select(v => v?.Reason).OfType<string>().Distinct())
        {
            text.AppendLine($"u undefined: {reason}");
        }
    }

    private static double? Checked(double? value, string key)
        => value is double v ? FiniteNumbers.Check(v, $"u({key})") : null;
}
