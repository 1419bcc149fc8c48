using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Core.Tuning;

/// <summary>What to tune: a starting fluid, the model, the alpha family and the measured vapour pressures.</summary>
public sealed record TuningRequest
{
    /// <summary>The fluid tuned (a catalog fluid, a fluid file, or one built from Tc, Pc and ω).</summary>
    public required Fluid BaseFluid { get; init; }

    /// <summary>The cubic model (Peng–Robinson or Soave–Redlich–Kwong family).</summary>
    public CubicModelKind Kind { get; init; } = CubicModelKind.PengRobinson;

    /// <summary>The alpha family; <see cref="AlphaForm.Default"/> chooses: the acentric factor
    /// for one point, Soave's m for two or three, Mathias–Copeman for four or more.</summary>
    public AlphaForm Form { get; init; } = AlphaForm.Default;

    /// <summary>The measured vapour pressures.</summary>
    public required IReadOnlyList<VapourPressurePoint> VapourPressures { get; init; }

    /// <summary>Measured saturated-liquid densities (mol/m³), to which a constant volume
    /// translation is fitted after the alpha function; empty for none.</summary>
    public IReadOnlyList<LiquidDensityPoint> LiquidDensities { get; init; } = [];

    /// <summary>Where the data came from (file name and checksum), for the provenance.</summary>
    public string DataOrigin { get; init; } = "data given in process";

    /// <summary>The date written into the provenance.</summary>
    public required DateOnly Date { get; init; }

    /// <summary>The tuned fluid's name, or null to keep the base fluid's.</summary>
    public string? Name { get; init; }
}

/// <summary>One measured vapour pressure against the model before and after tuning.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Measured">Measured P, Pa.</param>
/// <param name="Before">The base model's Psat, Pa.</param>
/// <param name="After">The tuned model's Psat, Pa.</param>
/// <param name="LatentHeatBefore">The base model's Δh_vap, J/mol.</param>
/// <param name="LatentHeatAfter">The tuned model's Δh_vap, J/mol.</param>
public sealed record TuningComparison(double Temperature, double Measured, double Before, double After, double LatentHeatBefore, double LatentHeatAfter)
{
    /// <summary>100·(Before/Measured − 1).</summary>
    public double DeviationBeforePercent => 100 * (Before / Measured - 1);

    /// <summary>100·(After/Measured − 1).</summary>
    public double DeviationAfterPercent => 100 * (After / Measured - 1);

    /// <summary>100·(ΔH after/ΔH before − 1).</summary>
    public double LatentHeatChangePercent => 100 * (LatentHeatAfter / LatentHeatBefore - 1);
}

/// <summary>The outcome of a tuning.</summary>
public sealed record TuningResult
{
    /// <summary>The tuned fluid (its file carries the parameters, covariance and provenance).</summary>
    public required Fluid Tuned { get; init; }

    /// <summary>The fluid before tuning.</summary>
    public required Fluid Base { get; init; }

    /// <summary>The model.</summary>
    public required CubicModelKind Kind { get; init; }

    /// <summary>What was tuned: <see cref="AlphaForm.Default"/> for the acentric factor, else the alpha family.</summary>
    public required AlphaForm Form { get; init; }

    /// <summary>The method, in words.</summary>
    public required string Method { get; init; }

    /// <summary>The parameter names and values (ω alone for one point).</summary>
    public required IReadOnlyList<(string Name, double Value, double? StandardError)> Parameters { get; init; }

    /// <summary>The least-squares fit (weights, χ², covariance), or null for one point.</summary>
    public VapourPressureFit? Fit { get; init; }

    /// <summary>Each data point before and after.</summary>
    public required IReadOnlyList<TuningComparison> Comparisons { get; init; }

    /// <summary>The volume translation fitted to the liquid densities, or null when none were given.</summary>
    public VolumeShiftFit? VolumeShift { get; init; }

    /// <summary>Whether α is convex over 0 &lt; T ≤ Tc (reported; required for Twu).</summary>
    public required bool Convex { get; init; }

    /// <summary>Mean |deviation| of P before tuning, %.</summary>
    public double AadBeforePercent => Comparisons.Average(c => Math.Abs(c.DeviationBeforePercent));

    /// <summary>Mean |deviation| of P after tuning, %.</summary>
    public double AadAfterPercent => Comparisons.Average(c => Math.Abs(c.DeviationAfterPercent));

    /// <summary>Largest |deviation| of P before tuning, %.</summary>
    public double MaximumBeforePercent => Comparisons.Max(c => Math.Abs(c.DeviationBeforePercent));

    /// <summary>Largest |deviation| of P after tuning, %.</summary>
    public double MaximumAfterPercent => Comparisons.Max(c => Math.Abs(c.DeviationAfterPercent));

