using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Plots;

/// <summary>One fluid on a chart: the fluid and the cubic model whose solver supplies the data.</summary>
public sealed record PlotFluid(Fluid Fluid, CubicModel Model)
{
    /// <summary>The fluid's name, as shown in legends.</summary>
    public string Name => Fluid.Name;

    /// <summary>The alpha form the model was built with (so that it can be rebuilt with another Tc
    /// and Pc for the uncertainty band of a latent-heat diagram).</summary>
    public AlphaForm Alpha { get; init; } = AlphaForm.Default;

    /// <summary>The same model with Tc and Pc replaced (volume shift dropped: it changes no ΔZ).</summary>
    public CubicModel WithCriticalPoint(double criticalTemperature, double criticalPressure)
        => CubicModel.For(Model.Kind, Fluid with
        {
            CriticalTemperature = Fluid.CriticalTemperature with { Value = criticalTemperature },
            CriticalPressure = Fluid.CriticalPressure with { Value = criticalPressure },
        }, Alpha);

    /// <summary>A coexistence solver of the model from the fluid's lowest valid temperature.</summary>
    public CoexistenceSolver Solver() => new(Model, CoexistenceSolver.LowestValidTemperature(Fluid));
}
