using System.Text;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Reads mixture files (<c>.mixture</c>): the components with their fractions and the
/// interaction parameters with their sources, one entry per line (docs/mixture-files.md).</summary>
/// <remarks>
/// <code>
/// format     phaseslope-mixture 1
/// name       natural gas A (invented)
/// basis      mole
/// component  methane = 0.90
/// component  nitrogen = 0.10
/// kij        methane, nitrogen = 0.0311 | Knapp et al., DECHEMA Chemistry Data Series Vol. VI (1982)
/// </code>
/// Every error is a <see cref="FluidDataException"/> naming the file, the line and the key.
/// </remarks>
public static class MixtureFile
{
    /// <summary>The format tag of the first line.</summary>
    public const string FormatTag = "phaseslope-mixture";

    /// <summary>The only format version this reader accepts.</summary>
    public const int FormatVersion = 1;

    /// <summary>The usual file name extension.</summary>
    public const string Extension = ".mixture";

    /// <summary>Reads a mixture file.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="origin">The file name, for messages.</param>
    /// <param name="resolve">Turns a component name as written into a fluid (a catalog name or
    /// synonym, or a fluid file); its <see cref="UnknownFluidException"/> or
    /// <see cref="FluidDataException"/> is reported at the component's line.</param>
    /// <returns>The mixture, and the name and remarks the file gives (null when none).</returns>
    /// <exception cref="FluidDataException">The file is malformed or a check fails.</exception>
    public static (Mixture Mixture, string? Name, string? Remarks) Parse(TextReader reader, string origin, Func<string, Fluid> resolve)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(origin);
        ArgumentNullException.ThrowIfNull(resolve);
        var components = new List<(int Line, Fluid Fluid, double Fraction)>();
        var pairs = new List<(int Line, string First, string Second, double Value, string Source)>();
        string? name = null;
        string? remarks = null;
        bool? mass = null;
        bool sawFormat = false;
        int lineNumber = 0;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        while (reader.ReadLine() is string raw)
        {
            lineNumber++;
            string line = raw.Trim();
            if (lineNumber == 1)
            {
                line = line.TrimStart('\uFEFF');
            }

            if (line.Length == 0 || line[0] == '#')
            {
                continue;
            }

            int space = line.IndexOfAny([' ', '\t']);
            string key = space < 0 ? line : line[..space];
            string rest = space < 0 ? "" : line[(space + 1)..].Trim();
            if (!sawFormat)
            {
                if (key != "format" || rest != $"{FormatTag} {FormatVersion}")
                {
                    throw new FluidDataException(origin, lineNumber, "format", $"the first entry must be 'format {FormatTag} {FormatVersion}', found '{line}'");
                }

                sawFormat = true;
                seen.Add(key);
                continue;
            }

            if (key is "name" or "basis" or "remarks" or "format" && !seen.Add(key))
            {
                throw new FluidDataException(origin, lineNumber, key, "given twice; each of format, name, basis and remarks may appear once");
            }

            switch (key)
            {
                case "name":
                    name = Require(origin, lineNumber, key, rest);
                    break;
                case "remarks":
                    remarks = Require(origin, lineNumber, key, rest);
                    break;
                case "basis":
                    mass = rest switch
                    {
                        "mole" => false,
                        "mass" => true,
                        _ => throw new FluidDataException(origin, lineNumber, key, $"'{rest}' is not a basis; write 'mole' or 'mass'"),
                    };
                    break;
                case "component":
                    components.Add(ReadComponent(origin, lineNumber, rest, resolve));
                    break;
                case "kij":
                    pairs.Add(ReadInteraction(origin, lineNumber, rest));
                    break;
                default:
                    throw new FluidDataException(origin, lineNumber, key, "unknown key; a mixture file has format, name, basis, component, kij and remarks lines");
            }
        }

        if (!sawFormat)
        {
            throw new FluidDataException(origin, Math.Max(lineNumber, 1), "format", $"no entries; a mixture file starts with 'format {FormatTag} {FormatVersion}'");
        }

        if (components.Count == 0)
        {
            throw new FluidDataException(origin, Math.Max(lineNumber, 1), "component", "no component lines (component NAME = FRACTION)");
        }

