using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Output;

/// <summary>A coexistence point, with the full phase properties when the fluid has an ideal-gas
/// heat capacity (null otherwise: only coexistence and residual properties are then printed).</summary>
/// <param name="Point">The coexistence point.</param>
/// <param name="Full">Both saturated phases with caloric properties and along-line slopes, or null.</param>
internal sealed record CoexistenceRow(CoexistencePoint Point, CoexistenceProperties? Full);
