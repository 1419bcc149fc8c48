using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary>Turns a FLUID argument into a fluid: an inline definition, a catalog name or synonym,
/// or the path of a fluid file.</summary>
/// <remarks>An argument that starts with <see cref="InlineFluid.Prefix"/> is an inline definition
/// (<see cref="InlineFluid"/>), whatever files exist. An argument that looks like a path (contains a directory separator or ends in
/// <c>.fluid</c>) is read as a file. Otherwise the catalog is searched first, and an existing
/// file of that name is used only when the catalog has no such fluid.</remarks>
internal static class FluidResolver
{
    /// <summary>Resolves the argument.</summary>
    /// <exception cref="UnknownFluidException">No catalog fluid and no file of that name.</exception>
    /// <exception cref="FluidDataException">The file cannot be read or fails validation.</exception>
    public static Fluid Resolve(string argument)
    {
        if (string.IsNullOrWhiteSpace(argument))
        {
            throw new Units.UsageException("FLUID: the fluid name is empty");
        }

        if (InlineFluid.IsInline(argument))
        {
            return ParseInline(argument);
        }

        bool pathLike = argument.Contains('/') || argument.Contains('\\')
            || argument.EndsWith(FluidFile.Extension, StringComparison.OrdinalIgnoreCase);
        if (!pathLike && FluidCatalog.Embedded.TryFind(argument, out var fluid))
        {
            return fluid;
        }

        if (pathLike || File.Exists(argument))
        {
            return ReadFile(argument);
        }

        return FluidCatalog.Embedded.Find(argument);
    }

    /// <summary>Reads an inline definition; a bad one is a usage error naming the key.</summary>
    /// <exception cref="Units.UsageException">The definition is malformed or a value fails the fluid-file checks.</exception>
    public static Fluid ParseInline(string argument)
    {
        try
        {
            return InlineFluid.Parse(argument);
        }
        catch (FluidDataException ex)
        {
            string where = ex.Field is null ? "" : $"'{ex.Field}': ";
            throw new Units.UsageException($"FLUID: inline fluid: {where}{ex.Problem}");
        }
    }

    /// <summary>Splits a comma-separated list of FLUID arguments (as <c>plot</c> takes). An item
    /// that starts with <see cref="InlineFluid.Prefix"/> takes with it every following item of the
    /// form <c>key=value</c>, so an inline definition's own commas do not split it.</summary>
    public static IReadOnlyList<string> SplitList(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var items = new List<string>();
        foreach (string piece in text.Split(','))
        {
            string item = piece.Trim();
            if (items.Count > 0 && InlineFluid.IsInline(items[^1]) && item.Contains('=') && !InlineFluid.IsInline(item))
            {
                items[^1] = $"{items[^1]},{item}";
            }
            else
            {
                items.Add(item);
            }
        }

        return items;
    }

    /// <summary>Reads a fluid file; errors name the file (and line and field for content errors).</summary>
    public static Fluid ReadFile(string path)
    {
        try
        {
            using var stream = Input.BoundedInput.Open(path, Input.BoundedInput.FluidFileLimit);
            return FluidFile.Read(stream, path);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new FluidDataException(path, 0, null, "fluid file not found");
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new FluidDataException(path, 0, null, $"cannot read fluid file: {ex.Message}");
        }
    }
}
