using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Core.Fluids;

/// <summary>A fluid's published vapour-pressure equation of the Wagner type, ln(P/Pc) =
/// (Tc/T)·Σ N_i·τ^t_i with τ = 1 − T/Tc and its own Tc and Pc (the ancillary equation of a
/// reference equation of state, or the IAPWS saturation equation for water).</summary>
/// <param name="Form">The form with the equation's own Tc, Pc and exponents t_i.</param>
/// <param name="Coefficients">N_i.</param>
/// <param name="Source">The published source.</param>
public sealed record PublishedVapourPressure(WagnerForm Form, IReadOnlyList<double> Coefficients, string Source)
{
    /// <summary>The saturation pressure in Pa at T in K (below the equation's Tc).</summary>
    public double Pressure(double temperature) => Math.Exp(Form.LnPressure(temperature, Coefficients));
}
