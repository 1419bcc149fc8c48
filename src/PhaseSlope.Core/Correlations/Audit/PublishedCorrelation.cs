namespace PhaseSlope.Core.Correlations.Audit;

/// <summary>A vapour-pressure correlation as printed in a handbook or paper: its form, its
/// coefficients and the convention they belong to.</summary>
/// <remarks>
/// <para>The printed forms, with log the logarithm of the stated base, P in the stated unit and
/// t the temperature on the stated scale:</para>
/// <list type="bullet">
/// <item><c>antoine</c>: log P = A − B/(t + C) (Antoine 1888), K or °C;</item>
/// <item><c>clausius-clapeyron</c>: log P = A − B/T, T in K;</item>
/// <item><c>kirchhoff</c>: log P = A + B/T + C·log T, T in K (the temperature term in the same
/// base as the pressure, as log10 tables print it);</item>
/// <item><c>riedel</c>: log P = A + B/T + C·log T + D·T⁶, T in K (same rule).</item>
/// </list>
/// <para>The conversion to the SI natural-log forms of <see cref="VapourPressureForm"/> is exact:
/// with λ = ln(base) and f the pascals per unit, ln(P/Pa) = λ·log P + ln f, so A_si = λA + ln f
/// and every term in 1/T or T⁶ is multiplied by λ; λ·C·log_b T = C·ln T leaves C unchanged in
/// the Kirchhoff and Riedel forms; a Celsius Antoine set has t + C = T + (C − 273.15).</para>
/// </remarks>
public sealed record PublishedCorrelation
{
    /// <summary>The form identifiers accepted.</summary>
    public static IReadOnlyList<string> FormIds { get; } = ["antoine", "clausius-clapeyron", "kirchhoff", "riedel"];

    /// <summary>Creates a correlation; the coefficient count must match the form.</summary>
    /// <exception cref="ArgumentException">Unknown form or wrong number of coefficients.</exception>
    public PublishedCorrelation(string formId, IReadOnlyList<double> coefficients)
    {
        ArgumentNullException.ThrowIfNull(formId);
        ArgumentNullException.ThrowIfNull(coefficients);
        int expected = CoefficientCount(formId);
        if (coefficients.Count != expected)
        {
            throw new ArgumentException($"the {formId} form takes {expected} coefficients, got {coefficients.Count}", nameof(coefficients));
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

    /// <summary>The coefficients as printed.</summary>
    public IReadOnlyList<double> Coefficients { get; }

    /// <summary>True when the form admits a Celsius temperature (only Antoine: the others have
    /// terms in 1/T or log T that need an absolute temperature).</summary>
    public bool AllowsCelsius => FormId == "antoine";

    /// <summary>Number of coefficients of a form.</summary>
    /// <exception cref="ArgumentException">Unknown form.</exception>
    public static int CoefficientCount(string formId) => formId switch
    {
        "antoine" => 3,
        "clausius-clapeyron" => 2,
        "kirchhoff" => 3,
        "riedel" => 4,
        _ => throw new ArgumentException($"unknown form '{formId}' (use {string.Join(", ", FormIds)})", nameof(formId)),
    };

    /// <summary>The SI natural-log form this correlation converts to.</summary>
    public VapourPressureForm Form() => FormId switch
    {
        "antoine" => new AntoineForm(),
        "clausius-clapeyron" => new ClausiusClapeyronForm(),
        "kirchhoff" => new KirchhoffForm(),
        _ => new RiedelForm(),
    };

    /// <summary>The coefficients converted exactly to ln(P/Pa) with T in K.</summary>
    /// <exception cref="ArgumentException">A Celsius convention for a form that needs kelvin.</exception>
    public double[] SiCoefficients(PublishedConvention convention)
    {
        ArgumentNullException.ThrowIfNull(convention);
        if (convention.TemperatureUnit == PublishedTemperatureUnit.Celsius && !AllowsCelsius)
        {
            throw new ArgumentException($"the {FormId} form takes T in K only", nameof(convention));
        }

        double lambda = convention.LogBase == LogBase.Ten ? Math.Log(10) : 1.0;
        double lnF = Math.Log(PublishedConvention.PascalsPer(convention.PressureUnit));
        var c = Coefficients;
        return FormId switch
        {
            "antoine" => [lambda * c[0] + lnF, lambda * c[1], convention.TemperatureUnit == PublishedTemperatureUnit.Celsius ? c[2] - PublishedConvention.CelsiusOffset : c[2]],
            "clausius-clapeyron" => [lambda * c[0] + lnF, lambda * c[1]],
            "kirchhoff" => [lambda * c[0] + lnF, lambda * c[1], c[2]],
            _ => [lambda * c[0] + lnF, lambda * c[1], c[2], lambda * c[3]],
        };
    }
}
