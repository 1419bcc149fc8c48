using System.Globalization;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Correlations.Audit;

/// <summary>A vapour-pressure correlation as printed in a handbook or paper: its form, its
/// coefficients and the convention they belong to; and the exact conversion both ways between a
/// printed set and the SI natural-log forms of <see cref="VapourPressureForm"/>.</summary>
/// <remarks>
/// <para>The printed forms, with log the logarithm of the stated base, P in the stated unit and
/// t the temperature on the stated scale:</para>
/// <list type="bullet">
/// <item><c>antoine</c>: log P = A − B/(t + C) (Antoine 1888), any scale;</item>
/// <item><c>clausius-clapeyron</c>: log P = A − B/T, absolute T (K or °R);</item>
/// <item><c>kirchhoff</c>: log P = A + B/T + C·log T, absolute T (the temperature term in the
/// same base as the pressure, as log10 tables print it);</item>
/// <item><c>riedel</c>: log P = A + B/T + C·log T + D·T⁶, absolute T (same rule);</item>
/// <item><c>antoine-extended</c>: log P = A + B/(T + C) + D·T + E·log T + F·T^G, absolute T
/// (same rule; <see cref="ExtendedAntoineForm"/>);</item>
/// <item><c>wagner-3-6</c>, <c>wagner-2.5-5</c>, <c>wagner-6</c>: ln(P/Pc) = (Tc/T)·Σ a_i·τ^(e_i),
/// τ = 1 − T/Tc (<see cref="WagnerForm"/>), coefficients a, b, c, d (, e, f) then Tc and Pc; the
/// form is in reduced variables, so the stated units apply to Tc and Pc only, and the log base is e.</item>
/// </list>
/// <para>The conversion is exact algebra. With λ = ln(base), f the pascals per unit and the printed
/// temperature t = k·T − o (T in K; k = 1.8 for °F and °R, o = 273.15 for °C, 459.67 for °F, read
/// from the one unit table), ln(P/Pa) = λ·log P + ln f, so A_si = λA + ln f; a term λB/(t + C) becomes
/// (λB/k)/(T + (C − o)/k); λ·D·T^n becomes λ·D·kⁿ·Tⁿ; λ·C·log_b(kT) = C·ln T + C·ln k moves C·ln k
/// into A. The reverse conversion (<see cref="FromSi"/>) inverts these, and its Jacobian
/// (<see cref="Jacobian"/>) carries a fit's covariance into the printed convention.</para>
/// </remarks>
public sealed record PublishedCorrelation
{
    /// <summary>The form identifiers accepted.</summary>
    public static IReadOnlyList<string> FormIds { get; } = ["antoine", "clausius-clapeyron", "kirchhoff", "riedel", "antoine-extended", "wagner-3-6", "wagner-2.5-5", "wagner-6"];

    /// <summary>Creates a correlation; the coefficient count must match the form.</summary>
    /// <exception cref="ArgumentException">Unknown form or wrong number of coefficients.</exception>
    public PublishedCorrelation(string formId, IReadOnlyList<double> coefficients)
    {
        ArgumentNullException.ThrowIfNull(formId);
        ArgumentNullException.ThrowIfNull(coefficients);
        int expected = CoefficientCount(formId);
        if (coefficients.Count != expected)
        {
            throw new ArgumentException($"the {formId} form takes {expected} coefficients ({string.Join(",", CoefficientNames(formId))}), got {coefficients.Count}", nameof(coefficients));
        }

        if (coefficients.Any(c => !double.IsFinite(c)))
        {
            throw new ArgumentException("coefficients must be finite numbers", nameof(coefficients));
        }

        FormId = formId;
        Coefficients = [.. coefficients];
    }

    /// <summary>The form identifier.</summary>
    public string FormId { get; }

    /// <summary>The coefficients as printed (for a Wagner form: a, b, … then Tc and Pc in the
    /// convention's units).</summary>
    public IReadOnlyList<double> Coefficients { get; }

    /// <summary>True for the Wagner forms, whose last two coefficients are Tc and Pc.</summary>
    public bool IsWagner => IsWagnerForm(FormId);

    private static bool IsWagnerForm(string formId) => formId.StartsWith("wagner-", StringComparison.Ordinal);

