using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>k_ij fitted to binary VLE data, and the mixture file it is written to.</summary>
public sealed class InteractionFitTests(ITestOutputHelper output)
{
    private static Fluid F(string name) => FluidCatalog.Embedded.Find(name);

    [Fact]
    public void Fit_ModelGeneratedData_RecoversKij()
    {
        // Data made by the model itself at k_ij = 0.05 (CO2–propane at 250 and 270 K): the fit
        // must return 0.05 to the golden section's tolerance (1e-7), with a standard error near 0
        // (the residuals are only the bubble points' convergence, ~1e-10 relative).
        Fluid[] fluids = [F("carbon-dioxide"), F("propane")];
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

        var fit = InteractionFit.Fit(fluids, CubicModelKind.PengRobinson, data);
        AssertClose.Absolute(0.05, fit.Kij, 1e-6, "k_ij");
        Assert.True(fit.StandardError < 1e-6, $"standard error {fit.StandardError}");
        // k_ij to 1e-7 moves these bubble pressures by < 1e-7 relative (∂ln P/∂k_ij is below 1 here).
        Assert.True(fit.PressureDeviation < 1e-6, $"AAD {fit.PressureDeviation}");
        Assert.Equal(9, fit.Residuals);
    }

    [Fact]
    public void Fit_EthanolWaterAtOneAtmosphere_DeviationOfTheCubic()
    {
        // Ethanol–water (Carey and Lewis 1932, via Perry's; from memory; BinaryVleData). A cubic
        // with van der Waals one-fluid mixing and one k_ij represents this hydrogen-bonding pair only
        // roughly: measured here k_ij = −0.1019 ± 0.0005, AAD(P) = 4.2 % and AAD(y) = 0.022
        // (printed below). The bounds 6 % and 0.035 hold that measured quality with margin and
        // fail if the fit goes wrong (k_ij = 0 gives AAD(P) above 30 %); a tighter check needs a
        // Gibbs-energy mixing rule, which this tool does not have. A k_ij of about −0.1 for
        // ethanol–water with Peng–Robinson is the order reported in the literature (from memory).
        var fit = InteractionFit.Fit([F("ethanol"), F("water")], CubicModelKind.PengRobinson, BinaryVleData.Points(BinaryVleData.EthanolWater));
        output.WriteLine($"k_ij = {fit.Kij:G6} ± {fit.StandardError:G3}, AAD(P) = {fit.PressureDeviation:P2}, AAD(y) = {fit.VapourDeviation:G3}, evaluations = {fit.ModelEvaluations}");
        Assert.True(fit.PressureDeviation < 0.06, $"AAD(P) = {fit.PressureDeviation:P2}");
        Assert.True(fit.VapourDeviation < 0.035, $"AAD(y) = {fit.VapourDeviation}");
        AssertClose.InRange(-0.15, -0.05, fit.Kij, "k_ij");
        Assert.True(fit.StandardError > 0 && fit.StandardError < 0.01, $"standard error {fit.StandardError}");

        // The handbook azeotrope at 1 atm (78.15 °C, x = y = 0.8943; Perry's, from memory) with the
        // fitted k_ij: measured, the model's bubble point there is 0.15 K off (78.30 °C) but its vapour is
        // y_1 ≈ x_1 + 0.02, so this model predicts no azeotrope for ethanol–water (y − x stays
        // small but positive up to x = 1). Checked within the fit's own scatter: 1.5 K and 0.035.
        var engine = MixtureEquilibrium.For([F("ethanol"), F("water")], CubicModelKind.PengRobinson, [0, fit.Kij, fit.Kij, 0]);
        var atAzeotrope = engine.BubbleAtPressure(BinaryVleData.Atmosphere, [0.8943, 0.1057]);
        output.WriteLine($"at x = 0.8943: T = {atAzeotrope.Temperature - 273.15:G5} °C, y - x = {atAzeotrope.Vapour.MoleFractions[0] - 0.8943:G3}");
        AssertClose.Absolute(78.15 + 273.15, atAzeotrope.Temperature, 1.5, "bubble temperature at the azeotrope");
        AssertClose.Absolute(0.8943, atAzeotrope.Vapour.MoleFractions[0], 0.035, "vapour at the azeotrope");
    }

    [Fact]
    public void Fit_TooFewPoints_IsRefused()
        => Assert.Throws<InvalidInputException>(() => InteractionFit.Fit([F("ethanol"), F("water")], CubicModelKind.PengRobinson,
            [new BinaryVlePoint(351, 101325, 0.5, null)]));

    [Fact]
    public void Fit_FractionOutsideZeroToOne_IsRefused()
        => Assert.Throws<InvalidInputException>(() => InteractionFit.Fit([F("ethanol"), F("water")], CubicModelKind.PengRobinson,
            [new BinaryVlePoint(351, 101325, 0.5, null), new BinaryVlePoint(352, 101325, 1.5, null)]));

    [Fact]
    public void Writer_RoundTripsThroughTheReader()
    {
        var mixture = Mixture.Create([F("ethanol"), F("water")], [0.5, 0.5], [new GivenInteraction(0, 1, -0.0712345678901, "fitted by phaseslope to data.csv")]);
        var text = new StringWriter();
        MixtureFileWriter.Write(text, mixture, "ethanol-water (fitted)", ["composition equimolar"]);
        var (read, name, _) = MixtureFile.Parse(new StringReader(text.ToString()), "test", FluidCatalog.Embedded.Find);
        Assert.Equal("ethanol-water (fitted)", name);
        Assert.Equal(-0.0712345678901, read.GivenInteractions.Single().Value);
        Assert.Equal("fitted by phaseslope to data.csv", read.GivenInteractions.Single().Source);
        Assert.Equal(mixture.MoleFractions, read.MoleFractions);
    }
}
