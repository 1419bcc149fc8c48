using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>A model that is not a cubic, implemented through <see cref="IResidualModel"/> only,
/// solved by the unchanged coexistence solver.</summary>
public class NonCubicModelTests
{
    private const double R = Constants.GasConstant;

    // An argon-sized invented parameter pair (a, b), not fitted to any fluid.
    private static readonly Lazy<CarnahanStarlingVanDerWaalsModel> Model = new(() => new CarnahanStarlingVanDerWaalsModel(0.1363, 1.0e-5));

    [Fact]
    public void CriticalPoint_HasTheKnownReducedPackingFraction()
    {
        // For Carnahan–Starling with van der Waals attraction the critical packing fraction is
        // η_c ≈ 0.1304 and Zc ≈ 0.359 (values from memory); the located point must match them to
        // the four digits recalled.
        var model = Model.Value;
        var c = model.CriticalPoint(Composition.Pure);
        AssertClose.Absolute(0.1304, 1.0e-5 * c.Density, 1e-4, "critical packing fraction");
        AssertClose.Absolute(0.359, c.Pressure / (c.Density * R * c.Temperature), 1e-3, "critical compressibility factor");
        // The solver's own ingredients at that point: (∂P/∂ρ)_T vanishes to rounding.
        var d = model.Residual(c.Temperature, c.Density, Composition.Pure);
        Assert.True(Math.Abs(d.PressureDRho) < 1e-10 * R * c.Temperature, $"dP/drho at the critical point {d.PressureDRho}");
    }

    [Theory]
    [InlineData(0.45)]
    [InlineData(0.6)]
    [InlineData(0.8)]
    [InlineData(0.95)]
    [InlineData(0.999)]
    [InlineData(0.999999)]
    public void AtTemperature_NonCubicModel_EqualGibbsEnergyAndPressure(double reduced)
    {
        var model = Model.Value;
        double tc = model.CriticalPoint(Composition.Pure).Temperature;
        var solver = new CoexistenceSolver(model, 0.4 * tc);
        double t = reduced * tc;

        var point = solver.AtTemperature(t);

        // (gL − gV)/RT from the Helmholtz energies alone (see CoexistenceSolverTests): its terms
        // are O(10) at the lowest temperature, so 1e-12 is about a hundred roundings.
        double rt = R * t;
        var dl = model.Residual(t, point.Liquid.Density, Composition.Pure);
        var dv = model.Residual(t, point.Vapour.Density, Composition.Pure);
        double gibbs = Math.Log(point.Liquid.Density / point.Vapour.Density) + (dl.Value - dv.Value) / rt
                       + point.Pressure * (1 / point.Liquid.Density - 1 / point.Vapour.Density) / rt;
        AssertClose.Absolute(0, gibbs, 1e-12, $"(gL - gV)/RT at Tr = {reduced}");
        Assert.True(point.Liquid.Density > point.Vapour.Density);
        Assert.True(point.Liquid.PressureDensityDerivative > 0 && point.Vapour.PressureDensityDerivative > 0);
        Assert.Equal(StopReason.Converged, point.Report.StopReason);
    }

    [Theory]
    [InlineData(0.6)]
    [InlineData(0.9)]
    public void Slope_NonCubicModel_EqualsDerivativeOfTheSaturationPressure(double reduced)
    {
        // Clapeyron dPsat/dT = Δh/(TΔv) against a 5-point central difference of Psat(T) with
        // h = 1e-3·T: truncation h⁴·P⁽⁵⁾/30 ~ 1e-12 relative, rounding ~ε/h·(Psat/T) ~ 1e-12; 1e-8.
        var model = Model.Value;
        double tc = model.CriticalPoint(Composition.Pure).Temperature;
        var solver = new CoexistenceSolver(model, 0.4 * tc);
        double t = reduced * tc;
        double h = 1e-3 * t;
        double P(double x) => solver.AtTemperature(x).Pressure;
        double fd = (P(t - 2 * h) - 8 * P(t - h) + 8 * P(t + h) - P(t + 2 * h)) / (12 * h);

        AssertClose.Relative(fd, solver.AtTemperature(t).Slope, 1e-8, $"dPsat/dT at Tr = {reduced}");
    }

    [Fact]
    public void AtPressure_NonCubicModel_InvertsAtTemperature()
    {
        var model = Model.Value;
        double tc = model.CriticalPoint(Composition.Pure).Temperature;
        var solver = new CoexistenceSolver(model, 0.4 * tc);
        foreach (double reduced in new[] { 0.5, 0.7, 0.9, 0.99 })
        {
            var forward = solver.AtTemperature(reduced * tc);
            var back = solver.AtPressure(forward.Pressure);
            // d ln P/d ln T ≈ 5–10, so a 1e-14 relative error in P is ~1e-15 in T: 1e-12.
            AssertClose.Relative(forward.Temperature, back.Temperature, 1e-12, $"T at Tr = {reduced}");
        }
    }

    [Fact]
    public void Residual_HandDerivatives_MatchFiniteDifferences()
    {
        // Central differences with relative step 1e-5: truncation ~1e-10, rounding ~1e-11 of the
        // derivative's natural size; 1e-7 relative.
        var model = Model.Value;
        double t = 120;
        double rho = 2.0e4;
        double ht = 1e-5 * t;
        double hr = 1e-5 * rho;
        var pure = Composition.Pure;
        var d = model.Residual(t, rho, pure);
        AssertClose.Relative((model.Residual(t + ht, rho, pure).Value - model.Residual(t - ht, rho, pure).Value) / (2 * ht), d.DT, 1e-7, "dA/dT");
        AssertClose.Relative((model.Residual(t, rho + hr, pure).Value - model.Residual(t, rho - hr, pure).Value) / (2 * hr), d.DRho, 1e-7, "dA/drho");
        AssertClose.Relative((model.Residual(t, rho + hr, pure).DRho - model.Residual(t, rho - hr, pure).DRho) / (2 * hr), d.DRhoRho, 1e-7, "d2A/drho2");
        AssertClose.Relative((model.Residual(t, rho + hr, pure).DRhoRho - model.Residual(t, rho - hr, pure).DRhoRho) / (2 * hr), d.DRhoRhoRho, 1e-7, "d3A/drho3");
        AssertClose.Relative((model.Residual(t + ht, rho, pure).DRho - model.Residual(t - ht, rho, pure).DRho) / (2 * ht), d.DTRho, 1e-7, "d2A/dTdrho");
    }
}
