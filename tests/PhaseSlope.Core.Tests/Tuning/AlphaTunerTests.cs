using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Correlations;
using PhaseSlope.Core.Tests.TestSupport;
using PhaseSlope.Core.Tuning;
using Xunit.Abstractions;

namespace PhaseSlope.Core.Tests.Tuning;

public sealed class AlphaTunerTests(ITestOutputHelper output)
{
    private static readonly DateOnly Day = new(2026, 12, 2);

    private static VapourPressurePoint[] WaterData(double from, double to, double step)
    {
        var points = new List<VapourPressurePoint>();
        for (double t = from; t <= to + 1e-9; t += step)
        {
            points.Add(new VapourPressurePoint(t, Math.Exp(SyntheticSaturationData.WaterLnPressure(t))));
        }

        return [.. points];
    }

    [Theory]
    [InlineData(AlphaForm.MathiasCopeman, 0.18)]
    [InlineData(AlphaForm.Twu, 0.22)]
    public void Water_TunedToTheIapwsEquation_ReproducesItToTheFormsLimit(AlphaForm form, double aadPercent)
    {
        // The IAPWS saturation-pressure equation (Wagner & Pruss 1993, coefficients from memory)
        // at 280–640 K every 10 K. Measured: Peng–Robinson with its own alpha 4.0 % AAD; tuned
        // Mathias–Copeman 0.1768 % (max 0.52 % at 610 K), Twu 0.2154 % (max 0.59 %). These are the
        // global minima (five starting points each end at the same parameters), i.e. the limit of a
        // three-parameter alpha function with Peng–Robinson's fixed Zc = 0.307 against water's 0.229:
        // the residuals are a smooth wave, not noise. A 0.1 % target over this range is not reached
        // by these forms; the bound here is the measured value rounded up.
        var water = FluidCatalog.Embedded.Find("water");
        var result = AlphaTuner.Tune(new TuningRequest { BaseFluid = water, Form = form, VapourPressures = WaterData(280, 640, 10), Date = Day });
        output.WriteLine($"{form}: AAD {result.AadBeforePercent:0.###} % -> {result.AadAfterPercent:0.####} %, max {result.MaximumAfterPercent:0.####} %, params {string.Join(", ", result.Parameters.Select(p => p.Value))}, iterations {result.Fit!.Iterations}");
        foreach (var c in result.Comparisons)
        {
            output.WriteLine($"  {c.Temperature} {c.DeviationBeforePercent:0.###} {c.DeviationAfterPercent:0.####}");
        }

        Assert.True(result.AadAfterPercent < aadPercent, $"AAD {result.AadAfterPercent} %");
        Assert.True(result.AadBeforePercent > 5 * result.AadAfterPercent, "tuning must improve on the base model");

        // The tuned fluid, rebuilt through the model factory (its preferred alpha), gives the same pressures.
        var solver = CoexistenceSolver.For(result.Tuned, CubicModelKind.PengRobinson);
        foreach (var c in result.Comparisons)
        {
            AssertClose.Relative(c.After, solver.AtTemperature(c.Temperature).Pressure, 1e-12, $"tuned model at {c.Temperature} K");
        }
    }

