using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders coexistence points as JSON, CSV or a table.</summary>
internal static class CoexistenceWriter
{
    /// <summary>The caution printed under every people-facing table of model results.</summary>
    public const string Caution =
        "Model estimates. Before use for pressure equipment, relief sizing or flammable or toxic service, verify against measured data and follow local codes and licensed engineering practice.";

    /// <summary>Renders rows in a format; <paramref name="single"/> prints one object instead of an array.</summary>
    /// <remarks>CSV is the JSON flattened (<see cref="JsonFlattener"/>): one column per JSON key,
    /// the phase objects' keys prefixed <c>liquid_</c> and <c>vapour_</c>; in engineering units
    /// converted with the unit in each header (<see cref="FlatCsv"/>). JSON is always SI.
    /// <paramref name="byPressure"/> marks a table traced at given pressures (u(P) is then zero
    /// and u(T) is not).</remarks>
    public static string Render(IReadOnlyList<CoexistenceRow> rows, bool single, OutputFormat format, Fluid fluid, IResidualModel model, ReferenceState? reference, UnitSystem units,
        UncertaintySummary? uncertainty = null, bool byPressure = false)
        => format switch
        {
            OutputFormat.Json => Json(rows, single, fluid, model, reference, uncertainty),
            OutputFormat.Csv => Csv(rows, fluid, model, reference, units, uncertainty),
            _ => single ? SingleTable(rows[0], fluid, model, reference, units, uncertainty) : CurveTable(rows, fluid, model, reference, units, uncertainty, byPressure),
        };

    /// <summary>Each row's JSON object flattened to (key, value) fields, in JSON order, as the
    /// rows are enumerated (lazily: one buffer, reused).</summary>
    internal static IEnumerable<IReadOnlyList<FlatField>> Flat(IReadOnlyList<CoexistenceRow> rows, Fluid fluid, IResidualModel model, ReferenceState? reference, UncertaintySummary? uncertainty)
    {
        var flattener = new JsonFlattener();
        return rows.Select(row => flattener.Flatten(json => WriteObject(json, row, fluid, model, reference, uncertainty)));
    }

    /// <summary>Objects whose temperatures are differences (kept in K in engineering CSV).</summary>
    private static readonly HashSet<string> Differences = ["standard_uncertainty"];

    private static string Json(IReadOnlyList<CoexistenceRow> rows, bool single, Fluid fluid, IResidualModel model, ReferenceState? reference, UncertaintySummary? uncertainty)
    {
        return JsonText.Write(json =>
        {
            if (single)
            {
                WriteObject(json, rows[0], fluid, model, reference, uncertainty);
            }
            else
            {
                json.WriteStartArray();
                foreach (var row in rows)
                {
                    WriteObject(json, row, fluid, model, reference, uncertainty);
                }

                json.WriteEndArray();
            }
        });
    }

    private static void WriteObject(Utf8JsonWriter json, CoexistenceRow row, Fluid fluid, IResidualModel model, ReferenceState? reference, UncertaintySummary? uncertainty)
    {
        var point = row.Point;
        json.WriteStartObject();
        json.WriteString("fluid", fluid.Name);
        ModelText.WriteJson(json, model.Identity);
        if (reference is not null && row.Full is not null)
        {
            json.WriteString("reference", reference.Id);
        }

        json.WriteNumberOrNull("molar_mass_kg_mol", fluid.MolarMass?.Value);
        json.WriteBoolean("critical", point.IsCritical);
        foreach (var column in CoexistenceColumns.Flat)
        {
            if (column.Key.StartsWith("liquid_", StringComparison.Ordinal) || column.Key.StartsWith("vapour_", StringComparison.Ordinal))
            {
                continue;
            }

            json.WriteFinite(column.Key, Finite(column.Value(row), column.Key));
        }

        json.WriteFinite("inverse_slope_K_Pa", Finite(point.InverseSlope, "inverse_slope_K_Pa"));
        json.WriteFinite("compressibility_factor_change", point.CompressibilityChange);
        WritePhase(json, "liquid", point.Liquid, row.Full?.Liquid, fluid.MolarMass?.Value);
        WritePhase(json, "vapour", point.Vapour, row.Full?.Vapour, fluid.MolarMass?.Value);
        json.WriteStartObject("solver");
        json.WriteString("method", Kebab(point.Report.Method.ToString()));
        json.WriteFinite("iterations", point.Report.Iterations);
        json.WriteFinite("fugacity_residual", point.Report.FugacityResidual);
        json.WriteString("stop_reason", Kebab(point.Report.StopReason.ToString()));
        json.WriteString("start", Kebab(point.Report.Start.ToString()));
        json.WriteFinite("model_evaluations", point.Report.ModelEvaluations);
        json.WriteFinite("density_uncertainty", point.Report.DensityUncertainty);
        json.WriteEndObject();
        if (uncertainty is not null && row.Uncertainty is { } values)
        {
            UncertaintyText.WriteJson(json, values, uncertainty);
        }

        json.WriteEndObject();
    }

