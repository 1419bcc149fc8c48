using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary>The options that pick one state: FLUID, any two of --temperature, --pressure,
/// --density (or --volume), --enthalpy, --entropy, --internal-energy and --quality, --phase,
/// --reference, and the common ones.</summary>
internal sealed class StateOptions
{
    /// <summary>The list of the properties in messages.</summary>
    public const string PropertyList = "--temperature, --pressure, --density (or --volume), --enthalpy, --entropy, --internal-energy and --quality";

    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Temperature, e.g. 300 K, 26.85 degC (bare number: K)" };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Absolute pressure, e.g. 2 MPa, 1.2 bar (bare number: Pa)" };

    /// <summary>--density.</summary>
    public Option<string> Density { get; } = new("--density") { Description = "Density (of the mixture inside the dome), e.g. 11000 mol/m3, 500 kg/m3 (bare number: mol/m3)" };

    /// <summary>--volume.</summary>
    public Option<string> Volume { get; } = new("--volume") { Description = "Molar or specific volume instead of the density, e.g. 0.002 m3/mol, 0.05 m3/kg, 1.2 L/kg (bare number: m3/mol)" };

    /// <summary>--enthalpy.</summary>
    public Option<string> Enthalpy { get; } = new("--enthalpy") { Description = "Enthalpy on the chosen --reference, e.g. 250 kJ/kg, 12 kJ/mol (bare number: J/mol)" };

    /// <summary>--entropy.</summary>
    public Option<string> Entropy { get; } = new("--entropy") { Description = "Entropy on the chosen --reference, e.g. 1.05 kJ/(kg*K), 80 J/(mol*K) (bare number: J/(mol*K))" };

    /// <summary>--internal-energy.</summary>
    public Option<string> InternalEnergy { get; } = new("--internal-energy") { Description = "Internal energy on the chosen --reference, e.g. 220 kJ/kg (bare number: J/mol)" };

    /// <summary>--quality.</summary>
    public Option<string> Quality { get; } = new("--quality") { Description = "Vapour quality, the vapour mass (= mole) fraction from 0 to 1, on or inside the saturation dome" };

    /// <summary>--phase.</summary>
    public Option<string> Phase { get; } = new("--phase")
    {
        Description = "With --temperature and --pressure or --density below Tc: stable (default: the equilibrium state), liquid or vapour (the single phase on that branch, which may be metastable)",
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
        foreach (var option in Properties)
        {
            command.Options.Add(option);
        }

        command.Options.Add(Phase);
        command.Options.Add(Reference);
        Common.AddTo(command, withEos: true, withUnits);
    }

    private IEnumerable<Option<string>> Properties => [Temperature, Pressure, Density, Volume, Enthalpy, Entropy, InternalEnergy, Quality];

    /// <summary>Whether any option that gives a property was used.</summary>
    public bool AnyPropertyGiven(ParseResult parse) => Properties.Any(o => parse.GetValue(o) is not null);

    /// <summary>Binds --format and --units, then the state (see <see cref="BindPoint"/>).</summary>
    public StateRequest Bind(ParseResult parse)
    {
        var output = Common.BindOutput(parse, csvUnits: true);
        var point = BindPoint(parse);
        output.RequireMolarMassFor(point.Setting.Fluid);
        return new StateRequest(point, output);
    }

    /// <summary>Parses and checks the options that pick the state, then resolves the fluid (a
    /// value per kilogram needs its molar mass).</summary>
    public StatePoint BindPoint(ParseResult parse)
    {
        var given = new List<(StateProperty Property, Option<string> Option, string Text)>();
        void Add(StateProperty property, Option<string> option)
        {
            if (parse.GetValue(option) is string text)
            {
                given.Add((property, option, text));
            }
        }

        Add(StateProperty.Temperature, Temperature);
        Add(StateProperty.Pressure, Pressure);
        Add(StateProperty.Density, Density);
        Add(StateProperty.Density, Volume);
        Add(StateProperty.Enthalpy, Enthalpy);
        Add(StateProperty.Entropy, Entropy);
        Add(StateProperty.InternalEnergy, InternalEnergy);
        Add(StateProperty.Quality, Quality);
        if (parse.GetValue(Density) is not null && parse.GetValue(Volume) is not null)
        {
            throw new UsageException("--volume: give the density or the volume, not both (they are one property)");
        }

        if (given.Count != 2)
        {
            throw new UsageException($"give exactly two of {PropertyList} (given: {(given.Count == 0 ? "none" : string.Join(", ", given.Select(g => g.Option.Name)))})");
        }

        var phase = ParsePhase(parse.GetValue(Phase) ?? "stable");
        bool temperatureWith = given[0].Property == StateProperty.Temperature && given[1].Property is StateProperty.Pressure or StateProperty.Density;
        if (CommonOptions.Given(parse, Phase) && phase != PhaseChoice.Stable && !temperatureWith)
        {
            throw new UsageException("--phase: chooses a branch only for a state given by --temperature with --pressure or --density");
        }

        var setting = BindSetting(parse);
        var values = given.Select(g => Value(g.Property, g.Option.Name, g.Text, setting.Fluid, isVolume: g.Option == Volume)).ToList();
        var spec = new StateSpecification(given[0].Property, values[0], given[1].Property, values[1]);
        return new StatePoint(setting, spec, phase);
    }

    /// <summary>Binds the model, the reference and the fluid: what every state of a command shares.</summary>
    public StateSetting BindSetting(ParseResult parse)
    {
        var model = Common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
        var reference = ReferenceOption.Parse(parse.GetValue(Reference) ?? ReferenceState.IdealGas.Id);
        Fluid fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        return new StateSetting(fluid, reference, model);
    }

    /// <summary>The SI molar value of one property given as text (units as in the options' help;
    /// a value per kilogram needs the fluid's molar mass).</summary>
    /// <param name="property">The property.</param>
    /// <param name="where">The value's place for messages (an option, or a batch file's line and column).</param>
    /// <param name="text">The number with its unit.</param>
    /// <param name="fluid">The fluid (its molar mass).</param>
    /// <param name="isVolume">The density is given as a molar or specific volume.</param>
    public static double Value(StateProperty property, string where, string text, Fluid fluid, bool isVolume = false)
    {
        double? m = fluid.MolarMass?.Value;
        return property switch
        {
            StateProperty.Temperature => QuantityParser.ParseTemperature(text, where),
            StateProperty.Pressure => QuantityParser.ParsePressure(text, where),
            StateProperty.Density when isVolume => 1 / QuantityParser.ParseMolarOrSpecific(text, where, MolarQuantity.Volume, m),
            StateProperty.Density => QuantityParser.ParseDensity(text, where, m),
            StateProperty.Entropy => QuantityParser.ParseMolarOrSpecific(text, where, MolarQuantity.Entropy, m),
            StateProperty.Quality => QuantityParser.ParseQuality(text, where),
            _ => QuantityParser.ParseMolarOrSpecific(text, where, MolarQuantity.Energy, m),
        };
    }

    private static PhaseChoice ParsePhase(string text) => text.ToLowerInvariant() switch
    {
        "stable" => PhaseChoice.Stable,
        "liquid" => PhaseChoice.Liquid,
        "vapour" or "vapor" => PhaseChoice.Vapour,
        _ => throw new UsageException($"--phase: unknown phase '{text}' (use stable, liquid or vapour)"),
    };
}

