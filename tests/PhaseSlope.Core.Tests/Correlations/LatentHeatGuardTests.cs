using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>Guards of the Clapeyron latent heat: no clamp, no negative ΔH, a finding for an
/// implausible one.</summary>
public class LatentHeatGuardTests
{
    private const double R = Constants.GasConstant;

    /// <summary>Exact Clausius–Clapeyron data ln P = a − b/T at the given temperatures.</summary>
    private static VapourPressurePoint[] Exact(double a, double b, params double[] temperatures)
        => [.. temperatures.Select(t => new VapourPressurePoint(t, Math.Exp(a - b / t)))];

    [Fact]
    public void Haggenmacher_PrOverTr3AboveOne_RefusedNotClamped()
    {
        // P between 0.45 and 0.7 Pc at T/Tc = 0.55-0.6: every point is below Pc, but
        // Pr/Tr^3 > 2, where sqrt(1 - Pr/Tr^3) has no real value. It used to be clamped to 0.
        const double tc = 540, pc = 3.1e6;
        double b = Math.Log(0.7 / 0.45) / (1 / 297.0 - 1 / 324.0);
        double a = Math.Log(0.45 * pc) + b / 297.0;
        var fit = VapourPressureFitter.Fit(new ClausiusClapeyronForm(), Exact(a, b, 297, 305, 315, 324));
        var estimator = new LatentHeatEstimator(fit, VolumeChangeModel.Haggenmacher, criticalTemperature: tc, criticalPressure: pc);
        var ex = Assert.Throws<InvalidInputException>(() => estimator.At(310));
        Assert.Contains("Haggenmacher relation", ex.Message, StringComparison.Ordinal);
        Assert.Equal("critical pressure", ex.Field);
    }

    [Fact]
    public void Estimator_DataAbovePc_RefusedNamingThePoint()
    {
        var fit = VapourPressureFitter.Fit(new ClausiusClapeyronForm(), Exact(20, 3000, 300, 320, 340));
        var ex = Assert.Throws<InvalidInputException>(() =>
            new LatentHeatEstimator(fit, VolumeChangeModel.Haggenmacher, criticalTemperature: 540, criticalPressure: 31));
        Assert.Contains("not above the data point at 300 K", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fitter_FallingPressures_Refused()
    {
        // b < 0: ln P = a + |b|/T falls with T.
        var ex = Assert.Throws<InvalidInputException>(() =>
            VapourPressureFitter.Fit(new ClausiusClapeyronForm(), Exact(5, -3000, 300, 320, 340)));
        Assert.Contains("falls with temperature", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    // b = ΔH/R. 3000 K gives ΔH/T = 83 J/(mol K) at 300 K (a plausible value: no finding);
    // 30 000 K gives 831 J/(mol K), far above the 350 bound (finding).
    [InlineData(3000, false)]
    [InlineData(30000, true)]
    public void IdealGas_TroutonBound_FlagsOnlyTheImplausible(double b, bool flagged)
    {
        var fit = VapourPressureFitter.Fit(new ClausiusClapeyronForm(), Exact(20, b, 290, 300, 310));
        var point = new LatentHeatEstimator(fit, VolumeChangeModel.IdealGas).At(300);
        // Exact data: ΔH = R·b to rounding of the linear solve (1e-9 relative is far above it).
        Assert.Equal(R * b, point.EnthalpyOfVaporization, R * b * 1e-9);
        Assert.Equal(flagged, point.Finding is not null);
        if (flagged)
        {
            Assert.Contains("implausible latent heat", point.Finding!, StringComparison.Ordinal);
        }
    }
}
