using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Estimation;

/// <summary>One structural group of the Joback method with its contributions and the atoms it
/// stands for.</summary>
/// <param name="Id">Short identifier used in group lists (for example "CH3", "ring=CH", "OH");
/// the identifiers are ours and listed in docs/estimation.md.</param>
/// <param name="Description">The group as drawn, for reports.</param>
/// <param name="Formula">The atoms of the group including its hydrogens, as a formula (for example
/// "CH3" for −CH3, "CHO" for the aldehyde group O=CH−, "N" for >N−).</param>
/// <param name="Tc">Contribution to Tc, or null where the published table has none.</param>
/// <param name="Pc">Contribution to Pc, or null where the published table has none.</param>
/// <param name="Vc">Contribution to Vc, cm³/mol, or null where the published table has none.</param>
/// <param name="Tb">Contribution to Tb, K.</param>
/// <param name="HeatCapacity">Ideal-gas heat-capacity contributions a, b, c, d, or null where the
/// published table has none.</param>
public sealed record JobackGroup(string Id, string Description, string Formula, double? Tc, double? Pc, double? Vc, double Tb, JobackHeatCapacityTerms? HeatCapacity)
{
    /// <summary>Element counts of the group (from <see cref="Formula"/>).</summary>
    public IReadOnlyDictionary<string, int> Composition { get; } = ChemicalFormula.Parse(Formula);

    /// <summary>Atoms in the group including its hydrogens (for nA in the Pc relation).</summary>
    public int Atoms => Composition.Values.Sum();
}
