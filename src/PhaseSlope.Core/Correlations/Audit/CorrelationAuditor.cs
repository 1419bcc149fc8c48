using System.Globalization;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Correlations.Audit;

/// <summary>What to audit: a published correlation, the parts of its convention that are stated,
/// and what is known to test it against.</summary>
public sealed record AuditRequest
{
    /// <summary>The correlation as printed.</summary>
    public required PublishedCorrelation Correlation { get; init; }

    /// <summary>The stated log base, or null to detect it (e only for the Wagner forms).</summary>
    public LogBase? LogBase { get; init; }

    /// <summary>The stated pressure unit, or null to detect it.</summary>
    public PublishedPressureUnit? PressureUnit { get; init; }

    /// <summary>The stated temperature scale, or null to detect it (K or degC); only an absolute
    /// scale (K, degR) for the forms with 1/T or log T terms (<see cref="PublishedCorrelation.Refusal"/>).</summary>
    public PublishedTemperatureUnit? TemperatureUnit { get; init; }

    /// <summary>The stated range of validity (K), or null for the data's range, else the default range for the fluid.</summary>
    public (double Minimum, double Maximum)? Range { get; init; }

    /// <summary>Measured vapour pressures, or null.</summary>
    public IReadOnlyList<VapourPressurePoint>? Data { get; init; }

    /// <summary>The fluid (normal boiling point, Tc), or null.</summary>
    public Fluid? Fluid { get; init; }

    /// <summary>The fluid's coexistence solver (model vapour pressure and ΔZ), or null.</summary>
    public CoexistenceSolver? Solver { get; init; }

    /// <summary>A second correlation to compare with, or null.</summary>
    public PublishedCorrelation? Against { get; init; }

    /// <summary>The second correlation's convention; null parts take the first's.</summary>
    public LogBase? AgainstLogBase { get; init; }

    /// <summary>The second correlation's pressure unit, or null for the first's.</summary>
    public PublishedPressureUnit? AgainstPressureUnit { get; init; }

    /// <summary>The second correlation's temperature scale, or null for the first's.</summary>
    public PublishedTemperatureUnit? AgainstTemperatureUnit { get; init; }

    /// <summary>Relative difference in P above which the two correlations disagree (default 0.01).</summary>
    public double AgainstThreshold { get; init; } = 0.01;
}

/// <summary>Audits a published vapour-pressure correlation: detects or confirms its convention,
/// converts it exactly to SI, and checks it against data, the model, the Clapeyron latent heat,
/// the Waring criterion, its behaviour at the edges of its range and a second correlation.</summary>
/// <remarks>
/// <para><b>Detection.</b> Every convention the request leaves open is a candidate (degF and
/// degR only when stated). Each is scored against the anchors that are known: the normal boiling
/// point (P = 101325 Pa at Tb), the model's vapour pressure over the range (RMS in ln P) and the
/// data (RMS in ln P), on two scales (docs/audit.md gives the reasoning):</para>
/// <list type="bullet">
/// <item>the <b>score</b>, RMS of deviation/σ, with σ the spread a right reading may show, the
/// correlation's own error included: 0.01 in ln P at Tb (a handbook correlation reproduces its
/// fluid's Tb to a fraction of a percent inside its range and to about 1 % when modestly
/// extrapolated), 0.25 for the model (a generalised cubic equation errs by a few percent for
/// non-polar fluids and by about 25 % for water near its triple point) and 0.01 for data;</item>
/// <item>the <b>separation</b>, RMS of max(|deviation|, u)/u, with u the anchor's own standard
/// uncertainty in ln P: at Tb, u(Tb)·ΔS/(R·Tb) with u(Tb) the fluid's stated uncertainty (else
/// <see cref="DefaultBoilingPointUncertainty"/>) and ΔS = <see cref="TroutonEntropy"/> (Trouton's
/// rule, common practice, for d ln P/dT at Tb); 0.25 for the model; for data, the RMS of their
/// stated u(P)/P, else 0.01. A deviation inside an anchor's uncertainty counts as that
/// uncertainty: a candidate within every anchor's uncertainty has separation 1.</item>
/// </list>
/// <para>The best candidate is the one with the lowest score; it must score below
/// <see cref="InconsistentScore"/> (else no candidate is consistent with what is known). It is
/// accepted only when every other candidate is clearly worse on one of the two scales: a score at
/// least <see cref="AmbiguityRatio"/> times the best's and above 1 (worse beyond the correlation's
/// own expected error), or a separation at least <see cref="SeparationRatio"/> times the best's
/// (a deviation that many times larger at an anchor known well enough to tell; the ratio keeps the
/// rule free of the correlation's unknown error, which the best reading's deviation estimates).
/// Two readings both within the anchors' uncertainty have separations 1 and 1 and scores below
/// 1: a real tie, refused. With no anchor at all there is nothing to decide on.</para>
/// <para><b>Thresholds</b> are given with each check below.</para>
/// </remarks>
public static class CorrelationAuditor
{
    /// <summary>Points on the audit grid over the range.</summary>
    public const int GridPoints = 41;

