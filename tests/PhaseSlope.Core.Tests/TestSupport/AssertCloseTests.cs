using Xunit.Sdk;

namespace PhaseSlope.Core.Tests.TestSupport;

public class AssertCloseTests
{
    [Theory]
    [InlineData(100.0, 100.0 + 1e-9, 1e-10)]
    [InlineData(1.0, 1.0 - 5e-11, 1e-10)]
    [InlineData(-2.0, -2.0 * (1 + 5e-7), 1e-6)]
    public void Relative_WithinTolerance_Passes(double expected, double actual, double tolerance)
    {
        AssertClose.Relative(expected, actual, tolerance, "value");
    }

    [Fact]
    public void Relative_OutsideTolerance_FailsShowingExpectedActualAndRelativeDifference()
    {
        var ex = Assert.Throws<XunitException>(() => AssertClose.Relative(2.0, 2.5, 0.1, "critical pressure"));

        Assert.Contains("critical pressure", ex.Message, StringComparison.Ordinal);
        Assert.Contains("expected 2,", ex.Message, StringComparison.Ordinal);
        Assert.Contains("actual 2.5,", ex.Message, StringComparison.Ordinal);
        Assert.Contains("relative difference 0.25 ", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, 1.0)]
    [InlineData(1.0, double.NaN)]
    [InlineData(0.0, 1e-300)]
    [InlineData(1.0, double.PositiveInfinity)]
    public void Relative_NaNInfinityOrNonzeroAgainstZero_Fails(double expected, double actual)
    {
        Assert.Throws<XunitException>(() => AssertClose.Relative(expected, actual, 1e-3, "value"));
    }

    [Fact]
    public void Absolute_OutsideTolerance_FailsShowingDifference()
    {
        var ex = Assert.Throws<XunitException>(() => AssertClose.Absolute(0.0, 0.5, 0.25, "residual"));

        Assert.Contains("residual", ex.Message, StringComparison.Ordinal);
        Assert.Contains("difference 0.5 exceeds 0.25", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Absolute_WithinTolerance_Passes()
    {
        AssertClose.Absolute(0.0, -1e-13, 1e-12, "residual");
    }

    [Fact]
    public void InRange_Outside_Fails()
    {
        Assert.Throws<XunitException>(() => AssertClose.InRange(85, 90, 84.9, "entropy"));
        Assert.Throws<XunitException>(() => AssertClose.InRange(85, 90, double.NaN, "entropy"));
        AssertClose.InRange(85, 90, 87, "entropy");
    }
}
