using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Validation.Sections;

/// <summary>Sublimation and melting lines, the triple point and the catalog's solid data
/// (tests/PhaseSlope.Core.Tests/Solids and Fluids/CatalogSolidDataTests).</summary>
internal static class SolidLines
{
    private const double Atmosphere = 101325;

    private static SolidPhaseLines Lines(Fluid fluid) => new(fluid, CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson));

    public static void Write(Page page)
    {
        page.Heading(2, "Solid lines (`curve --line sublimation|melting`): sublimation, melting, the triple point");
        page.Paragraph("""
            Peng–Robinson. A fluid's sublimation and melting lines are its published equations where the fluid file
            has them, else the Clapeyron route from the sourced triple point (Δh_sub = Δh_fus + Δh_vap, Δv from the
            file's densities and the model's vapour, Δh held at its triple-point value). The Clapeyron rows remove
            the published equations from the fluid to test that route alone.
            """);
        var rows = new List<string[]>();
        Water(rows);
        CarbonDioxide(rows);
        Nitrogen(rows);
        CatalogConsistency(rows);
        Propane(rows);
        page.Table(["check", "reference (source)", "model", "deviation", "held to", "where"], rows, 2, 3);
        TriplePointTable(page);
    }

    private static void Water(List<string[]> rows)
    {
        var water = FluidCatalog.Embedded.Find("water");
        var clapeyron = Lines(water with { SublimationPressureEquation = null, MeltingPressureEquation = null });
        foreach (double t in References.WaterSublimationTemperatures)
        {
            double reference = References.IapwsSublimation(t);
            double model = clapeyron.Sublimation(t).Pressure;
            rows.Add([$"water sublimation pressure at {Fmt.F(t, 2)} K, Clapeyron route", $"{P4(reference)} Pa ({References.Iapws2011})",
                $"{P4(model)} Pa", Fmt.Pct(model / reference - 1, 2), "3 %", "`Solids/WaterSolidLinesTests`"]);
        }

        // The lowest temperature the sublimation line is drawn at by default (0.7 T_t): shown, held by no test.
        double low = clapeyron.DefaultRange(PhaseLineKind.Sublimation).Low;
        double atLow = clapeyron.Sublimation(low).Pressure, referenceLow = References.IapwsSublimation(low);
        rows.Add([$"water sublimation pressure at {Fmt.F(low, 2)} K (0.7 T_t, where the default line starts), Clapeyron route", $"{P4(referenceLow)} Pa ({References.Iapws2011})",
            $"{P4(atLow)} Pa", Fmt.Pct(atLow / referenceLow - 1, 2), "none (below the tests' 200 K; shown for the line's lower end)", "–"]);

        double slopeReference = References.IapwsMeltingSlopeAtTriplePoint();
        double slope = clapeyron.Melting(References.IapwsTt).Slope;
        rows.Add(["water melting slope dP/dT at T_t, Clapeyron route (Δh_fus/(T_t·Δv_fus))", $"{Fmt.F(slopeReference / 1e6, 3)} MPa/K (slope of the melting equation, {References.Iapws2011})",
            $"{Fmt.F(slope / 1e6, 3)} MPa/K", Fmt.Pct(slope / slopeReference - 1, 3), "0.1 %, and negative", "`Solids/WaterSolidLinesTests`"]);

        var published = Lines(water);
        double worst = 0;
        foreach (double t in new[] { 50.0, 120.0, 200.0, 250.0, 273.16 })
        {
            worst = Math.Max(worst, Math.Abs(published.Sublimation(t).Pressure / References.IapwsSublimation(t) - 1));
        }

        rows.Add(["water sublimation, the file's published equation at 50, 120, 200, 250, 273.16 K", $"the IAPWS formula evaluated independently ({References.Iapws2011})",
            "same", Fmt.Below(worst, 1.5e-16), "1e-12 relative", "`Solids/WaterSolidLinesTests`"]);
    }

    private static (double T, double Residual) AtOneAtmosphere(SolidPhaseLines lines)
    {
        var (low, high) = lines.DefaultRange(PhaseLineKind.Sublimation);
        double t = Brent.FindRoot(x => lines.Sublimation(x).Pressure - Atmosphere, low, high, accuracy: 1e-9, maxIterations: 100);
        return (t, lines.Sublimation(t).Pressure - Atmosphere);
    }

    private static void CarbonDioxide(List<string[]> rows)
    {
        var co2 = FluidCatalog.Embedded.Find("carbon dioxide");
        var lines = Lines(co2);
        const string Handbook = "CRC Handbook, triple points table; from memory";
        rows.Add(["carbon dioxide triple-point temperature (sourced in the file: Span & Wagner 1996, from memory)", $"{References.Co2HandbookTt} K ({Handbook})",
            $"{Fmt.F(lines.TriplePointTemperature, 3)} K", $"{Fmt.Signed(lines.TriplePointTemperature - References.Co2HandbookTt, 3)} K", "0.005 K (the handbook's rounding)", "`Solids/CarbonDioxideSolidLinesTests`"]);
        rows.Add(["carbon dioxide triple-point pressure (sourced in the file)", $"{Fmt.F(References.Co2HandbookPt / 1e6, 3)} MPa ({Handbook})",
            $"{Fmt.F(lines.TriplePointPressure / 1e6, 5)} MPa", $"{Fmt.Signed((lines.TriplePointPressure - References.Co2HandbookPt) / 1e3, 2)} kPa", "0.5 kPa", "`Solids/CarbonDioxideSolidLinesTests`"]);
        double dev = lines.Check.RelativeDeviation;
        rows.Add(["carbon dioxide: model vapour pressure at T_t against the sourced P_t", $"{Fmt.F(lines.Check.SourcedPressure / 1e6, 5)} MPa (Span & Wagner 1996, from memory)",
            $"{Fmt.F(lines.Check.ModelPressure / 1e6, 4)} MPa", Fmt.Pct(dev, 2), "2 % (Peng–Robinson near 0.7 T_c, common practice)", "`Solids/CarbonDioxideSolidLinesTests`"]);

        var (tEquation, residualEquation) = AtOneAtmosphere(lines);
        rows.Add(["carbon dioxide sublimation temperature at 1 atm, published equation", $"{References.Co2HandbookSublimation} K (CRC Handbook; from memory)",
            $"{Fmt.F(tEquation, 3)} K (residual {Fmt.Below(residualEquation / Atmosphere, 1.5e-16)} of 1 atm)", $"{Fmt.Signed(tEquation - References.Co2HandbookSublimation, 3)} K", "0.1 K", "`Solids/CarbonDioxideSolidLinesTests`"]);
        var (tClapeyron, residualClapeyron) = AtOneAtmosphere(Lines(co2 with { SublimationPressureEquation = null }));
        rows.Add(["carbon dioxide sublimation temperature at 1 atm, Clapeyron route (Δh_sub held at T_t)", $"{References.Co2HandbookSublimation} K (CRC Handbook; from memory)",
            $"{Fmt.F(tClapeyron, 3)} K (residual {Fmt.Below(residualClapeyron / Atmosphere, 1.5e-16)} of 1 atm)", $"{Fmt.Signed(tClapeyron - References.Co2HandbookSublimation, 3)} K", "0.6 K, and not above 194.75 K (Δh_sub held low)", "`Solids/CarbonDioxideSolidLinesTests`"]);

        double tt = co2.TriplePointTemperature!.Value;
        double published = lines.Melting(tt).Slope;
        double clapeyron = Lines(co2 with { MeltingPressureEquation = null }).Melting(tt).Slope;
        rows.Add(["carbon dioxide melting slope at T_t, Clapeyron route", $"{Fmt.F(published / 1e6, 3)} MPa/K (the file's melting equation, Span & Wagner 1996; from memory)",
            $"{Fmt.F(clapeyron / 1e6, 3)} MPa/K", Fmt.Pct(clapeyron / published - 1, 1), "15 % (solid density known to about 2 %)", "`Solids/CarbonDioxideSolidLinesTests`"]);
    }

    private static void Nitrogen(List<string[]> rows)
    {
        // SimonGlatzelTests checks the Simon–Glatzel form through a fluid file of its own; the catalog's
        // nitrogen file carries the same constants and the same sourced triple point (12.5198 kPa).
        var nitrogen = FluidCatalog.Embedded.Find("nitrogen");
        var equation = nitrogen.MeltingPressureEquation!;
        double catalogPt = nitrogen.TriplePointPressure!.Value;
        double SimonGlatzel(double t, double pt) => pt * (1 + References.N2A * (Math.Pow(t / References.N2Tt, References.N2B) - 1));
        double[] temperatures = [63.151, 65.0, 80.0, 120.0];
        string source = "Simon–Glatzel, Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory";
        double worst = temperatures.Max(t => Math.Abs(equation.Pressure(t) / SimonGlatzel(t, catalogPt) - 1));
        rows.Add([$"nitrogen melting pressure, the catalog file's equation at {string.Join(", ", temperatures.Select(t => Fmt.F(t, 3)))} K (at 120 K: {Fmt.F(equation.Pressure(120) / 1e6, 2)} MPa)",
            $"P_t[1 + {References.N2A}((T/T_t)^{References.N2B} − 1)], T_t = {References.N2Tt} K, P_t = the file's {Fmt.F(catalogPt / 1e3, 4)} kPa ({source})",
            "same", Fmt.Below(worst, 1.5e-16), "1e-14 relative in the test, on its own file of the same line", "`Solids/SimonGlatzelTests`"]);
    }

    private static void CatalogConsistency(List<string[]> rows)
    {
        // CatalogSolidDataTests.MeltingEquationSlope_AtTheTriplePoint_MatchesClapeyronFromFusionEnthalpyAndVolume.
        var tolerances = new Dictionary<string, double>(StringComparer.Ordinal) { ["water"] = 0.01, ["carbon dioxide"] = 0.10 };
        foreach (Fluid fluid in FluidCatalog.Embedded.All.Where(f => f.MeltingPressureEquation is not null && f.EnthalpyOfFusion is not null && f.FusionVolumeChange is not null).OrderBy(f => f.Name, StringComparer.Ordinal))
        {
            double tt = fluid.TriplePointTemperature!.Value;
            double clapeyron = fluid.EnthalpyOfFusion!.Value / (tt * fluid.FusionVolumeChange!.Value);
            double published = fluid.MeltingPressureEquation!.Slope(tt);
            rows.Add([$"{fluid.Name}: Δh_fus/(T_t·Δv_fus) from the file's enthalpy of fusion and densities", $"{Fmt.F(published / 1e6, 3)} MPa/K (slope of the file's melting equation at T_t; {fluid.MeltingPressureEquation.Source})",
                $"{Fmt.F(clapeyron / 1e6, 3)} MPa/K", Fmt.Pct(clapeyron / published - 1, 2), tolerances.TryGetValue(fluid.Name, out double tol) ? Fmt.PctAbs(tol, 0) : "no tolerance (the test fails)", "`Fluids/CatalogSolidDataTests`"]);
        }

        // CatalogSolidDataTests.FusionEnthalpy_MatchesTheSlopesOfTheSublimationAndVapourPressureEquations.
        Span<double> roots = stackalloc double[2];
        foreach (Fluid fluid in FluidCatalog.Embedded.All.Where(f => f.SublimationPressureEquation is not null && f.VapourPressureEquation is not null && f.EnthalpyOfFusion is not null).OrderBy(f => f.Name, StringComparer.Ordinal))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            var model = CubicModel.For(CubicModelKind.PengRobinson, fluid);
            int n = model.DensityRoots(tt, pt, Composition.Pure, roots);
            double vg = 1 / roots[0];
            double vl = fluid.TriplePointLiquidDensity is { } rl ? 1 / rl.Value : n == 2 ? 1 / roots[1] : 0;
            double vs = fluid.SolidDensity is { } rs ? 1 / rs.Value : vl;
            double subSlope = fluid.SublimationPressureEquation!.Slope(tt);
            double vapSlope = fluid.VapourPressureEquation!.Pressure(tt) * fluid.VapourPressureEquation.Form.Slope(tt, fluid.VapourPressureEquation.Coefficients);
            double sublimation = tt * (vg - vs) * subSlope;
            double fusion = sublimation - tt * (vg - vl) * vapSlope;
            double sourced = fluid.EnthalpyOfFusion!.Value;
            double e = fluid.Name == "water" ? 0.001 : 0.01;
            rows.Add([$"{fluid.Name}: Δh_fus = T_t[(v_g − v_s)·dP_sub/dT − (v_g − v_l)·dP_vap/dT] from the slopes of the file's sublimation and vapour-pressure equations", $"{Fmt.F(sourced, 0)} J/mol ({fluid.EnthalpyOfFusion.Source})",
                $"{Fmt.F(fusion, 0)} J/mol", Fmt.Pct(fusion / sourced - 1, 1), $"{Fmt.PctAbs(sublimation / sourced * e, 1)} (Δh_sub/Δh_fus × {Fmt.PctAbs(e, 1)} in either slope)", "`Fluids/CatalogSolidDataTests`"]);
        }
    }

    private static void Propane(List<string[]> rows)
    {
        var propane = FluidCatalog.Embedded.Find("propane");
        foreach (var (alpha, bound) in new[] { (AlphaForm.MathiasCopeman, References.PropaneTunedLnBound), (AlphaForm.Default, References.PropaneDefaultLnBound) })
        {
            var solver = new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, propane, alpha), propane);
            double p = solver.AtTemperature(References.PropaneTt).Pressure;
            string name = alpha == AlphaForm.MathiasCopeman ? "tuned Mathias–Copeman alpha" : "its generalised (default) alpha";
            rows.Add([$"propane at its triple point, now the lowest valid temperature ({Fmt.F(solver.MinimumTemperature, 3)} K), Peng–Robinson with {name}", $"about {Fmt.E2(References.PropanePt)} Pa (Lemmon, McLinden & Wagner 2009; from memory)",
                $"{Fmt.E2(p)} Pa", $"{Fmt.Pct(p / References.PropanePt - 1, 1)} (ln ratio {Fmt.Signed(Math.Log(p / References.PropanePt), 2)})", $"{bound} in ln P", "`Equilibrium/TriplePointRangeTests`"]);
        }
    }

    /// <summary>CatalogSolidDataTests.ModelVapourPressureAtTheTriplePoint_AgainstTheSourcedPressure_ForEveryFluid.</summary>
    private static void TriplePointTable(Page page)
    {
        page.Paragraph("""
            The model's vapour pressure at each catalog fluid's sourced triple-point temperature against the sourced
            triple-point pressure (both named in the fluid's file), for every fluid that has both: Peng–Robinson as the
            catalog builds it (own Soave alpha) and, where the file has one, with its tuned Mathias–Copeman alpha. Held
            to |ln(P/P_t)| ≤ 0.35 where T_t/T_c ≥ 0.28 (ln 3 below) for the own alpha, and 0.02 for the tuned alpha where
            T_t ≥ 0.3 T_c (`Fluids/CatalogSolidDataTests`): the test catches a mistyped or mis-scaled P_t, it does not
            grade the model.
            """);
        var rows = new List<string[]>();
        foreach (Fluid fluid in FluidCatalog.Embedded.All.Where(f => f.TriplePointTemperature is not null && f.TriplePointPressure is not null).OrderBy(f => f.Name, StringComparer.Ordinal))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            double reduced = tt / fluid.CriticalTemperature.Value;
            double model = new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, fluid), tt).AtTemperature(tt).Pressure;
            double? tuned = CubicModel.FindParameters(fluid, CubicModelKind.PengRobinson, AlphaForm.MathiasCopeman) is null
                ? null
                : new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.MathiasCopeman), tt).AtTemperature(tt).Pressure;
            double ownBound = reduced >= 0.28 ? 0.35 : Math.Log(3);
            double tunedBound = reduced >= 0.3 ? 0.02 : ownBound;
            rows.Add([fluid.Name, Fmt.F(tt, 3), Fmt.F(reduced, 3), $"{pt.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)} ({fluid.TriplePointPressure.Source})", P4(model), Fmt.Pct(model / pt - 1, 1),
                tuned is double q ? P4(q) : "–", tuned is double r ? Fmt.Pct(r / pt - 1, 1) : "–", tuned is null ? Fmt.F(ownBound, 2) : $"{Fmt.F(ownBound, 2)}; {Fmt.F(tunedBound, 2)}"]);
        }

        page.Table(["fluid", "T_t K", "T_t/T_c", "P_t sourced, Pa (source)", "PR Pa", "dev", "PR tuned MC Pa", "dev", "held to (ln P)"], rows, 1, 2, 4, 5, 6, 7);
    }

    /// <summary>A pressure with four significant digits in fixed notation (exponent form below 1e-2 Pa):
    /// a model pressure is converged far beyond that.</summary>
    private static string P4(double x)
        => x < 1e-2 ? Fmt.E2(x) : Fmt.F(x, Math.Max(0, 3 - (int)Math.Floor(Math.Log10(x))));
}