    /// <summary>ln P spread a right reading may show at the normal boiling point (see remarks).</summary>
    public const double BoilingPointSigma = 0.01;

    /// <summary>Standard uncertainty of a normal boiling point whose fluid states none, K: catalog
    /// values are quoted to 0.01 K from handbooks, and compilations of a well-studied fluid agree to
    /// a few hundredths of a kelvin (from memory); 0.05 K is about a tenth of what separates the bar
    /// and atm readings of a correlation at Tb (ln(1.01325)·R·Tb/ΔS ≈ 0.44 K for benzene).</summary>
    public const double DefaultBoilingPointUncertainty = 0.05;

    /// <summary>Entropy of vaporization at the normal boiling point by Trouton's rule, J/(mol·K)
    /// (common practice: 85–90 for non-polar liquids): gives d ln P/dT ≈ ΔS/(R·Tb) at Tb, which
    /// turns u(Tb) into an uncertainty in ln P without depending on any candidate.</summary>
    public const double TroutonEntropy = 88;

    /// <summary>A candidate whose score is at least this many times the best's (and above 1) is clearly worse (see remarks).</summary>
    public const double AmbiguityRatio = 2;

    /// <summary>A candidate whose separation is at least this many times the best's is clearly worse
    /// (see remarks): a five-fold larger deviation, at an anchor known well enough to tell.</summary>
    public const double SeparationRatio = 5;

    /// <summary>ln P spread the model is trusted to (see remarks).</summary>
    public const double ModelSigma = 0.25;

    /// <summary>ln P spread data are trusted to (see remarks).</summary>
    public const double DataSigma = 0.01;

    /// <summary>Best score above which no candidate is consistent.</summary>
    public const double InconsistentScore = 5;

    /// <summary>The default range when none is stated and no data are given: from 0.8·Tb (not
    /// below the model's lowest valid temperature) to Tb, about where printed Antoine sets are
    /// fitted; without Tb, 0.5–0.7 Tc.</summary>
    public static (double Minimum, double Maximum) DefaultRange(Fluid fluid, double lowestValid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        double tc = fluid.CriticalTemperature.Value;
        return fluid.NormalBoilingPoint?.Value is double tb
            ? (Math.Max(0.8 * tb, lowestValid), tb)
            : (Math.Max(0.5 * tc, lowestValid), 0.7 * tc);
    }

    /// <summary>Largest |ln(P/Pa)| whose exponential is a finite double (ln of double.MaxValue is
    /// 709.78); a correlation beyond it anywhere on the range cannot give a pressure.</summary>
    private const double MaximumAbsoluteLnPressure = 709.78;

    /// <summary>Refuses coefficients that overflow: in no candidate convention does any point of
    /// the audit range give a representable pressure (finite SI coefficients and |ln P| within
    /// double precision). Such a correlation would otherwise pass checks made of NaN and infinity
    /// comparisons. A single pole inside the range (an Antoine T = −C) is not an overflow: the
    /// pole check reports it.</summary>
    private static void RequireRepresentable(PublishedCorrelation correlation, IEnumerable<PublishedConvention> conventions, double[] grid, string what)
    {
        (PublishedConvention Convention, double T, double LnP)? first = null;
        foreach (var convention in conventions)
        {
            var (form, si) = correlation.ToSi(convention);
            foreach (double t in grid)
            {
                double lnP = si.All(double.IsFinite) ? form.LnPressure(t, si) : double.NaN;
                if (Math.Abs(lnP) <= MaximumAbsoluteLnPressure)
                {
                    return;
                }

                first ??= (convention, t, lnP);
            }
        }

        if (first is var (c, at, value))
        {
            string coefficients = string.Join(", ", correlation.Coefficients.Select(Preconditions.Format));
            throw new InvalidInputException("coefficients", value,
                $"the {what}'s {correlation.FormId} coefficients {coefficients} overflow: no pressure on the range is representable (read as {c} they give ln(P/Pa) = {Preconditions.Format(value)} at {Preconditions.Format(at)} K; double precision needs |ln P| <= 709.78)");
        }
    }

