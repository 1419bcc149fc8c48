using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Output;

/// <summary>One coexistence state as written: the solver's point, the full property set when
/// the fluid has an ideal-gas heat capacity (else null), and its standard uncertainties when
/// they were asked for (else null).</summary>
internal sealed record CoexistenceRow(CoexistencePoint Point, CoexistenceProperties? Full, CoexistenceUncertainty? Uncertainty = null);
