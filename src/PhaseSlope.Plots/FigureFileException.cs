namespace PhaseSlope.Plots;

/// <summary>A figure file could not be written; the target was left untouched and no
/// temporary file remains.</summary>
public sealed class FigureFileException(string message, Exception? inner = null) : Exception(message, inner);
