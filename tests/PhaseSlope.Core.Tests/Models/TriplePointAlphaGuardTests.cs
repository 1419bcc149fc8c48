using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>The alpha guard covers the range the solver now reaches: a fluid's own alpha parameters
/// must keep α positive and decreasing down to its triple point, not only from 0.3 Tc.</summary>
public sealed class TriplePointAlphaGuardTests
{
    [Fact]
    public void MathiasCopemanConstants_RisingBelowPointThreeTc_RefusedDownToTheTriplePoint()
    {
        // Invented constants: c1 = 1, c2 = 0, c3 = -1.417 make d(alpha)/dT change sign at
        // x = 1 - sqrt(Tr) = 0.485 (Tr = 0.265): decreasing on 0.3 <= Tr <= 1, rising between
        // propane's triple point (Tr = 0.231) and Tr = 0.265.
        var propane = FluidCatalog.Embedded.Find("propane");
        var fluid = propane with
        {
            AlphaParameters = [new AlphaParameterSet(AlphaForm.MathiasCopeman, CubicModelKind.PengRobinson, [1.0, 0.0, -1.417], "invented for the test")],
        };

        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.MathiasCopeman));

        Assert.Equal("alpha parameters", ex.Field);
        Assert.Contains("does not decrease with T", ex.Message, StringComparison.Ordinal);
        Assert.Contains("for 0.231 <= T/Tc <= 1", ex.Message, StringComparison.Ordinal);
        // The same constants pass the check from 0.3 Tc (the range before the triple point became the lower end).
        var alpha = new MathiasCopemanAlpha(1.0, 0.0, -1.417, 369.89, "invented for the test");
        Assert.Null(AlphaGuard.FirstViolation(alpha, 369.89));
    }
}
