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
    /// <summary>Renders a state, single-phase or two-phase.</summary>
    public static string State(PropertyModel engine, FluidState state, OutputFormat format, UnitSystem units, StateUncertaintyText? uncertainty = null)
        => format switch
        {
            OutputFormat.Json => Json(engine, state, uncertainty),
            OutputFormat.Csv => FlatCsv.Write([Flat(engine, state, uncertainty)], units, engine.MolarMass, Differences),
            // Without a molar mass only SI tables are allowed (engineering units were refused), which do not use it.
            _ => (!state.Region.HasQuality() ? StateTable(engine, state, state.Single!, units) : TwoPhaseTable(engine, state, units))
                 + (uncertainty?.Table(units, engine.MolarMass ?? double.NaN) ?? ""),
        };

    /// <summary>Keys of a state that are temperature differences (in K in every unit system).</summary>
    public static IReadOnlySet<string> Differences { get; } = new HashSet<string>(StringComparer.Ordinal) { "standard_uncertainty", "superheat_K", "subcooling_K" };

    /// <summary>The state's JSON object flattened into CSV fields.</summary>
    public static IReadOnlyList<FlatField> Flat(PropertyModel engine, FluidState state, StateUncertaintyText? uncertainty = null)
        => new JsonFlattener().Flatten(json => WriteObject(json, engine, state, uncertainty));

    /// <summary>The JSON object of a state (one element of a batch, or the whole output).</summary>
    public static string Json(PropertyModel engine, FluidState state, StateUncertaintyText? uncertainty = null)
        => JsonText.Write(json => WriteObject(json, engine, state, uncertainty));

    private static void WriteObject(Utf8JsonWriter json, PropertyModel engine, FluidState state, StateUncertaintyText? uncertainty)
    {
        json.WriteStartObject();
        WriteHeader(json, engine, state);
        if (!state.Region.HasQuality())
        {
            StateColumns.WriteMembers(json, state.Single!);
            json.WriteNull("liquid");
            json.WriteNull("vapour");
        }
        else
        {
            StateColumns.WriteMixture(json, state);
            var point = state.Coexistence!;
            CoexistenceWriter.WritePhase(json, "liquid", point.Liquid, state.Saturation?.Liquid, engine.MolarMass);
            CoexistenceWriter.WritePhase(json, "vapour", point.Vapour, state.Saturation?.Vapour, engine.MolarMass);
        }

        uncertainty?.WriteJson(json);
        json.WriteEndObject();
    }

    /// <summary>Renders a derivative value of a model's state, with its explanation in measurable
    /// quantities when asked (--explain).</summary>
    public static string Derivative(PropertyModel engine, ThermodynamicState state, Commands.DeriveTarget target, double value, DerivativeExplanation? explanation, OutputFormat format)
    {
        string unit = target.Unit;
        string by = target.By.ToString();
        string hold = target.Hold.ToString();
        return format switch
        {
            OutputFormat.Json => JsonText.Write(json =>
            {
                json.WriteStartObject();
                WriteHeader(json, engine, state);
                json.WriteString("of", target.OfName);
                json.WriteString("by", by);
                json.WriteString("hold", hold);
                json.WriteFinite("value", value);
                json.WriteString("unit", unit);
                json.WriteFinite("temperature_K", state.Temperature);
                json.WriteFinite("pressure_Pa", state.Pressure);
                json.WriteFinite("density_mol_m3", state.Density);
                if (explanation is not null)
                {
                    DerivativeWriter.WriteExplanation(json, explanation);
                }

                json.WriteEndObject();
            }),
            OutputFormat.Csv => CsvText.Write(
                ["of", "by", "hold", "value", "unit", "temperature_K", "pressure_Pa", "density_mol_m3", .. DerivativeWriter.CsvHeader(explanation)],
                [[target.OfName, by, hold, NumberText.RoundTrip(value), unit,
                  NumberText.RoundTrip(state.Temperature), NumberText.RoundTrip(state.Pressure), NumberText.RoundTrip(state.Density), .. DerivativeWriter.CsvCells(explanation)]]),
            _ => $"{Title(engine, state)}{Environment.NewLine}{target.Symbol} = {NumberText.Table(value)} {unit}{Environment.NewLine}"
                 + $"(molar basis; SI units; reference: {engine.Reference.Id}){Environment.NewLine}"
                 + (explanation is null ? "" : DerivativeWriter.Table(target, explanation, value, unit)),
        };
    }

    private static void WriteHeader(Utf8JsonWriter json, PropertyModel engine, ThermodynamicState state)
        => WriteHeader(json, engine, engine.Describe(state));

    private static void WriteHeader(Utf8JsonWriter json, PropertyModel engine, FluidState state)
    {
        json.WriteString("fluid", engine.Fluid.Name);
        ModelText.WriteJson(json, engine.Model.Identity);
        json.WriteString("reference", engine.Reference.Id);
        json.WriteString("phase", state.Region.Id());
        if (!state.Region.HasQuality())
        {
            var single = state.Single!;
            // The model's density root the single phase is on (liquid, vapour or supercritical).
            json.WriteString("branch", single.Phase.ToString().ToLowerInvariant());
        }
        else
        {
            json.WriteNull("branch");
        }

        json.WriteNumberOrNull("quality", state.Quality);
        json.WriteBoolean("metastable", state.Single?.Metastable ?? false);
        json.WriteBoolean("critical", state.Region == FluidRegion.CriticalPoint);
        json.WriteNumberOrNull("saturation_temperature_K", state.SaturationTemperature);
        json.WriteNumberOrNull("superheat_K", state.Superheat);
        json.WriteNumberOrNull("subcooling_K", state.Subcooling);
        var any = state.Single ?? state.Liquid!;
        if (any.UndefinedReason is string reason)
        {
            json.WriteString("undefined_reason", reason);
        }

        if (any.IdealGasUnavailableReason is string missing)
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
        => Title(engine, engine.Describe(state));

    private static string Title(PropertyModel engine, FluidState state)
        => $"{engine.Fluid.Name}, {ModelText.Describe(engine.Model)}: {state.Region.Id()}"
           + (state.Quality is double x && state.Region == FluidRegion.TwoPhase ? $", quality {NumberText.Table(x)}" : "") + " at "
           + $"{NumberText.Table(state.Temperature)} K, {NumberText.Table(UnitFormatter.Pressure(state.Pressure, UnitSystem.Si))} {UnitFormatter.PressureLabel(UnitSystem.Si)}";

    /// <summary>The lines on the saturation temperature and the superheat or subcooling under a
    /// single phase's title (none above Pc or below the lowest valid saturation pressure).</summary>
    private static string SaturationLines(FluidState state, UnitSystem units)
    {
        if (state.SaturationTemperature is not double ts)
        {
            return "";
        }

        string Temperature(double kelvin) => $"{NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Temperature, kelvin, units, double.NaN))} {UnitFormatter.Label(DisplayQuantity.Temperature, units)}";
        string line = $"saturation temperature at this pressure: {Temperature(ts)}";
        if (state.Superheat is double superheat)
        {
            line += $"; superheat {NumberText.Table(superheat)} K";
        }
        else if (state.Subcooling is double subcooling)
        {
            line += $"; subcooling {NumberText.Table(subcooling)} K";
        }

        return line + Environment.NewLine;
    }

    private static string ReferenceLine(PropertyModel engine, ThermodynamicState state)
        => state.IdealGasUnavailableReason is null
            ? $"reference: {engine.Reference.Description}"
            : "reference: none (absolute h, s, u, a and g need the ideal-gas heat capacity cp°, which this fluid does not give)";

    private static string StateTable(PropertyModel engine, FluidState described, ThermodynamicState state, UnitSystem units)
    {
        var table = new TextTable(["property", "value", "unit"], [false, true, false]);
        foreach (var column in StateColumns.All)
        {
            table.Add(column.Title, StateColumns.Display(column, state, units), StateColumns.Unit(column, units));
        }

        var text = new StringBuilder();
        text.AppendLine(Title(engine, described));
        text.Append(SaturationLines(described, units));
        text.AppendLine(ReferenceLine(engine, state));
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

    private static string TwoPhaseTable(PropertyModel engine, FluidState state, UnitSystem units)
    {
        var liquid = state.Liquid!;
        var vapour = state.Vapour!;
        var mixture = new TextTable(["mixture property", "value", "unit"], [false, true, false]);
        mixture.Add("quality (vapour fraction)", NumberText.Table(state.Quality!.Value), "-");
        foreach (var column in StateColumns.All)
        {
            if (StateColumns.MixtureValue(column.Key, state) is { } value)
            {
                mixture.Add(column.Title, StateColumns.Display(column, value, state.MolarMass, units), StateColumns.Unit(column, units));
            }
        }

        var phases = new TextTable(["saturated phase", "liquid", "vapour", "unit"], [false, true, true, false]);
        foreach (var column in StateColumns.All.Where(c => c.Key is not ("temperature_K" or "pressure_Pa")))
        {
            phases.Add(column.Title, StateColumns.Display(column, liquid, units), StateColumns.Display(column, vapour, units), StateColumns.Unit(column, units));
        }

        var text = new StringBuilder();
        text.AppendLine(Title(engine, state));
        text.AppendLine(ReferenceLine(engine, liquid));
        text.AppendLine();
        text.Append(mixture.Render());
        text.AppendLine();
        text.Append(phases.Render());
        text.AppendLine("note: inside the dome the mixture's v, h, s and u are the lever rule on the saturated phases; cp, w and the compressibilities belong to each phase, not to the mixture");
        if (StateColumns.IdealGasNote(liquid) is string unavailable)
        {
            text.AppendLine(unavailable);
        }

        text.AppendLine(CoexistenceWriter.Caution);
        return text.ToString();
    }

    /// <summary>Renders a batch of states: JSON an array of {line, error, state}; CSV one row per
    /// state with <c>line</c> and <c>error</c> first and the flattened state JSON after; a table of
    /// the main values in the chosen units.</summary>
    public static string Batch(PropertyModel engine, IReadOnlyList<StateBatchResult> results, OutputFormat format, UnitSystem units)
    {
        switch (format)
        {
            case OutputFormat.Json:
                return JsonText.Write(json =>
                {
                    json.WriteStartArray();
                    foreach (var r in results)
                    {
                        json.WriteStartObject();
                        json.WriteNumber("line", r.Line);
                        json.WriteStringOrNull("error", r.Error);
                        json.WritePropertyName("state");
                        if (r.State is { } state)
                        {
                            json.WriteRawValue(Json(engine, state));
                        }
                        else
                        {
                            json.WriteNullValue();
                        }

                        json.WriteEndObject();
                    }

                    json.WriteEndArray();
                });
            case OutputFormat.Csv:
                var flattener = new JsonFlattener();
                return FlatCsv.Write(results.Select(r =>
                {
                    List<FlatField> row =
                    [
                        new("line", [], JsonValueKind.Number, r.Line.ToString(CultureInfo.InvariantCulture)),
                        new("error", [], r.Error is null ? JsonValueKind.Null : JsonValueKind.String, r.Error ?? ""),
                    ];
                    if (r.State is { } state)
                    {
                        row.AddRange(flattener.Flatten(json => WriteObject(json, engine, state, null)));
                    }

                    return (IReadOnlyList<FlatField>)row;
                }), units, engine.MolarMass, Differences);
            default:
                double m = engine.MolarMass ?? double.NaN;
                string Show(DisplayQuantity q, double? si) => si is double v ? NumberText.Table(UnitFormatter.Convert(q, v, units, m)) : "";
                var table = new TextTable(
                    ["line", "phase", $"T [{UnitFormatter.Label(DisplayQuantity.Temperature, units)}]", $"P [{UnitFormatter.Label(DisplayQuantity.Pressure, units)}]",
                     $"rho [{UnitFormatter.Label(DisplayQuantity.Density, units)}]", $"h [{UnitFormatter.Label(DisplayQuantity.MolarEnergy, units)}]",
                     $"s [{UnitFormatter.Label(DisplayQuantity.MolarEntropy, units)}]", "quality"],
                    [true, false, true, true, true, true, true, true]);
                foreach (var r in results)
                {
                    var s = r.State;
                    table.Add(r.Line.ToString(CultureInfo.InvariantCulture), s?.Region.Id() ?? "refused",
                        Show(DisplayQuantity.Temperature, s?.Temperature), Show(DisplayQuantity.Pressure, s?.Pressure), Show(DisplayQuantity.Density, s?.Density),
                        Show(DisplayQuantity.MolarEnergy, s?.Enthalpy), Show(DisplayQuantity.MolarEntropy, s?.Entropy), s?.Quality is double x ? NumberText.Table(x) : "");
                }

                var text = new StringBuilder();
                text.AppendLine($"{engine.Fluid.Name}, {ModelText.Describe(engine.Model)}: {results.Count} states, reference: {engine.Reference.Description}");
                text.AppendLine();
                text.Append(table.Render());
                foreach (var r in results.Where(r => r.Error is not null))
                {
                    text.AppendLine($"refused: {r.Error}");
                }

                text.AppendLine(CoexistenceWriter.Caution);
                return text.ToString();
        }
    }
}

/// <summary>One result of <c>state --batch</c>: the row's line and its state or why it was refused.</summary>
/// <param name="Line">1-based physical line in the batch file.</param>
/// <param name="State">The state, or null when the row was refused.</param>
/// <param name="Error">Why the row was refused (line and column named), or null.</param>
internal sealed record StateBatchResult(int Line, FluidState? State, string? Error);
