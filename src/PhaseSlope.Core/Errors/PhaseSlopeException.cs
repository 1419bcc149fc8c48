namespace PhaseSlope.Core.Errors;

/// <summary>Base of the small exception family thrown by the PhaseSlope core.</summary>
/// <remarks>Every message is a single line that names what is wrong, so the command-line
/// tool can print it as it is.</remarks>
public abstract class PhaseSlopeException : Exception
{
    /// <summary>Creates the exception with a one-line message.</summary>
    protected PhaseSlopeException(string message) : base(message) { }

    /// <summary>Creates the exception with a one-line message and its cause.</summary>
    protected PhaseSlopeException(string message, Exception inner) : base(message, inner) { }
}