    /// <summary>Runs the audit.</summary>
    /// <exception cref="ArgumentException">No range can be set (no range, data or fluid), a bad range,
    /// or a stated log base or scale the form (or the second correlation's) does not admit.</exception>
    /// <exception cref="InvalidInputException">Coefficients that overflow (no finite pressure on the
    /// range), or a Wagner Tc or Pc that is not positive in any candidate reading.</exception>
    public static AuditReport Audit(AuditRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var (tMin, tMax) = ResolveRange(request);
        double[] grid = [.. Enumerable.Range(0, GridPoints).Select(i => i == GridPoints - 1 ? tMax : tMin + (tMax - tMin) * i / (GridPoints - 1))];
        RequireRepresentable(request.Correlation, Candidates(request), grid, "correlation");
        if (request.Against is PublishedCorrelation against)
        {
            RequireRepresentable(against, [.. Candidates(request).Select(c => SecondConvention(request, c)).Distinct()], grid, "second correlation");
        }

        var model = ModelPoints(request.Solver, grid);
        double? tb = request.Fluid?.NormalBoilingPoint?.Value;
        double? tc = request.Fluid?.CriticalTemperature.Value;

        var findings = new List<AuditFinding>();
        double tbUncertainty = request.Fluid?.NormalBoilingPoint?.StandardUncertainty ?? DefaultBoilingPointUncertainty;
        var candidates = Candidates(request).Select(c => Score(request.Correlation, c, tb, tbUncertainty, model, request.Data)).OrderBy(c => c.Score).ToList();
        bool detected = candidates.Count > 1;
        ConventionCandidate? best = candidates[0];
        ConventionCandidate? runnerUp = candidates.Count > 1 ? candidates[1] : null;
        PublishedConvention? convention = best.Convention;
        if (detected)
        {
            if (best.Evidence.Count == 0)
            {
                findings.Add(new("convention", AuditSeverity.Fail,
                    $"the convention is not fully stated and there is nothing to test the {candidates.Count} candidate conventions against (give --fluid or --data, or state --log-base, --correlation-pressure-unit and --correlation-temperature-unit): "
                    + "refusing to guess, since a wrong log base or unit changes pressures by orders of magnitude"));
                convention = null;
            }
            else if (best.Score > InconsistentScore)
            {
                findings.Add(new("convention", AuditSeverity.Fail,
                    $"no candidate convention is consistent with what is known: the best, {best.Convention}, deviates by {EvidenceText(best)}; the coefficients or the form may be wrong"));
                convention = null;
            }
            else if (candidates.Skip(1).FirstOrDefault(c => !ClearlyWorse(c, best)) is ConventionCandidate rival)
            {
                runnerUp = rival;
                findings.Add(new("convention", AuditSeverity.Fail,
                    $"ambiguous: {best.Convention} (score {Fmt(best.Score)}, separation {Fmt(best.Separation)}: {EvidenceText(best)}) and {rival.Convention} (score {Fmt(rival.Score)}, separation {Fmt(rival.Separation)}: {EvidenceText(rival)}) are about equally plausible "
                    + $"(the other must score at least {Fmt(AmbiguityRatio)} times worse and above 1, or deviate at least {Fmt(SeparationRatio)} times as far in units of each anchor's own uncertainty); refusing to guess: state the convention from the source"));
                convention = null;
            }
            else
            {
                findings.Add(new("convention", AuditSeverity.Warn,
                    $"inferred, not stated: {best.Convention} (score {Fmt(best.Score)}: {EvidenceText(best)}; separation {Fmt(best.Separation)}); runner-up {runnerUp!.Convention} (score {Fmt(runnerUp.Score)}: {EvidenceText(runnerUp)}; separation {Fmt(runnerUp.Separation)}); confirm the convention in the source before using the correlation"));
            }
        }
        else
        {
            findings.Add(new("convention", AuditSeverity.Pass, $"stated: {best.Convention}"));
        }

        if (convention is null)
        {
            return new AuditReport { Convention = null, Detected = detected, Best = best, RunnerUp = runnerUp, SiCoefficients = null, MinimumTemperature = tMin, MaximumTemperature = tMax, Findings = findings };
        }

        var (form, si) = request.Correlation.ToSi(convention);
        if (request.Data is { Count: > 0 } data)
        {
            findings.Add(DataCheck(form, si, data));
        }

        if (tb is double boil)
        {
            findings.Add(BoilingPointCheck(form, si, boil, tMin, tMax));
        }

        if (request.Fluid is not null)
        {
            findings.Add(ModelCheck(form, si, model));
        }

        if (form is AntoineForm or ExtendedAntoineForm)
        {
            findings.Add(PoleCheck(si, tMin, tMax));
        }

        findings.AddRange(LatentHeatChecks(form, si, grid, model, tc));
        findings.Add(CriticalCheck(form, tMax, tc));
        if (request.Against is not null)
        {
            var second = SecondConvention(request, convention);
            findings.Add(AgainstCheck(form, si, request.Against, second, grid, request.AgainstThreshold));
        }

        return new AuditReport { Convention = convention, Detected = detected, Best = best, RunnerUp = runnerUp, SiCoefficients = si, MinimumTemperature = tMin, MaximumTemperature = tMax, Findings = findings };
    }

