namespace PhaseSlope.Core.Mixtures;

/// <summary>A binary azeotrope: the bubble point at which the incipient vapour has the liquid's
/// composition (y_1 = x_1 strictly inside 0 &lt; x_1 &lt; 1).</summary>
/// <param name="Kind">Maximum or minimum of pressure (at fixed T).</param>
/// <param name="MoleFraction">x_1 = y_1 at the azeotrope.</param>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Point">The bubble point at the azeotrope.</param>
/// <param name="Clapeyron">The slope dP/dT of the azeotrope's P–T line: the generalized Clapeyron
/// equation at x = y, which is the pure form Δh/(TΔv) of the azeotrope as one fluid.</param>
/// <param name="RootIterations">Brent iterations in x_1 (each one bubble point).</param>
/// <param name="Residual">|y_1 − x_1| at the result.</param>
public sealed record Azeotrope(AzeotropeKind Kind, double MoleFraction, double Temperature, double Pressure,
    MixtureSaturationPoint Point, MixtureClapeyron.Result Clapeyron, int RootIterations, double Residual);
