using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Solids;

/// <summary>A Simon–Glatzel melting line: nitrogen's, P/P_t = 1 + 12798.61[(T/T_t)^1.78963 − 1]
/// with T_t = 63.151 K and P_t = 12.5198 kPa (Span, Lemmon, Jacobsen, Wagner &amp; Yokozeki,
/// J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory), read from a fluid file written here.</summary>
public class SimonGlatzelTests
{
    private const double Tt = 63.151, Pt = 12.5198e3, A = 12798.61, B = 1.78963;

    // Constants of the same source (Span et al. 2000, from memory), except the acentric factor
    // (Poling, Prausnitz & O'Connell, 5th ed. (2001), Appendix A, from memory). The range's upper
    // end, 300 K, is this test's choice (the equation is published for far higher temperatures).
    private const string NitrogenFile = """
        format                    phaseslope-fluid 1
        name                      nitrogen-test
        molar_mass                28.01348 g/mol       | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory
        critical_temperature      126.192 K            | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory
        critical_pressure         3.3958 MPa           | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory
        acentric_factor           0.037                | Poling, Prausnitz & O'Connell, 5th ed. (2001), Appendix A; from memory
        triple_point_temperature  63.151 K             | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory
        triple_point_pressure     12.5198 kPa          | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory
        melting_pressure_equation reduce 63.151 K 12.5198 kPa form powers terms 12798.61^1.78963 range 63.151-300 K | Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000), Simon-Glatzel melting equation; from memory
        """;

    private static Fluid Nitrogen => FluidFile.Parse(new StringReader(NitrogenFile), "test/nitrogen-test.fluid");

    /// <summary>The published formula, evaluated here.</summary>
    private static double SimonGlatzel(double t) => Pt * (1 + A * (Math.Pow(t / Tt, B) - 1));

    [Theory]
    [InlineData(63.151)]
    [InlineData(65.0)]
    [InlineData(80.0)]
    [InlineData(120.0)]
    [InlineData(300.0)]
    public void Equation_ReproducesFormula(double t)
    {
        var equation = Nitrogen.MeltingPressureEquation!;

        Assert.Equal(SolidLineKind.Melting, equation.Kind);
        Assert.Equal(SolidLineForm.Powers, equation.Form);
        // The same arithmetic on the same doubles: 1e-14 allows a different association of the
        // two products (a few ulps).
        AssertClose.Relative(SimonGlatzel(t), equation.Pressure(t), 1e-14, $"melting pressure at {t} K");
    }

    [Theory]
    [InlineData(64.0)]
    [InlineData(80.0)]
    [InlineData(120.0)]
    [InlineData(299.0)]
    public void Slope_AnalyticMatchesCentralDifference(double t)
    {
        var equation = Nitrogen.MeltingPressureEquation!;
        double numeric = FiniteDifference.Central5(SimonGlatzel, t, 1e-3);

        // Five-point difference with a 1e-3 K step: truncation (1e-3)^4 f'''''/30, negligible for
        // a power law over tens of kelvin; rounding about 1.5 eps P/(1e-3 K) against a slope of
        // order P/T: 1e-11 relative. 1e-8 leaves room for both.
        AssertClose.Relative(numeric, equation.Slope(t), 1e-8, $"melting slope at {t} K");
        Assert.True(equation.Slope(t) > 0, "nitrogen's solid is denser than its liquid: the melting line rises");
    }

    [Fact]
    public void MeltingLine_UsesThePublishedEquationAndItsRange()
    {
        var fluid = Nitrogen;
        var lines = new SolidPhaseLines(fluid, CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson));

        Assert.Equal((63.151, 300.0), lines.DefaultRange(PhaseLineKind.Melting));
        Assert.Contains("published melting equation", lines.MeltingMethod, StringComparison.Ordinal);
        var point = lines.Melting(100.0);
        AssertClose.Relative(SimonGlatzel(100.0), point.Pressure, 1e-14, "melting pressure at 100 K");
        // No volume change in this file: the enthalpy and volume changes are not invented.
        Assert.Null(point.VolumeChange);
        Assert.Null(point.EnthalpyChange);
        Assert.Throws<Errors.InvalidInputException>(() => lines.Melting(301.0));
        Assert.Throws<Errors.InvalidInputException>(() => lines.Melting(60.0));
    }
}
