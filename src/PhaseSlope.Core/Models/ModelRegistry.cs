namespace PhaseSlope.Core.Models;

/// <summary>One published cubic model: its identifier, title, form, own alpha function, the
/// alpha families it accepts and its Péneloux-type volume-shift correlation.</summary>
/// <param name="Kind">The model.</param>
/// <param name="Id">Short identifier for the command line and reports (for example "pr").</param>
/// <param name="Title">Readable title with its year.</param>
/// <param name="Form">δ1, δ2 and the derived Ωa, Ωb, Zc.</param>
/// <param name="OwnAlpha">The model's own α(T) from ω and Tc.</param>
/// <param name="AcceptsAlphaChoice">Whether Twu and Mathias–Copeman alpha functions apply
/// (they were published for the Peng–Robinson and Soave–Redlich–Kwong forms only).</param>
/// <param name="AlphaParametersOf">Whose published Twu or Mathias–Copeman parameters serve this
/// model when it has none of its own (Peng–Robinson 1978 differs from 1976 only in κ(ω)).</param>
/// <param name="Peneloux">Slope and offset of c = slope·(offset − Z_RA)·R·Tc/Pc, or null when the
/// model has no such correlation.</param>
public sealed record ModelEntry(
    CubicModelKind Kind,
    string Id,
    string Title,
    CubicForm Form,
    Func<double, double, IAlphaFunction> OwnAlpha,
    bool AcceptsAlphaChoice,
    CubicModelKind? AlphaParametersOf,
    (double Slope, double Offset)? Peneloux);

/// <summary>The registry of models: the one table that the command line, the model factory and
/// the volume-shift correlations read. Adding a published cubic is one row here.</summary>
public static class ModelRegistry
{
    private static readonly ModelEntry[] Table =
    [
        new(CubicModelKind.PengRobinson, "pr", "Peng-Robinson (1976)", CubicForm.PengRobinson,
            (omega, tc) => new SoaveAlpha(SoaveAlpha.PengRobinson1976Slope(omega), tc, "Peng & Robinson 1976"),
            true, null, VolumeShift.PengRobinsonCoefficients),
        new(CubicModelKind.PengRobinson1978, "pr78", "Peng-Robinson (1978 kappa for omega > 0.491)", CubicForm.PengRobinson,
            (omega, tc) => new SoaveAlpha(SoaveAlpha.PengRobinson1978Slope(omega), tc, "Robinson & Peng 1978"),
            true, CubicModelKind.PengRobinson, VolumeShift.PengRobinsonCoefficients),
        new(CubicModelKind.SoaveRedlichKwong, "srk", "Soave-Redlich-Kwong (1972)", CubicForm.RedlichKwong,
            (omega, tc) => new SoaveAlpha(SoaveAlpha.SoaveSlope(omega), tc, "Soave 1972"),
            true, null, VolumeShift.SoaveRedlichKwongCoefficients),
        new(CubicModelKind.RedlichKwong, "rk", "Redlich-Kwong (1949)", CubicForm.RedlichKwong,
            (_, tc) => new InverseRootAlpha(tc), false, null, null),
        new(CubicModelKind.VanDerWaals, "vdw", "van der Waals (1873)", CubicForm.VanDerWaals,
            (_, _) => new ConstantAlpha(), false, null, null),
    ];

    /// <summary>Every registered model, in the order the documentation lists them.</summary>
    public static IReadOnlyList<ModelEntry> Entries => Table;

    /// <summary>All identifiers, in the order the documentation lists them.</summary>
    public static IReadOnlyList<string> Ids { get; } = Table.Select(t => t.Id).ToArray();

    /// <summary>The registry row of a model.</summary>
    public static ModelEntry Entry(this CubicModelKind kind)
        => Array.Find(Table, t => t.Kind == kind) ?? throw new ArgumentOutOfRangeException(nameof(kind), kind, "unknown cubic model");

    /// <summary>The short identifier (for example "pr") of a model.</summary>
    public static string Id(this CubicModelKind kind) => kind.Entry().Id;

    /// <summary>A readable title of a model with its year.</summary>
    public static string Title(this CubicModelKind kind) => kind.Entry().Title;

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
