namespace PhaseSlope.Cli.Units;

/// <summary>The user gave the command line something it cannot accept (a malformed number,
/// an unknown unit, an out-of-range value).</summary>
/// <remarks>The message is a single line that names the option and the offending text, so it
/// can be printed to standard error as it is.</remarks>
internal sealed class UsageException : Exception
{
    /// <summary>Creates the exception with a one-line message.</summary>
    public UsageException(string message) : base(message) { }

    /// <summary>Creates the exception with a one-line message and its cause.</summary>
    public UsageException(string message, Exception inner) : base(message, inner) { }
}
