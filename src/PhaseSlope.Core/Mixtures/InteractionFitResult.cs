namespace PhaseSlope.Core.Mixtures;

/// <summary>A binary interaction parameter fitted to VLE data.</summary>
/// <param name="Kij">The fitted k_12.</param>
/// <param name="StandardError">Its standard error, from the Jacobian of the weighted residuals
/// (see <see cref="InteractionFit"/>).</param>
/// <param name="Points">Each data point with the model's values at <paramref name="Kij"/>.</param>
/// <param name="PressureDeviation">Average absolute relative deviation of the bubble pressure
/// (a fraction: 0.01 is 1 %).</param>
/// <param name="VapourDeviation">Average absolute deviation of y_1 over the points that have it, or null when none has.</param>
/// <param name="WeightedSumOfSquares">The minimized Σ r² (weighted residuals).</param>
/// <param name="Residuals">The number of residuals (one per point, plus one per measured y_1).</param>
/// <param name="ObjectiveEvaluations">Objective evaluations of the search (each one bubble point per data point).</param>
/// <param name="ModelEvaluations">Fugacity evaluations of the mixture model in all bubble points.</param>
public sealed record InteractionFitResult(double Kij, double StandardError, IReadOnlyList<InteractionFitPoint> Points,
    double PressureDeviation, double? VapourDeviation, double WeightedSumOfSquares, int Residuals, int ObjectiveEvaluations, int ModelEvaluations);
