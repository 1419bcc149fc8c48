using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Models;

/// <summary>A two-parameter cubic equation of state for one fluid, optionally volume-translated
/// (Péneloux, Rauzy &amp; Fréze, Fluid Phase Equilib. 8, 7 (1982)), expressed through its one
/// residual Helmholtz function A_r(T, ρ).</summary>
/// <remarks>
/// Untranslated, P = RT/(v − b) − a·α(T)/((v + δ1·b)(v + δ2·b)). A constant shift c with
/// v = v_cubic − c gives P = RT/(v − b′) − a·α/((v + e1)(v + e2)) with the repulsive co-volume
/// b′ = b − c and e_i = c + δ_i·b. Integrating the pressure gives, with η = bρ and the shifted
/// δ′_i = δ_i + c/b (so e_i = δ′_i·b),
/// A_r = −RT·ln(1 − b′ρ) − (a·α/b)·F(η), where F = ln[(1 + δ′1η)/(1 + δ′2η)]/(δ′1 − δ′2), or
/// F = η/(1 + δ′η) when δ′1 = δ′2 = δ′ (van der Waals: F = η/(1 + cρ)). Then dF/dρ = b/D with
/// D = (1 + δ′1η)(1 + δ′2η). With c = 0, δ′_i = δ_i and b′ = b exactly, so the untranslated
/// model is computed by the same operations as before translation was added. Every pressure,
/// fugacity and caloric residual comes from <see cref="Residual(double, double)"/>; none is written a second time.
/// Density roots at given (T, P) are the roots of the cubic in v, in closed form
/// (<see cref="DensityRoots"/>), polished by Newton steps on P(v), with no Helmholtz evaluation.
/// The model is valid for T &gt; 0 and 0 &lt; ρ &lt; 1/b′; both attractive factors 1 + e_iρ
/// stay positive there because b′ + e_i = (1 + δ_i)·b &gt; 0 for every form used here.
/// </remarks>
public sealed class CubicModel : IResidualModel, IMixedThirdDerivatives
{
    private const double R = Constants.GasConstant;
    private readonly double _delta1;
    private readonly double _delta2;

    /// <summary>Builds a model from its form, alpha function and critical constants.</summary>
    /// <param name="kind">Which published model this is (for reports).</param>
    /// <param name="form">δ1, δ2 and the derived Ωa, Ωb.</param>
    /// <param name="alpha">α(T).</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    /// <param name="volumeShift">Péneloux volume translation c in m³/mol (v = v_cubic − c),
    /// finite, with −b &lt; c &lt; b; 0 for the untranslated model.</param>
    /// <exception cref="InvalidInputException">Tc or Pc not positive, or so large or small that a or b
    /// overflows; c outside (−b, b).</exception>
    public CubicModel(CubicModelKind kind, CubicForm form, IAlphaFunction alpha, double criticalTemperature, double criticalPressure, double volumeShift = 0)
    {
        ArgumentNullException.ThrowIfNull(form);
        ArgumentNullException.ThrowIfNull(alpha);
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Preconditions.Finite(volumeShift, "volume shift");
        Kind = kind;
        Form = form;
        Alpha = alpha;
        CriticalTemperature = criticalTemperature;
        CriticalPressure = criticalPressure;
        CovolumeB = form.OmegaB * R * criticalTemperature / criticalPressure;
        AttractionA = form.OmegaA * R * R * criticalTemperature * criticalTemperature / criticalPressure;
        // Tc²/Pc and Tc/Pc must be representable: Tc = 1e300 K passed the positivity check and
        // then failed in the solver as "too close to the critical temperature".
        if (!(double.IsFinite(AttractionA) && AttractionA > 0 && double.IsFinite(CovolumeB) && CovolumeB > 0))
        {
            throw new InvalidInputException("critical temperature", criticalTemperature,
                $"critical temperature {Preconditions.Format(criticalTemperature)} K and critical pressure {Preconditions.Format(criticalPressure)} Pa give model constants a = {Preconditions.Format(AttractionA)} and b = {Preconditions.Format(CovolumeB)} outside the range of double precision: check Tc and Pc and their units");
        }

        if (!(volumeShift < CovolumeB))
        {
            throw new InvalidInputException("volume shift", volumeShift,
                $"volume shift {Preconditions.Format(volumeShift)} m3/mol must be below the co-volume b = {Preconditions.Format(CovolumeB)} m3/mol");
        }

        // This tool's bound, not a published one: a shift larger in magnitude than the co-volume
        // moves the liquid molar volume (about 1.1-1.4 b at low T) by more than the liquid's own
        // volume; published Péneloux shifts are a few tenths of b at most.
        if (!(volumeShift > -CovolumeB))
        {
            throw new InvalidInputException("volume shift", volumeShift,
                $"volume shift {Preconditions.Format(volumeShift)} m3/mol is below minus the co-volume b = {Preconditions.Format(CovolumeB)} m3/mol: a shift larger than b would move liquid volumes by more than themselves");
        }

        VolumeShift = volumeShift;
        // ρc = 1/(vc − c) with vc = Zc·R·Tc/Pc, written so that c = 0 gives Pc/(Zc·R·Tc) exactly.
        CriticalDensity = criticalPressure / (form.CriticalCompressibility * R * criticalTemperature - volumeShift * criticalPressure);
        TranslatedCovolume = CovolumeB - volumeShift;
        double shift = volumeShift / CovolumeB;
        _delta1 = form.Delta1 + shift;
        _delta2 = form.Delta2 + shift;
        var entry = kind.Entry();
        Identity = new ModelIdentity(entry.Id, entry.Title, alpha.Description, volumeShift);
    }

