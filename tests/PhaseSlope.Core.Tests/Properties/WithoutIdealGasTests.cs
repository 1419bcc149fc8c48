using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>A fluid without an ideal-gas heat capacity: the properties that do not need cp° equal
/// those of the same fluid with cp°, the others are null with a reason, and a derivative is
/// refused exactly when it depends on cv or the absolute entropy.</summary>
public class WithoutIdealGasTests(ITestOutputHelper output)
{
    private static readonly StateVariable[] All = [T, P, V, U, H, S, A, G];

    private static (PropertyModel With, PropertyModel Without) Engines(string name, CubicModelKind kind)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        var bare = fluid with { IdealGasHeatCapacity = null };
        return (new PropertyModel(fluid, CubicModel.For(kind, fluid)), new PropertyModel(bare, CubicModel.For(kind, bare)));
    }

    public static TheoryData<string, CubicModelKind, double, double> States => new()
    {
        // fluid, model, T (K), P (Pa): a liquid, a vapour and a supercritical state of each.
        { "propane", CubicModelKind.PengRobinson, 300.0, 2e6 },
        { "propane", CubicModelKind.PengRobinson, 300.0, 1e5 },
        { "propane", CubicModelKind.PengRobinson, 450.0, 6e6 },
        { "water", CubicModelKind.SoaveRedlichKwong, 400.0, 1e6 },
        { "water", CubicModelKind.SoaveRedlichKwong, 500.0, 1e5 },
        { "carbon dioxide", CubicModelKind.PengRobinson1978, 320.0, 10e6 },
    };

    [Theory]
    [MemberData(nameof(States))]
    public void AtPressure_WithoutCp_ResidualPropertiesBitForBitAsWithCp(string name, CubicModelKind kind, double t, double p)
    {
        // Exact equality: these properties come from the same residual Helmholtz derivatives at
        // the same density root, and the ideal-gas part never enters them.
        var (with, without) = Engines(name, kind);
        var a = with.AtPressure(t, p);
        var b = without.AtPressure(t, p);

        Assert.Equal(a.Density, b.Density);
        Assert.Equal(a.Phase, b.Phase);
        Assert.Equal(a.CompressibilityFactor, b.CompressibilityFactor);
        Assert.Equal(a.LnFugacityCoefficient, b.LnFugacityCoefficient);
        Assert.Equal(a.ResidualEnthalpy, b.ResidualEnthalpy);
        Assert.Equal(a.ResidualEntropy, b.ResidualEntropy);
        Assert.Equal(a.PressureTemperatureDerivative, b.PressureTemperatureDerivative);
        Assert.Equal(a.PressureDensityDerivative, b.PressureDensityDerivative);
        Assert.Equal(a.IsobaricExpansivity, b.IsobaricExpansivity);
        Assert.Equal(a.IsothermalCompressibility, b.IsothermalCompressibility);
        Assert.Equal(a.InternalPressure, b.InternalPressure);
        Assert.Equal(a.HeatCapacityDifference, b.HeatCapacityDifference);
        // cp − cv of the full state is the difference of its two heat capacities (one rounding).
        AssertClose.Relative(a.IsobaricHeatCapacity!.Value - a.IsochoricHeatCapacity!.Value, b.HeatCapacityDifference!.Value, 1e-12, "cp - cv");

        Assert.Null(a.IdealGasUnavailableReason);
        Assert.Contains("cp°", b.IdealGasUnavailableReason, StringComparison.Ordinal);
        Assert.Null(b.InternalEnergy);
        Assert.Null(b.Enthalpy);
        Assert.Null(b.Entropy);
        Assert.Null(b.HelmholtzEnergy);
        Assert.Null(b.GibbsEnergy);
        Assert.Null(b.IsochoricHeatCapacity);
        Assert.Null(b.IsobaricHeatCapacity);
        Assert.Null(b.IdealGasHeatCapacity);
        Assert.Null(b.SpeedOfSound);
        Assert.Null(b.IsentropicCompressibility);
        Assert.Null(b.JouleThomsonCoefficient);
        Assert.False(b.IdealGasExtrapolated);
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Of_EveryDerivative_ComputedWithoutCpExactlyWhenItDoesNotDependOnCvOrEntropy(string name, CubicModelKind kind, double t, double p)
    {
        // The decision is checked against its meaning. A second state with cv and s changed (as
        // another cp° would change them) must give the same value for every derivative said not to
        // need cp° (to 1e-9, rounding as below), and a different one for every derivative said to
        // need it. Some of those depend on s only weakly (measured: (dP/dG)_A of liquid water at 400 K
        // and 1 MPa moves by 2.8e-8 relative), so "different" is "by more than 1e-12 relative",
        // above the rounding of an unchanged value (at most 1.7e-13 measured here) and below the
        // weakest dependence. The value computed
        // without cp° must equal the one computed with it: both are exact expressions of the same
        // quantity, evaluated in different orders; their rounding (about 1e-15, amplified by the
        // cancellations in the Jacobian, at most by cp/cv ≈ 10 here) stays far below 1e-9.
        var (with, without) = Engines(name, kind);
        var a = with.AtPressure(t, p);
        var b = without.AtPressure(t, p);
        var other = a with { IsochoricHeatCapacity = a.IsochoricHeatCapacity * 1.7, InternalEnergy = a.InternalEnergy + 500, Enthalpy = a.Enthalpy + 500, Entropy = a.Entropy + 40 };
        int computed = 0, refused = 0;
        foreach (var x in All)
        {
            foreach (var y in All)
            {
                foreach (var z in All)
                {
                    if (y == z)
                    {
                        continue;
                    }

                    string what = $"(d{x}/d{y})_{z} of {name} at {t} K, {p} Pa";
                    bool needs = PartialDerivatives.NeedsIdealGas(b, x, y, z);
                    Assert.Equal(needs, PartialDerivatives.NeedsIdealGas(a, x, y, z));
                    double withCp = PartialDerivatives.Of(a, x, y, z);
                    double changed = PartialDerivatives.Of(other, x, y, z);
                    double scale = Math.Abs(withCp) + Math.Abs(changed);
                    if (needs)
                    {
                        refused++;
                        Assert.True(Math.Abs(withCp - changed) > 1e-12 * scale, $"{what} is refused but does not depend on cv or s: {withCp} vs {changed}");
                        var ex = Assert.Throws<InvalidInputException>(() => PartialDerivatives.Of(b, x, y, z));
                        Assert.Contains("cp°", ex.Message, StringComparison.Ordinal);
                    }
                    else
                    {
                        computed++;
                        Assert.True(Math.Abs(withCp - changed) <= 1e-9 * scale, $"{what} is computed without cp° but depends on cv or s: {withCp} vs {changed}");
                        double value = PartialDerivatives.Of(b, x, y, z);
                        Assert.True(Math.Abs(value - withCp) <= 1e-9 * (Math.Abs(withCp) + Math.Abs(value)), $"{what}: {value} without cp°, {withCp} with it");
                    }
                }
            }
        }

        output.WriteLine($"{name} at {t} K, {p} Pa: {computed} derivatives computed without cp°, {refused} refused");
        // 8·8·7 = 448 derivatives; both kinds occur (the counts are a property of the algebra, not of the state).
        Assert.Equal(448, computed + refused);
        Assert.InRange(computed, 1, 447);
    }

    [Theory]
    // (∂U/∂V)_T = T(∂P/∂T)_V − P, (∂H/∂S)_P = T, (∂H/∂P)_S = V, (∂P/∂T)_V and (∂V/∂T)_P need no cp°;
    // (∂T/∂P)_S and (∂H/∂T)_P = cp need cv, (∂G/∂T)_P = −s needs the absolute entropy.
    [InlineData(U, V, T, false)]
    [InlineData(H, S, P, false)]
    [InlineData(H, P, S, false)]
    [InlineData(P, T, V, false)]
    [InlineData(V, T, P, false)]
    [InlineData(T, P, S, true)]
    [InlineData(H, T, P, true)]
    [InlineData(G, T, P, true)]
    [InlineData(U, T, V, true)]
    public void NeedsIdealGas_KnownCases(StateVariable x, StateVariable y, StateVariable z, bool needs)
    {
        var (_, without) = Engines("propane", CubicModelKind.PengRobinson);
        var state = without.AtPressure(300, 2e6);

        Assert.Equal(needs, PartialDerivatives.NeedsIdealGas(state, x, y, z));
        if (!needs)
        {
            double value = PartialDerivatives.Of(state, x, y, z);
            double expected = (x, y, z) switch
            {
                (U, V, T) => state.InternalPressure,
                (H, S, P) => state.Temperature,
                (H, P, S) => state.MolarVolume,
                (P, T, V) => state.PressureTemperatureDerivative,
                _ => state.IsobaricExpansivity!.Value * state.MolarVolume,
            };
            // A few roundings apart (see Of_EveryDerivative_…): 1e-12 relative.
            AssertClose.Relative(expected, value, 1e-12, $"(d{x}/d{y})_{z}");
        }
    }

    [Fact]
    public void Constructor_ReferenceOtherThanBase_RefusedWithoutCp()
    {
        var fluid = FluidCatalog.Embedded.Find("propane") with { IdealGasHeatCapacity = null };

        var ex = Assert.Throws<FluidDataException>(() => new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid), ReferenceState.NormalBoilingPoint));

        Assert.Equal("ideal_gas_cp", ex.Field);
    }

    [Fact]
    public void Coexistence_FullPropertiesWithoutCp_Refused()
    {
        var (_, without) = Engines("propane", CubicModelKind.PengRobinson);

        var ex = Assert.Throws<FluidDataException>(() => without.Coexistence(without.Solver.AtTemperature(300)));

        Assert.Equal("ideal_gas_cp", ex.Field);
    }

    [Fact]
    public void AtPressure_WithoutMolarMass_SpeedOfSoundNullOthersAsWithIt()
    {
        var fluid = FluidCatalog.Embedded.Find("propane");
        var noMass = fluid with { MolarMass = null };
        var a = new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid)).AtPressure(300, 1e5);
        var b = new PropertyModel(noMass, CubicModel.For(CubicModelKind.PengRobinson, noMass)).AtPressure(300, 1e5);

        Assert.NotNull(a.SpeedOfSound);
        Assert.Null(b.SpeedOfSound);
        Assert.Null(b.MolarMass);
        Assert.Equal(a.Enthalpy, b.Enthalpy);
        Assert.Equal(a.IsobaricHeatCapacity, b.IsobaricHeatCapacity);
    }
}
