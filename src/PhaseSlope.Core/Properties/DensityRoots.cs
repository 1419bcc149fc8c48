using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>The mechanically stable density roots of P(T, ρ) = P for a model.</summary>
internal static class DensityRoots
{
    /// <summary>The liquid and vapour roots (either may be missing beyond its spinodal) below Tc,
    /// or the single root at and above Tc (returned as <see cref="PhaseLabel.Supercritical"/>).</summary>
    public static IReadOnlyList<(double Density, PhaseLabel Phase)> Find(CubicModel model, double temperature, double pressure)
    {
        if (temperature < model.CriticalTemperature && SpinodalWindow.TryFind(model, temperature, out var window))
        {
            var roots = new List<(double, PhaseLabel)>(2);
            if (pressure <= window.VapourPressure)
            {
                roots.Add((window.VapourRoot(model, temperature, pressure), PhaseLabel.Vapour));
            }

            if (pressure >= window.LiquidPressure)
            {
                roots.Add((window.LiquidRoot(model, temperature, pressure), PhaseLabel.Liquid));
            }

            return roots;
        }

        return [(MonotonicRoot(model, temperature, pressure), temperature < model.CriticalTemperature ? PhaseLabel.Liquid : PhaseLabel.Supercritical)];
    }

    /// <summary>The root of a monotonic isotherm (at or above Tc, or just below it where the
    /// loop is narrower than rounding).</summary>
    private static double MonotonicRoot(CubicModel model, double temperature, double pressure)
    {
        // P(ρ) rises from 0 at ρ → 0 to +∞ at ρ → 1/b; at ρ = P/(RT)·1e-3 the pressure is far below
        // the target for any Z of order one. Solve in ln ρ, then polish with Newton steps.
        double rt = Constants.GasConstant * temperature;
        double lo = Math.Log(pressure / rt * 1e-3);
        double hi = Math.Log(model.MaximumDensity * (1 - 1e-12));
        double F(double x) => model.Pressure(temperature, Math.Exp(x)) - pressure;
        double rho = Math.Exp(Brent.FindRoot(F, lo, hi, 1e-13, 400));
        for (int i = 0; i < 2; i++)
        {
            var d = model.Residual(temperature, rho);
            double next = rho - (d.Pressure - pressure) / d.PressureDRho;
            if (!(next > 0 && next < model.MaximumDensity))
            {
                break;
            }

            rho = next;
        }

        return rho;
    }
}
