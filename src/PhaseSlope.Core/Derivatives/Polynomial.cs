using System.Numerics;

namespace PhaseSlope.Core.Derivatives;

/// <summary>A sparse polynomial (Laurent while being built) in the measurable quantities with
/// integer coefficients: the Jacobian entries all have coefficients ±1, so their products and
/// differences stay integral and the algebra is exact.</summary>
internal sealed class Polynomial
{
    private readonly Dictionary<Monomial, BigInteger> _terms;

    private Polynomial(Dictionary<Monomial, BigInteger> terms) => _terms = terms;

    /// <summary>The zero polynomial.</summary>
    public static Polynomial Zero => new([]);

    /// <summary>A single term.</summary>
    public static Polynomial Term(BigInteger coefficient, Monomial monomial)
        => coefficient.IsZero ? Zero : new(new() { [monomial] = coefficient });

    /// <summary>A quantity to the first power.</summary>
    public static Polynomial Of(MeasurableQuantity quantity) => Term(1, Monomial.Of(quantity));

    /// <summary>A constant.</summary>
    public static Polynomial Constant(BigInteger value) => Term(value, Monomial.One);

    /// <summary>The terms in writing order (<see cref="Monomial.CompareTo"/>).</summary>
    public IReadOnlyList<(Monomial Monomial, BigInteger Coefficient)> Terms
        => [.. _terms.OrderBy(t => t.Key).Select(t => (t.Key, t.Value))];

    /// <summary>Whether the polynomial is zero.</summary>
    public bool IsZero => _terms.Count == 0;

    /// <summary>Whether it has exactly one term.</summary>
    public bool IsMonomial => _terms.Count == 1;

    /// <summary>The sum.</summary>
    public static Polynomial operator +(Polynomial a, Polynomial b)
    {
        var terms = new Dictionary<Monomial, BigInteger>(a._terms);
        foreach (var (m, c) in b._terms)
        {
            Add(terms, m, c);
        }

        return new(terms);
    }

    /// <summary>The negation.</summary>
    public static Polynomial operator -(Polynomial a) => new(a._terms.ToDictionary(t => t.Key, t => -t.Value));

    /// <summary>The difference.</summary>
    public static Polynomial operator -(Polynomial a, Polynomial b) => a + -b;

    /// <summary>The product.</summary>
    public static Polynomial operator *(Polynomial a, Polynomial b)
    {
        var terms = new Dictionary<Monomial, BigInteger>();
        foreach (var (ma, ca) in a._terms)
        {
            foreach (var (mb, cb) in b._terms)
            {
                Add(terms, ma * mb, ca * cb);
            }
        }

        return new(terms);
    }

    /// <summary>Every term multiplied by a monomial.</summary>
    public Polynomial Times(Monomial monomial) => new(_terms.ToDictionary(t => t.Key * monomial, t => t.Value));

    /// <summary>Every term divided by a monomial (exponents subtracted).</summary>
    public Polynomial Over(Monomial monomial) => new(_terms.ToDictionary(t => t.Key / monomial, t => t.Value));

    /// <summary>Every coefficient divided by an integer that divides them all.</summary>
    public Polynomial Over(BigInteger divisor) => new(_terms.ToDictionary(t => t.Key, t => t.Value / divisor));

    /// <summary>The exponent-wise minimum over the terms (the monomial content; for a Laurent
    /// polynomial it may have negative exponents).</summary>
    public Monomial MonomialContent() => _terms.Keys.Aggregate(Monomial.Min);

    /// <summary>The greatest common divisor of the coefficients (positive).</summary>
    public BigInteger IntegerContent() => _terms.Values.Aggregate(BigInteger.Zero, BigInteger.GreatestCommonDivisor);

    /// <summary>The coefficient of the first term in writing order.</summary>
    public BigInteger LeadingCoefficient => Terms[0].Coefficient;

    /// <summary>The value at the given quantities.</summary>
    public double Evaluate(ReadOnlySpan<double> values)
    {
        double sum = 0;
        foreach (var (m, c) in _terms)
        {
            sum += (double)c * m.Evaluate(values);
        }

        return sum;
    }

    /// <summary>The sum of the absolute values of the terms at the given quantities (the size of
    /// the numbers a value is formed from, for rounding estimates).</summary>
    public double Magnitude(ReadOnlySpan<double> values)
    {
        double sum = 0;
        foreach (var (m, c) in _terms)
        {
            sum += Math.Abs((double)c * m.Evaluate(values));
        }

        return sum;
    }

    /// <summary>The partial derivative with respect to a quantity.</summary>
    public Polynomial Derivative(MeasurableQuantity quantity)
    {
        var terms = new Dictionary<Monomial, BigInteger>();
        var unit = Monomial.Of(quantity);
        foreach (var (m, c) in _terms)
        {
            int e = m[quantity];
            if (e != 0)
            {
                Add(terms, m / unit, c * e);
            }
        }

        return new(terms);
    }

    /// <summary>Whether the quantity occurs in any term.</summary>
    public bool Contains(MeasurableQuantity quantity) => _terms.Keys.Any(m => m[quantity] != 0);

    /// <summary>The exact quotient a/b when b divides a (multivariate division with zero
    /// remainder, leading terms in writing order), else null.</summary>
    public static Polynomial? TryDivide(Polynomial a, Polynomial b)
    {
        if (b.IsZero)
        {
            return null;
        }

        var remainder = a;
        var quotient = Zero;
        var (lead, leadCoefficient) = b.Terms[0];
        for (int guard = 0; !remainder.IsZero && guard < 1000; guard++)
        {
            var (m, c) = remainder.Terms[0];
            var q = m / lead;
            if (!q.IsPolynomial || !BigInteger.Remainder(c, leadCoefficient).IsZero)
            {
                return null;
            }

            var step = Term(c / leadCoefficient, q);
            quotient += step;
            remainder -= step * b;
        }

        return remainder.IsZero ? quotient : null;
    }

    private static void Add(Dictionary<Monomial, BigInteger> terms, Monomial m, BigInteger c)
    {
        var sum = terms.GetValueOrDefault(m) + c;
        if (sum.IsZero)
        {
            terms.Remove(m);
        }
        else
        {
            terms[m] = sum;
        }
    }
}
