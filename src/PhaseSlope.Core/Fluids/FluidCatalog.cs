using System.Diagnostics.CodeAnalysis;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Fluids;

/// <summary>A set of fluids that can be found by name or synonym.</summary>
/// <remarks>Look-up compares normalised names (see <see cref="FluidNames.Normalise"/>): case is
/// ignored, and so are white space, hyphens, underscores and commas, so "R-134a", "R134a" and
/// "r134a" find the same fluid. Every name and synonym must be unique across the catalog once
/// normalised.
/// <para>The <see cref="Embedded"/> catalog indexes its files by reading only their <c>name</c>
/// and <c>synonyms</c> lines, and parses a file in full the first time its fluid is asked for
/// (then keeps it). Finding one fluid therefore parses one file, not the whole catalog; only
/// <see cref="All"/> parses every file. A process that looks up one fluid pays for one.</para></remarks>
public sealed class FluidCatalog
{
    /// <summary>Prefix of the manifest resource names under which the shipped fluid files are embedded.</summary>
    public const string ResourcePrefix = "PhaseSlope.Fluids.";

    private const int MaxNearMatches = 4;

    private static readonly Lazy<FluidCatalog> EmbeddedCatalog = new(ReadEmbedded, LazyThreadSafetyMode.ExecutionAndPublication);

    private readonly Dictionary<string, Entry> _byNormalName = new(StringComparer.Ordinal);
    private readonly Lazy<IReadOnlyList<Fluid>> _all;
    private int _filesParsed;

    /// <summary>Builds a catalog from fluids already read.</summary>
    /// <param name="fluids">The fluids.</param>
    /// <exception cref="FluidDataException">Two fluids share a name or synonym once normalised.</exception>
    public FluidCatalog(IEnumerable<Fluid> fluids)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        var entries = new List<Entry>();
        foreach (Fluid fluid in fluids)
        {
            ArgumentNullException.ThrowIfNull(fluid, nameof(fluids));
            var entry = new Entry(fluid.Name, fluid.Origin, new Lazy<Fluid>(fluid));
            RegisterAll(entry, fluid.Synonyms);
            entries.Add(entry);
        }

