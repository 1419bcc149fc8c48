namespace PhaseSlope.Core.Errors;

/// <summary>A fluid name matched nothing in the catalog.</summary>
public sealed class UnknownFluidException : PhaseSlopeException
{
    /// <summary>Creates the exception with the name asked for and the closest catalog names.</summary>
    public UnknownFluidException(string name, IReadOnlyList<string> nearMatches)
        : base(nearMatches.Count == 0
            ? $"unknown fluid '{name}'; 'phaseslope fluids list' shows the catalog"
            : $"unknown fluid '{name}'; did you mean {string.Join(", ", nearMatches.Select(m => $"'{m}'"))}?")
    {
        Name = name;
        NearMatches = nearMatches;
    }

    /// <summary>The name that was asked for.</summary>
    public string Name { get; }

    /// <summary>Catalog names closest to the one asked for, best first.</summary>
    public IReadOnlyList<string> NearMatches { get; }
}
