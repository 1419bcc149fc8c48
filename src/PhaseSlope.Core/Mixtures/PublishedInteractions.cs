using System.Diagnostics.CodeAnalysis;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The one table of published binary interaction parameters k_ij shipped with the tool,
/// keyed by canonical catalog fluid names; a pair that is not here gets k_ij = 0 with a note
/// (<see cref="InteractionOrigin.AssumedZero"/>) unless the user gives one.</summary>
/// <remarks>
/// <para>Every value was fitted by its source to binary vapour–liquid equilibrium data with the
/// Peng–Robinson (1976) equation and van der Waals one-fluid mixing. It applies to Peng–Robinson
/// 1978 too: the 1978 κ(ω) differs from the 1976 one only for ω &gt; 0.491, and every fluid in
/// this table has ω below that, so both models are the same function for these pairs.</para>
/// <para>No Soave–Redlich–Kwong, Redlich–Kwong or van der Waals values are shipped: none could be
/// sourced with enough confidence, so under those models every pair is an assumed zero unless
/// given. Refrigerant and solvent pairs are absent for the same reason.</para>
/// <para>All values were recalled, not read from the publication at the time of writing ("from
/// memory" in each source); check them against the publication before relying on them for design.
/// A k_ij of a few hundredths moves a bubble pressure of CO2 or N2 with hydrocarbons by several
/// per cent, so an assumed zero is flagged in every output.</para>
/// </remarks>
public static class PublishedInteractions
{
    private const string Knapp =
        "Knapp, Döring, Oellrich, Plöcker & Prausnitz, Vapor-Liquid Equilibria for Mixtures of Low Boiling Substances, "
        + "DECHEMA Chemistry Data Series Vol. VI (1982), Peng-Robinson k_ij; from memory";

    private static readonly CubicModelKind[] PengRobinsonBoth = [CubicModelKind.PengRobinson, CubicModelKind.PengRobinson1978];

    private static readonly PublishedInteraction[] Rows =
    [
        new("carbon dioxide", "methane", PengRobinsonBoth, 0.0919, Knapp),
        new("carbon dioxide", "ethane", PengRobinsonBoth, 0.1322, Knapp),
        new("carbon dioxide", "propane", PengRobinsonBoth, 0.1241, Knapp),
        new("carbon dioxide", "n-butane", PengRobinsonBoth, 0.1333, Knapp),
        new("nitrogen", "methane", PengRobinsonBoth, 0.0311, Knapp),
        new("nitrogen", "ethane", PengRobinsonBoth, 0.0515, Knapp),
        new("nitrogen", "propane", PengRobinsonBoth, 0.0852, Knapp),
        new("nitrogen", "n-butane", PengRobinsonBoth, 0.0800, Knapp),
        new("carbon dioxide", "nitrogen", PengRobinsonBoth, -0.0170, Knapp),
        new("hydrogen sulfide", "methane", PengRobinsonBoth, 0.0850, Knapp + " (recollection less certain than the CO2 and N2 rows)"),
    ];

    /// <summary>Every row of the table.</summary>
    public static IReadOnlyList<PublishedInteraction> All => Rows;

    /// <summary>Finds the published k_ij of two fluids for a model, matching the fluids' canonical
    /// names (so a fluid file named like a catalog fluid finds the catalog fluid's pairs), in
    /// either order.</summary>
    /// <param name="first">One fluid.</param>
    /// <param name="second">The other fluid.</param>
    /// <param name="kind">The cubic model.</param>
    /// <param name="interaction">The row, or null when none applies.</param>
    /// <returns>True when a row applies.</returns>
    public static bool TryFind(Fluid first, Fluid second, CubicModelKind kind, [NotNullWhen(true)] out PublishedInteraction? interaction)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        string a = FluidNames.Normalise(first.Name);
        string b = FluidNames.Normalise(second.Name);
        foreach (var row in Rows)
        {
            string x = FluidNames.Normalise(row.First);
            string y = FluidNames.Normalise(row.Second);
            if (((x == a && y == b) || (x == b && y == a)) && row.Models.Contains(kind))
            {
                interaction = row;
                return true;
            }
        }

        interaction = null;
        return false;
    }
}
