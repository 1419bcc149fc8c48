using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Properties;

public class PartialDerivativesTests
{
    private static readonly PropertyModel Propane = Engines.For("propane", CubicModelKind.PengRobinson);

    [Theory]
    [InlineData(StateVariable.T)]
    [InlineData(StateVariable.P)]
    [InlineData(StateVariable.S)]
    [InlineData(StateVariable.G)]
    public void Of_HeldEqualsVaried_ThrowsInvalidInputException(StateVariable variable)
    {
        var state = Propane.AtPressure(300, 1e5);

        var ex = Assert.Throws<InvalidInputException>(() => PartialDerivatives.Of(state, H, variable, variable));

        Assert.Contains("must differ", ex.Message, StringComparison.Ordinal);
    }

    public static TheoryData<string, CubicModelKind> CriticalCases => new()
    {
        { "propane", CubicModelKind.PengRobinson },
        { "water", CubicModelKind.SoaveRedlichKwong },
        { "methane", CubicModelKind.VanDerWaals },
        { "ethanol", CubicModelKind.PengRobinson1978 },
        { "argon", CubicModelKind.RedlichKwong },
    };

    [Theory]
    [MemberData(nameof(CriticalCases))]
    public void Of_CompressibilityAtModelCriticalState_ThrowsInvalidInputException(string fluid, CubicModelKind kind)
    {
        // At the model's critical point (∂P/∂V)_T = 0 (the defining condition of the critical
        // point of a cubic), so (∂V/∂P)_T and every derivative at constant T taken by P diverge.
        // The state's (∂P/∂ρ)_T comes out as rounding noise of either sign there, which must not be
        // turned into a finite number.
        var engine = Engines.For(fluid, kind);
        var state = engine.AtDensity(engine.Solver.CriticalTemperature, engine.Solver.CriticalDensity);

        var ex = Assert.Throws<InvalidInputException>(() => PartialDerivatives.Of(state, V, P, T));
        Assert.Contains("undefined at this state", ex.Message, StringComparison.Ordinal);
        Assert.Throws<InvalidInputException>(() => PartialDerivatives.Of(state, H, T, P));
        Assert.Throws<InvalidInputException>(() => PartialDerivatives.Of(state, S, P, T));
        Assert.Null(state.IsobaricHeatCapacity);
        Assert.Null(state.IsothermalCompressibility);

        // Derivatives that stay finite at the critical point are still given: (∂P/∂T)_V and cv.
        AssertClose.Relative(state.PressureTemperatureDerivative, PartialDerivatives.Of(state, P, T, V), 1e-15, "(dP/dT)_V at the critical point");
        AssertClose.Relative(state.IsochoricHeatCapacity!.Value, PartialDerivatives.Of(state, U, T, V), 1e-15, "cv at the critical point");
    }

    [Fact]
    public void Of_SlightlyAboveCriticalTemperature_StillDefined()
    {
        // 1 % above Tc on the critical isochore the isotherm has a finite slope, (∂P/∂ρ)_T ≈
        // 0.01·T·(∂²P/∂T∂ρ) of order 1e-2·RT: far above rounding, so the guard against the
        // critical singularity must not fire there. κT from the Jacobian equals the state's.
        var model = (CubicModel)Propane.Model;
        var state = Propane.AtDensity(1.01 * model.CriticalTemperature, model.CriticalDensity);

        double kappa = -PartialDerivatives.Of(state, V, P, T) / state.MolarVolume;

        AssertClose.Relative(state.IsothermalCompressibility!.Value, kappa, 1e-14, "kappaT at 1.01 Tc");
    }

    [Theory]
    [InlineData(StateVariable.P, StateVariable.T, "Pa/K")]
    [InlineData(StateVariable.U, StateVariable.V, "Pa")]
    [InlineData(StateVariable.H, StateVariable.T, "J/(mol K)")]
    [InlineData(StateVariable.S, StateVariable.T, "J/(mol K^2)")]
    [InlineData(StateVariable.T, StateVariable.P, "K/Pa")]
    [InlineData(StateVariable.H, StateVariable.U, "1")]
    [InlineData(StateVariable.G, StateVariable.A, "1")]
    [InlineData(StateVariable.V, StateVariable.P, "m3/(Pa mol)")]
    [InlineData(StateVariable.H, StateVariable.P, "m3/mol")]
    [InlineData(StateVariable.H, StateVariable.S, "K")]
    [InlineData(StateVariable.S, StateVariable.V, "Pa/K")]
    [InlineData(StateVariable.V, StateVariable.T, "m3/(mol K)")]
    public void Unit_Combinations_SimplifiedSiUnit(StateVariable of, StateVariable by, string unit)
    {
        // Dimensional analysis with J = Pa·m³: e.g. (∂S/∂V)_T in J/(mol K)/(m³/mol) = Pa/K, which
        // is the unit of (∂P/∂T)_V as the Maxwell relation requires.
        Assert.Equal(unit, PartialDerivatives.Unit(of, by));
    }

    [Fact]
    public void Unit_MaxwellPairs_AgreeWithEachOther()
    {
        // Both sides of each Maxwell relation have one unit.
        Assert.Equal(PartialDerivatives.Unit(P, T), PartialDerivatives.Unit(S, V));
        Assert.Equal(PartialDerivatives.Unit(V, T), PartialDerivatives.Unit(S, P));
        Assert.Equal(PartialDerivatives.Unit(T, V), PartialDerivatives.Unit(P, S));
        Assert.Equal(PartialDerivatives.Unit(T, P), PartialDerivatives.Unit(V, S));
    }
}
