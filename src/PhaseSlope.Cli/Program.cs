namespace PhaseSlope.Cli;

/// <summary>Entry point of the phaseslope command-line tool.</summary>
public static class Program
{
    /// <summary>Runs the tool and returns its exit code (see the README's exit-code table).</summary>
    public static int Main(string[] args) => CliApp.Run(args, Console.Out, Console.Error);
}
