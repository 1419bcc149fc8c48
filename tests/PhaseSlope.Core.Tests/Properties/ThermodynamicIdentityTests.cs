using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>Exact thermodynamic identities (any thermodynamics text, e.g. Callen,
/// Thermodynamics and an Introduction to Thermostatistics, 2nd ed. (1985), ch. 7) at liquid,
/// vapour and supercritical states, and the Jacobian derivatives against independent central
/// differences of the engine's own states.</summary>
public class ThermodynamicIdentityTests(ITestOutputHelper output)
{
    /// <summary>Relative tolerance of an identity between two Jacobian expressions: each side is a
    /// few products and one quotient of the eight (T, V) partials, each correct to a few ulps, so
    /// the sides agree to ~10 ε ≈ 2e-15; 1e-12 leaves room for the cancellation in cp − cv and
    /// in 1 − Tα while still catching any wrong term (which would show at order 1).</summary>
    private const double IdentityTolerance = 1e-12;

    public static TheoryData<string, CubicModelKind, AlphaForm, bool, double, double, PhaseLabel> States => new()
    {
        // Propane, Peng-Robinson: compressed liquid (Psat(300 K) ≈ 1 MPa), superheated vapour, supercritical (Tc = 369.89 K).
        { "propane", CubicModelKind.PengRobinson, AlphaForm.Default, false, 300, 2e6, PhaseLabel.Liquid },
        { "propane", CubicModelKind.PengRobinson, AlphaForm.Default, false, 300, 0.1e6, PhaseLabel.Vapour },
        { "propane", CubicModelKind.PengRobinson, AlphaForm.Default, false, 450, 6e6, PhaseLabel.Supercritical },
        // Water, Soave-Redlich-Kwong (Tc = 647.096 K).
        { "water", CubicModelKind.SoaveRedlichKwong, AlphaForm.Default, false, 400, 1e6, PhaseLabel.Liquid },
        { "water", CubicModelKind.SoaveRedlichKwong, AlphaForm.Default, false, 500, 0.5e6, PhaseLabel.Vapour },
        { "water", CubicModelKind.SoaveRedlichKwong, AlphaForm.Default, false, 700, 30e6, PhaseLabel.Supercritical },
        // Ethanol, Peng-Robinson 1978 (Tc ≈ 514 K).
        { "ethanol", CubicModelKind.PengRobinson1978, AlphaForm.Default, false, 300, 1e6, PhaseLabel.Liquid },
        { "ethanol", CubicModelKind.PengRobinson1978, AlphaForm.Default, false, 400, 0.1e6, PhaseLabel.Vapour },
        { "ethanol", CubicModelKind.PengRobinson1978, AlphaForm.Default, false, 550, 8e6, PhaseLabel.Supercritical },
        // Carbon dioxide, Peng-Robinson with the Twu alpha function and the Péneloux shift (Tc ≈ 304 K).
        { "carbon-dioxide", CubicModelKind.PengRobinson, AlphaForm.Twu, true, 250, 5e6, PhaseLabel.Liquid },
        { "carbon-dioxide", CubicModelKind.PengRobinson, AlphaForm.Twu, true, 280, 1e6, PhaseLabel.Vapour },
        { "carbon-dioxide", CubicModelKind.PengRobinson, AlphaForm.Twu, true, 350, 10e6, PhaseLabel.Supercritical },
    };

    private static (PropertyModel Engine, ThermodynamicState State) Build(string fluid, CubicModelKind kind, AlphaForm alpha, bool shift, double t, double p, PhaseLabel phase)
    {
        var engine = Engines.For(fluid, kind, alpha, shift);
        var state = engine.AtPressure(t, p);
        Assert.Equal(phase, state.Phase);
        return (engine, state);
    }

    private static double D(ThermodynamicState s, StateVariable x, StateVariable y, StateVariable z) => PartialDerivatives.Of(s, x, y, z);

    private double Check(double expected, double actual, double tolerance, string what)
    {
        double deviation = AssertClose.RelativeDifference(expected, actual);
        output.WriteLine($"{what}: relative deviation {deviation:E2}");
        AssertClose.Relative(expected, actual, tolerance, what);
        return deviation;
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Jacobians_ExactIdentities_HoldToNearMachinePrecision(string fluid, CubicModelKind kind, AlphaForm alpha, bool shift, double t, double p, PhaseLabel phase)
    {
        var (_, s) = Build(fluid, kind, alpha, shift, t, p, phase);
        double v = s.MolarVolume;
        double alphaP = D(s, V, T, P) / v;
        double kappaT = -D(s, V, P, T) / v;
        double cp = D(s, H, T, P);
        double cv = D(s, U, T, V);

        // Maxwell relation from dA = −S dT − P dV.
        Check(D(s, P, T, V), D(s, S, V, T), IdentityTolerance, "(dS/dV)_T = (dP/dT)_V");
        // Maxwell relation from dG = −S dT + V dP.
        Check(-D(s, V, T, P), D(s, S, P, T), IdentityTolerance, "(dS/dP)_T = -(dV/dT)_P");
        // Thermodynamic equation of state.
        Check(-p + t * alphaP / kappaT, D(s, U, V, T), IdentityTolerance, "(dU/dV)_T = -P + T alpha/kappaT");
        Check(s.InternalPressure, D(s, U, V, T), IdentityTolerance, "InternalPressure");
        // cp − cv = T v α²/κT (Mayer's relation, general form).
        Check(t * v * alphaP * alphaP / kappaT, cp - cv, IdentityTolerance, "cp - cv = T v alpha^2/kappaT");
        Check(cp, s.IsobaricHeatCapacity!.Value, IdentityTolerance, "IsobaricHeatCapacity = (dH/dT)_P");
        Check(cv, s.IsochoricHeatCapacity!.Value, IdentityTolerance, "IsochoricHeatCapacity = (dU/dT)_V");
        Check(alphaP, s.IsobaricExpansivity!.Value, IdentityTolerance, "IsobaricExpansivity");
        Check(kappaT, s.IsothermalCompressibility!.Value, IdentityTolerance, "IsothermalCompressibility");
        // (∂H/∂P)_T = v(1 − Tα).
        Check(v * (1 - t * alphaP), D(s, H, P, T), IdentityTolerance, "(dH/dP)_T = v(1 - T alpha)");
        // κS = −(1/V)(∂V/∂P)_S = κT·cv/cp, and κS = 1/(ρ_mass w²) (Newton–Laplace).
        double kappaS = -D(s, V, P, S) / v;
        Check(kappaT * cv / cp, kappaS, IdentityTolerance, "kappaS = kappaT cv/cp");
        Check(kappaS, s.IsentropicCompressibility!.Value, IdentityTolerance, "IsentropicCompressibility");
        // Isentropic exponent k = −(v/P)(∂P/∂v)_S against the Jacobian, and γ = cp/cv.
        Check(-v / p / D(s, V, P, S), s.IsentropicExponent!.Value, IdentityTolerance, "isentropic exponent = -(v/P)(dP/dv)_S");
        Check(cp / cv, s.HeatCapacityRatio!.Value, IdentityTolerance, "heat capacity ratio = cp/cv");
        double w = s.SpeedOfSound!.Value;
        Check(kappaS, 1 / (s.Density * s.MolarMass!.Value * w * w), IdentityTolerance, "kappaS = 1/(rho w^2)");
        // Joule–Thomson: (∂T/∂P)_H = (Tα − 1)v/cp.
        Check((t * alphaP - 1) * v / cp, D(s, T, P, H), IdentityTolerance, "(dT/dP)_H = (T alpha - 1) v/cp");
        Check(D(s, T, P, H), s.JouleThomsonCoefficient!.Value, IdentityTolerance, "JouleThomsonCoefficient");
        // Cyclic rule.
        Check(-1, D(s, P, T, V) * D(s, T, V, P) * D(s, V, P, T), IdentityTolerance, "cyclic rule");
        // Fundamental relations: (∂G/∂P)_T = V, (∂G/∂T)_P = −S, (∂A/∂V)_T = −P, (∂U/∂S)_V = T, (∂H/∂S)_P = T.
        Check(v, D(s, G, P, T), IdentityTolerance, "(dG/dP)_T = V");
        Check(-s.Entropy!.Value, D(s, G, T, P), IdentityTolerance, "(dG/dT)_P = -S");
        Check(-p, D(s, A, V, T), IdentityTolerance, "(dA/dV)_T = -P");
        Check(t, D(s, U, S, V), IdentityTolerance, "(dU/dS)_V = T");
        Check(t, D(s, H, S, P), IdentityTolerance, "(dH/dS)_P = T");
        // Reciprocity: (∂X/∂Y)_Z·(∂Y/∂X)_Z = 1.
        Check(1, D(s, S, P, H) * D(s, P, S, H), IdentityTolerance, "reciprocity (dS/dP)_H (dP/dS)_H");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void GibbsHelmholtz_FromJacobians_EqualsMinusHOverTSquared(string fluid, CubicModelKind kind, AlphaForm alpha, bool shift, double t, double p, PhaseLabel phase)
    {
        // (∂(G/T)/∂T)_P = (∂G/∂T)_P/T − G/T² = −H/T² (Gibbs–Helmholtz). G and T·S are each larger
        // than H in magnitude here, so the comparison is scaled by (|G| + T|S|)/T²: the terms agree
        // to a few ulps of that scale.
        var (_, s) = Build(fluid, kind, alpha, shift, t, p, phase);
        double lhs = D(s, G, T, P) / t - s.GibbsEnergy!.Value / (t * t);
        double scale = (Math.Abs(s.GibbsEnergy!.Value) + t * Math.Abs(s.Entropy!.Value)) / (t * t);
        output.WriteLine($"Gibbs-Helmholtz: deviation {Math.Abs(lhs + s.Enthalpy!.Value / (t * t)) / scale:E2} of scale");
        AssertClose.Absolute(-s.Enthalpy!.Value / (t * t), lhs, IdentityTolerance * scale, "Gibbs-Helmholtz (d(G/T)/dT)_P = -H/T^2");
    }

    /// <summary>Truncation part of the tolerance of a five-point central difference, whose
    /// truncation error δ⁴f⁽⁵⁾/30 scales as the fourth power of the step. At the near-critical
    /// supercritical ethanol state (T/Tc ≈ 1.07, P/Pc ≈ 1.3) a step of 1e-3·T left 1e-7 relative in
    /// cp, so the step of 1e-4 used here leaves ~1e-11; 1e-9 allows a factor 100 for the other
    /// states and derivatives.</summary>
    private const double TruncationTolerance = 1e-9;

    /// <summary>Ulps of error in one evaluation of a property (a sum of a handful of rounded terms
    /// plus the error of a re-solved density root), bounding the rounding part of a difference.</summary>
    private const double UlpsPerEvaluation = 32;

    /// <summary>2⁻⁵², the spacing of doubles at 1.</summary>
    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>Checks a five-point central difference of f against the exact derivative with the
    /// tolerance the step allows: truncation, plus rounding 1.5·ε_f/δ with ε_f =
    /// <see cref="UlpsPerEvaluation"/>·ε·scale, where scale is |f| or, for A = U − TS and
    /// G = H − TS, the size of the terms that cancel.</summary>
    private double CheckDifference(Func<double, double> f, double x, double step, double exact, string what, double? scale = null)
    {
        double difference = FiniteDifference.Central5(f, x, step);
        double rounding = 1.5 * UlpsPerEvaluation * MachineEpsilon * (scale ?? Math.Abs(f(x))) / (step * Math.Abs(exact));
        return Check(exact, difference, TruncationTolerance + rounding, what);
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Jacobians_AtConstantPressure_MatchCentralDifferencesOfAtPressure(string fluid, CubicModelKind kind, AlphaForm alpha, bool shift, double t, double p, PhaseLabel phase)
    {
        var (engine, s) = Build(fluid, kind, alpha, shift, t, p, phase);
        var choice = phase switch { PhaseLabel.Liquid => PhaseChoice.Liquid, PhaseLabel.Vapour => PhaseChoice.Vapour, _ => PhaseChoice.Stable };
        ThermodynamicState At(double tt, double pp) => engine.AtPressure(tt, pp, choice);
        double dT = 1e-4 * t;
        double dP = 1e-4 * p;
        double gScale = Math.Abs(s.Enthalpy!.Value) + t * Math.Abs(s.Entropy!.Value);

        CheckDifference(x => At(x, p).Enthalpy!.Value, t, dT, s.IsobaricHeatCapacity!.Value, "cp vs FD of h(T) at constant P");
        CheckDifference(x => At(x, p).MolarVolume, t, dT, D(s, V, T, P), "(dV/dT)_P vs FD");
        CheckDifference(x => At(x, p).Entropy!.Value, t, dT, D(s, S, T, P), "(dS/dT)_P vs FD");
        CheckDifference(x => At(x, p).GibbsEnergy!.Value, t, dT, D(s, G, T, P), "(dG/dT)_P vs FD", gScale);
        CheckDifference(x => At(t, x).Entropy!.Value, p, dP, D(s, S, P, T), "(dS/dP)_T vs FD");
        CheckDifference(x => At(t, x).Enthalpy!.Value, p, dP, D(s, H, P, T), "(dH/dP)_T vs FD");
        CheckDifference(x => At(t, x).MolarVolume, p, dP, D(s, V, P, T), "(dV/dP)_T vs FD");
        CheckDifference(x => At(t, x).GibbsEnergy!.Value, p, dP, D(s, G, P, T), "(dG/dP)_T vs FD", gScale);

        // Joule–Thomson along constant h: T(P') with h(T(P'), P') = h(T, P), found by Newton steps
        // with the exact cp until the step is below rounding; then μJT = dT/dP by central
        // differences. One evaluation of T(P') is uncertain by ~ε·(T + |h|/cp) (the rounding of T
        // itself and of h converted to temperature), the scale passed below.
        double h0 = s.Enthalpy!.Value;
        double cp0 = s.IsobaricHeatCapacity!.Value;
        double TemperatureAtEnthalpy(double pp)
        {
            double tt = t;
            for (int i = 0; i < 30; i++)
            {
                var state = At(tt, pp);
                double step = (state.Enthalpy!.Value - h0) / state.IsobaricHeatCapacity!.Value;
                tt -= step;
                if (Math.Abs(step) <= 1e-15 * tt)
                {
                    break;
                }
            }

            return tt;
        }

        CheckDifference(TemperatureAtEnthalpy, p, dP, s.JouleThomsonCoefficient!.Value, "muJT vs FD of T along constant h",
            t + Math.Abs(h0) / cp0);
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Jacobians_AtConstantTemperatureOrVolume_MatchCentralDifferencesOfAtDensity(string fluid, CubicModelKind kind, AlphaForm alpha, bool shift, double t, double p, PhaseLabel phase)
    {
        var (engine, s) = Build(fluid, kind, alpha, shift, t, p, phase);
        double v = s.MolarVolume;
        ThermodynamicState At(double tt, double vv) => engine.AtDensity(tt, 1 / vv);
        double dT = 1e-4 * t;
        // A step that changes P by at most 5 %, so that a stiff liquid is not stretched to a
        // negative pressure (which AtDensity rejects): |ΔP| ≈ 2δV/(V·κT).
        double dV = Math.Min(1e-4, 0.025 * p * s.IsothermalCompressibility!.Value) * v;
        double aScale = Math.Abs(s.InternalEnergy!.Value) + t * Math.Abs(s.Entropy!.Value);

        CheckDifference(x => At(t, x).Entropy!.Value, v, dV, D(s, S, V, T), "(dS/dV)_T vs FD");
        CheckDifference(x => At(t, x).InternalEnergy!.Value, v, dV, D(s, U, V, T), "(dU/dV)_T vs FD");
        CheckDifference(x => At(t, x).HelmholtzEnergy!.Value, v, dV, D(s, A, V, T), "(dA/dV)_T vs FD", aScale);
        CheckDifference(x => At(x, v).InternalEnergy!.Value, t, dT, s.IsochoricHeatCapacity!.Value, "cv vs FD of u(T) at constant V");
        CheckDifference(x => At(x, v).Pressure, t, dT, D(s, P, T, V), "(dP/dT)_V vs FD", Math.Abs(p) + 1 / (s.IsothermalCompressibility!.Value));
        CheckDifference(x => At(x, v).Entropy!.Value, t, dT, D(s, S, T, V), "(dS/dT)_V vs FD");
        CheckDifference(x => At(x, v).HelmholtzEnergy!.Value, t, dT, D(s, A, T, V), "(dA/dT)_V = -S vs FD", aScale);
    }
}
