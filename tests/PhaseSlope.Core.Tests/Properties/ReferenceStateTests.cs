using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>Reference conventions fix the zeros of h and s only: every difference and every
/// derivative that does not involve the absolute entropy is the same on all of them, and each
/// convention's anchor carries its prescribed values.</summary>
public class ReferenceStateTests
{
    private const double R = Constants.GasConstant;

    /// <summary>Propane with Peng–Robinson: Tc = 369.89 K is above 0 °C and −40 °C, and its normal
    /// boiling point (≈ 231 K) is above the lowest valid temperature, so every convention exists.</summary>
    private static PropertyModel Propane(ReferenceState reference) => TestSupport.Engines.For("propane", CubicModelKind.PengRobinson, reference: reference);

    /// <summary>The five conventions: the four built-in ones and a custom single-phase anchor.</summary>
    private static readonly ReferenceState[] Conventions =
    [
        ReferenceState.IdealGas,
        ReferenceState.NormalBoilingPoint,
        ReferenceState.Refrigeration,
        ReferenceState.MinusForty,
        ReferenceState.Custom(300, 1e5, 1234.5, 67.89),
    ];

    [Fact]
    public void Differences_AcrossCoexistence_SameForEveryConvention()
    {
        // Offsets of up to ~3e4 J/mol are added to h values of ~1e4 J/mol; each difference then
        // carries the rounding of the offset, a few ulps of 3e4 J/mol ≈ 1e-11 J/mol. The bound
        // 1e-9 J/mol (1e-12 J/(mol K) for s) is four orders of magnitude below any real leak of
        // the reference into a difference.
        var baseline = Propane(ReferenceState.IdealGas);
        foreach (double t in new[] { 200.0, 280.0, 350.0 })
        {
            var expected = baseline.Coexistence(baseline.Solver.AtTemperature(t));
            foreach (var reference in Conventions)
            {
                var engine = Propane(reference);
                var c = engine.Coexistence(engine.Solver.AtTemperature(t));
                string at = $"{reference.Id} at {t} K";
                AssertClose.Absolute(expected.EnthalpyOfVaporization, c.EnthalpyOfVaporization, 1e-9, $"dh {at}");
                AssertClose.Absolute(expected.EntropyOfVaporization, c.EntropyOfVaporization, 1e-12, $"ds {at}");
                AssertClose.Absolute(
                    expected.Vapour.State.InternalEnergy!.Value - expected.Liquid.State.InternalEnergy!.Value,
                    c.Vapour.State.InternalEnergy!.Value - c.Liquid.State.InternalEnergy!.Value, 1e-9, $"du {at}");
                AssertClose.Relative(expected.Vapour.EntropySlope!.Value, c.Vapour.EntropySlope!.Value, 1e-14, $"ds_V/dT {at}");
                AssertClose.Relative(expected.Liquid.EnthalpySlope!.Value, c.Liquid.EnthalpySlope!.Value, 1e-14, $"dh_L/dT {at}");
            }
        }
    }

    [Fact]
    public void Derivatives_WithoutAbsoluteEntropy_SameForEveryConvention()
    {
        // The (T, V) partials of T, P, V, U, H and S contain cv, P_T, P_V, T, V and P only (those
        // of A and G contain the absolute S), so every (∂X/∂Y)_Z with X, Y and Z among these six
        // is the same on every convention: to rounding, and in fact bit for bit, since the offsets
        // never enter.
        StateVariable[] free = [StateVariable.T, StateVariable.P, StateVariable.V, StateVariable.U, StateVariable.H, StateVariable.S];
        var states = new List<(string, double, double)> { ("liquid", 300, 2e6), ("vapour", 300, 1e5), ("supercritical", 450, 6e6) };
        var baseline = Propane(ReferenceState.IdealGas);
        int compared = 0;
        foreach (var reference in Conventions)
        {
            var engine = Propane(reference);
            foreach (var (name, t, p) in states)
            {
                var expected = baseline.AtPressure(t, p);
                var state = engine.AtPressure(t, p);
                foreach (var x in free)
                {
                    foreach (var y in free)
                    {
                        foreach (var z in free.Where(z => z != y))
                        {
                            AssertClose.Relative(PartialDerivatives.Of(expected, x, y, z), PartialDerivatives.Of(state, x, y, z), 1e-14,
                                $"(d{x}/d{y})_{z} of the {name} on {reference.Id}");
                            compared++;
                        }
                    }
                }
            }
        }

        Assert.Equal(5 * 3 * 6 * 6 * 5, compared);
    }

