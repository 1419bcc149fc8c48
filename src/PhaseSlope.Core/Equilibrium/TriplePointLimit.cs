using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Equilibrium;

/// <summary>The sourced triple point of the fluid a <see cref="CoexistenceSolver"/> was built for:
/// the lower end of liquid–vapour coexistence in temperature and, where the fluid gives it, in
/// pressure. Below either the condensed phase is the solid, and the solver refuses with the reason.</summary>
/// <param name="FluidName">The fluid's name, for messages.</param>
/// <param name="Temperature">The sourced triple-point temperature, K.</param>
/// <param name="Pressure">The sourced triple-point pressure, Pa, or null when the fluid gives none.</param>
/// <param name="PressureSource">The source of <paramref name="Pressure"/>, or null.</param>
public sealed record TriplePointLimit(string FluidName, double Temperature, double? Pressure, string? PressureSource)
{
    /// <summary>The fluid's triple point, or null when it gives no triple-point temperature.</summary>
    public static TriplePointLimit? Of(Fluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        return fluid.TriplePointTemperature is { } t
            ? new TriplePointLimit(fluid.Name, t.Value, fluid.TriplePointPressure?.Value, fluid.TriplePointPressure?.Source)
            : null;
    }

    /// <summary>"the triple-point pressure 611.657 Pa of water (source)", for messages; null without a pressure.</summary>
    public string? PressureText => Pressure is double p
        ? $"the triple-point pressure {Preconditions.Format(p)} Pa of {FluidName} ({PressureSource})"
        : null;
}
