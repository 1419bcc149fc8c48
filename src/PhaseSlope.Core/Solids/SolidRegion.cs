using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Solids;

/// <summary>Whether a fluid's own data place a single-phase state of the model in the solid region
/// (or rule out the liquid the model gives): the guard every described state of
/// <see cref="PropertyModel"/> passes, so that no liquid is reported where the fluid's data say there is none.</summary>
/// <remarks>
/// <para>The rules, from the sourced triple point (T_t, P_t) and the fluid's solid lines
/// (<see cref="SolidPhaseLines"/>: published equations where the file has them, Clapeyron otherwise):</para>
/// <list type="bullet">
/// <item>T &lt; T_t: solid above the sublimation pressure P_sub(T), except, for a fluid whose melting
/// line runs from the triple point to lower temperatures (water, Δv_fus &lt; 0), at or above the
/// melting pressure P_m(T) where that line is given, which is liquid again. Without sublimation data
/// the boundary is unknown: a liquid of the model is refused (below the triple point the condensed
/// phase is the solid), a vapour is not.</item>
/// <item>T ≥ T_t: a liquid of the model below P_t is refused (below the triple-point pressure only
/// vapour and solid exist; the model's vapour pressure there is below the sourced one); for a fluid
/// whose melting line runs to higher temperatures (Δv_fus &gt; 0), a state above P_m(T) is solid,
/// where the line is given (a published equation within its stated range; the Clapeyron line on its
/// whole side of the triple point).</item>
/// </list>
/// <para>Cost: on the common path (T ≥ T_t and P ≤ P_t, or no melting line above T_t) two
/// comparisons. A line is evaluated only when T &lt; T_t or P &gt; P_t with a melting line; a
/// sublimation line without a published equation is a Runge–Kutta integral from the triple point,
/// paid only below T_t.</para>
/// </remarks>
public sealed class SolidRegion
{
    private readonly Fluid _fluid;
    private readonly double? _triplePointTemperature;
    private readonly double? _triplePointPressure;
    private readonly SolidPhaseLines? _lines;
    private readonly int _meltingSide; // +1: the melting line runs to higher T; −1: to lower T; 0: none given

    /// <summary>The solid region of <paramref name="fluid"/> with the model and solver of
    /// <paramref name="solver"/> (whose vapour root the Clapeyron sublimation line uses).</summary>
    public SolidRegion(Fluid fluid, CoexistenceSolver solver)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(solver);
        _fluid = fluid;
        _triplePointTemperature = fluid.TriplePointTemperature?.Value;
        _triplePointPressure = fluid.TriplePointPressure?.Value;
        if (_triplePointTemperature is not double tt || _triplePointPressure is null)
        {
            return;
        }

        _lines = new SolidPhaseLines(fluid, solver);
        if (fluid.MeltingPressureEquation is { } melting)
        {
            _meltingSide = melting.HighestTemperature <= tt * (1 + 1e-9) ? -1 : 1;
        }
        else if (fluid.EnthalpyOfFusion is not null && fluid.FusionVolumeChange is { } dv && dv.Value != 0)
        {
            _meltingSide = Math.Sign(dv.Value);
        }
    }

    /// <summary>Null when the fluid's data allow a single phase of this kind at (T, P); otherwise
    /// the reason the state is refused, for an <see cref="Errors.InvalidInputException"/>.</summary>
    /// <param name="temperature">T, K.</param>
    /// <param name="pressure">P, Pa.</param>
    /// <param name="phase">The phase the model gives there.</param>
    /// <param name="metastable">Whether the model itself marks the phase metastable (a liquid beyond its
    /// own saturation, such as a liquid under tension): the triple-point-pressure rule is for a liquid
    /// the model reports as stable, which the sourced data contradict; a metastable liquid above the
    /// triple-point temperature is reported as such.</param>
    public string? Refusal(double temperature, double pressure, PhaseLabel phase, bool metastable = false)
    {
        if (_triplePointTemperature is not double tt)
        {
            return null;
        }

        bool liquid = phase == PhaseLabel.Liquid;
        string at = $"{_fluid.Name} at {Number(temperature)} K and {Number(pressure)} Pa";
        // 1e-12 relative: a temperature converted from another unit that rounds onto the triple point.
        if (temperature >= tt * (1 - 1e-12))
        {
            if (liquid && !metastable && _triplePointPressure is double pt && pressure < pt * (1 - 1e-12))
            {
                return $"no liquid exists below the triple-point pressure {Number(pt)} Pa of {_fluid.Name} ({_fluid.TriplePointPressure!.Source}): the model gives a liquid at {Number(temperature)} K and {Number(pressure)} Pa because its vapour pressure there is below the sourced triple-point pressure; the stable phase is the vapour";
            }

            if (_meltingSide > 0 && pressure > _triplePointPressure && Melting(temperature) is { } melting && pressure > melting.Pressure)
            {
                return $"{at} is solid by its own data: above its melting pressure {Number(melting.Pressure)} Pa at that temperature ({_lines!.MeltingMethod}); this tool does not model solid phases";
            }

            return null;
        }

        if (_meltingSide < 0 && Melting(temperature) is { } below && pressure >= below.Pressure)
        {
            // Above the melting line of a fluid whose solid is the less dense phase: the liquid again.
            return null;
        }

        var sublimation = Sublimation(temperature);
        if (sublimation is null)
        {
            return liquid
                ? $"{at} is below its triple point {Number(tt)} K, where the condensed phase is the solid, not the liquid the model gives (the fluid gives no sublimation line there to place the solid-vapour boundary); this tool does not model solid phases"
                : null;
        }

        if (pressure <= sublimation.Pressure)
        {
            return liquid
                ? $"{at} is below its triple point {Number(tt)} K and below its sublimation pressure {Number(sublimation.Pressure)} Pa there, where only the vapour exists; the model gives a liquid"
                : null;
        }

        string upTo = _meltingSide < 0 && Melting(temperature) is { } m ? $" and below its melting pressure {Number(m.Pressure)} Pa" : "";
        return $"{at} is solid by its own data: below its triple point {Number(tt)} K and above its sublimation pressure {Number(sublimation.Pressure)} Pa there ({_lines!.SublimationMethod}){upTo}; this tool does not model solid phases";
    }

    /// <summary>The sublimation line at T below the triple point, or null where the fluid gives none
    /// (no triple-point pressure, or a published equation that does not reach T and no Clapeyron data).</summary>
    private PhaseLinePoint? Sublimation(double temperature)
    {
        if (_lines is null)
        {
            return null;
        }

        if (_fluid.SublimationPressureEquation is { } equation)
        {
            return equation.Covers(temperature) ? _lines.Sublimation(temperature) : null;
        }

        return _fluid.EnthalpyOfFusion is null ? null : _lines.Sublimation(temperature);
    }

    /// <summary>The melting line at T on its side of the triple point, or null where it is not given.</summary>
    private PhaseLinePoint? Melting(double temperature)
    {
        if (_lines is null || _meltingSide == 0)
        {
            return null;
        }

        if (_fluid.MeltingPressureEquation is { } equation)
        {
            return equation.Covers(temperature) ? _lines.Melting(temperature) : null;
        }

        double tt = _triplePointTemperature!.Value;
        bool onSide = _meltingSide > 0 ? temperature >= tt : temperature <= tt;
        return onSide ? _lines.Melting(temperature) : null;
    }

    private static string Number(double value) => Preconditions.Format(value);
}
