using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders fitted correlations (<c>fit</c>) and latent heats from data (<c>latent</c>).</summary>
internal static class FitWriter
{
    /// <summary>Writes a fit to <paramref name="output"/>; <paramref name="candidates"/> are the
    /// other forms tried by auto.</summary>
    /// <remarks>The text streams out in chunks as it is made (a fit to a million points has a
    /// million residual rows), rather than being built as one string first.</remarks>
    /// <param name="output">Where the text goes.</param>
    /// <param name="fit">The fit reported.</param>
    /// <param name="candidates">The forms auto tried (one element otherwise).</param>
    /// <param name="format">Table, CSV or JSON.</param>
    /// <param name="convention">A published convention to print the coefficients in as well (table
    /// and JSON), or null.</param>
    public static void Fit(TextWriter output, VapourPressureFit fit, IReadOnlyList<VapourPressureFit> candidates, OutputFormat format, PublishedConvention? convention = null)
    {
        CheckFinite(fit);
        var printed = convention is null ? null : Printed.Of(fit, convention);
        using var chunked = new ChunkedTextWriter(output);
        switch (format)
        {
            case OutputFormat.Json:
                FitJson(chunked, fit, candidates, printed);
                break;
            case OutputFormat.Csv:
                FitCsv(chunked, fit);
                break;
            default:
                FitTable(chunked, fit, candidates, printed);
                break;
        }
    }

    /// <summary>A fit's coefficients in a published convention, with their covariance (J·Σ·Jᵀ) when
    /// the fit's is defined; every number checked finite before anything is written.</summary>
    private sealed record Printed(PublishedConvention Convention, PublishedCorrelation Correlation, double[,]? Covariance)
    {
        public static Printed Of(VapourPressureFit fit, PublishedConvention convention)
        {
            var correlation = PublishedCorrelation.FromSi(fit.Form, fit.Parameters, convention);
            var names = PublishedCorrelation.CoefficientNames(correlation.FormId);
            for (int i = 0; i < correlation.Coefficients.Count; i++)
            {
                FiniteNumbers.Check(correlation.Coefficients[i], $"coefficient {names[i]} in {convention}");
            }

            double[,]? covariance = null;
            if (fit.CovarianceDefined)
            {
                covariance = PublishedCorrelation.Covariance(fit.Form, fit.Parameters, fit.Covariance, convention);
                foreach (double v in covariance)
                {
                    FiniteNumbers.Check(v, $"the covariance in {convention}");
                }

                // J·Σ·Jᵀ is positive semi-definite, but where Σ is nearly singular its rounding can
                // leave a variance below zero: then the printed standard errors are undefined, as
                // the fit's are when its own covariance is (never a square root of a negative number).
                for (int i = 0; i < covariance.GetLength(0); i++)
                {
                    if (!(covariance[i, i] >= 0))
                    {
                        covariance = null;
                        break;
                    }
                }
            }

            return new Printed(convention, correlation, covariance);
        }

        public IReadOnlyList<string> Names => PublishedCorrelation.CoefficientNames(Correlation.FormId);

        /// <summary>Standard error of printed coefficient i, or null for a given (not fitted) Tc or Pc
        /// or without a covariance.</summary>
        public double? StandardError(int i) => Covariance is not null && i < Covariance.GetLength(0) ? Math.Sqrt(Covariance[i, i]) : null;

        /// <summary>The audit command line that reads these coefficients back.</summary>
        public string AuditArguments
            => $"--form {Correlation.FormId} --coefficients {string.Join(",", Correlation.Coefficients.Select(NumberText.RoundTrip))} "
            + $"--log-base {PublishedConvention.Symbol(Convention.LogBase)} --correlation-pressure-unit {PublishedConvention.Symbol(Convention.PressureUnit)} "
            + $"--correlation-temperature-unit {PublishedConvention.Symbol(Convention.TemperatureUnit)}";
    }

    /// <summary>Why a fit has no covariance (see <see cref="VapourPressureFit.CovarianceDefined"/>).</summary>
    private const string CovarianceUndefined =
        "the data do not determine the parameters independently to double precision (temperatures too close together for this form)";

