namespace PhaseSlope.Core.Models;

/// <summary>Short identifiers of the cubic models, used by the command line and in reports.</summary>
public static class CubicModelKinds
{
    private static readonly (CubicModelKind Kind, string Id, string Title)[] Table =
    [
        (CubicModelKind.PengRobinson, "pr", "Peng-Robinson (1976)"),
        (CubicModelKind.PengRobinson1978, "pr78", "Peng-Robinson (1978 kappa for omega > 0.491)"),
        (CubicModelKind.SoaveRedlichKwong, "srk", "Soave-Redlich-Kwong (1972)"),
        (CubicModelKind.RedlichKwong, "rk", "Redlich-Kwong (1949)"),
        (CubicModelKind.VanDerWaals, "vdw", "van der Waals (1873)"),
    ];

    /// <summary>All identifiers, in the order the documentation lists them.</summary>
    public static IReadOnlyList<string> Ids { get; } = Table.Select(t => t.Id).ToArray();

    /// <summary>The short identifier (for example "pr") of a model.</summary>
    public static string Id(this CubicModelKind kind) => Table.First(t => t.Kind == kind).Id;

    /// <summary>A readable title of a model with its year.</summary>
    public static string Title(this CubicModelKind kind) => Table.First(t => t.Kind == kind).Title;

    /// <summary>Finds a model by its identifier, case-insensitively.</summary>
    public static bool TryParse(string id, out CubicModelKind kind)
    {
        foreach (var row in Table)
        {
            if (string.Equals(row.Id, id, StringComparison.OrdinalIgnoreCase))
            {
                kind = row.Kind;
                return true;
            }
        }

        kind = default;
        return false;
    }
}
