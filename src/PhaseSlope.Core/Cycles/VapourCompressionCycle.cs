using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Cycles;

/// <summary>The states and the performance of a simple vapour-compression cycle: compressor
/// 1 → 2, condenser 2 → 3, expansion valve 3 → 4, evaporator 4 → 1.</summary>
/// <remarks>
/// <para>State 1, evaporator outlet: P_evap = Psat(T_evap), T = T_evap + superheat (the saturated
/// vapour for no superheat). 2s: P_cond = Psat(T_cond), s = s1. 2: h2 = h1 + (h2s − h1)/η at
/// P_cond. 3, condenser outlet: P_cond, T = T_cond − subcooling (the saturated liquid for no
/// subcooling). 4: the throttle, h4 = h3 at P_evap, inside the dome with its quality. Pressure
/// drops in the heat exchangers and lines, heat losses and the oil are left out, as in the
/// textbook form of the cycle.</para>
/// <para>Refrigerating effect q_L = h1 − h4, compressor work w = h2 − h1, heat rejected
/// q_H = h2 − h3, COP = q_L / w (refrigeration) and q_H / w (heat pump). Differences of h do not
/// depend on the reference convention; the states' h and s are on the property model's.</para>
/// </remarks>
public sealed record VapourCompressionCycle
{
    /// <summary>What was asked for.</summary>
    public required VapourCompressionSpecification Specification { get; init; }

    /// <summary>Evaporator-outlet state (compressor suction).</summary>
    public required FluidState Suction { get; init; }

    /// <summary>Compressor discharge after isentropic compression (state 2s).</summary>
    public required FluidState IsentropicDischarge { get; init; }

    /// <summary>Compressor discharge (state 2).</summary>
    public required FluidState Discharge { get; init; }

    /// <summary>Condenser outlet (state 3).</summary>
    public required FluidState CondenserOutlet { get; init; }

    /// <summary>Evaporator inlet after the throttle (state 4), two-phase.</summary>
    public required FluidState EvaporatorInlet { get; init; }

    /// <summary>Saturation pressure at the evaporating temperature, Pa.</summary>
    public double EvaporatingPressure => Suction.Pressure;

    /// <summary>Saturation pressure at the condensing temperature, Pa.</summary>
    public double CondensingPressure => Discharge.Pressure;

    /// <summary>q_L = h1 − h4, J/mol.</summary>
    public double RefrigeratingEffect => Suction.Enthalpy!.Value - EvaporatorInlet.Enthalpy!.Value;

    /// <summary>w = h2 − h1, J/mol.</summary>
    public double CompressorWork => Discharge.Enthalpy!.Value - Suction.Enthalpy!.Value;

    /// <summary>q_H = h2 − h3, J/mol.</summary>
    public double HeatRejected => Discharge.Enthalpy!.Value - CondenserOutlet.Enthalpy!.Value;

    /// <summary>Coefficient of performance as a refrigerator, q_L / w.</summary>
    public double CoefficientOfPerformance => RefrigeratingEffect / CompressorWork;

    /// <summary>Coefficient of performance as a heat pump, q_H / w.</summary>
    public double HeatingCoefficientOfPerformance => HeatRejected / CompressorWork;

    /// <summary>The states in cycle order with their labels: 1, 2s, 2, 3, 4.</summary>
    public IReadOnlyList<(string Label, FluidState State)> States
        => [("1", Suction), ("2s", IsentropicDischarge), ("2", Discharge), ("3", CondenserOutlet), ("4", EvaporatorInlet)];

