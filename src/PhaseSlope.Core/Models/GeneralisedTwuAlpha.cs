namespace PhaseSlope.Core.Models;

/// <summary>The generalised alpha function of Twu, Coon &amp; Cunningham for the Peng–Robinson
/// form, Fluid Phase Equilib. 105, 49 (1995): α = α0 + ω(α1 − α0), where α0 and α1 are
/// <see cref="TwuAlpha"/> functions with fixed constants, so only Tc and ω are needed.</summary>
/// <remarks>
/// The paper gives one pair of constant sets for Tr ≤ 1 and another for Tr &gt; 1; at Tr = 1
/// the subcritical pair is used. The values below are recalled from memory of the paper, not
/// checked against it. The two pairs join smoothly at Tc: with the recalled digits, dα0/dTr at
/// Tr = 1 is −0.394352 below and −0.394359 above, dα1/dTr is −1.735538 and −1.735542, and
/// d²α/dT² agrees across Tc to about 1e-5 relative, i.e. to the rounding of the published
/// constants. That agreement is tested, and is the only internal check of the recalled values.
/// </remarks>
public sealed class GeneralisedTwuAlpha : IAlphaFunction
{
    private const string Source = "Twu, Coon & Cunningham 1995, Peng-Robinson; constants from memory";

    private readonly double _criticalTemperature;
    private readonly TwuAlpha _subcritical0;
    private readonly TwuAlpha _subcritical1;
    private readonly TwuAlpha _supercritical0;
    private readonly TwuAlpha _supercritical1;

    /// <summary>Creates the generalised function from the acentric factor and Tc in K.</summary>
    public GeneralisedTwuAlpha(double acentricFactor, double criticalTemperature)
    {
        Preconditions.Finite(acentricFactor, "acentric factor");
        Preconditions.Positive(criticalTemperature, "critical temperature");
        AcentricFactor = acentricFactor;
        _criticalTemperature = criticalTemperature;
        // Tr ≤ 1: α0 (L, M, N) = (0.125283, 0.911807, 1.948150), α1 = (0.511614, 0.784054, 2.812520).
        _subcritical0 = new TwuAlpha(0.125283, 0.911807, 1.948150, criticalTemperature, Source);
        _subcritical1 = new TwuAlpha(0.511614, 0.784054, 2.812520, criticalTemperature, Source);
        // Tr > 1: α0 = (0.401219, 4.963070, −0.2), α1 = (0.024955, 1.248089, −8.0).
        _supercritical0 = new TwuAlpha(0.401219, 4.963070, -0.2, criticalTemperature, Source);
        _supercritical1 = new TwuAlpha(0.024955, 1.248089, -8.0, criticalTemperature, Source);
        Description = $"alpha = alpha0 + omega(alpha1 - alpha0), omega = {acentricFactor.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} ({Source})";
    }

    /// <summary>The acentric factor ω.</summary>
    public double AcentricFactor { get; }

    /// <summary>The acentric factors for which α = α0 + ω(α1 − α0) stays positive and decreasing
    /// in T on 0.3 ≤ T/Tc ≤ 1 (the <see cref="AlphaGuard"/> grid): both conditions are linear in ω
    /// at each T, so the range is the intersection of half-lines, computed once from the
    /// constants (lower end about −0.134; no upper end).</summary>
    public static (double Lowest, double Highest) ValidAcentricFactorRange { get; } = ComputeRange();

    private static (double, double) ComputeRange()
    {
        var a0 = new TwuAlpha(0.125283, 0.911807, 1.948150, 1, Source);
        var a1 = new TwuAlpha(0.511614, 0.784054, 2.812520, 1, Source);
        double lo = double.NegativeInfinity, hi = double.PositiveInfinity;
        for (int i = 0; i <= 70; i++)
        {
            double tr = AlphaGuard.LowestReducedTemperature + (1 - AlphaGuard.LowestReducedTemperature) * i / 70;
            var v0 = a0.Evaluate(tr);
            var v1 = a1.Evaluate(tr);
            // α0 + ω·(α1 − α0) > 0 and α0' + ω·(α1' − α0') < 0.
            Bound(v0.Value, v1.Value - v0.Value, positive: true);
            Bound(v0.FirstDerivative, v1.FirstDerivative - v0.FirstDerivative, positive: false);
        }

        return (lo, hi);

        void Bound(double c, double d, bool positive)
        {
            // c + ω·d > 0 (positive) or c + ω·d < 0 (negative): a half-line in ω.
            if (d == 0)
            {
                return;
            }

            double root = -c / d;
            if ((d > 0) == positive)
            {
                lo = Math.Max(lo, root);
            }
            else
            {
                hi = Math.Min(hi, root);
            }
        }
    }

    /// <inheritdoc />
    public string Description { get; }

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature)
    {
        bool subcritical = temperature <= _criticalTemperature;
        AlphaValue a0 = (subcritical ? _subcritical0 : _supercritical0).Evaluate(temperature);
        AlphaValue a1 = (subcritical ? _subcritical1 : _supercritical1).Evaluate(temperature);
        double w = AcentricFactor;
        return new AlphaValue(
            a0.Value + w * (a1.Value - a0.Value),
            a0.FirstDerivative + w * (a1.FirstDerivative - a0.FirstDerivative),
            a0.SecondDerivative + w * (a1.SecondDerivative - a0.SecondDerivative));
    }

    /// <inheritdoc />
    public double ThirdDerivative(double temperature)
    {
        bool subcritical = temperature <= _criticalTemperature;
        double a0 = (subcritical ? _subcritical0 : _supercritical0).ThirdDerivative(temperature);
        double a1 = (subcritical ? _subcritical1 : _supercritical1).ThirdDerivative(temperature);
        return a0 + AcentricFactor * (a1 - a0);
    }
}
