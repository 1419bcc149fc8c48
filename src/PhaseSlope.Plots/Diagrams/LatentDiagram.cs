using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>latent: the model's enthalpy of vaporization against temperature, falling to zero
/// at the critical point; optionally the Clapeyron estimate from measured vapour pressures with
/// its ±u band (standard uncertainty from the fit covariance).</summary>
public static class LatentDiagram
{
    /// <summary>Points of the estimate from data across the data's temperature range.</summary>
    public const int DataPoints = 41;

    /// <summary>Builds the diagram; with data, the first fluid's Tc and Pc fix a three-term
    /// Wagner (3, 6) correlation fitted to the data, and its model gives the volume change.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel($"Enthalpy of vaporization of {Chart.Names(fluids)} — {Chart.Models(fluids)}");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Left, "enthalpy of vaporization Δh", units.EnthalpyUnit));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            double m = Chart.MolarMass(fluid, options);
            var curve = Chart.Curve(fluid, options.Points);
            model.Series.Add(Chart.Line($"{fluid.Name} (model)", HouseStyle.Colour(i),
                curve.Select(c => new DataPoint(units.Temperature(c.Temperature), units.Enthalpy(c.EnthalpyOfVaporization, m)))));
            criticals.Add(new DataPoint(units.Temperature(curve[^1].Temperature), 0));
        }

        model.Series.Add(Chart.Critical(criticals));

        if (options.Data is { Count: > 0 } data)
        {
            var first = fluids[0];
            double m = Chart.MolarMass(first, options);
            var points = FromData(first, data);
            var colour = HouseStyle.Colour(fluids.Count);
            var band = new AreaSeries
            {
                Title = "±u (standard uncertainty: fit, Tc and Pc, volume model)",
                Color = OxyColors.Undefined,
                Fill = OxyColor.FromAColor(110, colour),
                StrokeThickness = 0,
                Color2 = OxyColors.Undefined,
            };
            foreach (var p in points)
            {
                double t = units.Temperature(p.Temperature);
                band.Points.Add(new DataPoint(t, units.Enthalpy(p.EnthalpyOfVaporization + p.StandardUncertainty, m)));
                band.Points2.Add(new DataPoint(t, units.Enthalpy(p.EnthalpyOfVaporization - p.StandardUncertainty, m)));
            }

            model.Series.Add(band);
            model.Subtitle = $"dashed: Clapeyron estimate from {options.DataLabel} (Wagner (3, 6) fit, Δz from the model)";
            model.Series.Add(Chart.Line("from data", colour,
                points.Select(p => new DataPoint(units.Temperature(p.Temperature), units.Enthalpy(p.EnthalpyOfVaporization, m))),
                Chart.Thick, LineStyle.Dash));
        }

        return model;
    }

    /// <summary>The latent heat from measured vapour pressures over their temperature range:
    /// Wagner (3, 6) with the fluid's Tc and Pc, Δz from the fluid's model.</summary>
    internal static IReadOnlyList<LatentHeatPoint> FromData(PlotFluid fluid, IReadOnlyList<VapourPressurePoint> data)
    {
        double tc = fluid.Fluid.CriticalTemperature.Value;
        double pc = fluid.Fluid.CriticalPressure.Value;
        var fit = VapourPressureFitter.Fit(WagnerForm.ThreeSix(tc, pc), data);
        var estimator = new LatentHeatEstimator(fit, VolumeChangeModel.EquationOfState, fluid.Solver(), tc, pc);
        // The band of the latent command: the fit, Tc and Pc (the Wagner form and the model's
        // ΔZ use them; refit and re-solved at ±u) and the volume model (docs/uncertainty.md).
        LatentHeatEstimator Build(double t, double p) => new(
            VapourPressureFitter.Fit(WagnerForm.ThreeSix(t, p), data), VolumeChangeModel.EquationOfState,
            new CoexistenceSolver(fluid.WithCriticalPoint(t, p), CoexistenceSolver.LowestValidTemperature(fluid.Fluid)), t, p);
        var inputs = Core.Uncertainty.FamilyUncertainty.CriticalConstants(fluid.Fluid);
        var band = new LatentHeatBand(Build, estimator, inputs[0].StandardUncertainty, inputs[1].StandardUncertainty);
        double lo = fit.MinimumTemperature;
        double hi = fit.MaximumTemperature;
        return band.Linear([.. Enumerable.Range(0, DataPoints).Select(k => k == DataPoints - 1 ? hi : lo + (hi - lo) * k / (DataPoints - 1))]);
    }
}
