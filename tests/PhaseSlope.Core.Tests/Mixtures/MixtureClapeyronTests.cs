using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The generalized Clapeyron slope of bubble and dew lines.</summary>
public sealed class MixtureClapeyronTests
{
    [Theory]
    [InlineData("propane", 250.0)]
    [InlineData("carbon-dioxide", 280.0)]
    [InlineData("n-butane", 400.0)]
    public void PureLimit_IsThePureClapeyronSlope(string name, double t)
    {
        // A binary with one component present: the bubble and dew slopes are the pure fluid's
        // Δh/(TΔv) at its coexistence point, evaluated from other formulas (fugacity derivatives
        // against the Helmholtz energy of each phase), so equal to 1e-10 relative (the
        // coexistence point is converged to ~1e-12 in density).
        var fluid = FluidCatalog.Embedded.Find(name);
        var other = FluidCatalog.Embedded.Find(name == "n-butane" ? "propane" : "n-butane");
        var pure = CubicModel.For(CubicModelKind.PengRobinson, fluid);
        var mixture = new CubicMixtureModel([pure, CubicModel.For(CubicModelKind.PengRobinson, other)]);
        var point = new CoexistenceSolver(pure, CoexistenceSolver.LowestValidTemperature(fluid)).AtTemperature(t);
        double[] x = [1, 0];
        var bubble = MixtureClapeyron.BubbleLine(mixture, t, point.Pressure, x, x);
        var dew = MixtureClapeyron.DewLine(mixture, t, point.Pressure, x, x);
        AssertClose.Relative(point.Slope, bubble.Slope, 1e-10, "bubble slope");
        AssertClose.Relative(point.Slope, dew.Slope, 1e-10, "dew slope");
        AssertClose.Relative(point.EnthalpyOfVaporization, bubble.EnthalpyDifference, 1e-10, "enthalpy of vaporization");
        AssertClose.Relative(point.VolumeChange, bubble.VolumeDifference, 1e-10, "volume change");
    }
}