    /// <summary>The coefficient names of a form, in order.</summary>
    /// <exception cref="ArgumentException">Unknown form.</exception>
    public static IReadOnlyList<string> CoefficientNames(string formId) => formId switch
    {
        "antoine" => ["A", "B", "C"],
        "clausius-clapeyron" => ["A", "B"],
        "kirchhoff" => ["A", "B", "C"],
        "riedel" => ["A", "B", "C", "D"],
        "antoine-extended" => ["A", "B", "C", "D", "E", "F", "G"],
        "wagner-3-6" or "wagner-2.5-5" => ["a", "b", "c", "d", "Tc", "Pc"],
        "wagner-6" => ["a", "b", "c", "d", "e", "f", "Tc", "Pc"],
        _ => throw new ArgumentException($"unknown form '{formId}' (use {string.Join(", ", FormIds)})", nameof(formId)),
    };

    /// <summary>Number of coefficients of a form.</summary>
    /// <exception cref="ArgumentException">Unknown form.</exception>
    public static int CoefficientCount(string formId) => CoefficientNames(formId).Count;

    /// <summary>Why a form cannot be printed with the given log base or temperature scale, or
    /// null when it can (a null argument is not checked). Every pressure unit is possible.</summary>
    /// <exception cref="ArgumentException">Unknown form.</exception>
    public static string? Refusal(string formId, LogBase? logBase, PublishedTemperatureUnit? temperatureUnit)
    {
        _ = CoefficientCount(formId);
        if (IsWagnerForm(formId))
        {
            return logBase == LogBase.Ten ? $"the {formId} form is published as ln(P/Pc) in reduced variables: log base e only" : null;
        }

        return formId != "antoine" && temperatureUnit is PublishedTemperatureUnit t && !PublishedConvention.IsAbsolute(t)
            ? $"the {formId} form has terms in 1/T or log T, which need an absolute temperature (K or degR), not {PublishedConvention.Symbol(t)}"
            : null;
    }

    /// <summary>Whether the correlation can be read in the convention (see <see cref="Refusal"/>).</summary>
    public bool Admits(PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(convention);
        return Refusal(FormId, convention.LogBase, convention.TemperatureUnit) is null;
    }

    /// <summary>The SI natural-log form this correlation converts to in the convention (for a
    /// Wagner form, with its Tc and Pc converted to K and Pa).</summary>
    /// <exception cref="ArgumentException">A convention the form does not admit.</exception>
    /// <exception cref="InvalidInputException">A Wagner Tc or Pc that is not positive in SI.</exception>
    public VapourPressureForm Form(PublishedConvention convention) => ToSi(convention).Form;

    /// <summary>The coefficients converted exactly to ln(P/Pa) with T in K.</summary>
    /// <exception cref="ArgumentException">A convention the form does not admit.</exception>
    public double[] SiCoefficients(PublishedConvention convention) => ToSi(convention).Parameters;

    /// <summary>The SI form and its parameters (ln(P/Pa), T in K).</summary>
    /// <exception cref="ArgumentException">A convention the form does not admit.</exception>
    /// <exception cref="InvalidInputException">A Wagner Tc or Pc that is not positive in SI.</exception>
    public (VapourPressureForm Form, double[] Parameters) ToSi(PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(convention);
        if (Refusal(FormId, convention.LogBase, convention.TemperatureUnit) is string why)
        {
            throw new ArgumentException(why, nameof(convention));
        }

        double lambda = Lambda(convention.LogBase);
        double lnF = Math.Log(PublishedConvention.PascalsPer(convention.PressureUnit));
        var (k, o) = PublishedConvention.Scale(convention.TemperatureUnit);
        double lnK = Math.Log(k);
        var c = Coefficients;
        switch (FormId)
        {
            case "antoine":
                return (new AntoineForm(), [lambda * c[0] + lnF, lambda * c[1] / k, (c[2] - o) / k]);
            case "clausius-clapeyron":
                return (new ClausiusClapeyronForm(), [lambda * c[0] + lnF, lambda * c[1] / k]);
            case "kirchhoff":
                return (new KirchhoffForm(), [lambda * c[0] + lnF + c[2] * lnK, lambda * c[1] / k, c[2]]);
            case "riedel":
                return (new RiedelForm(), [lambda * c[0] + lnF + c[2] * lnK, lambda * c[1] / k, c[2], lambda * c[3] * Math.Pow(k, 6)]);
            case "antoine-extended":
                return (new ExtendedAntoineForm(), [lambda * c[0] + lnF + c[4] * lnK, lambda * c[1] / k, c[2] / k, lambda * c[3] * k, c[4], lambda * c[5] * Math.Pow(k, c[6]), c[6]]);
            default:
                int n = c.Count - 2;
                double tc = PublishedConvention.ToKelvin(c[n], convention.TemperatureUnit);
                double pc = c[n + 1] * PublishedConvention.PascalsPer(convention.PressureUnit);
                if (!(tc > 0) || !(pc > 0))
                {
                    throw new InvalidInputException(!(tc > 0) ? "critical temperature" : "critical pressure", !(tc > 0) ? tc : pc,
                        $"the {FormId} form needs Tc > 0 K and Pc > 0 Pa; read as {convention} its Tc and Pc are {Preconditions.Format(tc)} K and {Preconditions.Format(pc)} Pa");
                }

                var form = FormId switch
                {
                    "wagner-3-6" => WagnerForm.ThreeSix(tc, pc),
                    "wagner-2.5-5" => WagnerForm.TwoHalfFive(tc, pc),
                    _ => WagnerForm.SixTerm(tc, pc),
                };
                return (form, [.. c.Take(n)]);
        }
    }