    private static readonly HashSet<string> PointKeys = ["temperature_K", "pressure_Pa"];

    /// <summary>A saturated phase as a JSON object: its full properties and slopes along the line
    /// with cp°, the residual ones without.</summary>
    internal static void WritePhase(Utf8JsonWriter json, string name, PhaseState phase, SaturatedPhase? full, double? molarMass)
    {
        json.WriteStartObject(name);
        if (full is null)
        {
            json.WriteFinite("density_mol_m3", phase.Density);
            json.WriteNumberOrNull("density_kg_m3", phase.Density * molarMass);
            json.WriteFinite("molar_volume_m3_mol", phase.MolarVolume);
            json.WriteFinite("compressibility_factor", phase.CompressibilityFactor);
            json.WriteFinite("ln_fugacity_coefficient", phase.LnFugacityCoefficient);
            json.WriteFinite("residual_enthalpy_J_mol", phase.ResidualEnthalpy);
            json.WriteFinite("residual_entropy_J_molK", phase.ResidualEntropy);
        }
        else
        {
            StateColumns.WriteMembers(json, full.State, PointKeys);
            json.WriteNumberOrNull("density_slope_mol_m3K", full.DensitySlope);
            json.WriteNumberOrNull("enthalpy_slope_J_molK", full.EnthalpySlope);
            json.WriteNumberOrNull("entropy_slope_J_molK2", full.EntropySlope);
            json.WriteNumberOrNull("internal_energy_slope_J_molK", full.InternalEnergySlope);
            json.WriteNumberOrNull("saturation_heat_capacity_J_molK", full.SaturationHeatCapacity);
        }

        json.WriteFinite("residual_internal_energy_J_mol", phase.ResidualInternalEnergy);
        json.WriteEndObject();
    }

    private static string Csv(IReadOnlyList<CoexistenceRow> rows, Fluid fluid, IResidualModel model, ReferenceState? reference, UnitSystem units, UncertaintySummary? uncertainty)
        => FlatCsv.Write(Flat(rows, fluid, model, reference, uncertainty), units, fluid.MolarMass?.Value, Differences);

    private static string CurveTable(IReadOnlyList<CoexistenceRow> rows, Fluid fluid, IResidualModel model, ReferenceState? reference, UnitSystem units, UncertaintySummary? uncertainty,
        bool byPressure)
    {
        var table = CurveTableOf(rows, fluid, units, uncertainty, byPressure);
        var text = new StringBuilder();
        string kind = byPressure ? "Saturation table by pressure" : "Saturation curve";
        text.AppendLine($"{kind} of {fluid.Name}, {ModelText.Describe(model)}; {rows.Count} state{(rows.Count == 1 ? "" : "s")}{(rows[^1].Point.IsCritical ? ", the last one the critical point" : "")}");
        text.AppendLine(ReferenceLine(rows, reference));
        if (uncertainty is not null)
        {
            UncertaintyText.DescribeInputs(text, uncertainty);
        }

        text.AppendLine();
        text.Append(table.Render());
        text.AppendLine();
        if (uncertainty is not null)
        {
            UncertaintyText.DescribeReasons(text, rows.Select(r => r.Uncertainty));
        }

        if (TriplePointNote(rows[0], fluid) is { } note)
        {
            text.AppendLine(note);
        }

        text.AppendLine(Caution);
        return text.ToString();
    }

