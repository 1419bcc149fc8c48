namespace PhaseSlope.Plots;

/// <summary>Round values for the lines of a chart (isotherms, isobars, isentropes, isochores),
/// chosen in the display unit so that the labels read 0, 20, 40 °C or 1, 2, 5, 10 bar.</summary>
/// <remarks>The nice-number rule: the step is 1, 2 or 5 times a power of ten, the smallest such
/// step that gives no more than the wanted number of lines over the range; the values are its
/// multiples inside the range. On a logarithmic quantity the values are 1, 2 and 5 times the
/// powers of ten inside the range (thinned to 1 and 3, then to 1 per decade, when there would be too
/// many).</remarks>
public static class RoundValues
{
    private static readonly double[] Mantissas = [1, 2, 5];

    /// <summary>Multiples of a 1-2-5 step inside [<paramref name="low"/>, <paramref name="high"/>],
    /// at most <paramref name="most"/> of them.</summary>
    public static IReadOnlyList<double> Linear(double low, double high, int most)
    {
        if (!(high > low) || most < 1)
        {
            return [];
        }

        double step = Step((high - low) / most);
        var values = new List<double>();
        for (double k = Math.Ceiling(low / step - 1e-9); k * step <= high * (1 + 1e-12) + 1e-12 * step; k++)
        {
            // k·step, rounded to the step's own decimals so that 0.1·3 prints as 0.3.
            values.Add(Math.Round(k * step, Math.Max(0, Math.Min(15, -(int)Math.Floor(Math.Log10(step)) + 1))));
        }

        return values;
    }

    /// <summary>Values 1, 2, 5 × 10^k inside [<paramref name="low"/>, <paramref name="high"/>]
    /// (both positive), thinned to 1 and 3 (then 1) × 10^k if more than <paramref name="most"/> (one per
    /// decade is kept even if that is still more).</summary>
    public static IReadOnlyList<double> Logarithmic(double low, double high, int most)
    {
        if (!(low > 0) || !(high > low) || most < 1)
        {
            return [];
        }

        var values = new List<double>();
        foreach (double[] mantissas in new[] { Mantissas, [1.0, 3.0], [1.0] })
        {
            values = [];
            for (int e = (int)Math.Floor(Math.Log10(low)); e <= (int)Math.Ceiling(Math.Log10(high)); e++)
            {
                foreach (double m in mantissas)
                {
                    double v = double.Parse($"{m}e{e}", System.Globalization.CultureInfo.InvariantCulture);
                    if (v >= low * (1 - 1e-12) && v <= high * (1 + 1e-12))
                    {
                        values.Add(v);
                    }
                }
            }

            if (values.Count <= most)
            {
                break;
            }
        }

        return values;
    }

    /// <summary>The smallest 1-2-5 step at least <paramref name="raw"/>.</summary>
    public static double Step(double raw)
    {
        double decade = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        foreach (double m in new[] { 1.0, 2, 5, 10 })
        {
            if (m * decade >= raw * (1 - 1e-12))
            {
                return m * decade;
            }
        }

        return 10 * decade;
    }
}
