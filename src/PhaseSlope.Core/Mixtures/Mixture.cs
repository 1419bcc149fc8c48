using System.Globalization;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>An immutable mixture: its components (resolved fluids, in the order given), their
/// mole fractions and the interaction parameters the user gave; the published table fills the
/// other pairs when a model is chosen (<see cref="Interactions"/>).</summary>
/// <remarks>
/// <para>Fractions are checked, never repaired: a fraction that is negative or not finite, a
/// component given twice, or fractions whose sum differs from 1 by more than
/// <see cref="FractionSumTolerance"/> are refused naming the component. Within the tolerance
/// the fractions are divided by their sum, so <see cref="MoleFractions"/> sums to 1 to rounding
/// (the difference is at most 1e-6 relative: fractions read from a datasheet to six decimals).
/// A zero fraction is allowed (a component present in the model but not in this feed).</para>
/// <para>Mass fractions become mole fractions by x_i = (w_i/M_i)/Σ_j (w_j/M_j); every component
/// then needs a molar mass.</para>
/// </remarks>
public sealed class Mixture
{
    /// <summary>How far the given fractions may sum from 1 before they are refused: 1e-6, the
    /// last digit of a composition printed to six decimals.</summary>
    public const double FractionSumTolerance = 1e-6;

    /// <summary>Kay's rule, as the pseudo-critical constants' source.</summary>
    public const string KayRuleSource = "Kay's rule (mole-fraction average of the components' critical constants): Kay, Ind. Eng. Chem. 28, 1014 (1936); from memory";

    private readonly Fluid[] _components;
    private readonly double[] _moleFractions;
    private readonly GivenInteraction[] _given;

    private Mixture(Fluid[] components, double[] moleFractions, GivenInteraction[] given)
    {
        _components = components;
        _moleFractions = moleFractions;
        _given = given;
    }

    /// <summary>The components, in the order given.</summary>
    public IReadOnlyList<Fluid> Components => _components;

    /// <summary>The mole fractions, in component order, summing to 1 to rounding.</summary>
    public IReadOnlyList<double> MoleFractions => _moleFractions;

    /// <summary>The interaction parameters the user gave (each overrides the published table).</summary>
    public IReadOnlyList<GivenInteraction> GivenInteractions => _given;

    /// <summary>The number of components.</summary>
    public int Count => _components.Length;

    /// <summary>A copy of the mole fractions, for the model's amounts.</summary>
    public double[] Amounts() => [.. _moleFractions];

    /// <summary>The molar mass of the blend, Σ x_i M_i in kg/mol, or null when a component has none.</summary>
    public double? MolarMass => MolarMassOf(_moleFractions);

    /// <summary>The molar mass Σ x_i M_i in kg/mol of a phase of these components with the mole
    /// fractions <paramref name="moleFractions"/> (in component order; a liquid and a vapour in
    /// equilibrium differ from the feed and from each other), or null when a component has none.</summary>
    /// <exception cref="ArgumentException">The fractions are not one per component.</exception>
    public double? MolarMassOf(IReadOnlyList<double> moleFractions)
    {
        ArgumentNullException.ThrowIfNull(moleFractions);
        if (moleFractions.Count != _components.Length)
        {
            throw new ArgumentException($"expected {_components.Length} mole fractions, got {moleFractions.Count}", nameof(moleFractions));
        }

        double sum = 0;
        for (int i = 0; i < _components.Length; i++)
        {
            if (_components[i].MolarMass is not SourcedValue m)
            {
                return null;
            }

            sum += moleFractions[i] * m.Value;
        }

        return sum;
    }

    /// <summary>The mass fractions w_i = x_i M_i / Σ x_j M_j, or null when a component has no molar mass.</summary>
    public IReadOnlyList<double>? MassFractions
        => MolarMass is double m ? [.. _moleFractions.Select((x, i) => x * _components[i].MolarMass!.Value / m)] : null;

    /// <summary>The pseudo-critical temperature by Kay's rule, Σ x_i Tc_i in K (see <see cref="KayRuleSource"/>).
    /// It is not the mixture's critical point, only a scale for reduced conditions.</summary>
    public double PseudoCriticalTemperature => Sum(f => f.CriticalTemperature.Value);

