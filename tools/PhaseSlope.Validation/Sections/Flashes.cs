using PhaseSlope.Core;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.Properties;

namespace PhaseSlope.Validation.Sections;

internal static class Flashes
{
    public static void Write(Page page)
    {
        page.Heading(2, "Flashes (`flash`): states from any two properties");
        page.Paragraph("""
            Peng–Robinson with the catalog cp°. A state computed at (T, P) or on the coexistence line is flashed back
            from other pairs of properties; the flash promises T to 1e-10 relative (it converges the property it
            matches to 1e-12).
            """);
        var rows = new List<string[]>();
        Catalog(rows);
        EveryPair(rows);
        LeverRule(rows);
        page.Table(["check", "states", "result", "held to", "where"], rows);
    }

    /// <summary>The grid of CatalogFlashTests: every catalog fluid with cp° (its Fluids table).</summary>
    private static void Catalog(List<string[]> rows)
    {
        double worstT = 0, worstTHighCp = 0, worstQuality = 0, worstResidual = 0;
        int states = 0, fluids = 0, skipped = 0;
        foreach (string name in CatalogFlashTests.Fluids())
        {
            var engine = PropertyModel.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson);
            fluids++;
            void Check(double t, double p, double? x, double h, double s)
            {
                var fromH = engine.Flash(StateProperty.Pressure, p, StateProperty.Enthalpy, h);
                var fromS = engine.Flash(StateProperty.Pressure, p, StateProperty.Entropy, s);
                foreach (var back in new[] { fromH, fromS })
                {
                    double error = Math.Abs(back.Temperature / t - 1);
                    if (x is double quality)
                    {
                        worstQuality = Math.Max(worstQuality, Math.Abs((back.Quality ?? double.NaN) - quality));
                        worstT = Math.Max(worstT, error);
                    }
                    else if (back.Single!.IsobaricHeatCapacity > 1e3)
                    {
                        worstTHighCp = Math.Max(worstTHighCp, error);
                    }
                    else
                    {
                        worstT = Math.Max(worstT, error);
                    }
                }

                worstResidual = Math.Max(worstResidual, Math.Abs(h - fromH.Enthalpy!.Value) / Math.Max(Math.Abs(h), Constants.GasConstant * t));
                worstResidual = Math.Max(worstResidual, Math.Abs(s - fromS.Entropy!.Value) / Math.Max(Math.Abs(s), Constants.GasConstant));
                states++;
            }

            foreach (var state in CatalogFlashTests.Grid(engine))
            {
                if (state.Solid)
                {
                    skipped++; // solid by the fluid's own data (as CatalogFlashTests skips it)
                    continue;
                }

                Check(state.Temperature, state.Pressure, state.Quality, state.Enthalpy, state.Entropy);
            }
        }

