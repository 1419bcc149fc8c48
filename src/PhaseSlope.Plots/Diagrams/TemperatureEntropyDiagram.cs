using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>t-s: the temperature–entropy dome of one fluid with isobars (horizontal inside the
/// dome) at round values of the display unit, the lines of constant vapour quality x = 0.1 … 0.9,
/// s = sL + x·(sV − sL), and optionally isochores, from the full property model (ideal-gas heat
/// capacity plus the cubic's residual part) on the chosen reference.</summary>
public static class TemperatureEntropyDiagram
{
    /// <summary>Points per isobar branch.</summary>
    public const int IsobarPoints = 60;

    /// <summary>Highest temperature drawn by default, as a multiple of Tc.</summary>
    public const double TopReducedTemperature = 1.35;

    /// <summary>Highest automatic isobar, as a multiple of Pc.</summary>
    public const double TopReducedPressure = 2;

    /// <summary>Legend title of the isobars.</summary>
    public const string IsobarTitle = "isobars";

    /// <summary>Builds the diagram for one fluid.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var properties = new PropertyModel(fluid.Fluid, fluid.Model, options.Reference);
        properties.RequireIdealGas("a temperature–entropy diagram");
        var solver = properties.Solver;
        double tc = solver.CriticalTemperature;
        double pc = solver.CriticalPressure;
        double m = Chart.MolarMass(fluid, options);
        DataPoint Map(double s, double t) => new(units.Entropy(s, m), units.Temperature(t));
        DataPoint MapState(ThermodynamicState s) => Map(s.Entropy!.Value, s.Temperature);

        var model = Chart.NewModel($"T–s diagram of {fluid.Name}", Chart.ModelAndReference(fluid, options.Reference));
        var sAxis = HouseStyle.Linear(AxisPosition.Bottom, "entropy s", units.EntropyUnit);
        var tAxis = HouseStyle.Linear(AxisPosition.Left, "temperature T", units.TemperatureUnit);
        model.Axes.Add(sAxis);
        model.Axes.Add(tAxis);

        double tMin = options.TemperatureRange?.Low ?? solver.MinimumTemperature;
        double tMax = options.TemperatureRange?.High ?? TopReducedTemperature * tc;
        if (options.TemperatureRange is not null)
        {
            tAxis.Minimum = units.Temperature(tMin);
            tAxis.Maximum = units.Temperature(tMax);
        }

        if (options.EntropyRange is { } sr)
        {
            sAxis.Minimum = units.Entropy(sr.Low, m);
            sAxis.Maximum = units.Entropy(sr.High, m);
        }

        var curve = CoexistenceCurve.Trace(solver, tMin, tc, options.Points);
        var saturated = curve.Take(curve.Count - 1).Select(properties.Coexistence).ToList();
        var critical = properties.AtDensity(curve[^1].Temperature, curve[^1].Liquid.Density);
        var dome = saturated.Select(s => MapState(s.Liquid.State)).Append(MapState(critical))
            .Concat(saturated.AsEnumerable().Reverse().Select(s => MapState(s.Vapour.State)));
        model.Series.Add(Chart.Line("saturated liquid and vapour", HouseStyle.Ink, dome, Chart.Thick));

        var grey = OxyColor.FromRgb(130, 130, 130);
        bool first = true;
        int at = saturated.Count / 4;
        foreach (double x in PressureEnthalpyDiagram.Qualities)
        {
            var line = saturated.Select(s => Map(s.Liquid.State.Entropy!.Value + x * s.EntropyOfVaporization, s.Point.Temperature)).Append(MapState(critical)).ToList();
            model.Series.Add(Chart.Line(first ? PressureEnthalpyDiagram.QualityTitle : null, grey, line, 1, LineStyle.Dot));
            Chart.Label(model, (first ? "x = " : "") + Chart.Number(x), line[at], grey, first ? HorizontalAlignment.Right : HorizontalAlignment.Center,
                VerticalAlignment.Middle, dx: first ? 8 : 0);
            first = false;
        }

        double pMin = curve[0].Pressure;
        var pressures = options.Isobars
            ?? [.. RoundValues.Logarithmic(units.Pressure(pMin * 1.05), units.Pressure(TopReducedPressure * pc), PressureEnthalpyDiagram.MostLines).Select(units.PressureToSi)];
        var colour = HouseStyle.Colour(0);
        first = true;
        foreach (double p in pressures)
        {
            var points = new List<DataPoint>();
            if (p < pc && p > pMin)
            {
                var sat = properties.Coexistence(solver.AtPressure(p));
                double tSat = sat.Point.Temperature;
                points.AddRange(Spaced(tMin, tSat, IsobarPoints).SkipLast(1).Select(t => MapState(properties.AtPressure(t, p, PhaseChoice.Liquid))));
                points.Add(MapState(sat.Liquid.State));
                points.Add(MapState(sat.Vapour.State));
                if (tSat < tMax)
                {
                    points.AddRange(Spaced(tSat, tMax, IsobarPoints).Skip(1)
                        .Select(t => MapState(properties.AtPressure(t, p, t < tc ? PhaseChoice.Vapour : PhaseChoice.Stable))));
                }
            }
            else if (p < pc)
            {
                // Below the dome's lowest pressure: vapour all the way.
                points.AddRange(Spaced(tMin, tMax, 2 * IsobarPoints).Select(t => MapState(properties.AtPressure(t, p, t < tc ? PhaseChoice.Vapour : PhaseChoice.Stable))));
            }
            else
            {
                points.AddRange(Spaced(tMin, tMax, 2 * IsobarPoints).Select(t => MapState(properties.AtPressure(t, p))));
            }

            model.Series.Add(Chart.Line(first ? $"{IsobarTitle} ({units.PressureUnit})" : null, colour, points, Chart.Thin));
            // At the hot end, where the vapour branches stand apart.
            Chart.Label(model, Chart.Number(units.Pressure(p)), points[^1], colour, HorizontalAlignment.Right, VerticalAlignment.Bottom, dy: -2);
            first = false;
        }

        if (options.Isochores is not null)
        {
            var isochoreColour = HouseStyle.Colour(4);
            first = true;
            foreach (double rho in PressureEnthalpyDiagram.Isochores(options, units, m, saturated, solver.CriticalDensity))
            {
                var points = PressureEnthalpyDiagram.IsochorePoints(properties, rho, tMin, tMax).Select(s => Map(s.Entropy!.Value, s.Temperature)).ToList();
                if (points.Count < 2)
                {
                    continue;
                }

                model.Series.Add(Chart.Line(first ? $"{PressureEnthalpyDiagram.IsochoreTitle} ({units.DensityUnit})" : null, isochoreColour, points, 1, LineStyle.DashDot));
                // Three quarters up, below the isobars' labels at the top.
                Chart.Label(model, Chart.Number(units.Density(rho, m)), points[points.Count * 3 / 4], isochoreColour, HorizontalAlignment.Left, VerticalAlignment.Middle, dx: 3);
                first = false;
            }
        }

        model.Series.Add(Chart.Critical([MapState(critical)]));
        return model;
    }

    /// <summary><paramref name="n"/> temperatures from <paramref name="a"/> to <paramref name="b"/>.</summary>
    internal static IEnumerable<double> Spaced(double a, double b, int n)
        => Enumerable.Range(0, n).Select(k => k == n - 1 ? b : a + (b - a) * k / (n - 1));
}
