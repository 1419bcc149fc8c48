using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Mixtures;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Validation.Sections;

/// <summary>The P–T flash of the invented 10-component gas near its envelope and critical point
/// (Mixtures/MixtureCriticalRegionTests), and the carbon dioxide–ethane azeotrope with the published
/// k_ij (Mixtures/BinaryDiagramTests).</summary>
internal static class MixtureCriticalRegion
{
    public static void Write(Page page)
    {
        page.Heading(2, "Mixture flashes near the critical region");
        page.Paragraph($"""
            Peng–Robinson, k_ij = 0, the invented 10-component gas of the tests ({string.Join(", ", NaturalGasNames.Select((n, i) => $"{n} {NaturalGas[i]}"))}).
            Each state is checked against the defining equations recomputed here from the model: a split must close
            the material balance, have equal fugacities and lower the Gibbs energy; a single phase must be stable to the
            stability test's resolution (tm ≥ −1e-10).
            """);
        var engine = Engine(0, NaturalGasNames);
        var rows = new List<string[]>();
        Grid(engine, rows);
        FailedBefore(engine, rows);
        AroundCritical(engine, rows);
        CarbonDioxideEthane(rows);
        page.Table(["check", "states", "result", "held to", "where"], rows);
    }

    private sealed class Tally
    {
        public int States, Splits, Failures, Unstable, GibbsNotLower;
        public double Balance, Fugacity;
    }

    /// <summary>The checks of MixtureCriticalRegionTests.Check, recording the worst values.</summary>
    private static void Check(MixtureEquilibrium engine, MixtureFlashResult flash, Tally tally, bool independentStability)
    {
        double t = flash.Temperature, p = flash.Pressure;
        var z = NaturalGas;
        int n = z.Length;
        tally.States++;
        if (!flash.IsTwoPhase)
        {
            double tm = flash.Stability.TangentPlaneDistance;
            if (independentStability)
            {
                tm = Math.Min(tm, TangentPlane.Minimum(engine.Model, t, p, z));
            }

            tally.Unstable += flash.Stability.IsStable && tm >= -StabilityAnalysis.NegativeDistance ? 0 : 1;
            return;
        }

        tally.Splits++;
        double beta = flash.VapourFraction;
        var measured = MixtureCriticalRegionTests.MeasureSplit(engine, flash, z);
        tally.Balance = Math.Max(tally.Balance, measured.Balance);
        tally.Fugacity = Math.Max(tally.Fugacity, measured.Fugacity);
        double gibbsChange = measured.GibbsChange;
        tally.GibbsNotLower += gibbsChange < 0 && flash.GibbsEnergyChange < 0 && beta > 0 && beta < 1 ? 0 : 1;
    }

    private static string Result(Tally tally)
        => $"{tally.Failures} failures; {Fmt.N(tally.Splits)} two-phase; worst material balance {Fmt.Below(tally.Balance, 1.5e-16)}, worst |Δln f| {Fmt.Below(tally.Fugacity, 1.5e-11)}; {tally.GibbsNotLower} splits not lowering G; {tally.Unstable} single phases with tm below −1e-10";

    private const string HeldTo = "no failure; material balance 1e-12; ln f equal to 1e-8; ΔG < 0 (recomputed and reported); single phase tm ≥ −1e-10";

    /// <summary>MixtureCriticalRegionTests.Flash_FineGridAcrossTheCriticalRegion_ConvergesEverywhere:
    /// the whole grid (about 5 s of CPU in Debug, 10 s wall on a busy two-core machine,
    /// measured when written: the whole grid, not a subset, fits the generator's budget).</summary>
    private static void Grid(MixtureEquilibrium engine, List<string[]> rows)
    {
        var tally = new Tally();
        for (int a = 0; a <= 100; a++)
        {
            for (int b = 0; b <= 120; b++)
            {
                double t = 150 + a, p = 4.5e6 + 0.05e6 * b;
                try
                {
                    Check(engine, engine.Flash(t, p, NaturalGas), tally, independentStability: false);
                }
                catch (ConvergenceException)
                {
                    tally.States++;
                    tally.Failures++;
                }
            }
        }

        rows.Add(["T–P flash on the whole grid T 150–250 K by 1 K × P 4.5–10.5 MPa by 0.05 MPa (the dense part of the envelope, its cricondenbar and critical point)",
            Fmt.N(tally.States), Result(tally), HeldTo + "; more than 1 000 two-phase states", "`Mixtures/MixtureCriticalRegionTests`"]);
    }

    /// <summary>MixtureCriticalRegionTests.Flash_StatesThatFailedBefore_Converge (its InlineData).</summary>
    private static void FailedBefore(MixtureEquilibrium engine, List<string[]> rows)
    {
        var tally = new Tally();
        foreach (var (t, mpa) in References.CriticalRegionFailedBefore)
        {
            try
            {
                Check(engine, engine.Flash(t, mpa * 1e6, NaturalGas), tally, independentStability: true);
            }
            catch (ConvergenceException)
            {
                tally.States++;
                tally.Failures++;
            }
        }

        rows.Add(["the 13 states that failed before the restricted-step Newton (8 in the stability test just above the envelope, 207–232 K; 5 in the split within about 1 % of the critical point), single phases also checked by the test-side tangent-plane minimisation",
            Fmt.N(tally.States), Result(tally), HeldTo, "`Mixtures/MixtureCriticalRegionTests`"]);
    }

