using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class CubicFormTests
{
    // Peng & Robinson, Ind. Eng. Chem. Fundam. 15, 59 (1976): the paper prints Zc = 0.307,
    // Ωa = 0.45724 and Ωb = 0.07780 (from memory); Zc = 0.30740 to five digits is the value
    // the same critical conditions give. A printed 5-decimal value is correct to half a unit in
    // its last place, so the tolerance is 5e-6 absolute.
    private const double HalfUnitInFifthDecimal = 5e-6;

    [Fact]
    public void PengRobinson_CriticalConstants_MatchPublishedRoundedValues()
    {
        var form = CubicForm.PengRobinson;

        AssertClose.Absolute(0.30740, form.CriticalCompressibility, HalfUnitInFifthDecimal, "PR Zc");
        AssertClose.Absolute(0.45724, form.OmegaA, HalfUnitInFifthDecimal, "PR Omega_a");
        AssertClose.Absolute(0.07780, form.OmegaB, HalfUnitInFifthDecimal, "PR Omega_b");
    }

    [Fact]
    public void VanDerWaals_CriticalConstants_AreExactFractions()
    {
        // van der Waals (1873): vc = 3b, Pc = a/(27b²), R·Tc = 8a/(27b), so Zc = 3/8,
        // Ωa = 27/64, Ωb = 1/8 (closed forms; any textbook). 1e-15 is a few ulps of these
        // numbers: the form solves for Ωb with a root finder to 1e-17.
        var form = CubicForm.VanDerWaals;

        AssertClose.Absolute(3.0 / 8.0, form.CriticalCompressibility, 1e-15, "vdW Zc");
        AssertClose.Absolute(27.0 / 64.0, form.OmegaA, 1e-15, "vdW Omega_a");
        AssertClose.Absolute(1.0 / 8.0, form.OmegaB, 1e-15, "vdW Omega_b");
    }

    [Fact]
    public void RedlichKwong_CriticalConstants_MatchClosedForms()
    {
        // Redlich & Kwong, Chem. Rev. 44, 233 (1949): Zc = 1/3, Ωb = (2^(1/3) − 1)/3 = 0.08664,
        // Ωa = 1/(9(2^(1/3) − 1)) = 0.42748 (closed forms of the triple-root condition). 1e-14
        // allows for the rounding in evaluating the cube root and the root finder's last step.
        var form = CubicForm.RedlichKwong;
        double cubeRootOfTwo = Math.Cbrt(2);

        AssertClose.Absolute(1.0 / 3.0, form.CriticalCompressibility, 1e-14, "RK Zc");
        AssertClose.Absolute((cubeRootOfTwo - 1) / 3, form.OmegaB, 1e-14, "RK Omega_b");
        AssertClose.Absolute(1 / (9 * (cubeRootOfTwo - 1)), form.OmegaA, 1e-14, "RK Omega_a");
    }

    [Fact]
    public void EveryForm_CubicInZ_HasTripleRootAtCriticalPoint()
    {
        // With A = Ωa, B = Ωb the cubic Z³ + c2·Z² + c1·Z + c0 (coefficients in the CubicForm
        // remarks) must equal (Z − Zc)³: c2 = −3Zc, c1 = 3Zc², c0 = −Zc³. Coefficients are O(1),
        // so 1e-14 absolute is rounding level.
        foreach (var form in new[] { CubicForm.VanDerWaals, CubicForm.RedlichKwong, CubicForm.PengRobinson })
        {
            double u = form.Delta1 + form.Delta2;
            double w = form.Delta1 * form.Delta2;
            double a = form.OmegaA;
            double b = form.OmegaB;
            double zc = form.CriticalCompressibility;

            AssertClose.Absolute(-3 * zc, (u - 1) * b - 1, 1e-14, $"{form.Name} Z² coefficient");
            AssertClose.Absolute(3 * zc * zc, a + (w - u) * b * b - u * b, 1e-14, $"{form.Name} Z coefficient");
            AssertClose.Absolute(-zc * zc * zc, -(a * b + w * b * b * (1 + b)), 1e-14, $"{form.Name} constant term");
        }
    }

    [Fact]
    public void PengRobinson_Deltas_AreOnePlusAndMinusRootTwo()
    {
        // Peng & Robinson (1976): attractive denominator v(v + b) + b(v − b) = v² + 2bv − b²,
        // i.e. δ1,2 = 1 ± √2.
        var form = CubicForm.PengRobinson;

        Assert.Equal(2.0, form.Delta1 + form.Delta2, 15);
        Assert.Equal(-1.0, form.Delta1 * form.Delta2, 15);
    }
}
