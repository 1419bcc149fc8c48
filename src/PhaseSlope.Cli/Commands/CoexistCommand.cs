using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope coexist FLUID --temperature V | --pressure V</c>: one coexistence state.</summary>
internal static class CoexistCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var fluid = CommonOptions.FluidArgument();
        var temperature = new Option<string>("--temperature", "-T") { Description = "Saturation temperature, e.g. 300 K, 26.85 degC, 80 degF (bare number: K)" };
        var pressure = new Option<string>("--pressure", "-P") { Description = "Saturation pressure, e.g. 101.325 kPa, 1.2 bar, 14.7 psi, 1 atm (bare number: Pa)" };
        var reference = ReferenceOption.Create();
        var common = new CommonOptions();
        var diagnostics = new DiagnosticsOption();
        var command = new Command("coexist", "One liquid-vapour coexistence state at a given temperature or pressure");
        command.Arguments.Add(fluid);
        command.Options.Add(temperature);
        command.Options.Add(pressure);
        command.Options.Add(reference);
        common.AddTo(command, withEos: true);
        var output = new OutputOption();
        output.AddTo(command);
        diagnostics.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            string? tText = parse.GetValue(temperature);
            string? pText = parse.GetValue(pressure);
            if ((tText is null) == (pText is null))
            {
                throw new UsageException("coexist: give exactly one of --temperature and --pressure");
            }

            var model = common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
            var (format, units) = common.BindOutput(parse);
            double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
            double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
            var zero = ReferenceOption.Parse(parse.GetValue(reference)!);
            var data = FluidResolver.Resolve(parse.GetValue(fluid)!);
            var context = CoexistenceContext.Create(data, diagnostics.Begin(parse, model.For(data)), zero);
            var point = t is double tv ? context.Solver.AtTemperature(tv) : context.Solver.AtPressure(p!.Value);
            output.Emit(io, parse, CoexistenceWriter.Render([context.Row(point)], single: true, format, data, context.Solver.Model, zero, units), "the coexistence state");
            diagnostics.End(io, [point]);
        }));
        return command;
    }
}
