using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Cycles;

/// <summary>The state on an isobar at a given enthalpy or entropy: the two-phase state by the
/// lever rule between the saturated phases at P, a single phase by a one-dimensional root in
/// temperature (h and s rise with T at constant P, since cp &gt; 0).</summary>
/// <remarks>
/// <para>Interim: this is the small (P, h) and (P, s) inversion the vapour-compression cycle and the
/// isentropes of the p-h chart need. A general flash on <see cref="PropertyModel"/> supersedes it;
/// its callers are <see cref="VapourCompressionCycle.Compute"/> and the p-h chart's isentropes only.</para>
/// <para>Root: MathNet's Brent method on the scaled residual (h − h*)/(R·Tc) or (s − s*)/R, to
/// 1e-12 (a temperature to about 1e-10 relative), bracketed by the saturation temperature and the
/// lowest valid temperature (liquid) or the given highest temperature (vapour, or any phase at or
/// above Pc).</para>
/// </remarks>
public static class IsobaricStates
{
    /// <summary>Scaled residual at which the root is accepted.</summary>
    public const double Accuracy = 1e-12;

    /// <summary>Iteration cap of Brent's method.</summary>
    public const int MaxIterations = 200;

    /// <summary>The state at pressure <paramref name="pressure"/> (Pa) and molar enthalpy
    /// <paramref name="enthalpy"/> (J/mol), if one lies between the lowest valid temperature and
    /// <paramref name="highestTemperature"/> (K).</summary>
    /// <exception cref="InvalidInputException">P not positive, or below the saturation pressure at the lowest valid temperature.</exception>
    public static bool TryAtEnthalpy(PropertyModel properties, double pressure, double enthalpy, double highestTemperature, out IsobaricPoint point)
        => TrySolve(properties, pressure, enthalpy, s => s.Enthalpy!.Value, Constants.GasConstant * properties.Solver.CriticalTemperature, highestTemperature, out point);

    /// <summary>The state at pressure <paramref name="pressure"/> (Pa) and molar entropy
    /// <paramref name="entropy"/> (J/(mol·K)), if one lies between the lowest valid temperature and
    /// <paramref name="highestTemperature"/> (K).</summary>
    /// <exception cref="InvalidInputException">P not positive, or below the saturation pressure at the lowest valid temperature.</exception>
    public static bool TryAtEntropy(PropertyModel properties, double pressure, double entropy, double highestTemperature, out IsobaricPoint point)
        => TrySolve(properties, pressure, entropy, s => s.Entropy!.Value, Constants.GasConstant, highestTemperature, out point);

    private static bool TrySolve(PropertyModel properties, double pressure, double target, Func<ThermodynamicState, double> of, double scale,
        double highestTemperature, out IsobaricPoint point)
    {
        ArgumentNullException.ThrowIfNull(properties);
        Preconditions.Positive(pressure, "pressure");
        Preconditions.Finite(target, "target value");
        properties.RequireIdealGas("a state at given enthalpy or entropy");
        var solver = properties.Solver;
        double tc = solver.CriticalTemperature;
        double tLow = solver.MinimumTemperature;
        point = default;
        if (pressure < solver.CriticalPressure)
        {
            var sat = properties.Coexistence(solver.AtPressure(pressure));
            double tSat = sat.Point.Temperature;
            var liquid = sat.Liquid.State;
            var vapour = sat.Vapour.State;
            double l = of(liquid), v = of(vapour);
            if (target >= l && target <= v)
            {
                double x = (target - l) / (v - l);
                point = new IsobaricPoint(tSat, pressure,
                    liquid.Enthalpy!.Value + x * (vapour.Enthalpy!.Value - liquid.Enthalpy!.Value),
                    liquid.Entropy!.Value + x * (vapour.Entropy!.Value - liquid.Entropy!.Value),
                    1 / ((1 - x) / liquid.Density + x / vapour.Density), x);
                return true;
            }

            return target > v
                ? TryRoot(properties, pressure, target, of, scale, tSat, highestTemperature, v, t => t < tc ? PhaseChoice.Vapour : PhaseChoice.Stable, out point)
                : TryRoot(properties, pressure, target, of, scale, tLow, tSat, l, _ => PhaseChoice.Liquid, out point);
        }

        return TryRoot(properties, pressure, target, of, scale, tLow, highestTemperature, null, _ => PhaseChoice.Stable, out point);
    }

    /// <summary>Brent on [a, b]; <paramref name="saturated"/> is the value at the saturated end
    /// (which a phase-chosen evaluation exactly at Tsat would only reproduce to rounding).</summary>
    private static bool TryRoot(PropertyModel properties, double pressure, double target, Func<ThermodynamicState, double> of, double scale,
        double a, double b, double? saturated, Func<double, PhaseChoice> phase, out IsobaricPoint point)
    {
        point = default;
        if (!(b > a))
        {
            return false;
        }

        double Residual(double t)
        {
            bool atSaturation = saturated is not null && (t == a && phase(t) == PhaseChoice.Vapour || t == b && phase(t) == PhaseChoice.Liquid);
            return ((atSaturation ? saturated!.Value : of(properties.AtPressure(t, pressure, phase(t)))) - target) / scale;
        }

        double fa = Residual(a), fb = Residual(b);
        if (fa * fb > 0)
        {
            return false;
        }

        if (!Brent.TryFindRoot(Residual, a, b, Accuracy, MaxIterations, out double root))
        {
            throw new ConvergenceException(
                $"no temperature found at {Preconditions.Format(pressure)} Pa for the value {Preconditions.Format(target)} within {MaxIterations} iterations of Brent's method",
                MaxIterations, Residual(root));
        }

        var state = properties.AtPressure(root, pressure, phase(root));
        point = new IsobaricPoint(root, pressure, state.Enthalpy!.Value, state.Entropy!.Value, state.Density, null);
        return true;
    }
}
