using PhaseSlope.Core.Correlations;
using System.Globalization;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Fluids;

/// <summary>The correlation entries of a fluid file: the ideal-gas heat capacity
/// (<c>ideal_gas_cp</c>) and the published alpha-function parameters (<c>alpha_…</c>).</summary>
internal sealed partial class FluidFileParser
{
    private const string SectionReduce = "reduce";
    private const string SectionPower = "power";
    private const string SectionEinstein = "einstein";
    private const string SectionRange = "range";

    private static readonly string[] Sections = [SectionReduce, SectionPower, SectionEinstein, SectionRange];

    /// <summary>cp°/R of a monatomic ideal gas (translation only): no real gas has less.</summary>
    internal const double LowestReducedHeatCapacity = 2.5;

    /// <summary>Number of evenly spaced temperatures, both ends included, at which the stated
    /// range is sampled for the monatomic-minimum check.</summary>
    internal const int RangeSamples = 1001;

    /// <summary>Reads
    /// <c>[reduce T_r K] [power c^t …] [einstein v@θ …] range T_min-T_max K | source</c>.
    /// Power terms are c·(T/T_r)^t; an Einstein term's characteristic temperature is θ·T_r, so
    /// with the default T_r = 1 K both are plain kelvin.</summary>
    private IdealGasHeatCapacity ReadIdealGasCp(int line, string rest)
    {
        const string key = KeyIdealGasCp;
        string source = ReadSource(line, key, rest, out string body);
        string[] tokens = body.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length == 0)
        {
            throw Fail(line, key, "empty correlation: no terms before '|'");
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        var sectionTokens = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        List<string>? current = null;
        foreach (string token in tokens)
        {
            if (Array.IndexOf(Sections, token) >= 0)
            {
                if (!seen.Add(token))
                {
                    throw Fail(line, key, $"'{token}' is given twice");
                }

                current = [];
                sectionTokens[token] = current;
                continue;
            }

            if (current is null)
            {
                throw Fail(line, key,
                    $"unexpected '{token}'; the correlation is written as sections starting with {string.Join(", ", Sections.Select(s => $"'{s}'"))}");
            }

            current.Add(token);
        }

        double reducing = 1.0;
        if (sectionTokens.TryGetValue(SectionReduce, out List<string>? reduceTokens))
        {
            reducing = ReadKelvin(line, key, SectionReduce, reduceTokens, "reduce 304.1282 K");
        }

        var power = new List<(double Coefficient, double Exponent)>();
        if (sectionTokens.TryGetValue(SectionPower, out List<string>? powerTokens))
        {
            if (powerTokens.Count == 0)
            {
                throw Fail(line, key, "'power' has no terms; write coefficient^exponent, such as 4.714^0 -6.986e-3^1");
            }

            foreach (string term in powerTokens)
            {
                (double c, double t) = ReadPair(line, key, term, '^', "power term", "coefficient^exponent, such as 4.714^0 or -6.986e-3^1");
                power.Add((c, t));
            }
        }

        var einstein = new List<(double Coefficient, double Temperature)>();
        if (sectionTokens.TryGetValue(SectionEinstein, out List<string>? einsteinTokens))
        {
            if (einsteinTokens.Count == 0)
            {
                throw Fail(line, key, "'einstein' has no terms; write coefficient@temperature, such as 3.043@393");
            }

            foreach (string term in einsteinTokens)
            {
                (double v, double theta) = ReadPair(line, key, term, '@', "Planck-Einstein term", "coefficient@temperature, such as 3.043@393");
                if (theta <= 0)
                {
                    throw Fail(line, key,
                        $"Planck-Einstein term '{term}': the characteristic temperature must be greater than zero");
                }

                einstein.Add((v, theta * reducing));
            }
        }

        if (power.Count == 0 && einstein.Count == 0)
        {
            throw Fail(line, key, "empty correlation: give at least one 'power' or 'einstein' term");
        }

        if (!sectionTokens.TryGetValue(SectionRange, out List<string>? rangeTokens))
        {
            throw Fail(line, key, "missing 'range T_min-T_max K' (the temperatures the source states the correlation for)");
        }

        (double low, double high) = ReadRange(line, key, rangeTokens);
        var correlation = new IdealGasHeatCapacity(power, reducing, einstein, low, high, source);
        CheckMonatomicMinimum(line, correlation);
        return correlation;
    }

