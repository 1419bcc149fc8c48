using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>Messages that show the difference they report, and the estimate and audit guards.</summary>
public class MessageAndEstimateGuardTests
{
    [Theory]
    [InlineData(273.15999, 273.16, "273.15999", "273.16")]
    [InlineData(300.0, 273.16, "300", "273.16")]
    [InlineData(1.0, 1.0000000000000002, "1", "1.0000000000000002")]
    public void Apart_ShowsTheFewestDigitsThatDiffer(double a, double b, string shownA, string shownB)
        => Assert.Equal((shownA, shownB), Preconditions.Apart(a, b));

    [Fact]
    public void Solver_JustBelowTheTriplePoint_MessageShowsTheDifference()
    {
        // Water's lowest valid temperature is its triple point, 273.16 K (catalog, IAPWS-95).
        var solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find("water"), CubicModelKind.PengRobinson);
        var ex = Assert.Throws<InvalidInputException>(() => solver.AtTemperature(273.15999));
        Assert.Contains("273.15999 K is below the triple point 273.16 K", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(AcentricFactorMethod.AmbroseWalton)]
    [InlineData(AcentricFactorMethod.LeeKesler)]
    [InlineData(AcentricFactorMethod.Edmister)]
    public void AcentricFactor_PointBelowTheMethodsRange_Refused(AcentricFactorMethod method)
    {
        // (1 K, 1 Pa) with Tc = 370 K is T/Tc = 0.0027; Ambrose-Walton gave omega = -0.371.
        var ex = Assert.Throws<InvalidInputException>(() => CorrespondingStates.AcentricFactor(method, 370, 4.2e6, 1, 1));
        Assert.Contains("holds for T/Tc from 0.3 to 1", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AcentricFactor_ResultOutsideTheCatalogRange_Refused()
    {
        // 1 Pa at T/Tc = 0.81 is absurdly low: omega comes out near 14.
        var ex = Assert.Throws<InvalidInputException>(() => CorrespondingStates.AcentricFactor(AcentricFactorMethod.AmbroseWalton, 370, 4.2e6, 300, 1));
        Assert.Contains("outside the accepted range -0.5 to 2", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AcentricFactor_NormalBoilingPointOfPropane_StillEstimated()
    {
        // Propane: Tc 369.89 K, Pc 4.2512 MPa, Tb 231.036 K (catalog); tabulated omega 0.152.
        // A corresponding-states estimate from Tb is typically within 0.01 of it (common practice).
        double omega = CorrespondingStates.AcentricFactor(AcentricFactorMethod.AmbroseWalton, 369.89, 4.2512e6, 231.036, 101325);
        Assert.InRange(omega, 0.142, 0.162);
    }

    [Fact]
    public void Audit_CoefficientsThatOverflow_Refused()
    {
        var request = new AuditRequest
        {
            Correlation = new PublishedCorrelation("antoine", [1e300, 1e300, 1]),
            LogBase = LogBase.Ten,
            PressureUnit = PublishedPressureUnit.Pa,
            TemperatureUnit = PublishedTemperatureUnit.Kelvin,
            Range = (200, 300),
        };
        var ex = Assert.Throws<InvalidInputException>(() => CorrelationAuditor.Audit(request));
        Assert.Contains("overflow", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("pro\u202Epane", "U+202E at position 4")]
    [InlineData("pro\0pane", "U+0000 at position 4")]
    public void FluidFile_NameWithControlOrFormatCharacters_Refused(string name, string where)
    {
        string text = File.ReadAllText("../../../../../fluids/propane.fluid")
            .Replace("name                      propane", "name                      " + name, StringComparison.Ordinal);
        var ex = Assert.Throws<FluidDataException>(() => FluidFile.Parse(new StringReader(text), "test.fluid"));
        Assert.Contains(where, ex.Message, StringComparison.Ordinal);
    }
}
