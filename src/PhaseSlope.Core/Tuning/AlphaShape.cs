using System.Globalization;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tuning;

/// <summary>The shape a tuned alpha function must keep over 0 &lt; T ≤ T_max (the tuner uses Tc,
/// since a tuned fluid is used on the whole saturation line, not only where the data are):
/// positive, decreasing and, where the published form requires it, convex.</summary>
/// <remarks>Checked on 400 temperatures spaced evenly in ln T from 1e-3·Tc to T_max. The
/// functions tuned are smooth in √Tr or Tr^q with at most two turning points of α′ or α″ (a cubic
/// polynomial in √Tr, or a power times an exponential of a power); a grid step of 1.7 % in T
/// cannot hide a sign change of α, α′ or α″ except within that step of a turning point. Below
/// 1e-3·Tc no fluid has a liquid.</remarks>
public static class AlphaShape
{
    private const int Points = 400;
    private const double LowestReducedTemperature = 1e-3;

    /// <summary>The first violation with its reduced temperature and reason, and whether α is
    /// convex throughout; null violation when α is positive and decreasing (and convex when
    /// <paramref name="requireConvex"/>) on the whole grid.</summary>
    public static (string? Violation, bool Convex) Check(IAlphaFunction alpha, double criticalTemperature, double highestTemperature, bool requireConvex)
    {
        ArgumentNullException.ThrowIfNull(alpha);
        bool convex = true;
        double lnLow = Math.Log(LowestReducedTemperature * criticalTemperature);
        double lnHigh = Math.Log(highestTemperature);
        for (int i = 0; i < Points; i++)
        {
            double t = Math.Exp(lnLow + (lnHigh - lnLow) * i / (Points - 1));
            var value = alpha.Evaluate(t);
            string at = (t / criticalTemperature).ToString("0.000", CultureInfo.InvariantCulture);
            if (!double.IsFinite(value.Value) || !double.IsFinite(value.FirstDerivative) || !double.IsFinite(value.SecondDerivative))
            {
                return ($"alpha is not finite at T/Tc = {at}", false);
            }

            if (!(value.Value > 0))
            {
                return ($"alpha is not positive at T/Tc = {at} (alpha = {Preconditions.Format(value.Value)})", false);
            }

            if (!(value.FirstDerivative < 0))
            {
                return ($"alpha does not decrease with T at T/Tc = {at} (d alpha/dT = {Preconditions.Format(value.FirstDerivative)} 1/K)", false);
            }

            if (!(value.SecondDerivative > 0))
            {
                if (requireConvex)
                {
                    return ($"alpha is not convex at T/Tc = {at} (d2 alpha/dT2 = {Preconditions.Format(value.SecondDerivative)} 1/K2), which the published form requires", false);
                }

                convex = false;
            }
        }

        return (null, convex);
    }
}