    /// <summary>Share of the sourced triple-point pressure beyond which a table that starts at the
    /// triple point says how far the model's vapour pressure is from it (the 1 % that
    /// <c>fluids check</c> accepts at the normal boiling point).</summary>
    internal const double TriplePointNoteShare = 0.01;

    /// <summary>A note when the table starts at the fluid's triple point and the model's vapour
    /// pressure there is more than <see cref="TriplePointNoteShare"/> from the sourced one; else null.</summary>
    internal static string? TriplePointNote(CoexistenceRow first, Fluid fluid)
    {
        if (fluid.TriplePointTemperature?.Value is not double tt || fluid.TriplePointPressure is not { } pt
            || Math.Abs(first.Point.Temperature / tt - 1) > 1e-9)
        {
            return null;
        }

        double deviation = first.Point.Pressure / pt.Value - 1;
        return Math.Abs(deviation) <= TriplePointNoteShare
            ? null
            : string.Create(CultureInfo.InvariantCulture,
                $"note: at the triple point the model's vapour pressure is {NumberText.Table(100 * deviation)} % from the sourced {NumberText.Table(pt.Value)} Pa ({pt.Source}); the low end of this table carries that error (a fitted --alpha, where the fluid file has one, reduces it)");
    }

    /// <summary>The cells of the <c>curve</c> table: the curve columns in <paramref name="units"/>,
    /// rounded as the table prints them (the HTML report shows the same table).</summary>
    internal static TextTable CurveTableOf(IReadOnlyList<CoexistenceRow> rows, Fluid fluid, UnitSystem units, UncertaintySummary? uncertainty = null, bool byPressure = false)
    {
        var columns = CoexistenceColumns.For(rows).Where(c => c.InCurveTable).ToArray();
        // A curve is traced at given temperatures (or pressures): u(T) (or u(P)) is zero on every row and not shown.
        var given = byPressure ? DisplayQuantity.Pressure : DisplayQuantity.Temperature;
        var uColumns = uncertainty is null ? [] : UncertaintyText.Quantities.Where(q => q.Display != given).ToArray();
        var headers = columns.Select(c => CoexistenceColumns.Header(c, units)).Concat(uColumns.Select(q => UncertaintyText.Header(q, units))).ToArray();
        var table = new TextTable(headers, headers.Select(_ => true).ToArray());
        double m = fluid.MolarMass?.Value ?? double.NaN; // SI tables do not use it; engineering units were refused without it
        var values = rows.Select(row => columns.Select(c => CoexistenceColumns.Display(c, row, units, m)).ToArray()).ToArray();
        // Energies and entropies may be a zero to rounding (at the reference state, or h_V - h_L at
        // the critical point): each is printed against the largest of its kind in the table (h_L
        // against h_V and the latent heat, of which it is a difference), see NumberText.Table.
        var scales = columns.Select(c => HasArbitraryZero(c.Quantity)
            ? NumberText.Scale(columns.Select((other, j) => (other, j)).Where(o => o.other.Quantity == c.Quantity).SelectMany(o => values.Select(v => v[o.j])))
            : 0).ToArray();
        for (int i = 0; i < rows.Count; i++)
        {
            table.Add(values[i].Select((v, j) => NumberText.Table(v, scales[j]))
                .Concat(uColumns.Select(q => UncertaintyText.Cell(q, rows[i].Uncertainty, units, m))).ToArray());
        }

        return table;
    }

    /// <summary>The line naming the zero of h and s, or why they are not shown.</summary>
    internal static string ReferenceLine(IReadOnlyList<CoexistenceRow> rows, ReferenceState? reference)
        => rows.All(r => r.Full is not null) && reference is not null
            ? $"h and s reference: {reference.Description}"
            : "h and s not shown: the fluid has no ideal-gas heat capacity cp°";

