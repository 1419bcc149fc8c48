namespace PhaseSlope.Core.Mixtures;

/// <summary>Which variable a binary diagram holds fixed.</summary>
public enum BinaryDiagramKind
{
    /// <summary>Isothermal: P–x–y at fixed T.</summary>
    Isothermal,

    /// <summary>Isobaric: T–x–y at fixed P.</summary>
    Isobaric,
}
