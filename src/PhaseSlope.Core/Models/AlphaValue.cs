namespace PhaseSlope.Core.Models;

/// <summary>The alpha function α(T) of a cubic model and its first two temperature derivatives.</summary>
/// <param name="Value">α (dimensionless).</param>
/// <param name="FirstDerivative">dα/dT in 1/K.</param>
/// <param name="SecondDerivative">d²α/dT² in 1/K².</param>
public readonly record struct AlphaValue(double Value, double FirstDerivative, double SecondDerivative);
