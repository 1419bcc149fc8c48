namespace PhaseSlope.Core.Models;

/// <summary>Compositions passed to <see cref="IResidualModel"/>.</summary>
public static class Composition
{
    private static readonly double[] PureAmounts = [1.0];

    /// <summary>One mole of a single component: the composition argument of every pure-fluid call.</summary>
    public static ReadOnlySpan<double> Pure => PureAmounts;
}
