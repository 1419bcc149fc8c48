using System.Globalization;
using MathNet.Numerics.OdeSolvers;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Solids;

/// <summary>The sublimation and melting lines of a pure fluid from its sourced triple point, by its
/// published equations where the fluid file has them and by the Clapeyron equation otherwise.</summary>
/// <remarks>
/// <para><b>Sublimation without an equation</b>: dP/dT = Δh_sub/(T·Δv_sub) integrated from the sourced
/// triple point (T_t, P_t) (fourth-order Runge–Kutta in ln P, steps of at most 0.5 K), with
/// Δh_sub(T_t) = Δh_fus + Δh_vap(T_t) and Δv_sub = v_vapour(T, P) − v_solid: the vapour volume from the
/// model's vapour root (its compressibility factor, not the ideal gas), the solid's from its sourced
/// density (neglected, and said so, when the file gives none). Δh_vap(T_t) is the best the fluid
/// has: the Clapeyron equation applied to its published vapour-pressure equation
/// (T·Δv·dP/dT with the model's volumes at that equation's pressure), else the model's own
/// coexistence at T_t. Δh_sub varies as ∫(cp° − cp_solid) dT when the file gives the solid's heat
/// capacity and the fluid has cp°; otherwise it is held at its triple-point value.</para>
/// <para><b>Melting without an equation</b>: dP/dT = Δh_fus/(T·Δv_fus) with both held at their
/// triple-point values, integrated in closed form P = P_t + (Δh_fus/Δv_fus)·ln(T/T_t). The sign of
/// Δv_fus alone sets the direction (water's negative slope comes out of it).</para>
/// </remarks>
public sealed class SolidPhaseLines
{
    /// <summary>The melting line's default end without a published equation: where the constant-Δh,
    /// constant-Δv Clapeyron line reaches this pressure, Pa (a triple-point extrapolation beyond it).</summary>
    public const double ClapeyronMeltingLimit = 100e6;

    /// <summary>How far above the triple-point pressure, Pa, a published melting line reports Δh and
    /// Δv: the triple-point Δv_fus it holds constant changes with pressure by about
    /// (κ_liquid·v_liquid − κ_solid·v_solid)·ΔP, some 10 % of itself per 10 MPa for compressibilities
    /// near 1e-9 1/Pa and a Δv of a tenth of the volume; beyond this band they are not given.</summary>
    public const double MeltingVolumeBand = 10e6;

    /// <summary>The sublimation line's default start, as a fraction of the triple-point temperature.</summary>
    public const double SublimationDefaultStart = 0.7;

    /// <summary>Largest Runge–Kutta step of the sublimation integral, K.</summary>
    private const double StepLimit = 0.5;

    private readonly Fluid _fluid;
    private readonly CoexistenceSolver _solver;
    private readonly Lazy<TriplePointCheck> _check;
    private readonly Lazy<(double Value, string Method)> _vaporization;