    /// <summary>The pseudo-critical pressure by Kay's rule, Σ x_i Pc_i in Pa (see <see cref="KayRuleSource"/>).</summary>
    public double PseudoCriticalPressure => Sum(f => f.CriticalPressure.Value);

    /// <summary>The mole-fraction average of the acentric factors, Σ x_i ω_i (the same linear rule).</summary>
    public double PseudoAcentricFactor => Sum(f => f.AcentricFactor.Value);

    private double Sum(Func<Fluid, double> value)
    {
        double sum = 0;
        for (int i = 0; i < _components.Length; i++)
        {
            sum += _moleFractions[i] * value(_components[i]);
        }

        return sum;
    }

    /// <summary>The index of the component whose canonical name or a synonym is
    /// <paramref name="name"/> (compared as catalog look-up compares names), or −1.</summary>
    public int IndexOf(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        string wanted = FluidNames.Normalise(name);
        for (int i = 0; i < _components.Length; i++)
        {
            var fluid = _components[i];
            if (FluidNames.Normalise(fluid.Name) == wanted || fluid.Synonyms.Any(s => FluidNames.Normalise(s) == wanted))
            {
                return i;
            }
        }

        return -1;
    }

    /// <summary>Builds a mixture from mole fractions.</summary>
    /// <param name="components">The fluids, in order; no fluid twice (compared by canonical name).</param>
    /// <param name="moleFractions">One fraction per component: finite, not negative, summing to 1
    /// within <see cref="FractionSumTolerance"/>.</param>
    /// <param name="interactions">Interaction parameters given for some pairs, or null for none.</param>
    /// <exception cref="InvalidInputException">A check fails; the field is the component's name
    /// (or "mole fractions", "kij"), the message names it.</exception>
    public static Mixture Create(IReadOnlyList<Fluid> components, IReadOnlyList<double> moleFractions, IReadOnlyList<GivenInteraction>? interactions = null)
    {
        var fluids = CheckComponents(components, moleFractions);
        var fractions = CheckFractions(fluids, moleFractions, "mole");
        return new Mixture(fluids, fractions, CheckInteractions(fluids, interactions));
    }

    /// <summary>Builds a mixture from mass fractions (the way blends are specified), converting
    /// them with each component's molar mass.</summary>
    /// <param name="components">The fluids, in order; each needs a molar mass.</param>
    /// <param name="massFractions">One mass fraction per component, checked as
    /// <see cref="Create"/> checks mole fractions.</param>
    /// <param name="interactions">Interaction parameters given for some pairs, or null for none.</param>
    /// <exception cref="InvalidInputException">A check fails, naming the component.</exception>
    /// <exception cref="FluidDataException">A component has no molar mass (named).</exception>
    public static Mixture FromMassFractions(IReadOnlyList<Fluid> components, IReadOnlyList<double> massFractions, IReadOnlyList<GivenInteraction>? interactions = null)
    {
        var fluids = CheckComponents(components, massFractions);
        var mass = CheckFractions(fluids, massFractions, "mass");
        var mole = MoleFractionsFromMass(fluids, mass);
        return new Mixture(fluids, mole, CheckInteractions(fluids, interactions));
    }

    /// <summary>Mole fractions x_i = (w_i/M_i)/Σ_j (w_j/M_j) from mass fractions w_i (not checked
    /// here beyond being finite and not negative; <see cref="FromMassFractions"/> checks them).</summary>
    /// <exception cref="FluidDataException">A component has no molar mass (named).</exception>
    public static double[] MoleFractionsFromMass(IReadOnlyList<Fluid> components, IReadOnlyList<double> massFractions)
    {
        ArgumentNullException.ThrowIfNull(components);
        ArgumentNullException.ThrowIfNull(massFractions);
        if (components.Count != massFractions.Count)
        {
            throw new ArgumentException($"{components.Count} components but {massFractions.Count} mass fractions", nameof(massFractions));
        }

        var moles = new double[components.Count];
        double total = 0;
        for (int i = 0; i < moles.Length; i++)
        {
            moles[i] = massFractions[i] / components[i].RequireMolarMass("converting mass fractions to mole fractions");
            total += moles[i];
        }

        if (!(total > 0))
        {
            throw new InvalidInputException("mass fractions", total, "the mass fractions are all zero");
        }

        for (int i = 0; i < moles.Length; i++)
        {
            moles[i] /= total;
        }

        return moles;
    }