    [Fact]
    public void ModelGeneratedData_RecoverTheirOwnParameters()
    {
        // Data made by the Peng–Robinson model with known Mathias–Copeman constants: the tuning must
        // return them. The data are exact to the solver's 1e-12; Levenberg–Marquardt stops on its
        // relative-change tolerances with the pressures reproduced to ~3e-9 relative, which with a
        // condition number ~1e3 leaves the parameters within ~1e-7 (measured 1.2e-7 for c3).
        var propane = FluidCatalog.Embedded.Find("propane");
        double[] truth = [0.6, -0.2, 0.5];
        var known = propane with { AlphaParameters = [new AlphaParameterSet(AlphaForm.MathiasCopeman, CubicModelKind.PengRobinson, truth, "test")] };
        var solver = new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, known, AlphaForm.MathiasCopeman), 120);
        var data = Enumerable.Range(0, 12).Select(i => 130.0 + i * 20).Select(t => new VapourPressurePoint(t, solver.AtTemperature(t).Pressure)).ToArray();

        var result = AlphaTuner.Tune(new TuningRequest { BaseFluid = propane, Form = AlphaForm.MathiasCopeman, VapourPressures = data, Date = Day });
        output.WriteLine(string.Join(", ", result.Parameters.Select(p => p.Value)) + $" AAD {result.AadAfterPercent}");
        for (int j = 0; j < 3; j++)
        {
            AssertClose.Absolute(truth[j], result.Parameters[j].Value, 1e-6, $"c{j + 1}");
        }

        Assert.True(result.AadAfterPercent < 1e-5, $"AAD {result.AadAfterPercent} %");
    }

    [Theory]
    [InlineData(AlphaForm.Soave)]
    [InlineData(AlphaForm.MathiasCopeman)]
    [InlineData(AlphaForm.Twu)]
    public void ParameterGradient_IsTheExactDerivative(AlphaForm form)
    {
        // The gradient from the coexistence conditions against a central difference of re-solved
        // pressures (step 1e-6: truncation ~1e-12, rounding of ln P at 1e-15 over 2e-6 ~ 1e-9).
        var family = TunableAlpha.Of(form);
        double tc = 369.89, pc = 4.2512e6;
        double[] theta = family.Start(CubicModelKind.PengRobinson, 0.152, tc);
        var tuned = new TunedVapourPressureForm(CubicModelKind.PengRobinson, family, tc, pc, 100, theta);
        foreach (double t in new[] { 150.0, 250.0, 350.0, 369.0 })
        {
            var gradient = new double[theta.Length];
            tuned.LnPressureGradient(t, theta, gradient);
            for (int j = 0; j < theta.Length; j++)
            {
                double h = 1e-6 * Math.Max(Math.Abs(theta[j]), 0.1);
                double[] up = [.. theta];
                double[] down = [.. theta];
                up[j] += h;
                down[j] -= h;
                double numeric = (tuned.LnPressure(t, up) - tuned.LnPressure(t, down)) / (2 * h);
                AssertClose.Absolute(numeric, gradient[j], 1e-6 * Math.Max(1, Math.Abs(numeric)), $"{form} d lnP/d{family.ParameterNames[j]} at {t} K");
            }
        }
    }

    [Theory]
    [InlineData("propane")]
    [InlineData("water")]
    [InlineData("n-heptane")]
    [InlineData("r-134a")]
    public void OnePoint_ModelsOwnPressure_GivesBackTheTabulatedAcentricFactor(string name)
    {
        // Self-consistency: the model with the tabulated ω (Poling et al., from memory) gives some
        // Psat at the normal boiling point; tuning ω to that one point must return the tabulated ω
        // (to Brent's 1e-12 and the solver's 1e-12 in ln P).
        var fluid = FluidCatalog.Embedded.Find(name);
        double t = fluid.NormalBoilingPoint!.Value;
        double p = CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson).AtTemperature(t).Pressure;
        var result = AlphaTuner.Tune(new TuningRequest { BaseFluid = fluid, VapourPressures = [new VapourPressurePoint(t, p)], Date = Day });
        AssertClose.Absolute(fluid.AcentricFactor.Value, result.Tuned.AcentricFactor.Value, 1e-9, $"{name} ω");
    }

    [Theory]
    [InlineData("propane", 0.02)]
    [InlineData("n-heptane", 0.02)]
    [InlineData("r-134a", 0.02)]
    [InlineData("benzene", 0.02)]
    public void OnePoint_MeasuredNormalBoilingPoint_GivesAnAcentricFactorNearTheTabulatedOne(string name, double tolerance)
    {
        // The measured normal boiling point (101325 Pa at the catalog's Tb, from reference equations
        // or Poling et al., from memory) gives the ω with which Peng–Robinson passes through it. It
        // differs from the tabulated ω (defined at T/Tc = 0.7) by the model's inconsistency between
        // Tb and 0.7·Tc: about 0.01 for these fluids (common practice: PR's κ(ω) reproduces vapour
        // pressures to 1–3 %, i.e. ~0.01 in ω). Measured values are printed.
        var fluid = FluidCatalog.Embedded.Find(name);
        var result = AlphaTuner.Tune(new TuningRequest { BaseFluid = fluid, VapourPressures = [new VapourPressurePoint(fluid.NormalBoilingPoint!.Value, Constants.StandardAtmosphere)], Date = Day });
        output.WriteLine($"{name}: tabulated ω {fluid.AcentricFactor.Value}, from Tb {result.Tuned.AcentricFactor.Value:0.#####}");
        AssertClose.Absolute(fluid.AcentricFactor.Value, result.Tuned.AcentricFactor.Value, tolerance, $"{name} ω from Tb");
        AssertClose.Relative(Constants.StandardAtmosphere, result.Comparisons[0].After, 1e-10, "the tuned model passes through the point");
    }

    [Fact]
    public void TunedFluid_WrittenAndReadBack_KeepsParametersCovarianceAndProvenance()
    {
        var water = FluidCatalog.Embedded.Find("water");
        var result = AlphaTuner.Tune(new TuningRequest { BaseFluid = water, Form = AlphaForm.MathiasCopeman, VapourPressures = WaterData(300, 600, 25), Date = Day, Name = "water-tuned" });
        string text = FluidFileWriter.Format(result.Tuned);
        output.WriteLine(text);
        var read = FluidFile.Parse(new StringReader(text), "tuned.fluid");
        Assert.Equal("water-tuned", read.Name);
        Assert.Equal(AlphaForm.MathiasCopeman, read.PreferredAlpha);
        // The catalog's SRK constants stay; the PR set is replaced by the tuned one.
        var set = Assert.Single(read.AlphaParameters, s => s.Model == CubicModelKind.PengRobinson);
        Assert.Equal(result.Parameters.Select(p => p.Value), set.Values);
        Assert.NotNull(set.Covariance);
        for (int i = 0; i < 3; i++)
        {
            for (int j = 0; j < 3; j++)
            {
                Assert.Equal(result.Fit!.Covariance[i, j], set.Covariance![i, j]);
            }
        }

        Assert.Contains("tuned by phaseslope tune to 13 vapour pressures", read.Provenance, StringComparison.Ordinal);
        Assert.Contains("2026-12-02", read.Provenance, StringComparison.Ordinal);
    }

    [Fact]
    public void AlphaThatRisesWithTemperature_IsReported()
    {
        // c1 < 0 makes the Mathias–Copeman α rise with T: not a physical alpha function.
        var alpha = new MathiasCopemanAlpha(-0.3, 0, 0, 400, "test");
        var (violation, _) = AlphaShape.Check(alpha, 400, 390, requireConvex: false);
        Assert.NotNull(violation);
        Assert.Contains("does not decrease", violation, StringComparison.Ordinal);
    }

    [Fact]
    public void OnePoint_OutOfReach_IsRefusedWithTheModelsRange()
    {
        // 1 Pa at 300 K for propane (Psat ~1 MPa): no acentric factor gets there.
        var propane = FluidCatalog.Embedded.Find("propane");
        var ex = Assert.Throws<InvalidInputException>(() => AlphaTuner.Tune(new TuningRequest { BaseFluid = propane, VapourPressures = [new VapourPressurePoint(300, 1)], Date = Day }));
        Assert.Contains("no acentric factor between", ex.Message, StringComparison.Ordinal);
    }
}

