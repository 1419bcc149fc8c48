using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>p-h: the dome of one fluid on a logarithmic pressure axis against enthalpy, with
/// isotherms (horizontal inside the dome) and the lines of constant vapour quality
/// x = 0.1 … 0.9, h = hL + x·(hV − hL), from the full property model on the ideal-gas reference.</summary>
public static class PressureEnthalpyDiagram
{
    /// <summary>Reduced temperatures of the isotherms drawn (those below the fluid's lowest valid
    /// temperature are left out).</summary>
    public static readonly IReadOnlyList<double> ReducedTemperatures = [0.7, 0.8, 0.9, 1.0, 1.2];

    /// <summary>Vapour qualities of the constant-quality lines.</summary>
    public static readonly IReadOnlyList<double> Qualities = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];

    /// <summary>Points per isotherm branch.</summary>
    public const int IsothermPoints = 60;

    /// <summary>Highest pressure drawn, as a multiple of Pc.</summary>
    public const double TopReducedPressure = 3;

    /// <summary>Builds the diagram for one fluid.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var properties = new PropertyModel(fluid.Fluid, fluid.Model);
        properties.RequireIdealGas("a pressure–enthalpy diagram");
        var solver = properties.Solver;
        double tc = fluid.Model.CriticalTemperature;
        double pc = fluid.Model.CriticalPressure;
        double m = Chart.MolarMass(fluid, options);
        DataPoint Map(double h, double p) => new(units.Enthalpy(h, m), units.Pressure(p));

        var model = HouseStyle.NewModel($"P–h diagram of {fluid.Name} ({Chart.ModelTitle(fluid)}, ideal-gas reference)");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "enthalpy h", units.EnthalpyUnit));
        model.Axes.Add(HouseStyle.Logarithmic(AxisPosition.Left, "pressure P", units.PressureUnit));

        // Start the dome at 0.55 Tc (a vapour pressure of roughly 0.5-2 % of Pc for ordinary
        // fluids) or at the lowest valid temperature, whichever is higher: below that the dome
        // only widens into decades of pressure no one reads off a P-h chart.
        double tStart = Math.Max(solver.MinimumTemperature, 0.55 * tc);
        var curve = CoexistenceCurve.Trace(solver, tStart, tc, options.Points);
        var saturated = curve.Take(curve.Count - 1).Select(properties.Coexistence).ToList();
        var critical = properties.AtDensity(curve[^1].Temperature, curve[^1].Liquid.Density);
        var dome = saturated.Select(s => Map(s.Liquid.State.Enthalpy!.Value, s.Point.Pressure)).Append(Map(critical.Enthalpy!.Value, critical.Pressure))
            .Concat(saturated.AsEnumerable().Reverse().Select(s => Map(s.Vapour.State.Enthalpy!.Value, s.Point.Pressure)));
        model.Series.Add(Chart.Line("saturated liquid and vapour", HouseStyle.Ink, dome, Chart.Thick));

        var grey = OxyColor.FromRgb(130, 130, 130);
        bool qualityInLegend = true;
        foreach (double x in Qualities)
        {
            var line = saturated.Select(s => Map(s.Liquid.State.Enthalpy!.Value + x * (s.Vapour.State.Enthalpy!.Value - s.Liquid.State.Enthalpy!.Value), s.Point.Pressure))
                .Append(Map(critical.Enthalpy!.Value, critical.Pressure)).ToList();
            model.Series.Add(Chart.Line(qualityInLegend ? "vapour quality x = 0.1 … 0.9" : null, grey, line, 1, LineStyle.Dot));
            model.Annotations.Add(new TextAnnotation
            {
                Text = Chart.Number(x),
                TextPosition = line[0],
                // Just above the low-pressure end of the line, inside the dome.
                TextVerticalAlignment = VerticalAlignment.Bottom,
                Offset = new ScreenVector(0, -4),
                TextHorizontalAlignment = HorizontalAlignment.Center,
                Stroke = OxyColors.Undefined,
                FontSize = HouseStyle.BaseLabelFontSize,
                TextColor = grey,
            });
            qualityInLegend = false;
        }

        double pMin = curve[0].Pressure;
        double pMax = TopReducedPressure * pc;
        int colour = 0;
        foreach (double tr in ReducedTemperatures)
        {
            double t = tr * tc;
            if (t < tStart)
            {
                continue;
            }

            var points = new List<DataPoint>();
            if (tr < 1)
            {
                var sat = properties.Coexistence(solver.AtTemperature(t));
                double pSat = sat.Point.Pressure;
                points.AddRange(LogSpaced(pMax, pSat, IsothermPoints).SkipLast(1)
                    .Select(p => Map(properties.AtPressure(t, p, PhaseChoice.Liquid).Enthalpy!.Value, p)));
                points.Add(Map(sat.Liquid.State.Enthalpy!.Value, pSat));
                points.Add(Map(sat.Vapour.State.Enthalpy!.Value, pSat));
                points.AddRange(LogSpaced(pSat, pMin, IsothermPoints).Skip(1)
                    .Select(p => Map(properties.AtPressure(t, p, PhaseChoice.Vapour).Enthalpy!.Value, p)));
            }
            else
            {
                points.AddRange(LogSpaced(pMax, pMin, 2 * IsothermPoints).Select(p => Map(properties.AtPressure(t, p).Enthalpy!.Value, p)));
            }

            string label = $"T = {Chart.Number(tr)} Tc ({Chart.Number(units.Temperature(t))} {units.TemperatureUnit})";
            model.Series.Add(Chart.Line(label, HouseStyle.Colour(colour++), points, Chart.Thin + 0.5));
        }

        model.Series.Add(Chart.Critical([Map(critical.Enthalpy!.Value, critical.Pressure)]));
        return model;
    }

    /// <summary><paramref name="n"/> pressures spaced evenly in ln P from <paramref name="a"/> to <paramref name="b"/>.</summary>
    internal static IEnumerable<double> LogSpaced(double a, double b, int n)
        => Enumerable.Range(0, n).Select(k => k == n - 1 ? b : a * Math.Pow(b / a, k / (n - 1.0)));
}