    /// <summary>Largest |change| of Δh_vap over the data range, %.</summary>
    public double MaximumLatentHeatChangePercent => Comparisons.Max(c => Math.Abs(c.LatentHeatChangePercent));
}

/// <summary>Tunes a cubic model to measured vapour pressures: the acentric factor from one point,
/// or an alpha function's parameters from several, by weighted least squares in ln P with the
/// coexistence solver inside the objective (<see cref="TunedVapourPressureForm"/>).</summary>
public static class AlphaTuner
{
    /// <summary>The acentric factors searched for one point: from −0.2, where the Peng–Robinson and
    /// Soave κ(ω) are still positive (α decreasing), to 2, the fluid files' upper bound.</summary>
    public static readonly (double Lowest, double Highest) AcentricFactorRange = (-0.2, 2.0);

    /// <summary>Tunes.</summary>
    /// <exception cref="InvalidInputException">Too few points for the family, data outside the
    /// fluid's liquid–vapour range, no acentric factor in range reproduces the point, or the tuned
    /// alpha function is not positive and decreasing (convex for Twu) up to the data.</exception>
    public static TuningResult Tune(TuningRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var fluid = request.BaseFluid;
        var data = request.VapourPressures;
        if (data.Count == 0)
        {
            throw new InvalidInputException("data", 0, "no vapour pressures to tune to");
        }

        if (!request.Kind.Entry().AcceptsAlphaChoice)
        {
            throw new InvalidInputException("model", double.NaN, $"tuning applies to the Peng-Robinson and Soave-Redlich-Kwong models, not {request.Kind.Title()}");
        }

        double tc = fluid.CriticalTemperature.Value;
        double pc = fluid.CriticalPressure.Value;
        VapourPressureFitter.RequireBelowCriticalPoint(data, tc, pc);
        double lowestData = data.Min(d => d.Temperature);
        double highestData = data.Max(d => d.Temperature);
        double minimum;
        if (fluid.TriplePointTemperature?.Value is double triple)
        {
            if (lowestData < triple)
            {
                throw new InvalidInputException("temperature", lowestData,
                    $"the data point at {Preconditions.Format(lowestData)} K is below the triple point {Preconditions.Format(triple)} K of {fluid.Name}: there is no liquid there (a sublimation pressure?)");
            }

            minimum = triple;
        }
        else
        {
            minimum = Math.Min(CoexistenceSolver.LowestValidTemperature(fluid), lowestData);
        }

        var form = request.Form == AlphaForm.Default
            ? data.Count == 1 ? AlphaForm.Default : data.Count < 4 ? AlphaForm.Soave : AlphaForm.MathiasCopeman
            : request.Form;
        string date = request.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
        string range = data.Count == 1
            ? $"{Preconditions.Format(lowestData)} K"
            : $"{Preconditions.Format(lowestData)}-{Preconditions.Format(highestData)} K";
        string label = $"tuned by phaseslope tune to {data.Count} vapour pressure{(data.Count == 1 ? "" : "s")} ({range}; {request.DataOrigin}) on {date}";
        var baseModel = CubicModel.For(request.Kind, fluid);

        Fluid tuned;
        string method;
        VapourPressureFit? fit = null;
        IReadOnlyList<(string, double, double?)> parameters;
        bool convex;
        IReadOnlyList<CoexistencePoint>? tunedPoints = null;
        if (form == AlphaForm.Default)
        {
            if (data.Count != 1)
            {
                throw new InvalidInputException("data", data.Count, "the acentric factor is tuned to one point; with several, choose an alpha function (soave, twu or mathias-copeman)");
            }

            double omega = AcentricFactorFor(request.Kind, tc, pc, minimum, data[0]);
            method = $"acentric factor that reproduces the one vapour pressure with {request.Kind.Title()} (Brent's method)";
            tuned = fluid with
            {
                AcentricFactor = new SourcedValue(omega, label),
                PreferredAlpha = AlphaForm.Default,
            };
            parameters = [("omega", omega, null)];
            convex = true;
        }
        else
        {
            // Auto: Mathias–Copeman first; if its best fit bends α the wrong way somewhere below
            // the data (a cubic in √Tr can turn up at low T), Twu, then Soave's one parameter.
            AlphaForm[] candidates = request.Form != AlphaForm.Default ? [form]
                : form == AlphaForm.MathiasCopeman ? [AlphaForm.MathiasCopeman, AlphaForm.Twu, AlphaForm.Soave] : [form];
            var refused = new List<string>();
            TunableAlpha? family = null;
            convex = false;
            foreach (var candidate in candidates)
            {
                var trial = TunableAlpha.Of(candidate);
                var tunedForm = new TunedVapourPressureForm(request.Kind, trial, tc, pc, minimum, trial.Start(request.Kind, fluid.AcentricFactor.Value, tc));
                var trialFit = VapourPressureFitter.Fit(tunedForm, data);
                // Checked up to Tc, not only to the data: the tuned fluid is used on the whole line.
                var (violation, isConvex) = AlphaShape.Check(trial.Create(trialFit.Parameters, tc, label), tc, tc, trial.RequiresConvexity);
                if (violation is null)
                {
                    (form, family, fit, convex) = (candidate, trial, trialFit, isConvex);
                    break;
                }

                refused.Add($"the tuned {CubicModel.AlphaName(candidate)} parameters {string.Join(", ", trialFit.Parameters.Select(Preconditions.Format))} are refused: {violation} (0 < T <= Tc)");
            }

            if (family is null || fit is null)
            {
                throw new InvalidInputException("alpha parameters", double.NaN,
                    $"{string.Join("; ", refused)}; {(candidates.Length > 1 ? "no alpha function fits these data with a physical shape; check the data and Tc, Pc" : "try another alpha function or check the data")}");
            }

            var modelKind = request.Kind == CubicModelKind.SoaveRedlichKwong ? CubicModelKind.SoaveRedlichKwong : CubicModelKind.PengRobinson;
            var set = new AlphaParameterSet(form, modelKind, [.. fit.Parameters], label) { Covariance = fit.CovarianceDefined ? fit.Covariance : null };
            (var sensitivity, tunedPoints) = CriticalSensitivity(fluid, request.Kind, set, fit, minimum);
            set = set with { CriticalSensitivity = sensitivity };
            tuned = fluid with
            {
                AlphaParameters = [.. fluid.AlphaParameters.Where(s => !(s.Form == form && s.Model == modelKind)), set],
                PreferredAlpha = form,
            };
            method = $"{CubicModel.AlphaName(form)} alpha parameters {string.Join(", ", family.ParameterNames)} of {request.Kind.Title()} by weighted least squares in ln P "
                + $"(Levenberg-Marquardt, exact parameter gradient, coexistence solved at every point), {fit.Iterations} iterations"
                + (refused.Count > 0 ? $" (chosen after {string.Join("; ", refused)})" : "");
            var chosen = fit;
            parameters = [.. family.ParameterNames.Select((n, j) => (n, chosen.Parameters[j], chosen.CovarianceDefined ? (double?)Math.Sqrt(chosen.Covariance[j, j]) : null))];
        }

        var tunedModel = CubicModel.For(request.Kind, tuned);
        var sorted = data.OrderBy(d => d.Temperature).ToArray();
        VolumeShiftFit? shiftFit = null;
        if (request.LiquidDensities.Count > 0)
        {
            // After the alpha function: the translation leaves Psat and every phase difference as tuned.
            shiftFit = VolumeShiftTuner.Fit(tunedModel, request.LiquidDensities, minimum);
            var own = request.Kind == CubicModelKind.SoaveRedlichKwong ? CubicModelKind.SoaveRedlichKwong : CubicModelKind.PengRobinson;
            string shiftLabel = $"fitted by phaseslope tune to {request.LiquidDensities.Count} saturated-liquid densities ({request.DataOrigin}) on {date}; AAD of the liquid density "
                + string.Create(CultureInfo.InvariantCulture, $"{shiftFit.AadBeforePercent:0.###} % before, {shiftFit.AadAfterPercent:0.###} % after");
            tuned = tuned with
            {
                VolumeShifts = [.. tuned.VolumeShifts.Where(v => v.Model != own), new FluidVolumeShift(own, new SourcedValue(shiftFit.Shift, shiftLabel, shiftFit.StandardError))],
            };
        }

        var before = new CoexistenceSolver(baseModel, minimum);
        var beforePoints = CoexistenceCurve.Through(before, [.. sorted.Select(d => d.Temperature)]);
        // The tuned model's states at the data were solved once already for the sensitivity
        // (the same model, the same sorted temperatures); the acentric-factor route solves them here.
        var afterPoints = tunedPoints ?? CoexistenceCurve.Through(new CoexistenceSolver(tunedModel, minimum), [.. sorted.Select(d => d.Temperature)]);
        var comparisons = sorted.Select((d, i) => new TuningComparison(d.Temperature, d.Pressure, beforePoints[i].Pressure, afterPoints[i].Pressure,
            beforePoints[i].EnthalpyOfVaporization, afterPoints[i].EnthalpyOfVaporization)).ToArray();
        var result = new TuningResult
        {
            Tuned = tuned,
            Base = fluid,
            Kind = request.Kind,
            Form = form,
            Method = method,
            Parameters = parameters,
            Fit = fit,
            Comparisons = comparisons,
            Convex = convex,
            VolumeShift = shiftFit,
        };
        string statistics = string.Create(CultureInfo.InvariantCulture,
            $"AAD of P {result.AadBeforePercent:0.####} % before, {result.AadAfterPercent:0.####} % after; max {result.MaximumBeforePercent:0.####} % before, {result.MaximumAfterPercent:0.####} % after");
        if (fit is { ReducedChiSquare: double chi2 })
        {
            statistics += string.Create(CultureInfo.InvariantCulture, $"; reduced chi-square {chi2:G6}");
        }

        return result with
        {
            Tuned = tuned with
            {
                Name = request.Name ?? tuned.Name,
                Provenance = $"{label}; method: {method}; {statistics}",
            },
        };
    }

