using System.Text;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Cli.Commands;

/// <summary>A resolved MIXTURE argument: the mixture, the name its file gives it, and where it
/// came from.</summary>
/// <param name="Mixture">The mixture with every --kij applied.</param>
/// <param name="Name">The file's <c>name</c> line, or null (a command-line mixture has none).</param>
/// <param name="Origin">The mixture file's path, or <see cref="MixtureResolver.CommandLineOrigin"/>.</param>
/// <param name="Remarks">The file's <c>remarks</c> line, or null.</param>
internal sealed record ResolvedMixture(Mixture Mixture, string? Name, string Origin, string? Remarks = null);

/// <summary>Turns a MIXTURE argument into a <see cref="Mixture"/>: either
/// <c>NAME=FRACTION,NAME=FRACTION,…</c> (each NAME as FLUID accepts it: a catalog name or synonym,
/// or the path of a .fluid file) or the path of a mixture file (docs/mixture-files.md); then the
/// --kij overrides.</summary>
/// <remarks>
/// <para>An argument that contains '=' and does not end in <c>.mixture</c> is a list; anything
/// else is a mixture file. Inline fluids (<c>inline:…</c>) cannot be components: their own commas
/// and '=' would be read as the list's; a fluid file (path) can.</para>
/// <para>Exit codes: a malformed list, a negative fraction, fractions that do not sum to 1, a
/// repeated component, a malformed or misplaced --kij, or --mass-fractions with a file are usage
/// errors (2); an unknown component, a component without a molar mass under --mass-fractions, and
/// a mixture file that cannot be read or fails its checks are fluid errors (3), as for FLUID.</para>
/// </remarks>
internal static class MixtureResolver
{
    /// <summary>The origin of a mixture written on the command line.</summary>
    public const string CommandLineOrigin = "command line";

    /// <summary>The source recorded for a --kij value.</summary>
    public const string CommandLineKijSource = "given on the command line (--kij)";

    /// <summary>Whether <paramref name="argument"/> is a list (else a mixture file's path).</summary>
    public static bool IsList(string argument)
        => argument.Contains('=', StringComparison.Ordinal) && !argument.TrimEnd().EndsWith(MixtureFile.Extension, StringComparison.OrdinalIgnoreCase);

    /// <summary>The --kij texts parsed: names as written and values (checked for syntax only).</summary>
    /// <exception cref="UsageException">A text is not A,B=VALUE.</exception>
    public static IReadOnlyList<(string Text, string First, string Second, double Value)> ParseKij(IEnumerable<string> texts)
    {
        var parsed = new List<(string, string, string, double)>();
        foreach (string text in texts)
        {
            if (!MixtureSyntax.TryParseInteraction(text, out string first, out string second, out double value, out string problem))
            {
                throw new UsageException($"--kij: {problem}");
            }

            if (!Mixture.IsAcceptedInteraction(value))
            {
                throw new UsageException($"--kij: k_ij of {first}, {second} is {value.ToString("G10", System.Globalization.CultureInfo.InvariantCulture)}; {Mixture.InteractionRange}");
            }

            parsed.Add((text.Trim(), first, second, value));
        }

        return parsed;
    }

    /// <summary>Resolves the argument and applies the --kij overrides.</summary>
    /// <param name="argument">The MIXTURE text.</param>
    /// <param name="massFractions">--mass-fractions: the list's fractions are mass fractions.</param>
    /// <param name="kij">The --kij values (from <see cref="ParseKij"/>).</param>
    /// <exception cref="UsageException">See the remarks.</exception>
    /// <exception cref="FluidDataException">See the remarks.</exception>
    public static ResolvedMixture Resolve(string argument, bool massFractions, IReadOnlyList<(string Text, string First, string Second, double Value)> kij)
    {
        if (string.IsNullOrWhiteSpace(argument))
        {
            throw new UsageException("MIXTURE: the mixture is empty (write NAME=FRACTION,NAME=FRACTION,... or give a mixture file)");
        }

        bool list = IsList(argument);
        if (!list && massFractions)
        {
            throw new UsageException("--mass-fractions: applies to a MIXTURE written NAME=FRACTION,...; a mixture file states its basis on its 'basis' line");
        }

        string text = argument.Trim();
        bool pathLike = text.Contains('/') || text.Contains('\\') || text.EndsWith(MixtureFile.Extension, StringComparison.OrdinalIgnoreCase);
        if (!list && !pathLike && !File.Exists(text))
        {
            throw new UsageException($"MIXTURE: '{text}' is neither NAME=FRACTION,NAME=FRACTION,... (e.g. {text}=1 for one component) nor an existing mixture file");
        }

        var resolved = list ? FromList(argument, massFractions) : FromFile(text);
        return kij.Count == 0 ? resolved : resolved with { Mixture = ApplyKij(resolved.Mixture, kij) };
    }