/// <summary>What the states of one command share: the fluid, the zero of h and s, and the model.</summary>
/// <param name="Fluid">The resolved fluid.</param>
/// <param name="Reference">The zero of h and s.</param>
/// <param name="Model">The model choice.</param>
internal sealed record StateSetting(Fluid Fluid, ReferenceState Reference, ModelChoice Model)
{
    /// <summary>The property engine of this setting.</summary>
    public PropertyModel Engine() => new(Fluid, Model.For(Fluid), Reference);
}

/// <summary>Two properties that fix a state, in molar SI units.</summary>
/// <param name="First">One property.</param>
/// <param name="FirstValue">Its value.</param>
/// <param name="Second">The other.</param>
/// <param name="SecondValue">Its value.</param>
internal sealed record StateSpecification(StateProperty First, double FirstValue, StateProperty Second, double SecondValue)
{
    /// <summary>The temperature when it is one of the two, else null.</summary>
    public double? Temperature => Of(StateProperty.Temperature);

    /// <summary>The pressure when it is one of the two, else null.</summary>
    public double? Pressure => Of(StateProperty.Pressure);

    /// <summary>The density when it is one of the two, else null.</summary>
    public double? Density => Of(StateProperty.Density);

    private double? Of(StateProperty p) => First == p ? FirstValue : Second == p ? SecondValue : null;

    /// <summary>The state: a chosen branch at (T, P) or (T, ρ) as <see cref="PropertyModel.AtPressure"/>
    /// and <see cref="PropertyModel.AtDensity"/> give it, otherwise the flash.</summary>
    public FluidState Evaluate(PropertyModel engine, PhaseChoice phase)
    {
        if (Temperature is double t && Pressure is double p)
        {
            return engine.Describe(engine.AtPressure(t, p, phase));
        }

        if (phase != PhaseChoice.Stable && Temperature is double tb && Density is double rho)
        {
            return engine.Describe(engine.AtDensity(tb, rho, phase));
        }

        return engine.Flash(First, FirstValue, Second, SecondValue);
    }
}

/// <summary>The checked inputs that pick one state.</summary>
/// <param name="Setting">The fluid, reference and model.</param>
/// <param name="Spec">The two properties.</param>
/// <param name="Phase">The branch chosen at a given (T, P) or (T, ρ).</param>
internal sealed record StatePoint(StateSetting Setting, StateSpecification Spec, PhaseChoice Phase)
{
    /// <summary>The resolved fluid.</summary>
    public Fluid Fluid => Setting.Fluid;

    /// <summary>The model choice.</summary>
    public ModelChoice Model => Setting.Model;

    /// <summary>Builds the engine and evaluates the state, single-phase or two-phase.</summary>
    public (PropertyModel Engine, FluidState State) EvaluateAny()
    {
        var engine = Setting.Engine();
        return (engine, Spec.Evaluate(engine, Phase));
    }

    /// <summary>Builds the engine and evaluates the state, which must be a single phase.</summary>
    /// <param name="purpose">What needs a single phase, for the refusal.</param>
    /// <exception cref="Core.Errors.InvalidInputException">The state is on or inside the dome.</exception>
    public (PropertyModel Engine, ThermodynamicState State) Evaluate(string purpose)
    {
        var (engine, state) = EvaluateAny();
        return (engine, state.Single ?? throw new Core.Errors.InvalidInputException("state", state.Quality ?? double.NaN,
            $"{purpose} needs a single phase; this state is {state.Region.Id()} (quality {Output.NumberText.Table(state.Quality!.Value)}) at {Output.NumberText.Table(state.Temperature)} K and {Output.NumberText.Table(state.Pressure)} Pa"));
    }
}

/// <summary>The checked inputs of <c>state</c>.</summary>
/// <param name="Point">The state.</param>
/// <param name="Output">The output format and units.</param>
internal sealed record StateRequest(StatePoint Point, OutputChoice Output);
