namespace PhaseSlope.Core;

/// <summary>Physical constants used throughout the core, in SI units.</summary>
public static class Constants
{
    /// <summary>Molar gas constant R in J/(mol·K): the exact value fixed by the 2019 SI
    /// redefinition (N_A·k = 6.02214076e23 × 1.380649e-23), as given in CODATA 2018.</summary>
    public const double GasConstant = 8.314462618;

    /// <summary>Standard atmosphere in Pa, exact by definition (10th CGPM, 1954).</summary>
    public const double StandardAtmosphere = 101325.0;
}
