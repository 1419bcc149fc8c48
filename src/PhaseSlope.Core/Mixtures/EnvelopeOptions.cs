using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Settings of <see cref="EnvelopeTracer"/>; <see cref="Default"/> for the documented defaults.</summary>
public sealed record EnvelopeOptions
{
    /// <summary>The documented defaults.</summary>
    public static EnvelopeOptions Default { get; } = new();

    /// <summary>Pressure of the first (bubble) point, Pa; default 1e5 Pa. Low pressure is where
    /// Wilson's K-values are a safe start (Michelsen 1980).</summary>
    public double StartPressure { get; init; } = 1e5;

    /// <summary>The trace ends when the far branch comes back below this pressure, Pa; default 1e5 Pa.</summary>
    public double EndPressure { get; init; } = 1e5;

    /// <summary>Largest step in the most sensitive variable (ln K, ln T or ln P); default 0.1.</summary>
    public double MaximumStep { get; init; } = 0.1;

    /// <summary>First step; default 0.02.</summary>
    public double InitialStep { get; init; } = 0.02;

    /// <summary>Below this step the trace gives up; default 1e-6.</summary>
    public double MinimumStep { get; init; } = 1e-6;

    /// <summary>|ln K| of the two points that straddle the critical point; default 0.02. The
    /// critical point is interpolated between them (cubic Hermite in ln K).</summary>
    public double CriticalStep { get; init; } = 0.02;

    /// <summary>Largest number of points; default 2000.</summary>
    public int MaximumPoints { get; init; } = 2000;

    /// <summary>Newton stops when the largest correction (in ln K, ln T, ln P) is below this; default 1e-10.</summary>
    public double Tolerance { get; init; } = 1e-10;

    /// <summary>Newton iteration cap per point; default 30.</summary>
    public int MaximumIterations { get; init; } = 30;

    internal void Validate()
    {
        Preconditions.Positive(StartPressure, "start pressure");
        Preconditions.Positive(EndPressure, "end pressure");
        Preconditions.Positive(MaximumStep, "maximum step");
        Preconditions.Positive(InitialStep, "initial step");
        Preconditions.Positive(MinimumStep, "minimum step");
        Preconditions.Positive(CriticalStep, "critical step");
        Preconditions.Positive(Tolerance, "tolerance");
        if (MaximumPoints < 2 || MaximumIterations < 1)
        {
            throw new InvalidInputException("maximum points", MaximumPoints, "an envelope needs at least 2 points and 1 iteration per point");
        }

        if (!(InitialStep <= MaximumStep && MinimumStep < InitialStep && CriticalStep <= MaximumStep))
        {
            throw new InvalidInputException("initial step", InitialStep, "steps must satisfy minimum < initial <= maximum and critical <= maximum");
        }
    }
}
