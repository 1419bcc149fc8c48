using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope coexist FLUID --temperature V | --pressure V</c>: one coexistence state.</summary>
internal static class CoexistCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new CoexistOptions();
        var command = new Command("coexist", "One liquid-vapour coexistence state at a given temperature or pressure");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var context = CoexistenceContext.Create(request.Fluid, options.Diagnostics.Begin(request.Diagnostics, request.Model.For(request.Fluid)), request.Reference);
            var point = request.Temperature is double t ? context.Solver.AtTemperature(t) : context.Solver.AtPressure(request.Pressure!.Value);
            var row = context.Row(point);
            UncertaintySummary? summary = null;
            if (request.Uncertainty is { } choice)
            {
                var parameters = UncertaintyRun.Parameters(request.Model, request.Fluid);
                row = row with
                {
                    Uncertainty = request.Temperature is null
                        ? UncertaintyRun.AtPressure(io, choice, parameters, point)
                        : UncertaintyRun.AtTemperatures(io, choice, parameters, [point])[0],
                };
                summary = UncertaintyRun.Summary(choice, parameters);
            }

            options.Out.Emit(io, parse, CoexistenceWriter.Render([row], single: true, request.Output.Format, request.Fluid,
                context.Solver.Model, request.Reference, request.Output.Units, summary), "the coexistence state");
            options.Diagnostics.End(io, [point]);
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>coexist</c>.</summary>
/// <param name="Fluid">The resolved fluid.</param>
/// <param name="Temperature">The saturation temperature in K, or null when a pressure is given.</param>
/// <param name="Pressure">The saturation pressure in Pa, or null when a temperature is given.</param>
/// <param name="Reference">The zero of h and s.</param>
/// <param name="Model">The model choice.</param>
/// <param name="Output">The output format and units.</param>
/// <param name="Diagnostics">Whether --diagnostics was given.</param>
/// <param name="Uncertainty">How to propagate input uncertainties, or null for none.</param>
internal sealed record CoexistRequest(Fluid Fluid, double? Temperature, double? Pressure, ReferenceState Reference,
    ModelChoice Model, OutputChoice Output, bool Diagnostics, UncertaintyChoice? Uncertainty = null);

/// <summary>The options of <c>coexist</c>, bound to a <see cref="CoexistRequest"/>.</summary>
internal sealed class CoexistOptions
{
    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Saturation temperature, e.g. 300 K, 26.85 degC, 80 degF (bare number: K)" };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Saturation pressure, e.g. 101.325 kPa, 1.2 bar, 14.7 psi, 1 atm (bare number: Pa)" };

    /// <summary>--reference.</summary>
    public Option<string> Reference { get; } = ReferenceOption.Create();

    /// <summary>--eos, --alpha, --volume-shift, --format, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>--diagnostics.</summary>
    public DiagnosticsOption Diagnostics { get; } = new();

    /// <summary>--uncertainty, --samples, --seed.</summary>
    public UncertaintyOptions Uncertainty { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Fluid);
        command.Options.Add(Temperature);
        command.Options.Add(Pressure);
        command.Options.Add(Reference);
        Common.AddTo(command, withEos: true);
        Common.Units.Description = CommonOptions.UnitsWithCsvDescription;
        Out.AddTo(command);
        Diagnostics.AddTo(command);
        Uncertainty.AddTo(command);
    }

    /// <summary>Parses and checks every option, then resolves the fluid.</summary>
    public CoexistRequest Bind(ParseResult parse)
    {
        string? tText = parse.GetValue(Temperature);
        string? pText = parse.GetValue(Pressure);
        if ((tText is null) == (pText is null))
        {
            throw new UsageException("coexist: give exactly one of --temperature and --pressure");
        }

        var model = Common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
        var output = Common.BindOutput(parse, csvUnits: true);
        double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
        double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
        var reference = ReferenceOption.Parse(parse.GetValue(Reference)!);
        var uncertainty = Uncertainty.Bind(parse);
        var fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        output.RequireMolarMassFor(fluid);
        return new CoexistRequest(fluid, t, p, reference, model, output, Diagnostics.Given(parse), uncertainty);
    }
}
