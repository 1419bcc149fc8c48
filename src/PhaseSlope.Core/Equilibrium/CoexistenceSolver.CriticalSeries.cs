using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>Below this distance 1 − T/Tc the coexisting densities come from the critical
    /// series instead of the Newton iteration (see <see cref="CriticalSeries"/>).</summary>
    public const double CriticalSeriesReducedGap = 1e-4;

    /// <summary>The reduced distances ε = 1 − T/Tc of the Newton-solved points the series is fitted to.</summary>
    private static readonly double[] SeriesFitGaps = [1e-4, 1.6e-4, 2.5e-4, 4e-4, 6.3e-4, 1e-3];

    /// <summary>A reduced distance inside the fitted range but not fitted, where the series is
    /// checked against a Newton solution to state its uncertainty.</summary>
    private const double SeriesCheckGap = 3.2e-4;

    private CriticalSeries? _series;

    /// <summary>The coexisting densities of a classical (analytic) model near its critical point
    /// as series in s = (1 − T/Tc)^½: the half-difference d = (ρL − ρV)/2 = s·(a1 + a3·s² + a5·s⁴ + a7·s⁶)
    /// and the mean m = (ρL + ρV)/2 = ρc + s²·(b2 + b4·s² + b6·s⁴), fitted by linear least squares
    /// to Newton solutions at 1e-4 ≤ 1 − T/Tc ≤ 1e-3.</summary>
    /// <remarks>
    /// Why: the pressure difference between the two phases that the Newton iteration drives to
    /// zero is of order Pc·(d/ρc)³, so rounding in P (~1e-16·Pc) limits the densities it can
    /// resolve to about 1e-16/(d/ρc)³ relative: 1e-11 at 1 − T/Tc = 1e-4 but 1e-5 at 1e-8. The
    /// series has no such floor: with the fitted range s ≤ 0.032, its truncation is of order
    /// s⁸ ≈ 1e-12 relative in d, and it is evaluated once per solver. Parity: for an analytic
    /// Helmholtz function the two branches are one function of ±s, so d is odd and m even in s.
    /// The uncertainty stated with each point is the series' largest relative deviation from
    /// the Newton solutions, at the fitted points and at one held-out point.
    /// </remarks>
    private sealed record CriticalSeries(double[] Gap, double[] Mean, double Uncertainty, double TopPressure);

    /// <summary>The series, fitted on first use; the evaluations of that first use are charged
    /// to <paramref name="work"/>, so the point that pays for it says so.</summary>
    private CriticalSeries Series(Work work) => _series ??= FitSeries(work);

    private CriticalSeries FitSeries(Work work)
    {
        double tc = CriticalTemperature;
        double rhoc = CriticalDensity;
        int n = SeriesFitGaps.Length;
        var gapDesign = new double[n, 4];
        var meanDesign = new double[n, 3];
        var gapValues = new double[n];
        var meanValues = new double[n];
        var points = new CoexistencePoint[n];
        CoexistencePoint? near = null;
        for (int k = n - 1; k >= 0; k--)
        {
            // From the widest gap inward, each point started from the previous one.
            double eps = SeriesFitGaps[k];
            points[k] = near = Solve(tc * (1 - eps), near, work, seriesAllowed: false);
            double s = Math.Sqrt(eps);
            double s2 = eps;
            gapValues[k] = (points[k].Liquid.Density - points[k].Vapour.Density) / (2 * s);
            meanValues[k] = ((points[k].Liquid.Density + points[k].Vapour.Density) / 2 - rhoc) / s2;
            for (int j = 0; j < 4; j++)
            {
                gapDesign[k, j] = Math.Pow(s2, j);
            }

            for (int j = 0; j < 3; j++)
            {
                meanDesign[k, j] = Math.Pow(s2, j);
            }
        }

        double[] gap = LeastSquares(gapDesign, gapValues);
        double[] mean = LeastSquares(meanDesign, meanValues);
        var series = new CriticalSeries(gap, mean, 0, points[0].Pressure);
        var check = Solve(tc * (1 - SeriesCheckGap), points[0], work, seriesAllowed: false);
        // The Newton points themselves are only as good as their own stated uncertainty.
        double uncertainty = points.Append(check).Max(p => p.Report.DensityUncertainty);
        foreach (var point in points.Append(check))
        {
            var (liquid, vapour) = SeriesDensities(series, point.Temperature);
            uncertainty = Math.Max(uncertainty, Math.Max(
                Math.Abs(liquid / point.Liquid.Density - 1), Math.Abs(vapour / point.Vapour.Density - 1)));
        }

        if (!(uncertainty < 1e-8))
        {
            throw new ConvergenceException(
                $"the near-critical series of the model does not reproduce its own coexistence states (deviation {Preconditions.Format(uncertainty)}): the model's critical point may not be classical",
                0, uncertainty);
        }

        return series with { Uncertainty = uncertainty };
    }

    private (double Liquid, double Vapour) SeriesDensities(CriticalSeries series, double temperature)
    {
        double s2 = 1 - temperature / CriticalTemperature;
        double s = Math.Sqrt(s2);
        double half = s * Polynomial(series.Gap, s2);
        double mean = CriticalDensity + s2 * Polynomial(series.Mean, s2);
        return (mean + half, mean - half);
    }

    private static double Polynomial(double[] coefficients, double x)
    {
        double sum = 0;
        for (int j = coefficients.Length - 1; j >= 0; j--)
        {
            sum = sum * x + coefficients[j];
        }

        return sum;
    }

    /// <summary>The point at T from the series: both phases evaluated once at the series densities.</summary>
    private CoexistencePoint SeriesPoint(double temperature, Work work)
    {
        var series = Series(work);
        var (liquid, vapour) = SeriesDensities(series, temperature);
        var dl = Evaluate(work, temperature, liquid);
        var dv = Evaluate(work, temperature, vapour);
        return Build(dl, dv, dv.Pressure, CoexistenceMethod.CriticalSeries, 0, StopReason.Converged, work, CoexistenceStart.None, series.Uncertainty);
    }

    /// <summary>The point at P above the series' top pressure: Newton on T with the series
    /// densities, dPsat/dT from the Clapeyron slope of each iterate.</summary>
    private CoexistencePoint? SeriesAtPressure(double pressure, Work work)
    {
        double tc = CriticalTemperature;
        double t = tc - (CriticalPressure - pressure) / CriticalIsochoreSlope;
        CoexistencePoint? best = null;
        for (int i = 0; i < 30; i++)
        {
            if (!(t < tc))
            {
                t = 0.5 * (tc + (best?.Temperature ?? tc * (1 - CriticalSeriesReducedGap)));
            }

            var point = SeriesPoint(t, work);
            double error = point.Pressure - pressure;
            best = point;
            if (Math.Abs(error) <= 1e-15 * pressure)
            {
                break;
            }

            double next = t - error / point.Slope;
            if (next == t)
            {
                break;
            }

            t = next;
        }

        if (best is null || Math.Abs(best.Pressure - pressure) > 1e-13 * pressure)
        {
            return null;
        }

        // The pressure asked for, with the phases evaluated at the series densities for that T.
        return Build(best.Liquid.Helmholtz, best.Vapour.Helmholtz, pressure, CoexistenceMethod.CriticalSeries, 0, StopReason.Converged,
            work, CoexistenceStart.None, best.Report.DensityUncertainty);
    }

    /// <summary>Linear least squares by the normal equations for a few columns (≤ 4, rows of
    /// order one after scaling); solved with MathNet's QR for stability.</summary>
    private static double[] LeastSquares(double[,] design, double[] values)
    {
        var a = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(design);
        var y = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.DenseOfArray(values);
        return a.QR(MathNet.Numerics.LinearAlgebra.Factorization.QRMethod.Thin).Solve(y).ToArray();
    }
}
