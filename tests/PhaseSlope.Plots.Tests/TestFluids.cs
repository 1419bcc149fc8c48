using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Plots.Tests;

/// <summary>Catalog fluids with the default Peng–Robinson model.</summary>
internal static class TestFluids
{
    public static PlotFluid Get(string name, CubicModelKind kind = CubicModelKind.PengRobinson)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        return new PlotFluid(fluid, CubicModel.For(kind, fluid));
    }

    public static PlotFluid Propane => Get("propane");
}

/// <summary>A fresh folder under the system temp folder, deleted on dispose.</summary>
internal sealed class TempFolder : IDisposable
{
    public string Path { get; } = Directory.CreateTempSubdirectory("phaseslope-plottests-").FullName;

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public string[] Entries() => [.. Directory.EnumerateFileSystemEntries(Path).Select(System.IO.Path.GetFileName).Order(StringComparer.Ordinal)!];

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // Best effort: a leftover temp folder is harmless.
        }
    }
}