    /// <summary>cp°/R ≥ 5/2 at every sampled temperature of the stated range (a relative
    /// allowance of 1e-12 absorbs the rounding of R·(cp°/R)/R).</summary>
    private void CheckMonatomicMinimum(int line, IdealGasHeatCapacity correlation)
    {
        double low = correlation.MinimumTemperature;
        double high = correlation.MaximumTemperature;
        for (int i = 0; i < RangeSamples; i++)
        {
            double temperature = i == RangeSamples - 1 ? high : low + (high - low) * i / (RangeSamples - 1);
            double reduced = correlation.HeatCapacity(temperature) / Constants.GasConstant;
            if (!double.IsFinite(reduced))
            {
                throw Fail(line, KeyIdealGasCp, $"cp°/R is not a finite number at {Show(temperature)} K");
            }

            if (reduced < LowestReducedHeatCapacity * (1 - 1e-12))
            {
                throw Fail(line, KeyIdealGasCp,
                    $"unphysical: cp°/R = {reduced.ToString("G6", CultureInfo.InvariantCulture)} at {Show(temperature)} K is below {Show(LowestReducedHeatCapacity)}, the monatomic minimum");
            }
        }
    }

    private (double First, double Second) ReadPair(int line, string key, string term, char separator, string what, string example)
    {
        int at = term.IndexOf(separator, StringComparison.Ordinal);
        if (at <= 0 || at == term.Length - 1 || term.IndexOf(separator, at + 1) >= 0
            || !TryNumber(term[..at], out double first) || !TryNumber(term[(at + 1)..], out double second))
        {
            throw Fail(line, key, $"malformed {what} '{term}'; write {example}");
        }

        return (first, second);
    }

    private double ReadKelvin(int line, string key, string section, List<string> tokens, string example)
    {
        if (tokens.Count != 2 || !TryNumber(tokens[0], out double value))
        {
            throw Fail(line, key, $"malformed '{section}' ('{section} {string.Join(' ', tokens)}'); write {example}");
        }

        if (tokens[1] != "K")
        {
            throw Fail(line, key, $"'{section}' takes the unit K, found '{tokens[1]}'");
        }

        if (value <= 0)
        {
            throw Fail(line, key, $"'{section}' temperature {Show(value)} K must be greater than zero");
        }

        return value;
    }

    /// <summary>Reads <c>T_min-T_max K</c>; the separator is a '-' (or '–') that does not belong
    /// to an exponent, with or without spaces around it.</summary>
    private (double Low, double High) ReadRange(int line, string key, List<string> tokens)
    {
        const string example = "range 50-1000 K";
        if (tokens.Count < 2 || tokens[^1] != "K")
        {
            string found = tokens.Count == 0 ? "nothing" : $"'{string.Join(' ', tokens)}'";
            throw Fail(line, key, $"malformed 'range': found {found}; write {example} (temperatures in K)");
        }

        string text = string.Concat(tokens.Take(tokens.Count - 1)).Replace('–', '-');
        int dash = -1;
        for (int i = 1; i < text.Length; i++)
        {
            if (text[i] == '-' && text[i - 1] is not ('e' or 'E'))
            {
                dash = i;
                break;
            }
        }

        if (dash < 0 || !TryNumber(text[..dash], out double low) || !TryNumber(text[(dash + 1)..], out double high))
        {
            throw Fail(line, key, $"malformed 'range' '{string.Join(' ', tokens)}'; write {example}");
        }

        if (low <= 0)
        {
            throw Fail(line, key, $"'range' lower end {Show(low)} K must be greater than zero");
        }

        if (low >= high)
        {
            throw Fail(line, key, $"'range' lower end {Show(low)} K is not below the upper end {Show(high)} K");
        }

        return (low, high);
    }

    /// <summary>The form and model an alpha-parameter key names.</summary>
    private static (AlphaForm Form, CubicModelKind Model) AlphaKeyMeaning(string key) => key switch
    {
        KeyAlphaSoavePr => (AlphaForm.Soave, CubicModelKind.PengRobinson),
        KeyAlphaSoaveSrk => (AlphaForm.Soave, CubicModelKind.SoaveRedlichKwong),
        KeyAlphaTwuPr => (AlphaForm.Twu, CubicModelKind.PengRobinson),
        KeyAlphaTwuSrk => (AlphaForm.Twu, CubicModelKind.SoaveRedlichKwong),
        KeyAlphaMathiasCopemanPr => (AlphaForm.MathiasCopeman, CubicModelKind.PengRobinson),
        _ => (AlphaForm.MathiasCopeman, CubicModelKind.SoaveRedlichKwong),
    };

