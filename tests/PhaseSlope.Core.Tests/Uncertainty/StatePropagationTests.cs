using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Core.Tests.Uncertainty;

public class StatePropagationTests
{
    private static StateValues Evaluate(CubicModel model, double t, double? pressure, double? density, bool liquid)
    {
        double rho;
        if (pressure is double p)
        {
            Span<double> roots = stackalloc double[3];
            int n = model.DensityRoots(t, p, Composition.Pure, roots);
            rho = liquid ? roots[..n].ToArray().Max() : roots[..n].ToArray().Min();
        }
        else
        {
            rho = density!.Value;
        }

        var state = PhaseState.Evaluate(model, t, rho);
        // κT = 1/(ρ·(∂P/∂ρ)_T) and α = (∂P/∂T)_ρ/(ρ·(∂P/∂ρ)_T) of the (translated) model; the
        // residual cv_r = −T·A_TT and cp_r = cv_r + T·P_T²/(ρ²·P_ρ) − R (the ideal-gas cp° is exact
        // in the propagation, so its sensitivities are those of the residual parts).
        double kappa = 1 / (rho * state.PressureDensityDerivative);
        double cv = -t * state.Helmholtz.DTT;
        double cp = cv + t * state.PressureTemperatureDerivative * state.PressureTemperatureDerivative / (rho * rho * state.PressureDensityDerivative);
        return new StateValues(rho, pressure ?? state.Pressure, state.CompressibilityFactor, state.ResidualEnthalpy, state.ResidualEntropy,
            IsobaricHeatCapacity: cp, IsochoricHeatCapacity: cv,
            IsothermalCompressibility: kappa, IsobaricExpansivity: state.PressureTemperatureDerivative * kappa);
    }

    [Theory]
    // Propane (PR): compressed liquid at 300 K, 3 MPa (Psat about 1 MPa); vapour at 0.5 MPa; a
    // given liquid density; the same with the Péneloux shift following Tc, Pc, ω.
    [InlineData(VolumeShiftRule.Fixed, 300.0, 3e6, null, true)]
    [InlineData(VolumeShiftRule.Fixed, 300.0, 5e5, null, false)]
    [InlineData(VolumeShiftRule.Fixed, 300.0, null, 12500.0, true)]
    [InlineData(VolumeShiftRule.Peneloux, 300.0, 3e6, null, true)]
    [InlineData(VolumeShiftRule.Peneloux, 330.0, null, 11500.0, true)]
    public void Sensitivities_MatchCentralDifferences(VolumeShiftRule rule, double t, double? pressure, double? density, bool liquid)
    {
        var parameters = new CubicParameterization(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson, AlphaForm.Default, rule);
        var nominal = Evaluate(parameters.Nominal, t, pressure, density, liquid);
        var rows = StatePropagation.Sensitivities(parameters, t, nominal.Density, density is not null);
        var values = parameters.Inputs.Select(i => i.Value).ToArray();
        for (int k = 0; k < values.Length; k++)
        {
            // Central difference, step 1e-4 of the value (1e-4 for ω): truncation about 1e-8
            // relative, and the closed-form roots are polished to rounding; 1e-6 leaves a margin.
            double h = k == 2 ? 1e-4 : 1e-4 * Math.Abs(values[k]);
            var up = Evaluate(Moved(parameters, values, k, h), t, pressure, density, liquid);
            var down = Evaluate(Moved(parameters, values, k, -h), t, pressure, density, liquid);
            double u = parameters.Inputs[k].StandardUncertainty;
            void Check(Func<StateValues, double> pick, double scale, string what)
                => AssertClose.Absolute((pick(up) - pick(down)) / (2 * h) * u / scale, pick(rows[k]) * u / scale, 1e-6,
                    $"d{what}/d{parameters.Inputs[k].Name} x u / scale ({rule}, {t} K, P {pressure}, rho {density})");
            Check(v => v.Density, nominal.Density, "rho");
            Check(v => v.Pressure, nominal.Pressure, "P");
            Check(v => v.CompressibilityFactor, Math.Max(nominal.CompressibilityFactor, 0.01), "Z");
            // h_r and s_r scaled by RT and R: their natural size.
            Check(v => v.ResidualEnthalpy, Constants.GasConstant * t, "h_r");
            Check(v => v.ResidualEntropy, Constants.GasConstant, "s_r");
            // κT and α relative to their own size.
            Check(v => v.IsothermalCompressibility!.Value, nominal.IsothermalCompressibility!.Value, "kappa_T");
            Check(v => v.IsobaricExpansivity!.Value, Math.Abs(nominal.IsobaricExpansivity!.Value), "alpha");
            // cv and cp scaled by R, their natural size.
            Check(v => v.IsochoricHeatCapacity!.Value, Constants.GasConstant, "cv");
            Check(v => v.IsobaricHeatCapacity!.Value, Constants.GasConstant, "cp");
        }
    }

    private static CubicModel Moved(CubicParameterization parameters, double[] values, int k, double step)
    {
        var moved = (double[])values.Clone();
        moved[k] += step;
        return parameters.Build(moved);
    }

    [Fact]
    public void MonteCarlo_SmallUncertainties_AgreesWithLinear()
    {
        var fluid = FluidCatalog.Embedded.Find("propane");
        fluid = fluid with
        {
            CriticalTemperature = fluid.CriticalTemperature with { StandardUncertainty = 0.03 },
            CriticalPressure = fluid.CriticalPressure with { StandardUncertainty = 2000 },
            AcentricFactor = fluid.AcentricFactor with { StandardUncertainty = 0.0005 },
        };
        var parameters = new CubicParameterization(fluid, CubicModelKind.PengRobinson);
        var nominal = Evaluate(parameters.Nominal, 300, 3e6, null, true);
        // cp and α are passed only to enable u(cp), u(cv), u(μJT); residual cp stands in for cp (cp° is exact).
        var linear = StatePropagation.Linear(parameters, 300, nominal.Density, densityGiven: false, nominal.IsobaricHeatCapacity, nominal.IsobaricExpansivity);
        const int N = 20000;
        var mc = StatePropagation.MonteCarlo(parameters, x => Evaluate(parameters.Build(x), 300, 3e6, null, true), N, seed: 5);

        // Relative standard error of a standard deviation 1/sqrt(2N) = 0.5 %; 4 of them.
        double tolerance = 4 / Math.Sqrt(2.0 * N);
        AssertClose.Relative(linear.Density!.Value, mc.Density!.Value, tolerance, "u(rho)");
        AssertClose.Relative(linear.ResidualEnthalpy!.Value, mc.ResidualEnthalpy!.Value, tolerance, "u(h_r)");
        AssertClose.Relative(linear.ResidualEntropy!.Value, mc.ResidualEntropy!.Value, tolerance, "u(s_r)");
        AssertClose.Relative(linear.IsothermalCompressibility!.Value, mc.IsothermalCompressibility!.Value, tolerance, "u(kappa_T)");
        AssertClose.Relative(linear.IsobaricExpansivity!.Value, mc.IsobaricExpansivity!.Value, tolerance, "u(alpha)");
        AssertClose.Relative(linear.IsochoricHeatCapacity!.Value, mc.IsochoricHeatCapacity!.Value, tolerance, "u(cv)");
        AssertClose.Relative(linear.IsobaricHeatCapacity!.Value, mc.IsobaricHeatCapacity!.Value, tolerance, "u(cp)");
        Assert.Equal(0, mc.Pressure);
    }
}
