namespace PhaseSlope.Core.Properties;

/// <summary>The shape of the saturated-vapour line in the T–s plane, which decides whether an
/// isentropic expansion from saturated vapour ends wet or superheated (the first question when
/// choosing a working fluid for an organic Rankine cycle).</summary>
public enum VapourLineClass
{
    /// <summary>ds/dT &lt; 0 along the vapour line (as for water): expansion from saturated vapour
    /// enters the two-phase region.</summary>
    Wet,

    /// <summary>The vapour line is close to vertical over the working range: expansion from
    /// saturated vapour stays near saturation.</summary>
    Isentropic,

    /// <summary>ds/dT &gt; 0 over the working range (as for toluene): expansion from saturated
    /// vapour ends superheated.</summary>
    Dry,
}
