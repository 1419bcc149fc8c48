namespace PhaseSlope.Core.Fluids;

/// <summary>A fluid file a catalog can index and parse: its origin (file path or resource name)
/// and a function that opens it afresh each time it is called.</summary>
/// <param name="Origin">File path or resource name.</param>
/// <param name="Open">Opens the file; the caller disposes the stream.</param>
internal sealed record FluidFileSource(string Origin, Func<Stream> Open);
