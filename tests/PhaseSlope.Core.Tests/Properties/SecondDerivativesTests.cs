using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>The exact second derivatives (∂c_p/∂P)_T and (∂c_v/∂v)_T, the cubic's mixed third
/// Helmholtz derivatives they rest on, and the speed of sound and Joule–Thomson coefficient
/// through the measurable-quantity expressions.</summary>
public sealed class SecondDerivativesTests
{
    public static TheoryData<string, double, double> States => new()
    {
        { "propane", 300, 1e5 },        // gas
        { "propane", 250, 2e6 },        // compressed liquid
        { "water", 400, 1e6 },          // liquid
        { "carbon-dioxide", 320, 9e6 }, // supercritical, near the critical region
    };

    [Theory]
    [MemberData(nameof(States))]
    public void MixedThirdDerivatives_EqualCentralDifferencesOfTheSecond(string fluid, double t, double p)
    {
        // ∂³A_r/∂T²∂ρ = ∂(A_Tρ)/∂T and ∂³A_r/∂T∂ρ² = ∂(A_Tρ)/∂ρ, with A_Tρ from the model's own
        // Residual. Five-point central differences with steps 1e-3·T and 1e-3·ρ: truncation
        // ~ h⁴·f⁽⁵⁾/30, about 1e-12 relative for these smooth functions, rounding ~ 1e-16·|A_Tρ|/h
        // relative to the derivative, up to ~1e-9 where ρ·A_Tρρ is small against its terms (measured: worst
        // 1.8e-9, ∂/∂ρ for water at 400 K; ∂/∂T at most 2.6e-12): 1e-7 leaves fifty-fold margin and
        // still catches a wrong sign or factor.
        var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
        var model = (CubicModel)engine.Model;
        var state = engine.AtPressure(t, p);
        double rho = state.Density;
        var (dTTRho, dTRhoRho) = model.MixedThirdDerivatives(t, rho);
        double byT = FiniteDifference.Central5(x => model.Residual(x, rho).DTRho, t, 1e-3 * t);
        double byRho = FiniteDifference.Central5(x => model.Residual(t, x).DTRho, rho, 1e-3 * rho);
        AssertClose.Relative(byT, dTTRho, 1e-7, "d3Ar/dT2drho");
        AssertClose.Relative(byRho, dTRhoRho, 1e-7, "d3Ar/dTdrho2");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void IsobaricHeatCapacityByPressure_EqualsCentralDifferenceOfCp(string fluid, double t, double p)
    {
        // (∂c_p/∂P)_T = −T v (α² + (∂α/∂T)_P), exact, against a five-point central difference of the
        // model's own c_p(T, P) at fixed T with step 1e-3·P (each c_p from its own density root, so
        // the difference includes the root solve's rounding, ~1e-15 relative in c_p): truncation
        // ~ 1e-12, rounding ~ 1e-15·c_p/(h·|∂c_p/∂P|), up to ~1e-8 in the gas where c_p hardly moves
        // with P (measured worst 2.6e-9, CO2 at 320 K and 9 MPa; (∂α/∂T)_P at most 7.3e-11). 1e-6
        // covers both with margin.
        var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
        var state = engine.AtPressure(t, p);
        double exact = SecondDerivatives.IsobaricHeatCapacityByPressure(engine.Model, state);
        double difference = FiniteDifference.Central5(x => engine.AtPressure(t, x).IsobaricHeatCapacity!.Value, p, 1e-3 * p);
        AssertClose.Relative(difference, exact, 1e-6, "(dcp/dP)_T");

        // The same through the textbook form −T v (α² + (∂α/∂T)_P).
        double alpha = state.IsobaricExpansivity!.Value;
        double alphaSlope = SecondDerivatives.ExpansivityByTemperature(engine.Model, state);
        AssertClose.Relative(-t * state.MolarVolume * (alpha * alpha + alphaSlope), exact, 1e-12, "-T v (alpha^2 + dalpha/dT)");
        double alphaDifference = FiniteDifference.Central5(x => engine.AtPressure(x, p).IsobaricExpansivity!.Value, t, 1e-4 * t);
        AssertClose.Relative(alphaDifference, alphaSlope, 1e-6, "(dalpha/dT)_P");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void IsochoricHeatCapacityByVolume_EqualsCentralDifferenceOfCv(string fluid, double t, double p)
    {
        // (∂c_v/∂v)_T = T (∂²P/∂T²)_v, exact, against a five-point central difference of the model's
        // c_v(T, v) at fixed T with step 1e-4·v (no root solve: AtDensity); c_v − c_v° is a
        // difference of two T-derivatives of A_r, rounding ~1e-15·c_v/(h·|∂c_v/∂v|) relative, ~1e-9;
        // truncation ~ 1e-16 (measured worst 3.1e-10, propane gas). 1e-6 covers both.
        var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
        var state = engine.AtPressure(t, p);
        double exact = SecondDerivatives.IsochoricHeatCapacityByVolume(engine.Model, state);
        double v = state.MolarVolume;
        double difference = FiniteDifference.Central5(x => engine.AtDensity(t, 1 / x).IsochoricHeatCapacity!.Value, v, 1e-4 * v);
        AssertClose.Relative(difference, exact, 1e-6, "(dcv/dv)_T");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void SpeedOfSoundAndJouleThomson_FromTheModelsOwnAlphaKappaCp_EqualTheModel(string fluid, double t, double p)
    {
        // w = sqrt(M·w²/M) with M·w² = −v²(∂P/∂v)_S reduced to v·c_p/(κ_T·c_p − T·v·α²), and
        // μ_JT = (∂T/∂P)_H = v(Tα − 1)/c_p, fed the model's own α, κ_T, c_p: equal to the model's
        // speed of sound and Joule–Thomson coefficient (other formulas, in (T, V)) to rounding.
        // 1e-13: the expression's cancellation (κ_T·c_p − T·v·α², c_v/c_p ~ 0.7 in a liquid) costs
        // a few ulps at these states (measured worst 5.9e-16 for w and 4.3e-15 for μ_JT).
        var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
        var state = engine.AtPressure(t, p);
        var values = MeasuredValues.FromState(state);
        double mw2 = values.Evaluate(JacobianReduction.MolarMassTimesSoundSpeedSquared()).Value;
        AssertClose.Relative(state.SpeedOfSound!.Value, Math.Sqrt(mw2 / state.MolarMass!.Value), 1e-13, "w");
        double jt = values.Evaluate(JacobianReduction.Reduce(T, P, H)).Value;
        AssertClose.Relative(PartialDerivatives.Of(state, T, P, H), jt, 1e-13, "mu_JT");
    }

    [Fact]
    public void SoundSpeedExpression_IsVOverTheIsentropicCompressibility()
    {
        // M·w² = v/κ_S with κ_S = κ_T − T v α²/c_p (Callen 1985, ch. 7; from memory).
        var expected = ExpressionParser.Parse("v/(kappa_T - T*v*alpha^2/cp)");
        Assert.Equal(expected.Text, JacobianReduction.MolarMassTimesSoundSpeedSquared().Text);
    }

    [Fact]
    public void WithoutIdealGas_ExpressionUsesCpOrSExactlyWhenTheDerivativeNeedsCp0()
    {
        // The model refuses a derivative without c_p° when its Jacobian depends on c_v or s
        // (decided numerically); the reduced expression uses c_p or s. The two decisions, made in
        // different ways, agree on all 336 derivatives: --explain never shows an expression whose
        // quantities the state cannot give while the value itself is computed.
        var fluid = PhaseSlope.Core.Fluids.FluidCatalog.Embedded.Find("propane") with { IdealGasHeatCapacity = null };
        var engine = new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid));
        var state = engine.AtPressure(250, 2e6);
        var all = Enum.GetValues<StateVariable>();
        int refused = 0;
        foreach (var x in all)
        {
            foreach (var y in all.Where(v => v != x))
            {
                foreach (var z in all.Where(v => v != x && v != y))
                {
                    var e = JacobianReduction.Reduce(x, y, z);
                    bool uses = e.Quantities.Contains(MeasurableQuantity.HeatCapacity) || e.Quantities.Contains(MeasurableQuantity.Entropy);
                    bool needs = PartialDerivatives.NeedsIdealGas(state, x, y, z);
                    Assert.True(uses == needs, $"(d{x}/d{y})_{z} = {e.Text}: uses cp or s {uses}, needs cp0 {needs}");
                    refused += needs ? 1 : 0;
                }
            }
        }

        Assert.InRange(refused, 1, 335);
    }
}
