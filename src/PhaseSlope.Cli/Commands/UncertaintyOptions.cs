using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Commands;

/// <summary>How to propagate the input uncertainties, bound from <c>--uncertainty</c>,
/// <c>--samples</c> and <c>--seed</c>.</summary>
/// <param name="Method">Linear or Monte Carlo.</param>
/// <param name="Samples">Monte Carlo samples (unused for linear).</param>
/// <param name="Seed">Monte Carlo seed (unused for linear).</param>
internal sealed record UncertaintyChoice(PropagationMethod Method, int Samples, int Seed)
{
    /// <summary>The JSON and text name of the method.</summary>
    public string MethodName => Method == PropagationMethod.Linear ? "linear" : "monte-carlo";

    /// <summary>A short description for table headers.</summary>
    public string Describe() => Method == PropagationMethod.Linear
        ? "linear propagation with exact sensitivities"
        : $"Monte Carlo, {Samples} samples, seed {Seed}";
}

/// <summary>The option group <c>--uncertainty linear|monte-carlo [--samples N] [--seed S]</c>.</summary>
internal sealed class UncertaintyOptions
{
    /// <summary>Default Monte Carlo sample count: 2000 gives each standard uncertainty to about
    /// 1/sqrt(2·2000) = 1.6 % (relative standard error of a standard deviation).</summary>
    public const int DefaultSamples = 2000;

    /// <summary>Default seed, so that a run without --seed is reproducible too.</summary>
    public const int DefaultSeed = 1;

    public Option<string> Method { get; } = new("--uncertainty")
    {
        Description = "Add standard uncertainties from those of Tc, Pc and omega (the fluid file's, else a family default): "
            + "linear (first order, exact sensitivities) or monte-carlo (inputs resampled and solved again)",
    };

    public Option<int> Samples { get; } = new("--samples")
    {
        Description = $"Monte Carlo samples, {MonteCarloPropagation.MinimumSamples} to {MonteCarloPropagation.MaximumSamples} (default {DefaultSamples}); only with --uncertainty monte-carlo",
        DefaultValueFactory = _ => DefaultSamples,
    };

    public Option<int> Seed { get; } = new("--seed")
    {
        Description = $"Seed of the Monte Carlo draws, 0 or more (default {DefaultSeed}); the same seed gives the same numbers; only with --uncertainty monte-carlo",
        DefaultValueFactory = _ => DefaultSeed,
    };

    public void AddTo(Command command)
    {
        command.Options.Add(Method);
        command.Options.Add(Samples);
        command.Options.Add(Seed);
    }

    /// <summary>The choice, or null when --uncertainty is not given.</summary>
    /// <exception cref="UsageException">An unknown method; --samples or --seed without
    /// monte-carlo; a sample count or seed out of range.</exception>
    public UncertaintyChoice? Bind(ParseResult parse)
    {
        string? text = parse.GetValue(Method);
        PropagationMethod? method = text?.Trim().ToLowerInvariant() switch
        {
            null => null,
            "linear" => PropagationMethod.Linear,
            "monte-carlo" => PropagationMethod.MonteCarlo,
            _ => throw new UsageException($"--uncertainty: unknown method '{text}' (use linear or monte-carlo)"),
        };
        bool monteCarlo = method == PropagationMethod.MonteCarlo;
        foreach (var option in new Option[] { Samples, Seed })
        {
            if (CommonOptions.Given(parse, option) && !monteCarlo)
            {
                throw new UsageException($"{option.Name}: applies only with --uncertainty monte-carlo");
            }
        }

        int samples = parse.GetValue(Samples);
        if (samples < MonteCarloPropagation.MinimumSamples || samples > MonteCarloPropagation.MaximumSamples)
        {
            throw new UsageException($"--samples: must be between {MonteCarloPropagation.MinimumSamples} and {MonteCarloPropagation.MaximumSamples}, got {samples}");
        }

        int seed = parse.GetValue(Seed);
        if (seed < 0)
        {
            throw new UsageException($"--seed: must be 0 or more, got {seed}");
        }

        return method is PropagationMethod m ? new UncertaintyChoice(m, samples, seed) : null;
    }
}
