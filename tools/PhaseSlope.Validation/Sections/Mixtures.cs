using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.Mixtures;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Validation.Sections;

internal static class Mixtures
{
    private const double Atmosphere = 101325;
    private const double Kelvin = 273.15;

    public static void Write(Page page)
    {
        page.Heading(2, "Mixtures: bubble and dew points, glide, azeotropes, k_ij fit");
        page.Paragraph("Peng–Robinson with van der Waals one-fluid mixing; k_ij = 0 unless given.");
        var rows = new List<string[]>();

        // MixtureSaturationTests.PureLimit_EqualsTheCoexistenceSolver: one component present (z = (1, 0), k_ij 0.05).
        double worstPure = 0;
        foreach (var (name, absent, temperature) in new[] { ("propane", "n-butane", 250.0), ("carbon-dioxide", "methane", 280.0), ("r-32", "r-134a", 300.0), ("n-butane", "propane", 400.0) })
        {
            var engine = Engine(0.05, name, absent);
            var point = PhaseSlope.Core.Equilibrium.CoexistenceSolver.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson).AtTemperature(temperature);
            double[] z = [1, 0];
            foreach (var sat in new[] { engine.BubbleAtTemperature(temperature, z), engine.DewAtTemperature(temperature, z) })
            {
                worstPure = Math.Max(worstPure, Math.Abs(sat.Pressure / point.Pressure - 1));
                worstPure = Math.Max(worstPure, Math.Abs(sat.Liquid.Density / point.Liquid.Density - 1));
                worstPure = Math.Max(worstPure, Math.Abs(sat.Vapour.Density / point.Vapour.Density - 1));
            }

            foreach (var sat in new[] { engine.BubbleAtPressure(point.Pressure, z), engine.DewAtPressure(point.Pressure, z) })
            {
                worstPure = Math.Max(worstPure, Math.Abs(sat.Temperature / temperature - 1));
            }
        }

        rows.Add(["bubble and dew points at T and at P with one component present (propane, CO2, R-32, n-butane beside an absent second component)", "the pure coexistence solver (another route: Newton on the densities)",
            "P, both densities, T", $"relative difference {Fmt.Below(worstPure)}", "1e-10", "`Mixtures/MixtureSaturationTests`"]);

        var air = Engine(0, "nitrogen", "oxygen", "argon").Glide(Atmosphere, [0.7812, 0.2096, 0.0092]);
        rows.Add(["air (N2/O2/Ar 0.7812/0.2096/0.0092 mol) at 1 atm: bubble / dew temperature", $"{Fmt.F(References.AirBubble, 2)} / {Fmt.F(References.AirDew, 2)} K (Lemmon et al. 2000, from memory)",
            $"{Fmt.F(air.Bubble.Temperature, 2)} / {Fmt.F(air.Dew.Temperature, 2)} K", $"{Fmt.Signed(air.Bubble.Temperature - References.AirBubble, 2)} / {Fmt.Signed(air.Dew.Temperature - References.AirDew, 2)} K",
            $"±{References.AirTolerance} K", "`Mixtures/MixtureSaturationTests`"]);

        var r407 = Engine(0, "r-32", "r-125", "r-134a");
        var g407 = r407.Glide(Atmosphere, FromMass(r407, 0.23, 0.25, 0.52));
        rows.Add(["R-407C (R-32/R-125/R-134a 23/25/52 mass %) at 1 atm: bubble, dew, glide", $"{Fmt.F(References.R407CBubbleCelsius, 1)} °C, {Fmt.F(References.R407CDewCelsius, 1)} °C, {References.R407CGlide} K (ASHRAE, from memory)",
            $"{Fmt.F(g407.Bubble.Temperature - Kelvin, 2)} °C, {Fmt.F(g407.Dew.Temperature - Kelvin, 2)} °C, {Fmt.F(g407.Glide, 2)} K",
            $"{Fmt.Signed(g407.Bubble.Temperature - Kelvin - References.R407CBubbleCelsius, 2)}, {Fmt.Signed(g407.Dew.Temperature - Kelvin - References.R407CDewCelsius, 2)}, {Fmt.Signed(g407.Glide - References.R407CGlide, 2)} K",
            $"±{References.R407CTolerance} K each", "`Mixtures/MixtureSaturationTests`"]);