    /// <summary>∂θ/∂Tc and ∂θ/∂Pc of the weighted least-squares optimum: at the optimum
    /// J_θᵀW·r = 0; moving Tc or Pc (x) at fixed data, dθ/dx = −(J_θᵀWJ_θ)⁻¹·J_θᵀW·∂r/∂x, with
    /// every ∂ln Psat/∂(θ, Tc, Pc) exact from the coexistence conditions (<see cref="LinearPropagation.Sensitivities"/>).
    /// This is the Gauss–Newton form (the residual × second-derivative terms are dropped, as in
    /// the fit's covariance): exact for a fit through its data, off by about the size of the
    /// relative residuals otherwise (1.7e-3 for propane against its published equation).</summary>
    /// <returns>The sensitivity (p×2) and the tuned model's states at the data temperatures (in
    /// increasing temperature), which the before/after comparison reuses.</returns>
    private static (double[,] Sensitivity, IReadOnlyList<CoexistencePoint> Points) CriticalSensitivity(Fluid fluid, CubicModelKind kind, AlphaParameterSet set, VapourPressureFit fit, double minimum)
    {
        int p = set.Values.Count;
        var tuned = fluid with { AlphaParameters = [set], PreferredAlpha = set.Form };
        var hook = TunableAlpha.Uncertainty(set, set.Covariance ?? new double[p, p], fluid.CriticalTemperature.Value);
        var parameterization = new CubicParameterization(tuned, kind, set.Form, VolumeShiftRule.Fixed, 0, hook);
        var solver = new CoexistenceSolver(parameterization.Nominal, minimum);
        var points = CoexistenceCurve.Through(solver, [.. fit.Data.Select(d => d.Temperature)]);
        var jt = Matrix<double>.Build.Dense(points.Count, p);
        var jx = Matrix<double>.Build.Dense(points.Count, 2);
        for (int i = 0; i < points.Count; i++)
        {
            var s = LinearPropagation.Sensitivities(points[i], parameterization, atFixedPressure: false);
            double pressure = points[i].Pressure;
            for (int k = 0; k < p; k++)
            {
                jt[i, k] = s.Pressure[3 + k] / pressure;
            }

            jx[i, 0] = s.Pressure[0] / pressure;
            jx[i, 1] = s.Pressure[1] / pressure;
        }

        var jtw = jt.Transpose() * Matrix<double>.Build.Diagonal([.. fit.Weights]);
        var d = -(jtw * jt).Solve(jtw * jx);
        return (d.ToArray(), points);
    }

