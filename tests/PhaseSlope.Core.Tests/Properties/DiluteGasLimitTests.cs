using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>As P → 0 a real gas becomes ideal: cp → cp°(T) and w → sqrt(γRT/M) with
/// γ = cp°/(cp° − R) (kinetic theory; any physical chemistry text).</summary>
public class DiluteGasLimitTests
{
    private const double R = Constants.GasConstant;

    public static TheoryData<string, CubicModelKind, double> Gases => new()
    {
        { "nitrogen", CubicModelKind.PengRobinson, 300 },
        { "nitrogen", CubicModelKind.SoaveRedlichKwong, 150 },
        { "argon", CubicModelKind.PengRobinson, 300 },
        { "argon", CubicModelKind.VanDerWaals, 120 },
        // Water vapour at 1 Pa is far below its vapour pressure (≈ 3.2 kPa at 298 K, 47 kPa at 353 K).
        { "water", CubicModelKind.SoaveRedlichKwong, 298.15 },
        { "water", CubicModelKind.PengRobinson, 400 },
    };

    /// <summary>Relative deviation from the ideal gas at 1 Pa: first order in P, of size
    /// |B|·P/(RT) and T²|B″|·P/(RT) with the model's second virial coefficient B; for these gases
    /// and temperatures |B| and T²|B″| stay below ~0.05 m³/mol (water, strongly attracting, has
    /// the largest), so the deviation is below 0.05·1/(R·100 K) ≈ 6e-5. 1e-4 bounds it.</summary>
    private const double OnePascalTolerance = 1e-4;

    [Theory]
    [MemberData(nameof(Gases))]
    public void HeatCapacityAndSpeedOfSound_AtOnePascal_ApproachIdealGasValues(string fluid, CubicModelKind kind, double t)
    {
        var engine = TestSupport.Engines.For(fluid, kind);
        var state = engine.AtPressure(t, 1);
        double cp0 = state.IdealGasHeatCapacity!.Value;
        double gamma = cp0 / (cp0 - R);
        double idealSound = Math.Sqrt(gamma * R * t / engine.MolarMass!.Value);

        Assert.NotEqual(PhaseLabel.Liquid, state.Phase);
        AssertClose.Relative(engine.Fluid.IdealGasHeatCapacity!.HeatCapacity(t), cp0, 1e-15, $"{fluid} state cp° = catalog cp°(T)");
        AssertClose.Relative(cp0, state.IsobaricHeatCapacity!.Value, OnePascalTolerance, $"{fluid} {kind} cp at 1 Pa, {t} K");
        AssertClose.Relative(cp0 - R, state.IsochoricHeatCapacity!.Value, OnePascalTolerance, $"{fluid} {kind} cv at 1 Pa, {t} K");
        AssertClose.Relative(idealSound, state.SpeedOfSound!.Value, OnePascalTolerance, $"{fluid} {kind} w at 1 Pa, {t} K");
    }

    [Theory]
    [MemberData(nameof(Gases))]
    public void HeatCapacity_TowardZeroPressure_DeviationShrinksInProportionToPressure(string fluid, CubicModelKind kind, double t)
    {
        // cp − cp° = −T·B″·P + O(P²) (virial expansion): the limit is approached linearly, so the
        // deviation at 1 Pa is ten times that at 0.1 Pa to within the O(P) relative correction
        // (~1e-4) and the rounding of cp − cp° (~1e-14·cp over a deviation of ~1e-7·cp, i.e. 1e-7).
        var engine = TestSupport.Engines.For(fluid, kind);
        double Deviation(double p)
        {
            var s = engine.AtPressure(t, p);
            return s.IsobaricHeatCapacity!.Value - s.IdealGasHeatCapacity!.Value;
        }

        double at1 = Deviation(1);
        double at01 = Deviation(0.1);

        Assert.True(at1 > 0, $"{fluid}: attraction makes cp exceed cp° (B″ < 0), got {at1}");
        AssertClose.Relative(10, at1 / at01, 1e-3, $"{fluid} {kind} ratio of cp - cp° at 1 Pa and 0.1 Pa");
    }

    [Theory]
    [InlineData(CubicModelKind.PengRobinson, 100)]
    [InlineData(CubicModelKind.PengRobinson, 300)]
    [InlineData(CubicModelKind.RedlichKwong, 600)]
    public void SpeedOfSound_ArgonAtOnePascal_IsSqrtFiveRTOverThreeM(CubicModelKind kind, double t)
    {
        // A monatomic ideal gas has γ = 5/3 exactly, w = sqrt(5RT/(3M)).
        var engine = TestSupport.Engines.For("argon", kind);
        var state = engine.AtPressure(t, 1);

        AssertClose.Relative(5.0 / 3.0, state.IdealGasHeatCapacity!.Value / (state.IdealGasHeatCapacity!.Value - R), 1e-15, "argon gamma");
        AssertClose.Relative(Math.Sqrt(5 * R * t / (3 * engine.MolarMass!.Value)), state.SpeedOfSound!.Value, OnePascalTolerance, $"argon w at 1 Pa, {t} K");
    }

    /// <summary>Chase, NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data
    /// Monograph 9 (1998), cp° of the ideal gas at 298.15 K; values from memory.</summary>
    public static TheoryData<string, double> Janaf => new()
    {
        { "nitrogen", 29.124 },
        { "carbon-dioxide", 37.135 },
        { "methane", 35.639 },
        { "water", 33.590 },
    };

    [Theory]
    [MemberData(nameof(Janaf))]
    public void IdealGasHeatCapacity_At298K_MatchesJanaf(string fluid, double expected)
    {
        // These catalog fluids carry the ideal-gas part of a reference equation of state, which
        // reproduces the statistical-mechanical cp° of the tables to ~0.1 %; 0.3 % also allows for
        // the reference values being recalled rather than looked up. The state is a dilute one so
        // that the value is read through ThermodynamicState as a user would.
        var engine = TestSupport.Engines.For(fluid, CubicModelKind.PengRobinson);
        var state = engine.AtDensity(298.15, 1e-3);

        AssertClose.Relative(expected, state.IdealGasHeatCapacity!.Value, 0.003, $"{fluid} cp° at 298.15 K vs JANAF");
    }
}