    private static ResolvedMixture FromList(string argument, bool massFractions)
    {
        string[] items = argument.Split(',');
        var fluids = new List<Fluid>();
        var fractions = new List<double>();
        for (int k = 0; k < items.Length; k++)
        {
            string item = items[k];
            if (item.Trim().Length == 0)
            {
                throw new UsageException($"MIXTURE: item {k + 1} is empty (write NAME=FRACTION,NAME=FRACTION,...)");
            }

            if (InlineFluid.IsInline(item.Trim()) || items.Take(k).Any(i => InlineFluid.IsInline(i.Trim())))
            {
                throw new UsageException("MIXTURE: an inline fluid cannot be a component (its commas would split the list); save it as a .fluid file and give that path, or use a mixture file");
            }

            if (!MixtureSyntax.TryParseComponent(item, out string name, out double fraction, out string problem))
            {
                throw new UsageException($"MIXTURE: item {k + 1}: {problem}");
            }

            fluids.Add(ResolveComponent(name, k + 1));
            fractions.Add(fraction);
        }

        try
        {
            var mixture = massFractions ? Mixture.FromMassFractions(fluids, fractions) : Mixture.Create(fluids, fractions);
            return new ResolvedMixture(mixture, null, CommandLineOrigin);
        }
        catch (InvalidInputException ex)
        {
            throw new UsageException($"MIXTURE: {ex.Message}");
        }
        catch (FluidDataException ex) when (ex.Field == "molar_mass")
        {
            throw new FluidDataException("MIXTURE", 0, null, $"--mass-fractions: {ex.Problem}");
        }
    }

    /// <summary>A list component: a catalog name or synonym, or a fluid file (as FLUID).</summary>
    private static Fluid ResolveComponent(string name, int position)
    {
        try
        {
            return FluidResolver.Resolve(name);
        }
        catch (UnknownFluidException ex)
        {
            throw new FluidDataException("MIXTURE", 0, null, $"component {position}: {ex.Message}");
        }
        catch (FluidDataException ex)
        {
            throw new FluidDataException("MIXTURE", 0, null, $"component {position} '{name}': {ex.Message}");
        }
    }

    /// <summary>Reads a mixture file; a component that looks like a path is read relative to the
    /// mixture file's folder.</summary>
    private static ResolvedMixture FromFile(string path)
    {
        string folder = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        Fluid Component(string name)
        {
            bool pathLike = name.Contains('/') || name.Contains('\\') || name.EndsWith(FluidFile.Extension, StringComparison.OrdinalIgnoreCase);
            if (InlineFluid.IsInline(name))
            {
                throw new FluidDataException(path, 0, "component", "an inline fluid cannot be a component; give the path of a .fluid file");
            }

            return pathLike ? FluidResolver.ReadFile(Path.IsPathRooted(name) ? name : Path.Combine(folder, name)) : FluidCatalog.Embedded.Find(name);
        }

        try
        {
            using var stream = Input.BoundedInput.Open(path, Input.BoundedInput.FluidFileLimit);
            var (mixture, name, remarks) = MixtureFile.Read(stream, path, Component);
            return new ResolvedMixture(mixture, name, path, remarks);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new FluidDataException(path, 0, null, "mixture file not found (a MIXTURE is NAME=FRACTION,NAME=FRACTION,... or the path of a mixture file)");
        }
        catch (DecoderFallbackException)
        {
            throw new FluidDataException(path, 0, null, "cannot read mixture file: it is not UTF-8 text");
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new FluidDataException(path, 0, null, $"cannot read mixture file: {ex.Message}");
        }
    }

    /// <summary>Applies the --kij values over the mixture's own; each names two components of it.</summary>
    private static Mixture ApplyKij(Mixture mixture, IReadOnlyList<(string Text, string First, string Second, double Value)> kij)
    {
        var given = new List<GivenInteraction>();
        foreach (var (text, first, second, value) in kij)
        {
            given.Add(new GivenInteraction(IndexIn(mixture, first, text), IndexIn(mixture, second, text), value, CommandLineKijSource));
        }

        try
        {
            return mixture.WithInteractions(given);
        }
        catch (InvalidInputException ex)
        {
            throw new UsageException($"--kij: {ex.Message}");
        }
    }

    /// <summary>The component a --kij name means: its name or synonym, or a catalog name of it.</summary>
    private static int IndexIn(Mixture mixture, string name, string text)
    {
        int index = mixture.IndexOf(name);
        if (index < 0 && FluidCatalog.Embedded.TryFind(name, out var fluid))
        {
            index = mixture.IndexOf(fluid.Name);
        }

        return index >= 0
            ? index
            : throw new UsageException($"--kij '{text}': '{name}' is not a component of the mixture (components: {string.Join(", ", mixture.Components.Select(c => c.Name))})");
    }
}