    /// <summary>Builds a model for a fluid from its Tc, Pc and ω, with a chosen alpha function
    /// (by default the published model's own) and volume shift (by default none).</summary>
    /// <param name="kind">The cubic model.</param>
    /// <param name="fluid">The fluid (Tc, Pc, ω and <see cref="Fluid.AlphaParameters"/>).</param>
    /// <param name="alpha"><see cref="AlphaForm.Default"/>: the model's own alpha function.
    /// <see cref="AlphaForm.Twu"/>: the fluid's Twu (1991) L, M, N for this model when
    /// present, else for Peng–Robinson the generalised Twu, Coon &amp; Cunningham (1995) function of
    /// ω. <see cref="AlphaForm.MathiasCopeman"/>: the fluid's c1, c2, c3 for this model. Twu and
    /// Mathias–Copeman apply to the Peng–Robinson and Soave–Redlich–Kwong forms only; parameters
    /// given for <see cref="CubicModelKind.PengRobinson"/> also serve
    /// <see cref="CubicModelKind.PengRobinson1978"/>, which differs only in its default κ(ω).</param>
    /// <param name="volumeShift">Volume translation c in m³/mol (see <see cref="Models.VolumeShift"/>).</param>
    /// <exception cref="InvalidInputException">The alpha form does not apply to the model, or
    /// the fluid has no parameters for it; the fluid's own parameters (or the generalised Twu
    /// function) give an α that is not positive and decreasing from min(0.3, the fluid's lowest
    /// valid temperature over Tc) to T/Tc = 1 (<see cref="AlphaGuard"/>); ω outside
    /// <see cref="GeneralisedTwuAlpha.ValidAcentricFactorRange"/> for the generalised Twu function.</exception>
    public static CubicModel For(CubicModelKind kind, Fluid fluid, AlphaForm alpha = AlphaForm.Default, double volumeShift = 0)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        double tc = fluid.CriticalTemperature.Value;
        double pc = fluid.CriticalPressure.Value;
        double omega = fluid.AcentricFactor.Value;
        if (alpha == AlphaForm.Default)
        {
            // A tuned fluid prefers its tuned alpha function, where it has one for this model.
            if (EffectiveAlpha(kind, fluid, alpha) is var preferred && preferred != AlphaForm.Default)
            {
                return For(kind, fluid, preferred, volumeShift);
            }

            return For(kind, tc, pc, omega, volumeShift);
        }

