using BenchmarkDotNet.Running;

namespace PhaseSlope.Benchmarks;

/// <summary>Entry point: `dotnet run -c Release --project tests/PhaseSlope.Benchmarks -- --filter '*'`
/// runs every benchmark, `-- counts` prints model evaluations per operation; see
/// docs/performance.md for the results and how to read them.</summary>
public static class Program
{
    /// <summary>Runs the benchmarks chosen on the command line.</summary>
    public static void Main(string[] args)
    {
        if (args is ["counts"])
        {
            Counts.Print(Console.Out);
            return;
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
