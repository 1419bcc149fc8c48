using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Equilibrium;
using PhaseSlope.Core.Tests.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Validation.Sections;

internal static class Numerics
{
    private static readonly CubicModelKind[] Kinds = Enum.GetValues<CubicModelKind>();

    public static void Write(Page page)
    {
        page.Heading(2, "Numerics (model-internal consistency)");
        var rows = new List<string[]>();
        CubicForms(rows);
        Roots(rows);
        Helmholtz(rows);
        CatalogSweep(rows);
        Slopes(rows);
        NearCritical(rows);
        RandomSweep(rows);
        page.Table(["check", "reference", "result", "held to", "where"], rows);
        page.Paragraph("""
            Also checked by the test suite, not recomputed on this page: ln φ against ∫(Z − 1)/P dP along the isotherm
            (`Properties/PhaseStateTests`); the critical series
            against the Newton solution across its boundary and saturation within 1e-12 of Pc
            (`Equilibrium/NearCriticalTests`); a non-cubic model through the same interface
            (`Models/NonCubicModelTests`). Each test states its tolerance and why.
            """);
        page.Paragraph("""
            Near Tc double precision, not the iteration, limits what a Newton iteration on the densities can
            resolve: the pressure difference between the phases is of order Pc·(Δρ/ρc)³, so the densities carry
            about 1e-16/(1 − T/Tc) relative error from rounding alone. The solver therefore uses the critical series
            within 1e-4 of Tc (docs/methods.md) and states the density uncertainty of every point
            (`SolverReport.DensityUncertainty`; its largest value over the catalog states above is in the table).
            """);
    }

    private static void CubicForms(List<string[]> rows)
    {
        // Exact values from the critical conditions: van der Waals Zc = 3/8, Ωa = 27/64, Ωb = 1/8;
        // Redlich–Kwong Zc = 1/3, Ωb = (2^(1/3) − 1)/3, Ωa = 1/(9(2^(1/3) − 1)).
        var vdw = CubicForm.VanDerWaals;
        double vdwError = new[] { vdw.CriticalCompressibility / (3.0 / 8) - 1, vdw.OmegaA / (27.0 / 64) - 1, vdw.OmegaB / (1.0 / 8) - 1 }.Max(Math.Abs);
        var rk = CubicForm.RedlichKwong;
        double cbrt2 = Math.Cbrt(2);
        double rkError = new[] { rk.CriticalCompressibility / (1.0 / 3) - 1, rk.OmegaB / ((cbrt2 - 1) / 3) - 1, rk.OmegaA / (1 / (9 * (cbrt2 - 1))) - 1 }.Max(Math.Abs);
        var pr = CubicForm.PengRobinson;
        rows.Add(["Peng–Robinson Zc, Ωa, Ωb from the critical conditions", "0.30740, 0.45724, 0.07780 (Peng & Robinson 1976 print rounded values; from memory)",
            $"{Fmt.F(pr.CriticalCompressibility, 5)}, {Fmt.F(pr.OmegaA, 5)}, {Fmt.F(pr.OmegaB, 5)}", "half a unit in the fifth decimal", "`Models/CubicFormTests`"]);
        rows.Add(["van der Waals Zc, Ωa, Ωb", "3/8, 27/64, 1/8 (exact)", "relative error " + Fmt.Below(vdwError), "1e-15", "`Models/CubicFormTests`"]);
        rows.Add(["Redlich–Kwong Zc, Ωa, Ωb", "1/3, 1/(9(2^(1/3) − 1)), (2^(1/3) − 1)/3 (exact)", "relative error " + Fmt.Below(rkError, 1.5e-15), "1e-14", "`Models/CubicFormTests`"]);
    }