    /// <summary>Whether a candidate is clearly worse than the best on either scale (see remarks).</summary>
    private static bool ClearlyWorse(ConventionCandidate candidate, ConventionCandidate best)
        => candidate.Score >= Math.Max(AmbiguityRatio * best.Score, 1) || candidate.Separation >= SeparationRatio * best.Separation;

    private static (double, double) ResolveRange(AuditRequest request)
    {
        (double lo, double hi) = request.Range
            ?? (request.Data is { Count: > 0 } d ? (d.Min(p => p.Temperature), d.Max(p => p.Temperature))
            : request.Fluid is not null ? DefaultRange(request.Fluid, request.Solver?.MinimumTemperature ?? 0)
            : throw new ArgumentException("no temperature range: give a range, data or a fluid", nameof(request)));
        if (!(lo > 0) || !(hi > lo) || !double.IsFinite(hi))
        {
            throw new ArgumentException($"the range must be 0 < Tmin < Tmax, got {Fmt(lo)} K to {Fmt(hi)} K", nameof(request));
        }

        return (lo, hi);
    }

    /// <summary>The second correlation's convention: each part stated for it, else the first's
    /// where the second's form admits it, else the nearest it admits (log base e for a Wagner form,
    /// K for an absolute-temperature form beside a Celsius or Fahrenheit Antoine set).</summary>
    private static PublishedConvention SecondConvention(AuditRequest request, PublishedConvention first)
    {
        string id = request.Against!.FormId;
        var logBase = request.AgainstLogBase ?? (PublishedCorrelation.Refusal(id, first.LogBase, null) is null ? first.LogBase : LogBase.E);
        var scale = request.AgainstTemperatureUnit ?? (PublishedCorrelation.Refusal(id, null, first.TemperatureUnit) is null ? first.TemperatureUnit : PublishedTemperatureUnit.Kelvin);
        var convention = new PublishedConvention(logBase, request.AgainstPressureUnit ?? first.PressureUnit, scale);
        return PublishedCorrelation.Refusal(id, convention.LogBase, convention.TemperatureUnit) is string why
            ? throw new ArgumentException($"second correlation: {why}", nameof(request))
            : convention;
    }

