using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The catalog's solid-phase data (triple-point pressure, enthalpy of fusion, solid and
/// liquid densities, published melting and sublimation equations) checked against independent
/// physics: the Clapeyron equation on each two-phase line meeting at the triple point, the
/// published vapour-pressure equations of the same papers, and the Peng–Robinson model.</summary>
public sealed partial class CatalogSolidDataTests(ITestOutputHelper output)
{
    private static IEnumerable<Fluid> Catalog => FluidCatalog.Embedded.All;

    /// <summary>(a) Clapeyron at the triple point: Δh_fus/(T_t·Δv_fus) from the file's enthalpy of
    /// fusion and densities against the slope of the file's published melting equation there.
    /// The two come from different publications (handbook enthalpy, density measurements, the
    /// melting-pressure fit), so agreement is a check on all three.</summary>
    [Fact]
    public void MeltingEquationSlope_AtTheTriplePoint_MatchesClapeyronFromFusionEnthalpyAndVolume()
    {
        // Tolerance per fluid from the recalled uncertainties of its data (relative):
        // - water: Δh_fus 333.55 kJ/kg (CRC, 6.01 kJ/mol, four digits: 0.1 %), ice density 916.72
        //   kg/m³ (IAPWS-06, five digits) and liquid 999.793 kg/m³ (IAPWS-95): Δv = −9.06e-5 m³/kg is
        //   an 8 % difference of the two volumes, so 1e-4 on either volume is 0.12 % on Δv; about
        //   0.25 % from the data, and 1 % allowed because the melting equation's own uncertainty in
        //   slope at T_t is not recalled (it was built consistent with IAPWS-95 and IAPWS-06, so it
        //   is expected to be small).
        // - carbon dioxide: the solid density 1512 kg/m³ is recalled to about 2 % (see the file);
        //   Δv = v_l − v_s is 28 % of v_s, so 2 % on v_s is 7 % on Δv; Δh_fus 9.02 kJ/mol (CRC)
        //   differs among handbooks by about 2 %; 10 % is the linear sum with rounding.
        var tolerances = new Dictionary<string, double>(StringComparer.Ordinal)
        {
            ["water"] = 0.01,
            ["carbon dioxide"] = 0.10,
        };
        var checkedFluids = new List<string>();
        foreach (Fluid fluid in Catalog.Where(f => f.MeltingPressureEquation is not null && f.EnthalpyOfFusion is not null && f.FusionVolumeChange is not null))
        {
            Assert.True(tolerances.TryGetValue(fluid.Name, out double tolerance),
                $"{fluid.Name} has Δh_fus, Δv_fus and a melting equation: add its tolerance here, justified from its data's uncertainties");
            double tt = fluid.TriplePointTemperature!.Value;
            double clapeyron = fluid.EnthalpyOfFusion!.Value / (tt * fluid.FusionVolumeChange!.Value);
            double published = fluid.MeltingPressureEquation!.Slope(tt);
            output.WriteLine(Invariant($"{fluid.Name}: Clapeyron {clapeyron:G5} Pa/K, melting equation {published:G5} Pa/K, {100 * (clapeyron / published - 1):+0.00;-0.00;0.00} %"));
            AssertClose.Relative(published, clapeyron, tolerance, $"{fluid.Name} melting slope at T_t: Clapeyron from {fluid.EnthalpyOfFusion.Source} and {fluid.FusionVolumeChange.Source} vs {fluid.MeltingPressureEquation.Source}");
            checkedFluids.Add(fluid.Name);
        }

        // Water (negative slope) and carbon dioxide carry all three; the check must not run empty.
        Assert.Contains("water", checkedFluids);
        Assert.Contains("carbon dioxide", checkedFluids);
    }

