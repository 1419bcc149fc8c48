namespace PhaseSlope.Cli.Input;

/// <summary>An input file passed a limit of <see cref="BoundedInput"/>; an <see cref="IOException"/>
/// so that every reader reports it as a file it cannot read, naming the file.</summary>
internal sealed class InputLimitException(string message) : IOException(message);
