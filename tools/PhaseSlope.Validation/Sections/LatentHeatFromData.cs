using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Correlations;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Validation.Sections;

internal static class LatentHeatFromData
{
    public static void Write(Page page)
    {
        page.Heading(2, "Vapour-pressure fitting and latent heat from data");
        var water = FluidCatalog.Embedded.Find("water");
        var temperatures = Temperatures(275, 645, 38);
        var form = WagnerForm.SixTerm(WaterTc, WaterPc);
        var fit = VapourPressureFitter.Fit(form, Points(WaterLnPressure, temperatures));
        double worst = Enumerable.Range(0, 6).Max(k => Math.Abs(fit.Parameters[k] - WaterCoefficients[k]));
        // The test's allowance: 10·κ·1e-15 of the largest coefficient, κ the condition number of the
        // column-normalised design matrix (VapourPressureFitterTests).
        var j = Matrix<double>.Build.Dense(temperatures.Length, 6, (i, k) => WaterTc / temperatures[i] * Math.Pow(1 - temperatures[i] / WaterTc, form.Exponents[k]));
        for (int k = 0; k < 6; k++)
        {
            j.SetColumn(k, j.Column(k).Normalize(2));
        }

        double allowance = 10 * j.ConditionNumber() * 1e-15 * WaterCoefficients.Max(Math.Abs);
        page.Paragraph($"""
            Tests in `Correlations/` (reference values recalled, "from memory"):

            - **Recovery.** Noise-free data generated from the IAPWS saturation-pressure equation for water
              (Wagner & Pruß 1993; 38 points, 275–645 K) are fitted by the six-term Wagner form and return its six
              coefficients to {Fmt.Below(worst)} (the conditioning allows {Fmt.E2(allowance)}:
              `VapourPressureFitterTests`). Clausius–Clapeyron and Antoine sets return their own constants to
              rounding; with noise the estimates fall within their standard errors.
            - **Every form's** analytic d ln P/dT and d² ln P/dT² and its parameter gradients match finite
              differences of its own ln P (`VapourPressureFormDerivativeTests`).
            - **Latent heat of water** from the IAPWS-generated P–T data via Clapeyron with three volume models,
              against steam-table enthalpies of vaporization (IAPWS-95 tables, read from the test's `SteamTable`;
              from memory). `LatentHeatEstimatorTests` holds the Peng–Robinson ΔZ route to 3 %, the Haggenmacher
              ΔZ to 1 %, and checks that the ideal-gas route overestimates by exactly 1/ΔZ.
            """);
        var solver = CoexistenceSolver.For(water, CubicModelKind.PengRobinson);
        var dataFit = VapourPressureFitter.Fit(WagnerForm.SixTerm(WaterTc, WaterPc), Points(WaterLnPressure, Temperatures(275, 645, 38)));
        var eos = new LatentHeatEstimator(dataFit, VolumeChangeModel.EquationOfState, solver);
        var haggenmacher = new LatentHeatEstimator(dataFit, VolumeChangeModel.Haggenmacher, null, water.CriticalTemperature.Value, water.CriticalPressure.Value);
        var ideal = new LatentHeatEstimator(dataFit, VolumeChangeModel.IdealGas);
        double molar = water.MolarMass!.Value;
        var rows = new List<string[]>();
        foreach (object[] row in LatentHeatEstimatorTests.SteamTable())
        {
            double celsius = (double)row[0], hfg = (double)row[1];
            string Dev(LatentHeatEstimator e) => Fmt.Pct(e.At(celsius + 273.15).EnthalpyOfVaporization / molar / 1e3 / hfg - 1, 2);
            rows.Add([Fmt.F(celsius, 0), hfg.ToString("F1", System.Globalization.CultureInfo.InvariantCulture), Dev(eos), Dev(haggenmacher), Dev(ideal)]);
        }

        page.Table(["°C", "steam table [kJ/kg]", "Peng–Robinson ΔZ (`eos`)", "Haggenmacher ΔZ", "ideal gas"], rows, 0, 1, 2, 3, 4);
        page.Paragraph("""
            Only the volume change comes from a model here; the slope d ln P/dT is the data's. Using the model's
            own Δv with its own slope instead would carry its vapour-pressure error into ΔH.
            """);
        Coverage(page);
    }

    /// <summary>The recipe of LatentHeatCoverageTests: 400 seeded datasets of 15 points (σ(ln P) = 0.002,
    /// 300–600 K) from a Wagner 2.5-5 curve, fitted by the same form; the fraction of trials whose true
    /// ΔH at 450 K lies within ±u and ±2u of the estimate. Same seeds as the test.</summary>
    private static void Coverage(Page page)
    {
        (int One, int Two) Run(bool absolute, int seed)
        {
            const int trials = 400;
            var form = WagnerForm.TwoHalfFive(WaterTc, WaterPc);
            var temperatures = Temperatures(300, 600, 15);
            double trueHeat = PhaseSlope.Core.Constants.GasConstant * 450 * 450 * PhaseSlope.Core.Tests.TestSupport.FiniteDifference.Central5(TwoHalfFiveLnPressure, 450, 1e-3);
            var random = new Random(seed);
            int one = 0, two = 0;
            for (int trial = 0; trial < trials; trial++)
            {
                var fit = VapourPressureFitter.Fit(form, Points(TwoHalfFiveLnPressure, temperatures, 0.002, random, withUncertainty: absolute));
                var point = new LatentHeatEstimator(fit, VolumeChangeModel.IdealGas).At(450);
                double miss = Math.Abs(point.EnthalpyOfVaporization - trueHeat);
                one += miss <= point.StandardUncertainty ? 1 : 0;
                two += miss <= 2 * point.StandardUncertainty ? 1 : 0;
            }

            return (one, two);
        }

        static string Share(int count) => $"{count}/400 ({Fmt.PctAbs(count / 400.0, 2)})";
        var relative = Run(false, 20240601);
        var absolute = Run(true, 777);
        double t1 = 2 * MathNet.Numerics.Distributions.StudentT.CDF(0, 1, 11, 1) - 1, t2 = 2 * MathNet.Numerics.Distributions.StudentT.CDF(0, 1, 11, 2) - 1;
        double n1 = 2 * MathNet.Numerics.Distributions.Normal.CDF(0, 1, 1) - 1, n2 = 2 * MathNet.Numerics.Distributions.Normal.CDF(0, 1, 2) - 1;
        page.Paragraph("""
            **Coverage of the uncertainty band** (`Correlations/LatentHeatCoverageTests`, same seeds): 400 synthetic
            datasets of 15 points from a known Wagner 2.5-5 curve, fitted by the same form; how often the true ΔH at
            450 K lies within ±u and ±2u of the estimate, against the exact expectation (held to three binomial
            standard errors). These coverages are of the fit's share of the band; `latent` also adds the
            uncertainty of Tc and Pc and a volume-model share (docs/uncertainty.md), and the error of the form
            itself is not in the band.
            """);
        page.Table(["weights", "±u", "expected", "±2u", "expected"],
        [
            ["relative (σ from the residuals; Student t, 11 degrees of freedom)", Share(relative.One), Fmt.PctAbs(t1, 1), Share(relative.Two), Fmt.PctAbs(t2, 1)],
            ["absolute per-point uncertainties (normal)", Share(absolute.One), Fmt.PctAbs(n1, 1), Share(absolute.Two), Fmt.PctAbs(n2, 1)],
        ], 1, 2, 3, 4);
    }
}
