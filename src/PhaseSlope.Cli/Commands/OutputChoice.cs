using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary>The output named by --format and --units.</summary>
/// <param name="Format">Table, CSV or JSON.</param>
/// <param name="Units">Display units of tables (CSV and JSON are always SI).</param>
internal sealed record OutputChoice(OutputFormat Format, UnitSystem Units);
