using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary>The solver and, when the fluid has an ideal-gas heat capacity, the property engine
/// behind <c>coexist</c> and <c>curve</c>.</summary>
internal sealed class CoexistenceContext
{
    private CoexistenceContext(CoexistenceSolver solver, PropertyModel? engine, ReferenceState reference)
    {
        Solver = solver;
        Engine = engine;
        Reference = reference;
    }

    /// <summary>The coexistence solver.</summary>
    public CoexistenceSolver Solver { get; }

    /// <summary>The property engine, or null when the fluid has no ideal-gas heat capacity.</summary>
    public PropertyModel? Engine { get; }

    /// <summary>The reference convention of absolute h and s.</summary>
    public ReferenceState Reference { get; }

    /// <summary>Builds the context for a fluid, model and reference.</summary>
    public static CoexistenceContext Create(Fluid fluid, IResidualModel model, ReferenceState reference)
    {
        if (fluid.IdealGasHeatCapacity is null)
        {
            if (reference.Id != ReferenceState.IdealGas.Id)
            {
                // A reference sets the zero of h and s, which this fluid cannot give: refused (exit 3,
                // naming cp°) by the property engine's own check rather than silently ignored.
                _ = new PropertyModel(fluid, model, reference);
            }

            return new CoexistenceContext(new CoexistenceSolver(model, fluid), null, reference);
        }

        var engine = new PropertyModel(fluid, model, reference);
        return new CoexistenceContext(engine.Solver, engine, reference);
    }

    /// <summary>A row for a point, with full phase properties when available.</summary>
    public CoexistenceRow Row(CoexistencePoint point) => new(point, Engine?.Coexistence(point));
}