    /// <summary>What <see cref="IsAcceptedInteraction"/> accepts, for messages.</summary>
    public const string InteractionRange = "it must be between -1 and 1 (published values lie within about ±0.5)";

    /// <summary>Whether a k_ij is accepted: finite and strictly between −1 and 1. k_ij ≥ 1 makes
    /// a_ij = (1 − k_ij)√(a_i a_j) zero or negative (no attraction between unlike molecules);
    /// k_ij ≤ −1 at least doubles it, far outside published values (within about ±0.5).</summary>
    public static bool IsAcceptedInteraction(double value) => value > -1 && value < 1;

    /// <summary>The same mixture with <paramref name="overrides"/> added to the given interaction
    /// parameters, each replacing any given value of its pair (the command line's <c>--kij</c>
    /// over a mixture file's <c>kij</c> lines).</summary>
    /// <exception cref="InvalidInputException">An override fails the checks of <see cref="Create"/>.</exception>
    public Mixture WithInteractions(IReadOnlyList<GivenInteraction> overrides)
    {
        ArgumentNullException.ThrowIfNull(overrides);
        var checkedOverrides = CheckInteractions(_components, overrides);
        var kept = _given.Where(g => !checkedOverrides.Any(o => SamePair(o, g)));
        return new Mixture(_components, _moleFractions, [.. kept, .. checkedOverrides]);
    }

    private static bool SamePair(GivenInteraction a, GivenInteraction b)
        => (a.First == b.First && a.Second == b.Second) || (a.First == b.Second && a.Second == b.First);

    /// <summary>The interaction parameters for <paramref name="kind"/>: for each pair, the value
    /// given by the user, else the published one for that model
    /// (<see cref="PublishedInteractions"/>), else 0 with a note (<see cref="InteractionOrigin.AssumedZero"/>).</summary>
    public InteractionMatrix Interactions(CubicModelKind kind)
    {
        int n = _components.Length;
        var pairs = new BinaryInteraction[n * (n - 1) / 2];
        int k = 0;
        for (int i = 0; i < n; i++)
        {
            for (int j = i + 1; j < n; j++)
            {
                var given = _given.FirstOrDefault(g => SamePair(g, new GivenInteraction(i, j, 0, "")));
                pairs[k++] = given is not null
                    ? new BinaryInteraction(i, j, given.Value, given.Source, InteractionOrigin.Given)
                    : PublishedInteractions.TryFind(_components[i], _components[j], kind, out var row)
                        ? new BinaryInteraction(i, j, row.Value, row.Source, InteractionOrigin.Published)
                        : new BinaryInteraction(i, j, 0, $"no value given and none published in this tool's table for {kind.Title()}: k_ij = 0 assumed", InteractionOrigin.AssumedZero);
            }
        }

        return new InteractionMatrix(n, pairs);
    }

    /// <summary>The cubic mixture model of this mixture: each component's pure model built as
    /// <see cref="CubicModel.For(CubicModelKind, Fluid, AlphaForm, double)"/> builds it for a pure
    /// fluid (the same alpha choice and, per component, the volume shift <paramref name="volumeShift"/>
    /// gives), with the k_ij of <see cref="Interactions"/>.</summary>
    /// <param name="kind">The cubic model.</param>
    /// <param name="alpha">The alpha function, applied to every component.</param>
    /// <param name="volumeShift">The volume shift c (m³/mol) of each component, or null for none.</param>
    /// <exception cref="InvalidInputException">A component's model cannot be built (for example no
    /// Mathias–Copeman parameters for it), naming the fluid.</exception>
    public CubicMixtureModel CreateModel(CubicModelKind kind, AlphaForm alpha = AlphaForm.Default, Func<Fluid, double>? volumeShift = null)
    {
        var models = _components.Select(f => CubicModel.For(kind, f, alpha, volumeShift?.Invoke(f) ?? 0)).ToArray();
        return new CubicMixtureModel(models, Interactions(kind).ToArray());
    }

