using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Core.Properties;

/// <summary>A coexistence point with both saturated phases fully evaluated (only for a fluid with
/// cp°: see <see cref="PropertyModel.Coexistence"/>).</summary>
/// <param name="Point">The coexistence point from the solver.</param>
/// <param name="Liquid">The saturated liquid.</param>
/// <param name="Vapour">The saturated vapour.</param>
public sealed record CoexistenceProperties(CoexistencePoint Point, SaturatedPhase Liquid, SaturatedPhase Vapour)
{
    /// <summary>h_V − h_L from the absolute caloric properties, J/mol; equals the solver's
    /// enthalpy of vaporization (the ideal-gas parts and the reference offsets cancel).</summary>
    public double EnthalpyOfVaporization => Vapour.State.Enthalpy!.Value - Liquid.State.Enthalpy!.Value;

    /// <summary>s_V − s_L from the absolute properties, J/(mol·K).</summary>
    public double EntropyOfVaporization => Vapour.State.Entropy!.Value - Liquid.State.Entropy!.Value;
}
