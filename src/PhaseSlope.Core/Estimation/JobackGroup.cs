namespace PhaseSlope.Core.Estimation;

/// <summary>One structural group of the Joback method with its contributions.</summary>
/// <param name="Id">Short identifier used in group lists (for example "CH3", "ring=CH", "OH").</param>
/// <param name="Description">The group as drawn, for reports.</param>
/// <param name="Tc">Contribution to Tc.</param>
/// <param name="Pc">Contribution to Pc.</param>
/// <param name="Vc">Contribution to Vc, cm³/mol.</param>
/// <param name="Tb">Contribution to Tb, K.</param>
/// <param name="A">Ideal-gas heat-capacity contribution a, J/(mol·K).</param>
/// <param name="B">b, J/(mol·K²).</param>
/// <param name="C">c, J/(mol·K³).</param>
/// <param name="D">d, J/(mol·K⁴).</param>
/// <param name="Atoms">Atoms in the group including its hydrogens (for nA in the Pc relation).</param>
public sealed record JobackGroup(string Id, string Description, double Tc, double Pc, double Vc, double Tb, double A, double B, double C, double D, int Atoms);
