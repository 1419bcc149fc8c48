using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>p-v: isotherms of the model in pressure–molar volume on a logarithmic volume axis.
/// Inside the coexistence dome each subcritical isotherm's van der Waals loop is dashed, and the
/// tie line at Psat joins the coexisting volumes; the equal-fugacity condition the solver meets
/// is the same as the equal-area (Maxwell) rule, ∫ P dv from vL to vV = Psat·(vV − vL).</summary>
public static class PressureVolumeDiagram
{
    /// <summary>Reduced temperatures of the isotherms drawn (those below the fluid's lowest valid
    /// temperature are left out).</summary>
    public static readonly IReadOnlyList<double> ReducedTemperatures = [0.75, 0.85, 0.95, 1.0, 1.1];

    /// <summary>Points per isotherm.</summary>
    public const int IsothermPoints = 400;

    /// <summary>Builds the diagram for one fluid.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var cubic = fluid.Model;
        var solver = fluid.Solver();
        double tc = cubic.CriticalTemperature;
        double pc = cubic.CriticalPressure;
        double vc = 1 / cubic.CriticalDensity;
        double m = Chart.MolarMass(fluid, options);
        DataPoint Map(double v, double p) => options.Reduced ? new(v / vc, p / pc) : new(units.Volume(v, m), units.Pressure(p));

        var model = HouseStyle.NewModel($"Isotherms of {fluid.Name} in P–v — {Chart.ModelTitle(fluid)}");
        var vAxis = options.Reduced
            ? HouseStyle.Logarithmic(AxisPosition.Bottom, "reduced molar volume v/vc", null)
            : HouseStyle.Logarithmic(AxisPosition.Bottom, "volume v", units.VolumeUnit);
        var pAxis = options.Reduced
            ? HouseStyle.Linear(AxisPosition.Left, "reduced pressure P/Pc", null)
            : HouseStyle.Linear(AxisPosition.Left, "pressure P", units.PressureUnit);

        // The loops dip below zero; show enough of them to see their shape, and cut the steep
        // liquid branches at twice the critical pressure.
        var low = Map(vc, -0.6 * pc);
        var high = Map(vc, 2.0 * pc);
        pAxis.Minimum = low.Y;
        pAxis.Maximum = high.Y;
        double vMin = cubic.TranslatedCovolume * 1.12;
        double vMax = vc * 40;
        vAxis.Minimum = Map(vMin, pc).X;
        vAxis.Maximum = Map(vMax, pc).X;
        model.Axes.Add(vAxis);
        model.Axes.Add(pAxis);

        var dome = CoexistenceCurve.Trace(solver, options.Points);
        model.Series.Add(Chart.Line("saturated liquid and vapour", HouseStyle.Ink,
            dome.Select(c => Map(c.Liquid.MolarVolume, c.Pressure)).Concat(dome.Reverse().Skip(1).Select(c => Map(c.Vapour.MolarVolume, c.Pressure))),
            Chart.Thick));

        int colour = 0;
        foreach (double tr in ReducedTemperatures)
        {
            double t = tr * tc;
            if (t < solver.MinimumTemperature)
            {
                continue;
            }

            var c = HouseStyle.Colour(colour++);
            string label = $"T = {Chart.Number(tr)} Tc ({Chart.Number(units.Temperature(t))} {units.TemperatureUnit})";
            var volumes = Enumerable.Range(0, IsothermPoints).Select(k => vMin * Math.Pow(vMax / vMin, k / (IsothermPoints - 1.0))).ToArray();
            if (tr >= 1)
            {
                model.Series.Add(Chart.Line(label, c, volumes.Select(v => Map(v, cubic.Pressure(t, 1 / v)))));
                continue;
            }

            var sat = solver.AtTemperature(t);
            double vL = sat.Liquid.MolarVolume;
            double vV = sat.Vapour.MolarVolume;
            var liquid = volumes.Where(v => v < vL).Append(vL);
            var loop = volumes.Where(v => v > vL && v < vV).Prepend(vL).Append(vV);
            var vapour = volumes.Where(v => v > vV).Prepend(vV);
            model.Series.Add(Chart.Line(label, c, liquid.Select(v => Map(v, cubic.Pressure(t, 1 / v)))));
            model.Series.Add(Chart.Line(null, c, vapour.Select(v => Map(v, cubic.Pressure(t, 1 / v)))));
            model.Series.Add(Chart.Line(null, c, loop.Select(v => Map(v, cubic.Pressure(t, 1 / v))), Chart.Thin, LineStyle.Dash));
            model.Series.Add(Chart.Line(null, HouseStyle.Ink, [Map(vL, sat.Pressure), Map(vV, sat.Pressure)], Chart.Thin));
        }

        // Legend-only entries (no points) explaining the line styles shared by every isotherm.
        model.Series.Add(Chart.Line("dashed: model loop inside the dome", HouseStyle.Ink, Chart.Thin, LineStyle.Dash));
        model.Series.Add(Chart.Line("tie line at Psat (equal areas)", HouseStyle.Ink, Chart.Thin));

        var critical = dome[^1];
        model.Series.Add(Chart.Critical([Map(critical.Liquid.MolarVolume, critical.Pressure)]));
        return model;
    }
}