    private static List<PublishedConvention> Candidates(AuditRequest request)
    {
        var correlation = request.Correlation;
        if (PublishedCorrelation.Refusal(correlation.FormId, request.LogBase, request.TemperatureUnit) is string why)
        {
            throw new ArgumentException(why, nameof(request));
        }

        LogBase[] bases = request.LogBase is LogBase b ? [b] : [LogBase.Ten, LogBase.E];
        PublishedPressureUnit[] units = request.PressureUnit is PublishedPressureUnit u ? [u] : [.. PublishedConvention.PressureUnits];
        PublishedTemperatureUnit[] scales = request.TemperatureUnit is PublishedTemperatureUnit t ? [t] : [.. PublishedConvention.DetectedTemperatureUnits];
        var candidates = new List<PublishedConvention>();
        InvalidInputException? invalid = null;
        foreach (var lb in bases)
        {
            foreach (var pu in units)
            {
                foreach (var tu in scales)
                {
                    var convention = new PublishedConvention(lb, pu, tu);
                    if (!correlation.Admits(convention))
                    {
                        continue; // a part left open takes only the values the form admits
                    }

                    try
                    {
                        _ = correlation.ToSi(convention);
                        candidates.Add(convention);
                    }
                    catch (InvalidInputException ex)
                    {
                        invalid ??= ex; // a Wagner Tc or Pc that is not positive in this reading
                    }
                }
            }
        }

        return candidates.Count > 0
            ? candidates
            : throw invalid ?? new InvalidInputException("coefficients", double.NaN, $"no convention can be read for the {correlation.FormId} form");
    }

    private sealed record ModelPoint(double Temperature, double LnPressure, double CompressibilityChange);

    private static List<ModelPoint> ModelPoints(CoexistenceSolver? solver, double[] grid)
    {
        var points = new List<ModelPoint>();
        if (solver is null)
        {
            return points;
        }

        foreach (double t in grid)
        {
            if (t >= solver.MinimumTemperature && t < solver.CriticalTemperature && solver.TryAtTemperature(t, out var p))
            {
                points.Add(new ModelPoint(t, Math.Log(p!.Pressure), p.CompressibilityChange));
            }
        }

        return points;
    }

    private static ConventionCandidate Score(PublishedCorrelation correlation, PublishedConvention convention, double? tb, double tbUncertainty, List<ModelPoint> model, IReadOnlyList<VapourPressurePoint>? data)
    {
        var (form, si) = correlation.ToSi(convention);
        var evidence = new List<AnchorDeviation>();
        if (tb is double boil)
        {
            // u(ln P) = (d ln P/dT)·u(Tb), the slope by Trouton's rule (see remarks).
            double u = TroutonEntropy / (Constants.GasConstant * boil) * tbUncertainty;
            evidence.Add(new("normal boiling point", form.LnPressure(boil, si) - Math.Log(Constants.StandardAtmosphere), BoilingPointSigma, u));
        }

        if (model.Count > 0)
        {
            evidence.Add(new("model", Rms(model.Select(m => form.LnPressure(m.Temperature, si) - m.LnPressure)), ModelSigma, ModelSigma));
        }

        if (data is { Count: > 0 })
        {
            double u = data.All(d => d.StandardUncertainty is > 0) ? Rms(data.Select(d => d.StandardUncertainty!.Value / d.Pressure)) : DataSigma;
            evidence.Add(new("data", Rms(data.Select(d => form.LnPressure(d.Temperature, si) - Math.Log(d.Pressure))), DataSigma, u));
        }

        double score = evidence.Count == 0 ? 0 : Math.Sqrt(evidence.Average(e => Math.Pow(e.LnDeviation / e.Sigma, 2)));
        double separation = evidence.Count == 0 ? 1 : Math.Sqrt(evidence.Average(e => Math.Pow(Math.Max(Math.Abs(e.LnDeviation), e.Uncertainty) / e.Uncertainty, 2)));
        return new ConventionCandidate(convention, double.IsFinite(score) ? score : double.PositiveInfinity, evidence,
            double.IsFinite(separation) ? separation : double.PositiveInfinity);
    }

    private static double Rms(IEnumerable<double> values)
    {
        var list = values.ToList();
        double s = Math.Sqrt(list.Average(v => v * v));
        return list.Any(v => !double.IsFinite(v)) ? double.PositiveInfinity : s;
    }