    /// <summary>Computes the cycle with <paramref name="properties"/> (its model and reference).</summary>
    /// <exception cref="InvalidInputException">The specification is invalid
    /// (<see cref="VapourCompressionSpecification.Validate"/>); the condensing temperature is at or
    /// above the model's critical temperature; the evaporating or condenser-outlet temperature is
    /// below the lowest valid temperature; the throttled liquid falls outside the dome; the
    /// discharge lies beyond the temperatures the flash searches
    /// (<see cref="PropertyModel.FlashMaximumTemperature"/>).</exception>
    /// <exception cref="FluidDataException">The fluid has no ideal-gas heat capacity.</exception>
    public static VapourCompressionCycle Compute(PropertyModel properties, VapourCompressionSpecification specification)
    {
        ArgumentNullException.ThrowIfNull(properties);
        ArgumentNullException.ThrowIfNull(specification);
        specification.Validate();
        properties.RequireIdealGas("a vapour-compression cycle");
        var solver = properties.Solver;
        double tc = solver.CriticalTemperature;
        double tMin = solver.MinimumTemperature;
        var spec = specification;
        if (spec.CondensingTemperature >= tc)
        {
            var (t, c) = Preconditions.Apart(spec.CondensingTemperature, tc);
            throw new InvalidInputException("condensing temperature", spec.CondensingTemperature,
                $"the condensing temperature {t} K is at or above the critical temperature {c} K of {properties.Fluid.Name}: the cycle needs a condenser (a transcritical cycle is not drawn)");
        }

        double tOutlet = spec.CondensingTemperature - spec.Subcooling;
        foreach (var (value, what) in new[] { (spec.EvaporatingTemperature, "evaporating temperature"), (tOutlet, "condenser-outlet temperature (condensing minus subcooling)") })
        {
            if (value < tMin)
            {
                var (t, m) = Preconditions.Apart(value, tMin);
                throw new InvalidInputException(what, value, solver.TriplePoint is null
                    ? $"the {what} {t} K is below the lowest valid temperature {m} K of {properties.Fluid.Name}"
                    : $"the {what} {t} K is below the triple point {m} K of {properties.Fluid.Name}: no liquid exists there, the condensed phase is the solid");
            }
        }

        // Every state is a flash of the property model (PropertyModel.Flash): the saturated ends by
        // (T, x), the superheated suction and the subcooled outlet by (T, P), the discharges by
        // (P, s) and (P, h), the throttled state by (P, h).
        var suction = spec.Superheat == 0
            ? properties.Flash(StateProperty.Temperature, spec.EvaporatingTemperature, StateProperty.Quality, 1)
            : properties.Flash(StateProperty.Temperature, spec.EvaporatingTemperature + spec.Superheat, StateProperty.Pressure,
                properties.Solver.AtTemperature(spec.EvaporatingTemperature).Pressure);
        double pEvap = suction.Pressure;
        var saturatedLiquid = properties.Flash(StateProperty.Temperature, spec.CondensingTemperature, StateProperty.Quality, 0);
        double pCond = saturatedLiquid.Pressure;
        var outlet = spec.Subcooling == 0
            ? saturatedLiquid
            : properties.Describe(properties.AtPressure(tOutlet, pCond, PhaseChoice.Liquid));

        var isentropic = properties.Flash(StateProperty.Pressure, pCond, StateProperty.Entropy, suction.Entropy!.Value);
        double h1 = suction.Enthalpy!.Value;
        double h2 = h1 + (isentropic.Enthalpy!.Value - h1) / spec.IsentropicEfficiency;
        var discharge = spec.IsentropicEfficiency < 1 ? properties.Flash(StateProperty.Pressure, pCond, StateProperty.Enthalpy, h2) : isentropic;

        // The throttle: h4 = h3, at the evaporating pressure; it must land inside the dome.
        var inlet = properties.Flash(StateProperty.Pressure, pEvap, StateProperty.Enthalpy, outlet.Enthalpy!.Value);
        if (inlet.Region != FluidRegion.TwoPhase)
        {
            throw new InvalidInputException("subcooling", spec.Subcooling,
                $"the throttled liquid (h = {Preconditions.Format(outlet.Enthalpy!.Value)} J/mol) is not a two-phase state at the evaporating pressure {Preconditions.Format(pEvap)} Pa but {inlet.Region.Id()}: reduce the subcooling");
        }

        return new VapourCompressionCycle
        {
            Specification = spec,
            Suction = suction,
            IsentropicDischarge = isentropic,
            Discharge = discharge,
            CondenserOutlet = outlet,
            EvaporatorInlet = inlet,
        };
    }
}
