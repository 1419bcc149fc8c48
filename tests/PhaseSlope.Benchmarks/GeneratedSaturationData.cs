using System.Globalization;
using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Benchmarks;

/// <summary>Generated, not measured, vapour pressures of water for the fitting benchmarks and for
/// the million-row file of docs/performance.md.</summary>
/// <remarks>The IAPWS saturation-pressure equation, ln(P/Pc) = (Tc/T)(a1τ + a2τ^1.5 + a3τ³ +
/// a4τ^3.5 + a5τ⁴ + a6τ^7.5), τ = 1 − T/Tc, of Wagner &amp; Pruss, J. Phys. Chem. Ref. Data 22, 783
/// (1993) (constants below from memory), at evenly spaced temperatures from 275 K to 645 K, with
/// a fixed-seed Gaussian perturbation of 0.1 % in ln P (about the scatter of good static
/// measurements).</remarks>
public static class GeneratedSaturationData
{
    /// <summary>Tc of water, K (Wagner &amp; Pruss 1993, from memory).</summary>
    public const double CriticalTemperature = 647.096;

    /// <summary>Pc of water, Pa (Wagner &amp; Pruss 1993, from memory).</summary>
    public const double CriticalPressure = 22.064e6;

    private const int Seed = 20240607;
    private static readonly double[] Coefficients = [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502];
    private static readonly double[] Exponents = [1, 1.5, 3, 3.5, 4, 7.5];

    /// <summary>The points, in increasing temperature.</summary>
    public static VapourPressurePoint[] Points(int count)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 2);
        var random = new Random(Seed);
        var points = new VapourPressurePoint[count];
        for (int i = 0; i < count; i++)
        {
            double t = 275 + 370.0 * i / (count - 1);
            double tau = 1 - t / CriticalTemperature;
            double sum = 0;
            for (int k = 0; k < Coefficients.Length; k++)
            {
                sum += Coefficients[k] * Math.Pow(tau, Exponents[k]);
            }

            // Box–Muller: a standard normal deviate from two uniform ones.
            double gaussian = Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
            double lnP = Math.Log(CriticalPressure) + CriticalTemperature / t * sum + 1e-3 * gaussian;
            points[i] = new VapourPressurePoint(t, Math.Exp(lnP));
        }

        return points;
    }

    /// <summary>Writes the points as a data file for <c>phaseslope fit</c> (K and kPa, round-trip
    /// precision), headed by a comment that says they are generated.</summary>
    public static void WriteCsv(string path, int count)
    {
        using var file = new StreamWriter(path);
        file.Write("# GENERATED, not measured: IAPWS saturation-pressure equation for water (Wagner & Pruss 1993)\n");
        file.Write("# with a fixed-seed 0.1 % Gaussian perturbation in ln P (tests/PhaseSlope.Benchmarks/GeneratedSaturationData.cs)\n");
        file.Write("T [K],P [kPa]\n");
        foreach (var point in Points(count))
        {
            file.Write(point.Temperature.ToString("R", CultureInfo.InvariantCulture));
            file.Write(',');
            file.Write((point.Pressure / 1e3).ToString("R", CultureInfo.InvariantCulture));
            file.Write('\n');
        }
    }
}
