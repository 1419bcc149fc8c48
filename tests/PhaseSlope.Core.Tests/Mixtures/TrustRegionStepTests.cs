using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The restricted Newton step against the optimality conditions of the trust-region
/// subproblem (Nocedal &amp; Wright, Numerical Optimization, 2nd ed. (2006), Theorem 4.1): s is the
/// global minimiser of g·s + ½ sᵀHs over |s| ≤ Δ if and only if (H + μI)s = −g for some μ ≥ 0 with
/// μ(Δ − |s|) = 0 and H + μI positive semi-definite.</summary>
public sealed class TrustRegionStepTests
{
    public static TheoryData<double[], double[], double> Cases => new()
    {
        // Positive definite, Newton step (0.1, 0.05) inside the radius: μ = 0.
        { [2, 0, 0, 4], [-0.2, -0.2], 1 },
        // Positive definite, Newton step longer than the radius: on the boundary.
        { [2, 0.5, 0.5, 1], [-3, 1], 0.5 },
        // Indefinite (eigenvalues 1 and −1): on the boundary, along the negative curvature.
        { [1, 0, 0, -1], [0.3, 0.2], 0.7 },
        // Indefinite 3 × 3 with coupling (a saddle like the stability test's near the envelope).
        { [1, 0.4, 0, 0.4, -0.2, 0.1, 0, 0.1, 0.5], [1e-3, -2e-3, 5e-4], 0.25 },
        // Hard case: no gradient component along the negative-curvature direction (0, 1).
        { [1, 0, 0, -2], [0.5, 0], 2 },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Solve_MeetsTheOptimalityConditions(double[] entries, double[] g, double radius)
    {
        int n = g.Length;
        var h = Matrix<double>.Build.Dense(n, n, (i, j) => entries[i * n + j]);
        var step = new double[n];
        double predicted = TrustRegionStep.Solve(h, g, radius, step);
        var s = Vector<double>.Build.DenseOfArray(step);
        double length = s.L2Norm();
        // Inside the region to rounding (the bisection stops at 1e-14 relative in μ).
        Assert.True(length <= radius * (1 + 1e-9), $"|s| = {length} > Δ = {radius}");

        // μ from the stationarity condition, by least squares over the components.
        var residual = h * s + Vector<double>.Build.DenseOfArray(g);
        double mu = length > 0 ? -residual.DotProduct(s) / (length * length) : 0;
        Assert.True(mu >= -1e-9, $"μ = {mu} must not be negative");
        // (H + μI)s = −g to 1e-8 of |g| (bisection on μ to 1e-14 relative; the hard case is exact).
        double gNorm = Vector<double>.Build.DenseOfArray(g).L2Norm();
        Assert.True((residual + mu * s).L2Norm() <= 1e-8 * gNorm + 1e-300, $"stationarity residual {(residual + mu * s).L2Norm()}");
        // Complementarity: a shift only with the step on the boundary (1e-8 relative, as above).
        Assert.True(mu * Math.Abs(radius - length) <= 1e-8 * (1 + mu) * radius, $"μ = {mu} with |s| = {length}, Δ = {radius}");
        // H + μI positive semi-definite: its lowest eigenvalue not below −1e-9 (rounding of μ).
        double lowest = (h + mu * Matrix<double>.Build.DenseIdentity(n)).Evd().EigenValues.Min(e => e.Real);
        Assert.True(lowest >= -1e-9, $"lowest eigenvalue of H + μI {lowest}");

        // The change returned is the model's at s, and it is a decrease.
        double model = s.DotProduct(Vector<double>.Build.DenseOfArray(g)) + 0.5 * s.DotProduct(h * s);
        AssertClose.Absolute(model, predicted, 1e-12, "predicted change of the quadratic model");
        Assert.True(predicted <= 0, $"predicted change {predicted}");
    }
}