    /// <summary>(b) Every published melting and sublimation equation passes through the file's
    /// triple point: the equations are reduced by the triple point of the same paper, so an
    /// equation copied with another paper's reducing point (or a mistyped one) shows here.</summary>
    [Fact]
    public void PublishedSolidLines_PassThroughTheSourcedTriplePoint()
    {
        int count = 0;
        foreach (Fluid fluid in Catalog)
        {
            foreach (SolidLineEquation? equation in new[] { fluid.MeltingPressureEquation, fluid.SublimationPressureEquation })
            {
                if (equation is null)
                {
                    continue;
                }

                Assert.True(fluid.TriplePointTemperature is not null && fluid.TriplePointPressure is not null,
                    $"{fluid.Name} has a {equation.Kind} equation but no sourced triple point");
                double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
                Assert.True(equation.Covers(tt), Invariant($"{fluid.Name} {equation.Kind} equation's range {equation.LowestTemperature}-{equation.HighestTemperature} K excludes T_t {tt} K"));

                // The published equations are reduced by their paper's own triple point, so the
                // reducing point must be the file's (T_t, P_t) to the digits printed in the file;
                // a reducing point copied from another paper or mistyped differs at the third or
                // fourth digit.
                double halfT = HalfUnitOfLastDigit(fluid.TriplePointTemperature), halfP = HalfUnitOfLastDigit(fluid.TriplePointPressure);
                AssertClose.Relative(tt, equation.ReducingTemperature, halfT, $"{fluid.Name} {equation.Kind} equation's reducing temperature vs {fluid.TriplePointTemperature.Source}");
                AssertClose.Relative(pt, equation.ReducingPressure, halfP, $"{fluid.Name} {equation.Kind} equation's reducing pressure vs {fluid.TriplePointPressure.Source}");

                // And evaluated at T_t it gives P_t: to the half-unit of P_t's last digit plus what
                // the half-unit of T_t's last digit moves the line (T_t·|dP/dT|/P_t times it: 1e-4 to
                // 1e-3 for the sublimation lines, large for steep melting lines such as ethane's,
                // whose pressure is then fixed by the reducing-point check above).
                double atTriplePoint = equation.Pressure(tt);
                double tolerance = halfP + halfT * tt * Math.Abs(equation.Slope(tt)) / pt;
                output.WriteLine(Invariant($"{fluid.Name} {equation.Kind}: P(T_t) = {atTriplePoint:G8} Pa, sourced P_t = {pt:G8} Pa, allowed {tolerance:G3} relative"));
                AssertClose.Relative(pt, atTriplePoint, tolerance, $"{fluid.Name} {equation.Kind} equation ({equation.Source}) at T_t vs {fluid.TriplePointPressure.Source}");
                count++;
            }
        }

        // Water, carbon dioxide and nitrogen carry both lines, argon a sublimation and ethane a
        // melting equation.
        Assert.True(count >= 8, $"{count} published solid lines in the catalog");
    }

    /// <summary>(b, continued) Below the triple point the solid is the stable phase, so its
    /// sublimation pressure lies below the extrapolated vapour pressure of the (metastable)
    /// liquid; the gap opens as d ln P/dT differs by Δh_fus/(RT²) (Clapeyron on both lines).</summary>
    [Fact]
    public void SublimationPressure_BelowTheTriplePoint_LiesBelowTheLiquidsVapourPressure()
    {
        foreach (Fluid fluid in Catalog.Where(f => f.SublimationPressureEquation is not null && f.VapourPressureEquation is not null))
        {
            double tt = fluid.TriplePointTemperature!.Value;
            double t = Math.Max(0.95 * tt, fluid.SublimationPressureEquation!.LowestTemperature);
            double sublimation = fluid.SublimationPressureEquation.Pressure(t);
            double vapour = fluid.VapourPressureEquation!.Pressure(t);
            output.WriteLine(Invariant($"{fluid.Name} at {t:G5} K: sublimation {sublimation:G5} Pa, liquid vapour pressure {vapour:G5} Pa"));
            Assert.True(sublimation < vapour, Invariant($"{fluid.Name} at {t} K: sublimation {sublimation} Pa is not below the liquid's {vapour} Pa"));
        }
    }