    /// <summary>HelmholtzDerivativesTests: every analytic derivative against a central difference (relative
    /// step HelmholtzStates.Step) at the test's states, the error relative to |f|/x + |f'|.</summary>
    private static void Helmholtz(List<string[]> rows)
    {
        double worst = 0;
        int checks = 0;
        void Check(Func<double, double> f, double x, double analytic)
        {
            double h = HelmholtzStates.Step * x;
            double fd = (f(x + h) - f(x - h)) / (2 * h);
            worst = Math.Max(worst, Math.Abs(analytic - fd) / (Math.Abs(f(x)) / x + Math.Abs(analytic)));
            checks++;
        }

        foreach (object[] c in HelmholtzDerivativesTests.States())
        {
            var kind = (CubicModelKind)c[0];
            var fluid = FluidCatalog.Embedded.Find((string)c[1]);
            var model = CubicModel.For(kind, fluid);
            var (t, rho) = HelmholtzStates.Pick(model, CoexistenceSolver.LowestValidTemperature(fluid), (string)c[2]);
            var d = model.Residual(t, rho);
            Check(x => model.Residual(x, rho).Value, t, d.DT);
            Check(x => model.Residual(x, rho).DT, t, d.DTT);
            Check(x => model.Residual(x, rho).DRho, t, d.DTRho);
            Check(x => model.Residual(x, rho).Pressure, t, d.PressureDT);
            Check(x => model.Residual(t, x).Value, rho, d.DRho);
            Check(x => model.Residual(t, x).DRho, rho, d.DRhoRho);
            Check(x => model.Residual(t, x).DRhoRho, rho, d.DRhoRhoRho);
            Check(x => model.Residual(t, x).DT, rho, d.DTRho);
            Check(x => model.Residual(t, x).Pressure, rho, d.PressureDRho);
            Check(x => model.Residual(t, x).PressureDRho, rho, d.PressureDRhoRho);
        }

        rows.Add([$"analytic Helmholtz derivatives (A_T, A_TT, A_Tρ, A_ρ, A_ρρ, A_ρρρ, ∂P/∂T, ∂P/∂ρ, ∂²P/∂ρ²) vs central differences: propane with every model and ethanol with Peng–Robinson 1978, saturated liquid and vapour at 0.7 Tc and supercritical ({checks} checks)", "central differences (relative step 1e-5)",
            $"worst {Fmt.Below(worst)} of |f|/x + |f′|", "1e-7 (the difference's truncation)", "`Models/HelmholtzDerivativesTests`"]);
    }

    /// <summary>DensityRootsTests.ClosedForm_EqualsDefaultNewtonRoots: n-hexane, every model, its grid.</summary>
    private static void Roots(List<string[]> rows)
    {
        var fluid = FluidCatalog.Embedded.Find("n-hexane");
        double worst = 0;
        int pairs = 0, countMismatches = 0;
        Span<double> closed = stackalloc double[2];
        Span<double> newton = stackalloc double[2];
        foreach (var kind in Kinds)
        {
            var model = CubicModel.For(kind, fluid);
            foreach (double tr in new[] { 0.35, 0.6, 0.9, 0.99, 1.2, 2 })
            {
                foreach (double pr in new[] { 1e-6, 1e-3, 0.05, 0.3, 0.9, 1.5, 10 })
                {
                    double t = tr * model.CriticalTemperature, p = pr * model.CriticalPressure;
                    int n = model.DensityRoots(t, p, Composition.Pure, closed);
                    int m = DefaultDensityRoots.Find(model, t, p, Composition.Pure, newton);
                    countMismatches += n == m ? 0 : 1;
                    for (int i = 0; i < Math.Min(n, m); i++)
                    {
                        worst = Math.Max(worst, Math.Abs(closed[i] / newton[i] - 1));
                    }

                    pairs++;
                }
            }
        }

        rows.Add([$"closed-form cubic density roots vs the default Newton roots, n-hexane, {pairs / Kinds.Length} (T, P) pairs × {Kinds.Length} models", "the Newton roots",
            $"{countMismatches} differ in the number of roots; densities {Fmt.Below(worst)} relative", "same count; 1e-12", "`Models/DensityRootsTests`"]);
    }