        return (Build(origin, components, pairs, mass ?? false), name, remarks);
    }

    private static (int Line, Fluid Fluid, double Fraction) ReadComponent(string origin, int line, string text, Func<string, Fluid> resolve)
    {
        if (text.Contains('|', StringComparison.Ordinal))
        {
            throw new FluidDataException(origin, line, "component", "takes no source: write 'component NAME = FRACTION' (the composition is yours; say where it came from in 'remarks')");
        }

        if (!MixtureSyntax.TryParseComponent(text, out string name, out double fraction, out string problem))
        {
            throw new FluidDataException(origin, line, "component", problem);
        }

        try
        {
            return (line, resolve(name), fraction);
        }
        catch (UnknownFluidException ex)
        {
            throw new FluidDataException(origin, line, "component", ex.Message);
        }
        catch (FluidDataException ex)
        {
            throw new FluidDataException(origin, line, "component", $"component '{name}': {ex.Message}");
        }
    }

    private static (int Line, string First, string Second, double Value, string Source) ReadInteraction(string origin, int line, string text)
    {
        int bar = text.IndexOf('|', StringComparison.Ordinal);
        string source = bar < 0 ? "" : text[(bar + 1)..].Trim();
        if (source.Length == 0)
        {
            throw new FluidDataException(origin, line, "kij", "needs '| source' after the value: the publication, your fit, or 'from memory'");
        }

        if (!MixtureSyntax.TryParseInteraction(text[..bar], out string first, out string second, out double value, out string problem))
        {
            throw new FluidDataException(origin, line, "kij", problem);
        }

        return (line, first, second, value, source);
    }

    private static Mixture Build(string origin, List<(int Line, Fluid Fluid, double Fraction)> components,
        List<(int Line, string First, string Second, double Value, string Source)> pairs, bool mass)
    {
        var fluids = components.Select(c => c.Fluid).ToArray();
        var fractions = components.Select(c => c.Fraction).ToArray();
        Mixture mixture;
        try
        {
            mixture = mass ? Mixture.FromMassFractions(fluids, fractions) : Mixture.Create(fluids, fractions);
        }
        catch (InvalidInputException ex)
        {
            // A named component is reported at its own line; the sum at the last component line.
            int at = components.FindIndex(c => c.Fluid.Name == ex.Field);
            var component = at >= 0 ? components[at] : components[^1];
            if (at >= 0 && ex.Message.Contains("given twice", StringComparison.Ordinal))
            {
                component = components[components.FindLastIndex(c => c.Fluid.Name == ex.Field)];
            }

            throw new FluidDataException(origin, component.Line, "component", ex.Message);
        }
        catch (FluidDataException ex) when (ex.Field == "molar_mass")
        {
            var component = components.First(c => c.Fluid.MolarMass is null);
            throw new FluidDataException(origin, component.Line, "component", $"basis mass: {ex.Problem}");
        }

        var given = new List<GivenInteraction>();
        foreach (var (line, first, second, value, source) in pairs)
        {
            int i = Find(origin, line, mixture, first);
            int j = Find(origin, line, mixture, second);
            given.Add(new GivenInteraction(i, j, value, source));
            try
            {
                mixture.WithInteractions(given);
            }
            catch (InvalidInputException ex)
            {
                throw new FluidDataException(origin, line, "kij", ex.Message);
            }
        }

        return given.Count == 0 ? mixture : mixture.WithInteractions(given);
    }

    private static int Find(string origin, int line, Mixture mixture, string name)
    {
        int index = mixture.IndexOf(name);
        return index >= 0
            ? index
            : throw new FluidDataException(origin, line, "kij", $"'{name}' is not a component of this mixture (components: {string.Join(", ", mixture.Components.Select(c => c.Name))})");
    }

    private static string Require(string origin, int line, string key, string value)
        => value.Length > 0 ? value : throw new FluidDataException(origin, line, key, "has no value");

    /// <summary>Opens a stream as UTF-8 text for <see cref="Parse"/>.</summary>
    public static (Mixture Mixture, string? Name, string? Remarks) Read(Stream stream, string origin, Func<string, Fluid> resolve)
    {
        ArgumentNullException.ThrowIfNull(stream);
        using var reader = new StreamReader(stream, new UTF8Encoding(false, true), detectEncodingFromByteOrderMarks: true, leaveOpen: true);
        return Parse(reader, origin, resolve);
    }
}
