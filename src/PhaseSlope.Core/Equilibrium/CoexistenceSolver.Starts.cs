using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>ρL and ρV from the classical critical scaling ρ = ρc ± A·(Tc − T)^½.</summary>
    /// <remarks>Expanding P(T, ρ) about the critical point, P − Pc ≈ P_T·ΔT + P_Tρ·ΔT·Δρ +
    /// P_ρρρ·Δρ³/6, the equal-area construction on the odd part gives Δρ² = 6·P_Tρ·(Tc − T)/P_ρρρ
    /// to leading order, so A² = 6·P_Tρ/P_ρρρ. The two derivatives are taken once per solver by
    /// central differences of the model's exact (∂P/∂ρ)_T and (∂²P/∂ρ²)_T at (Tc, ρc); their
    /// 1e-6 accuracy is far better than the start needs.</remarks>
    private (double Liquid, double Vapour) CriticalScalingStart(double temperature)
    {
        _scalingAmplitude ??= ScalingAmplitude();
        double half = _scalingAmplitude.Value * Math.Sqrt(CriticalTemperature - temperature);
        double rhoc = CriticalDensity;
        return (Math.Min(rhoc + half, 0.5 * (rhoc + _densityBound)), Math.Max(rhoc - half, 0.05 * rhoc));
    }

    private double ScalingAmplitude()
    {
        double tc = CriticalTemperature;
        double rhoc = CriticalDensity;
        var pure = Composition.Pure;
        double hRho = 1e-3 * rhoc;
        double hT = 1e-4 * tc;
        double pRhoRhoRho = (Model.Residual(tc, rhoc + hRho, pure).PressureDRhoRho - Model.Residual(tc, rhoc - hRho, pure).PressureDRhoRho) / (2 * hRho);
        double pTRho = (Model.Residual(tc + hT, rhoc, pure).PressureDRho - Model.Residual(tc - hT, rhoc, pure).PressureDRho) / (2 * hT);
        if (!(pRhoRhoRho > 0 && pTRho > 0))
        {
            throw new ConvergenceException(
                $"the model's critical point is not a classical critical point ((d3P/drho3)_T = {Preconditions.Format(pRhoRhoRho)}, d2P/dTdrho = {Preconditions.Format(pTRho)})",
                0, double.NaN);
        }

        return Math.Sqrt(6 * pTRho / pRhoRhoRho);
    }

    /// <summary>(∂P/∂T)_ρ at the critical point, the limiting slope of the saturation curve,
    /// evaluated once per solver.</summary>
    private double CriticalIsochoreSlope
        => _criticalIsochoreSlope ??= Model.Residual(CriticalTemperature, CriticalDensity, Composition.Pure).PressureDT;

    /// <summary>The model's own acentric factor, ω = −1 − log10(Psat(0.7·Tc)/Pc), solved once per
    /// solver from a bracketing start: the parameter of the ancillary vapour pressure.</summary>
    private double ModelAcentricFactor(Work work)
    {
        if (_acentricFactor is double known)
        {
            return known;
        }

        double t = 0.7 * CriticalTemperature;
        string? failure = null;
        CoexistencePoint? point = null;
        if (BracketingStart(t, work, out double liquid, out double vapour, ref failure))
        {
            point = Iterate(t, liquid, vapour, CoexistenceStart.Bracketing, work, ref failure);
        }

        // Without it the ancillary falls back on a simple fluid's ω = 0, a poorer but valid start.
        double omega = point is null ? 0 : -1 - Math.Log10(point.Pressure / CriticalPressure);
        _acentricFactor = omega;
        return omega;
    }

    /// <summary>log10(P/Pc) = (7/3)(1 + ω)(1 − Tc/T): exact at Tc and, through the model's own ω,
    /// at 0.7·Tc (the corresponding-states relation usually credited to Edmister).</summary>
    private double AncillaryPressure(double temperature, Work work)
        => CriticalPressure * Math.Pow(10, 7.0 / 3 * (1 + ModelAcentricFactor(work)) * (1 - CriticalTemperature / temperature));

    /// <summary>The temperature at which <see cref="AncillaryPressure"/> equals P: near Pc the
    /// line through the critical point with the critical isochore's slope, elsewhere the inverse
    /// of the corresponding-states relation.</summary>
    private double AncillaryTemperature(double pressure, Work work)
    {
        double tc = CriticalTemperature;
        if (1 - pressure / CriticalPressure < 0.02)
        {
            return tc - (CriticalPressure - pressure) / CriticalIsochoreSlope;
        }

        double inverse = 1 - Math.Log10(pressure / CriticalPressure) / (7.0 / 3 * (1 + ModelAcentricFactor(work)));
        return tc / inverse;
    }

    /// <summary>The density roots at the ancillary vapour pressure; when only one branch has a
    /// root there, the pressure is moved toward the other branch a few times.</summary>
    private bool AncillaryStart(double temperature, Work work, out double liquid, out double vapour)
    {
        double pressure = AncillaryPressure(temperature, work);
        Span<double> roots = stackalloc double[2];
        for (int attempt = 0; attempt < 8 && pressure < CriticalPressure; attempt++)
        {
            int count = Model.DensityRoots(temperature, pressure, Composition.Pure, roots);
            if (count == 2)
            {
                (vapour, liquid) = (roots[0], roots[1]);
                return true;
            }

            // A lone root below ρc is a vapour: the pressure is below the liquid branch's reach.
            pressure = count == 1 && roots[0] < CriticalDensity ? pressure * 1.5 : pressure / 2;
        }

        liquid = vapour = double.NaN;
        return false;
    }

    /// <summary>A start found by bracketing: a safeguarded Newton iteration on ln P for
    /// ln φL(P) = ln φV(P), d(ln φL − ln φV)/d ln P = ZL − ZV, with the density roots at each trial
    /// pressure. A pressure with only a vapour root lies below Psat, one with only a liquid root
    /// above it. Stops at |ln φL − ln φV| &lt; 1e-8, where the density iteration takes over.</summary>
    private bool BracketingStart(double temperature, Work work, out double liquid, out double vapour, ref string? failure)
    {
        double rt = R * temperature;
        double lo = double.NegativeInfinity;
        double hi = Math.Log(CriticalPressure);
        double lnP = Math.Log(CriticalPressure) + 7.0 / 3 * Math.Log(10) * (1 - CriticalTemperature / temperature);
        lnP = Math.Min(lnP, hi - 1e-3);
        Span<double> roots = stackalloc double[2];
        for (int i = 0; i < 300; i++)
        {
            double p = Math.Exp(lnP);
            int count = Model.DensityRoots(temperature, p, Composition.Pure, roots);
            double next;
            if (count == 2)
            {
                var dv = Evaluate(work, temperature, roots[0]);
                var dl = Evaluate(work, temperature, roots[1]);
                double f = dl.LnFugacityCoefficient(p) - dv.LnFugacityCoefficient(p);
                if (Math.Abs(f) < 1e-8)
                {
                    (vapour, liquid) = (roots[0], roots[1]);
                    return true;
                }

                if (f > 0)
                {
                    lo = lnP;
                }
                else
                {
                    hi = lnP;
                }

                double slope = p / rt * (1 / roots[1] - 1 / roots[0]);
                next = lnP - f / slope;
            }
            else
            {
                if (count == 1 && roots[0] < CriticalDensity)
                {
                    lo = lnP;
                }
                else
                {
                    hi = lnP;
                }

                next = double.NaN;
            }

            if (!(next > lo && next < hi))
            {
                next = double.IsNegativeInfinity(lo) ? hi - 2 : 0.5 * (lo + hi);
            }

            if (!(hi - lo > 1e-15 * Math.Abs(hi)) || next < -700)
            {
                break;
            }

            lnP = next;
        }

        failure ??= "no pressure found with both phases present";
        liquid = vapour = double.NaN;
        return false;
    }
}
