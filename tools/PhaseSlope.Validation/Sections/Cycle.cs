using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Validation.Sections;

internal static class Cycle
{
    public static void Write(Page page)
    {
        page.Heading(2, "A worked vapour-compression cycle (`plot --diagram p-h --cycle`)");
        page.Paragraph($"""
            {References.CycleBook}. R-134a between {References.CycleLowPressure / 1e6} and {References.CycleHighPressure / 1e6} MPa,
            saturated vapour at the compressor inlet, saturated liquid at the condenser outlet, isentropic
            compression. Peng–Robinson (its own alpha) with the catalog cp°, the cycle computed by
            `Core/Cycles/VapourCompressionCycle` on the −40 °C convention of the book's tables, the saturation
            temperatures the model's own at the two pressures. Test: `Cycles/VapourCompressionCycleTests`, 2 % on the
            refrigerating effect, the work, the heat rejected and the COP, 1 % on the latent heat.
            """);
        var fluid = FluidCatalog.Embedded.Find("r-134a");
        var m = new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid), ReferenceState.MinusForty);
        double molar = m.MolarMass!.Value;
        double Kj(double perMole) => perMole / molar / 1e3;
        double te = m.Solver.AtPressure(References.CycleLowPressure).Temperature;
        double tc = m.Solver.AtPressure(References.CycleHighPressure).Temperature;
        var cycle = VapourCompressionCycle.Compute(m, new VapourCompressionSpecification(te, tc, 0, 0, 1));
        double latent = Kj(m.Coexistence(m.Solver.AtTemperature(te)).EnthalpyOfVaporization);
        string[] Row(string quantity, double book, double model, int decimals, string tolerance)
            => [quantity, Fmt.F(book, 2), Fmt.F(model, decimals), Fmt.Pct(model / book - 1, 1), tolerance];
        page.Table(["quantity", "book", "model", "difference", "tolerance"],
        [
            Row("h1 (saturated vapour, 0.14 MPa), kJ/kg", References.CycleH1, Kj(cycle.Suction.Enthalpy!.Value), 2, "–"),
            Row("h2 (0.8 MPa, s = s1), kJ/kg", References.CycleH2, Kj(cycle.Discharge.Enthalpy!.Value), 2, "–"),
            Row("h3 = h4 (saturated liquid, 0.8 MPa), kJ/kg", References.CycleH3, Kj(cycle.CondenserOutlet.Enthalpy!.Value), 2, "–"),
            Row("refrigerating effect h1 − h4, kJ/kg", References.CycleH1 - References.CycleH3, Kj(cycle.RefrigeratingEffect), 2, "±2 %"),
            Row("compressor work h2 − h1, kJ/kg", References.CycleH2 - References.CycleH1, Kj(cycle.CompressorWork), 2, "±2 %"),
            Row("heat rejected h2 − h3, kJ/kg", References.CycleH2 - References.CycleH3, Kj(cycle.HeatRejected), 2, "±2 %"),
            Row("COP", References.CycleCop, cycle.CoefficientOfPerformance, 3, "±2 %"),
            Row("latent heat at 0.14 MPa, kJ/kg", References.CycleLatentHeat, latent, 2, "±1 %"),
        ], 1, 2, 3, 4);

        var published = fluid.VapourPressureEquation!;
        string Off(double t) => Fmt.Pct(m.Solver.AtTemperature(t).Pressure / published.Pressure(t) - 1, 2);
        page.Paragraph($"""
            The model's known error behind the tolerances: its vapour pressure of R-134a lies {Off(te)} (at
            {Fmt.F(te - 273.15, 1)} °C) and {Off(tc)} (at {Fmt.F(tc - 273.15, 1)} °C) off the catalog's published
            equation (the test requires 0.5 %); the latent heat carries that and the model's vapour volume.
            """);
    }
}
