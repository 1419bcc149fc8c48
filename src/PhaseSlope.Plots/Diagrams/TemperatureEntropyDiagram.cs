using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>t-s: the temperature–entropy dome of one fluid with a few isobars (horizontal inside
/// the dome), from the full property model (ideal-gas heat capacity plus the cubic's residual
/// part) on the ideal-gas reference state.</summary>
public static class TemperatureEntropyDiagram
{
    /// <summary>Reduced pressures of the isobars drawn (those below the saturation pressure at
    /// the lowest valid temperature are left out).</summary>
    public static readonly IReadOnlyList<double> ReducedPressures = [0.02, 0.1, 0.3, 0.7, 1.5];

    /// <summary>Points per isobar branch.</summary>
    public const int IsobarPoints = 60;

    /// <summary>Highest temperature drawn, as a multiple of Tc.</summary>
    public const double TopReducedTemperature = 1.35;

    /// <summary>Builds the diagram for one fluid.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var properties = new PropertyModel(fluid.Fluid, fluid.Model);
        properties.RequireIdealGas("a temperature–entropy diagram");
        var solver = properties.Solver;
        double tc = fluid.Model.CriticalTemperature;
        double pc = fluid.Model.CriticalPressure;
        double m = Chart.MolarMass(fluid, options);
        DataPoint Map(ThermodynamicState s) => new(units.Entropy(s.Entropy!.Value, m), units.Temperature(s.Temperature));

        var model = HouseStyle.NewModel($"T–s diagram of {fluid.Name} ({Chart.ModelTitle(fluid)}, ideal-gas reference)");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "entropy s", units.EntropyUnit));
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Left, "temperature T", units.TemperatureUnit));

        var curve = CoexistenceCurve.Trace(solver, options.Points);
        var saturated = curve.Take(curve.Count - 1).Select(properties.Coexistence).ToList();
        var critical = properties.AtDensity(curve[^1].Temperature, curve[^1].Liquid.Density);
        var dome = saturated.Select(s => Map(s.Liquid.State)).Append(Map(critical))
            .Concat(saturated.AsEnumerable().Reverse().Select(s => Map(s.Vapour.State)));
        model.Series.Add(Chart.Line("saturated liquid and vapour", HouseStyle.Ink, dome, Chart.Thick));

        double tMin = solver.MinimumTemperature;
        double tMax = TopReducedTemperature * tc;
        double pMin = curve[0].Pressure;
        int colour = 0;
        foreach (double pr in ReducedPressures)
        {
            double p = pr * pc;
            if (p <= pMin * 1.05)
            {
                continue;
            }

            var points = new List<DataPoint>();
            if (p < pc)
            {
                var sat = properties.Coexistence(solver.AtPressure(p));
                double tSat = sat.Point.Temperature;
                points.AddRange(Spaced(tMin, tSat, IsobarPoints).SkipLast(1).Select(t => Map(properties.AtPressure(t, p, PhaseChoice.Liquid))));
                points.Add(Map(sat.Liquid.State));
                points.Add(Map(sat.Vapour.State));
                points.AddRange(Spaced(tSat, tMax, IsobarPoints).Skip(1)
                    .Select(t => Map(properties.AtPressure(t, p, t < tc ? PhaseChoice.Vapour : PhaseChoice.Stable))));
            }
            else
            {
                points.AddRange(Spaced(tMin, tMax, 2 * IsobarPoints).Select(t => Map(properties.AtPressure(t, p))));
            }

            string label = $"P = {Chart.Number(pr)} Pc ({Chart.Number(units.Pressure(p))} {units.PressureUnit})";
            model.Series.Add(Chart.Line(label, HouseStyle.Colour(colour++), points, Chart.Thin + 0.5));
        }

        model.Series.Add(Chart.Critical([Map(critical)]));
        return model;
    }

    /// <summary><paramref name="n"/> temperatures from <paramref name="a"/> to <paramref name="b"/>.</summary>
    internal static IEnumerable<double> Spaced(double a, double b, int n)
        => Enumerable.Range(0, n).Select(k => k == n - 1 ? b : a + (b - a) * k / (n - 1));
}
