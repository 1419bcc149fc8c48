using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Fluids;

public class FluidCheckModelTests
{
    [Fact]
    public void Run_WithModel_UsesItsAlphaFunctionAndNamesItsShift()
    {
        Fluid propane = FluidCatalog.Embedded.Find("propane");
        var byKind = FluidCheck.Run(propane, CubicModelKind.PengRobinson);
        var same = FluidCheck.Run(propane, CubicModel.For(CubicModelKind.PengRobinson, propane));
        var twu = FluidCheck.Run(propane, CubicModel.For(CubicModelKind.PengRobinson, propane, AlphaForm.Twu));
        double shift = VolumeShift.Peneloux(CubicModelKind.PengRobinson, propane.CriticalTemperature.Value, propane.CriticalPressure.Value,
            VolumeShift.RackettCompressibility(propane.AcentricFactor.Value));
        var shifted = FluidCheck.Run(propane, CubicModel.For(CubicModelKind.PengRobinson, propane, volumeShift: shift));

        // The kind overload is the default model: the same boiling point to the bit.
        Assert.Equal(byKind.PredictedBoilingPoint, same.PredictedBoilingPoint);
        // Another alpha function is another vapour-pressure curve, so another boiling point.
        Assert.NotEqual(byKind.PredictedBoilingPoint, twu.PredictedBoilingPoint);
        Assert.Contains("Twu", twu.Model.Alpha, StringComparison.Ordinal);
        Assert.True(twu.SolvesToCriticalPoint, twu.Failure);
        // A volume translation moves both phases' volumes alike: saturation is unchanged (to the
        // solver's rounding, 1e-9 relative), and the model says it is shifted.
        Assert.Equal(byKind.PredictedBoilingPoint!.Value, shifted.PredictedBoilingPoint!.Value, 1e-9 * byKind.PredictedBoilingPoint.Value);
        Assert.Equal(shift, shifted.Model.VolumeShift);
        Assert.NotEqual(0, shift);
    }
}