        var r410 = Engine(0, "r-32", "r-125");
        var g410 = r410.Glide(Atmosphere, FromMass(r410, 0.5, 0.5));
        rows.Add(["R-410A (R-32/R-125 50/50 mass %) at 1 atm: bubble, glide", $"{Fmt.F(References.R410ABubbleCelsius, 1)} °C, below {References.R410AGlideLimit} K (ASHRAE, from memory)",
            $"{Fmt.F(g410.Bubble.Temperature - Kelvin, 2)} °C, {Fmt.F(g410.Glide, 3)} K", $"{Fmt.Signed(g410.Bubble.Temperature - Kelvin - References.R410ABubbleCelsius, 2)} K",
            $"±{References.R410ATolerance} K; glide below {References.R410AGlideLimit} K", "`Mixtures/MixtureSaturationTests`"]);

        var benzene = MixtureEquilibrium.For([FluidCatalog.Embedded.Find("benzene"), FluidCatalog.Embedded.Find("cyclohexane")], CubicModelKind.PengRobinson, [0, 0.02, 0.02, 0]);
        var azeotrope = BinaryDiagram.AtPressure(benzene, Atmosphere).Azeotrope;
        rows.Add(["benzene–cyclohexane azeotrope at 1 atm, k_ij = 0.02 (a typical value, from memory)", $"{References.BenzeneCyclohexaneAzeotropeCelsius} °C at x_benzene ≈ {References.BenzeneCyclohexaneAzeotropeX} (CRC Handbook, from memory)",
            azeotrope is null ? "no azeotrope" : $"{Fmt.F(azeotrope.Temperature - Kelvin, 2)} °C at x = {Fmt.F(azeotrope.MoleFraction, 3)} ({(azeotrope.Kind == AzeotropeKind.MaximumPressure ? "maximum-pressure, minimum-boiling" : "minimum-pressure, maximum-boiling")})",
            azeotrope is null ? "–" : $"{Fmt.Signed(azeotrope.Temperature - Kelvin - References.BenzeneCyclohexaneAzeotropeCelsius, 2)} K, {Fmt.Signed(azeotrope.MoleFraction - References.BenzeneCyclohexaneAzeotropeX, 3)}",
            "±0.5 K, ±0.1", "`Mixtures/BinaryDiagramTests`"]);

        var fit = InteractionFit.Fit([FluidCatalog.Embedded.Find("ethanol"), FluidCatalog.Embedded.Find("water")], CubicModelKind.PengRobinson, BinaryVleData.Points(BinaryVleData.EthanolWater));
        rows.Add([$"ethanol–water at 1 atm ({BinaryVleData.EthanolWater.Length} points), k_ij fitted", "Carey & Lewis 1932 via Perry's (from memory; `BinaryVleData`)",
            $"k_ij = {Fmt.F(fit.Kij, 4)} ± {Fmt.F(fit.StandardError, 4)}, AAD(P) {Fmt.PctAbs(fit.PressureDeviation, 1)}, AAD(y) {(fit.VapourDeviation is double dy ? Fmt.F(dy, 3) : "–")}",
            "a cubic with van der Waals mixing cannot represent this polar pair closely", "k_ij in −0.15…−0.05, AAD(P) below 6 %, AAD(y) below 0.035", "`Mixtures/InteractionFitTests`"]);

        // The handbook azeotrope at 1 atm (78.15 °C, x = y = 0.8943; Perry's, from memory; the last row of
        // BinaryVleData.EthanolWater) with the fitted k_ij, as InteractionFitTests checks it (1.5 K, 0.035).
        var (ax, _, aCelsius) = BinaryVleData.EthanolWater.Single(r => r.X == r.Y);
        var fitted = MixtureEquilibrium.For([FluidCatalog.Embedded.Find("ethanol"), FluidCatalog.Embedded.Find("water")], CubicModelKind.PengRobinson, [0, fit.Kij, fit.Kij, 0]);
        var atAzeotrope = fitted.BubbleAtPressure(Atmosphere, [ax, 1 - ax]);
        var fittedAzeotrope = BinaryDiagram.AtPressure(fitted, Atmosphere).Azeotrope;
        rows.Add([$"ethanol–water with the fitted k_ij: bubble point at the measured azeotrope's x = {ax}", $"{aCelsius} °C, y = x (Perry's, from memory)",
            $"{Fmt.F(atAzeotrope.Temperature - Kelvin, 2)} °C, y − x = {Fmt.Signed(atAzeotrope.Vapour.MoleFractions[0] - ax, 3)}; the model's own diagram: {(fittedAzeotrope is null ? "no azeotrope" : $"azeotrope at x = {Fmt.F(fittedAzeotrope.MoleFraction, 3)}")}",
            $"{Fmt.Signed(atAzeotrope.Temperature - Kelvin - aCelsius, 2)} K", "1.5 K; y within 0.035", "`Mixtures/InteractionFitTests`"]);