    /// <summary>The printed set of a fitted (or otherwise SI) correlation in a convention: the exact
    /// inverse of <see cref="ToSi"/>.</summary>
    /// <param name="form">The SI form (its <see cref="VapourPressureForm.Id"/> must be one of <see cref="FormIds"/>).</param>
    /// <param name="parameters">Its parameters, ln(P/Pa) with T in K.</param>
    /// <param name="convention">The convention to print in.</param>
    /// <exception cref="ArgumentException">A form with no printed counterpart, or a convention it does not admit.</exception>
    public static PublishedCorrelation FromSi(VapourPressureForm form, IReadOnlyList<double> parameters, PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(form);
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(convention);
        RequirePrintable(form, convention);
        double lambda = Lambda(convention.LogBase);
        double lnF = Math.Log(PublishedConvention.PascalsPer(convention.PressureUnit));
        var (k, o) = PublishedConvention.Scale(convention.TemperatureUnit);
        double lnK = Math.Log(k);
        var s = parameters;
        double[] printed = form.Id switch
        {
            "antoine" => [(s[0] - lnF) / lambda, k * s[1] / lambda, k * s[2] + o],
            "clausius-clapeyron" => [(s[0] - lnF) / lambda, k * s[1] / lambda],
            "kirchhoff" => [(s[0] - lnF - s[2] * lnK) / lambda, k * s[1] / lambda, s[2]],
            "riedel" => [(s[0] - lnF - s[2] * lnK) / lambda, k * s[1] / lambda, s[2], s[3] / (lambda * Math.Pow(k, 6))],
            "antoine-extended" => [(s[0] - lnF - s[4] * lnK) / lambda, k * s[1] / lambda, k * s[2], s[3] / (lambda * k), s[4], s[5] / (lambda * Math.Pow(k, s[6])), s[6]],
            _ => [.. s, PublishedConvention.FromKelvin(((WagnerForm)form).CriticalTemperature, convention.TemperatureUnit),
                ((WagnerForm)form).CriticalPressure / PublishedConvention.PascalsPer(convention.PressureUnit)],
        };
        return new PublishedCorrelation(form.Id, printed);
    }

