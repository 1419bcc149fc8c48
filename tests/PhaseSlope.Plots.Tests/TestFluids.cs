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

    /// <summary>n vapour pressures of the fluid's own model between 0.55 and 0.9 Tc, each moved by
    /// a fixed ±0.3 % pattern and carrying a 0.3 % standard uncertainty (no randomness: the same
    /// figure every run).</summary>
    public static IReadOnlyList<Core.Correlations.VapourPressurePoint> ModelVapourPressures(PlotFluid fluid, int n)
    {
        var solver = new Core.Equilibrium.CoexistenceSolver(fluid.Model, Core.Equilibrium.CoexistenceSolver.LowestValidTemperature(fluid.Fluid));
        double tc = fluid.Model.CriticalTemperature;
        return [.. Enumerable.Range(0, n).Select(i =>
        {
            double t = tc * (0.55 + 0.35 * i / (n - 1));
            double p = solver.AtTemperature(t).Pressure * (1 + 0.003 * (i % 3 - 1));
            return new Core.Correlations.VapourPressurePoint(t, p, 0.003 * p);
        })];
    }
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
