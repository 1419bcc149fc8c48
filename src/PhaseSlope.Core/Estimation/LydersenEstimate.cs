namespace PhaseSlope.Core.Estimation;

/// <summary>Lydersen's critical constants for one molecule, SI units, or why there are none.</summary>
/// <param name="CriticalTemperature">Tc, K, or null.</param>
/// <param name="CriticalPressure">Pc, Pa, or null.</param>
/// <param name="CriticalVolume">Vc, m³/mol, or null.</param>
/// <param name="Unavailable">Why the method gives no values (groups without an increment), or
/// null when it gives all three.</param>
public sealed record LydersenEstimate(double? CriticalTemperature, double? CriticalPressure, double? CriticalVolume, string? Unavailable);
