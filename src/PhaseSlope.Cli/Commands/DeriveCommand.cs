using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope derive FLUID --of X --by Y --hold Z --temperature V --pressure V [--explain]</c>:
/// any first partial derivative at a state, (∂c_p/∂P)_T and (∂c_v/∂V)_T; and
/// <c>derive --from-measured "alpha=…,kappa_t=…,cp=…" --of X --by Y --hold Z …</c>: a first
/// derivative or the speed of sound from the user's own values, with a propagated uncertainty.</summary>
internal static class DeriveCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new DeriveOptions();
        var command = new Command("derive", "A partial derivative (dX/dY) at constant Z, exact, at a single-phase state of a model, or from measured alpha, kappa_T and cp");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            string text = request.Measured is { } measured
                ? FromMeasured(request, measured)
                : FromModel(request);
            options.Out.Emit(io, parse, text, "the derivative");
        }));
        return command;
    }

    private static string FromModel(DeriveRequest request)
    {
        var (engine, state) = request.Point!.Evaluate("a partial derivative");
        var target = request.Target;
        switch (target.Kind)
        {
            case DeriveKind.IsobaricHeatCapacityByPressure:
            {
                double value = SecondDerivatives.IsobaricHeatCapacityByPressure(engine.Model, state);
                var explanation = request.Explain ? DerivativeExplanation.CpByPressure(engine.Model, state) : null;
                return StateWriter.Derivative(engine, state, target, value, explanation, request.Format);
            }

            case DeriveKind.IsochoricHeatCapacityByVolume:
            {
                double value = SecondDerivatives.IsochoricHeatCapacityByVolume(engine.Model, state);
                var explanation = request.Explain ? DerivativeExplanation.CvByVolume(engine.Model, state) : null;
                return StateWriter.Derivative(engine, state, target, value, explanation, request.Format);
            }

            default:
            {
                if (PartialDerivatives.NeedsIdealGas(state, target.Of, target.By, target.Hold))
                {
                    // Decided from the Jacobian's dependence on cv and s, not from a list.
                    engine.RequireIdealGas($"(d{target.Of}/d{target.By}) at constant {target.Hold}, through cv or the absolute entropy,");
                }

                double value = PartialDerivatives.Of(state, target.Of, target.By, target.Hold);
                var explanation = request.Explain ? DerivativeExplanation.FromState(state, JacobianReduction.Reduce(target.Of, target.By, target.Hold)) : null;
                return StateWriter.Derivative(engine, state, target, value, explanation, request.Format);
            }
        }
    }

    private static string FromMeasured(DeriveRequest request, MeasuredInput measured)
    {
        var target = request.Target;
        bool sound = target.Kind == DeriveKind.SpeedOfSound;
        var expression = sound ? JacobianReduction.MolarMassTimesSoundSpeedSquared() : JacobianReduction.Reduce(target.Of, target.By, target.Hold);
        var missing = expression.Quantities.Where(q => measured.Values.Value(q) is null).ToList();
        if (missing.Count > 0)
        {
            throw new UsageException($"{MeasuredInput.Where(missing[0])}: {target.Symbol} = {(sound ? "sqrt((" + expression.Text + ")/M)" : expression.Text)} needs "
                + string.Join(", ", missing.Select(q => $"{MeasuredValues.Describe(q)} (give {MeasuredInput.Where(q)})")));
        }

        if (sound && measured.MolarMass is null)
        {
            throw new UsageException("--molar-mass: the speed of sound w = sqrt(M*w^2/M) needs the molar mass (give e.g. --molar-mass \"18.015 g/mol\")");
        }

        var (value, uncertainty) = measured.Values.Evaluate(expression);
        if (!double.IsFinite(value))
        {
            throw new InvalidInputException("from-measured", value, $"{target.Symbol} = {expression.Text} is undefined for these values (a zero denominator)");
        }

        if (sound)
        {
            // M·w² = v/κ_S must be positive: κ_S = κ_T − T·v·α²/c_p ≤ 0 is no stable state.
            if (!(value > 0))
            {
                throw new InvalidInputException("from-measured", value, $"these values give M*w^2 = {expression.Text} = {NumberText.Table(value)} J/mol, not above zero (the isentropic compressibility kappa_T - T*v*alpha^2/cp is not positive): no speed of sound");
            }

            double m = measured.MolarMass!.Value;
            double w = Math.Sqrt(value / m);
            double? uw = uncertainty is null && measured.MolarMassUncertainty is null
                ? null
                // w = sqrt(E/M): u(w)/w = ½·sqrt((u(E)/E)² + (u(M)/M)²), first order, uncorrelated.
                : w / 2 * Math.Sqrt(Math.Pow((uncertainty ?? 0) / value, 2) + Math.Pow((measured.MolarMassUncertainty ?? 0) / m, 2));
            return DerivativeWriter.Measured(target, expression, measured, w, uw, request.Format);
        }

        return DerivativeWriter.Measured(target, expression, measured, value, uncertainty, request.Format);
    }
}

