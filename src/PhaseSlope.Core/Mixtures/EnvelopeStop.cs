namespace PhaseSlope.Core.Mixtures;

/// <summary>Why an envelope trace ended.</summary>
public enum EnvelopeStop
{
    /// <summary>The trace came back down below the end pressure on the far branch: the whole
    /// envelope above that pressure was traced.</summary>
    EndPressure,

    /// <summary>The point limit of the options was reached first.</summary>
    PointLimit,

    /// <summary>Newton failed even with the smallest step allowed; the envelope is traced up to the
    /// last converged point (for example where a phase loses its density root).</summary>
    StepTooSmall,
}
