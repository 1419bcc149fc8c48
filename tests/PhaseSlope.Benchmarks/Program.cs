using System.Globalization;
using BenchmarkDotNet.Running;

namespace PhaseSlope.Benchmarks;

/// <summary>Entry point: `dotnet run -c Release --project tests/PhaseSlope.Benchmarks -- --filter '*'`
/// runs every benchmark; see docs/performance.md for the results and how to read them.
/// `-- counts` instead prints model evaluations per operation (machine-independent), and
/// `-- --write-fit-csv PATH N` writes N generated water vapour pressures as a data file
/// (see <see cref="GeneratedSaturationData"/>), for timing `phaseslope fit` as a process.</summary>
public static class Program
{
    /// <summary>Runs the benchmarks chosen on the command line, prints the counts, or writes the data file.</summary>
    public static void Main(string[] args)
    {
        if (args is ["envelope-counts"])
        {
            Counts.PrintEnvelopes(Console.Out);
            return;
        }

        if (args is ["counts"])
        {
            Counts.Print(Console.Out);
            Console.Out.WriteLine();
            Counts.PrintFlashes(Console.Out);
            Console.Out.WriteLine();
            Counts.PrintEnvelopes(Console.Out);
            return;
        }

        if (args is ["--write-fit-csv", string path, string count])
        {
            GeneratedSaturationData.WriteCsv(path, int.Parse(count, CultureInfo.InvariantCulture));
            return;
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