/// <summary>What <c>derive</c> computes.</summary>
internal enum DeriveKind
{
    /// <summary>A first derivative (∂X/∂Y)_Z of T, P, V, U, H, S, A, G.</summary>
    First,

    /// <summary>(∂c_p/∂P)_T.</summary>
    IsobaricHeatCapacityByPressure,

    /// <summary>(∂c_v/∂V)_T.</summary>
    IsochoricHeatCapacityByVolume,

    /// <summary>The speed of sound w (from measured values only).</summary>
    SpeedOfSound,
}

/// <summary>The quantity <c>derive</c> computes.</summary>
/// <param name="Kind">Which kind.</param>
/// <param name="Of">X (a first derivative), else T.</param>
/// <param name="By">Y (a first derivative, or P / V for c_p / c_v), else T.</param>
/// <param name="Hold">Z (a first derivative, or T for c_p / c_v), else T.</param>
internal sealed record DeriveTarget(DeriveKind Kind, StateVariable Of, StateVariable By, StateVariable Hold)
{
    /// <summary>The --of name: T … G, cp, cv or w.</summary>
    public string OfName => Kind switch
    {
        DeriveKind.IsobaricHeatCapacityByPressure => "cp",
        DeriveKind.IsochoricHeatCapacityByVolume => "cv",
        DeriveKind.SpeedOfSound => "w",
        _ => Of.ToString(),
    };

    /// <summary>The symbol in plain text: (dU/dV)_T, (dcp/dP)_T, w.</summary>
    public string Symbol => Kind == DeriveKind.SpeedOfSound ? "w" : $"(d{OfName}/d{By})_{Hold}";

    /// <summary>The SI unit of the value (molar basis).</summary>
    public string Unit => Kind switch
    {
        DeriveKind.IsobaricHeatCapacityByPressure => "m3/(mol K)", // J/(mol K Pa)
        DeriveKind.IsochoricHeatCapacityByVolume => "Pa/K",         // J/(mol K)/(m3/mol)
        DeriveKind.SpeedOfSound => "m/s",
        _ => PartialDerivatives.Unit(Of, By),
    };
}

/// <summary>The checked inputs of <c>derive</c>.</summary>
/// <param name="Point">The model's state (null with --from-measured).</param>
/// <param name="Measured">The user's values (--from-measured), or null.</param>
/// <param name="Target">What is computed.</param>
/// <param name="Explain">Show the derivative in measurable quantities (--explain).</param>
/// <param name="Format">The output format (the value is always in SI units).</param>
internal sealed record DeriveRequest(StatePoint? Point, MeasuredInput? Measured, DeriveTarget Target, bool Explain, OutputFormat Format);

/// <summary>The options of <c>derive</c>, bound to a <see cref="DeriveRequest"/>.</summary>
internal sealed class DeriveOptions
{
    private const string Variables = "T, P, V (molar volume), U, H, S, A or G";

