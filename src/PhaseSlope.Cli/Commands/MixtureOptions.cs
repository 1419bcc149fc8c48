using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary>The checked mixture of a mixture command and its model choice.</summary>
/// <param name="Mixture">The mixture, with every --kij applied.</param>
/// <param name="Name">The mixture file's name line, or null.</param>
/// <param name="Origin">The mixture file's path, or <see cref="MixtureResolver.CommandLineOrigin"/>.</param>
/// <param name="Model">--eos, --alpha and --volume-shift (a mixture's volume shift is none, fluid or peneloux).</param>
/// <param name="Remarks">The mixture file's remarks line, or null.</param>
internal sealed record MixtureInput(Mixture Mixture, string? Name, string Origin, ModelChoice Model, string? Remarks = null)
{
    /// <summary>The k_ij of every pair for the chosen model, with their sources.</summary>
    public InteractionMatrix Interactions => Mixture.Interactions(Model.Kind);

    /// <summary>The cubic mixture model: each component's model built as the pure commands build
    /// it (same --eos, --alpha; --volume-shift per component), with <see cref="Interactions"/>.</summary>
    public CubicMixtureModel CreateModel() => Model.ForMixture(Mixture);

    /// <summary>A name for messages and titles: the file's name, else the components joined by '+'.</summary>
    public string DisplayName => Name ?? string.Join(" + ", Mixture.Components.Select(c => c.Name));
}

/// <summary>The MIXTURE argument, --mass-fractions, --kij and the model options (--eos, --alpha,
/// --volume-shift), bound to a <see cref="MixtureInput"/>: the option group every mixture command
/// shares. The command's own options (--format, its conditions) stay in its own group.</summary>
internal sealed class MixtureOptions
{
    /// <summary>Creates the group; the model options are <paramref name="common"/>'s (so a command
    /// binds --format from the same <see cref="CommonOptions"/>).</summary>
    public MixtureOptions(CommonOptions common) => Common = common;

    /// <summary>MIXTURE.</summary>
    public Argument<string> Mixture { get; } = new("MIXTURE")
    {
        Description = "Components and fractions, NAME=FRACTION,NAME=FRACTION,... (mole fractions summing to 1; NAME as FLUID: a catalog name, "
            + "synonym or .fluid path), e.g. methane=0.9,ethane=0.1; or the path of a mixture file (docs/mixture-files.md)",
    };

    /// <summary>--mass-fractions.</summary>
    public Option<bool> MassFractions { get; } = new("--mass-fractions")
    {
        Description = "Read the fractions of a MIXTURE written NAME=FRACTION,... as mass fractions (as blends are specified), converted with each component's molar mass",
    };

    /// <summary>--kij (repeatable).</summary>
    public Option<string[]> Kij { get; } = new("--kij")
    {
        Description = "Binary interaction parameter of one pair, \"A,B=VALUE\" (repeatable); overrides the mixture file and the published table; "
            + "a pair with neither is 0, with a note",
        AllowMultipleArgumentsPerToken = false,
    };

    /// <summary>--eos, --alpha, --volume-shift (and the command's --format).</summary>
    public CommonOptions Common { get; }

    /// <summary>Adds MIXTURE, --mass-fractions, --kij, --eos, --alpha and --volume-shift.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Mixture);
        command.Options.Add(MassFractions);
        command.Options.Add(Kij);
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        // Each command owns its CommonOptions instance, so this description is the mixture commands' own.
        Common.VolumeShift.Description = "Volume translation c of each component (v = v_eos - c): fluid (default: each fluid file's own volume_shift_pr/srk, else none), "
            + "none, or peneloux (the published correlation for pr or srk, per component); it shifts densities only";
        command.Options.Add(Common.VolumeShift);
    }

    /// <summary>Checks the options (model spelling, --volume-shift, --kij syntax), then resolves
    /// the mixture (reading its file and component fluid files) and applies --kij.</summary>
    /// <exception cref="UsageException">A bad option or a malformed mixture.</exception>
    /// <exception cref="Core.Errors.FluidDataException">An unknown component or a bad mixture or fluid file.</exception>
    public MixtureInput Bind(ParseResult parse)
    {
        var model = Common.BindModel(parse);
        if (!model.ShiftSuitsMixture)
        {
            throw new UsageException($"--volume-shift: a mixture takes fluid, none or peneloux (each component's own), not one volume '{model.VolumeShiftText}' for every component");
        }

        var kij = MixtureResolver.ParseKij(parse.GetValue(Kij) ?? []);
        var resolved = MixtureResolver.Resolve(parse.GetValue(Mixture) ?? "", parse.GetValue(MassFractions), kij);
        return new MixtureInput(resolved.Mixture, resolved.Name, resolved.Origin, model, resolved.Remarks);
    }
}
