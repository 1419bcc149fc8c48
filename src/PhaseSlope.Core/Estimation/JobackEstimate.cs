using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Estimation;

/// <summary>The Joback estimates for one molecule, SI units. A null is a quantity the method
/// cannot give for these groups (a blank in its table: see <see cref="GroupsWithout"/>).</summary>
/// <param name="NormalBoilingPoint">Estimated Tb, K.</param>
/// <param name="CriticalTemperature">Estimated Tc, K (from the measured Tb when one was given).</param>
/// <param name="CriticalPressure">Estimated Pc, Pa.</param>
/// <param name="CriticalVolume">Estimated Vc, m³/mol.</param>
/// <param name="IdealGasHeatCapacity">Estimated cp°(T) with the method's range.</param>
/// <param name="Composition">Element counts the groups stand for.</param>
/// <param name="Groups">The groups with their counts.</param>
/// <param name="GroupList">The groups, as text for source labels.</param>
/// <param name="Source">The source label of every estimated value.</param>
/// <param name="UsedMeasuredBoilingPoint">True when Tc was computed from a measured Tb.</param>
public sealed record JobackEstimate(
    double NormalBoilingPoint,
    double? CriticalTemperature,
    double? CriticalPressure,
    double? CriticalVolume,
    IdealGasHeatCapacity? IdealGasHeatCapacity,
    IReadOnlyDictionary<string, int> Composition,
    IReadOnlyList<(JobackGroup Group, int Count)> Groups,
    string GroupList,
    string Source,
    bool UsedMeasuredBoilingPoint)
{
    /// <summary>Number of atoms nA.</summary>
    public int Atoms => Composition.Values.Sum();

    /// <summary>The molecular formula the groups imply, in Hill order.</summary>
    public string Formula => ChemicalFormula.Hill(Composition);

    /// <summary>The molar mass of <see cref="Composition"/>, kg/mol (IUPAC 2005 atomic weights).</summary>
    public double MolarMass => ChemicalFormula.MolarMass(Composition);

    /// <summary>The identifiers of the groups whose contribution is blank in the table, as text
    /// ("=NH, =N"), or null when every group has one.</summary>
    /// <param name="contribution">Which contribution, for example <c>g =&gt; g.Tc</c>.</param>
    public string? GroupsWithout(Func<JobackGroup, object?> contribution)
    {
        ArgumentNullException.ThrowIfNull(contribution);
        var ids = Groups.Where(g => contribution(g.Group) is null).Select(g => g.Group.Id).ToList();
        return ids.Count == 0 ? null : string.Join(", ", ids);
    }
}