    /// <summary>(f) Clapeyron on both lines at the triple point: Δh_fus = Δh_sub − Δh_vap =
    /// T_t[(v_g − v_s)·dP_sub/dT − (v_g − v_l)·dP_vap/dT], from the slopes of the published
    /// sublimation and vapour-pressure equations, against the file's enthalpy of fusion (a
    /// calorimetric or handbook value, independent of both equations). The vapour volume is
    /// the model's vapour root at (T_t, P_t) (Peng–Robinson's second virial coefficient is good
    /// to a few percent, and Z − 1 is at most 8 % here); the condensed volumes are the file's
    /// densities where it has them, else the model's liquid root for both (their product with the
    /// slopes is under 2.5 % of Δh_fus).</summary>
    [Fact]
    public void FusionEnthalpy_MatchesTheSlopesOfTheSublimationAndVapourPressureEquations()
    {
        // Δh_fus is a difference of two numbers Δh_sub/Δh_fus times larger (3 for carbon
        // dioxide, 7 for argon, 8.5 for water, 9.5 for nitrogen), so a relative error e in either
        // slope is an error (Δh_sub/Δh_fus)·e in Δh_fus. The tolerance allows e = 1 % for the
        // one- and two-term Wagner-type sublimation fits and the ancillary vapour-pressure
        // equations at the end of their ranges, and e = 0.1 % for the IAPWS equations of water
        // (stated to about 0.1 % near T_t; from memory).
        int count = 0;
        Span<double> roots = stackalloc double[2];
        foreach (Fluid fluid in Catalog.Where(f => f.SublimationPressureEquation is not null && f.VapourPressureEquation is not null && f.EnthalpyOfFusion is not null))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            var model = CubicModel.For(CubicModelKind.PengRobinson, fluid);
            int n = model.DensityRoots(tt, pt, Composition.Pure, roots);
            Assert.True(n >= 1, $"{fluid.Name}: no vapour root at the triple point");
            double vg = 1 / roots[0];
            double vl = fluid.TriplePointLiquidDensity is { } rl ? 1 / rl.Value : n == 2 ? 1 / roots[1] : 0;
            double vs = fluid.SolidDensity is { } rs ? 1 / rs.Value : vl;
            double subSlope = fluid.SublimationPressureEquation!.Slope(tt);
            double vapSlope = fluid.VapourPressureEquation!.Pressure(tt) * fluid.VapourPressureEquation.Form.Slope(tt, fluid.VapourPressureEquation.Coefficients);
            double sublimation = tt * (vg - vs) * subSlope;
            double fusion = sublimation - tt * (vg - vl) * vapSlope;
            double sourced = fluid.EnthalpyOfFusion!.Value;
            double e = fluid.Name == "water" ? 0.001 : 0.01;
            double tolerance = sublimation / sourced * e;
            output.WriteLine(Invariant($"{fluid.Name}: dh_sub {sublimation:F0} J/mol, dh_fus from the slopes {fusion:F1} J/mol, sourced {sourced:F1} J/mol, {100 * (fusion / sourced - 1):+0.0;-0.0;0.0} % (allowed {100 * tolerance:F1} %)"));
            AssertClose.Relative(sourced, fusion, tolerance, $"{fluid.Name} Δh_fus from {fluid.SublimationPressureEquation.Source} and {fluid.VapourPressureEquation.Source} vs {fluid.EnthalpyOfFusion.Source}");
            count++;
        }