    [Fact]
    public void Derivatives_InvolvingAbsoluteEntropy_DependOnConvention()
    {
        // The control case: (∂G/∂T)_P = −S does change with the convention, so the comparison above
        // is not comparing a quantity that could never differ.
        var a = Propane(ReferenceState.IdealGas).AtPressure(300, 1e5);
        var b = Propane(ReferenceState.NormalBoilingPoint).AtPressure(300, 1e5);

        double ga = PartialDerivatives.Of(a, StateVariable.G, StateVariable.T, StateVariable.P);
        double gb = PartialDerivatives.Of(b, StateVariable.G, StateVariable.T, StateVariable.P);

        Assert.True(Math.Abs(ga - gb) > 1, $"(dG/dT)_P: {ga} on ideal-gas, {gb} on nbp");
        AssertClose.Relative(-b.Entropy!.Value, gb, 1e-14, "(dG/dT)_P = -S on nbp");
    }

    /// <summary>At an anchor, h and s are the offset plus the engine's own value of the same state:
    /// they reproduce the target to the rounding of a sum of ~1e4 J/mol terms, ~1e-11 J/mol; 1e-8
    /// J/mol and 1e-10 J/(mol K) are far below any misplaced anchor (which would be off by kJ/mol).</summary>
    private const double AnchorEnthalpyTolerance = 1e-8;

    private const double AnchorEntropyTolerance = 1e-10;

    [Fact]
    public void NormalBoilingPoint_SaturatedLiquidAtOneAtmosphere_HasZeroEnthalpyAndEntropy()
    {
        var engine = Propane(ReferenceState.NormalBoilingPoint);
        var point = engine.Solver.AtPressure(101325);
        var liquid = engine.Coexistence(point).Liquid.State;

        AssertClose.Absolute(0, liquid.Enthalpy!.Value, AnchorEnthalpyTolerance, "h of the saturated liquid at 101325 Pa");
        AssertClose.Absolute(0, liquid.Entropy!.Value, AnchorEntropyTolerance, "s of the saturated liquid at 101325 Pa");
    }

    [Fact]
    public void Refrigeration_SaturatedLiquidAtZeroCelsius_Has200KjPerKgAnd1KjPerKgK()
    {
        // The convention of the International Institute of Refrigeration: h = 200 kJ/kg and
        // s = 1 kJ/(kg K) for the saturated liquid at 0 °C (from memory).
        var engine = Propane(ReferenceState.Refrigeration);
        var liquid = engine.Coexistence(engine.Solver.AtTemperature(273.15)).Liquid.State;
        double m = engine.MolarMass!.Value;

        AssertClose.Absolute(200e3, liquid.Enthalpy!.Value / m, AnchorEnthalpyTolerance / m, "h in J/kg at 0 degC");
        AssertClose.Absolute(1e3, liquid.Entropy!.Value / m, AnchorEntropyTolerance / m, "s in J/(kg K) at 0 degC");
    }

    [Fact]
    public void MinusForty_SaturatedLiquidAt233K_HasZeroEnthalpyAndEntropy()
    {
        var engine = Propane(ReferenceState.MinusForty);
        var liquid = engine.Coexistence(engine.Solver.AtTemperature(233.15)).Liquid.State;

        AssertClose.Absolute(0, liquid.Enthalpy!.Value, AnchorEnthalpyTolerance, "h at -40 degC");
        AssertClose.Absolute(0, liquid.Entropy!.Value, AnchorEntropyTolerance, "s at -40 degC");
    }