    /// <summary>The catalog sweeps of CoexistenceSolverTests and SolverCostTests: every fluid × model.</summary>
    private static void CatalogSweep(List<string[]> rows)
    {
        var fluids = FluidCatalog.Embedded.All.OrderBy(f => f.Name, StringComparer.Ordinal).ToList();
        double worstCritical = 0, worstResidual = 0, worstRoundTrip = 0, worstDensityUncertainty = 0;
        int states = 0, roundTrips = 0, belowTriple = 0;
        double[] nearCritical = [1 - 1e-4, 1 - 1e-6, 1 - 1e-8];
        double[] roundTripReduced = [0.3, 0.5, 0.7, 0.9, 0.99, 0.999, 0.9999];
        foreach (var fluid in fluids)
        {
            foreach (var kind in Kinds)
            {
                var solver = CoexistenceSolver.For(fluid, kind);
                var model = (CubicModel)solver.Model;
                worstCritical = Math.Max(worstCritical, Math.Max(Math.Abs(solver.CriticalTemperature / fluid.CriticalTemperature.Value - 1), Math.Abs(solver.CriticalPressure / fluid.CriticalPressure.Value - 1)));
                double tmin = solver.MinimumTemperature;
                double top = 0.999 * model.CriticalTemperature;
                var temperatures = Enumerable.Range(0, 20).Select(i => tmin + (top - tmin) * i / 19).Concat(nearCritical.Select(r => r * model.CriticalTemperature));
                foreach (double t in temperatures)
                {
                    var point = solver.AtTemperature(t);
                    worstResidual = Math.Max(worstResidual, Math.Abs(point.Liquid.LnFugacityCoefficient - point.Vapour.LnFugacityCoefficient));
                    worstDensityUncertainty = Math.Max(worstDensityUncertainty, point.Report.DensityUncertainty);
                    states++;
                }

                foreach (double tr in roundTripReduced)
                {
                    double t = tr * model.CriticalTemperature;
                    if (t < tmin)
                    {
                        continue;
                    }

                    double pressure = solver.AtTemperature(t).Pressure;
                    if (fluid.TriplePointPressure?.Value is double pt && pressure < pt)
                    {
                        belowTriple++; // the model's Psat below the sourced triple-point pressure: refused at P
                        continue;
                    }

                    var back = solver.AtPressure(pressure);
                    worstRoundTrip = Math.Max(worstRoundTrip, Math.Abs(back.Temperature / t - 1));
                    roundTrips++;
                }
            }
        }

        rows.Add([$"each model's critical point, located numerically, vs input Tc, Pc ({fluids.Count} catalog fluids × {Kinds.Length} models)", "the input constants",
            "relative error " + Fmt.Below(worstCritical), "1e-12", "`Models/CubicModelTests`"]);
        rows.Add([$"equal-fugacity residual \\|ln φL − ln φV\\|, every catalog fluid × model, 20 temperatures from the lowest valid one to 0.999 Tc and at T/Tc = 1 − 1e-4, 1 − 1e-6, 1 − 1e-8 ({Fmt.N(states)} states)", "0 (equal fugacities)",
            "worst " + Fmt.Below(worstResidual, 1.5e-13) + "; largest stated density uncertainty " + Fmt.Below(worstDensityUncertainty), "1e-12", "`Equilibrium/CoexistenceSolverTests`"]);
        rows.Add([$"Tsat(Psat(T)) = T, every catalog fluid × model, T/Tc = {string.Join(", ", roundTripReduced.Select(r => r.ToString(System.Globalization.CultureInfo.InvariantCulture)))} ({Fmt.N(roundTrips)} states above the lowest valid temperature; {Fmt.N(belowTriple)} where the model's Psat lies below the sourced triple-point pressure are refused at given P and left out)", "T",
            "relative error " + Fmt.Below(worstRoundTrip), "1e-12", "`Equilibrium/SolverCostTests`, `Equilibrium/NearCriticalTests`"]);
    }

