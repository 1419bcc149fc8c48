using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Mixtures;

public sealed partial class MixtureEquilibrium
{
    /// <summary>Temperature accuracy of a P–h or P–s flash, K: Brent's method stops when the bracket
    /// is this narrow (h changes by cp·1e-9 K, far below the inner flash's own accuracy).</summary>
    public const double EnergyFlashTemperatureAccuracy = 1e-9;

    /// <summary>The flash at pressure P and molar enthalpy h (J/mol, on the convention of
    /// <see cref="MixtureProperties"/>).</summary>
    /// <remarks>An outer one-dimensional search on T around the P–T flash: h(T) at fixed P rises
    /// monotonically (cp &gt; 0, and through the two-phase range by the latent heat), so the root is
    /// bracketed by widening an interval around Kay's pseudo-critical temperature and refined by
    /// Brent's method (MathNet.Numerics). Each outer step is one P–T flash with its stability test.</remarks>
    /// <exception cref="FluidDataException">A component has no cp°.</exception>
    /// <exception cref="InvalidInputException">Bad pressure, enthalpy or composition, or no temperature
    /// between the lowest valid temperature of the components and five times the highest critical
    /// temperature gives the enthalpy.</exception>
    /// <exception cref="ConvergenceException">An inner flash or the outer search did not converge.</exception>
    public MixtureFlashResult FlashAtEnthalpy(double pressure, double enthalpy, IReadOnlyList<double> feed)
        => EnergyFlash(pressure, enthalpy, feed, entropy: false);

    /// <summary>The flash at pressure P and molar entropy s (J/(mol·K), on the convention of
    /// <see cref="MixtureProperties"/>); as <see cref="FlashAtEnthalpy"/>, s(T) at fixed P rising monotonically.</summary>
    /// <exception cref="FluidDataException">A component has no cp°.</exception>
    /// <exception cref="InvalidInputException">Bad pressure, entropy or composition, or no temperature
    /// in range gives the entropy.</exception>
    /// <exception cref="ConvergenceException">An inner flash or the outer search did not converge.</exception>
    public MixtureFlashResult FlashAtEntropy(double pressure, double entropy, IReadOnlyList<double> feed)
        => EnergyFlash(pressure, entropy, feed, entropy: true);

    private MixtureFlashResult EnergyFlash(double pressure, double target, IReadOnlyList<double> feed, bool entropy)
    {
        string name = entropy ? "entropy" : "enthalpy";
        Preconditions.Positive(pressure, "pressure");
        Preconditions.Finite(target, name);
        Properties.Require($"a pressure-{name} flash");
        var z = Feed(feed, requirePresent: true);
        int outer = 0, evaluations = 0;
        MixtureFlashResult? last = null;
        double Residual(double temperature)
        {
            outer++;
            last = Flash(temperature, pressure, z);
            evaluations += last.Report.ModelEvaluations;
            return (entropy ? last.Entropy!.Value : last.Enthalpy!.Value) - target;
        }

        double floor = Components.Min(CoexistenceSolver.LowestValidTemperature);
        double ceiling = 5 * _tc.Max();
        double pseudoCritical = 0;
        for (int i = 0; i < z.Length; i++)
        {
            pseudoCritical += z[i] * _tc[i];
        }

        double lo = Math.Max(floor, 0.8 * pseudoCritical), hi = Math.Min(ceiling, 1.2 * pseudoCritical);
        double fLo = Residual(lo), fHi = Residual(hi);
        for (int widen = 0; widen < 40 && fLo > 0; widen++)
        {
            if (lo <= floor)
            {
                throw OutOfRange(name, target, pressure, floor, ceiling);
            }

            (hi, fHi) = (lo, fLo);
            lo = Math.Max(floor, 0.8 * lo);
            fLo = Residual(lo);
        }

        for (int widen = 0; widen < 40 && fHi < 0; widen++)
        {
            if (hi >= ceiling)
            {
                throw OutOfRange(name, target, pressure, floor, ceiling);
            }

            (lo, fLo) = (hi, fHi);
            hi = Math.Min(ceiling, 1.25 * hi);
            fHi = Residual(hi);
        }

        if (!(fLo <= 0 && fHi >= 0))
        {
            throw OutOfRange(name, target, pressure, floor, ceiling);
        }

        if (!Brent.TryFindRoot(Residual, lo, hi, EnergyFlashTemperatureAccuracy, 200, out double temperature))
        {
            throw new ConvergenceException($"the pressure-{name} flash at {Preconditions.Format(pressure)} Pa did not converge in temperature", outer, Math.Abs(fHi - fLo));
        }

        // The state at the root itself (Brent's last evaluation may be a bracket end).
        if (last is null || last.Temperature != temperature)
        {
            Residual(temperature);
        }

        var report = last!.Report with { ModelEvaluations = evaluations, OuterSteps = outer };
        return last with { Report = report };
    }

    private static InvalidInputException OutOfRange(string name, double target, double pressure, double floor, double ceiling)
        => new(name, target,
            $"no temperature between {Preconditions.Format(floor)} K and {Preconditions.Format(ceiling)} K gives the {name} {Preconditions.Format(target)} at {Preconditions.Format(pressure)} Pa");
}