        Assert.True(count >= 4, $"{count} fluids checked (water, carbon dioxide, nitrogen and argon expected)");
    }

    /// <summary>(f, integrated) The sublimation line the toolkit draws without a published
    /// equation (Clapeyron from the sourced triple point with Δh_sub = Δh_fus + Δh_vap, Δh_vap from
    /// the fluid's vapour-pressure equation) against the published sublimation equation, for the
    /// fluids that have both: the catalog's Δh_fus, P_t and vapour-pressure equation together must
    /// reproduce the published line.</summary>
    [Fact]
    public void ClapeyronSublimationFromTheCatalogsFusionData_FollowsThePublishedSublimationEquation()
    {
        // Two effects separate the lines (all measured deviations are positive, the Clapeyron
        // line high):
        // - Δh_sub is held at its triple-point value (the catalog gives no solid heat capacity),
        //   while it grows towards low T by |Δcp|·(T_t − T), Δcp = cp° − cp_solid < 0. Integrating
        //   d ln P/dT = Δh/(RT²) from T_t, the held-constant line is high by (|Δcp|/R)·(x − ln(1 + x)),
        //   x = T_t/T − 1 (0.014 at 0.85·T_t). Near their triple points cp_solid is about 4.5R for ice
        //   (38 J/(mol·K)), 4R for argon, 5.5R for β-nitrogen and 6.5R for solid carbon dioxide (54
        //   J/(mol·K)), against cp° of 2.5R to 4R (solid heat capacities from memory, handbook
        //   level), so |Δcp| ≤ 2.5R; 3R is allowed.
        // - An error in Δh_sub itself (from Δh_fus: the Δh_fus test above measures up to 6.3 % of
        //   Δh_fus for nitrogen, 0.8 % of Δh_sub for carbon dioxide) scales ln(P/P_t): 1 %·|ln(P/P_t)|.
        // Plus 0.5 % for the model's vapour volume (Z differs from 1 by up to 8 % here, and the
        // model's second virial coefficient by a few percent of that).
        int count = 0;
        var failures = new List<string>();
        foreach (Fluid fluid in Catalog.Where(f => f.SublimationPressureEquation is not null && f.VapourPressureEquation is not null && f.EnthalpyOfFusion is not null))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            double t = Math.Max(0.85 * tt, fluid.SublimationPressureEquation!.LowestTemperature);
            var solver = CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson);
            var clapeyron = new PhaseSlope.Core.Solids.SolidPhaseLines(fluid with { SublimationPressureEquation = null }, solver).Sublimation(t).Pressure;
            double published = fluid.SublimationPressureEquation.Pressure(t);
            double x = tt / t - 1;
            double tolerance = 3 * (x - Math.Log(1 + x)) + 0.01 * Math.Abs(Math.Log(published / pt)) + 0.005;
            output.WriteLine(Invariant($"{fluid.Name} at {t:F3} K: Clapeyron from the catalog {clapeyron:G6} Pa, published equation {published:G6} Pa, {Percent(clapeyron / published - 1)} % (allowed {100 * tolerance:F1} %)"));
            if (!(Math.Abs(clapeyron / published - 1) <= tolerance))
            {
                failures.Add(Invariant($"{fluid.Name} at {t:F3} K: Clapeyron sublimation {clapeyron:G6} Pa from {fluid.EnthalpyOfFusion!.Source} vs {published:G6} Pa from {fluid.SublimationPressureEquation.Source}"));
            }

            count++;
        }

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
        Assert.True(count >= 4, $"{count} fluids checked");
    }

    /// <summary>(c) The published vapour-pressure equation at the triple-point temperature against
    /// the sourced triple-point pressure (both from the same reference equation of state).</summary>
    [Fact]
    public void VapourPressureEquation_AtTheTriplePoint_GivesTheSourcedTriplePointPressure()
    {
        // Tolerance: the printed digits of P_t (half a unit of the last digit, at most 0.5·10^(1−n) relative
        // for n significant digits: 0.5 % for ethane's 1.14 Pa) plus the ancillary's own fit to its equation of state: 0.1 % where
        // P_t ≥ 1 kPa (ancillaries are fitted to the saturation pressures computed from their
        // equation of state and reproduce them to about 0.1 % over the pressures that dominate
        // the fit; measured here 0.013 % at most), 2.5 % below 1 kPa, where a four- or five-term
        // Wagner form is stretched over eight to ten decades of pressure and its relative
        // deviation grows (measured 1.8 % for propane at 1.7e-4 Pa and 1.7 % for R-134a at
        // 390 Pa).
        int count = 0;
        foreach (Fluid fluid in Catalog.Where(f => f.VapourPressureEquation is not null && f.TriplePointPressure is not null))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            double equation = fluid.VapourPressureEquation!.Pressure(tt);
            double tolerance = HalfUnitOfLastDigit(fluid.TriplePointPressure) + (pt >= 1000 ? 0.001 : 0.025);
            output.WriteLine(Invariant($"{fluid.Name}: vapour-pressure equation at {tt} K: {equation:G6} Pa, sourced P_t {pt:G6} Pa, {100 * (equation / pt - 1):+0.000;-0.000;0.000} % (allowed {100 * tolerance:F2} %)"));
            AssertClose.Relative(pt, equation, tolerance, $"{fluid.Name} {fluid.VapourPressureEquation.Source} at T_t vs {fluid.TriplePointPressure.Source}");
            count++;
        }

        Assert.True(count >= 8, $"{count} fluids with both a vapour-pressure equation and P_t");
    }

    /// <summary>(d) Every solid datum names a publication (author and year) and, being recalled,
    /// says "from memory".</summary>
    [Fact]
    public void EverySolidDatum_NamesAPublicationAndIsMarkedFromMemory()
    {
        var failures = new List<string>();
        foreach (Fluid fluid in Catalog)
        {
            var sources = new (string Key, string? Source)[]
            {
                ("triple_point_temperature", fluid.TriplePointTemperature?.Source),
                ("triple_point_pressure", fluid.TriplePointPressure?.Source),
                ("enthalpy_of_fusion", fluid.EnthalpyOfFusion?.Source),
                ("solid_density", fluid.SolidDensity?.Source),
                ("triple_point_liquid_density", fluid.TriplePointLiquidDensity?.Source),
                ("fusion_volume_change", fluid.FusionVolumeChange?.Source),
                ("solid_heat_capacity", fluid.SolidHeatCapacity?.Source),
                ("melting_pressure_equation", fluid.MeltingPressureEquation?.Source),
                ("sublimation_pressure_equation", fluid.SublimationPressureEquation?.Source),
            };
            foreach (var (key, source) in sources)
            {
                if (source is null)
                {
                    continue;
                }

                // A publication: a year in parentheses, e.g. "(2000)", or a handbook by name.
                bool publication = PublicationYear().IsMatch(source) || source.Contains("Handbook", StringComparison.Ordinal);
                if (!publication || !source.Contains("from memory", StringComparison.Ordinal))
                {
                    failures.Add($"{fluid.Name} {key}: '{source}'");
                }
            }
        }

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }

    /// <summary>Entropies of fusion Δh_fus/T_t in the range real substances show (common practice,
    /// a rule of thumb): at least about R (Richards's rule for monatomic and plastic crystals, the
    /// smallest entropies of fusion, of simple and globular molecules whose solid just below the
    /// melting point is already rotationally disordered), at most about 15R (long flexible chains
    /// gain conformational entropy on melting). Catches a unit slip (J for kJ, per kg for per mol)
    /// in any file.</summary>
    [Fact]
    public void EntropyOfFusion_LiesInTheRangeRealSubstancesShow()
    {
        var failures = new List<string>();
        foreach (Fluid fluid in Catalog.Where(f => f.EnthalpyOfFusion is not null))
        {
            Assert.True(fluid.TriplePointTemperature is not null, $"{fluid.Name} has an enthalpy of fusion but no triple-point temperature");
            double entropy = fluid.EnthalpyOfFusion!.Value / fluid.TriplePointTemperature!.Value / Constants.GasConstant;
            output.WriteLine(Invariant($"{fluid.Name}: dS_fus/R = {entropy:F2}"));

            // Measured: smallest oxygen 0.98R (its solid has two transitions below melting that take
            // up most of the entropy) and hydrogen 1.01R; largest n-decane 14.2R. Bounds 0.8R-15R.
            if (!(entropy >= 0.8 && entropy <= 15))
            {
                failures.Add(Invariant($"{fluid.Name}: dS_fus = {entropy:F2} R from {fluid.EnthalpyOfFusion.Source}"));
            }
        }

        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }

    /// <summary>The triple-point pressure is only meaningful with the triple-point temperature, and
    /// the fusion data with both; a helium-like fluid without a triple point carries neither.</summary>
    [Fact]
    public void SolidData_ComeWithTheTriplePointTheyBelongTo()
    {
        foreach (Fluid fluid in Catalog)
        {
            if (fluid.TriplePointPressure is not null || fluid.MeltingPressureEquation is not null || fluid.SublimationPressureEquation is not null || fluid.FusionVolumeChange is not null)
            {
                Assert.True(fluid.TriplePointTemperature is not null, $"{fluid.Name} has solid data but no triple_point_temperature");
            }

            if (fluid.TriplePointPressure is { } pt)
            {
                // The triple point is on the liquid's vapour-pressure curve, below the critical point.
                Assert.True(pt.Value > 0 && pt.Value < fluid.CriticalPressure.Value, $"{fluid.Name} P_t {pt.Value} Pa");
            }
        }

        Assert.True(FluidCatalog.Embedded.Find("helium").TriplePointPressure is null, "helium-4 has no solid-liquid-vapour triple point");
    }

    /// <summary>(e) The model's vapour pressure at the sourced triple-point temperature against the
    /// sourced triple-point pressure, for every catalog fluid that has both (the check the solid
    /// lines report as <c>TriplePointCheck</c>): Peng–Robinson as the catalog builds it (its own
    /// Soave alpha unless the file names a preferred one) and, where the file has one, with its
    /// tuned Mathias–Copeman alpha. The table is printed to the test output.</summary>
    [Fact]
    public void ModelVapourPressureAtTheTriplePoint_AgainstTheSourcedPressure_ForEveryFluid()
    {
        // Bounds on |ln(P_model/P_t)|, from what the model is and from the measured table (the
        // test's purpose is to catch a mistyped or mis-scaled P_t, e.g. kPa for Pa, ln 1000 = 6.9,
        // or a value recalled an order of magnitude off, not to grade the model):
        // - Peng–Robinson's generalised alpha has κ(ω) fitted to vapour pressures from T_r ≈ 0.7 to
        //   1 (ω itself is defined at T_r = 0.7); below, the error in ln P grows with the distance
        //   1/T_r − 1 from the fitted range. Measured at triple points with T_r ≥ 0.28: at most
        //   0.25 in ln P (ethane +29 % at T_r = 0.30, ethylene +26 % at 0.37, water −20.5 % at
        //   0.42, hydrogen −18 %); bound 0.35 (a factor 1.42). Below T_r = 0.28 only propane
        //   (T_r = 0.23, P_t = 1.7e-4 Pa, ten decades below P_c): measured +112 %, 0.75 in ln P;
        //   bound ln 3 = 1.10.
        // - The tuned Mathias–Copeman alpha was fitted to the file's own vapour-pressure equation
        //   from the lowest valid temperature (then max(0.3 T_c, T_t)) to 0.98 T_c, with maximum
        //   deviations of 0.2–0.6 %: where T_t ≥ 0.3 T_c the triple point is inside that range, bound
        //   0.02 in ln P (2 %, the fit's worst point plus its extrapolation to the range's end); below,
        //   it is an extrapolation and held to the own-alpha bound.
        var table = new StringBuilder();
        table.AppendLine("fluid                T_t K     T_t/T_c  P_t sourced Pa  PR Pa           dev %    PR tuned MC Pa  dev %");
        var failures = new List<string>();
        int count = 0;
        foreach (Fluid fluid in Catalog.Where(f => f.TriplePointTemperature is not null && f.TriplePointPressure is not null).OrderBy(f => f.Name, StringComparer.Ordinal))
        {
            double tt = fluid.TriplePointTemperature!.Value, pt = fluid.TriplePointPressure!.Value;
            double reduced = tt / fluid.CriticalTemperature.Value;
            double model = new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, fluid), tt).AtTemperature(tt).Pressure;
            double? tuned = CubicModel.FindParameters(fluid, CubicModelKind.PengRobinson, AlphaForm.MathiasCopeman) is null
                ? null
                : new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.MathiasCopeman), tt).AtTemperature(tt).Pressure;
            string tunedText = tuned is double p ? Invariant($"{p,15:G6} {Percent(p / pt - 1),7}") : $"{"-",15} {"-",7}";
            table.AppendLine(Invariant($"{fluid.Name,-20} {tt,8:F3} {reduced,8:F3} {pt,15:G6} {model,15:G6} {Percent(model / pt - 1),7} {tunedText}"));

            double ownBound = reduced >= 0.28 ? 0.35 : Math.Log(3);
            if (Math.Abs(Math.Log(model / pt)) > ownBound)
            {
                failures.Add(Invariant($"{fluid.Name}: Peng-Robinson {model:G6} Pa vs {pt:G6} Pa ({fluid.TriplePointPressure.Source}), bound {ownBound:G3} in ln P"));
            }

            double tunedBound = reduced >= 0.3 ? 0.02 : ownBound;
            if (tuned is double q && Math.Abs(Math.Log(q / pt)) > tunedBound)
            {
                failures.Add(Invariant($"{fluid.Name}: tuned Mathias-Copeman {q:G6} Pa vs {pt:G6} Pa ({fluid.TriplePointPressure.Source}), bound {tunedBound:G3} in ln P"));
            }

            count++;
        }

        output.WriteLine(table.ToString());
        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
        Assert.True(count >= 20, $"{count} fluids with a sourced triple point");
    }

    private static string Percent(double fraction) => (100 * fraction).ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture);

    /// <summary>Half a unit of a value's last printed digit, relative to the value (an upper bound:
    /// 0.5·10^(1−n) for n significant digits). The digits are the value's own (G6, trailing zeros
    /// dropped), which for the catalog's values of at most six digits are those printed in the
    /// file whatever the unit (12.5198 kPa is 12519.8 Pa, 0.51795 MPa is 517950 Pa).</summary>
    private static double HalfUnitOfLastDigit(SourcedValue value)
    {
        string mantissa = value.Value.ToString("G6", CultureInfo.InvariantCulture).Split('E')[0];
        string digits = mantissa.Replace("-", "", StringComparison.Ordinal).Replace(".", "", StringComparison.Ordinal).Trim('0');
        int significant = Math.Max(1, digits.Length);
        return 0.5 * Math.Pow(10, 1 - significant);
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    [GeneratedRegex(@"\((1[89]|20)\d\d\)")]
    private static partial Regex PublicationYear();
}
