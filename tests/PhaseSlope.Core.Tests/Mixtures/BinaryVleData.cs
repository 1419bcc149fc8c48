using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>Published binary VLE data used by the tests.</summary>
internal static class BinaryVleData
{
    /// <summary>Normal atmosphere, Pa (the definition of the standard atmosphere).</summary>
    public const double Atmosphere = 101325;

    /// <summary>Ethanol (1) – water (2) at 101.325 kPa: x_1, y_1 and T in °C of Carey and Lewis,
    /// Ind. Eng. Chem. 24, 882 (1932), as tabulated in Perry's Chemical Engineers' Handbook
    /// (vapour–liquid equilibrium of ethanol–water at 1 atm); from memory. The last row is the
    /// azeotrope (78.15 °C, x = y = 0.8943).</summary>
    public static readonly (double X, double Y, double Celsius)[] EthanolWater =
    [
        (0.0190, 0.1700, 95.50),
        (0.0721, 0.3891, 89.00),
        (0.0966, 0.4375, 86.70),
        (0.1238, 0.4704, 85.30),
        (0.1661, 0.5089, 84.10),
        (0.2337, 0.5445, 82.70),
        (0.2608, 0.5580, 82.30),
        (0.3273, 0.5826, 81.50),
        (0.3965, 0.6122, 80.70),
        (0.5079, 0.6564, 79.80),
        (0.5198, 0.6599, 79.70),
        (0.5732, 0.6841, 79.30),
        (0.6763, 0.7385, 78.74),
        (0.7472, 0.7815, 78.41),
        (0.8943, 0.8943, 78.15),
    ];

    /// <summary>The rows as fit input (T in K, P = 1 atm, x_1, y_1).</summary>
    public static BinaryVlePoint[] Points((double X, double Y, double Celsius)[] rows)
        => [.. rows.Select(r => new BinaryVlePoint(r.Celsius + 273.15, Atmosphere, r.X, r.Y))];
}
