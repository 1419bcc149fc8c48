using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Cycles;

/// <summary>The interim (P, h) and (P, s) inversion: round trips from (T, P) and the lever rule
/// inside the dome.</summary>
public class IsobaricStatesTests
{
    private static readonly PropertyModel Propane = Engines.For("propane", CubicModelKind.PengRobinson);

    [Theory]
    [InlineData(200.0, 1e5)]     // compressed liquid
    [InlineData(300.0, 1e5)]     // superheated vapour
    [InlineData(360.0, 3e6)]     // vapour near the dome top
    [InlineData(400.0, 6e6)]     // supercritical fluid (Pc = 4.25 MPa)
    [InlineData(300.0, 2e6)]     // compressed liquid near saturation
    public void Single_phase_round_trip_returns_the_temperature(double t, double p)
    {
        var state = Propane.AtPressure(t, p);
        // Brent stops at a scaled residual of 1e-12, i.e. |Δh| ≤ 1e-12·R·Tc ≈ 3e-9 J/mol; with
        // cp ≥ 50 J/(mol K) that is ≤ 1e-10 K. 1e-9 relative leaves a factor of 3 for the bracket's own stop.
        Assert.True(IsobaricStates.TryAtEnthalpy(Propane, p, state.Enthalpy!.Value, 1000, out var byH));
        Assert.True(IsobaricStates.TryAtEntropy(Propane, p, state.Entropy!.Value, 1000, out var byS));
        AssertClose.Relative(t, byH.Temperature, 1e-9, "T from (P, h)");
        AssertClose.Relative(t, byS.Temperature, 1e-9, "T from (P, s)");
        Assert.Null(byH.Quality);
        AssertClose.Relative(state.Density, byS.Density, 1e-8, "density from (P, s)");
    }

    [Fact]
    public void Two_phase_states_follow_the_lever_rule_of_the_coexistence_point()
    {
        var sat = Propane.Coexistence(Propane.Solver.AtPressure(1e6));
        double hL = sat.Liquid.State.Enthalpy!.Value, hV = sat.Vapour.State.Enthalpy!.Value;
        Assert.True(IsobaricStates.TryAtEnthalpy(Propane, 1e6, hL + 0.3 * (hV - hL), 1000, out var mix));
        // The lever rule in h, solved back: exact to rounding of the h values (~1e-15 relative).
        AssertClose.Relative(0.3, mix.Quality!.Value, 1e-12, "quality");
        Assert.Equal(sat.Point.Temperature, mix.Temperature);
        AssertClose.Relative(sat.Liquid.State.Entropy!.Value + 0.3 * sat.EntropyOfVaporization, mix.Entropy, 1e-12, "s of the mixture");
        Assert.True(IsobaricStates.TryAtEntropy(Propane, 1e6, mix.Entropy, 1000, out var back));
        AssertClose.Relative(0.3, back.Quality!.Value, 1e-12, "quality from s");
    }

    [Fact]
    public void Values_beyond_the_range_searched_are_not_found()
    {
        var hot = Propane.AtPressure(900, 1e5);
        Assert.False(IsobaricStates.TryAtEnthalpy(Propane, 1e5, hot.Enthalpy!.Value, 600, out _));
        Assert.True(IsobaricStates.TryAtEnthalpy(Propane, 1e5, hot.Enthalpy!.Value, 1000, out var found));
        AssertClose.Relative(900, found.Temperature, 1e-9, "T at 900 K");
    }
}