    /// <summary>The Clapeyron slope against a 5-point difference of the solver's own Psat(T), on the
    /// cases the test reads (its SlopeCases table).</summary>
    private static void Slopes(List<string[]> rows)
    {
        double[] reduced = [0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.99];
        double worst = 0;
        var names = new List<string>();
        foreach (object[] c in CoexistenceSolverTests.SlopeCases())
        {
            string name = (string)c[0];
            var kind = (CubicModelKind)c[1];
            names.Add($"{name} ({Fmt.Model(kind)})");
            var solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find(name), kind);
            foreach (double tr in reduced)
            {
                double t = tr * solver.CriticalTemperature;
                double h = 1e-4 * t;
                double P(double x) => solver.AtTemperature(x).Pressure;
                double fd = (P(t - 2 * h) - 8 * P(t - h) + 8 * P(t + h) - P(t + 2 * h)) / (12 * h);
                worst = Math.Max(worst, Math.Abs(solver.AtTemperature(t).Slope / fd - 1));
            }
        }

        rows.Add([$"Clapeyron slope Δh/(TΔv) vs a 5-point central difference (h = 1e-4·T) of the solver's own Psat(T), T/Tc = 0.5 … 0.99; {string.Join(", ", names)}", "Clapeyron (1834)",
            "relative difference " + Fmt.Below(worst), "1e-7", "`Equilibrium/CoexistenceSolverTests`"]);
    }

    /// <summary>NearCriticalTests.AtTemperature_WithinOneInAMillionOfTc_FollowsTheClassicalSquareRoot: the
    /// mean-field amplitude (ρL − ρV)/√ε at ε = 1 − T/Tc = 1e-6 and 1e-8 against ε = 1e-10, on its Fluids table.</summary>
    private static void NearCritical(List<string[]> rows)
    {
        double worst = 0;
        var names = new List<string>();
        foreach (object[] c in NearCriticalTests.Fluids)
        {
            string name = (string)c[0];
            var kind = (CubicModelKind)c[1];
            names.Add($"{name} ({Fmt.Model(kind)})");
            var solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find(name), kind);
            double tc = solver.CriticalTemperature;
            double Ratio(double eps)
            {
                double t = tc * (1 - eps);
                var p = solver.AtTemperature(t);
                return (p.Liquid.Density - p.Vapour.Density) / Math.Sqrt(1 - t / tc);
            }

            double reference = Ratio(1e-10);
            worst = Math.Max(worst, Math.Max(Math.Abs(Ratio(1e-8) / reference - 1), Math.Abs(Ratio(1e-6) / reference - 1)));
        }

        rows.Add([$"near-critical: (ρL − ρV)/√(1 − T/Tc) at 1e-6 and 1e-8 below Tc against 1e-10 below; {string.Join(", ", names)}", "mean-field square root (constant amplitude)",
            $"relative difference {Fmt.Below(worst)} (the O(1 − T/Tc) term plus the rounding of T itself)", "3e-6", "`Equilibrium/NearCriticalTests`"]);
    }

    /// <summary>The seeded sweep of RandomFluidSweepTests, same seed, recipe and size (about
    /// ten seconds here, so no smaller sample is needed).</summary>
    private const int RandomCases = 100_000;

    private static void RandomSweep(List<string[]> rows)
    {
        var sweep = PhaseSlope.Core.Tests.Equilibrium.RandomFluidSweepTests.Sweep(RandomCases);
        int failures = sweep.Failures.Count;
        double worstResidual = sweep.WorstResidual, worstRoundTrip = sweep.WorstRoundTrip, lowestPressure = sweep.LowestPressure;

        rows.Add([$"seeded sweep of random fluids (Tc 5–1000 K, Pc 0.1–100 MPa, ω −0.4…1.6, every model, generalised Twu for a third of the Peng–Robinson cases; T from 0.3 Tc to 1 − 1e-9 of Tc): {Fmt.N(RandomCases)} fluids, the test's seed and recipe", "equal fugacities; T back",
            $"{failures} failures; worst \\|ln φL − ln φV\\| {Fmt.Below(worstResidual)}, worst Tsat(Psat(T)) {Fmt.Below(worstRoundTrip)} relative (Psat down to about 1e{Math.Round(Math.Log10(lowestPressure)).ToString(System.Globalization.CultureInfo.InvariantCulture)} Pa)",
            "no failure; 1e-12; 1e-11", "`Equilibrium/RandomFluidSweepTests`"]);
    }
}
