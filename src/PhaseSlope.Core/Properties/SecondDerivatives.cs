using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>Second derivatives users need from a model, exact (closed forms in the residual
/// Helmholtz energy's derivatives): (∂c_p/∂P)_T, (∂c_v/∂v)_T and (∂α/∂T)_P.</summary>
/// <remarks>
/// With P(T, ρ) = ρRT + ρ²·∂A_r/∂ρ: P_TT = ρ²·A_TTρ, P_Tρ = R + 2ρ·A_Tρ + ρ²·A_Tρρ, and along an
/// isobar ρ′ = −P_T/P_ρ, ρ″ = −(P_TT + 2·P_Tρ·ρ′ + P_ρρ·ρ′²)/P_ρ, so (∂²v/∂T²)_P = −ρ″/ρ² + 2ρ′²/ρ³.
/// Then (∂c_p/∂P)_T = −T·(∂²v/∂T²)_P = −T·v·(α² + (∂α/∂T)_P) and (∂c_v/∂v)_T = T·(∂²P/∂T²)_v
/// (both from the Maxwell relations: Callen 1985, ch. 7; from memory). The ideal-gas c_p° depends on
/// T alone, so neither needs it. The model must implement <see cref="IMixedThirdDerivatives"/>.
/// </remarks>
public static class SecondDerivatives
{
    /// <summary>(∂c_p/∂P)_T in J/(mol·K·Pa) = m³/(mol·K).</summary>
    /// <exception cref="InvalidInputException">The model gives no third derivatives, or the state is
    /// mechanically unstable.</exception>
    public static double IsobaricHeatCapacityByPressure(IResidualModel model, ThermodynamicState state)
    {
        var (_, _, vTT) = IsobaricVolumeDerivatives(model, state, "(dcp/dP)_T");
        return -state.Temperature * vTT;
    }

    /// <summary>(∂α/∂T)_P in 1/K².</summary>
    /// <exception cref="InvalidInputException">As <see cref="IsobaricHeatCapacityByPressure"/>.</exception>
    public static double ExpansivityByTemperature(IResidualModel model, ThermodynamicState state)
    {
        var (v, vT, vTT) = IsobaricVolumeDerivatives(model, state, "(dalpha/dT)_P");
        double alpha = vT / v;
        return vTT / v - alpha * alpha;
    }

    /// <summary>(∂c_v/∂v)_T = T·(∂²P/∂T²)_v in Pa/K.</summary>
    /// <exception cref="InvalidInputException">The model gives no third derivatives.</exception>
    public static double IsochoricHeatCapacityByVolume(IResidualModel model, ThermodynamicState state)
        => state.Temperature * PressureByTemperatureSquared(model, state, "(dcv/dV)_T");

    /// <summary>(∂²P/∂T²)_v in Pa/K².</summary>
    /// <exception cref="InvalidInputException">The model gives no third derivatives.</exception>
    public static double PressureByTemperatureSquared(IResidualModel model, ThermodynamicState state, string purpose = "(d2P/dT2)_V")
    {
        var third = Third(model, state, purpose);
        return state.Density * state.Density * third.DTTRho;
    }

    private static (double DTTRho, double DTRhoRho) Third(IResidualModel model, ThermodynamicState state, string purpose)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(state);
        if (model is not IMixedThirdDerivatives third)
        {
            throw new InvalidInputException("model", double.NaN, $"{purpose} needs the model's third derivatives of the Helmholtz energy, which {model.Identity.Title} does not give");
        }

        return third.MixedThirdDerivatives(state.Temperature, state.Density);
    }

    /// <summary>v, (∂v/∂T)_P and (∂²v/∂T²)_P at the state.</summary>
    private static (double V, double VT, double VTT) IsobaricVolumeDerivatives(IResidualModel model, ThermodynamicState state, string purpose)
    {
        var (dTTRho, dTRhoRho) = Third(model, state, purpose);
        if (!state.MechanicallyStable)
        {
            throw new InvalidInputException("state", state.Density, $"{purpose} is undefined at this state: it is mechanically unstable ((dP/drho)_T <= 0)");
        }

        const double r = Constants.GasConstant;
        double rho = state.Density;
        var d = model.Residual(state.Temperature, rho, [1.0]);
        double pT = d.PressureDT;
        double pRho = d.PressureDRho;
        double pRhoRho = d.PressureDRhoRho;
        double pTT = rho * rho * dTTRho;
        double pTRho = r + 2 * rho * d.DTRho + rho * rho * dTRhoRho;
        double rhoT = -pT / pRho;
        double rhoTT = -(pTT + 2 * pTRho * rhoT + pRhoRho * rhoT * rhoT) / pRho;
        double v = 1 / rho;
        double vT = -rhoT / (rho * rho);
        double vTT = -rhoTT / (rho * rho) + 2 * rhoT * rhoT / (rho * rho * rho);
        return (v, vT, vTT);
    }
}
