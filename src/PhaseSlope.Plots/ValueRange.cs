namespace PhaseSlope.Plots;

/// <summary>A closed range of one quantity in SI units (an axis range, the temperatures a chart
/// spans), low below high.</summary>
/// <param name="Low">Lower end, SI.</param>
/// <param name="High">Upper end, SI.</param>
public readonly record struct ValueRange(double Low, double High)
{
    /// <summary>Whether both ends are finite and <see cref="Low"/> &lt; <see cref="High"/>.</summary>
    public bool IsValid => double.IsFinite(Low) && double.IsFinite(High) && Low < High;
}