    /// <summary>MixtureCriticalRegionTests.Flash_AroundTheCriticalPoint_ConvergesAndPassesTheChecks.</summary>
    private static void AroundCritical(MixtureEquilibrium engine, List<string[]> rows)
    {
        var critical = CriticalPointCriteria.Locate(engine.Model, NaturalGas).Single();
        var tally = new Tally();
        int insideSplit = 0, inside = 0;
        foreach (double offset in new[] { 1e-3, 1e-4, 1e-5, 1e-6 })
        {
            foreach (int dt in new[] { -1, 0, 1 })
            {
                foreach (int dp in new[] { -1, 0, 1 })
                {
                    try
                    {
                        Check(engine, engine.Flash(critical.Temperature * (1 + dt * offset), critical.Pressure * (1 + dp * offset), NaturalGas), tally, independentStability: true);
                    }
                    catch (ConvergenceException)
                    {
                        tally.States++;
                        tally.Failures++;
                    }
                }
            }

            if (offset >= 1e-4)
            {
                inside++;
                insideSplit += engine.Flash(critical.Temperature * (1 + offset), critical.Pressure * (1 - offset), NaturalGas).IsTwoPhase ? 1 : 0;
            }
        }

        rows.Add([$"3 × 3 states at relative offsets 1e-3, 1e-4, 1e-5, 1e-6 in T and P around the critical point of the Heidemann–Khalil criteria ({Fmt.F(critical.Temperature, 2)} K, {Fmt.F(critical.Pressure / 1e6, 3)} MPa)",
            Fmt.N(tally.States), Result(tally) + $"; at T_c(1 + δ), P_c(1 − δ) two-phase for {insideSplit} of {inside} offsets ≥ 1e-4",
            HeldTo + "; two phases at T_c(1 + δ), P_c(1 − δ) for δ ≥ 1e-4", "`Mixtures/MixtureCriticalRegionTests`"]);
    }

    /// <summary>BinaryDiagramTests.CarbonDioxideEthane_MaximumPressureAzeotrope_WithThePublishedKij.</summary>
    private static void CarbonDioxideEthane(List<string[]> rows)
    {
        Fluid co2 = FluidCatalog.Embedded.Find("carbon-dioxide"), ethane = FluidCatalog.Embedded.Find("ethane");
        if (!PublishedInteractions.TryFind(co2, ethane, CubicModelKind.PengRobinson, out var published))
        {
            rows.Add(["carbon dioxide–ethane azeotrope with the published k_ij", "–", "no published k_ij in the catalog", "–", "`Mixtures/BinaryDiagramTests`"]);
            return;
        }

        var engine = MixtureEquilibrium.For([co2, ethane], CubicModelKind.PengRobinson, [0, published.Value, published.Value, 0]);
        var ideal = MixtureEquilibrium.For([co2, ethane], CubicModelKind.PengRobinson, [0, 0, 0, 0]);
        var parts = new List<string>();
        foreach (double t in References.Co2EthaneAzeotropeTemperatures)
        {
            var azeotrope = BinaryDiagram.AtTemperature(engine, t).Azeotrope;
            if (azeotrope is null)
            {
                parts.Add($"{Fmt.F(t, 0)} K: no azeotrope");
                continue;
            }

            double highestPure = new[] { co2, ethane }.Max(f => new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, f), CoexistenceSolver.LowestValidTemperature(f)).AtTemperature(t).Pressure);
            var weak = BinaryDiagram.AtTemperature(ideal, t).Azeotrope;
            string kind = azeotrope.Kind == AzeotropeKind.MaximumPressure ? "maximum-pressure" : "minimum-pressure";
            parts.Add($"{Fmt.F(t, 0)} K: {kind}, x_CO2 = {Fmt.F(azeotrope.MoleFraction, 3)} ({Fmt.Signed(azeotrope.MoleFraction - 2.0 / 3, 3)}), {Fmt.F(azeotrope.Pressure / 1e6, 4)} MPa, {Fmt.Pct(azeotrope.Pressure / highestPure - 1, 2)} above the higher pure vapour pressure; with k_ij = 0 {(weak is null ? "no azeotrope" : $"{Fmt.F(weak.Pressure / 1e6, 4)} MPa")}");
        }

        rows.Add([$"carbon dioxide–ethane azeotrope with the published k_ij = {published.Value} ({published.Source}); reference: maximum-pressure, about two-thirds carbon dioxide at all these temperatures ({References.Co2EthaneAzeotropeSource})",
            Fmt.N(References.Co2EthaneAzeotropeTemperatures.Length), string.Join("; ", parts),
            "maximum-pressure; x within ±0.08 of 2/3; above both pure vapour pressures; weaker or absent with k_ij = 0", "`Mixtures/BinaryDiagramTests`"]);
    }
}
