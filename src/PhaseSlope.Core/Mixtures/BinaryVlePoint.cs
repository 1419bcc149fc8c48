namespace PhaseSlope.Core.Mixtures;

/// <summary>One measured vapour–liquid equilibrium point of a binary: T, P, the liquid's x_1 and,
/// where measured, the vapour's y_1.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa (the measured bubble pressure of the liquid x_1 at T).</param>
/// <param name="LiquidFraction">x_1, mole fraction of the first component in the liquid.</param>
/// <param name="VapourFraction">y_1 in the vapour, or null where it was not measured.</param>
public sealed record BinaryVlePoint(double Temperature, double Pressure, double LiquidFraction, double? VapourFraction);
