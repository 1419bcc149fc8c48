using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Derivatives;

/// <summary>The symbolic reduction of first derivatives to T, P, v, s, α, κ_T and c_p.</summary>
public sealed class JacobianReductionTests
{
    private static readonly StateVariable[] Variables = Enum.GetValues<StateVariable>();

    public static TheoryData<string, double, double> States => new()
    {
        { "propane", 300, 1e5 },     // gas
        { "propane", 250, 2e6 },     // compressed liquid
        { "water", 400, 1e6 },       // liquid
        { "carbon-dioxide", 320, 9e6 }, // supercritical, near the critical region
    };

    [Theory]
    [MemberData(nameof(States))]
    public void Every336Derivative_ThroughItsExpression_EqualsTheJacobianValue(string fluid, double t, double p)
    {
        // The expression evaluated with the model's own α, κ_T, c_p (and s) must equal the value the
        // Jacobian in (T, V) gives (PartialDerivatives, other formulas). Both are exact; they differ
        // by rounding, which grows with the cancellation inside the expression: allowed
        // 1e-13 × (the expression's cancellation factor + the Jacobian's few roundings, 20), so
        // about 2e-12 wherever nothing cancels, larger only where a difference of large terms makes
        // the value itself uncertain to that many ulps. The worst over all 336 must also stay below
        // 1e-12 relative (the bound; it does at these four states).
        var comparisons = Compare(fluid, t, p);
        foreach (var c in comparisons)
        {
            Assert.True(c.Deviation <= c.Allowed, $"(d{c.Of}/d{c.By})_{c.Hold} = {c.Expression.Text}: {c.Reduced} vs {c.Jacobian} ({c.Deviation:G3} > {c.Allowed:G3})");
        }

        int count = comparisons.Count;
        double worst = comparisons.Max(c => c.Deviation);
        Assert.Equal(336, count);
        Assert.True(worst < 1e-12, $"worst {worst:G3}");
    }

    /// <summary>One first derivative through its reduced expression against the Jacobian value,
    /// with the rounding it is allowed (1e-13 × (the expression's cancellation factor + 20)).</summary>
    public sealed record Comparison(StateVariable Of, StateVariable By, StateVariable Hold, MeasurableExpression Expression,
        double Reduced, double Jacobian, double Deviation, double Allowed);

    /// <summary>All 336 first derivatives (X, Y, Z distinct) at a Peng–Robinson state (T, P) of the
    /// fluid, each through its expression with the model's own α, κ_T, c_p, s and through the
    /// Jacobian in (T, V); also printed on docs/validation.md by the generator.</summary>
    public static IReadOnlyList<Comparison> Compare(string fluid, double t, double p)
    {
        var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
        var state = engine.AtPressure(t, p);
        var measured = MeasuredValues.FromState(state);
        var values = new double[MeasurableQuantities.All.Count];
        foreach (var q in MeasurableQuantities.All)
        {
            values[(int)q] = measured.Value(q)!.Value;
        }

        var comparisons = new List<Comparison>();
        foreach (var x in Variables)
        {
            foreach (var y in Variables.Where(v => v != x))
            {
                foreach (var z in Variables.Where(v => v != x && v != y))
                {
                    var expression = JacobianReduction.Reduce(x, y, z);
                    double reduced = measured.Evaluate(expression).Value;
                    double jacobian = PartialDerivatives.Of(state, x, y, z);
                    double allowed = 1e-13 * (expression.CancellationFactor(values) + 20);
                    comparisons.Add(new Comparison(x, y, z, expression, reduced, jacobian, Math.Abs(reduced - jacobian) / Math.Abs(jacobian), allowed));
                }
            }
        }

        return comparisons;
    }

    [Theory]
    // Maxwell relations (from dU = T dS − P dV and its Legendre transforms).
    [InlineData(S, V, T, "alpha/kappa_T")]           // (∂S/∂V)_T = (∂P/∂T)_V = α/κ_T
    [InlineData(S, P, T, "-v*alpha")]                // (∂S/∂P)_T = −(∂V/∂T)_P
    [InlineData(T, V, S, "-(T*alpha)/(kappa_T*cp - T*v*alpha^2)")] // (∂T/∂V)_S = −(∂P/∂S)_V = −Tα/(κ_T c_v·...)
    [InlineData(T, P, S, "T*v*alpha/cp")]            // (∂T/∂P)_S = (∂V/∂S)_P
    // The thermodynamic equation of state.
    [InlineData(U, V, T, "T*alpha/kappa_T - P")]
    [InlineData(H, P, T, "v*(1 - T*alpha)")]
    // Natural-variable derivatives.
    [InlineData(H, S, P, "T")]
    [InlineData(H, P, S, "v")]
    [InlineData(G, T, P, "-s")]
    [InlineData(A, V, T, "-P")]
    // Heat capacities and the Joule–Thomson coefficient.
    [InlineData(H, T, P, "cp")]
    [InlineData(U, T, V, "cp - T*v*alpha^2/kappa_T")] // c_v = c_p − T v α²/κ_T
    [InlineData(T, P, H, "v*(T*alpha - 1)/cp")]
    public void ClassicIdentities_MatchTheirTextbookForms(StateVariable x, StateVariable y, StateVariable z, string textbook)
    {
        // Textbook forms (Callen, Thermodynamics and an Introduction to Thermostatistics, 2nd ed.
        // (1985), ch. 7, the reduction of derivatives; from memory), written in this tool's notation
        // and brought to the canonical form by the parser: equal canonical texts are equal
        // rational functions.
        var derived = JacobianReduction.Reduce(x, y, z);
        var expected = ExpressionParser.Parse(textbook);
        Assert.Equal(expected.Text, derived.Text);
    }

