using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Estimation;

/// <summary>The Joback estimates for one molecule, SI units.</summary>
/// <param name="NormalBoilingPoint">Estimated Tb, K.</param>
/// <param name="CriticalTemperature">Estimated Tc, K (from the measured Tb when one was given).</param>
/// <param name="CriticalPressure">Estimated Pc, Pa.</param>
/// <param name="CriticalVolume">Estimated Vc, m³/mol.</param>
/// <param name="IdealGasHeatCapacity">Estimated cp°(T) with the method's range.</param>
/// <param name="Atoms">Number of atoms nA.</param>
/// <param name="GroupList">The groups, as text for source labels.</param>
/// <param name="UsedMeasuredBoilingPoint">True when Tc was computed from a measured Tb.</param>
public sealed record JobackEstimate(
    double NormalBoilingPoint,
    double CriticalTemperature,
    double CriticalPressure,
    double CriticalVolume,
    IdealGasHeatCapacity IdealGasHeatCapacity,
    int Atoms,
    string GroupList,
    bool UsedMeasuredBoilingPoint);
