namespace PhaseSlope.Core.Models;

/// <summary>Density roots of P(T, ρ, n) = P for any <see cref="IResidualModel"/>, by safeguarded
/// Newton steps on each branch: the vapour root climbing from the ideal-gas density, the liquid
/// root descending from the close-packed end. The default of <see cref="IResidualModel.DensityRoots"/>.</summary>
/// <remarks>On the vapour branch P(ρ) rises from 0 while (∂P/∂ρ)_T &gt; 0; on the liquid branch it
/// is convex and rising toward the density bound, so Newton from above descends monotonically.
/// Each branch keeps a bracket: a step that leaves it, or lands where (∂P/∂ρ)_T ≤ 0, is replaced
/// by bisection. A branch whose iterates close in on a spinodal (the bracket shrinks to rounding
/// with (∂P/∂ρ)_T ≤ 0 on one side) has no root at this pressure. Costs about 5–10
/// <see cref="IResidualModel.Residual"/> evaluations per root.</remarks>
public static class DefaultDensityRoots
{
    private const int MaxIterations = 200;

    /// <summary>Finds the roots; see <see cref="IResidualModel.DensityRoots"/>.</summary>
    public static int Find(IResidualModel model, double temperature, double pressure, ReadOnlySpan<double> amounts, Span<double> roots)
    {
        ArgumentNullException.ThrowIfNull(model);
        double bound = model.DensityBound(amounts);
        double rt = Constants.GasConstant * temperature;
        int count = 0;
        double? vapour = Branch(model, temperature, pressure, amounts, Math.Min(pressure / rt, 0.5 * bound), 0, bound, rising: true);
        if (vapour is double v)
        {
            roots[count++] = v;
        }

        double? liquid = Branch(model, temperature, pressure, amounts, bound * (1 - 1e-4), 0, bound, rising: false);
        if (liquid is double l && (count == 0 || Math.Abs(l - roots[0]) > 1e-10 * l))
        {
            if (count == 1 && l < roots[0])
            {
                roots[1] = roots[0];
                roots[0] = l;
            }
            else
            {
                roots[count] = l;
            }

            count++;
        }

        return count;
    }

    /// <summary>Safeguarded Newton on one branch. <paramref name="rising"/>: start low and move up
    /// (vapour), else start high and move down (liquid). Null when the branch does not reach P.</summary>
    private static double? Branch(IResidualModel model, double t, double p, ReadOnlySpan<double> amounts, double start, double lo, double hi, bool rising)
    {
        double rho = start;
        for (int i = 0; i < MaxIterations; i++)
        {
            var d = model.Residual(t, rho, amounts);
            double f = d.Pressure - p;
            double slope = d.PressureDRho;
            // P is summed from terms of size ρRT and ρ²|A_r,ρ|, which for a dense liquid are many
            // times P itself: the attainable accuracy of f is set by them, not by P.
            double scale = p + rho * (Constants.GasConstant * t + rho * Math.Abs(d.DRho));
            if (slope > 0 && Math.Abs(f) <= 1e-14 * scale)
            {
                return rho;
            }

            // Bracket: on the vapour branch everything below a stable point with P < target is
            // "too low"; above a point that is past the target or past the spinodal is "too high".
            // The liquid branch mirrors it.
            bool towardRoot = slope > 0 && (rising ? f < 0 : f > 0);
            if (rising)
            {
                if (towardRoot) { lo = rho; } else { hi = rho; }
            }
            else
            {
                if (towardRoot) { hi = rho; } else { lo = rho; }
            }

            if (!(hi - lo > 4e-16 * hi))
            {
                // Closed in on a spinodal (or on the root at rounding level).
                return slope > 0 && Math.Abs(f) <= 1e-12 * scale ? rho : null;
            }

            double next = slope > 0 ? rho - f / slope : double.NaN;
            rho = next > lo && next < hi ? next : 0.5 * (lo + hi);
        }

        return null;
    }
}