    [Fact]
    public void HeatCapacityDifference_IsTvAlphaSquaredOverKappa()
    {
        // c_p − c_v = T v α²/κ_T (Callen 1985, eq. 7.48; from memory), from two reduced expressions.
        var cp = JacobianReduction.Reduce(H, T, P);
        var cv = JacobianReduction.Reduce(U, T, V);
        var difference = ExpressionParser.Parse($"({cp.Text}) - ({cv.Text})");
        Assert.Equal(ExpressionParser.Parse("T*v*alpha^2/kappa_T").Text, difference.Text);
    }

    [Fact]
    public void CanonicalText_IsTheDocumentedForm()
    {
        Assert.Equal("T*alpha/kappa_T - P", JacobianReduction.Reduce(U, V, T).Text);
        Assert.Equal("v*(T*alpha - 1)/cp", JacobianReduction.Reduce(T, P, H).Text);
        Assert.Equal("cp - T*v*alpha^2/kappa_T", JacobianReduction.Reduce(U, T, V).Text);
        Assert.Equal("cp/T - v*alpha^2/kappa_T", JacobianReduction.Reduce(S, T, V).Text);
    }

    [Fact]
    public void OnlyFreeEnergyDerivatives_NeedTheAbsoluteEntropy()
    {
        // s enters only through (∂G/∂T)_P = −s and (∂A/∂T)_V = −s: a derivative uses it exactly
        // when it involves A or G and their temperature dependence survives the reduction.
        foreach (var x in Variables)
        {
            foreach (var y in Variables.Where(v => v != x))
            {
                foreach (var z in Variables.Where(v => v != x && v != y))
                {
                    var e = JacobianReduction.Reduce(x, y, z);
                    if (e.Quantities.Contains(MeasurableQuantity.Entropy))
                    {
                        Assert.True(x is A or G || y is A or G || z is A or G, $"(d{x}/d{y})_{z} = {e.Text}");
                    }
                }
            }
        }

        Assert.Contains(MeasurableQuantity.Entropy, JacobianReduction.Reduce(G, T, P).Quantities);
        Assert.DoesNotContain(MeasurableQuantity.Entropy, JacobianReduction.Reduce(G, P, T).Quantities); // = v
    }

    [Fact]
    public void MissingQuantity_IsNamed()
    {
        var values = new MeasuredValues()
            .Set(MeasurableQuantity.Temperature, 300).Set(MeasurableQuantity.Pressure, 1e5).Set(MeasurableQuantity.Volume, 1e-4)
            .Set(MeasurableQuantity.Expansivity, 1e-3).Set(MeasurableQuantity.Compressibility, 1e-9).Set(MeasurableQuantity.HeatCapacity, 100);
        var ex = Assert.Throws<InvalidInputException>(() => values.Evaluate(JacobianReduction.Reduce(G, T, P)));
        Assert.Contains("absolute molar entropy", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Uncertainty_IsPropagatedToFirstOrder()
    {
        // (∂U/∂V)_T = Tα/κ_T − P: ∂/∂α = T/κ_T, ∂/∂κ_T = −Tα/κ_T²; with uncorrelated u(α), u(κ_T)
        // u² = (T u_α/κ_T)² + (Tα u_κ/κ_T²)² (the GUM's law of propagation; exact here to rounding).
        double t = 298.15, p = 1e5, alpha = 1.07e-3, kappa = 9.2e-10, ua = 0.02e-3, uk = 0.1e-10;
        var values = new MeasuredValues()
            .Set(MeasurableQuantity.Temperature, t).Set(MeasurableQuantity.Pressure, p).Set(MeasurableQuantity.Volume, 1.07e-4)
            .Set(MeasurableQuantity.Expansivity, alpha, ua).Set(MeasurableQuantity.Compressibility, kappa, uk);
        var (value, u) = values.Evaluate(JacobianReduction.Reduce(U, V, T));
        AssertClose.Relative(t * alpha / kappa - p, value, 1e-15, "value");
        double expected = Math.Sqrt(Math.Pow(t * ua / kappa, 2) + Math.Pow(t * alpha * uk / (kappa * kappa), 2));
        AssertClose.Relative(expected, u!.Value, 1e-14, "propagated uncertainty");
    }

    [Fact]
    public void Parser_RefusesWhatIsNotTheNotation()
    {
        Assert.Throws<InvalidInputException>(() => ExpressionParser.Parse("T*beta"));
        Assert.Throws<InvalidInputException>(() => ExpressionParser.Parse("(T + P"));
        Assert.Throws<InvalidInputException>(() => ExpressionParser.Parse("T^x"));
    }
}