    /// <summary>The lines of <paramref name="fluid"/> with the model and solver of <paramref name="solver"/>.</summary>
    /// <exception cref="InvalidInputException">The fluid gives no triple-point temperature or pressure.</exception>
    public SolidPhaseLines(Fluid fluid, CoexistenceSolver solver)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(solver);
        _fluid = fluid;
        _solver = solver;
        TriplePointTemperature = fluid.TriplePointTemperature?.Value
            ?? throw new InvalidInputException("fluid", double.NaN, $"fluid '{fluid.Name}' gives no triple_point_temperature, which the solid lines start from");
        TriplePointPressure = fluid.TriplePointPressure?.Value
            ?? throw new InvalidInputException("fluid", double.NaN, $"fluid '{fluid.Name}' gives no triple_point_pressure, which the solid lines start from");
        _check = new(() => new TriplePointCheck(TriplePointTemperature, TriplePointPressure, _solver.AtTemperature(TriplePointTemperature).Pressure));
        _vaporization = new(VaporizationAtTriplePoint);
    }

    /// <summary>The sourced triple-point temperature, K.</summary>
    public double TriplePointTemperature { get; }

    /// <summary>The sourced triple-point pressure, Pa.</summary>
    public double TriplePointPressure { get; }

    /// <summary>The model's vapour pressure at the triple point against the sourced one.</summary>
    public TriplePointCheck Check => _check.Value;

    /// <summary>Δh_vap at the triple point, J/mol, and how it was obtained.</summary>
    public (double Value, string Method) VaporizationEnthalpy => _vaporization.Value;

    /// <summary>Δh_sub = Δh_fus + Δh_vap at the triple point, J/mol, or null without Δh_fus.</summary>
    public double? SublimationEnthalpy => _fluid.EnthalpyOfFusion?.Value + VaporizationEnthalpy.Value;

    /// <summary>The solid's molar volume, m³/mol, or null when the file gives no solid density.</summary>
    public double? SolidVolume => _fluid.SolidDensity is { } rho ? 1 / rho.Value : null;

    /// <summary>How the sublimation line is computed, for output.</summary>
    public string SublimationMethod => _fluid.SublimationPressureEquation is { } equation
        ? $"published sublimation equation ({equation.Source})"
        : string.Create(CultureInfo.InvariantCulture, $"Clapeyron integrated from the triple point with dh_sub = dh_fus + dh_vap = {SublimationEnthalpy:G6} J/mol")
            + $" (dh_vap by {VaporizationEnthalpy.Method})"
            + (HasSublimationHeatCapacity ? ", varying with cp0 - cp_solid" : ", held constant")
            + (SolidVolume is null ? "; the solid's volume neglected beside the vapour's (no solid_density)" : "");

    /// <summary>How the melting line is computed, for output.</summary>
    public string MeltingMethod => _fluid.MeltingPressureEquation is { } equation
        ? $"published melting equation ({equation.Source})"
        : "Clapeyron with dh_fus and dv_fus held at their triple-point values";

    private bool HasSublimationHeatCapacity => _fluid.SolidHeatCapacity is not null && _fluid.IdealGasHeatCapacity is not null;

    /// <summary>The default temperature range of a line: vaporization from the solver's lowest
    /// temperature to the critical point; sublimation from 0.7 T_t (or the equation's lower end) to
    /// T_t; melting over the published equation's range, else from T_t to where the Clapeyron line
    /// reaches <see cref="ClapeyronMeltingLimit"/>.</summary>
    public (double Low, double High) DefaultRange(PhaseLineKind kind)
    {
        double tt = TriplePointTemperature;
        switch (kind)
        {
            case PhaseLineKind.Vaporization:
                return (_solver.MinimumTemperature, _solver.CriticalTemperature);
            case PhaseLineKind.Sublimation:
                double low = SublimationDefaultStart * tt;
                return _fluid.SublimationPressureEquation is { } sub
                    ? (Math.Max(low, sub.LowestTemperature), Math.Min(tt, sub.HighestTemperature))
                    : (low, tt);
            default:
                if (_fluid.MeltingPressureEquation is { } melt)
                {
                    return (melt.LowestTemperature, melt.HighestTemperature);
                }

                var (dh, dv) = RequireFusion();
                double end = tt * Math.Exp((ClapeyronMeltingLimit - TriplePointPressure) * dv / dh);
                return end > tt ? (tt, end) : (end, tt);
        }
    }

    /// <summary>The sublimation line at T (at or below the triple point).</summary>
    /// <exception cref="InvalidInputException">T above the triple point, outside the published
    /// equation's range, or the fluid lacks what the Clapeyron route needs.</exception>
    public PhaseLinePoint Sublimation(double temperature)
    {
        double tt = TriplePointTemperature;
        if (!(temperature > 0) || temperature > tt * (1 + 1e-12))
        {
            throw new InvalidInputException("temperature", temperature, string.Create(CultureInfo.InvariantCulture,
                $"{temperature:G6} K is not below the triple point {tt:G6} K of {_fluid.Name}: a solid sublimes only below it"));
        }

        if (_fluid.SublimationPressureEquation is { } equation)
        {
            RequireCovered(equation, temperature, "sublimation");
            var (p, slope) = equation.Evaluate(temperature);
            double dv = VapourVolume(temperature, p) - (SolidVolume ?? 0);
            return new PhaseLinePoint(temperature, p, slope, temperature * dv * slope, dv);
        }

        double h0 = SublimationEnthalpy ?? throw new InvalidInputException("fluid", double.NaN,
            $"fluid '{_fluid.Name}' gives neither a sublimation_pressure_equation nor an enthalpy_of_fusion, which the Clapeyron route needs");
        double lnP = Math.Log(TriplePointPressure);
        if (temperature < tt)
        {
            int n = Math.Max(17, (int)Math.Ceiling((tt - temperature) / StepLimit) + 1);
            double[] path = RungeKutta.FourthOrder(lnP, tt, temperature, n, (t, y) => SublimationSlopeOfLnP(t, Math.Exp(y), h0));
            lnP = path[^1];
        }

        double pressure = Math.Exp(lnP);
        double dh = SublimationEnthalpyAt(temperature, h0);
        double dvSub = VapourVolume(temperature, pressure) - (SolidVolume ?? 0);
        return new PhaseLinePoint(temperature, pressure, dh / (temperature * dvSub), dh, dvSub);
    }

    /// <summary>The melting line at T.</summary>
    /// <exception cref="InvalidInputException">T outside the published equation's range, on the side of
    /// the triple point where the Clapeyron line falls below P_t, or the fluid lacks Δh_fus or Δv_fus.</exception>
    public PhaseLinePoint Melting(double temperature)
    {
        if (!(temperature > 0))
        {
            throw new InvalidInputException("temperature", temperature, "the temperature must be positive");
        }

        double? fusionVolume = _fluid.FusionVolumeChange?.Value;
        if (_fluid.MeltingPressureEquation is { } equation)
        {
            RequireCovered(equation, temperature, "melting");
            var (p, slope) = equation.Evaluate(temperature);
            if (Math.Abs(p - TriplePointPressure) > MeltingVolumeBand)
            {
                fusionVolume = null; // the triple-point Δv no longer holds (MeltingVolumeBand)
            }

            return new PhaseLinePoint(temperature, p, slope, fusionVolume is double v ? temperature * v * slope : null, fusionVolume);
        }

        var (dh, dv) = RequireFusion();
        double tt = TriplePointTemperature;
        // The line leaves the triple point towards higher T when the liquid is the larger phase
        // (Δv_fus > 0), towards lower T when it is the smaller (water); 1e-12 relative is rounding.
        bool wrongSide = dv > 0 ? temperature < tt * (1 - 1e-12) : temperature > tt * (1 + 1e-12);
        if (wrongSide)
        {
            string side = dv > 0 ? "above" : "below";
            throw new InvalidInputException("temperature", temperature, string.Create(CultureInfo.InvariantCulture,
                $"the melting line of {_fluid.Name} runs from its triple point {tt:G6} K to temperatures {side} it (dv_fus {(dv > 0 ? ">" : "<")} 0); {temperature:G6} K is on the other side"));
        }

        double rise = dh / dv * Math.Log(temperature / tt);
        return new PhaseLinePoint(temperature, TriplePointPressure + Math.Max(rise, 0), dh / (temperature * dv), dh, dv);
    }

    /// <summary>d ln P/dT on the sublimation line at (T, P): Δh_sub/(T·P·Δv_sub).</summary>
    private double SublimationSlopeOfLnP(double temperature, double pressure, double h0)
    {
        double dv = VapourVolume(temperature, pressure) - (SolidVolume ?? 0);
        return SublimationEnthalpyAt(temperature, h0) / (temperature * pressure * dv);
    }

    /// <summary>Δh_sub(T) = Δh_sub(T_t) + ∫(cp° − cp_solid) dT when both heat capacities are known.</summary>
    private double SublimationEnthalpyAt(double temperature, double h0)
    {
        if (!HasSublimationHeatCapacity)
        {
            return h0;
        }

        double tt = TriplePointTemperature;
        return h0 + _fluid.IdealGasHeatCapacity!.EnthalpyIntegral(tt, temperature) - _fluid.SolidHeatCapacity!.Value * (temperature - tt);
    }

    /// <summary>The model's vapour molar volume at (T, P), m³/mol: its lowest-density root.</summary>
    private double VapourVolume(double temperature, double pressure)
    {
        Span<double> roots = stackalloc double[2];
        int count = _solver.Model.DensityRoots(temperature, pressure, Composition.Pure, roots);
        if (count == 0)
        {
            throw new ConvergenceException(string.Create(CultureInfo.InvariantCulture,
                $"the model has no vapour root at {temperature:G6} K and {pressure:G6} Pa"), 0, double.NaN);
        }

        return 1 / roots[0];
    }

    /// <summary>Δh_vap at the triple point: Clapeyron on the published vapour-pressure equation when the
    /// fluid has one (the model gives only the two volumes, at the equation's pressure), else the model's
    /// coexistence point.</summary>
    private (double Value, string Method) VaporizationAtTriplePoint()
    {
        double tt = TriplePointTemperature;
        if (_fluid.VapourPressureEquation is { } equation && tt < equation.Form.CriticalTemperature)
        {
            double p = equation.Pressure(tt);
            double slope = p * equation.Form.Slope(tt, equation.Coefficients);
            Span<double> roots = stackalloc double[2];
            int count = _solver.Model.DensityRoots(tt, p, Composition.Pure, roots);
            if (count == 2)
            {
                double liquidVolume = _fluid.TriplePointLiquidDensity is { } rho ? 1 / rho.Value : 1 / roots[1];
                return (tt * (1 / roots[0] - liquidVolume) * slope, $"Clapeyron on the vapour_pressure_equation ({equation.Source})");
            }
        }

        return (_solver.AtTemperature(tt).EnthalpyOfVaporization, $"the model's coexistence at the triple point ({_solver.Model.Identity.Equation})");
    }

    private (double Enthalpy, double Volume) RequireFusion()
    {
        double dh = _fluid.EnthalpyOfFusion?.Value ?? throw new InvalidInputException("fluid", double.NaN,
            $"fluid '{_fluid.Name}' gives neither a melting_pressure_equation nor an enthalpy_of_fusion, which the Clapeyron route needs");
        double dv = _fluid.FusionVolumeChange?.Value ?? throw new InvalidInputException("fluid", double.NaN,
            $"fluid '{_fluid.Name}' gives neither a melting_pressure_equation nor a fusion_volume_change (or solid_density with triple_point_liquid_density), which the Clapeyron route needs");
        return (dh, dv);
    }

    private void RequireCovered(SolidLineEquation equation, double temperature, string line)
    {
        if (!equation.Covers(temperature))
        {
            throw new InvalidInputException("temperature", temperature, string.Create(CultureInfo.InvariantCulture,
                $"{temperature:G6} K is outside the range {equation.LowestTemperature:G6}-{equation.HighestTemperature:G6} K of the published {line} equation of {_fluid.Name}"));
        }
    }
}
