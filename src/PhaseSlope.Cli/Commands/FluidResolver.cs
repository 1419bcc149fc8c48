using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary>Turns a FLUID argument into a fluid: a catalog name or synonym, or the path of a
/// fluid file.</summary>
/// <remarks>An argument that looks like a path (contains a directory separator or ends in
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
