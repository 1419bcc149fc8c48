using System.Globalization;
using System.Numerics;
using System.Text;

namespace PhaseSlope.Core.Derivatives;

/// <summary>A ratio of polynomials in the measurable quantities (T, P, v, s, α, κ_T, c_p) in a
/// canonical form: no negative exponents, no common monomial or integer factor, no common
/// polynomial factor that exact division finds (the whole of either side, or any Jacobian of two
/// state variables), and a positive leading coefficient in the
/// denominator. Two expressions are algebraically equal when their canonical texts are.</summary>
/// <remarks>The text (<see cref="Text"/>) is the notation of docs/derivatives.md: symbols T, P, v,
/// s, alpha, kappa_T, cp; * for products, ^ for integer powers, / and parentheses. With a monomial
/// denominator the terms are grouped by what remains of the denominator after each term is
/// reduced, each group's numerator factored by its monomial content: (T·α − P·κ_T)/κ_T is written
/// T*alpha/kappa_T - P and (T·v·α − v)/c_p is written v*(T*alpha - 1)/cp.</remarks>
public sealed class MeasurableExpression
{
    private MeasurableExpression(Polynomial numerator, Polynomial denominator)
    {
        Numerator = numerator;
        Denominator = denominator;
        Text = Render();
    }

    /// <summary>The canonical plain-text form.</summary>
    public string Text { get; }

    internal Polynomial Numerator { get; }

    internal Polynomial Denominator { get; }

    /// <summary>The quantities the expression uses, in notation order.</summary>
    public IReadOnlyList<MeasurableQuantity> Quantities
        => [.. MeasurableQuantities.All.Where(q => Numerator.Contains(q) || Denominator.Contains(q))];

    /// <summary>Whether the expression is the constant 0.</summary>
    public bool IsZero => Numerator.IsZero;

    /// <summary>The canonical form of N/D.</summary>
    /// <exception cref="DivideByZeroException">D is the zero polynomial.</exception>
    internal static MeasurableExpression Of(Polynomial numerator, Polynomial denominator)
    {
        if (denominator.IsZero)
        {
            throw new DivideByZeroException("the denominator of the expression is identically zero");
        }

        if (numerator.IsZero)
        {
            return new(Polynomial.Zero, Polynomial.Constant(1));
        }

        // Clear negative exponents and common monomials: divide both by the exponent-wise minimum
        // over all terms of both.
        var common = Monomial.Min(numerator.MonomialContent(), denominator.MonomialContent());
        numerator = numerator.Over(common);
        denominator = denominator.Over(common);

        // Common polynomial factors: any Jacobian of two state variables that divides both sides
        // (see JacobianReduction.CandidateFactors), removed until none does.
        for (bool found = true; found;)
        {
            found = false;
            foreach (var factor in JacobianReduction.CandidateFactors)
            {
                if (Polynomial.TryDivide(numerator, factor) is { } n && Polynomial.TryDivide(denominator, factor) is { } d)
                {
                    numerator = n;
                    denominator = d;
                    found = true;
                    break;
                }
            }
        }

        // A common polynomial factor that one side divides exactly.
        if (Polynomial.TryDivide(numerator, denominator) is { } quotient)
        {
            numerator = quotient;
            denominator = Polynomial.Constant(1);
        }
        else if (!denominator.IsMonomial && Polynomial.TryDivide(denominator, numerator) is { } inverse)
        {
            denominator = inverse;
            numerator = Polynomial.Constant(1);
        }

        // Integer content and sign: the denominator's leading coefficient positive.
        var gcd = BigInteger.GreatestCommonDivisor(numerator.IntegerContent(), denominator.IntegerContent());
        if (denominator.LeadingCoefficient.Sign < 0)
        {
            gcd = -gcd;
        }

        return new(numerator.Over(gcd), denominator.Over(gcd));
    }

    /// <summary>The value at the given quantities (indexed by <see cref="MeasurableQuantity"/>).</summary>
    public double Evaluate(ReadOnlySpan<double> values) => Numerator.Evaluate(values) / Denominator.Evaluate(values);

    /// <summary>The partial derivative of the value with respect to one quantity, at the given values
    /// (for the propagation of measurement uncertainties): (N'·D − N·D')/D².</summary>
    public double Sensitivity(MeasurableQuantity quantity, ReadOnlySpan<double> values)
    {
        double n = Numerator.Evaluate(values);
        double d = Denominator.Evaluate(values);
        double dn = Numerator.Derivative(quantity).Evaluate(values);
        double dd = Denominator.Derivative(quantity).Evaluate(values);
        return (dn * d - n * dd) / (d * d);
    }

    /// <summary>The size of the terms the value is formed from, relative to the value's own size:
    /// Σ|terms of N|/|N| + Σ|terms of D|/|D| (1 each where nothing cancels). Rounding makes the
    /// value uncertain by about this times the machine epsilon.</summary>
    public double CancellationFactor(ReadOnlySpan<double> values)
        => Numerator.Magnitude(values) / Math.Abs(Numerator.Evaluate(values)) + Denominator.Magnitude(values) / Math.Abs(Denominator.Evaluate(values));

