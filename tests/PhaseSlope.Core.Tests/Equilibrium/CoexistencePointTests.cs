using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Equilibrium;

public class CoexistencePointTests
{
    private const double R = Constants.GasConstant;

    public static TheoryData<string, CubicModelKind, double> Points() => new()
    {
        { "propane", CubicModelKind.PengRobinson, 0.55 },
        { "propane", CubicModelKind.PengRobinson, 0.9 },
        { "water", CubicModelKind.PengRobinson, 0.5 },
        { "ethanol", CubicModelKind.PengRobinson1978, 0.7 },
        { "nitrogen", CubicModelKind.SoaveRedlichKwong, 0.8 },
        { "toluene", CubicModelKind.RedlichKwong, 0.6 },
        { "argon", CubicModelKind.VanDerWaals, 0.98 },
    };

    private static CoexistencePoint Point(string fluid, CubicModelKind kind, double reduced)
    {
        var solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find(fluid), kind);
        return solver.AtTemperature(reduced * solver.CriticalTemperature);
    }

    [Theory]
    [MemberData(nameof(Points))]
    public void Slope_IsEnthalpyJumpOverTemperatureTimesVolumeJump(string fluid, CubicModelKind kind, double reduced)
    {
        // Clapeyron (1834): dPsat/dT = Δh/(T·Δv), the jumps from the two phases' own properties
        // (the ideal-gas enthalpy cancels at equal T). Pure arithmetic on the same numbers: 1e-14.
        var point = Point(fluid, kind, reduced);
        double dh = point.Vapour.ResidualEnthalpy - point.Liquid.ResidualEnthalpy;
        double dv = 1 / point.Vapour.Density - 1 / point.Liquid.Density;

        AssertClose.Relative(dh, point.EnthalpyOfVaporization, 1e-14, "dh");
        AssertClose.Relative(dv, point.VolumeChange, 1e-14, "dv");
        AssertClose.Relative(dh / (point.Temperature * dv), point.Slope, 1e-14, "slope");
        AssertClose.Relative(point.Temperature * dv / dh, point.InverseSlope, 1e-14, "inverse slope");
        Assert.True(dh > 0 && dv > 0, "vaporization absorbs heat and expands");
    }

    [Theory]
    [MemberData(nameof(Points))]
    public void InternalEnergyChange_EqualsResidualInternalEnergyJumpAndDhMinusPDv(string fluid, CubicModelKind kind, double reduced)
    {
        // Δu = Δh − P·Δv (definition h = u + Pv at equal P). Checked against the residual
        // internal energies u_r = A_r − T·∂A_r/∂T (the ideal-gas u cancels at equal T), which
        // do not go through h or P. Terms are O(RT); 1e-11·RT allows for the cancellation
        // of the O(10 RT) residuals of a cold liquid.
        var point = Point(fluid, kind, reduced);
        double rt = R * point.Temperature;
        double du = point.Vapour.ResidualInternalEnergy - point.Liquid.ResidualInternalEnergy;

        AssertClose.Absolute(du, point.InternalEnergyChange, 1e-11 * rt, "du from residual internal energies");
        AssertClose.Absolute(point.EnthalpyOfVaporization - point.Pressure * point.VolumeChange, point.InternalEnergyChange, 1e-11 * rt, "du = dh - P dv");
        AssertClose.Absolute(point.Pressure * point.VolumeChange / rt, point.CompressibilityChange, 1e-12, "dZ = P dv/RT");
    }

    [Theory]
    [MemberData(nameof(Points))]
    public void EntropyOfVaporization_EqualsResidualEntropyJump(string fluid, CubicModelKind kind, double reduced)
    {
        // At coexistence Δg = Δh − T·Δs = RT(ln φV − ln φL) ≈ 0, so Δs = Δh/T. Checked against the
        // residual entropies (ideal-gas s cancels at equal T and P), computed from −∂A_r/∂T + R·ln Z
        // and not from h. The difference is R·|Δ ln φ| ≤ 1e-12·R plus rounding of the O(10 R)
        // residuals: 1e-11·R.
        var point = Point(fluid, kind, reduced);
        double ds = point.Vapour.ResidualEntropy - point.Liquid.ResidualEntropy;

        AssertClose.Relative(point.EnthalpyOfVaporization / point.Temperature, point.EntropyOfVaporization, 1e-15, "ds = dh/T");
        AssertClose.Absolute(ds, point.EntropyOfVaporization, 1e-11 * R, "ds from residual entropies");
    }
}