    /// <summary>Reads <c>p1 [p2 p3] | source</c> of an alpha-parameter key.</summary>
    private AlphaParameterSet ReadAlphaParameters(int line, string key, string rest)
    {
        var (form, model) = AlphaKeyMeaning(key);
        var names = CubicModel.AlphaParameterNames(form);
        string source = ReadSource(line, key, rest, out string body);
        string[] tokens = body.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length != names.Count)
        {
            throw Fail(line, key, $"expected {(names.Count == 1 ? "one number" : $"{names.Count} numbers")} '{string.Join(' ', names)} | source', found {tokens.Length}");
        }

        var values = new double[names.Count];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = ParseNumber(line, key, tokens[i], $"parameter {names[i]}");
        }

        return new AlphaParameterSet(form, model, values, source);
    }

    /// <summary>Reads the upper triangle (row by row) of an alpha-parameter covariance matrix.</summary>
    private double[] ReadCovariance(int line, string key, string rest)
    {
        int p = ParameterCount(key[..^CovarianceSuffix.Length]);
        int count = p * (p + 1) / 2;
        return ReadNumbers(line, key, rest, count, $"the {count} numbers of the upper triangle of a {p}x{p} covariance matrix, row by row", "covariance element");
    }

    /// <summary>Reads ∂θ_j/∂Tc (1/K) for every parameter, then ∂θ_j/∂Pc (1/Pa).</summary>
    private double[] ReadSensitivity(int line, string key, string rest)
    {
        int count = 2 * ParameterCount(key[..^SensitivitySuffix.Length]);
        return ReadNumbers(line, key, rest, count, $"{count} numbers (d parameter/d Tc in 1/K for each parameter, then d parameter/d Pc in 1/Pa)", "sensitivity");
    }

    /// <summary>The number of parameters of the alpha form an alpha key names.</summary>
    private static int ParameterCount(string alphaKey) => CubicModel.AlphaParameterNames(AlphaKeyMeaning(alphaKey).Form).Count;

    /// <summary>Reads exactly <paramref name="count"/> numbers before the source.</summary>
    private double[] ReadNumbers(int line, string key, string rest, int count, string expected, string element)
    {
        _ = ReadSource(line, key, rest, out string body);
        string[] tokens = body.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length != count)
        {
            throw Fail(line, key, $"expected {expected}, found {tokens.Length}");
        }

        return [.. tokens.Select((t, i) => ParseNumber(line, key, t, $"{element} {i + 1}"))];
    }

    /// <summary>Reads <c>alpha_default soave|twu|mathias-copeman</c>.</summary>
    private AlphaForm ReadAlphaDefault(int line, string key, string rest) => rest switch
    {
        "soave" => AlphaForm.Soave,
        "twu" => AlphaForm.Twu,
        "mathias-copeman" => AlphaForm.MathiasCopeman,
        _ => throw Fail(line, key, $"unknown alpha function '{rest}'; use soave, twu or mathias-copeman (the parameters are given by an alpha_... key)"),
    };

    /// <summary>The alpha parameter sets with their covariance matrices attached; a covariance
    /// without its parameters, or one that is not a covariance (negative variance, correlation
    /// beyond ±1), is refused.</summary>
    private IReadOnlyList<AlphaParameterSet> AlphaParametersWithCovariances()
    {
        var sets = new List<AlphaParameterSet>(_alphaParameters);
        int IndexOf(string stem, int line, string suffix, string what)
        {
            var (form, model) = AlphaKeyMeaning(stem);
            int index = sets.FindIndex(s => s.Form == form && s.Model == model);
            return index >= 0 ? index : throw Fail(line, stem + suffix, $"a {what} without its parameters: '{stem}' is not given");
        }

        foreach (var (stem, (line, upper)) in _alphaCovariances)
        {
            int index = IndexOf(stem, line, CovarianceSuffix, "covariance");

            int p = sets[index].Values.Count;
            var matrix = new double[p, p];
            int k = 0;
            for (int i = 0; i < p; i++)
            {
                for (int j = i; j < p; j++)
                {
                    matrix[i, j] = matrix[j, i] = upper[k++];
                }
            }

            for (int i = 0; i < p; i++)
            {
                if (!(matrix[i, i] >= 0))
                {
                    throw Fail(line, stem + CovarianceSuffix, $"variance {i + 1} is negative ({Show(matrix[i, i])})");
                }

                for (int j = i + 1; j < p; j++)
                {
                    // |cov| ≤ σi·σj, with a rounding allowance for values written to 17 digits.
                    if (Math.Abs(matrix[i, j]) > Math.Sqrt(matrix[i, i] * matrix[j, j]) * (1 + 1e-12))
                    {
                        throw Fail(line, stem + CovarianceSuffix, $"element ({i + 1},{j + 1}) implies a correlation beyond ±1");
                    }
                }
            }

            sets[index] = sets[index] with { Covariance = matrix };
        }

        foreach (var (stem, (line, values)) in _alphaSensitivities)
        {
            int index = IndexOf(stem, line, SensitivitySuffix, "sensitivity");

            int p = sets[index].Values.Count;
            var matrix = new double[p, 2];
            for (int j = 0; j < p; j++)
            {
                matrix[j, 0] = values[j];
                matrix[j, 1] = values[p + j];
            }

            sets[index] = sets[index] with { CriticalSensitivity = matrix };
        }

        if (_preferredAlpha != AlphaForm.Default && !sets.Any(s => s.Form == _preferredAlpha))
        {
            throw Fail(_lineOfKey[KeyAlphaDefault], KeyAlphaDefault, $"no {CubicModel.AlphaKeyStem(_preferredAlpha)}_... parameters are given for it");
        }

        return sets.AsReadOnly();
    }

    /// <summary>Reads <c>reduce TC K PC UNIT terms N1^t1 N2^t2 … | source</c>: a Wagner-type
    /// equation ln(P/Pc) = (Tc/T)·Σ N_i·τ^t_i with its own Tc and Pc.</summary>
    private PublishedVapourPressure ReadVapourPressureEquation(int line, string rest)
    {
        const string key = KeyVapourPressureEquation;
        const string example = "reduce 647.096 K 22.064 MPa terms -7.85951783^1 1.84408259^1.5 ...";
        string source = ReadSource(line, key, rest, out string body);
        string[] tokens = body.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length < 7 || tokens[0] != "reduce" || tokens[5] != "terms")
        {
            throw Fail(line, key, $"malformed equation; write {example}");
        }

        double tc = ReadKelvin(line, key, "reduce", [tokens[1], tokens[2]], example);
        if (!TryNumber(tokens[3], out double pcNumber) || !(pcNumber > 0))
        {
            throw Fail(line, key, $"'{tokens[3]}' is not a positive critical pressure");
        }

        string[] allowed = FluidUnits.Allowed(Units.Dimension.Pressure);
        if (Array.IndexOf(allowed, tokens[4]) < 0)
        {
            throw Fail(line, key, $"wrong pressure unit '{tokens[4]}'; allowed: {string.Join(", ", allowed)}");
        }

        var unit = FluidUnits.Get(tokens[4]);

        double pc = unit.ToSi(pcNumber);
        var coefficients = new List<double>();
        var exponents = new List<double>();
        foreach (string term in tokens[6..])
        {
            int caret = term.IndexOf('^', StringComparison.Ordinal);
            if (caret <= 0 || !TryNumber(term[..caret], out double n) || !TryNumber(term[(caret + 1)..], out double t) || !(t > 0))
            {
                throw Fail(line, key, $"malformed term '{term}'; write N^t with a positive exponent t");
            }

            coefficients.Add(n);
            exponents.Add(t);
        }

        return new PublishedVapourPressure(WagnerForm.WithExponents(exponents, tc, pc), coefficients, source);
    }

    /// <summary>Splits <c>body | source</c>; the source must be present and not empty.</summary>
    private string ReadSource(int line, string key, string rest, out string body)
    {
        int bar = rest.IndexOf('|', StringComparison.Ordinal);
        if (bar < 0)
        {
            throw Fail(line, key, "missing source: write '| <published source>' after the values");
        }

        string source = rest[(bar + 1)..].Trim();
        if (source.Length == 0)
        {
            throw Fail(line, key, "missing source: the text after '|' is empty");
        }

        body = rest[..bar];
        return source;
    }

    private static bool TryNumber(string token, out double number) =>
        double.TryParse(token, NumberStyles.Float, CultureInfo.InvariantCulture, out number) && double.IsFinite(number);
}