    /// <summary>--of.</summary>
    public Option<string> Of { get; } = new("--of") { Description = $"The function X differentiated: {Variables}; or cp (with --by P --hold T), cv (with --by V --hold T); or w, the speed of sound (with --from-measured, no --by or --hold)", Required = true };

    /// <summary>--by.</summary>
    public Option<string> By { get; } = new("--by") { Description = $"The variable Y it is differentiated by: {Variables}" };

    /// <summary>--hold.</summary>
    public Option<string> Hold { get; } = new("--hold") { Description = $"The variable Z held constant: {Variables}" };

    /// <summary>--explain.</summary>
    public Option<bool> Explain { get; } = new("--explain") { Description = "Also show the derivative in measurable quantities (T, P, v, s, alpha, kappa_T, cp) as derived by the Jacobian reduction, each quantity's value at the state, and the value through that expression" };

    /// <summary>--from-measured.</summary>
    public Option<string> FromMeasured { get; } = new("--from-measured") { Description = "Evaluate from your own values, no FLUID or model: \"alpha=V[±U] 1/K,kappa_t=V[±U] 1/Pa,cp=V[±U] J/(mol*K)\" with --temperature, --pressure, --molar-volume [--entropy] [--molar-mass]; a ± gives a propagated standard uncertainty" };

    /// <summary>--molar-volume.</summary>
    public Option<string> MolarVolume { get; } = new("--molar-volume") { Description = "With --from-measured: the measured molar volume v, e.g. 106.9 cm3/mol (per kg with --molar-mass; bare number: m3/mol), optionally ± a standard uncertainty" };

    /// <summary>--molar-mass.</summary>
    public Option<string> MolarMass { get; } = new("--molar-mass") { Description = "With --from-measured: the molar mass, e.g. 92.14 g/mol (needed by --of w and by values per kg)" };

    /// <summary>FLUID and the options that pick the state.</summary>
    public StateOptions State { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Options.Add(Of);
        command.Options.Add(By);
        command.Options.Add(Hold);
        command.Options.Add(Explain);
        command.Options.Add(FromMeasured);
        command.Options.Add(MolarVolume);
        command.Options.Add(MolarMass);
        State.AddTo(command, withUnits: false); // one value, always printed in SI
        // FLUID is required unless --from-measured is given (checked in Bind).
        State.Fluid.Arity = ArgumentArity.ZeroOrOne;
        Out.AddTo(command);
    }

    /// <summary>Parses and checks every option, then binds the state or the measured values.</summary>
    public DeriveRequest Bind(ParseResult parse)
    {
        var format = State.Common.OutputFormat(parse);
        bool measured = parse.GetValue(FromMeasured) is not null;
        var target = Target(parse, measured);
        bool explain = parse.GetValue(Explain);
        if (!measured)
        {
            if (parse.GetValue(State.Fluid) is null)
            {
                throw new UsageException("FLUID: required (a catalog name, a .fluid file or inline constants), unless --from-measured gives your own values");
            }

            foreach (var option in new[] { MolarVolume, MolarMass })
            {
                if (parse.GetValue(option) is not null)
                {
                    throw new UsageException($"{option.Name}: applies with --from-measured only (the model's state is fixed by two of {StateOptions.PropertyList})");
                }
            }

            foreach (var option in new[] { State.Temperature, State.Pressure, State.Entropy })
            {
                if (parse.GetValue(option) is string text && (text.Contains('±', StringComparison.Ordinal) || text.Contains("+/-", StringComparison.Ordinal)))
                {
                    throw new UsageException($"{option.Name}: a ± uncertainty is taken with --from-measured only (a model's state is computed at the value itself)");
                }
            }

            return new DeriveRequest(State.BindPoint(parse), null, target, explain, format);
        }

        if (parse.GetValue(State.Fluid) is string fluid)
        {
            throw new UsageException($"--from-measured: takes no FLUID (got '{Input.DataFileException.OneLine(fluid)}'); the derivative comes from your values alone, no model");
        }

        Option[] modelOnly = [State.Density, State.Volume, State.Enthalpy, State.InternalEnergy, State.Quality, State.Phase, State.Reference, State.Common.Eos, State.Common.Alpha, State.Common.VolumeShift];
        foreach (var option in modelOnly)
        {
            if (CommonOptions.Given(parse, option))
            {
                throw new UsageException($"{option.Name}: does not apply with --from-measured (no model is used; give --molar-volume for v)");
            }
        }

        var input = MeasuredInputParser.Parse(parse.GetValue(FromMeasured)!, parse.GetValue(State.Temperature), parse.GetValue(State.Pressure),
            parse.GetValue(MolarVolume), parse.GetValue(State.Entropy), parse.GetValue(MolarMass));
        return new DeriveRequest(null, input, target, true, format);
    }