        // InteractionFitTests.Fit_ModelGeneratedData_RecoversKij: CO2–propane data made by the model at k_ij = 0.05.
        double recovered = KijRecovery();
        rows.Add(["k_ij fit on CO2–propane bubble points generated by the model at k_ij = 0.05", "0.05", Fmt.F(recovered, 7), Fmt.Below(recovered - 0.05), "1e-6", "`Mixtures/InteractionFitTests`"]);

        // BinaryDiagramTests.BubbleLineSlope_MatchesCentralDifferenceAtFixedLiquid: its three cases (pair,
        // k_ij, T, x1) and its step, 0.01 K.
        var slopes = new List<string>();
        foreach (var (a, b, kij, t, x1) in new[] { ("benzene", "cyclohexane", 0.02, 350.0, 0.6), ("propane", "n-butane", 0.0, 300.0, 0.3), ("carbon-dioxide", "propane", 0.13, 260.0, 0.4) })
        {
            var engine = MixtureEquilibrium.For([FluidCatalog.Embedded.Find(a), FluidCatalog.Embedded.Find(b)], CubicModelKind.PengRobinson, [0, kij, kij, 0]);
            double[] z = [x1, 1 - x1];
            const double h = 0.01;
            var point = engine.BubbleAtTemperature(t, z);
            var slope = MixtureClapeyron.BubbleLine(engine.Model, t, point.Pressure, z, [.. point.Vapour.MoleFractions]);
            double difference = (engine.BubbleAtTemperature(t + h, z).Pressure - engine.BubbleAtTemperature(t - h, z).Pressure) / (2 * h);
            slopes.Add($"{a}–{b} {Fmt.Below(slope.Slope / difference - 1)}");
        }

        rows.Add(["bubble-line slope at fixed liquid composition from partial molar differences (generalized Clapeyron) vs a central difference (±0.01 K) of the bubble pressure", "the bubble pressure's own derivative",
            "relative difference", string.Join(", ", slopes), "1e-6", "`Mixtures/BinaryDiagramTests`"]);

        page.Table(["check", "reference", "model", "deviation", "held to", "where"], rows);
        page.Paragraph("""
            Also checked by the test suite, not recomputed here: a component alone in a mixture against the pure
            model; ln φ_i and its T, P and amount derivatives against central
            differences, with symmetry and Gibbs–Duhem (`Models/CubicMixtureModelTests`); flash material balance,
            equal fugacities and the tangent-plane test (`Mixtures/MixtureFlashTests`); robustness on T–P grids
            of a 10-component gas (`Mixtures/MixtureRobustnessTests`; the critical-region grid of
            `Mixtures/MixtureCriticalRegionTests` is recomputed in the next section); the
            generalized Clapeyron slope at an azeotrope and in the pure limit (`Mixtures/BinaryDiagramTests`,
            `Mixtures/MixtureClapeyronTests`); and more.
            """);
    }

    private static double KijRecovery()
    {
        Fluid[] fluids = [FluidCatalog.Embedded.Find("carbon-dioxide"), FluidCatalog.Embedded.Find("propane")];
        var engine = MixtureEquilibrium.For(fluids, CubicModelKind.PengRobinson, [0, 0.05, 0.05, 0]);
        var data = new List<BinaryVlePoint>();
        foreach (double t in new[] { 250.0, 270.0 })
        {
            foreach (double x in new[] { 0.2, 0.5, 0.8 })
            {
                var p = engine.BubbleAtTemperature(t, [x, 1 - x]);
                data.Add(new BinaryVlePoint(t, p.Pressure, x, t == 250 ? p.Vapour.MoleFractions[0] : null));
            }
        }

        return InteractionFit.Fit(fluids, CubicModelKind.PengRobinson, data).Kij;
    }
}
