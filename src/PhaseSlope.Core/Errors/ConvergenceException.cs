namespace PhaseSlope.Core.Errors;

/// <summary>An iterative routine stopped without meeting its tolerance.</summary>
public sealed class ConvergenceException : PhaseSlopeException
{
    /// <summary>Creates the exception with the last iterate and residual.</summary>
    public ConvergenceException(string message, int iterations, double lastResidual)
        : base(message)
    {
        Iterations = iterations;
        LastResidual = lastResidual;
    }

    /// <summary>Iterations performed before stopping.</summary>
    public int Iterations { get; }

    /// <summary>The residual at the last iterate.</summary>
    public double LastResidual { get; }
}
