namespace PhaseSlope.Core.Errors;

/// <summary>A fluid file could not be read or failed validation.</summary>
/// <remarks>The message names the file (origin), the line and the field.</remarks>
public sealed class FluidDataException : PhaseSlopeException
{
    /// <summary>Creates the exception for a problem at a line of a fluid file.</summary>
    /// <param name="origin">File name or catalog resource name.</param>
    /// <param name="line">1-based line number, or 0 when the problem concerns the whole file.</param>
    /// <param name="field">The field concerned, or null.</param>
    /// <param name="problem">What is wrong, without the location.</param>
    public FluidDataException(string origin, int line, string? field, string problem)
        : base(Format(origin, line, field, problem))
    {
        Origin = origin;
        Line = line;
        Field = field;
        Problem = problem;
    }

    /// <summary>File name or catalog resource name.</summary>
    public string Origin { get; }

    /// <summary>1-based line number, 0 for the whole file.</summary>
    public int Line { get; }

    /// <summary>The field concerned, or null.</summary>
    public string? Field { get; }

    /// <summary>What is wrong, without the location.</summary>
    public string Problem { get; }

    private static string Format(string origin, int line, string? field, string problem)
    {
        string where = line > 0 ? $"{origin}:{line}" : origin;
        return field is null ? $"{where}: {problem}" : $"{where}: field '{field}': {problem}";
    }
}
