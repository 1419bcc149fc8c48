namespace PhaseSlope.Core.Properties;

/// <summary>Which density root a state at given (T, P) takes.</summary>
public enum PhaseChoice
{
    /// <summary>The root of lowest Gibbs energy (the stable phase).</summary>
    Stable,

    /// <summary>The liquid root, metastable if the vapour has the lower Gibbs energy.</summary>
    Liquid,

    /// <summary>The vapour root, metastable if the liquid has the lower Gibbs energy.</summary>
    Vapour,
}
