using System.Text;

namespace PhaseSlope.Core.Fluids;

/// <summary>Name normalisation and edit distance used for fluid look-up and for suggestions.</summary>
public static class FluidNames
{
    /// <summary>Reduces a fluid name to the form used for comparison: lower case (invariant),
    /// with white space, hyphens, underscores and commas removed, so that "R-134a", "R134a" and
    /// "r134a" all become "r134a".</summary>
    /// <param name="name">The name as typed or as written in a fluid file.</param>
    /// <returns>The normalised name; empty when nothing but ignored characters was given.</returns>
    public static string Normalise(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var builder = new StringBuilder(name.Length);
        foreach (char c in name)
        {
            if (char.IsWhiteSpace(c) || c is '-' or '_' or ',')
            {
                continue;
            }

            builder.Append(char.ToLowerInvariant(c));
        }

        return builder.ToString();
    }

    /// <summary>Levenshtein distance: the least number of single-character insertions,
    /// deletions and substitutions that turn <paramref name="a"/> into <paramref name="b"/>.</summary>
    /// <param name="a">First string.</param>
    /// <param name="b">Second string.</param>
    /// <returns>The distance, 0 when the strings are equal.</returns>
    public static int EditDistance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (a.Length == 0)
        {
            return b.Length;
        }

        if (b.Length == 0)
        {
            return a.Length;
        }

        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitution = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                int deletion = previous[j] + 1;
                int insertion = current[j - 1] + 1;
                current[j] = Math.Min(substitution, Math.Min(deletion, insertion));
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