public sealed class TunableAlphaDerivativeTests
{
    [Theory]
    [InlineData(AlphaForm.Soave, new[] { 0.7 })]
    [InlineData(AlphaForm.MathiasCopeman, new[] { 0.8, -0.3, 0.5 })]
    [InlineData(AlphaForm.Twu, new[] { 0.4, 0.85, 2.0 })]
    public void AlphaAndSlopeGradients_MatchCentralDifferences(AlphaForm form, double[] theta)
    {
        // ∂α/∂θ and ∂(dα/dT)/∂θ, used by the linear propagation of a tuned fluid's covariance,
        // against central differences of the alpha function itself (step 1e-6: truncation ~1e-12,
        // rounding ~1e-16/1e-6 = 1e-10 relative).
        var family = TunableAlpha.Of(form);
        const double tc = 500;
        foreach (double t in new[] { 150.0, 300.0, 450.0, 499.0 })
        {
            var g = new double[theta.Length];
            var gs = new double[theta.Length];
            var gc = new double[theta.Length];
            family.Gradient(t, tc, theta, g);
            family.SlopeGradient(t, tc, theta, gs);
            family.CurvatureGradient(t, tc, theta, gc);
            for (int j = 0; j < theta.Length; j++)
            {
                double h = 1e-6;
                double[] up = [.. theta];
                double[] down = [.. theta];
                up[j] += h;
                down[j] -= h;
                var a = family.Create(up, tc, "test").Evaluate(t);
                var b = family.Create(down, tc, "test").Evaluate(t);
                AssertClose.Absolute((a.Value - b.Value) / (2 * h), g[j], 1e-8, $"{form} dα/dθ{j} at {t} K");
                AssertClose.Absolute((a.FirstDerivative - b.FirstDerivative) / (2 * h), gs[j], 1e-10, $"{form} dα'/dθ{j} at {t} K");
                AssertClose.Absolute((a.SecondDerivative - b.SecondDerivative) / (2 * h), gc[j], 1e-12, $"{form} dα''/dθ{j} at {t} K");
            }
        }
    }
}

