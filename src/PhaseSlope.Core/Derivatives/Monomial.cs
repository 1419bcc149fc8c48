using System.Text;

namespace PhaseSlope.Core.Derivatives;

/// <summary>A product of powers of the measurable quantities, T^a·P^b·v^c·s^d·α^e·κ_T^f·c_p^g; the
/// exponents may be negative while an expression is being built (a Laurent monomial).</summary>
internal readonly struct Monomial : IEquatable<Monomial>, IComparable<Monomial>
{
    private static readonly int Count = MeasurableQuantities.All.Count;
    private readonly int[]? _exponents;

    private Monomial(int[] exponents) => _exponents = exponents;

    /// <summary>The monomial 1.</summary>
    public static Monomial One => new(new int[Count]);

    /// <summary>The quantity itself, to the first power.</summary>
    public static Monomial Of(MeasurableQuantity quantity)
    {
        var e = new int[Count];
        e[(int)quantity] = 1;
        return new(e);
    }

    /// <summary>The exponent of a quantity.</summary>
    public int this[MeasurableQuantity quantity] => Exponents[(int)quantity];

    private int[] Exponents => _exponents ?? new int[Count];

    /// <summary>The sum of the exponents.</summary>
    public int Degree => Exponents.Sum();

    /// <summary>Whether every exponent is zero.</summary>
    public bool IsOne => Exponents.All(e => e == 0);

    /// <summary>Whether no exponent is negative.</summary>
    public bool IsPolynomial => Exponents.All(e => e >= 0);

    /// <summary>The product.</summary>
    public static Monomial operator *(Monomial a, Monomial b) => Combine(a, b, (x, y) => x + y);

    /// <summary>The quotient (exponents subtracted).</summary>
    public static Monomial operator /(Monomial a, Monomial b) => Combine(a, b, (x, y) => x - y);

    /// <summary>The exponent-wise minimum (the greatest common divisor of two monomials).</summary>
    public static Monomial Min(Monomial a, Monomial b) => Combine(a, b, Math.Min);

    /// <summary>The exponent-wise maximum.</summary>
    public static Monomial Max(Monomial a, Monomial b) => Combine(a, b, Math.Max);

    /// <summary>The monomial's value at the given quantities (indexed by <see cref="MeasurableQuantity"/>).</summary>
    public double Evaluate(ReadOnlySpan<double> values)
    {
        double product = 1;
        var e = Exponents;
        for (int i = 0; i < e.Length; i++)
        {
            if (e[i] != 0)
            {
                product *= Math.Pow(values[i], e[i]);
            }
        }

        return product;
    }

    /// <summary>The monomial in the plain-text notation (T*v*alpha^2), "1" for the unit monomial;
    /// negative exponents are not written here (the expression moves them to a denominator).</summary>
    public string Text()
    {
        var text = new StringBuilder();
        var e = Exponents;
        for (int i = 0; i < e.Length; i++)
        {
            if (e[i] == 0)
            {
                continue;
            }

            if (text.Length > 0)
            {
                text.Append('*');
            }

            text.Append(MeasurableQuantities.Symbol((MeasurableQuantity)i));
            if (e[i] != 1)
            {
                text.Append('^').Append(e[i]);
            }
        }

        return text.Length == 0 ? "1" : text.ToString();
    }

    /// <inheritdoc />
    public bool Equals(Monomial other) => Exponents.AsSpan().SequenceEqual(other.Exponents);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Monomial other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (int e in Exponents)
        {
            hash.Add(e);
        }

        return hash.ToHashCode();
    }

    /// <summary>The order terms are written in: higher degree first, then by the exponents of T, P,
    /// v, s, α, κ_T, c_p in turn (larger first).</summary>
    public int CompareTo(Monomial other)
    {
        int byDegree = other.Degree.CompareTo(Degree);
        if (byDegree != 0)
        {
            return byDegree;
        }

        var a = Exponents;
        var b = other.Exponents;
        for (int i = 0; i < a.Length; i++)
        {
            if (a[i] != b[i])
            {
                return b[i].CompareTo(a[i]);
            }
        }

        return 0;
    }

    private static Monomial Combine(Monomial a, Monomial b, Func<int, int, int> op)
    {
        var x = a.Exponents;
        var y = b.Exponents;
        var e = new int[Count];
        for (int i = 0; i < Count; i++)
        {
            e[i] = op(x[i], y[i]);
        }

        return new(e);
    }
}
