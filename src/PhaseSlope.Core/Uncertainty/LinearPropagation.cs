using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>First-order propagation of the input uncertainties into a coexistence state, with the
/// sensitivities obtained exactly through the coexistence conditions.</summary>
/// <remarks>
/// At fixed T the two phases keep equal pressure and equal molar Gibbs energy. Since
/// (∂G/∂p)_T,P = (∂A/∂p)_T,V for any model parameter p, differentiating G_L = G_V at fixed T gives
/// the exact (implicit-function) result dPsat/dp = −(A_p,V − A_p,L)/(v_V − v_L), a Clapeyron
/// equation in the parameter; each density then follows from P(T, ρ; p) = Psat:
/// dρ/dp = (dPsat/dp − ρ²·A_ρp)/(∂P/∂ρ)_T, and each phase's enthalpy from
/// h_r = A − T·A_T + ρ·A_ρ: dh/dp = A_p − T·A_Tp + ρ·A_ρp + (2A_ρ + ρA_ρρ − T·A_Tρ)·dρ/dp.
/// A_p, A_ρp and A_Tp of the cubic A_r = −RT·ln(1 − bρ) − (g/b)·F(bρ), g = a·α(T), are
/// written below in b, g and g_T; <see cref="CubicParameterization.Derivatives"/> supplies
/// their exact derivatives in Tc, Pc, ω (and any alpha parameters). A constant volume shift c
/// leaves Psat, Δh and Δv unchanged and moves each molar volume by −c, so the sensitivities are
/// taken on the untranslated cubic and c's own derivative is added to the volumes. At fixed P,
/// dTsat/dp = −(dPsat/dp)_T/(dPsat/dT) and X's change along the line is added:
/// (dX/dp)_P = (dX/dp)_T + (dX/dT)_σ·dTsat/dp. Two model evaluations per state (the two phases of
/// the untranslated cubic), no iteration.
/// Not applied at the critical point, in the critical-series region, or within 3u(Tc) of Tc,
/// where a sampled Tc can fall below T and first order does not hold.
/// </remarks>
public static class LinearPropagation
{
    private const double R = Constants.GasConstant;

    /// <summary>How many standard uncertainties of Tc a state must lie below Tc for first-order
    /// propagation: 3, so that a Tc moved by its 3σ excursion still lies above T.</summary>
    public const double CriticalMargin = 3;

    /// <summary>The exact sensitivities of a coexistence state of the nominal model to every input.</summary>
    /// <param name="point">A state of <see cref="CubicParameterization.Nominal"/>, not critical.</param>
    /// <param name="parameters">The inputs.</param>
    /// <param name="atFixedPressure">True when the state was solved at a given pressure (T moves
    /// with the inputs), false when at a given temperature.</param>
    public static CoexistenceSensitivity Sensitivities(CoexistencePoint point, CubicParameterization parameters, bool atFixedPressure)
    {
        ArgumentNullException.ThrowIfNull(point);
        ArgumentNullException.ThrowIfNull(parameters);
        var model = parameters.Nominal;
        double t = point.Temperature;
        double c = model.VolumeShift;
        var bare = c == 0 ? model : model.WithVolumeShift(0);
        double rhoL = 1 / (point.Liquid.MolarVolume + c);
        double rhoV = 1 / (point.Vapour.MolarVolume + c);
        var dl = bare.Residual(t, rhoL);
        var dv = bare.Residual(t, rhoV);
        var structural = parameters.Derivatives(t);
        int n = structural.Length;
        var alpha = model.Alpha.Evaluate(t);
        double g = model.AttractionA * alpha.Value;
        double gT = model.AttractionA * alpha.FirstDerivative;
        var phaseL = new Partials(model, t, rhoL, g, gT);
        var phaseV = new Partials(model, t, rhoV, g, gT);

        double vL = 1 / rhoL, vV = 1 / rhoV;
        double slope = point.Slope;
        var result = new CoexistenceSensitivity(new double[n], new double[n], new double[n], new double[n], new double[n]);
        for (int k = 0; k < n; k++)
        {
            var s = structural[k];
            var (aL, aRhoL, aTL) = phaseL.Along(s);
            var (aV, aRhoV, aTV) = phaseV.Along(s);
            double dP = -(aV - aL) / (vV - vL);
            double dRhoL = (dP - rhoL * rhoL * aRhoL) / dl.PressureDRho;
            double dRhoV = (dP - rhoV * rhoV * aRhoV) / dv.PressureDRho;
            double dH = Enthalpy(dv, aV, aRhoV, aTV, dRhoV) - Enthalpy(dl, aL, aRhoL, aTL, dRhoL);
            double dT = 0;
            if (atFixedPressure)
            {
                // Move back along the line to the given pressure.
                dT = -dP / slope;
                dRhoL += LineDensitySlope(dl, slope) * dT;
                dRhoV += LineDensitySlope(dv, slope) * dT;
                dH += (LineEnthalpySlope(dv, slope) - LineEnthalpySlope(dl, slope)) * dT;
                dP = 0;
            }

            result.Temperature[k] = dT;
            result.Pressure[k] = dP;
            result.EnthalpyOfVaporization[k] = dH;
            result.LiquidDensity[k] = Translated(rhoL, dRhoL, s.VolumeShift, c);
            result.VapourDensity[k] = Translated(rhoV, dRhoV, s.VolumeShift, c);
        }

        return result;
    }