    [Theory]
    [InlineData("propane", CubicModelKind.PengRobinson)]
    [InlineData("water", CubicModelKind.SoaveRedlichKwong)]
    [InlineData("toluene", CubicModelKind.PengRobinson1978)]
    public void IdealGas_VeryDiluteStateAt298K_HasZeroEnthalpyAndIdealEntropy(string fluid, CubicModelKind kind)
    {
        // h = s = 0 for the ideal gas at 298.15 K and 1 bar; a real state at the same T and density
        // ρ differs from that ideal gas by its residual parts, h_r ≈ (B − T·dB/dT)·P and
        // s_r ≈ −(dB/dT)·P, plus the pressure term −R ln(P/1 bar) of the ideal-gas entropy. At
        // ρ = 1e-8 mol/m³ (P ≈ 2.5e-5 Pa) and with |B|, T|dB/dT| below 0.1 m³/mol for these
        // fluids in these models, h_r < 3e-6 J/mol and s_r < 1e-8 J/(mol K).
        var engine = TestSupport.Engines.For(fluid, kind);
        var state = engine.AtDensity(ReferenceState.IdealGasTemperature, 1e-8);

        AssertClose.Absolute(0, state.Enthalpy!.Value, 3e-6, $"{fluid} h of the dilute gas at 298.15 K");
        AssertClose.Absolute(0, state.Entropy!.Value + R * Math.Log(state.Pressure / ReferenceState.IdealGasPressure), 1e-8, $"{fluid} s + R ln(P/1 bar)");
        Assert.True(state.Entropy > 100, "at 2.5e-5 Pa the ideal-gas entropy is R ln(1 bar/P) ≈ 183 J/(mol K)");
    }

    [Fact]
    public void Custom_SinglePhaseAnchor_HasGivenEnthalpyAndEntropy()
    {
        var engine = Propane(ReferenceState.Custom(300, 1e5, 1234.5, 67.89));
        var anchor = engine.AtPressure(300, 1e5);

        AssertClose.Absolute(1234.5, anchor.Enthalpy!.Value, AnchorEnthalpyTolerance, "h at the custom anchor");
        AssertClose.Absolute(67.89, anchor.Entropy!.Value, AnchorEntropyTolerance, "s at the custom anchor");
    }

    [Fact]
    public void Custom_SaturatedLiquidAnchor_HasGivenEnthalpyAndEntropy()
    {
        var engine = Propane(ReferenceState.Custom(250, null, -500, 2.5));
        var liquid = engine.Coexistence(engine.Solver.AtTemperature(250)).Liquid.State;

        AssertClose.Absolute(-500, liquid.Enthalpy!.Value, AnchorEnthalpyTolerance, "h of the saturated liquid at 250 K");
        AssertClose.Absolute(2.5, liquid.Entropy!.Value, AnchorEntropyTolerance, "s of the saturated liquid at 250 K");
    }

    [Fact]
    public void Refrigeration_MethaneAboveItsCriticalTemperature_ThrowsInvalidInputException()
    {
        // Methane's Tc ≈ 190.6 K: there is no saturated liquid at 0 °C.
        Fluid methane = FluidCatalog.Embedded.Find("methane");

        var ex = Assert.Throws<InvalidInputException>(() => new PropertyModel(methane, CubicModel.For(CubicModelKind.PengRobinson, methane), ReferenceState.Refrigeration));

        Assert.Contains("reference state 'refrigeration'", ex.Message, StringComparison.Ordinal);
        Assert.Contains("methane", ex.Message, StringComparison.Ordinal);
        Assert.Contains("critical temperature", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NormalBoilingPoint_CarbonDioxide_ThrowsInvalidInputException()
    {
        // Carbon dioxide's triple-point pressure (≈ 0.518 MPa; Span & Wagner, J. Phys. Chem. Ref.
        // Data 25, 1509 (1996), from memory) is above one atmosphere: it has no normal boiling
        // point, and at 101325 Pa the solid sublimes.
        Fluid co2 = FluidCatalog.Embedded.Find("carbon-dioxide");

        var ex = Assert.Throws<InvalidInputException>(() => new PropertyModel(co2, CubicModel.For(CubicModelKind.PengRobinson, co2), ReferenceState.NormalBoilingPoint));

        Assert.Contains("reference state 'nbp'", ex.Message, StringComparison.Ordinal);
        Assert.Contains("no liquid exists below the triple-point pressure 517950 Pa of carbon dioxide", ex.Message, StringComparison.Ordinal);
    }
}
