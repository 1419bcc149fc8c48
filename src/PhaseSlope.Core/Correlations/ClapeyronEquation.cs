namespace PhaseSlope.Core.Correlations;

/// <summary>The Clapeyron equation written for vapour-pressure correlations:
/// ΔH = T·Δv·dP/dT = R·T²·ΔZ·d ln P/dT, with ΔZ = P·Δv/(RT) (Clapeyron 1834).</summary>
/// <remarks>The one place the relation is written; the latent-heat estimator and the auditor's
/// latent-heat and Waring checks both call it. Exact for a pure fluid on its saturation line; how
/// good ΔH is depends on the slope and on ΔZ that go in.</remarks>
public static class ClapeyronEquation
{
    /// <summary>ΔH = R·T²·ΔZ·d ln P/dT in J/mol.</summary>
    /// <param name="temperature">T in K.</param>
    /// <param name="lnPressureSlope">d ln P/dT in 1/K. The relation is linear in it, so a standard
    /// uncertainty of the slope given here yields the standard uncertainty of ΔH.</param>
    /// <param name="compressibilityChange">ΔZ = Z_V − Z_L; 1 gives ΔH/ΔZ = R·T²·d ln P/dT, the
    /// quantity of Waring's criterion (and the Clausius–Clapeyron estimate of ΔH).</param>
    public static double EnthalpyOfVaporization(double temperature, double lnPressureSlope, double compressibilityChange)
        => Constants.GasConstant * temperature * temperature * compressibilityChange * lnPressureSlope;
}
