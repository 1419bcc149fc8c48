using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Core.Tests.Uncertainty;

/// <summary>The hook for tuned alpha parameters with a covariance, exercised with a
/// Mathias–Copeman α whose c1, c2, c3 carry a full (correlated) covariance.</summary>
public class AlphaParameterHookTests
{
    // c1, c2, c3 for propane with Peng–Robinson: invented for this test near the Soave slope
    // (c1 ≈ m(ω) = 0.6, small c2, c3), with a correlated covariance as a fit would give.
    private static readonly double[] C = [0.60, 0.05, -0.10];

    private static readonly Matrix<double> Covariance = Matrix<double>.Build.DenseOfArray(new[,]
    {
        { 1.0e-4, -0.5e-4, 0.2e-4 },
        { -0.5e-4, 4.0e-4, -1.0e-4 },
        { 0.2e-4, -1.0e-4, 9.0e-4 },
    });

    private static CubicParameterization Parameters()
    {
        var alpha = new MathiasCopemanAlpha(C[0], C[1], C[2], 369.89, "invented for a test");
        var hook = new AlphaParameterUncertainty(
            [new UncertainInput("c1", C[0], 0.01, "invented"), new UncertainInput("c2", C[1], 0.02, "invented"), new UncertainInput("c3", C[2], 0.03, "invented")],
            Covariance,
            (tc, c) => new MathiasCopemanAlpha(c[0], c[1], c[2], tc, "sample"),
            (t, k) => Sensitivity(alpha, t, k));
        return new CubicParameterization(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson, alphaParameters: hook);
    }

    /// <summary>α = g², g = 1 + c1x + c2x² + c3x³, x = 1 − √(T/Tc); ∂α/∂c_k = 2g·x^k and
    /// ∂α′/∂c_k = 2(x^k·g′ + g·k·x^(k−1))·dx/dT with g′ = dg/dx, dx/dT = −1/(2√(T·Tc)).</summary>
    private static (double, double) Sensitivity(MathiasCopemanAlpha alpha, double t, int k)
    {
        const double tc = 369.89;
        double x = 1 - Math.Sqrt(t / tc);
        double g = 1 + x * (alpha.C1 + x * (alpha.C2 + x * alpha.C3));
        double gx = alpha.C1 + x * (2 * alpha.C2 + 3 * alpha.C3 * x);
        double dxdt = -1 / (2 * Math.Sqrt(t * tc));
        int power = k + 1;
        double xk = Math.Pow(x, power);
        return (2 * g * xk, 2 * (xk * gx + g * power * Math.Pow(x, power - 1)) * dxdt);
    }

    [Fact]
    public void Sensitivities_ToAlphaParameters_MatchCentralDifferences()
    {
        var parameters = Parameters();
        Assert.Equal(6, parameters.Inputs.Count);
        var nominal = new CoexistenceSolver(parameters.Nominal, parameters.MinimumTemperature).AtTemperature(280);
        var s = LinearPropagation.Sensitivities(nominal, parameters, atFixedPressure: false);
        var values = parameters.Inputs.Select(i => i.Value).ToArray();
        for (int k = 3; k < 6; k++)
        {
            // Step 1e-4 in c_k (absolute): truncation about 1e-8 relative; 1e-6 leaves a margin.
            const double h = 1e-4;
            var up = Solve(parameters, values, k, h);
            var down = Solve(parameters, values, k, -h);
            AssertClose.Absolute((up.Pressure - down.Pressure) / (2 * h) / nominal.Pressure, s.Pressure[k] / nominal.Pressure, 1e-6, $"dlnP/dc{k - 2}");
            AssertClose.Absolute((up.EnthalpyOfVaporization - down.EnthalpyOfVaporization) / (2 * h) / nominal.EnthalpyOfVaporization,
                s.EnthalpyOfVaporization[k] / nominal.EnthalpyOfVaporization, 1e-6, $"dln dH/dc{k - 2}");
            AssertClose.Absolute((up.Liquid.Density - down.Liquid.Density) / (2 * h) / nominal.Liquid.Density,
                s.LiquidDensity[k] / nominal.Liquid.Density, 1e-6, $"dln rhoL/dc{k - 2}");
        }
    }

    private static CoexistencePoint Solve(CubicParameterization parameters, double[] values, int k, double step)
    {
        var moved = (double[])values.Clone();
        moved[k] += step;
        return new CoexistenceSolver(parameters.Build(moved), parameters.MinimumTemperature).AtTemperature(280);
    }

    [Fact]
    public void Covariance_EntersLinearAndMonteCarloAlike()
    {
        var parameters = Parameters();
        var point = new CoexistenceSolver(parameters.Nominal, parameters.MinimumTemperature).AtTemperature(280);
        var linear = LinearPropagation.Propagate(point, parameters, atFixedPressure: false);
        const int N = 20000;
        var mc = MonteCarloPropagation.AtTemperatures(parameters, [280], N, seed: 21)[0];

        // The covariance block is used as given (off-diagonal terms included): the two methods
        // agree within 4 relative standard errors of a standard deviation, 4/sqrt(2N) = 2 %,
        // plus the second-order terms of the family-default Tc, Pc, omega (about 1 %, measured
        // agreement of linear and Monte Carlo for propane at 280 K without the hook): 3 %.
        AssertClose.Relative(linear.Pressure!.Value, mc.Pressure!.Value, 0.03, "u(P)");
        AssertClose.Relative(linear.LiquidDensity!.Value, mc.LiquidDensity!.Value, 0.03, "u(rhoL)");
        Assert.Equal(Covariance[1, 2], parameters.Covariance[4, 5]);
    }
}
