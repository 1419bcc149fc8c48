using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Core.Properties;

/// <summary>One saturated phase with its derivatives along the coexistence line.</summary>
/// <remarks>
/// Along the line σ, by the change-of-constraint rule,
/// dX/dT|σ = (∂X/∂T)_P + (∂X/∂P)_T·dPsat/dT, for X = V (then ρ' = −ρ²·V'), H, S, U.
/// The saturation heat capacity is c_σ = T·ds/dT|σ. At the critical point every slope diverges
/// and the members are null.
/// </remarks>
/// <param name="State">The phase's full single-phase state.</param>
/// <param name="DensitySlope">dρ/dT along the line, mol/(m³·K).</param>
/// <param name="EnthalpySlope">dh/dT along the line, J/(mol·K).</param>
/// <param name="EntropySlope">ds/dT along the line, J/(mol·K²).</param>
/// <param name="InternalEnergySlope">du/dT along the line, J/(mol·K).</param>
public sealed record SaturatedPhase(ThermodynamicState State, double? DensitySlope, double? EnthalpySlope, double? EntropySlope, double? InternalEnergySlope)
{
    /// <summary>Saturation heat capacity T·ds/dT|σ, J/(mol·K); null at the critical point.</summary>
    public double? SaturationHeatCapacity => State.Temperature * EntropySlope;

    /// <summary>The phase and its along-line slopes at a coexistence point.</summary>
    internal static SaturatedPhase Along(ThermodynamicState state, CoexistencePoint point)
    {
        if (point.IsCritical)
        {
            return new SaturatedPhase(state, null, null, null, null);
        }

        double slope = point.Slope;
        double Line(StateVariable x)
            => PartialDerivatives.Of(state, x, StateVariable.T, StateVariable.P)
               + PartialDerivatives.Of(state, x, StateVariable.P, StateVariable.T) * slope;

        double volumeSlope = Line(StateVariable.V);
        return new SaturatedPhase(state, -state.Density * state.Density * volumeSlope,
            Line(StateVariable.H), Line(StateVariable.S), Line(StateVariable.U));
    }
}