        Preconditions.Positive(tc, "critical temperature");
        Preconditions.Finite(omega, "acentric factor");
        var entry = kind.Entry();
        if (!entry.AcceptsAlphaChoice)
        {
            throw new InvalidInputException("alpha form", double.NaN,
                $"the {AlphaName(alpha)} alpha function applies to the Peng-Robinson and Soave-Redlich-Kwong models only, not {entry.Title}");
        }

        CubicForm form = entry.Form;
        AlphaParameterSet? set = FindParameters(fluid, kind, alpha);
        if (alpha == AlphaForm.Twu && set is null && form == CubicForm.PengRobinson)
        {
            var (lowest, highest) = GeneralisedTwuAlpha.ValidAcentricFactorRange;
            if (!(omega >= lowest && omega <= highest))
            {
                throw new InvalidInputException("acentric factor", omega,
                    $"acentric factor {Preconditions.Format(omega)} of {fluid.Name} is outside {Preconditions.Format(lowest)} to {(double.IsPositiveInfinity(highest) ? "any value" : Preconditions.Format(highest))}, where the generalised Twu (1995) alpha function stays positive and decreasing for 0.3 <= T/Tc <= 1");
            }
        }

        IAlphaFunction function = alpha switch
        {
            _ when set is not null => FromParameters(set, fluid, tc),
            AlphaForm.Twu when form == CubicForm.PengRobinson => new GeneralisedTwuAlpha(omega, tc),
            AlphaForm.Twu => throw new InvalidInputException("alpha form", double.NaN,
                $"no Twu parameters for {fluid.Name} with {kind.Title()}, and the generalised Twu (1995) alpha function is implemented for Peng-Robinson only"),
            AlphaForm.MathiasCopeman or AlphaForm.Soave => throw new InvalidInputException("alpha form", double.NaN,
                $"no {AlphaName(alpha)} parameters for {fluid.Name} with {kind.Title()}: tune them to measured vapour pressures (phaseslope tune), or add a line "
                + $"'{AlphaKeyStem(alpha)}_{(form == CubicForm.PengRobinson ? "pr" : "srk")}  {string.Join(' ', AlphaParameterNames(alpha))}  | source' to a fluid file for it "
                + "and give the file's path as the fluid (docs/fluid-files.md)"),
            _ => throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "unknown alpha form"),
        };
        // Checked down to the fluid's lowest valid temperature (its triple point) where that lies below 0.3 Tc.
        double lowestReduced = Equilibrium.CoexistenceSolver.LowestValidTemperature(fluid) / tc;
        if (set is not null)
        {
            AlphaGuard.RequirePositiveDecreasing(function, tc,
                $"{AlphaName(alpha)} parameters {string.Join(", ", set.Values.Select(Preconditions.Format))} of {fluid.Name} with {kind.Title()}", lowestReduced);
        }
        else if (lowestReduced < AlphaGuard.LowestReducedTemperature)
        {
            AlphaGuard.RequirePositiveDecreasing(function, tc, $"the generalised Twu (1995) alpha function with omega = {Preconditions.Format(omega)} of {fluid.Name}", lowestReduced);
        }

        return new CubicModel(kind, form, function, tc, pc, volumeShift);
    }

    /// <summary>The alpha form a model for <paramref name="fluid"/> actually uses when
    /// <paramref name="alpha"/> is asked for: the fluid's preferred (tuned) form in place of
    /// <see cref="AlphaForm.Default"/> when it has parameters for this model.</summary>
    public static AlphaForm EffectiveAlpha(CubicModelKind kind, Fluid fluid, AlphaForm alpha)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        return alpha == AlphaForm.Default && fluid.PreferredAlpha != AlphaForm.Default && kind.Entry().AcceptsAlphaChoice
            && FindParameters(fluid, kind, fluid.PreferredAlpha) is not null
            ? fluid.PreferredAlpha
            : alpha;
    }

    /// <summary>The alpha function of a fluid-specific parameter set.</summary>
    private static IAlphaFunction FromParameters(AlphaParameterSet set, Fluid fluid, double tc)
    {
        int expected = AlphaParameterSet.ParameterCount(set.Form);
        if (set.Values.Count != expected)
        {
            throw new InvalidInputException("alpha parameters", set.Values.Count,
                $"{AlphaName(set.Form)} parameters for {fluid.Name} with {set.Model.Title()} must be {expected} numbers, got {set.Values.Count}");
        }

        var v = set.Values;
        return set.Form switch
        {
            AlphaForm.Soave => new SoaveAlpha(v[0], tc, set.Source) { FluidSpecific = true },
            AlphaForm.Twu => new TwuAlpha(v[0], v[1], v[2], tc, set.Source),
            _ => new MathiasCopemanAlpha(v[0], v[1], v[2], tc, set.Source),
        };
    }

    /// <summary>The readable name of an alpha form with fluid-specific parameters.</summary>
    public static string AlphaName(AlphaForm alpha) => alpha switch
    {
        AlphaForm.Twu => "Twu",
        AlphaForm.Soave => "Soave",
        AlphaForm.MathiasCopeman => "Mathias-Copeman",
        _ => "default",
    };

    /// <summary>The fluid-file key stem of an alpha form's parameters (alpha_soave, alpha_twu, alpha_mathias_copeman).</summary>
    public static string AlphaKeyStem(AlphaForm alpha) => alpha switch
    {
        AlphaForm.Twu => "alpha_twu",
        AlphaForm.Soave => "alpha_soave",
        AlphaForm.MathiasCopeman => "alpha_mathias_copeman",
        _ => throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "the model's own alpha function has no parameter key"),
    };

    /// <summary>The parameter names of an alpha form, in order.</summary>
    public static IReadOnlyList<string> AlphaParameterNames(AlphaForm alpha) => alpha switch
    {
        AlphaForm.Twu => ["L", "M", "N"],
        AlphaForm.Soave => ["m"],
        AlphaForm.MathiasCopeman => ["c1", "c2", "c3"],
        _ => [],
    };

    /// <summary>The same model with volume shift <paramref name="volumeShift"/> (m³/mol) in
    /// place of the present one: form, alpha and critical constants are kept.</summary>
    public CubicModel WithVolumeShift(double volumeShift)
        => new(Kind, Form, Alpha, CriticalTemperature, CriticalPressure, volumeShift);

    /// <summary>Builds the chosen published model from Tc (K), Pc (Pa) and the acentric factor,
    /// with its default alpha function.</summary>
    /// <param name="kind">The cubic model.</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    /// <param name="acentricFactor">ω.</param>
    /// <param name="volumeShift">Volume translation c in m³/mol; 0 for none.</param>
    public static CubicModel For(CubicModelKind kind, double criticalTemperature, double criticalPressure, double acentricFactor, double volumeShift = 0)
    {
        Preconditions.Finite(acentricFactor, "acentric factor");
        var entry = kind.Entry();
        return new CubicModel(kind, entry.Form, entry.OwnAlpha(acentricFactor, criticalTemperature), criticalTemperature, criticalPressure, volumeShift);
    }


    /// <summary>The fluid's parameter set of the form for this model; for Peng–Robinson 1978 a
    /// set given for Peng–Robinson when there is none of its own.</summary>
    public static AlphaParameterSet? FindParameters(Fluid fluid, CubicModelKind kind, AlphaForm alpha)
    {
        AlphaParameterSet? own = fluid.AlphaParameters.FirstOrDefault(p => p.Form == alpha && p.Model == kind);
        if (own is null && kind.Entry().AlphaParametersOf is CubicModelKind other)
        {
            own = fluid.AlphaParameters.FirstOrDefault(p => p.Form == alpha && p.Model == other);
        }

        return own;
    }

    /// <summary>Which published model this is.</summary>
    public CubicModelKind Kind { get; }

    /// <inheritdoc />
    public ModelIdentity Identity { get; }

    /// <inheritdoc />
    public int ComponentCount => 1;

    /// <summary>The cubic form (δ1, δ2, Ωa, Ωb, Zc).</summary>
    public CubicForm Form { get; }

    /// <summary>The alpha function.</summary>
    public IAlphaFunction Alpha { get; }

    /// <summary>Input critical temperature Tc in K.</summary>
    public double CriticalTemperature { get; }

    /// <summary>Input critical pressure Pc in Pa.</summary>
    public double CriticalPressure { get; }

    /// <summary>The model's own critical molar density 1/(vc − c), vc = Zc·R·Tc/Pc, in mol/m³.</summary>
    public double CriticalDensity { get; }

    /// <summary>Co-volume b = Ωb·R·Tc/Pc in m³/mol.</summary>
    public double CovolumeB { get; }

    /// <summary>Attraction parameter at Tc, a = Ωa·R²·Tc²/Pc, in Pa·m⁶/mol².</summary>
    public double AttractionA { get; }

    /// <summary>The volume translation c in m³/mol: molar volumes are v = v_cubic − c. 0 when
    /// the model is untranslated.</summary>
    public double VolumeShift { get; }

    /// <summary>The repulsive co-volume of the translated model, b′ = b − c, in m³/mol.</summary>
    public double TranslatedCovolume { get; }

    /// <summary>The highest density the model admits, 1/(b − c), in mol/m³.</summary>
    public double MaximumDensity => 1 / TranslatedCovolume;

    /// <inheritdoc />
    public double DensityBound(ReadOnlySpan<double> amounts)
    {
        RequirePure(amounts);
        return MaximumDensity;
    }

    /// <inheritdoc />
    public ModelCriticalPoint CriticalPoint(ReadOnlySpan<double> amounts)
    {
        RequirePure(amounts);
        return new ModelCriticalPoint(CriticalTemperature, CriticalPressure, CriticalDensity);
    }

    /// <inheritdoc />
    public HelmholtzDerivatives Residual(double temperature, double density, ReadOnlySpan<double> amounts)
    {
        RequirePure(amounts);
        return Residual(temperature, density);
    }

    /// <inheritdoc />
    public void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients)
    {
        RequirePure(amounts);
        var d = Residual(temperature, density);
        lnFugacityCoefficients[0] = d.LnFugacityCoefficient(d.Pressure);
    }

    /// <inheritdoc />
    public int DensityRoots(double temperature, double pressure, ReadOnlySpan<double> amounts, Span<double> roots)
    {
        RequirePure(amounts);
        return CubicRoots.Find(temperature, pressure, CovolumeB, TranslatedCovolume, _delta1, _delta2, AttractionA * Alpha.Evaluate(temperature).Value, roots);
    }

    private static void RequirePure(ReadOnlySpan<double> amounts)
    {
        if (amounts.Length != 1 || !(amounts[0] > 0))
        {
            throw new InvalidInputException("composition", amounts.Length,
                $"this cubic model describes one component; got a composition of {amounts.Length} amounts");
        }
    }

    /// <summary>The shifted δ′1 = δ1 + c/b and δ′2 of the attractive denominator (v + δ′1·b)(v + δ′2·b).</summary>
    internal (double Delta1, double Delta2) ShiftedDeltas => (_delta1, _delta2);

    /// <summary>The residual Helmholtz energy and its derivatives at (T, ρ).</summary>
    /// <param name="temperature">T in K, positive.</param>
    /// <param name="density">ρ in mol/m³, in (0, 1/(b − c)).</param>
    public HelmholtzDerivatives Residual(double temperature, double density)
    {
        AlphaValue alpha = Alpha.Evaluate(temperature);
        double b = CovolumeB;
        return Helmholtz(temperature, density, b, TranslatedCovolume, _delta1, _delta2,
            AttractionA * alpha.Value / b, AttractionA * alpha.FirstDerivative / b, AttractionA * alpha.SecondDerivative / b);
    }

    /// <summary>The translated cubic's molar residual Helmholtz energy and its derivatives, for
    /// any set of constants: b, the repulsive b′ = b − c, the shifted δ′1, δ′2, and θ = a·α/b with
    /// its first two T-derivatives. A pure fluid passes its own; a mixture at fixed composition
    /// its mixed a(T), b and c (<see cref="CubicMixtureModel"/>).</summary>
    internal static HelmholtzDerivatives Helmholtz(double temperature, double density, double b, double bRep, double delta1, double delta2,
        double theta, double thetaT, double thetaTT)
    {
        double eta = b * density;
        double etaRep = bRep * density;
        double u = delta1 + delta2;
        double w = delta1 * delta2;

        double oneMinusEta = 1 - etaRep;
        double logRepulsive = Math.Log(oneMinusEta);
        double d1 = 1 + delta1 * eta;
        double d2 = 1 + delta2 * eta;
        double f = delta1 == delta2
            ? eta / d1
            : Math.Log(d1 / d2) / (delta1 - delta2);
        double d = d1 * d2;
        double dRho = b * (u + 2 * w * eta);   // dD/dρ
        double dRhoRho = 2 * w * b * b;        // d²D/dρ²

        double rt = R * temperature;
        double value = -rt * logRepulsive - theta * f;
        double dT = -R * logRepulsive - thetaT * f;
        double dTT = -thetaTT * f;
        double aRho = rt * bRep / oneMinusEta - theta * b / d;
        double aRhoRho = rt * bRep * bRep / (oneMinusEta * oneMinusEta) + theta * b * dRho / (d * d);
        double aRhoRhoRho = 2 * rt * bRep * bRep * bRep / (oneMinusEta * oneMinusEta * oneMinusEta)
            + theta * b * (dRhoRho * d - 2 * dRho * dRho) / (d * d * d);
        double aTRho = R * bRep / oneMinusEta - thetaT * b / d;
        return new HelmholtzDerivatives(temperature, density, value, dT, dTT, aRho, aRhoRho, aRhoRhoRho, aTRho);
    }

    /// <inheritdoc />
    /// <remarks>From ∂²A_r/∂T∂ρ = R·b′/(1 − b′ρ) − θ′·b/D with D = (1 + δ′1·bρ)(1 + δ′2·bρ) and
    /// θ = a·α(T)/b (see <see cref="Helmholtz"/>): ∂³A_r/∂T²∂ρ = −θ″·b/D and
    /// ∂³A_r/∂T∂ρ² = R·b′²/(1 − b′ρ)² + θ′·b·(dD/dρ)/D², in closed form from a(T)'s first two
    /// T-derivatives.</remarks>
    public (double DTTRho, double DTRhoRho) MixedThirdDerivatives(double temperature, double density)
    {
        AlphaValue alpha = Alpha.Evaluate(temperature);
        double b = CovolumeB;
        double bRep = TranslatedCovolume;
        double thetaT = AttractionA * alpha.FirstDerivative / b;
        double thetaTT = AttractionA * alpha.SecondDerivative / b;
        double eta = b * density;
        double d = (1 + _delta1 * eta) * (1 + _delta2 * eta);
        double dRho = b * (_delta1 + _delta2 + 2 * _delta1 * _delta2 * eta);
        double oneMinusEta = 1 - bRep * density;
        return (-thetaTT * b / d, R * bRep * bRep / (oneMinusEta * oneMinusEta) + thetaT * b * dRho / (d * d));
    }

    /// <summary>Pressure P(T, ρ) in Pa.</summary>
    public double Pressure(double temperature, double density) => Residual(temperature, density).Pressure;

    /// <summary>∂a_r/∂α at fixed T and ρ, in J/mol: the molar residual Helmholtz energy is
    /// a_r = −RT·ln(1 − b′ρ) − (a·α/b)·f(bρ), linear in the value of α, so this is −(a/b)·f(bρ)
    /// with f the attractive integral of <see cref="Residual(double, double)"/>. With it a change
    /// of the alpha function's parameters moves Psat exactly (see the tuning).</summary>
    /// <param name="density">ρ in mol/m³, in (0, 1/(b − c)).</param>
    public double ResidualHelmholtzPerAlpha(double density)
    {
        double eta = CovolumeB * density;
        double d1 = 1 + _delta1 * eta;
        double d2 = 1 + _delta2 * eta;
        double f = _delta1 == _delta2 ? eta / d1 : Math.Log(d1 / d2) / (_delta1 - _delta2);
        return -AttractionA / CovolumeB * f;
    }
}
