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
    /// <summary>Highest temperature searched for the compressor discharge, as a multiple of Tc.</summary>
    public const double HighestReducedTemperature = 3;

    /// <summary>What was asked for.</summary>
    public required VapourCompressionSpecification Specification { get; init; }

    /// <summary>Evaporator-outlet state (compressor suction).</summary>
    public required IsobaricPoint Suction { get; init; }

    /// <summary>Compressor discharge after isentropic compression (state 2s).</summary>
    public required IsobaricPoint IsentropicDischarge { get; init; }

    /// <summary>Compressor discharge (state 2).</summary>
    public required IsobaricPoint Discharge { get; init; }

    /// <summary>Condenser outlet (state 3).</summary>
    public required IsobaricPoint CondenserOutlet { get; init; }

    /// <summary>Evaporator inlet after the throttle (state 4), two-phase.</summary>
    public required IsobaricPoint EvaporatorInlet { get; init; }

    /// <summary>Saturation pressure at the evaporating temperature, Pa.</summary>
    public double EvaporatingPressure => Suction.Pressure;

    /// <summary>Saturation pressure at the condensing temperature, Pa.</summary>
    public double CondensingPressure => Discharge.Pressure;

    /// <summary>q_L = h1 − h4, J/mol.</summary>
    public double RefrigeratingEffect => Suction.Enthalpy - EvaporatorInlet.Enthalpy;

    /// <summary>w = h2 − h1, J/mol.</summary>
    public double CompressorWork => Discharge.Enthalpy - Suction.Enthalpy;

    /// <summary>q_H = h2 − h3, J/mol.</summary>
    public double HeatRejected => Discharge.Enthalpy - CondenserOutlet.Enthalpy;

    /// <summary>Coefficient of performance as a refrigerator, q_L / w.</summary>
    public double CoefficientOfPerformance => RefrigeratingEffect / CompressorWork;

    /// <summary>Coefficient of performance as a heat pump, q_H / w.</summary>
    public double HeatingCoefficientOfPerformance => HeatRejected / CompressorWork;

    /// <summary>The states in cycle order with their labels: 1, 2s, 2, 3, 4.</summary>
    public IReadOnlyList<(string Label, IsobaricPoint State)> States
        => [("1", Suction), ("2s", IsentropicDischarge), ("2", Discharge), ("3", CondenserOutlet), ("4", EvaporatorInlet)];

    /// <summary>Computes the cycle with <paramref name="properties"/> (its model and reference).</summary>
    /// <exception cref="InvalidInputException">The specification is invalid
    /// (<see cref="VapourCompressionSpecification.Validate"/>); the condensing temperature is at or
    /// above the model's critical temperature; the evaporating or condenser-outlet temperature is
    /// below the lowest valid temperature; the throttled liquid falls outside the dome; the
    /// discharge lies above <see cref="HighestReducedTemperature"/>·Tc.</exception>
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
                throw new InvalidInputException(what, value, $"the {what} {t} K is below the lowest valid temperature {m} K of {properties.Fluid.Name}");
            }
        }

        var evaporator = properties.Coexistence(solver.AtTemperature(spec.EvaporatingTemperature));
        var condenser = properties.Coexistence(solver.AtTemperature(spec.CondensingTemperature));
        double pEvap = evaporator.Point.Pressure;
        double pCond = condenser.Point.Pressure;
        double tHigh = HighestReducedTemperature * tc;

        double t1 = spec.EvaporatingTemperature + spec.Superheat;
        var suction = spec.Superheat == 0
            ? Point(evaporator.Vapour.State, 1)
            : Point(properties.AtPressure(t1, pEvap, t1 < tc ? PhaseChoice.Vapour : PhaseChoice.Stable), null);
        var outlet = spec.Subcooling == 0
            ? Point(condenser.Liquid.State, 0)
            : Point(properties.AtPressure(tOutlet, pCond, PhaseChoice.Liquid), null);

        if (!IsobaricStates.TryAtEntropy(properties, pCond, suction.Entropy, tHigh, out var isentropic))
        {
            throw new InvalidInputException("condensing temperature", spec.CondensingTemperature,
                $"no state at the condensing pressure {Preconditions.Format(pCond)} Pa has the suction entropy below {Preconditions.Format(tHigh)} K");
        }

        double h2 = suction.Enthalpy + (isentropic.Enthalpy - suction.Enthalpy) / spec.IsentropicEfficiency;
        var discharge = isentropic;
        if (spec.IsentropicEfficiency < 1 && !IsobaricStates.TryAtEnthalpy(properties, pCond, h2, tHigh, out discharge))
        {
            throw new InvalidInputException("efficiency", spec.IsentropicEfficiency,
                $"the compressor discharge (efficiency {Preconditions.Format(spec.IsentropicEfficiency)}) would lie above {Preconditions.Format(tHigh)} K, beyond the range searched");
        }

        // The throttle: h4 = h3, at the evaporating pressure.
        double hL = evaporator.Liquid.State.Enthalpy!.Value, hV = evaporator.Vapour.State.Enthalpy!.Value;
        double x4 = (outlet.Enthalpy - hL) / (hV - hL);
        if (!(x4 >= 0 && x4 < 1))
        {
            throw new InvalidInputException("subcooling", spec.Subcooling,
                $"the throttled liquid (h = {Preconditions.Format(outlet.Enthalpy)} J/mol) lies outside the dome at the evaporating pressure (quality {Preconditions.Format(x4)}): reduce the subcooling");
        }

        double sL = evaporator.Liquid.State.Entropy!.Value, sV = evaporator.Vapour.State.Entropy!.Value;
        var inlet = new IsobaricPoint(spec.EvaporatingTemperature, pEvap, outlet.Enthalpy, sL + x4 * (sV - sL),
            1 / ((1 - x4) / evaporator.Liquid.State.Density + x4 / evaporator.Vapour.State.Density), x4);
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

    private static IsobaricPoint Point(ThermodynamicState state, double? quality)
        => new(state.Temperature, state.Pressure, state.Enthalpy!.Value, state.Entropy!.Value, state.Density, quality);
}
