using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>The cubic's closed-form density roots against the interface's default Newton roots
/// and the independent spinodal scan kept in the tests.</summary>
public class DensityRootsTests
{
    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void ClosedForm_EqualsDefaultNewtonRoots(CubicModelKind kind)
    {
        var fluid = FluidCatalog.Embedded.Find("n-hexane");
        var model = CubicModel.For(kind, fluid);
        double tc = model.CriticalTemperature;
        double pc = model.CriticalPressure;
        Span<double> closed = stackalloc double[2];
        Span<double> newton = stackalloc double[2];
        foreach (double tr in new[] { 0.35, 0.6, 0.9, 0.99, 1.2, 2 })
        {
            foreach (double pr in new[] { 1e-6, 1e-3, 0.05, 0.3, 0.9, 1.5, 10 })
            {
                double t = tr * tc;
                double p = pr * pc;
                int n = model.DensityRoots(t, p, Composition.Pure, closed);
                int m = DefaultDensityRoots.Find(model, t, p, Composition.Pure, newton);
                string at = $"{kind} at Tr = {tr}, Pr = {pr}";
                Assert.True(n == m, $"{at}: {n} closed-form roots, {m} Newton roots");
                for (int i = 0; i < n; i++)
                {
                    // Both are polished to rounding of P(ρ): ~1e-15 relative in ρ, 1e-12 allowed.
                    AssertClose.Relative(newton[i], closed[i], 1e-12, $"{at}: root {i}");
                    var d = model.Residual(t, closed[i]);
                    Assert.True(d.PressureDRho > 0, $"{at}: root {i} mechanically unstable");
                }
            }
        }
    }

    [Theory]
    [InlineData("propane", 0.8)]
    [InlineData("water", 0.6)]
    public void ClosedForm_TwoRootsExactlyBetweenTheSpinodalPressures(string name, double reduced)
    {
        // The independent grid scan of the isotherm gives the spinodal pressures; just inside the
        // window both roots exist, just outside only one.
        var model = CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find(name));
        double t = reduced * model.CriticalTemperature;
        Assert.True(SpinodalWindow.TryFind(model, t, out var window));
        Span<double> roots = stackalloc double[2];
        double low = Math.Max(window.LiquidPressure, 0);
        Assert.Equal(2, model.DensityRoots(t, window.VapourPressure * (1 - 1e-6), Composition.Pure, roots));
        Assert.Equal(1, model.DensityRoots(t, window.VapourPressure * (1 + 1e-6), Composition.Pure, roots));
        Assert.True(roots[0] > window.LiquidDensity, "above the vapour spinodal pressure only the liquid root is left");
        if (low > 0)
        {
            Assert.Equal(2, model.DensityRoots(t, low * (1 + 1e-6), Composition.Pure, roots));
            Assert.Equal(1, model.DensityRoots(t, low * (1 - 1e-6), Composition.Pure, roots));
            Assert.True(roots[0] < window.VapourDensity, "below the liquid spinodal pressure only the vapour root is left");
        }
    }
}
