using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>A test-side tangent-plane stability check (Michelsen, "The isothermal flash problem.
/// Part I. Stability", Fluid Phase Equilib. 9, 1–19 (1982)): successive substitution on the trial
/// phase ln W_i = ln z_i + ln φ_i(z) − ln φ_i(W) from a vapour-like (W = K z) and a liquid-like
/// (W = z/K) start with Wilson's K-values, returning the smaller modified tangent-plane distance
/// tm = 1 + Σ W_i (ln W_i + ln φ_i(W) − d_i − 1). Independent of the envelope tracer's code.</summary>
internal static class TangentPlane
{
    public static double Minimum(CubicMixtureModel model, double temperature, double pressure, double[] z)
    {
        int n = z.Length;
        var lnPhiZ = new double[n];
        model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, MixtureRoot.Stable, lnPhiZ);
        var d = new double[n];
        for (int i = 0; i < n; i++)
        {
            d[i] = Math.Log(z[i]) + lnPhiZ[i];
        }

        double best = double.PositiveInfinity;
        foreach (int sign in new[] { 1, -1 })
        {
            var w = new double[n];
            for (int i = 0; i < n; i++)
            {
                var c = model.Components[i];
                // Wilson's K with ω from 0.1 (a start only; the iteration decides).
                double lnK = Math.Log(c.CriticalPressure / pressure) + 5.373 * 1.1 * (1 - c.CriticalTemperature / temperature);
                w[i] = z[i] * Math.Exp(sign * lnK);
            }

            var lnPhiW = new double[n];
            double tm = double.PositiveInfinity;
            for (int iteration = 0; iteration < 2000; iteration++)
            {
                model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, MixtureRoot.Stable, lnPhiW);
                double change = 0;
                for (int i = 0; i < n; i++)
                {
                    double next = Math.Exp(d[i] - lnPhiW[i]);
                    change = Math.Max(change, Math.Abs(Math.Log(next / w[i])));
                    w[i] = next;
                }

                tm = 1;
                model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, MixtureRoot.Stable, lnPhiW);
                for (int i = 0; i < n; i++)
                {
                    tm += w[i] * (Math.Log(w[i]) + lnPhiW[i] - d[i] - 1);
                }

                if (change < 1e-12)
                {
                    break;
                }
            }

            best = Math.Min(best, tm);
        }

        return best;
    }
}
