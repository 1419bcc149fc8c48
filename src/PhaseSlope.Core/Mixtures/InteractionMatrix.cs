namespace PhaseSlope.Core.Mixtures;

/// <summary>The binary interaction parameters of a mixture for one cubic model: a value and a
/// source for every pair of components (symmetric, zero diagonal).</summary>
public sealed class InteractionMatrix
{
    private readonly BinaryInteraction[] _pairs;
    private readonly double[] _values;

    /// <summary>Builds the matrix from one entry per pair i &lt; j, in the order (0,1), (0,2), …,
    /// (1,2), … (as <see cref="Pairs"/> lists them).</summary>
    internal InteractionMatrix(int count, BinaryInteraction[] pairs)
    {
        Count = count;
        _pairs = pairs;
        _values = new double[count * count];
        foreach (var pair in pairs)
        {
            _values[pair.First * count + pair.Second] = pair.Value;
            _values[pair.Second * count + pair.First] = pair.Value;
        }
    }

    /// <summary>The number of components.</summary>
    public int Count { get; }

    /// <summary>Every pair i &lt; j with its value and source, in the order (0,1), (0,2), …, (1,2), ….</summary>
    public IReadOnlyList<BinaryInteraction> Pairs => _pairs;

    /// <summary>k_ij of components <paramref name="i"/> and <paramref name="j"/> (0 on the diagonal).</summary>
    public double this[int i, int j] => _values[Index(i, j)];

    /// <summary>The pair of components <paramref name="i"/> ≠ <paramref name="j"/>, in either order.</summary>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range, or i = j.</exception>
    public BinaryInteraction Pair(int i, int j)
    {
        _ = Index(i, j);
        if (i == j)
        {
            throw new ArgumentOutOfRangeException(nameof(j), j, "a component has no interaction parameter with itself");
        }

        int lo = Math.Min(i, j), hi = Math.Max(i, j);
        // Pairs are stored row by row: row lo starts after lo·(2n − lo − 1)/2 entries.
        return _pairs[lo * (2 * Count - lo - 1) / 2 + (hi - lo - 1)];
    }

    /// <summary>Whether any pair has no given or published value (k_ij = 0 assumed).</summary>
    public bool AnyAssumedZero => _pairs.Any(p => p.Origin == InteractionOrigin.AssumedZero);

    /// <summary>A copy of the values as the row-major n×n array <see cref="Models.CubicMixtureModel"/> takes.</summary>
    public double[] ToArray() => [.. _values];

    private int Index(int i, int j)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(i);
        ArgumentOutOfRangeException.ThrowIfNegative(j);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(i, Count);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(j, Count);
        return i * Count + j;
    }
}
