using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The slope of a mixture's bubble or dew line at fixed composition: the generalized
/// Clapeyron equation, the pure fluid's dP/dT = Δh/(TΔv) with partial molar differences.</summary>
/// <remarks>
/// <para>Along the bubble line of a liquid of fixed composition x, the incipient vapour y follows
/// from equal chemical potentials, μ_i^V(T, P, y) = μ_i^L(T, P, x). Differentiating, weighting
/// each equation by y_i and summing, the vapour's composition change drops out by the
/// Gibbs–Duhem equation (Σ y_i dμ_i^V = 0 at constant T and P), leaving
/// dP/dT|_x = Σ y_i (h̄_i^V − h̄_i^L) / (T·Σ y_i (v̄_i^V − v̄_i^L)); along the dew line of a vapour
/// of fixed composition y the weights are the incipient liquid's x_i. For one component, or at an
/// azeotrope (x = y), this is the pure form Δh/(TΔv).</para>
/// <para>Partial molar properties from the fugacity coefficients at (T, P):
/// h̄_i = h_i°(T) − RT²(∂ln φ_i/∂T)_{P,n} and v̄_i = RT(∂ln φ_i/∂P)_{T,n} + RT/P; the ideal-gas
/// parts cancel in the differences between phases at the same T and P, so no cp° is needed.</para>
/// </remarks>
public static class MixtureClapeyron
{
    /// <summary>The slope and the partial molar differences of a coexisting pair of phases.</summary>
    /// <param name="Slope">dP/dT along the line at the fixed phase's composition, Pa/K.</param>
    /// <param name="EnthalpyDifference">Σ w_i (h̄_i^V − h̄_i^L), J/mol, weighted by the incipient phase.</param>
    /// <param name="VolumeDifference">Σ w_i (v̄_i^V − v̄_i^L), m³/mol, weighted the same way.</param>
    public readonly record struct Result(double Slope, double EnthalpyDifference, double VolumeDifference);

    /// <summary>The slope of the bubble line (liquid of composition <paramref name="liquid"/>
    /// fixed, incipient vapour <paramref name="vapour"/>) at (T, P).</summary>
    public static Result BubbleLine(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> liquid, ReadOnlySpan<double> vapour)
        => Slope(model, temperature, pressure, liquid, vapour, weights: vapour);

    /// <summary>The slope of the dew line (vapour of composition <paramref name="vapour"/> fixed,
    /// incipient liquid <paramref name="liquid"/>) at (T, P).</summary>
    public static Result DewLine(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> liquid, ReadOnlySpan<double> vapour)
        => Slope(model, temperature, pressure, liquid, vapour, weights: liquid);

    private static Result Slope(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> liquid, ReadOnlySpan<double> vapour, ReadOnlySpan<double> weights)
    {
        ArgumentNullException.ThrowIfNull(model);
        int n = model.ComponentCount;
        Span<double> lnPhi = stackalloc double[n];
        Span<double> dTL = stackalloc double[n];
        Span<double> dPL = stackalloc double[n];
        Span<double> dTV = stackalloc double[n];
        Span<double> dPV = stackalloc double[n];
        double rhoL = model.LnFugacityCoefficientsAtPressure(temperature, pressure, liquid, MixtureRoot.Liquid, lnPhi, dTL, dPL);
        double rhoV = model.LnFugacityCoefficientsAtPressure(temperature, pressure, vapour, MixtureRoot.Vapour, lnPhi, dTV, dPV);
        if (Math.Abs(rhoL - rhoV) <= 1e-9 * rhoL)
        {
            throw new InvalidInputException("pressure", pressure,
                $"at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa the two phases have the same density: the slope is undefined at a critical point");
        }

        double rt = Constants.GasConstant * temperature;
        double total = 0, dh = 0, dv = 0;
        for (int i = 0; i < n; i++)
        {
            total += weights[i];
        }

        for (int i = 0; i < n; i++)
        {
            double w = weights[i] / total;
            dh += w * -rt * temperature * (dTV[i] - dTL[i]);
            dv += w * rt * (dPV[i] - dPL[i]);
        }

        return new Result(dh / (temperature * dv), dh, dv);
    }
}
