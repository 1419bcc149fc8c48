using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope flash MIXTURE --pressure V (--temperature V | --enthalpy V | --entropy V)</c>:
/// the stable state of a mixture, one phase or the liquid–vapour split, after a stability test.</summary>
internal static class FlashCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new FlashOptions();
        var command = new Command("flash", "Flash a mixture at a given pressure and temperature, enthalpy or entropy: "
            + "a tangent-plane stability test, then the stable liquid-vapour split (vapour fraction, phase compositions and properties) or the single phase");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var engine = new MixtureEquilibrium(request.Input.CreateModel(), request.Input.Mixture.Components);
            var z = request.Input.Mixture.MoleFractions;
            var result = request.Temperature is double t ? engine.Flash(t, request.Pressure, z)
                : request.Enthalpy is double h ? engine.FlashAtEnthalpy(request.Pressure, h, z)
                : engine.FlashAtEntropy(request.Pressure, request.Entropy!.Value, z);
            options.Out.Emit(io, parse, MixtureEquilibriumWriter.Render(request.Input, result, request.Output), "the flash");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>flash</c>: the pressure and exactly one of T, h, s.</summary>
/// <param name="Input">The mixture and model choice.</param>
/// <param name="Pressure">P in Pa.</param>
/// <param name="Temperature">T in K, or null.</param>
/// <param name="Enthalpy">Molar enthalpy in J/mol, or null.</param>
/// <param name="Entropy">Molar entropy in J/(mol·K), or null.</param>
/// <param name="Output">table, csv or json, and the units of table and CSV.</param>
internal sealed record FlashRequest(MixtureInput Input, double Pressure, double? Temperature, double? Enthalpy, double? Entropy, OutputChoice Output);

/// <summary>The options of <c>flash</c>, bound to a <see cref="FlashRequest"/>.</summary>
internal sealed class FlashOptions
{
    /// <summary>Creates the group.</summary>
    public FlashOptions() => Mixture = new MixtureOptions(Common);

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Pressure, e.g. 4 MPa, 40 bar (bare number: Pa)" };

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Temperature, e.g. 220 K, -50 degC (bare number: K)" };

    /// <summary>--enthalpy.</summary>
    public Option<string> Enthalpy { get; } = new("--enthalpy")
    {
        Description = "Enthalpy of the feed, J/mol or kJ/kg (per kg with the blend's molar mass), on the ideal-gas reference (h = 0 for each component as ideal gas at 298.15 K and 1 bar)",
    };

    /// <summary>--entropy.</summary>
    public Option<string> Entropy { get; } = new("--entropy")
    {
        Description = "Entropy of the feed, J/(mol K) or kJ/(kg K), on the ideal-gas reference (s = 0 for each component as ideal gas at 298.15 K and 1 bar)",
    };

    /// <summary>--eos, --alpha, --volume-shift, --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>MIXTURE, --mass-fractions, --kij and the model options.</summary>
    public MixtureOptions Mixture { get; }

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Mixture.AddTo(command);
        command.Options.Add(Pressure);
        command.Options.Add(Temperature);
        command.Options.Add(Enthalpy);
        command.Options.Add(Entropy);
        command.Options.Add(Common.Format);
        Common.Units.Description = CommonOptions.FlashUnitsDescription;
        command.Options.Add(Common.Units);
        Out.AddTo(command);
    }

    /// <summary>Checks the options (--pressure with exactly one of --temperature, --enthalpy and
    /// --entropy; table or json), resolves the mixture, then reads h or s (a per-kg value needs
    /// the blend's molar mass).</summary>
    public FlashRequest Bind(ParseResult parse)
    {
        string? pText = parse.GetValue(Pressure);
        string? tText = parse.GetValue(Temperature);
        string? hText = parse.GetValue(Enthalpy);
        string? sText = parse.GetValue(Entropy);
        if (pText is null)
        {
            throw new UsageException("flash: give --pressure with one of --temperature, --enthalpy and --entropy");
        }

        int second = (tText is null ? 0 : 1) + (hText is null ? 0 : 1) + (sText is null ? 0 : 1);
        if (second != 1)
        {
            throw new UsageException("flash: give exactly one of --temperature, --enthalpy and --entropy with --pressure");
        }

        var format = Common.OutputFormat(parse);
        double p = QuantityParser.ParsePressure(pText, "--pressure");
        double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
        _ = Out.Path(parse);
        var output = Common.BindOutput(parse, format, csvUnits: true);
        var input = Mixture.Bind(parse);
        output.RequireMolarMassFor(input.Mixture);
        double? molarMass = input.Mixture.MolarMass;
        double? h = hText is null ? null : QuantityParser.ParseMolarOrSpecific(hText, "--enthalpy", MolarQuantity.Energy, molarMass);
        double? s = sText is null ? null : QuantityParser.ParseMolarOrSpecific(sText, "--entropy", MolarQuantity.Entropy, molarMass);
        return new FlashRequest(input, p, t, h, s, output);
    }
}
