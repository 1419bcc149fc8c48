namespace PhaseSlope.Cli;

/// <summary>Entry point of the phaseslope command-line tool.</summary>
public static class Program
{
    /// <summary>Runs the tool and returns its exit code.</summary>
    public static int Main(string[] args) => args.Length == 0 ? 0 : 0;
}