    /// <inheritdoc />
    public override string ToString() => Text;

    private string Render()
    {
        if (Numerator.IsZero)
        {
            return "0";
        }

        if (!Denominator.IsMonomial)
        {
            return $"{Factored(Numerator, parenthesise: true)}/{Enclosed(Factored(Denominator, parenthesise: true))}";
        }

        // A monomial denominator: group the terms by the denominator each leaves once reduced.
        var (denominator, coefficient) = Denominator.Terms[0];
        var groups = new Dictionary<Monomial, Polynomial>();
        foreach (var (m, c) in Numerator.Terms)
        {
            var reduced = m / denominator;
            var below = Monomial.Max(Monomial.One, Monomial.One / reduced); // the negative exponents
            var above = reduced * below;
            groups[below] = groups.GetValueOrDefault(below, Polynomial.Zero) + Polynomial.Term(c, above);
        }

        var parts = new List<(bool Negative, string Term)>();
        foreach (var (below, group) in groups.OrderBy(g => g.Key.IsOne ? 1 : 0).ThenBy(g => g.Value.Terms[0].Monomial))
        {
            var part = group;
            var scale = coefficient;
            // The group's own integer factor against the denominator's coefficient.
            var g = BigInteger.GreatestCommonDivisor(part.IntegerContent(), scale);
            part = part.Over(g);
            scale /= g;
            bool negative = part.IsMonomial && part.LeadingCoefficient.Sign < 0
                || !part.IsMonomial && part.Terms.All(t => t.Coefficient.Sign < 0);
            if (negative)
            {
                part = -part;
            }

            string body = Factored(part, parenthesise: !below.IsOne || !scale.IsOne);
            string under = below.IsOne
                ? (scale.IsOne ? "" : "/" + scale.ToString(CultureInfo.InvariantCulture))
                : "/" + (scale.IsOne ? Power(below) : $"({scale.ToString(CultureInfo.InvariantCulture)}*{below.Text()})");
            parts.Add((negative, body + under));
        }

        // Positive groups first (cp - T*v*alpha^2/kappa_T, not -T*v*alpha^2/kappa_T + cp).
        var text = new StringBuilder();
        foreach (var (negative, term) in parts.Where(p => !p.Negative).Concat(parts.Where(p => p.Negative)))
        {
            text.Append(text.Length == 0 ? (negative ? "-" : "") : (negative ? " - " : " + ")).Append(term);
        }

        return text.ToString();
    }

    /// <summary>A denominator monomial: bare when a single symbol to the first power, else in parentheses.</summary>
    private static string Power(Monomial m)
    {
        string text = m.Text();
        return text.Contains('*', StringComparison.Ordinal) ? $"({text})" : text;
    }

    /// <summary>A product in a denominator, in parentheses: /(T*(v + s)), never /T*(v + s).</summary>
    private static string Enclosed(string factor)
        => factor.StartsWith('(') && factor.EndsWith(')') && factor.IndexOf(')', StringComparison.Ordinal) == factor.Length - 1 ? factor : $"({factor})";

    /// <summary>A polynomial with its monomial content factored out and a leading minus sign taken
    /// outside: -T*(v - s) rather than T*(-v + s).</summary>
    private static string Factored(Polynomial p, bool parenthesise)
    {
        if (p.IsMonomial)
        {
            var (m, c) = p.Terms[0];
            return Term(c, m, first: true);
        }

        string sign = "";
        if (p.LeadingCoefficient.Sign < 0)
        {
            sign = "-";
            p = -p;
        }

        var content = p.MonomialContent();
        var inner = p.Over(content);
        string sum = Sum(inner);
        if (content.IsOne)
        {
            return sign + (parenthesise || sign.Length > 0 ? $"({sum})" : sum);
        }

        return $"{sign}{content.Text()}*({sum})";
    }

    private static string Sum(Polynomial p)
    {
        var text = new StringBuilder();
        foreach (var (m, c) in p.Terms)
        {
            if (text.Length == 0)
            {
                text.Append(Term(c, m, first: true));
            }
            else
            {
                text.Append(c.Sign < 0 ? " - " : " + ").Append(Term(BigInteger.Abs(c), m, first: false));
            }
        }

        return text.ToString();
    }

    private static string Term(BigInteger c, Monomial m, bool first)
    {
        string sign = first && c.Sign < 0 ? "-" : "";
        var magnitude = BigInteger.Abs(c);
        if (m.IsOne)
        {
            return sign + magnitude.ToString(CultureInfo.InvariantCulture);
        }

        return sign + (magnitude.IsOne ? "" : magnitude.ToString(CultureInfo.InvariantCulture) + "*") + m.Text();
    }
}
