namespace PhaseSlope.Cli.Output;

/// <summary>How a command prints its result.</summary>
internal enum OutputFormat
{
    /// <summary>Aligned columns with units in the headers, for people.</summary>
    Table,

    /// <summary>Comma-separated values with a header row, SI units, round-trip numbers.</summary>
    Csv,

    /// <summary>JSON with SI-unit keys and round-trip numbers, for scripts.</summary>
    Json,
}
