namespace PhaseSlope.Cli;

/// <summary>The output file could not be written.</summary>
internal sealed class OutputFileException(string message, Exception inner) : Exception(message, inner);