    // Data: pass below 1 % (a correlation should match the data it is meant to represent to
    // about their scatter), warn below 5 %, fail beyond (a factor that size is a wrong
    // convention or a wrong fluid, not scatter).
    private static AuditFinding DataCheck(VapourPressureForm form, double[] si, IReadOnlyList<VapourPressurePoint> data)
    {
        var worst = data.Select(d => (d.Temperature, Dev: Math.Exp(form.LnPressure(d.Temperature, si) - Math.Log(d.Pressure)) - 1)).MaxBy(x => Math.Abs(x.Dev));
        double pct = 100 * Math.Abs(worst.Dev);
        var sev = !double.IsFinite(pct) || pct >= 5 ? AuditSeverity.Fail : pct >= 1 ? AuditSeverity.Warn : AuditSeverity.Pass;
        return new("data-deviation", sev,
            $"largest deviation from the {data.Count} data points is {Signed(100 * worst.Dev)} % at {Fmt(worst.Temperature)} K (pass below 1 %, warn below 5 %)"
            + (sev == AuditSeverity.Fail ? "; pressures this far off would mislead a vessel or relief calculation: check the convention and use measured data" : ""));
    }

    // Normal boiling point: pass below 1 %, warn below 5 % (a correlation extrapolated well
    // beyond its range may drift that far), fail beyond.
    private static AuditFinding BoilingPointCheck(VapourPressureForm form, double[] si, double tb, double tMin, double tMax)
    {
        double dev = 100 * (Math.Exp(form.LnPressure(tb, si)) / Constants.StandardAtmosphere - 1);
        var sev = !double.IsFinite(dev) || Math.Abs(dev) >= 5 ? AuditSeverity.Fail : Math.Abs(dev) >= 1 ? AuditSeverity.Warn : AuditSeverity.Pass;
        string where = tb >= tMin && tb <= tMax ? "inside the range" : "outside the range (extrapolated)";
        return new("boiling-point", sev,
            $"at the normal boiling point {Fmt(tb)} K ({where}) the correlation gives {Fmt(Math.Exp(form.LnPressure(tb, si)))} Pa, {Signed(dev)} % from 101325 Pa (pass below 1 %, warn below 5 %)"
            + (sev == AuditSeverity.Fail ? "; a deviation this large points to a wrong log base or unit: do not use it for vessel or relief pressures" : ""));
    }

    // Model: wider than the data thresholds since the cubic model itself errs (a few percent for
    // non-polar fluids, about 25 % for Peng-Robinson water near 0 °C): pass up to 30 %, warn up to 60 %, fail
    // beyond (a wrong unit or base is a factor of 1.3 or more, usually orders of magnitude).
    private static AuditFinding ModelCheck(VapourPressureForm form, double[] si, List<ModelPoint> model)
    {
        if (model.Count == 0)
        {
            return new("model-deviation", AuditSeverity.Warn, "the range lies outside the model's coexistence range: no comparison with the model");
        }

        var worst = model.Select(m => (m.Temperature, Dev: Math.Exp(form.LnPressure(m.Temperature, si) - m.LnPressure) - 1)).MaxBy(x => Math.Abs(x.Dev));
        double pct = 100 * Math.Abs(worst.Dev);
        var sev = !double.IsFinite(pct) || pct > 60 ? AuditSeverity.Fail : pct > 30 ? AuditSeverity.Warn : AuditSeverity.Pass;
        return new("model-deviation", sev,
            $"largest deviation from the model's vapour pressure over the range is {Signed(100 * worst.Dev)} % at {Fmt(worst.Temperature)} K (pass up to 30 %, warn up to 60 %: the model itself errs by a few percent for non-polar fluids and by about 25 % for water near 0 degC)"
            + (sev == AuditSeverity.Fail ? "; the correlation as declared gives pressures far from any plausible value: check the convention and defer to measured data" : ""));
    }

    // Antoine pole at T = −C: fail inside the range or within 10 % below its lower limit (the
    // curve bends sharply there), warn within 30 %, pass otherwise.
    private static AuditFinding PoleCheck(double[] si, double tMin, double tMax)
    {
        double pole = -si[2];
        if (pole <= 0)
        {
            return new("pole", AuditSeverity.Pass, $"the Antoine pole T = -C lies at {Fmt(pole)} K, not a physical temperature");
        }

        var sev = pole >= 0.9 * tMin ? AuditSeverity.Fail : pole >= 0.7 * tMin ? AuditSeverity.Warn : AuditSeverity.Pass;
        string place = pole >= tMin && pole <= tMax ? "inside the range" : pole > tMax ? "above the range" : $"{Fmt(100 * (1 - pole / tMin))} % below the lower limit";
        return new("pole", sev,
            $"the Antoine pole T = -C lies at {Fmt(pole)} K, {place} (fail above 0.9 Tmin, warn above 0.7 Tmin)"
            + (sev == AuditSeverity.Pass ? "" : "; near the pole ln P runs away, and extrapolating toward it gives meaningless pressures"));
    }

