using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class HelmholtzDerivativesTests
{
    // Step, tolerance and the difference check: TestSupport.HelmholtzStates.

    public static TheoryData<CubicModelKind, string, string> States()
    {
        var data = new TheoryData<CubicModelKind, string, string>();
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            foreach (string state in new[] { "liquid", "vapour", "supercritical" })
            {
                data.Add(kind, "propane", state);
            }
        }

        // ω = 0.649 puts the 1978 Peng–Robinson κ on its own branch.
        foreach (string state in new[] { "liquid", "vapour", "supercritical" })
        {
            data.Add(CubicModelKind.PengRobinson1978, "ethanol", state);
        }

        return data;
    }

    private static (CubicModel Model, double T, double Rho) State(CubicModelKind kind, string fluidName, string state)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(fluidName);
        var model = CubicModel.For(kind, fluid);
        var (t, rho) = HelmholtzStates.Pick(model, CoexistenceSolver.LowestValidTemperature(fluid), state);
        return (model, t, rho);
    }

    private static void CheckCentralDifference(Func<double, double> f, double x, double analytic, string what)
        => HelmholtzStates.CheckCentralDifference(f, x, analytic, what);

    [Theory]
    [MemberData(nameof(States))]
    public void Residual_TemperatureDerivatives_EqualCentralDifferences(CubicModelKind kind, string fluid, string state)
    {
        var (model, t, rho) = State(kind, fluid, state);
        var d = model.Residual(t, rho);

        CheckCentralDifference(x => model.Residual(x, rho).Value, t, d.DT, $"{kind} {state} dA/dT");
        CheckCentralDifference(x => model.Residual(x, rho).DT, t, d.DTT, $"{kind} {state} d2A/dT2");
        CheckCentralDifference(x => model.Residual(x, rho).DRho, t, d.DTRho, $"{kind} {state} d2A/dTdrho from dA/drho");
        CheckCentralDifference(x => model.Residual(x, rho).Pressure, t, d.PressureDT, $"{kind} {state} dP/dT");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Residual_DensityDerivatives_EqualCentralDifferences(CubicModelKind kind, string fluid, string state)
    {
        var (model, t, rho) = State(kind, fluid, state);
        var d = model.Residual(t, rho);

        CheckCentralDifference(x => model.Residual(t, x).Value, rho, d.DRho, $"{kind} {state} dA/drho");
        CheckCentralDifference(x => model.Residual(t, x).DRho, rho, d.DRhoRho, $"{kind} {state} d2A/drho2");
        CheckCentralDifference(x => model.Residual(t, x).DRhoRho, rho, d.DRhoRhoRho, $"{kind} {state} d3A/drho3");
        CheckCentralDifference(x => model.Residual(t, x).DT, rho, d.DTRho, $"{kind} {state} d2A/dTdrho from dA/dT");
        CheckCentralDifference(x => model.Residual(t, x).Pressure, rho, d.PressureDRho, $"{kind} {state} dP/drho");
        CheckCentralDifference(x => model.Residual(t, x).PressureDRho, rho, d.PressureDRhoRho, $"{kind} {state} d2P/drho2");
    }

    [Fact]
    public void Residual_VanDerWaals_HasNoTemperatureDependentAttraction()
    {
        // van der Waals (1873): a is constant, so A_r = −RT·ln(1 − bρ) − aρ exactly
        // (closed form; any textbook), d²A_r/dT² = 0. Rounding level 1e-13 relative.
        var model = CubicModel.For(CubicModelKind.VanDerWaals, 150.687, 4.863e6, -0.002);
        double t = 120;
        double rho = 20000;

        var d = model.Residual(t, rho);
        double expected = -Constants.GasConstant * t * Math.Log(1 - model.CovolumeB * rho) - model.AttractionA * rho;

        AssertClose.Relative(expected, d.Value, 1e-13, "vdW A_r");
        Assert.Equal(0.0, d.DTT);
    }
}
