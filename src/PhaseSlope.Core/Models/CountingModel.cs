namespace PhaseSlope.Core.Models;

/// <summary>A model that counts how often it is evaluated, passing every call to another model:
/// the measure of a solver's cost that travels between machines (see <c>--diagnostics</c> and
/// docs/performance.md).</summary>
/// <remarks>Counts <see cref="Residual"/> and <see cref="LnFugacityCoefficients"/> calls made
/// through it. Density roots are passed to the wrapped model's own
/// <see cref="IResidualModel.DensityRoots"/> and counted in <see cref="RootSolves"/>: for the
/// cubic family that is a closed form with no Helmholtz evaluation; for a model that uses the
/// default Newton roots, the evaluations inside them happen in the wrapped model and are not in
/// <see cref="Evaluations"/>. Not thread-safe.</remarks>
public sealed class CountingModel : IResidualModel
{
    /// <summary>Wraps <paramref name="inner"/>.</summary>
    public CountingModel(IResidualModel inner)
    {
        ArgumentNullException.ThrowIfNull(inner);
        Inner = inner;
    }

    /// <summary>The counted model.</summary>
    public IResidualModel Inner { get; }

    /// <summary>Residual-Helmholtz (and fugacity) evaluations so far.</summary>
    public long Evaluations { get; private set; }

    /// <summary>Density-root solves at given (T, P) so far.</summary>
    public long RootSolves { get; private set; }

    /// <summary>Sets the counters to zero.</summary>
    public void Reset()
    {
        Evaluations = 0;
        RootSolves = 0;
    }

    /// <inheritdoc />
    public ModelIdentity Identity => Inner.Identity;

    /// <inheritdoc />
    public int ComponentCount => Inner.ComponentCount;

    /// <inheritdoc />
    public HelmholtzDerivatives Residual(double temperature, double density, ReadOnlySpan<double> amounts)
    {
        Evaluations++;
        return Inner.Residual(temperature, density, amounts);
    }

    /// <inheritdoc />
    public void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients)
    {
        Evaluations++;
        Inner.LnFugacityCoefficients(temperature, density, amounts, lnFugacityCoefficients);
    }

    /// <inheritdoc />
    public double DensityBound(ReadOnlySpan<double> amounts) => Inner.DensityBound(amounts);

    /// <inheritdoc />
    public ModelCriticalPoint CriticalPoint(ReadOnlySpan<double> amounts) => Inner.CriticalPoint(amounts);

    /// <inheritdoc />
    public int DensityRoots(double temperature, double pressure, ReadOnlySpan<double> amounts, Span<double> roots)
    {
        RootSolves++;
        return Inner.DensityRoots(temperature, pressure, amounts, roots);
    }
}
