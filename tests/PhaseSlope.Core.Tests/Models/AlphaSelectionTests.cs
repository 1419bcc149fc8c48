using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class AlphaSelectionTests
{
    private static Fluid Propane => FluidCatalog.Embedded.Find("propane");

    private static Fluid WithSets(Fluid fluid, params AlphaParameterSet[] sets) => fluid with { AlphaParameters = sets };

    /// <summary>Normal fluids of the catalog (no hydrogen bonding, ω ≤ 0.33), for which the
    /// acentric-factor correlations of both alpha functions were built.</summary>
    public static TheoryData<string> NormalFluids() => new() { "argon", "methane", "nitrogen", "ethane", "propane", "n-butane", "benzene", "toluene", "r-134a" };

    private static double Log10ReducedVapourPressureAtTr07(CubicModel model, Fluid fluid)
    {
        var solver = new CoexistenceSolver(model, CoexistenceSolver.LowestValidTemperature(fluid));
        return Math.Log10(solver.AtTemperature(0.7 * model.CriticalTemperature).Pressure / model.CriticalPressure);
    }

    [Theory]
    [MemberData(nameof(NormalFluids))]
    public void VapourPressureAtTr07_DefaultPrAndGeneralisedTwu_FollowTheDefinitionOfOmega(string name)
    {
        // Pitzer et al. (1955) define ω = −1 − log10(Psat/Pc) at Tr = 0.7, so a model built from
        // ω should give log10(Psat/Pc) ≈ −1 − ω there. Neither κ(ω) nor the 1995 Twu sets are
        // constrained to this point: both are regressions of vapour pressures over many fluids,
        // with scatter of order 1 % in Psat. 0.005 in log10 (1.2 % in Psat) is that size;
        // measured deviations are at most 0.0029 (PR, argon) and 0.0017 (Twu, R-134a) here.
        Fluid fluid = FluidCatalog.Embedded.Find(name);
        double target = -1 - fluid.AcentricFactor.Value;
        double pr = Log10ReducedVapourPressureAtTr07(CubicModel.For(CubicModelKind.PengRobinson, fluid), fluid);
        double twu = Log10ReducedVapourPressureAtTr07(CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu), fluid);

        AssertClose.Absolute(target, pr, 0.005, $"{name} PR log10(Psat/Pc) at Tr = 0.7");
        AssertClose.Absolute(target, twu, 0.005, $"{name} PR + generalised Twu log10(Psat/Pc) at Tr = 0.7");
        // Fitted to the same kind of data, the two should also agree with each other to that
        // size: 0.005 in log10 (measured at most 0.0033, toluene; 0.0020 for propane, 0.46 % in Psat).
        AssertClose.Absolute(pr, twu, 0.005, $"{name} PR vs generalised Twu");
    }

    [Fact]
    public void For_Default_IsTheModelFromTheCriticalConstants()
    {
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            var byFluid = CubicModel.For(kind, Propane, AlphaForm.Default);
            var byConstants = CubicModel.For(kind, Propane.CriticalTemperature.Value, Propane.CriticalPressure.Value, Propane.AcentricFactor.Value);

            Assert.Equal(byConstants.Alpha.Description, byFluid.Alpha.Description);
            Assert.Equal(byConstants.Residual(250, 9000), byFluid.Residual(250, 9000));
        }
    }

    [Fact]
    public void For_TwuWithFluidParameters_UsesThemForThatModel()
    {
        // Test values (not a published set for propane); the SRK set must not be used for PR.
        var fluid = WithSets(Propane,
            new AlphaParameterSet(AlphaForm.Twu, CubicModelKind.SoaveRedlichKwong, [0.9, 0.9, 0.9], "srk test values"),
            new AlphaParameterSet(AlphaForm.Twu, CubicModelKind.PengRobinson, [0.3, 0.87, 1.9], "pr test values"));

        var model = CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu);

        var twu = Assert.IsType<TwuAlpha>(model.Alpha);
        Assert.Equal((0.3, 0.87, 1.9), (twu.L, twu.M, twu.N));
        Assert.Same(CubicForm.PengRobinson, model.Form);
        Assert.Contains("pr test values", model.Alpha.Description, StringComparison.Ordinal);
        var srk = Assert.IsType<TwuAlpha>(CubicModel.For(CubicModelKind.SoaveRedlichKwong, fluid, AlphaForm.Twu).Alpha);
        Assert.Equal(0.9, srk.L);
    }

    [Fact]
    public void For_PengRobinson1978_FallsBackOnPengRobinsonParameters()
    {
        var fluid = WithSets(Propane, new AlphaParameterSet(AlphaForm.MathiasCopeman, CubicModelKind.PengRobinson, [0.6, -0.1, 0.2], "test values"));

        var mc = Assert.IsType<MathiasCopemanAlpha>(CubicModel.For(CubicModelKind.PengRobinson1978, fluid, AlphaForm.MathiasCopeman).Alpha);

        Assert.Equal((0.6, -0.1, 0.2), (mc.C1, mc.C2, mc.C3));
    }

    [Fact]
    public void For_TwuWithoutFluidParameters_PengRobinsonUsesGeneralisedSet()
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, Propane, AlphaForm.Twu);

        var alpha = Assert.IsType<GeneralisedTwuAlpha>(model.Alpha);
        Assert.Equal(Propane.AcentricFactor.Value, alpha.AcentricFactor);
    }

    [Fact]
    public void For_TwuWithoutFluidParameters_SoaveRedlichKwongThrows()
    {
        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane, AlphaForm.Twu));

        Assert.Contains("no Twu parameters for propane", ex.Message, StringComparison.Ordinal);
        Assert.Contains("Soave-Redlich-Kwong", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void For_MathiasCopemanWithoutFluidParameters_Throws()
    {
        foreach (var (kind, line) in new[] { (CubicModelKind.PengRobinson, "alpha_mathias_copeman_pr"), (CubicModelKind.SoaveRedlichKwong, "alpha_mathias_copeman_srk") })
        {
            // The catalog's propane carries tuned constants; without them the model is refused.
            var bare = Propane with { AlphaParameters = [] };
            var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(kind, bare, AlphaForm.MathiasCopeman));

            // The message names the fluid and model, and how to supply the constants.
            Assert.StartsWith($"no Mathias-Copeman parameters for propane with {kind.Title()}: tune them to measured vapour pressures (phaseslope tune), or add a line '{line}  c1 c2 c3  | source'", ex.Message, StringComparison.Ordinal);
            Assert.EndsWith("(docs/fluid-files.md)", ex.Message, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData(CubicModelKind.RedlichKwong, AlphaForm.Twu)]
    [InlineData(CubicModelKind.VanDerWaals, AlphaForm.Twu)]
    [InlineData(CubicModelKind.RedlichKwong, AlphaForm.MathiasCopeman)]
    [InlineData(CubicModelKind.VanDerWaals, AlphaForm.MathiasCopeman)]
    public void For_TwuOrMathiasCopemanWithOtherForms_Throws(CubicModelKind kind, AlphaForm alpha)
    {
        // Even with parameters present for that model: the forms apply to PR and SRK only.
        var fluid = WithSets(Propane, new AlphaParameterSet(alpha, kind, [0.5, 0.9, 2.0], "test values"));

        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(kind, fluid, alpha));

        Assert.Contains("Peng-Robinson and Soave-Redlich-Kwong models only", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void For_ParameterSetWithWrongCount_Throws()
    {
        var fluid = WithSets(Propane, new AlphaParameterSet(AlphaForm.Twu, CubicModelKind.PengRobinson, [0.3, 0.87], "test values"));

        var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(CubicModelKind.PengRobinson, fluid, AlphaForm.Twu));

        Assert.Contains("must be 3 numbers, got 2", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void For_MathiasCopemanWithSoaveSlope_ReproducesDefaultSrkCoexistenceExactly()
    {
        // c1 = Soave's m(ω), c2 = c3 = 0: the alpha functions agree bit for bit, so the whole
        // coexistence computation must too.
        double m = SoaveAlpha.SoaveSlope(Propane.AcentricFactor.Value);
        var fluid = WithSets(Propane, new AlphaParameterSet(AlphaForm.MathiasCopeman, CubicModelKind.SoaveRedlichKwong, [m, 0, 0], "Soave slope"));
        double tmin = CoexistenceSolver.LowestValidTemperature(Propane);
        var mc = new CoexistenceSolver(CubicModel.For(CubicModelKind.SoaveRedlichKwong, fluid, AlphaForm.MathiasCopeman), tmin);
        var srk = new CoexistenceSolver(CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane), tmin);

        foreach (double t in new[] { 150.0, 259.0, 360.0 })
        {
            var a = mc.AtTemperature(t);
            var b = srk.AtTemperature(t);
            Assert.Equal(b.Pressure, a.Pressure);
            Assert.Equal(b.Liquid.Density, a.Liquid.Density);
            Assert.Equal(b.EnthalpyOfVaporization, a.EnthalpyOfVaporization);
        }
    }

    [Fact]
    public void For_AlphaFormWithVolumeShift_AppliesBoth()
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, Propane, AlphaForm.Twu, -5e-6);

        Assert.IsType<GeneralisedTwuAlpha>(model.Alpha);
        Assert.Equal(-5e-6, model.VolumeShift);
        Assert.Equal(-5e-6, CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane, volumeShift: -5e-6).VolumeShift);
    }
}