    private static Fluid[] CheckComponents(IReadOnlyList<Fluid> components, IReadOnlyList<double> fractions)
    {
        ArgumentNullException.ThrowIfNull(components);
        ArgumentNullException.ThrowIfNull(fractions);
        if (components.Count == 0)
        {
            throw new InvalidInputException("components", 0, "a mixture needs at least one component");
        }

        if (components.Count != fractions.Count)
        {
            throw new InvalidInputException("fractions", fractions.Count, $"{components.Count} components but {fractions.Count} fractions");
        }

        var fluids = components.ToArray();
        for (int i = 0; i < fluids.Length; i++)
        {
            ArgumentNullException.ThrowIfNull(fluids[i], nameof(components));
            for (int j = 0; j < i; j++)
            {
                if (FluidNames.Normalise(fluids[j].Name) == FluidNames.Normalise(fluids[i].Name))
                {
                    throw new InvalidInputException(fluids[i].Name, i,
                        $"component '{fluids[i].Name}' is given twice (components {j + 1} and {i + 1}); give each component once with its whole fraction");
                }
            }
        }

        return fluids;
    }

    private static double[] CheckFractions(Fluid[] fluids, IReadOnlyList<double> fractions, string basis)
    {
        double sum = 0;
        for (int i = 0; i < fluids.Length; i++)
        {
            double x = fractions[i];
            if (!double.IsFinite(x) || x < 0)
            {
                throw new InvalidInputException(fluids[i].Name, x,
                    $"the {basis} fraction of '{fluids[i].Name}' is {Show(x)}; a fraction must be a finite number, not negative");
            }

            sum += x;
        }

        // 1e-12 on top of the tolerance: the binary sum of decimal fractions is off by a few ulps
        // (0.333333 three times sums to 1 − 1.00000000003e-6), which must not decide a refusal.
        if (!(Math.Abs(sum - 1) <= FractionSumTolerance + 1e-12))
        {
            // A datasheet's percentages (23/25/52 %) sum to 100: say so rather than only refuse.
            string hint = Math.Abs(sum - 100) <= 100 * FractionSumTolerance ? "; these look like percentages: write fractions (0.23 for 23 %)" : "";
            throw new InvalidInputException($"{basis} fractions", sum,
                $"the {basis} fractions of {string.Join(", ", fluids.Select((f, i) => $"{f.Name} ({Show(fractions[i])})"))} sum to {Show(sum)}, not 1 (tolerance {Show(FractionSumTolerance)}){hint}");
        }

        return [.. fractions.Select(x => x / sum)];
    }

    private static GivenInteraction[] CheckInteractions(Fluid[] fluids, IReadOnlyList<GivenInteraction>? interactions)
    {
        if (interactions is null)
        {
            return [];
        }

        var given = interactions.ToArray();
        for (int k = 0; k < given.Length; k++)
        {
            var g = given[k] ?? throw new ArgumentNullException(nameof(interactions));
            if (g.First < 0 || g.First >= fluids.Length || g.Second < 0 || g.Second >= fluids.Length || g.First == g.Second)
            {
                throw new InvalidInputException("kij", g.Value,
                    $"interaction parameter {k + 1} is for components {g.First + 1} and {g.Second + 1}; it needs two different components of the {fluids.Length} in the mixture");
            }

            string pair = $"{fluids[Math.Min(g.First, g.Second)].Name}, {fluids[Math.Max(g.First, g.Second)].Name}";
            if (!IsAcceptedInteraction(g.Value))
            {
                throw new InvalidInputException("kij", g.Value, $"k_ij of {pair} is {Show(g.Value)}; {InteractionRange}");
            }

            if (string.IsNullOrWhiteSpace(g.Source))
            {
                throw new InvalidInputException("kij", g.Value, $"k_ij of {pair} has no source");
            }

            for (int m = 0; m < k; m++)
            {
                var h = given[m];
                if (SamePair(h, g))
                {
                    throw new InvalidInputException("kij", g.Value, $"k_ij of {pair} is given twice; give each pair once");
                }
            }
        }

        return given;
    }

    private static string Show(double value) => value.ToString("G10", CultureInfo.InvariantCulture);
}