    private static IEnumerable<AuditFinding> LatentHeatChecks(VapourPressureForm form, double[] si, double[] grid, List<ModelPoint> model, double? tc)
    {
        var dz = model.ToDictionary(m => m.Temperature, m => m.CompressibilityChange);
        string dzText = model.Count > 0 ? "with the model's compressibility change" : "with an ideal-gas vapour (dZ = 1)";
        // Reduced = ΔH/ΔZ = R T² d ln P/dT (Waring's quantity); H = ΔH with the model's ΔZ.
        var rows = grid.Select(t => (T: t, Slope: form.Slope(t, si), Dz: dz.TryGetValue(t, out double z) ? z : 1.0))
            .Select(r => (r.T, Reduced: ClapeyronEquation.EnthalpyOfVaporization(r.T, r.Slope, 1), H: ClapeyronEquation.EnthalpyOfVaporization(r.T, r.Slope, r.Dz))).ToList();

        var negative = rows.Where(r => !(r.H > 0)).ToList();
        if (negative.Count > 0)
        {
            yield return new("latent-heat-positive", AuditSeverity.Fail,
                $"the Clapeyron latent heat {dzText} is zero or negative from {Fmt(negative[0].T)} K to {Fmt(negative[^1].T)} K ({Fmt(negative[0].H)} J/mol at {Fmt(negative[0].T)} K): "
                + "vapour pressure must rise with temperature, so this correlation is wrong there and must not be used");
        }
        else
        {
            yield return new("latent-heat-positive", AuditSeverity.Pass,
                $"the Clapeyron latent heat {dzText} is positive over the range, {Fmt(rows[^1].H / 1000)} to {Fmt(rows[0].H / 1000)} kJ/mol");

            // Positive but absurd: the Trouton-type bound of the latent-heat estimator, applied by
            // the same code (a wrong log base or a mis-scaled B gives a positive slope many times too steep).
            var absurd = rows.Select(r => (r.T, Finding: LatentHeatEstimator.ImplausibilityFinding(r.T, r.H))).FirstOrDefault(r => r.Finding is not null);
            yield return absurd.Finding is string finding
                ? new("latent-heat-magnitude", AuditSeverity.Fail,
                    $"{finding}, {dzText}: the correlation's slope is far too steep there; any latent heat or relief rate derived from it would be wrong")
                : new("latent-heat-magnitude", AuditSeverity.Pass,
                    $"dH/T stays below {Fmt(LatentHeatEstimator.MaximumEntropyOfVaporization)} J/(mol K) over the range (a Trouton-type bound, common practice)");

            // Decreasing and smooth: a rise, or a step of more than 20 % between neighbouring grid
            // points (a 2.5 % step of the range), is not how a latent heat behaves below Tc.
            var rise = rows.Zip(rows.Skip(1)).FirstOrDefault(p => p.Second.H > p.First.H);
            var jump = rows.Zip(rows.Skip(1)).FirstOrDefault(p => Math.Abs(p.Second.H / p.First.H - 1) > 0.2);
            if (rise != default)
            {
                yield return new("latent-heat-trend", AuditSeverity.Warn, $"the latent heat rises with temperature from {Fmt(rise.First.T)} K ({Fmt(rise.First.H)} to {Fmt(rise.Second.H)} J/mol); a real latent heat falls toward zero at Tc");
            }
            else if (jump != default)
            {
                yield return new("latent-heat-trend", AuditSeverity.Warn, $"the latent heat changes by more than 20 % between {Fmt(jump.First.T)} and {Fmt(jump.Second.T)} K: not smooth");
            }
            else
            {
                yield return new("latent-heat-trend", AuditSeverity.Pass, "the latent heat decreases smoothly with temperature over the range");
            }
        }

        // Waring (Ind. Eng. Chem. 46, 762 (1954)): dH/dZ = R T² d ln P/dT decreases with T below
        // about Tr = 0.8.
        var below = tc is double c ? rows.Where(r => r.T < 0.8 * c).ToList() : rows;
        if (below.Count < 2)
        {
            yield return new("waring", AuditSeverity.Pass, "the range lies above Tr = 0.8, where the Waring criterion does not apply");
            yield break;
        }

        var up = below.Zip(below.Skip(1)).FirstOrDefault(p => p.Second.Reduced > p.First.Reduced);
        if (up == default)
        {
            yield return new("waring", AuditSeverity.Pass, $"dH/dZ = R T^2 dlnP/dT decreases with T {(tc is null ? "over the range" : "below Tr = 0.8")} (Waring 1954)");
        }
        else
        {
            yield return new("waring", tc is null ? AuditSeverity.Warn : AuditSeverity.Fail,
                $"dH/dZ = R T^2 dlnP/dT rises with T from {Fmt(up.First.T)} K, against the Waring criterion (it must fall below Tr = 0.8)"
                + (tc is null ? "; without a fluid Tc is unknown and the range may extend above Tr = 0.8, so this is a warning" : "; the correlation's slope, and any latent heat or relief rate derived from it, is unreliable there"));
        }
    }