        _all = SortedByName(entries);
    }

    /// <summary>Builds a catalog from fluid files that are indexed now by their name and synonym
    /// lines and parsed in full on first use.</summary>
    /// <param name="files">The files, each with its origin (used in messages and as
    /// <see cref="Fluid.Origin"/>) and a way to open it; a file may be opened twice, once to
    /// index it and once to parse it.</param>
    /// <exception cref="FluidDataException">A file's name or synonyms are missing or malformed,
    /// or two files share a name or synonym once normalised.</exception>
    internal FluidCatalog(IEnumerable<FluidFileSource> files)
    {
        ArgumentNullException.ThrowIfNull(files);
        var entries = new List<Entry>();
        foreach (FluidFileSource file in files)
        {
            (string name, IReadOnlyList<string> synonyms) = Open(file, s => FluidFile.ScanNames(s, file.Origin));
            var entry = new Entry(name, file.Origin, new Lazy<Fluid>(() => Parse(file), LazyThreadSafetyMode.ExecutionAndPublication));
            RegisterAll(entry, synonyms);
            entries.Add(entry);
        }

        _all = SortedByName(entries);
    }

    /// <summary>The catalog shipped inside the library, built on first use from every embedded
    /// resource whose name starts with <see cref="ResourcePrefix"/>. Building it reads only the
    /// name and synonym lines; each fluid's file is parsed when the fluid is first asked for.</summary>
    /// <exception cref="FluidDataException">A shipped file has a malformed name or synonym, or two
    /// share one (a build defect).</exception>
    public static FluidCatalog Embedded => EmbeddedCatalog.Value;

    /// <summary>Every fluid, sorted by canonical name (ordinal). The first use parses every file
    /// not yet parsed.</summary>
    /// <exception cref="FluidDataException">A file of the catalog fails validation (for the
    /// embedded catalog, a build defect).</exception>
    public IReadOnlyList<Fluid> All => _all.Value;

    /// <summary>How many fluid files this catalog has parsed in full so far (indexing does not
    /// count; a catalog built from fluids already read parses none).</summary>
    internal int FilesParsed => Volatile.Read(ref _filesParsed);

    /// <summary>Finds a fluid by its name or one of its synonyms.</summary>
    /// <param name="name">The name as typed.</param>
    /// <returns>The fluid.</returns>
    /// <exception cref="UnknownFluidException">No fluid has that name; the exception lists up to
    /// four catalog names closest by edit distance.</exception>
    /// <exception cref="FluidDataException">The fluid's file fails validation when it is parsed
    /// (for the embedded catalog, a build defect).</exception>
    public Fluid Find(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (TryFind(name, out Fluid? fluid))
        {
            return fluid;
        }

        throw new UnknownFluidException(name, NearMatches(name));
    }

    /// <summary>Finds a fluid by its name or one of its synonyms, without throwing for an unknown name.</summary>
    /// <param name="name">The name as typed.</param>
    /// <param name="fluid">The fluid, or null when none has that name.</param>
    /// <returns>True when a fluid was found.</returns>
    /// <exception cref="FluidDataException">The fluid's file fails validation when it is parsed
    /// (for the embedded catalog, a build defect).</exception>
    public bool TryFind(string name, [NotNullWhen(true)] out Fluid? fluid)
    {
        ArgumentNullException.ThrowIfNull(name);
        if (_byNormalName.TryGetValue(FluidNames.Normalise(name), out Entry? entry))
        {
            fluid = entry.Fluid.Value;
            return true;
        }

        fluid = null;
        return false;
    }

    /// <summary>Canonical names of the fluids whose name or a synonym is closest to
    /// <paramref name="name"/> by edit distance on normalised names, best first, at most four, and
    /// only those close enough to be a plausible misspelling. Parses no file.</summary>
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
        var best = new Dictionary<Entry, int>(ReferenceEqualityComparer.Instance);
        foreach ((string normal, Entry entry) in _byNormalName)
        {
            int distance = FluidNames.EditDistance(wanted, normal);
            if (distance <= limit && (!best.TryGetValue(entry, out int known) || distance < known))
            {
                best[entry] = distance;
            }
        }

        return [.. best
            .OrderBy(pair => pair.Value)
            .ThenBy(pair => pair.Key.Name, StringComparer.Ordinal)
            .Take(MaxNearMatches)
            .Select(pair => pair.Key.Name)];
    }

    /// <summary>A fresh catalog over the embedded resources (the one behind <see cref="Embedded"/>,
    /// which builds it once per process).</summary>
    internal static FluidCatalog ReadEmbedded()
    {
        var assembly = typeof(FluidCatalog).Assembly;
        return new FluidCatalog(assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(resource => new FluidFileSource(resource, () => assembly.GetManifestResourceStream(resource)
                ?? throw new FluidDataException(resource, 0, null, "embedded resource could not be opened")))
            .ToList());
    }

    private Fluid Parse(FluidFileSource file)
    {
        Fluid fluid = Open(file, s => FluidFile.Read(s, file.Origin));
        Interlocked.Increment(ref _filesParsed);
        return fluid;
    }

    private static T Open<T>(FluidFileSource file, Func<Stream, T> read)
    {
        using Stream stream = file.Open();
        return read(stream);
    }

    private static Lazy<IReadOnlyList<Fluid>> SortedByName(List<Entry> entries)
    {
        entries.Sort((a, b) => string.CompareOrdinal(a.Name, b.Name));
        return new Lazy<IReadOnlyList<Fluid>>(
            () => entries.Select(e => e.Fluid.Value).ToList().AsReadOnly(),
            LazyThreadSafetyMode.ExecutionAndPublication);
    }

    private void RegisterAll(Entry entry, IEnumerable<string> synonyms)
    {
        Register(entry, entry.Name, "name");
        foreach (string synonym in synonyms)
        {
            Register(entry, synonym, "synonyms");
        }
    }

    private void Register(Entry entry, string label, string field)
    {
        string normal = FluidNames.Normalise(label);
        if (normal.Length == 0)
        {
            throw new FluidDataException(entry.Origin, 0, field, $"'{label}' has no letters or digits");
        }

        if (_byNormalName.TryGetValue(normal, out Entry? other))
        {
            string where = other.Origin.Length == 0 ? "" : $" ({other.Origin})";
            throw new FluidDataException(entry.Origin, 0, field,
                $"'{label}' of fluid '{entry.Name}' is already a name of fluid '{other.Name}'{where}");
        }

        _byNormalName[normal] = entry;
    }

    /// <summary>One fluid of the catalog: its canonical name and origin, known from the index,
    /// and the fluid itself, read when first asked for.</summary>
    private sealed record Entry(string Name, string Origin, Lazy<Fluid> Fluid);
}
