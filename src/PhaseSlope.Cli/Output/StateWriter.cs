using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders single-phase states (<c>state</c>) and partial derivatives (<c>derive</c>).</summary>
internal static class StateWriter
{
    /// <summary>Renders a state.</summary>
    public static string State(PropertyModel engine, ThermodynamicState state, OutputFormat format, UnitSystem units, StateUncertaintyText? uncertainty = null)
        => format switch
        {
            OutputFormat.Json => JsonText.Write(json =>
            {
                json.WriteStartObject();
                WriteHeader(json, engine, state);
                StateColumns.WriteMembers(json, state);
                uncertainty?.WriteJson(json);
                json.WriteEndObject();
            }),
            OutputFormat.Csv => CsvText.Write(
                [.. StateColumns.All.Select(c => c.Key), .. uncertainty?.CsvHeader ?? []],
                [[.. StateColumns.All.Select(c => c.Value(state) is double v && double.IsFinite(v) ? NumberText.RoundTrip(v) : ""), .. uncertainty?.CsvCells ?? []]]),
            // Without a molar mass only SI tables are allowed (engineering units were refused), which do not use it.
            _ => StateTable(engine, state, units) + (uncertainty?.Table(units, engine.MolarMass ?? double.NaN) ?? ""),
        };

    /// <summary>Renders a derivative value.</summary>
    public static string Derivative(PropertyModel engine, ThermodynamicState state, StateVariable of, StateVariable by, StateVariable hold, double value, OutputFormat format)
    {
        string unit = PartialDerivatives.Unit(of, by);
        string symbol = $"(d{of}/d{by})_{hold}";
        return format switch
        {
            OutputFormat.Json => JsonText.Write(json =>
            {
                json.WriteStartObject();
                WriteHeader(json, engine, state);
                json.WriteString("of", of.ToString());
                json.WriteString("by", by.ToString());
                json.WriteString("hold", hold.ToString());
                json.WriteFinite("value", value);
                json.WriteString("unit", unit);
                json.WriteFinite("temperature_K", state.Temperature);
                json.WriteFinite("pressure_Pa", state.Pressure);
                json.WriteFinite("density_mol_m3", state.Density);
                json.WriteEndObject();
            }),
            OutputFormat.Csv => CsvText.Write(
                ["of", "by", "hold", "value", "unit", "temperature_K", "pressure_Pa", "density_mol_m3"],
                [[of.ToString(), by.ToString(), hold.ToString(), NumberText.RoundTrip(value), unit,
                  NumberText.RoundTrip(state.Temperature), NumberText.RoundTrip(state.Pressure), NumberText.RoundTrip(state.Density)]]),
            _ => $"{Title(engine, state)}{Environment.NewLine}{symbol} = {NumberText.Table(value)} {unit}{Environment.NewLine}"
                 + $"(molar basis; SI units; reference: {engine.Reference.Id}){Environment.NewLine}",
        };
    }

    private static void WriteHeader(Utf8JsonWriter json, PropertyModel engine, ThermodynamicState state)
    {
        json.WriteString("fluid", engine.Fluid.Name);
        ModelText.WriteJson(json, engine.Model.Identity);
        json.WriteString("reference", engine.Reference.Id);
        json.WriteString("phase", state.Phase.ToString().ToLowerInvariant());
        json.WriteBoolean("metastable", state.Metastable);
        json.WriteBoolean("critical", state.Critical);
        if (state.UndefinedReason is string reason)
        {
            json.WriteString("undefined_reason", reason);
        }

        if (state.IdealGasUnavailableReason is string missing)
        {
            // The properties that are null for this reason are the ones that need cp°.
            json.WriteString("ideal_gas_unavailable_reason", missing);
        }

        json.WriteNumberOrNull("molar_mass_kg_mol", engine.MolarMass);
        if (engine.MolarMass is null)
        {
            json.WriteString("molar_mass_unavailable_reason", $"fluid '{engine.Fluid.Name}' gives no molar mass; density_kg_m3 and the speed of sound need it");
        }
    }

    private static string Title(PropertyModel engine, ThermodynamicState state)
        => $"{engine.Fluid.Name}, {ModelText.Describe(engine.Model)}: {state.Phase.ToString().ToLowerInvariant()}{(state.Metastable ? " (metastable)" : "")} at "
           + $"{NumberText.Table(state.Temperature)} K, {NumberText.Table(UnitFormatter.Pressure(state.Pressure, UnitSystem.Si))} {UnitFormatter.PressureLabel(UnitSystem.Si)}";

    private static string StateTable(PropertyModel engine, ThermodynamicState state, UnitSystem units)
    {
        var table = new TextTable(["property", "value", "unit"], [false, true, false]);
        foreach (var column in StateColumns.All)
        {
            table.Add(column.Title, StateColumns.Display(column, state, units), StateColumns.Unit(column, units));
        }

        var text = new StringBuilder();
        text.AppendLine(Title(engine, state));
        text.AppendLine(state.IdealGasUnavailableReason is null
            ? $"reference: {engine.Reference.Description}"
            : "reference: none (absolute h, s, u, a and g need the ideal-gas heat capacity cp°, which this fluid does not give)");
        text.AppendLine();
        text.Append(table.Render());
        if (state.IdealGasExtrapolated)
        {
            var cp = engine.Fluid.IdealGasHeatCapacity!;
            text.AppendLine(string.Create(CultureInfo.InvariantCulture,
                $"note: {state.Temperature:G7} K is outside the ideal-gas heat-capacity range {cp.MinimumTemperature:G6}-{cp.MaximumTemperature:G6} K; caloric values are extrapolated"));
        }

        if (state.Critical)
        {
            text.AppendLine("note: this is the model's critical point; cp, the expansivity and the compressibilities diverge there and are undefined");
        }

        if (state.UndefinedReason is string reason)
        {
            text.AppendLine($"note: {reason}");
        }

        if (StateColumns.IdealGasNote(state) is string unavailable)
        {
            text.AppendLine(unavailable);
        }

        text.AppendLine(CoexistenceWriter.Caution);
        return text.ToString();
    }
}
