using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>The hook for uncertain alpha-function parameters with a covariance, such as a tuned
/// fluid's fitted Twu or Mathias–Copeman constants: their values, their covariance, how to build
/// α from them and the exact derivatives of α and dα/dT with respect to each.</summary>
/// <param name="Parameters">The parameters, with their standard uncertainties (the square roots
/// of the covariance diagonal) and sources.</param>
/// <param name="Covariance">Their covariance matrix (symmetric, positive semi-definite), in the
/// order of <paramref name="Parameters"/>; cross-covariances with Tc, Pc and ω are taken as zero.</param>
/// <param name="Alpha">Builds α(T) from Tc (K) and the parameter values (for Monte Carlo samples).
/// α must be a function of T/Tc only, as every published form here is: the Tc sensitivity
/// uses that.</param>
/// <param name="Sensitivity">∂α/∂p_k and ∂(dα/dT)/∂p_k at T for the α built from the nominal
/// values (for linear propagation).</param>
public sealed record AlphaParameterUncertainty(
    IReadOnlyList<UncertainInput> Parameters,
    Matrix<double> Covariance,
    Func<double, IReadOnlyList<double>, IAlphaFunction> Alpha,
    Func<double, int, (double Value, double TemperatureDerivative)> Sensitivity)
{
    /// <summary>∂p_k/∂Tc (column 0) and ∂p_k/∂Pc (column 1) of a tuning, or null: the parameters
    /// then covary with Tc and Pc (see <see cref="Fluids.AlphaParameterSet.CriticalSensitivity"/>).</summary>
    public Matrix<double>? CriticalSensitivity { get; init; }

    /// <summary>∂(d²α/dT²)/∂p_k at T for the nominal α (for the exact uncertainty of cv and cp), or
    /// null: those uncertainties are then not propagated linearly.</summary>
    public Func<double, int, double>? CurvatureSensitivity { get; init; }
}