    private DeriveTarget Target(ParseResult parse, bool measured)
    {
        string of = parse.GetValue(Of)!.Trim();
        string? by = parse.GetValue(By);
        string? hold = parse.GetValue(Hold);
        switch (of.ToLowerInvariant())
        {
            case "w":
                if (!measured)
                {
                    throw new UsageException("--of: w (the speed of sound) is computed here from --from-measured values; the model's speed of sound is in 'phaseslope state'");
                }

                if (by is not null || hold is not null)
                {
                    throw new UsageException($"{(by is not null ? "--by" : "--hold")}: the speed of sound w is not a partial derivative; give no --by or --hold with --of w");
                }

                return new DeriveTarget(DeriveKind.SpeedOfSound, StateVariable.T, StateVariable.T, StateVariable.T);
            case "cp" or "cv":
            {
                bool cp = of.Equals("cp", StringComparison.OrdinalIgnoreCase);
                var expectedBy = cp ? StateVariable.P : StateVariable.V;
                if (measured)
                {
                    throw new UsageException($"--of: (d{of.ToLowerInvariant()}/d{expectedBy})_T needs a second derivative of the equation of state (dalpha/dT or d2P/dT2), which --from-measured does not take; it comes from a model (give FLUID)");
                }

                var y = Variable(by ?? throw new UsageException($"--by: required (with --of {of.ToLowerInvariant()}: --by {expectedBy} --hold T)"), "--by");
                var z = Variable(hold ?? throw new UsageException($"--hold: required (with --of {of.ToLowerInvariant()}: --by {expectedBy} --hold T)"), "--hold");
                if (y != expectedBy || z != StateVariable.T)
                {
                    throw new UsageException($"--of: {of.ToLowerInvariant()} is offered as (d{of.ToLowerInvariant()}/d{expectedBy})_T only (give --by {expectedBy} --hold T)");
                }

                return new DeriveTarget(cp ? DeriveKind.IsobaricHeatCapacityByPressure : DeriveKind.IsochoricHeatCapacityByVolume, StateVariable.T, y, z);
            }

            default:
            {
                var x = Variable(of, "--of");
                var y = Variable(by ?? throw new UsageException("--by: required (the variable Y differentiated by: T, P, V, U, H, S, A or G)"), "--by");
                var z = Variable(hold ?? throw new UsageException("--hold: required (the variable Z held constant: T, P, V, U, H, S, A or G)"), "--hold");
                if (y == z)
                {
                    throw new UsageException($"--hold: the variable held constant ({z}) must differ from --by ({y})");
                }

                return new DeriveTarget(DeriveKind.First, x, y, z);
            }
        }
    }

    private static StateVariable Variable(string text, string option)
        => Enum.TryParse<StateVariable>(text.Trim(), ignoreCase: true, out var v) && Enum.IsDefined(v) && !int.TryParse(text, out _)
            ? v
            : throw new UsageException($"{option}: unknown variable '{text}' (use T, P, V, U, H, S, A or G{(option == "--of" ? "; or cp, cv, w" : "")})");
}