    /// <summary>Standard uncertainties of a coexistence state by first-order propagation.</summary>
    /// <param name="point">A state of <see cref="CubicParameterization.Nominal"/>.</param>
    /// <param name="parameters">The inputs and their covariance.</param>
    /// <param name="atFixedPressure">True when the state was solved at a given pressure.</param>
    /// <returns>The uncertainties, or null values with a reason at or near the critical point.</returns>
    public static CoexistenceUncertainty Propagate(CoexistencePoint point, CubicParameterization parameters, bool atFixedPressure)
    {
        ArgumentNullException.ThrowIfNull(point);
        ArgumentNullException.ThrowIfNull(parameters);
        if (NotApplicable(point, parameters) is string reason)
        {
            return CoexistenceUncertainty.Undefined(PropagationMethod.Linear, reason);
        }

        var s = Sensitivities(point, parameters, atFixedPressure);
        var sigma = parameters.Covariance;
        return new CoexistenceUncertainty(PropagationMethod.Linear,
            Combine(s.Temperature, sigma), Combine(s.Pressure, sigma), Combine(s.EnthalpyOfVaporization, sigma),
            Combine(s.LiquidDensity, sigma), Combine(s.VapourDensity, sigma), null);
    }

    /// <summary>Why first-order propagation does not apply to a state, or null when it does.</summary>
    internal static string? NotApplicable(CoexistencePoint point, CubicParameterization parameters)
    {
        if (point.IsCritical || point.Report.Method is CoexistenceMethod.CriticalSeries or CoexistenceMethod.CriticalState)
        {
            return "at or next to the critical point, where the coexistence properties are not differentiable in Tc";
        }

        double tc = parameters.Nominal.CriticalTemperature;
        double uTc = parameters.Inputs[0].StandardUncertainty;
        if (tc - point.Temperature < CriticalMargin * uTc)
        {
            return $"within {CriticalMargin} u(Tc) = {Preconditions.Format(CriticalMargin * uTc)} K of the critical temperature: first-order propagation does not hold there (use --uncertainty monte-carlo further from Tc)";
        }

        return null;
    }

    /// <summary>√(Jᵀ·Σ·J).</summary>
    internal static double Combine(double[] gradient, Matrix<double> covariance)
    {
        var j = Vector<double>.Build.DenseOfArray(gradient);
        double variance = j * (covariance * j);
        return Math.Sqrt(Math.Max(variance, 0));
    }

    /// <summary>dh_r/dp of one phase at fixed T: A_p − T·A_Tp + ρ·A_ρp + (∂h_r/∂ρ)_T·dρ/dp.</summary>
    private static double Enthalpy(in HelmholtzDerivatives d, double aP, double aRhoP, double aTP, double dRho)
        => aP - d.Temperature * aTP + d.Density * aRhoP + HDensity(d) * dRho;

    /// <summary>(∂h_r/∂ρ)_T = 2A_ρ + ρA_ρρ − T·A_Tρ.</summary>
    internal static double HDensity(in HelmholtzDerivatives d) => 2 * d.DRho + d.Density * d.DRhoRho - d.Temperature * d.DTRho;

    /// <summary>dρ/dT along the line: (dPsat/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T.</summary>
    private static double LineDensitySlope(in HelmholtzDerivatives d, double slope) => (slope - d.PressureDT) / d.PressureDRho;

    /// <summary>dh_r/dT along the line: (∂h_r/∂T)_ρ + (∂h_r/∂ρ)_T·dρ/dT|σ, with
    /// (∂h_r/∂T)_ρ = −T·A_TT + ρ·A_Tρ (the ideal-gas part is the same in both phases and cancels in Δh).</summary>
    private static double LineEnthalpySlope(in HelmholtzDerivatives d, double slope)
        => -d.Temperature * d.DTT + d.Density * d.DTRho + HDensity(d) * LineDensitySlope(d, slope);

    /// <summary>dρ/dp of the translated model, ρ = 1/(1/ρc − c), from dρc/dp of the cubic and dc/dp.</summary>
    internal static double Translated(double cubicDensity, double cubicDensityDerivative, double shiftDerivative, double shift)
    {
        double v = 1 / cubicDensity - shift;
        double dv = -cubicDensityDerivative / (cubicDensity * cubicDensity) - shiftDerivative;
        return -dv / (v * v);
    }

    /// <summary>The parameter derivatives of the untranslated cubic's A_r, A_ρ and A_T at one (T, ρ),
    /// as coefficients of ∂b, ∂g and ∂g_T.</summary>
    internal readonly struct Partials
    {
        private readonly double _ab, _ag, _arhob, _arhog, _atb, _atgT;

        public Partials(CubicModel model, double t, double rho, double g, double gT)
        {
            double b = model.CovolumeB;
            double d1 = model.Form.Delta1, d2 = model.Form.Delta2;
            double eta = b * rho;
            double one = 1 - eta;
            double p1 = 1 + d1 * eta, p2 = 1 + d2 * eta;
            double d = p1 * p2;
            double f = d1 == d2 ? eta / p1 : Math.Log(p1 / p2) / (d1 - d2);
            double dDdb = rho * (d1 + d2 + 2 * d1 * d2 * eta);
            double rt = R * t;
            // A = −RT ln(1 − bρ) − (g/b)F(bρ), F′ = 1/D; A_ρ = RT·b/(1 − bρ) − g/D; A_T = −R ln(1 − bρ) − (g_T/b)F.
            _ab = rt * rho / one + g * f / (b * b) - g * rho / (b * d);
            _ag = -f / b;
            _arhob = rt / (one * one) + g * dDdb / (d * d);
            _arhog = -1 / d;
            _atb = R * rho / one + gT * f / (b * b) - gT * rho / (b * d);
            _atgT = -f / b;
        }

        /// <summary>(A_p, A_ρp, A_Tp) for one input.</summary>
        public (double A, double ARho, double AT) Along(StructuralDerivative s)
            => (_ab * s.Covolume + _ag * s.Attraction,
                _arhob * s.Covolume + _arhog * s.Attraction,
                _atb * s.Covolume + _atgT * s.AttractionSlope);
    }
}
