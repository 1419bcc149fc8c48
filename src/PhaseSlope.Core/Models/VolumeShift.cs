using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Models;

/// <summary>Constant volume translations c (m³/mol, v = v_cubic − c) for
/// <see cref="CubicModel.WithVolumeShift"/>: the Péneloux correlations and a fit to one
/// measured saturated-liquid density.</summary>
/// <remarks>A constant shift leaves the vapour pressure, the enthalpy of vaporization and every
/// other difference between coexisting phases at equal T and P unchanged: the Gibbs energy and
/// the enthalpy of each phase move by the same −P·c, so only volumes (and densities) change.</remarks>
public static class VolumeShift
{
    private const double R = Constants.GasConstant;

    /// <summary>Péneloux, Rauzy &amp; Fréze, Fluid Phase Equilib. 8, 7 (1982), for
    /// Soave–Redlich–Kwong: c = 0.40768·(0.29441 − Z_RA)·R·Tc/Pc (coefficients from memory of
    /// the paper).</summary>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    /// <param name="rackettCompressibility">Z_RA, the Rackett compressibility factor
    /// (for example from <see cref="RackettCompressibility"/>).</param>
    /// <returns>c in m³/mol.</returns>
    public static double PenelouxSoaveRedlichKwong(double criticalTemperature, double criticalPressure, double rackettCompressibility)
        => Correlation(SoaveRedlichKwongCoefficients, criticalTemperature, criticalPressure, rackettCompressibility);

    /// <summary>Slope and offset of the Soave–Redlich–Kwong correlation (see <see cref="PenelouxSoaveRedlichKwong"/>).</summary>
    internal static readonly (double Slope, double Offset) SoaveRedlichKwongCoefficients = (0.40768, 0.29441);

    /// <summary>Slope and offset of the Peng–Robinson correlation (see <see cref="PenelouxPengRobinson"/>).</summary>
    internal static readonly (double Slope, double Offset) PengRobinsonCoefficients = (0.50033, 0.25969);

    /// <summary>The analogous correlation for Peng–Robinson,
    /// c = 0.50033·(0.25969 − Z_RA)·R·Tc/Pc, as it is quoted in the phase-behaviour literature
    /// that carries the Péneloux approach over to the Peng–Robinson form. Coefficients from
    /// memory; the original paper that introduced them is not recalled with certainty.</summary>
    /// <returns>c in m³/mol.</returns>
    public static double PenelouxPengRobinson(double criticalTemperature, double criticalPressure, double rackettCompressibility)
        => Correlation(PengRobinsonCoefficients, criticalTemperature, criticalPressure, rackettCompressibility);

    /// <summary>The Péneloux-type correlation of a model, as its <see cref="ModelRegistry"/> row
    /// gives it: Soave–Redlich–Kwong, or Peng–Robinson (1976 or 1978 κ, which share the form).</summary>
    /// <exception cref="InvalidInputException">For the other models, which have no such correlation.</exception>
    public static double Peneloux(CubicModelKind kind, double criticalTemperature, double criticalPressure, double rackettCompressibility)
        => kind.Entry().Peneloux is { } coefficients
            ? Correlation(coefficients, criticalTemperature, criticalPressure, rackettCompressibility)
            : throw new InvalidInputException("model", double.NaN,
                $"the Peneloux volume-shift correlation exists for Soave-Redlich-Kwong and Peng-Robinson only, not {kind.Title()}");

    /// <summary>The Rackett compressibility factor from the acentric factor by the relation of
    /// Yamada &amp; Gunn, J. Chem. Eng. Data 18, 234 (1973): Z_RA = 0.29056 − 0.08775ω
    /// (coefficients from memory).</summary>
    public static double RackettCompressibility(double acentricFactor)
    {
        Preconditions.Finite(acentricFactor, "acentric factor");
        return 0.29056 - 0.08775 * acentricFactor;
    }

    /// <summary>The shift that makes the model's saturated-liquid density at one temperature
    /// equal a measured one: c = 1/ρL,model − 1/ρL,measured, with ρL,model from the coexistence
    /// solver on the model without any shift (so the result is the whole shift, whatever shift
    /// <paramref name="model"/> already has).</summary>
    /// <param name="model">The model; its own volume shift is ignored.</param>
    /// <param name="temperature">T in K, in [<paramref name="minimumTemperature"/>, Tc).</param>
    /// <param name="measuredLiquidDensity">The measured saturated-liquid molar density at T, in mol/m³.</param>
    /// <param name="minimumTemperature">Lowest temperature the solver accepts, in K (for
    /// example <see cref="CoexistenceSolver.LowestValidTemperature"/> of the fluid).</param>
    /// <returns>c in m³/mol, for <see cref="CubicModel.WithVolumeShift"/>.</returns>
    public static double FitToLiquidDensity(CubicModel model, double temperature, double measuredLiquidDensity, double minimumTemperature)
    {
        ArgumentNullException.ThrowIfNull(model);
        Preconditions.Positive(measuredLiquidDensity, "measured liquid density");
        CubicModel unshifted = model.VolumeShift == 0 ? model : model.WithVolumeShift(0);
        CoexistencePoint point = new CoexistenceSolver(unshifted, minimumTemperature).AtTemperature(temperature);
        double shift = point.Liquid.MolarVolume - 1 / measuredLiquidDensity;
        if (!(shift < unshifted.CovolumeB))
        {
            throw new InvalidInputException("measured liquid density", measuredLiquidDensity,
                $"a measured liquid density of {Preconditions.Format(measuredLiquidDensity)} mol/m3 would need a volume shift of {Preconditions.Format(shift)} m3/mol, not below the co-volume {Preconditions.Format(unshifted.CovolumeB)} m3/mol");
        }

        return shift;
    }

    private static double Correlation((double Slope, double Offset) coefficients, double criticalTemperature, double criticalPressure, double rackettCompressibility)
    {
        var (slope, offset) = coefficients;
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Preconditions.Positive(rackettCompressibility, "Rackett compressibility factor");
        return slope * (offset - rackettCompressibility) * R * criticalTemperature / criticalPressure;
    }
}
