using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary>The options that pick one single-phase state: FLUID, --temperature with --pressure
/// or --density, --phase, --reference, and the common ones.</summary>
internal sealed class StateOptions
{
    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Temperature, e.g. 300 K, 26.85 degC (bare number: K)", Required = true };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Absolute pressure, e.g. 2 MPa, 1.2 bar (bare number: Pa)" };

    /// <summary>--density.</summary>
    public Option<string> Density { get; } = new("--density") { Description = "Density instead of pressure, e.g. 11000 mol/m3, 500 kg/m3 (bare number: mol/m3)" };

    /// <summary>--phase.</summary>
    public Option<string> Phase { get; } = new("--phase")
    {
        Description = "With --pressure below Tc: stable (default, the root of lower Gibbs energy), liquid or vapour (may be metastable)",
        DefaultValueFactory = _ => "stable",
    };

    /// <summary>--reference.</summary>
    public Option<string> Reference { get; } = ReferenceOption.Create();

    /// <summary>--eos, --format, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>Adds every option to a command; <paramref name="withUnits"/> adds --units, for a
    /// command whose table has display units to choose.</summary>
    public void AddTo(Command command, bool withUnits)
    {
        command.Arguments.Add(Fluid);
        command.Options.Add(Temperature);
        command.Options.Add(Pressure);
        command.Options.Add(Density);
        command.Options.Add(Phase);
        command.Options.Add(Reference);
        Common.AddTo(command, withEos: true, withUnits);
    }

    /// <summary>Binds --format and --units, then the state (see <see cref="BindPoint"/>).</summary>
    public StateRequest Bind(ParseResult parse)
    {
        var output = Common.BindOutput(parse);
        var point = BindPoint(parse);
        output.RequireMolarMassFor(point.Fluid);
        return new StateRequest(point, output);
    }

    /// <summary>Parses and checks the options that pick the state, then resolves the fluid (a
    /// density may be given in kg/m³, which needs its molar mass).</summary>
    public StatePoint BindPoint(ParseResult parse)
    {
        string? pText = parse.GetValue(Pressure);
        string? dText = parse.GetValue(Density);
        if ((pText is null) == (dText is null))
        {
            throw new UsageException("give exactly one of --pressure and --density with --temperature");
        }

        var model = Common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
        var phase = ParsePhase(parse.GetValue(Phase) ?? "stable");
        var reference = ReferenceOption.Parse(parse.GetValue(Reference) ?? ReferenceState.IdealGas.Id);
        double t = QuantityParser.ParseTemperature(parse.GetValue(Temperature)!, "--temperature");
        double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
        Fluid fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        double? rho = dText is null ? null : QuantityParser.ParseDensity(dText, "--density", fluid.MolarMass?.Value);
        return new StatePoint(fluid, t, p, rho, phase, reference, model);
    }

    private static PhaseChoice ParsePhase(string text) => text.ToLowerInvariant() switch
    {
        "stable" => PhaseChoice.Stable,
        "liquid" => PhaseChoice.Liquid,
        "vapour" or "vapor" => PhaseChoice.Vapour,
        _ => throw new UsageException($"--phase: unknown phase '{text}' (use stable, liquid or vapour)"),
    };
}

/// <summary>The checked inputs that pick one single-phase state.</summary>
/// <param name="Fluid">The resolved fluid.</param>
/// <param name="Temperature">The temperature in K.</param>
/// <param name="Pressure">The pressure in Pa, or null when a density is given.</param>
/// <param name="Density">The molar density in mol/m³, or null when a pressure is given.</param>
/// <param name="Phase">The root chosen at a given pressure.</param>
/// <param name="Reference">The zero of h and s.</param>
/// <param name="Model">The model choice.</param>
internal sealed record StatePoint(Fluid Fluid, double Temperature, double? Pressure, double? Density, PhaseChoice Phase,
    ReferenceState Reference, ModelChoice Model)
{
    /// <summary>Builds the engine and evaluates the state.</summary>
    public (PropertyModel Engine, ThermodynamicState State) Evaluate()
    {
        var engine = new PropertyModel(Fluid, Model.For(Fluid), Reference);
        var state = Pressure is double p ? engine.AtPressure(Temperature, p, Phase) : engine.AtDensity(Temperature, Density!.Value, Phase);
        return (engine, state);
    }
}

/// <summary>The checked inputs of <c>state</c>.</summary>
/// <param name="Point">The state.</param>
/// <param name="Output">The output format and units.</param>
internal sealed record StateRequest(StatePoint Point, OutputChoice Output);
