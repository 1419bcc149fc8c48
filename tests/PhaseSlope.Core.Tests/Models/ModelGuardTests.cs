using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>Inputs refused at the model boundary, each with its own message (they used to
/// surface in the solver as "too close to the critical temperature").</summary>
public class ModelGuardTests
{
    private static readonly Fluid Propane = FluidCatalog.Embedded.Find("propane");

    [Fact]
    public void GeneralisedTwu_ValidRange_LowerEndNearMinus0134AndNoUpperEnd()
    {
        // Computed from the recalled 1995 constants on the AlphaGuard grid; the value -0.1344 was
        // also found by an independent scan of the same inequalities (0.001 steps in Tr).
        var (lowest, highest) = GeneralisedTwuAlpha.ValidAcentricFactorRange;
        Assert.InRange(lowest, -0.1345, -0.1343);
        Assert.True(double.IsPositiveInfinity(highest));
        Assert.Null(AlphaGuard.FirstViolation(new GeneralisedTwuAlpha(lowest + 1e-3, 300), 300));
        Assert.NotNull(AlphaGuard.FirstViolation(new GeneralisedTwuAlpha(lowest - 1e-3, 300), 300));
    }

    [Theory]
    [InlineData(-0.5)]
    [InlineData(-0.2)]
    public void Twu_AcentricFactorOutsideRange_RefusedNamingTheRange(double omega)
    {
        // Omega = -0.5 with the generalised Twu function gave a negative latent heat.
        var fluid = Propane with { AcentricFactor = Propane.AcentricFactor with { Value = omega } };
        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu));
        Assert.Contains("where the generalised Twu (1995) alpha function stays positive and decreasing", ex.Message, StringComparison.Ordinal);
        Assert.Equal("acentric factor", ex.Field);
    }

    [Theory]
    [InlineData(1000.0, 1000.0, 1000.0, "is not finite")]
    [InlineData(-0.5, 1.0, 2.0, "does not decrease with T")]
    public void Twu_OwnParametersGivingABadAlpha_RefusedWithTheirOwnMessage(double l, double m, double n, string reason)
    {
        // Invented parameter sets: (1000, 1000, 1000) overflows exp(L(1 - Tr^NM)); L < 0 with
        // M = 1 gives alpha = exp(L(1 - Tr^2)), which rises with T.
        var fluid = Propane with { AlphaParameters = [new AlphaParameterSet(AlphaForm.Twu, CubicModelKind.PengRobinson, [l, m, n], "invented")] };
        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu));
        Assert.Contains("Twu parameters", ex.Message, StringComparison.Ordinal);
        Assert.Contains(reason, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Twu_SoundOwnParameters_Accepted()
    {
        // Invented but physical: alpha = exp(0.1(1 - Tr^2)) decreases from 1.09 to 1 on 0.3..1.
        var fluid = Propane with { AlphaParameters = [new AlphaParameterSet(AlphaForm.Twu, CubicModelKind.PengRobinson, [0.1, 1.0, 2.0], "invented")] };
        Assert.IsType<TwuAlpha>(CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu).Alpha);
    }

    [Theory]
    [InlineData(1e300, 4.2512e6)]
    [InlineData(369.89, 1e-305)]
    public void CriticalConstantsThatOverflow_RefusedNamingTcAndPc(double tc, double pc)
    {
        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, tc, pc, 0.152));
        Assert.Contains("outside the range of double precision", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(-1e300)]
    [InlineData(-1e-3)]
    public void VolumeShiftBeyondMinusCovolume_RefusedWithItsOwnMessage(double c)
    {
        // Propane PR: b = 5.63e-5 m3/mol, so both shifts are below -b.
        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, 369.89, 4.2512e6, 0.152, c));
        Assert.Contains("below minus the co-volume", ex.Message, StringComparison.Ordinal);
        Assert.Equal("volume shift", ex.Field);
    }
}