    /// <summary>The acentric factor that makes the model's own alpha function reproduce one vapour pressure.</summary>
    private static double AcentricFactorFor(CubicModelKind kind, double tc, double pc, double minimum, VapourPressurePoint point)
    {
        double Residual(double omega)
        {
            var solver = new CoexistenceSolver(CubicModel.For(kind, tc, pc, omega), minimum);
            return Math.Log(solver.AtTemperature(point.Temperature).Pressure / point.Pressure);
        }

        var (lowest, highest) = AcentricFactorRange;
        double atLowest = Residual(lowest);
        double atHighest = Residual(highest);
        if (Math.Sign(atLowest) == Math.Sign(atHighest))
        {
            throw new InvalidInputException("data", point.Pressure,
                $"no acentric factor between {Preconditions.Format(lowest)} and {Preconditions.Format(highest)} reproduces {Preconditions.Format(point.Pressure)} Pa at {Preconditions.Format(point.Temperature)} K with {kind.Title()}: "
                + $"the model gives {Preconditions.Format(point.Pressure * Math.Exp(atHighest))} to {Preconditions.Format(point.Pressure * Math.Exp(atLowest))} Pa there (check the units and Tc, Pc)");
        }

        // ω to 1e-12: ln Psat changes by about ln(10)·(1 − 1/Tr)·... per unit ω, so this is far
        // below any measured pressure's uncertainty; Brent converges in ~10 solves.
        return Brent.FindRoot(Residual, lowest, highest, 1e-12, 200);
    }
}