        rows.Add([$"(T, P) and two-phase states → (P, h) and (P, s) → T: every catalog fluid with cp° ({fluids}), 7 temperatures from the lowest valid one to 1.2 Tc × 6 pressures from 0.001 to 2 Pc, and 15 two-phase states per fluid up to 0.999 Tc; {Fmt.N(skipped)} grid states the fluid's own data place in the solid (at the triple-point temperature above the triple-point pressure) left out, as the flash refuses them",
            Fmt.N(states),
            $"T back {Fmt.Below(worstT)} relative, and {Fmt.Below(worstTHighCp)} at the states with cp > 1 kJ/(mol·K) (near the critical point, where an h residual of 1e-12·RT moves T by δh/cp, so the test allows 1e-7 there); h and s residuals {Fmt.Below(worstResidual)}; quality {Fmt.Below(worstQuality)}",
            "T 1e-10 (1e-7 where cp > 1 kJ/(mol·K)); residuals 1e-10; quality 1e-9", "`Properties/CatalogFlashTests`"]);
    }

    private static readonly string[] FiveFluids = ["propane", "water", "r-134a", "methane", "n-heptane"];

    /// <summary>The grid of FlashTests.SinglePhaseStates_RoundTripThroughEveryPair.</summary>
    private static void EveryPair(List<string[]> rows)
    {
        double worstT = 0, worstP = 0;
        int trips = 0, regionMismatches = 0;
        foreach (var trip in FiveFluids.SelectMany(FlashTests.EveryPairRoundTrips))
        {
            regionMismatches += trip.Back.Region == trip.Direct.Region && trip.Back.Quality is null ? 0 : 1;
            worstT = Math.Max(worstT, Math.Abs(trip.Back.Temperature / trip.Temperature - 1));
            worstP = Math.Max(worstP, Math.Abs(trip.Back.Pressure / trip.Pressure - 1));
            trips++;
        }

        rows.Add([$"single-phase (T, P) states back through every pair: (P, h), (P, s), (P, u), (P, ρ), (T, ρ), (T, s), (T, u), (ρ, u), (h, s); {string.Join(", ", FiveFluids)} on an 8 × 7 grid",
            Fmt.N(trips),
            $"T back {Fmt.Below(worstT)}, P {Fmt.Below(worstP)} relative; {regionMismatches} in another region",
            "T 1e-10, P 1e-8, same region", "`Properties/FlashTests`"]);
    }

    /// <summary>FlashTests.QualityStates_AreTheLeverRuleOnTheCoexistencePoint.</summary>
    private static void LeverRule(List<string[]> rows)
    {
        string[] names = ["propane", "water", "r-134a", "carbon-dioxide", "nitrogen"];
        double worstLever = 0, worstQuality = 0, worstT = 0;
        int states = 0;
        foreach (string name in names)
        {
            var engine = PropertyModel.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson);
            double t = 0.5 * (engine.Solver.MinimumTemperature + engine.Solver.CriticalTemperature);
            var point = engine.Coexistence(engine.Solver.AtTemperature(t));
            double hL = point.Liquid.State.Enthalpy!.Value, hV = point.Vapour.State.Enthalpy!.Value;
            foreach (double x in new[] { 0.0, 0.25, 0.5, 0.9, 1.0 })
            {
                var state = engine.Flash(StateProperty.Temperature, t, StateProperty.Quality, x);
                worstLever = Math.Max(worstLever, Math.Abs(hL + x * (hV - hL) - state.Enthalpy!.Value) / Math.Abs(hV - hL));
                foreach (var (a, va, b, vb) in new[]
                         {
                             (StateProperty.Pressure, state.Pressure, StateProperty.Enthalpy, state.Enthalpy!.Value),
                             (StateProperty.Pressure, state.Pressure, StateProperty.Entropy, state.Entropy!.Value),
                             (StateProperty.Temperature, t, StateProperty.Density, state.Density),
                             (StateProperty.Temperature, t, StateProperty.Enthalpy, state.Enthalpy!.Value),
                             (StateProperty.Enthalpy, state.Enthalpy!.Value, StateProperty.Entropy, state.Entropy!.Value),
                         })
                {
                    if (a == StateProperty.Temperature && b == StateProperty.Density && x is 0 or 1)
                    {
                        continue;
                    }

                    var back = engine.Flash(a, va, b, vb);
                    worstQuality = Math.Max(worstQuality, Math.Abs((back.Quality ?? double.NaN) - x));
                    worstT = Math.Max(worstT, Math.Abs(back.Temperature / t - 1));
                    states++;
                }
            }
        }

        rows.Add([$"two-phase states against the lever rule on the coexistence point at x = 0, 0.25, 0.5, 0.9, 1, and back from (P, h), (P, s), (T, ρ), (T, h), (h, s); {string.Join(", ", names)}",
            Fmt.N(states),
            $"h differs from the lever rule by {Fmt.Below(worstLever)} of the jump; quality back {Fmt.Below(worstQuality)}, T {Fmt.Below(worstT)} relative",
            "1e-13 of the jump; quality 1e-9; T 1e-10, except from (h, s) near the saturated liquid: twice 1e-12·max(\\|h\\|, RT)/(T·v·dPsat/dT), about 4e-10 (there dh = v·dPsat fixes T poorly)", "`Properties/FlashTests`"]);
    }
}