public sealed class TuningCriticalSensitivityTests
{
    [Fact]
    public void ParametersMoveWithTcAndPc_AsARetuningShows()
    {
        // ∂θ/∂Tc and ∂θ/∂Pc from the Gauss–Newton normal equations with exact gradients, against
        // re-tuning the same data with Tc and Pc moved by ±0.05 K and ±500 Pa (central
        // differences). Gauss–Newton drops the residual × second-derivative terms, as the fit's
        // own covariance does; with residuals of ~0.2 % (Peng–Robinson against the published
        // equation) that is a relative error of the same order: measured 1.7e-3, held to 5e-3.
        var propane = FluidCatalog.Embedded.Find("propane") with { AlphaParameters = [], PreferredAlpha = AlphaForm.Default };
        var data = Enumerable.Range(0, 20).Select(i => 150.0 + 10 * i).Select(t => new VapourPressurePoint(t, propane.VapourPressureEquationOrThrow().Pressure(t))).ToArray();
        TuningResult Tune(Fluid f) => AlphaTuner.Tune(new TuningRequest { BaseFluid = f, Form = AlphaForm.MathiasCopeman, VapourPressures = data, Date = new DateOnly(2026, 12, 2) });
        var nominal = Tune(propane);
        var d = nominal.Tuned.AlphaParameters.Single(s => s.Model == CubicModelKind.PengRobinson).CriticalSensitivity!;
        foreach (var (column, step) in new[] { (0, 0.05), (1, 500.0) })
        {
            Fluid Moved(double h) => column == 0
                ? propane with { CriticalTemperature = propane.CriticalTemperature with { Value = propane.CriticalTemperature.Value + h } }
                : propane with { CriticalPressure = propane.CriticalPressure with { Value = propane.CriticalPressure.Value + h } };
            var up = Tune(Moved(step)).Parameters;
            var down = Tune(Moved(-step)).Parameters;
            for (int j = 0; j < 3; j++)
            {
                double numeric = (up[j].Value - down[j].Value) / (2 * step);
                AssertClose.Relative(numeric, d[j, column], 5e-3, $"dc{j + 1}/d{(column == 0 ? "Tc" : "Pc")}");
            }
        }
    }
}

internal static class FluidTestExtensions
{
    public static PublishedVapourPressure VapourPressureEquationOrThrow(this Fluid fluid)
        => fluid.VapourPressureEquation ?? throw new InvalidOperationException($"{fluid.Name} has no vapour-pressure equation");
}
