using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Models;

using PhaseSlope.Core;

namespace PhaseSlope.Core.Tests.TestSupport;

/// <summary>Test reference (the grid scan the solver used before it had closed-form roots, kept
/// as an independent check): the mechanical-stability limits of a model's isotherm below Tc: the vapour spinodal
/// (local maximum of P(ρ)), the liquid spinodal (local minimum) and the inflection between them.</summary>
/// <remarks>Every coexistence state lies outside the window: ρV &lt; VapourDensity and
/// ρL &gt; LiquidDensity, and Psat lies in (LiquidPressure, VapourPressure).</remarks>
public readonly record struct SpinodalWindow(
    double InflectionDensity,
    double VapourDensity,
    double LiquidDensity,
    double VapourPressure,
    double LiquidPressure)
{
    private const int GridPoints = 256;

    /// <summary>Finds the window, or returns false when the isotherm is monotonic (T at or
    /// above the model's Tc, or so close to it that (∂P/∂ρ)_T cannot be seen to change sign).</summary>
    public static bool TryFind(CubicModel model, double temperature, out SpinodalWindow window)
    {
        window = default;
        double rhoMax = model.MaximumDensity;

        // Locate the minimum of (∂P/∂ρ)_T on a grid in packing fraction, then refine the
        // inflection (∂²P/∂ρ² = 0) inside the neighbouring cells. (∂²P/∂ρ²) < 0 at ρ → 0 below Tc
        // and → +∞ as ρ → 1/b, so the bracket always holds a sign change.
        double best = double.PositiveInfinity;
        int bestIndex = 1;
        for (int i = 1; i < GridPoints; i++)
        {
            double slope = model.Residual(temperature, rhoMax * i / GridPoints).PressureDRho;
            if (slope < best)
            {
                best = slope;
                bestIndex = i;
            }
        }

        double lo = rhoMax * (bestIndex - 1) / GridPoints;
        double hi = rhoMax * (bestIndex + 1) / GridPoints;
        lo = Math.Max(lo, rhoMax * 1e-9);
        double Curvature(double rho) => model.Residual(temperature, rho).PressureDRhoRho;
        if (!(Curvature(lo) < 0 && Curvature(hi) > 0)
            || !Brent.TryFindRoot(Curvature, lo, hi, 1e-15 * rhoMax, 200, out double inflection))
        {
            return false;
        }

        double Slope(double rho) => model.Residual(temperature, rho).PressureDRho;
        if (!(Slope(inflection) < 0))
        {
            return false;
        }

        // (∂P/∂ρ)_T = RT > 0 at ρ → 0 and → +∞ at ρ → 1/b: one sign change on each side.
        double upper = rhoMax * (1 - 1e-12);
        // MathNet's Brent gives up (returns false) when asked for more than the function's
        // dynamic range allows; 1e-14 of 1/b is ample for a bracket bound.
        if (!Brent.TryFindRoot(Slope, rhoMax * 1e-12, inflection, 1e-14 * rhoMax, 300, out double vapour)
            || !Brent.TryFindRoot(Slope, inflection, upper, 1e-14 * rhoMax, 300, out double liquid))
        {
            return false;
        }

        // MathNet's Brent also stops once |f| falls below its accuracy argument, which near Tc
        // (where (∂P/∂ρ)_T is tiny everywhere in the window) can leave the spinodals far from the
        // zero relative to the window's width. Newton steps with the exact (∂²P/∂ρ²)_T finish them
        // to rounding, staying inside their brackets; the inflection gets secant steps.
        vapour = PolishZero(model, temperature, vapour, rhoMax * 1e-12, inflection);
        liquid = PolishZero(model, temperature, liquid, inflection, upper);
        inflection = PolishInflection(model, temperature, inflection, vapour, liquid);
        window = new SpinodalWindow(inflection, vapour, liquid,
            model.Pressure(temperature, vapour), model.Pressure(temperature, liquid));
        return vapour < inflection && inflection < liquid;
    }

    private static double PolishZero(CubicModel model, double temperature, double rho, double lo, double hi)
    {
        for (int i = 0; i < 4; i++)
        {
            var d = model.Residual(temperature, rho);
            double next = rho - d.PressureDRho / d.PressureDRhoRho;
            if (!(next > lo && next < hi) || next == rho)
            {
                break;
            }

            rho = next;
        }

        return rho;
    }

    private static double PolishInflection(CubicModel model, double temperature, double rho, double lo, double hi)
    {
        double h = 1e-7 * rho;
        for (int i = 0; i < 4; i++)
        {
            double f = model.Residual(temperature, rho).PressureDRhoRho;
            double df = (model.Residual(temperature, rho + h).PressureDRhoRho - model.Residual(temperature, rho - h).PressureDRhoRho) / (2 * h);
            double next = rho - f / df;
            if (!(next > lo && next < hi) || !double.IsFinite(next) || next == rho)
            {
                break;
            }

            rho = next;
        }

        return rho;
    }

    /// <summary>The vapour root of P(T, ρ) = <paramref name="pressure"/>, for a pressure at or
    /// below <see cref="VapourPressure"/>.</summary>
    public double VapourRoot(CubicModel model, double temperature, double pressure)
    {
        // Below the vapour spinodal the attraction makes Z ≤ 1, so P(ρ) ≤ ρRT: at ρ = P/(2RT) the
        // model pressure is below the target, and at the spinodal it is at or above it.
        double lo = Math.Min(pressure / (2 * Constants.GasConstant * temperature), VapourDensity * 0.5);
        // Solve in ln ρ: dilute vapour densities span many decades.
        double F(double x) => model.Pressure(temperature, Math.Exp(x)) - pressure;
        double rho = Math.Exp(Brent.FindRoot(F, Math.Log(lo), Math.Log(VapourDensity), 1e-13, 300));
        return Polish(model, temperature, pressure, rho, 0, VapourDensity);
    }

    /// <summary>Two Newton steps on P(T, ρ) = P after the bracketing search, kept inside the
    /// bracket; they take the root from the bracket tolerance to rounding level.</summary>
    private static double Polish(CubicModel model, double temperature, double pressure, double rho, double lo, double hi)
    {
        for (int i = 0; i < 2; i++)
        {
            var d = model.Residual(temperature, rho);
            double next = rho - (d.Pressure - pressure) / d.PressureDRho;
            if (!(next > lo && next < hi))
            {
                break;
            }

            rho = next;
        }

        return rho;
    }

    /// <summary>The liquid root of P(T, ρ) = <paramref name="pressure"/>, for a pressure at or
    /// above <see cref="LiquidPressure"/>.</summary>
    public double LiquidRoot(CubicModel model, double temperature, double pressure)
    {
        double F(double rho) => model.Pressure(temperature, rho) - pressure;
        double rho = Brent.FindRoot(F, LiquidDensity, model.MaximumDensity * (1 - 1e-12), 1e-13 * model.MaximumDensity, 300);
        return Polish(model, temperature, pressure, rho, LiquidDensity, model.MaximumDensity);
    }
}
