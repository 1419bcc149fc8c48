using System.CommandLine;
using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope cycle FLUID "evaporating=…,condensing=…[,superheat=…,subcooling=…,efficiency=…]"</c>:
/// the states and the performance of a simple vapour-compression cycle, the numbers behind
/// <c>plot --diagram p-h --cycle</c>.</summary>
internal static class CycleCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var fluid = CommonOptions.FluidArgument();
        var spec = new Argument<string>("CYCLE")
        {
            Description = "The cycle as key=value items: \"evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=0.75\" (evaporating and condensing are saturation temperatures; superheat and subcooling default to 0 K, the compressor's isentropic efficiency to 1)",
        };
        var reference = ReferenceOption.Create();
        var common = new CommonOptions();
        var outFile = new OutputOption();
        var command = new Command("cycle", "States and COP of a simple vapour-compression cycle (evaporator, compressor, condenser, expansion valve)");
        command.Arguments.Add(fluid);
        command.Arguments.Add(spec);
        command.Options.Add(reference);
        common.AddTo(command, withEos: true, withUnits: true);
        outFile.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var output = common.BindOutput(parse, csvUnits: true);
            var specification = CycleOption.Parse(parse.GetValue(spec)!, "CYCLE");
            var model = common.BindModel(parse);
            var zero = ReferenceOption.Parse(parse.GetValue(reference)!);
            var resolved = FluidResolver.Resolve(parse.GetValue(fluid)!);
            output.RequireMolarMassFor(resolved);
            var engine = new PropertyModel(resolved, model.For(resolved), zero);
            var cycle = VapourCompressionCycle.Compute(engine, specification);
            outFile.Emit(io, parse, Render(engine, cycle, output), "the cycle");
        }));
        return command;
    }

    private static string Render(PropertyModel engine, VapourCompressionCycle cycle, OutputChoice output) => output.Format switch
    {
        OutputFormat.Json => Json(engine, cycle),
        OutputFormat.Csv => FlatCsv.Write(cycle.States.Select(s =>
            (IReadOnlyList<FlatField>)[new FlatField("state", [], JsonValueKind.String, s.Label), .. StateWriter.Flat(engine, s.State)]),
            output.Units, engine.MolarMass, StateWriter.Differences),
        _ => Table(engine, cycle, output.Units),
    };

    private static string Json(PropertyModel engine, VapourCompressionCycle cycle) => JsonText.Write(json =>
    {
        var spec = cycle.Specification;
        json.WriteStartObject();
        json.WriteString("fluid", engine.Fluid.Name);
        ModelText.WriteJson(json, engine.Model.Identity);
        json.WriteString("reference", engine.Reference.Id);
        json.WriteFinite("evaporating_temperature_K", spec.EvaporatingTemperature);
        json.WriteFinite("condensing_temperature_K", spec.CondensingTemperature);
        json.WriteFinite("superheat_K", spec.Superheat);
        json.WriteFinite("subcooling_K", spec.Subcooling);
        json.WriteFinite("isentropic_efficiency", spec.IsentropicEfficiency);
        json.WriteFinite("evaporating_pressure_Pa", cycle.EvaporatingPressure);
        json.WriteFinite("condensing_pressure_Pa", cycle.CondensingPressure);
        json.WriteFinite("pressure_ratio", cycle.CondensingPressure / cycle.EvaporatingPressure);
        json.WriteFinite("refrigerating_effect_J_mol", cycle.RefrigeratingEffect);
        json.WriteFinite("compressor_work_J_mol", cycle.CompressorWork);
        json.WriteFinite("heat_rejected_J_mol", cycle.HeatRejected);
        json.WriteFinite("coefficient_of_performance", cycle.CoefficientOfPerformance);
        json.WriteFinite("heating_coefficient_of_performance", cycle.HeatingCoefficientOfPerformance);
        json.WriteNumberOrNull("molar_mass_kg_mol", engine.MolarMass);
        json.WriteStartArray("states");
        foreach (var (label, state) in cycle.States)
        {
            json.WriteStartObject();
            json.WriteString("label", label);
            json.WritePropertyName("state");
            json.WriteRawValue(StateWriter.Json(engine, state));
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    });

    private static string Table(PropertyModel engine, VapourCompressionCycle cycle, UnitSystem units)
    {
        double m = engine.MolarMass ?? double.NaN; // SI tables do not use it; engineering units were refused without it
        string Show(DisplayQuantity q, double? si) => si is double v ? NumberText.Table(UnitFormatter.Convert(q, v, units, m)) : "";
        string Label(DisplayQuantity q) => UnitFormatter.Label(q, units);
        string[] names = ["1 compressor suction", "2s isentropic discharge", "2 compressor discharge", "3 condenser outlet", "4 evaporator inlet"];
        var states = new TextTable(["state", "phase", $"T [{Label(DisplayQuantity.Temperature)}]", $"P [{Label(DisplayQuantity.Pressure)}]",
            $"h [{Label(DisplayQuantity.MolarEnergy)}]", $"s [{Label(DisplayQuantity.MolarEntropy)}]", $"rho [{Label(DisplayQuantity.Density)}]", "quality"],
            [false, false, true, true, true, true, true, true]);
        for (int i = 0; i < cycle.States.Count; i++)
        {
            var s = cycle.States[i].State;
            states.Add(names[i], s.Region.Id(), Show(DisplayQuantity.Temperature, s.Temperature), Show(DisplayQuantity.Pressure, s.Pressure),
                Show(DisplayQuantity.MolarEnergy, s.Enthalpy), Show(DisplayQuantity.MolarEntropy, s.Entropy), Show(DisplayQuantity.Density, s.Density),
                s.Quality is double x ? NumberText.Table(x) : "");
        }

        var performance = new TextTable(["performance", "value", "unit"], [false, true, false]);
        performance.Add("refrigerating effect h1 - h4", Show(DisplayQuantity.MolarEnergy, cycle.RefrigeratingEffect), Label(DisplayQuantity.MolarEnergy));
        performance.Add("compressor work h2 - h1", Show(DisplayQuantity.MolarEnergy, cycle.CompressorWork), Label(DisplayQuantity.MolarEnergy));
        performance.Add("heat rejected h2 - h3", Show(DisplayQuantity.MolarEnergy, cycle.HeatRejected), Label(DisplayQuantity.MolarEnergy));
        performance.Add("COP (refrigeration)", NumberText.Table(cycle.CoefficientOfPerformance), "-");
        performance.Add("COP (heating)", NumberText.Table(cycle.HeatingCoefficientOfPerformance), "-");
        performance.Add("pressure ratio", NumberText.Table(cycle.CondensingPressure / cycle.EvaporatingPressure), "-");

        var spec = cycle.Specification;
        var text = new StringBuilder();
        text.AppendLine(CultureInfo.InvariantCulture, $"{engine.Fluid.Name}, {ModelText.Describe(engine.Model)}: vapour-compression cycle");
        text.AppendLine(CultureInfo.InvariantCulture,
            $"evaporating {Show(DisplayQuantity.Temperature, spec.EvaporatingTemperature)} {Label(DisplayQuantity.Temperature)}, condensing {Show(DisplayQuantity.Temperature, spec.CondensingTemperature)} {Label(DisplayQuantity.Temperature)}, superheat {NumberText.Table(spec.Superheat)} K, subcooling {NumberText.Table(spec.Subcooling)} K, isentropic efficiency {NumberText.Table(spec.IsentropicEfficiency)}");
        text.AppendLine($"reference: {engine.Reference.Description}");
        text.AppendLine();
        text.Append(states.Render());
        text.AppendLine();
        text.Append(performance.Render());
        text.AppendLine("note: the textbook cycle: no pressure drop in the heat exchangers and lines, no heat loss, no oil; COP is per unit of refrigerant, whatever its flow");
        text.AppendLine("note: many refrigerants are flammable (safety classes A2L, A3) or toxic (B classes); charge limits, relief and pressure-equipment design follow local codes and licensed engineering practice");
        text.AppendLine(CoexistenceWriter.Caution);
        return text.ToString();
    }
}