    // Toward Tc: fail at or above Tc, warn above 0.85 Tc (printed correlations are fitted
    // well below Tc and the Antoine and Clausius–Clapeyron forms cannot bend toward it).
    private static AuditFinding CriticalCheck(VapourPressureForm form, double tMax, double? tc)
    {
        bool rigid = form is AntoineForm or ClausiusClapeyronForm;
        string rigidText = rigid ? $"; the {form.Id} form's latent heat cannot fall to zero at Tc, so it overestimates the slope there" : "";
        if (tc is not double c)
        {
            return new("near-critical", AuditSeverity.Warn, "no fluid given: the range could not be compared with the critical temperature" + rigidText);
        }

        double tr = tMax / c;
        if (tr >= 1)
        {
            return new("near-critical", AuditSeverity.Fail, $"the range reaches {Fmt(tMax)} K, at or above Tc = {Fmt(c)} K, where there is no vapour pressure");
        }

        return tr > 0.85
            ? new("near-critical", AuditSeverity.Warn, $"the range reaches Tr = {Fmt(tr)}, above 0.85, where printed correlations lose accuracy{rigidText}; defer to measured data there")
            : new("near-critical", AuditSeverity.Pass, $"the range ends at Tr = {Fmt(tr)}, below 0.85");
    }

    // Second correlation: warn where they differ by more than the threshold, fail where they
    // differ by more than five times it (5 % by default: then at least one is misapplied).
    private static AuditFinding AgainstCheck(VapourPressureForm form, double[] si, PublishedCorrelation other, PublishedConvention convention, double[] grid, double threshold)
    {
        var (otherForm, otherSi) = other.ToSi(convention);
        var devs = grid.Select(t => (T: t, Dev: Math.Exp(form.LnPressure(t, si) - otherForm.LnPressure(t, otherSi)) - 1)).ToList();
        var outside = devs.Where(d => !(Math.Abs(d.Dev) <= threshold)).ToList();
        var worst = devs.MaxBy(d => Math.Abs(d.Dev));
        if (outside.Count == 0)
        {
            return new("against", AuditSeverity.Pass, $"agrees with the second correlation ({other.FormId}, {convention}) within {Fmt(100 * threshold)} % over the range (largest difference {Signed(100 * worst.Dev)} % at {Fmt(worst.T)} K)");
        }

        var sev = !(Math.Abs(worst.Dev) <= 5 * threshold) ? AuditSeverity.Fail : AuditSeverity.Warn;
        return new("against", sev,
            $"differs from the second correlation ({other.FormId}, {convention}) by more than {Fmt(100 * threshold)} % from {Fmt(outside[0].T)} K to {Fmt(outside[^1].T)} K (largest {Signed(100 * worst.Dev)} % at {Fmt(worst.T)} K; fail beyond {Fmt(500 * threshold)} %); "
            + "at most one of them is right there: use measured data");
    }

    private static string EvidenceText(ConventionCandidate c)
        => string.Join(", ", c.Evidence.Select(e => $"{e.Anchor} {Signed(e.Percent)} %"));

    private static string Fmt(double v) => v.ToString("G4", CultureInfo.InvariantCulture);

    private static string Signed(double v) => (v >= 0 ? "+" : "") + Fmt(v);
}
