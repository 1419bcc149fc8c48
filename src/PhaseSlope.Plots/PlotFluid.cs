using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Plots;

/// <summary>One fluid on a chart: the fluid and the cubic model whose solver supplies the data.</summary>
public sealed record PlotFluid(Fluid Fluid, CubicModel Model)
{
    /// <summary>The fluid's name, as shown in legends.</summary>
    public string Name => Fluid.Name;

    /// <summary>A coexistence solver of the model from the fluid's lowest valid temperature.</summary>
    public CoexistenceSolver Solver() => new(Model, CoexistenceSolver.LowestValidTemperature(Fluid));
}
