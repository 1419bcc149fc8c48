using System.Diagnostics.CodeAnalysis;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Fluids;

/// <summary>A set of fluids that can be found by name or synonym.</summary>
/// <remarks>Look-up compares normalised names (see <see cref="FluidNames.Normalise"/>): case is
/// ignored, and so are white space, hyphens, underscores and commas, so "R-134a", "R134a" and
/// "r134a" find the same fluid. Every name and synonym must be unique across the catalog once
/// normalised.</remarks>
public sealed class FluidCatalog
{
    /// <summary>Prefix of the manifest resource names under which the shipped fluid files are embedded.</summary>
    public const string ResourcePrefix = "PhaseSlope.Fluids.";

    private const int MaxNearMatches = 4;

    private static readonly Lazy<FluidCatalog> EmbeddedCatalog = new(LoadEmbedded, LazyThreadSafetyMode.ExecutionAndPublication);

    private readonly Dictionary<string, Fluid> _byNormalName = new(StringComparer.Ordinal);

    /// <summary>Builds a catalog from fluids already read.</summary>
    /// <param name="fluids">The fluids.</param>
    /// <exception cref="FluidDataException">Two fluids share a name or synonym once normalised.</exception>
    public FluidCatalog(IEnumerable<Fluid> fluids)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        var list = new List<Fluid>();
        foreach (Fluid fluid in fluids)
        {
            ArgumentNullException.ThrowIfNull(fluid, nameof(fluids));
            Register(fluid, fluid.Name, "name");
            foreach (string synonym in fluid.Synonyms)
            {
                Register(fluid, synonym, "synonyms");
            }

            list.Add(fluid);
        }

        list.Sort((a, b) => string.CompareOrdinal(a.Name, b.Name));
        All = list.AsReadOnly();
    }

    /// <summary>The catalog shipped inside the library, read once on first use from every embedded
    /// resource whose name starts with <see cref="ResourcePrefix"/>.</summary>
    /// <exception cref="FluidDataException">A shipped file is invalid (a build defect).</exception>
    public static FluidCatalog Embedded => EmbeddedCatalog.Value;

    /// <summary>Every fluid, sorted by canonical name (ordinal).</summary>
    public IReadOnlyList<Fluid> All { get; }

    /// <summary>Finds a fluid by its name or one of its synonyms.</summary>
    /// <param name="name">The name as typed.</param>
    /// <returns>The fluid.</returns>
    /// <exception cref="UnknownFluidException">No fluid has that name; the exception lists up to
    /// four catalog names closest by edit distance.</exception>
    public Fluid Find(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (TryFind(name, out Fluid? fluid))
        {
            return fluid;
        }

        throw new UnknownFluidException(name, NearMatches(name));
    }

    /// <summary>Finds a fluid by its name or one of its synonyms, without throwing.</summary>
    /// <param name="name">The name as typed.</param>
    /// <param name="fluid">The fluid, or null when none has that name.</param>
    /// <returns>True when a fluid was found.</returns>
    public bool TryFind(string name, [NotNullWhen(true)] out Fluid? fluid)
    {
        ArgumentNullException.ThrowIfNull(name);
        return _byNormalName.TryGetValue(FluidNames.Normalise(name), out fluid);
    }

    /// <summary>Canonical names of the fluids whose name or a synonym is closest to
    /// <paramref name="name"/> by edit distance on normalised names, best first, at most four, and
    /// only those close enough to be a plausible misspelling.</summary>
    /// <param name="name">The name as typed.</param>
    /// <returns>The canonical names, possibly none.</returns>
    public IReadOnlyList<string> NearMatches(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        string wanted = FluidNames.Normalise(name);
        if (wanted.Length == 0)
        {
            return [];
        }

        int limit = Math.Max(2, wanted.Length / 2);
        var best = new Dictionary<Fluid, int>(ReferenceEqualityComparer.Instance);
        foreach ((string normal, Fluid fluid) in _byNormalName)
        {
            int distance = FluidNames.EditDistance(wanted, normal);
            if (distance <= limit && (!best.TryGetValue(fluid, out int known) || distance < known))
            {
                best[fluid] = distance;
            }
        }

        return [.. best
            .OrderBy(pair => pair.Value)
            .ThenBy(pair => pair.Key.Name, StringComparer.Ordinal)
            .Take(MaxNearMatches)
            .Select(pair => pair.Key.Name)];
    }

    private void Register(Fluid fluid, string label, string field)
    {
        string normal = FluidNames.Normalise(label);
        if (normal.Length == 0)
        {
            throw new FluidDataException(fluid.Origin, 0, field, $"'{label}' has no letters or digits");
        }

        if (_byNormalName.TryGetValue(normal, out Fluid? other))
        {
            string where = other.Origin.Length == 0 ? "" : $" ({other.Origin})";
            throw new FluidDataException(fluid.Origin, 0, field,
                $"'{label}' of fluid '{fluid.Name}' is already a name of fluid '{other.Name}'{where}");
        }

        _byNormalName[normal] = fluid;
    }

    private static FluidCatalog LoadEmbedded()
    {
        var assembly = typeof(FluidCatalog).Assembly;
        var fluids = new List<Fluid>();
        foreach (string resource in assembly.GetManifestResourceNames()
                     .Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal))
                     .Order(StringComparer.Ordinal))
        {
            using Stream stream = assembly.GetManifestResourceStream(resource)
                ?? throw new FluidDataException(resource, 0, null, "embedded resource could not be opened");
            fluids.Add(FluidFile.Read(stream, resource));
        }

        return new FluidCatalog(fluids);
    }
}