    private static string SingleTable(CoexistenceRow row, Fluid fluid, IResidualModel model, ReferenceState? reference, UnitSystem units, UncertaintySummary? uncertainty)
    {
        var point = row.Point;
        double m = fluid.MolarMass?.Value ?? double.NaN; // SI tables do not use it; engineering units were refused without it
        string Show(DisplayQuantity q, double si) => NumberText.Table(UnitFormatter.Convert(q, si, units, m));
        string Label(DisplayQuantity q) => UnitFormatter.Label(q, units);

        var phases = new TextTable(["phase property", "liquid", "vapour", "unit"], [false, true, true, false]);
        if (row.Full is { } full)
        {
            // Energies and entropies are read against the largest of their kind in the table (h_L at
            // its reference state is 0 beside h_V; g = h - Ts is a difference of such terms).
            var shown = StateColumns.All.Where(c => HasArbitraryZero(c.Quantity))
                .SelectMany(c => new[] { full.Liquid.State, full.Vapour.State }.Select(s => (c.Quantity, Value: StateColumns.Shown(c, s, units) ?? 0)))
                .ToArray();
            foreach (var column in StateColumns.All.Where(c => !PointKeys.Contains(c.Key)))
            {
                double scale = HasArbitraryZero(column.Quantity) ? NumberText.Scale(shown.Where(s => s.Quantity == column.Quantity).Select(s => s.Value)) : 0;
                phases.Add(column.Title, StateColumns.Display(column, full.Liquid.State, units, scale), StateColumns.Display(column, full.Vapour.State, units, scale), StateColumns.Unit(column, units));
            }

            string Slope(double? value, DisplayQuantity q) => value is double v ? NumberText.Table(UnitFormatter.Convert(q, v, units, m)) : "undefined";
            phases.Add("ds/dT along the line", Slope(full.Liquid.EntropySlope, DisplayQuantity.MolarEntropy), Slope(full.Vapour.EntropySlope, DisplayQuantity.MolarEntropy), $"{Label(DisplayQuantity.MolarEntropy)} per K");
            phases.Add("dh/dT along the line", Slope(full.Liquid.EnthalpySlope, DisplayQuantity.MolarEntropy), Slope(full.Vapour.EnthalpySlope, DisplayQuantity.MolarEntropy), Label(DisplayQuantity.MolarEntropy));
            phases.Add("drho/dT along the line", Slope(full.Liquid.DensitySlope, DisplayQuantity.Density), Slope(full.Vapour.DensitySlope, DisplayQuantity.Density), $"{Label(DisplayQuantity.Density)} per K");
            phases.Add("saturation heat capacity T ds/dT", Slope(full.Liquid.SaturationHeatCapacity, DisplayQuantity.MolarEntropy), Slope(full.Vapour.SaturationHeatCapacity, DisplayQuantity.MolarEntropy), Label(DisplayQuantity.MolarEntropy));
        }
        else
        {
            phases.Add("density", Show(DisplayQuantity.Density, point.Liquid.Density), Show(DisplayQuantity.Density, point.Vapour.Density), Label(DisplayQuantity.Density));
            phases.Add("molar volume", Show(DisplayQuantity.MolarVolume, point.Liquid.MolarVolume), Show(DisplayQuantity.MolarVolume, point.Vapour.MolarVolume), Label(DisplayQuantity.MolarVolume));
            phases.Add("compressibility factor", NumberText.Table(point.Liquid.CompressibilityFactor), NumberText.Table(point.Vapour.CompressibilityFactor), "-");
            phases.Add("ln fugacity coefficient", NumberText.Table(point.Liquid.LnFugacityCoefficient), NumberText.Table(point.Vapour.LnFugacityCoefficient), "-");
            phases.Add("residual enthalpy", Show(DisplayQuantity.MolarEnergy, point.Liquid.ResidualEnthalpy), Show(DisplayQuantity.MolarEnergy, point.Vapour.ResidualEnthalpy), Label(DisplayQuantity.MolarEnergy));
        }

        var jumps = new TextTable(["across coexistence", "value", "unit"], [false, true, false]);
        jumps.Add("enthalpy of vaporization", Show(DisplayQuantity.MolarEnergy, point.EnthalpyOfVaporization), Label(DisplayQuantity.MolarEnergy));
        jumps.Add("entropy of vaporization", Show(DisplayQuantity.MolarEntropy, point.EntropyOfVaporization), Label(DisplayQuantity.MolarEntropy));
        jumps.Add("internal energy change", Show(DisplayQuantity.MolarEnergy, point.InternalEnergyChange), Label(DisplayQuantity.MolarEnergy));
        jumps.Add("volume change", Show(DisplayQuantity.MolarVolume, point.VolumeChange), Label(DisplayQuantity.MolarVolume));
        jumps.Add("compressibility change", NumberText.Table(point.CompressibilityChange), "-");
        jumps.Add("slope dPsat/dT (Clapeyron)", Show(DisplayQuantity.Slope, point.Slope), Label(DisplayQuantity.Slope));
        jumps.Add("inverse slope dTsat/dP", NumberText.Table(1 / UnitFormatter.Convert(DisplayQuantity.Slope, point.Slope, units, m)), $"K per {Label(DisplayQuantity.Pressure)}");

        var text = new StringBuilder();
        text.AppendLine($"{fluid.Name}, {ModelText.Describe(model)}{(point.IsCritical ? ": critical point" : "")}");
        text.AppendLine($"saturation temperature  {Show(DisplayQuantity.Temperature, point.Temperature)} {Label(DisplayQuantity.Temperature)}");
        text.AppendLine($"saturation pressure     {Show(DisplayQuantity.Pressure, point.Pressure)} {Label(DisplayQuantity.Pressure)}");
        text.AppendLine(ReferenceLine([row], reference));
        text.AppendLine();
        text.Append(phases.Render());
        text.AppendLine();
        text.Append(jumps.Render());
        text.AppendLine();
        if (uncertainty is not null)
        {
            var table = new TextTable(["standard uncertainty", "u", "unit"], [false, true, false]);
            foreach (var q in UncertaintyText.Quantities)
            {
                string header = UncertaintyText.Header(q, units);
                int open = header.LastIndexOf('[');
                table.Add(q.Title, UncertaintyText.Cell(q, row.Uncertainty, units, m), header[(open + 1)..^1]);
            }

            UncertaintyText.DescribeInputs(text, uncertainty);
            text.Append(table.Render());
            UncertaintyText.DescribeReasons(text, [row.Uncertainty]);
            text.AppendLine();
        }
        text.AppendLine($"solver: {Kebab(point.Report.Method.ToString())}, {point.Report.Iterations} iterations, {point.Report.ModelEvaluations} model evaluations, |ln phi_L - ln phi_V| = {point.Report.FugacityResidual.ToString("G3", CultureInfo.InvariantCulture)}, densities to {point.Report.DensityUncertainty.ToString("G2", CultureInfo.InvariantCulture)} relative, {Kebab(point.Report.StopReason.ToString())}");
        text.AppendLine(Caution);
        return text.ToString();
    }

    /// <summary>Whether a quantity's zero is a cancellation (energies and entropies are differences
    /// from a reference state, or between the phases), so that a zero may come out as round-off.</summary>
    internal static bool HasArbitraryZero(DisplayQuantity? quantity) => quantity is DisplayQuantity.MolarEnergy or DisplayQuantity.MolarEntropy;

    /// <summary>"PressureIteration" → "pressure-iteration".</summary>
    public static string Kebab(string pascal)
    {
        var text = new StringBuilder();
        foreach (char c in pascal)
        {
            if (char.IsUpper(c) && text.Length > 0)
            {
                text.Append('-');
            }

            text.Append(char.ToLowerInvariant(c));
        }

        return text.ToString();
    }

    private static double Finite(double? value, string key) => FiniteNumbers.Check(value ?? double.NaN, key);
}