    /// <summary>J = ∂(printed coefficient)/∂(SI parameter) of <see cref="FromSi"/>, p×p over the
    /// form's fitted parameters (a Wagner form's Tc and Pc are given, not fitted, and are left
    /// out); the printed covariance is J·Σ·Jᵀ.</summary>
    /// <exception cref="ArgumentException">As <see cref="FromSi"/>.</exception>
    public static double[,] Jacobian(VapourPressureForm form, IReadOnlyList<double> parameters, PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(form);
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(convention);
        RequirePrintable(form, convention);
        double lambda = Lambda(convention.LogBase);
        var (k, _) = PublishedConvention.Scale(convention.TemperatureUnit);
        double lnK = Math.Log(k);
        int p = form.ParameterCount;
        var j = new double[p, p];
        switch (form.Id)
        {
            case "antoine":
                j[0, 0] = 1 / lambda;
                j[1, 1] = k / lambda;
                j[2, 2] = k;
                break;
            case "clausius-clapeyron":
                j[0, 0] = 1 / lambda;
                j[1, 1] = k / lambda;
                break;
            case "kirchhoff":
            case "riedel":
                j[0, 0] = 1 / lambda;
                j[0, 2] = -lnK / lambda;
                j[1, 1] = k / lambda;
                j[2, 2] = 1;
                if (p == 4)
                {
                    j[3, 3] = 1 / (lambda * Math.Pow(k, 6));
                }

                break;
            case "antoine-extended":
                double kg = Math.Pow(k, parameters[6]);
                j[0, 0] = 1 / lambda;
                j[0, 4] = -lnK / lambda;
                j[1, 1] = k / lambda;
                j[2, 2] = k;
                j[3, 3] = 1 / (lambda * k);
                j[4, 4] = 1;
                j[5, 5] = 1 / (lambda * kg);
                j[5, 6] = -parameters[5] * lnK / (lambda * kg);
                j[6, 6] = 1;
                break;
            default:
                for (int i = 0; i < p; i++)
                {
                    j[i, i] = 1;
                }

                break;
        }

        return j;
    }

    /// <summary>Σ_printed = J·Σ·Jᵀ (<see cref="Jacobian"/>).</summary>
    /// <exception cref="ArgumentException">As <see cref="FromSi"/>, or a covariance of the wrong size.</exception>
    public static double[,] Covariance(VapourPressureForm form, IReadOnlyList<double> parameters, double[,] covariance, PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        var j = Jacobian(form, parameters, convention);
        int p = j.GetLength(0);
        if (covariance.GetLength(0) != p || covariance.GetLength(1) != p)
        {
            throw new ArgumentException($"the covariance must be {p}x{p}", nameof(covariance));
        }

        var jm = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(j);
        var sm = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(covariance);
        return (jm * sm * jm.Transpose()).ToArray();
    }

    /// <summary>The printed equation in the convention, e.g. "log10(P/mmHg) = A - B/(t/degC + C)".</summary>
    public string Equation(PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(convention);
        string log = convention.LogBase == LogBase.Ten ? "log10" : "ln";
        string p = $"{log}(P/{PublishedConvention.Symbol(convention.PressureUnit)})";
        string unit = PublishedConvention.Symbol(convention.TemperatureUnit);
        string t = PublishedConvention.IsAbsolute(convention.TemperatureUnit) ? $"T/{unit}" : $"t/{unit}";
        return FormId switch
        {
            "antoine" => $"{p} = A - B/({t} + C)",
            "clausius-clapeyron" => $"{p} = A - B/({t})",
            "kirchhoff" => $"{p} = A + B/({t}) + C {log}({t})",
            "riedel" => $"{p} = A + B/({t}) + C {log}({t}) + D ({t})^6",
            "antoine-extended" => $"{p} = A + B/({t} + C) + D ({t}) + E {log}({t}) + F ({t})^G",
            _ => WagnerEquation(unit, PublishedConvention.Symbol(convention.PressureUnit)),
        };
    }

    private string WagnerEquation(string temperatureUnit, string pressureUnit)
    {
        double[] exponents = WagnerForm.ExponentsOf(FormId);
        string terms = string.Join(" + ", exponents.Select((e, i) => $"{(char)('a' + i)} tau^{e.ToString(CultureInfo.InvariantCulture)}"));
        return $"ln(P/Pc) = (Tc/T)({terms}), tau = 1 - T/Tc, Tc in {temperatureUnit}, Pc in {pressureUnit}";
    }

    private static double Lambda(LogBase logBase) => logBase == LogBase.Ten ? Math.Log(10) : 1.0;

    private static void RequirePrintable(VapourPressureForm form, PublishedConvention convention)
    {
        if (!FormIds.Contains(form.Id) || form.ParameterCount == 0)
        {
            throw new ArgumentException($"the {form.Id} form has no printed coefficients to convert", nameof(form));
        }

        if (Refusal(form.Id, convention.LogBase, convention.TemperatureUnit) is string why)
        {
            throw new ArgumentException(why, nameof(convention));
        }
    }
}
