using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

public class LatentHeatBandTests
{
    private static readonly Fluid Water = FluidCatalog.Embedded.Find("water");

    /// <summary>Noisy IAPWS water data (0.2 % scatter, seeded) between 350 and 500 K: a fit with a
    /// real covariance, extrapolated on both sides.</summary>
    private static readonly VapourPressurePoint[] Data = Points(WaterLnPressure, Temperatures(350, 500, 12), sigma: 0.002, random: new Random(5));

    private static LatentHeatBand Band(VapourPressureForm form, VolumeChangeModel model, double uTc = 0.1, double uPc = 0.005e6)
    {
        LatentHeatEstimator Build(double tc, double pc)
        {
            var fit = VapourPressureFitter.Fit(form.WithCriticalPoint(tc, pc), Data);
            var solver = model == VolumeChangeModel.EquationOfState
                ? new CoexistenceSolver(CubicModel.For(CubicModelKind.PengRobinson, tc, pc, Water.AcentricFactor.Value), 273.16)
                : null;
            return new LatentHeatEstimator(fit, model, solver, tc, pc);
        }

        return new LatentHeatBand(Build, Build(WaterTc, WaterPc), uTc, uPc);
    }

    public static TheoryData<string, VolumeChangeModel> Cases => new()
    {
        { "wagner-2.5-5", VolumeChangeModel.EquationOfState },
        { "wagner-2.5-5", VolumeChangeModel.Haggenmacher },
        { "wagner-6", VolumeChangeModel.IdealGas },
        { "antoine", VolumeChangeModel.Haggenmacher },
    };

    private static VapourPressureForm Form(string id) => id switch
    {
        "wagner-2.5-5" => WagnerForm.TwoHalfFive(WaterTc, WaterPc),
        "wagner-6" => WagnerForm.SixTerm(WaterTc, WaterPc),
        _ => new AntoineForm(),
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Linear_OutsideTheData_NeverNarrowerThanAtTheNearestDataEnd(string form, VolumeChangeModel model)
    {
        var band = Band(Form(form), model);
        // From 300 K (below the data) to 640 K (above, 7 K below Tc), where a Wagner fit anchored
        // at (Tc, Pc) would otherwise narrow its band.
        double[] temperatures = [.. Temperatures(300, 640, 35)];
        var points = band.Linear(temperatures);
        var ends = band.Linear([350, 500]);

        foreach (var p in points.Where(p => p.Extrapolated))
        {
            var end = p.Temperature < 350 ? ends[0] : ends[1];
            Assert.True(p.StandardUncertainty >= end.StandardUncertainty,
                $"{form} {model} at {p.Temperature} K: band {p.StandardUncertainty} J/mol narrower than {end.StandardUncertainty} at the data end {end.Temperature} K");
        }

        Assert.Contains(points, p => p.BandHeldAtDataEnd || p.Extrapolated);
    }

    [Fact]
    public void MonteCarlo_OutsideTheData_NeverNarrowerThanAtTheNearestDataEnd()
    {
        var band = Band(Form("wagner-2.5-5"), VolumeChangeModel.Haggenmacher);
        var points = band.MonteCarlo([320, 400, 560, 620], 400, seed: 3);
        var ends = band.MonteCarlo([350, 500], 400, seed: 3);

        Assert.True(points[0].StandardUncertainty >= ends[0].StandardUncertainty);
        Assert.True(points[2].StandardUncertainty >= ends[1].StandardUncertainty);
        Assert.True(points[3].StandardUncertainty >= ends[1].StandardUncertainty);
    }

    [Fact]
    public void Linear_InsideTheData_IsTheQuadratureSumOfItsParts_AndExceedsTheFitAlone()
    {
        var band = Band(Form("wagner-2.5-5"), VolumeChangeModel.EquationOfState);
        foreach (var p in band.Linear([360, 420, 480]))
        {
            double sum = Math.Sqrt(p.FitUncertainty * p.FitUncertainty + p.CriticalPointUncertainty * p.CriticalPointUncertainty
                + p.VolumeModelUncertainty!.Value * p.VolumeModelUncertainty.Value);
            // Rounding of three squares and a root: 1e-12 relative.
            AssertClose.Relative(sum, p.StandardUncertainty, 1e-12, $"u at {p.Temperature} K");
            Assert.True(p.CriticalPointUncertainty > 0, "a Wagner form uses Tc and Pc");
            Assert.True(p.StandardUncertainty > p.FitUncertainty);
        }
    }

    [Fact]
    public void Linear_FormWithoutTcAndIdealGas_HasNoCriticalPointShare()
    {
        // Antoine does not use Tc or Pc and the ideal-gas route needs neither: u(Tc), u(Pc) do not enter.
        LatentHeatEstimator Build(double tc, double pc) => new(VapourPressureFitter.Fit(new AntoineForm(), Data), VolumeChangeModel.IdealGas);
        var band = new LatentHeatBand(Build, Build(0, 0), 0.1, 5000);

        Assert.All(band.Linear([400, 450]), p => Assert.Equal(0, p.CriticalPointUncertainty));
        Assert.Equal(0, band.CriticalTemperatureUncertainty);
    }

    [Fact]
    public void MonteCarlo_SameSeedSameBits()
    {
        var band = Band(Form("wagner-2.5-5"), VolumeChangeModel.Haggenmacher);
        var a = band.MonteCarlo([400, 450], 300, seed: 11);
        var b = band.MonteCarlo([400, 450], 300, seed: 11);
        var c = band.MonteCarlo([400, 450], 300, seed: 12);

        Assert.Equal(a.Select(p => p.StandardUncertainty), b.Select(p => p.StandardUncertainty));
        Assert.NotEqual(a[0].StandardUncertainty, c[0].StandardUncertainty);
    }
}
