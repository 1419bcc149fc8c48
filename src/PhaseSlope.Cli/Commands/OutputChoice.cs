using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary>The output named by --format and --units.</summary>
/// <param name="Format">Table, CSV or JSON.</param>
/// <param name="Units">Display units of tables (and of CSV where the command converts it; JSON is always SI).</param>
internal sealed record OutputChoice(OutputFormat Format, UnitSystem Units)
{
    /// <summary>Refuses per-kilogram units for a fluid that gives no molar mass.</summary>
    /// <exception cref="Core.Errors.FluidDataException">--units engineering and no molar mass.</exception>
    public void RequireMolarMassFor(Core.Fluids.Fluid fluid)
    {
        if (Format != OutputFormat.Json && Units == UnitSystem.Engineering)
        {
            fluid.RequireMolarMass("--units engineering (per-kilogram units)");
        }
    }

    /// <summary>Refuses per-kilogram units for a mixture with a component that gives no molar mass
    /// (each phase's molar mass Σ x_i M_i needs every component's).</summary>
    /// <exception cref="Core.Errors.FluidDataException">--units engineering and a component without a molar mass.</exception>
    public void RequireMolarMassFor(Core.Mixtures.Mixture mixture)
    {
        if (Format != OutputFormat.Json && Units == UnitSystem.Engineering)
        {
            foreach (var component in mixture.Components)
            {
                component.RequireMolarMass("--units engineering (per-kilogram units of each phase)");
            }
        }
    }
}