    /// <summary>Checks every number the fit output will show, so that an overflow fails before
    /// anything is written (the output streams).</summary>
    private static void CheckFinite(VapourPressureFit fit)
    {
        for (int i = 0; i < fit.Parameters.Count; i++)
        {
            FiniteNumbers.Check(fit.Parameters[i], $"parameter {fit.Form.ParameterNames[i]}");
        }

        foreach (var point in fit.Data)
        {
            FiniteNumbers.Check(fit.Pressure(point.Temperature), $"the fitted pressure at {NumberText.Table(point.Temperature)} K");
        }
    }

    private static void FitJson(TextWriter output, VapourPressureFit fit, IReadOnlyList<VapourPressureFit> candidates, Printed? printed)
        => JsonText.Write(output, json =>
        {
            json.WriteStartObject();
            WriteFit(json, fit);
            if (printed is not null)
            {
                WritePrinted(json, printed);
            }

            json.WriteStartArray("residuals");
            // Each list is computed once (the properties compute it on every access).
            var deviations = fit.DeviationsPercent;
            var residuals = fit.Residuals;
            for (int i = 0; i < fit.Data.Count; i++)
            {
                var point = fit.Data[i];
                json.WriteStartObject();
                json.WriteFinite("temperature_K", point.Temperature);
                json.WriteFinite("pressure_Pa", point.Pressure);
                json.WriteFinite("fitted_pressure_Pa", fit.Pressure(point.Temperature));
                json.WriteFinite("deviation_percent", deviations[i]);
                json.WriteFinite("ln_pressure_residual", residuals[i]);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            WriteCandidates(json, candidates);
            json.WriteEndObject();
        });

    private static void FitCsv(TextWriter output, VapourPressureFit fit)
    {
        var deviations = fit.DeviationsPercent;
        var residuals = fit.Residuals;
        CsvText.Write(output,
            ["temperature_K", "pressure_Pa", "fitted_pressure_Pa", "deviation_percent", "ln_pressure_residual"],
            fit.Data.Select((p, i) => new[]
            {
                NumberText.RoundTrip(p.Temperature), NumberText.RoundTrip(p.Pressure), NumberText.RoundTrip(fit.Pressure(p.Temperature)),
                NumberText.RoundTrip(deviations[i]), NumberText.RoundTrip(residuals[i]),
            }));
    }

    /// <summary>Renders latent heats.</summary>
    public static string Latent(VapourPressureFit fit, VolumeChangeModel model, IReadOnlyList<LatentHeatPoint> points, IReadOnlyList<VapourPressureFit> candidates, OutputFormat format, Core.Models.ModelIdentity? equationOfState = null,
        LatentBandText? band = null)
        => format switch
        {
            OutputFormat.Json => JsonText.Write(json =>
            {
                json.WriteStartObject();
                WriteFit(json, fit);
                json.WriteString("volume_model", VolumeModelId(model));
                if (equationOfState is not null)
                {
                    // The model behind the coexisting volumes, named in full.
                    ModelText.WriteJson(json, equationOfState);
                }

                if (band is not null)
                {
                    json.WriteString("uncertainty_method", band.MethodName);
                    if (band.Choice is { Method: Core.Uncertainty.PropagationMethod.MonteCarlo } mc)
                    {
                        json.WriteNumber("samples", mc.Samples);
                        json.WriteNumber("seed", mc.Seed);
                    }

                    UncertaintyText.WriteInputs(json, band.Inputs, "uncertain_inputs");
                }

                json.WriteStartArray("points");
                foreach (var p in points)
                {
                    json.WriteStartObject();
                    json.WriteFinite("temperature_K", p.Temperature);
                    json.WriteFinite("pressure_Pa", p.Pressure);
                    json.WriteFinite("enthalpy_of_vaporization_J_mol", p.EnthalpyOfVaporization);
                    json.WriteNumberOrNull("standard_uncertainty_J_mol", p.StandardUncertainty);
                    json.WriteFinite("compressibility_change", p.CompressibilityChange);
                    json.WriteBoolean("extrapolated", p.Extrapolated);
                    if (p.Finding is string finding)
                    {
                        json.WriteString("finding", finding);
                    }

                    if (band is not null)
                    {
                        json.WriteNumberOrNull("fit_uncertainty_J_mol", p.FitUncertainty);
                        json.WriteFinite("critical_point_uncertainty_J_mol", p.CriticalPointUncertainty);
                        json.WriteNumberOrNull("volume_model_uncertainty_J_mol", p.VolumeModelUncertainty);
                        json.WriteBoolean("band_held_at_data_end", p.BandHeldAtDataEnd);
                    }

                    json.WriteEndObject();
                }

                json.WriteEndArray();
                WriteCandidates(json, candidates);
                json.WriteEndObject();
            }),
            OutputFormat.Csv => CsvText.Write(
                ["temperature_K", "pressure_Pa", "enthalpy_of_vaporization_J_mol", "standard_uncertainty_J_mol", "compressibility_change", "extrapolated",
                    "fit_uncertainty_J_mol", "critical_point_uncertainty_J_mol", "volume_model_uncertainty_J_mol", "band_held_at_data_end", "finding"],
                points.Select(p => new[]
                {
                    NumberText.RoundTrip(p.Temperature), NumberText.RoundTrip(p.Pressure), NumberText.RoundTrip(p.EnthalpyOfVaporization),
                    NumberText.RoundTripOrEmpty(p.StandardUncertainty), NumberText.RoundTrip(p.CompressibilityChange), p.Extrapolated ? "true" : "false",
                    NumberText.RoundTripOrEmpty(p.FitUncertainty), NumberText.RoundTrip(p.CriticalPointUncertainty), NumberText.RoundTripOrEmpty(p.VolumeModelUncertainty),
                    p.BandHeldAtDataEnd ? "true" : "false",
                    p.Finding ?? "",
                })),
            _ => LatentTable(fit, model, points, band),
        };

    /// <summary>The command-line identifier of a volume model.</summary>
    public static string VolumeModelId(VolumeChangeModel model) => model switch
    {
        VolumeChangeModel.IdealGas => "ideal-gas",
        VolumeChangeModel.EquationOfState => "eos",
        _ => "haggenmacher",
    };

    private static void WriteFit(Utf8JsonWriter json, VapourPressureFit fit)
    {
        json.WriteString("form", fit.Form.Id);
        json.WriteString("equation", fit.Form.Description);
        json.WriteStartObject("parameters");
        for (int i = 0; i < fit.Parameters.Count; i++)
        {
            json.WriteFinite(fit.Form.ParameterNames[i], fit.Parameters[i]);
        }

        json.WriteEndObject();
        if (fit.CovarianceDefined)
        {
            json.WriteStartObject("standard_errors");
            for (int i = 0; i < fit.Parameters.Count; i++)
            {
                json.WriteFinite(fit.Form.ParameterNames[i], fit.StandardErrors[i]);
            }

            json.WriteEndObject();
            json.WriteFiniteMatrix("covariance", fit.Covariance);
            json.WriteNull("covariance_undefined_reason");
        }
        else
        {
            json.WriteNull("standard_errors");
            json.WriteNull("covariance");
            json.WriteString("covariance_undefined_reason", CovarianceUndefined);
        }

        json.WriteFinite("point_count", fit.Data.Count);
        json.WriteFinite("degrees_of_freedom", fit.DegreesOfFreedom);
        json.WriteFinite("chi_square", fit.ChiSquare);
        if (fit.ReducedChiSquare is double r)
        {
            json.WriteFinite("reduced_chi_square", r);
        }
        else
        {
            json.WriteNull("reduced_chi_square");
        }

        if (fit.Aicc is double a)
        {
            json.WriteFinite("aicc", a);
        }
        else
        {
            json.WriteNull("aicc");
        }

        json.WriteFinite("aad_percent", fit.AadPercent);
        json.WriteFinite("max_deviation_percent", fit.MaximumDeviationPercent);
        json.WriteStartArray("valid_range_K");
        json.WriteFiniteValue(fit.MinimumTemperature, "valid_range_K");
        json.WriteFiniteValue(fit.MaximumTemperature, "valid_range_K");
        json.WriteEndArray();
        json.WriteBoolean("absolute_uncertainties", fit.AbsoluteUncertainties);
        json.WriteFinite("iterations", fit.Iterations);
        json.WriteString("stop_reason", fit.StopReason);
    }

    private static void WritePrinted(Utf8JsonWriter json, Printed printed)
    {
        var names = printed.Names;
        var c = printed.Correlation;
        json.WriteStartObject("published");
        json.WriteString("form", c.FormId);
        json.WriteString("log_base", PublishedConvention.Symbol(printed.Convention.LogBase));
        json.WriteString("pressure_unit", PublishedConvention.Symbol(printed.Convention.PressureUnit));
        json.WriteString("temperature_unit", PublishedConvention.Symbol(printed.Convention.TemperatureUnit));
        json.WriteString("equation", c.Equation(printed.Convention));
        json.WriteStartObject("coefficients");
        for (int i = 0; i < c.Coefficients.Count; i++)
        {
            json.WriteFinite(names[i], c.Coefficients[i]);
        }

        json.WriteEndObject();
        if (printed.Covariance is double[,] covariance)
        {
            int p = covariance.GetLength(0);
            json.WriteStartObject("standard_errors");
            for (int i = 0; i < p; i++)
            {
                json.WriteFinite(names[i], printed.StandardError(i)!.Value);
            }

            json.WriteEndObject();
            json.WriteFiniteMatrix("covariance", covariance);
        }
        else
        {
            json.WriteNull("standard_errors");
            json.WriteNull("covariance");
        }

        json.WriteString("audit_arguments", printed.AuditArguments);
        json.WriteEndObject();
    }

    private static void WriteCandidates(Utf8JsonWriter json, IReadOnlyList<VapourPressureFit> candidates)
    {
        if (candidates.Count <= 1)
        {
            return;
        }

        json.WriteStartArray("candidates");
        foreach (var c in candidates)
        {
            json.WriteStartObject();
            json.WriteString("form", c.Form.Id);
            json.WriteFinite("aicc", c.Aicc!.Value);
            json.WriteFinite("aad_percent", c.AadPercent);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static void FitTable(TextWriter output, VapourPressureFit fit, IReadOnlyList<VapourPressureFit> candidates, Printed? printed)
    {
        var text = new StringBuilder();
        text.AppendLine($"form: {fit.Form.Id}");
        text.AppendLine($"equation: {fit.Form.Description}");
        text.AppendLine($"valid range (the data): {NumberText.Table(fit.MinimumTemperature)} to {NumberText.Table(fit.MaximumTemperature)} K; do not use it outside without checking");
        text.AppendLine();
        if (fit.Parameters.Count > 0)
        {
            var parameters = new TextTable(["parameter", "value", "standard error"], [false, true, true]);
            for (int i = 0; i < fit.Parameters.Count; i++)
            {
                parameters.Add(fit.Form.ParameterNames[i], NumberText.RoundTrip(fit.Parameters[i]),
                    fit.CovarianceDefined ? NumberText.Uncertainty(fit.StandardErrors[i]) : "undefined");
            }

            text.Append(parameters.Render());
            if (!fit.CovarianceDefined)
            {
                text.AppendLine($"standard errors undefined: {CovarianceUndefined}");
            }

            text.AppendLine();
        }

        if (printed is not null)
        {
            var c = printed.Correlation;
            var names = printed.Names;
            text.AppendLine($"printed as {printed.Convention} (exact conversion of the parameters above, not a refit):");
            text.AppendLine($"equation: {c.Equation(printed.Convention)}");
            var table = new TextTable(["coefficient", "value", "standard error"], [false, true, true]);
            for (int i = 0; i < c.Coefficients.Count; i++)
            {
                bool given = i >= fit.Parameters.Count; // a Wagner form's Tc and Pc
                table.Add(names[i], NumberText.RoundTrip(c.Coefficients[i]),
                    given ? "given" : printed.StandardError(i) is double se ? NumberText.Uncertainty(se) : "undefined");
            }

            text.Append(table.Render());
            text.AppendLine($"read back with: phaseslope audit {printed.AuditArguments}");
            text.AppendLine();
        }

        string weighting = fit.AbsoluteUncertainties ? "per-point standard uncertainties (absolute covariance)" : "relative weights (covariance scaled by the reduced chi-square)";
        text.AppendLine($"points {fit.Data.Count}, degrees of freedom {fit.DegreesOfFreedom}, {weighting}");
        text.AppendLine($"AAD {NumberText.Table(fit.AadPercent)} %, maximum deviation {NumberText.Table(fit.MaximumDeviationPercent)} %, chi-square {NumberText.Table(fit.ChiSquare)}"
            + (fit.ReducedChiSquare is double r ? $", reduced {NumberText.Table(r)}" : "")
            + (fit.Aicc is double a ? $", AICc {NumberText.Table(a)}" : ""));
        text.AppendLine();
        output.Write(text);
        text.Clear();
        // One row per point, made when written (twice: the columns are measured first).
        var deviations = fit.DeviationsPercent;
        TextTable.Write(output, ["T [K]", "P [kPa]", "P fit [kPa]", "deviation [%]"], [true, true, true, true], fit.Data.Count, i =>
        {
            var p = fit.Data[i];
            return [NumberText.Table(p.Temperature), NumberText.Table(UnitFormatter.Pressure(p.Pressure, UnitSystem.Si)), NumberText.Table(UnitFormatter.Pressure(fit.Pressure(p.Temperature), UnitSystem.Si)), NumberText.Table(deviations[i])];
        });
        if (candidates.Count > 1)
        {
            text.AppendLine();
            var table = new TextTable(["form tried", "AICc", "AAD [%]"], [false, true, true]);
            foreach (var c in candidates)
            {
                table.Add(c.Form.Id, NumberText.Table(c.Aicc!.Value), NumberText.Table(c.AadPercent));
            }

            text.AppendLine("chosen by the corrected Akaike information criterion (lowest AICc):");
            text.Append(table.Render());
        }

        output.Write(text);
    }

    private static string LatentTable(VapourPressureFit fit, VolumeChangeModel model, IReadOnlyList<LatentHeatPoint> points, LatentBandText? band)
    {
        var text = new StringBuilder();
        text.AppendLine($"enthalpy of vaporization by Clapeyron, dH = T dv dP/dT: dP/dT from the {fit.Form.Id} fit, dv from {VolumeModelId(model)}");
        text.AppendLine($"data range {NumberText.Table(fit.MinimumTemperature)} to {NumberText.Table(fit.MaximumTemperature)} K; rows marked * are extrapolated");
        text.AppendLine();
        var table = new TextTable(["T [K]", "P [kPa]", "dZ", "dH_vap [J/mol]", "u(dH) [J/mol]", "u fit", "u Tc,Pc", "u dv", ""], [true, true, true, true, true, true, true, true, false]);
        foreach (var p in points)
        {
            table.Add(NumberText.Table(p.Temperature), NumberText.Table(UnitFormatter.Pressure(p.Pressure, UnitSystem.Si)), NumberText.Table(p.CompressibilityChange),
                NumberText.Table(p.EnthalpyOfVaporization), NumberText.UncertaintyOrUndefined(p.StandardUncertainty),
                NumberText.UncertaintyOrUndefined(p.FitUncertainty), NumberText.Uncertainty(p.CriticalPointUncertainty), NumberText.UncertaintyOrUndefined(p.VolumeModelUncertainty),
                (p.BandHeldAtDataEnd ? "+" : "") + (p.Extrapolated ? "*" : ""));
        }

        text.Append(table.Render());
        foreach (var finding in points.Select(p => p.Finding).OfType<string>())
        {
            text.AppendLine($"finding: {finding}");
        }

        text.AppendLine();
        text.AppendLine($"u(dH) is the standard uncertainty ({band?.MethodName ?? "linear"}) from the fit covariance (u fit), the uncertainty of Tc and Pc where the form or the volume model uses them (u Tc,Pc)");
        text.AppendLine("and the volume model (u dv; see docs/uncertainty.md); rows marked + are outside the data, with the band held at that of the nearest data end.");
        if (band is not null)
        {
            foreach (var input in band.Inputs)
            {
                text.AppendLine($"  {input.Name} = {NumberText.Given(input.Value)} +/- {NumberText.Given(input.StandardUncertainty)}: {input.UncertaintySource}");
            }
        }
        if (!fit.CovarianceDefined)
        {
            text.AppendLine($"u(dH) undefined: {CovarianceUndefined}");
        }

        text.AppendLine(CoexistenceWriter.Caution);
        return text.ToString();
    }
}
