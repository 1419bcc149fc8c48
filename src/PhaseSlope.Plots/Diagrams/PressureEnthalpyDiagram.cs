using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>p-h: the dome of one fluid on a logarithmic pressure axis against enthalpy, with
/// isotherms (horizontal inside the dome) at round values of the display unit, isentropes in the
/// vapour and supercritical region, the lines of constant vapour quality x = 0.1 … 0.9,
/// h = hL + x·(hV − hL), optionally isochores, and optionally a vapour-compression cycle, from the
/// full property model on the chosen reference.</summary>
public static class PressureEnthalpyDiagram
{
    /// <summary>Vapour qualities of the constant-quality lines.</summary>
    public static readonly IReadOnlyList<double> Qualities = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];

    /// <summary>Points per isotherm branch (and per isentrope, per isochore).</summary>
    public const int IsothermPoints = 60;

    /// <summary>Highest pressure drawn by default, as a multiple of Pc.</summary>
    public const double TopReducedPressure = 3;

    /// <summary>Lowest temperature of the dome by default, as a multiple of Tc (or the lowest valid
    /// temperature, if higher).</summary>
    public const double BottomReducedTemperature = 0.55;

    /// <summary>Highest isotherm by default, as a multiple of Tc.</summary>
    public const double TopReducedTemperature = 1.2;

    /// <summary>Most isotherms chosen automatically (enough for a 20 K step over the default
    /// span of 0.55 to 1.2 Tc of a refrigerant).</summary>
    public const int MostIsotherms = 14;

    /// <summary>Most isentropes, isobars or isochores chosen automatically.</summary>
    public const int MostLines = 10;

    /// <summary>Legend titles of the line families.</summary>
    public const string IsothermTitle = "isotherms", IsentropeTitle = "isentropes", IsochoreTitle = "isochores", QualityTitle = "vapour quality x";

    /// <summary>Builds the diagram for one fluid.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var properties = new PropertyModel(fluid.Fluid, fluid.Model, options.Reference);
        properties.RequireIdealGas("a pressure–enthalpy diagram");
        var solver = properties.Solver;
        double tc = solver.CriticalTemperature;
        double pc = solver.CriticalPressure;
        double m = Chart.MolarMass(fluid, options);
        DataPoint Map(double h, double p) => new(units.Enthalpy(h, m), units.Pressure(p));

        var model = Chart.NewModel($"P–h diagram of {fluid.Name}", Chart.ModelAndReference(fluid, options.Reference));
        var hAxis = HouseStyle.Linear(AxisPosition.Bottom, "enthalpy h", units.EnthalpyUnit);
        var pAxis = HouseStyle.Logarithmic(AxisPosition.Left, "pressure P", units.PressureUnit);
        model.Axes.Add(hAxis);
        model.Axes.Add(pAxis);

        // By default the dome starts at 0.55 Tc (a vapour pressure of roughly 0.5-2 % of Pc for
        // ordinary fluids) or at the lowest valid temperature, whichever is higher: below that the
        // dome only widens into decades of pressure no one reads off a P-h chart.
        double tStart = options.TemperatureRange?.Low ?? Math.Max(solver.MinimumTemperature, BottomReducedTemperature * tc);
        double tTop = options.TemperatureRange?.High ?? TopReducedTemperature * tc;
        var curve = CoexistenceCurve.Trace(solver, tStart, tc, options.Points);
        var saturated = curve.Take(curve.Count - 1).Select(properties.Coexistence).ToList();
        var critical = properties.AtDensity(curve[^1].Temperature, curve[^1].Liquid.Density);
        double pMin = options.PressureRange?.Low ?? curve[0].Pressure;
        double pBottom = solver.AtTemperature(solver.MinimumTemperature).Pressure;
        if (pMin < pBottom)
        {
            throw new Core.Errors.InvalidInputException("pressure range", pMin,
                $"the pressure range starts at {Chart.Number(units.Pressure(pMin))} {units.PressureUnit}, below the saturation pressure {Chart.Number(units.Pressure(pBottom))} {units.PressureUnit} at the lowest valid temperature of {fluid.Name}");
        }

        double pMax = options.PressureRange?.High ?? TopReducedPressure * pc;
        if (options.PressureRange is not null)
        {
            pAxis.Minimum = units.Pressure(pMin);
            pAxis.Maximum = units.Pressure(pMax);
        }

        if (options.EnthalpyRange is { } hr)
        {
            hAxis.Minimum = units.Enthalpy(hr.Low, m);
            hAxis.Maximum = units.Enthalpy(hr.High, m);
        }

        var dome = saturated.Select(s => Map(s.Liquid.State.Enthalpy!.Value, s.Point.Pressure)).Append(Map(critical.Enthalpy!.Value, critical.Pressure))
            .Concat(saturated.AsEnumerable().Reverse().Select(s => Map(s.Vapour.State.Enthalpy!.Value, s.Point.Pressure)));
        model.Series.Add(Chart.Line("saturated liquid and vapour", HouseStyle.Ink, dome, Chart.Thick));

        AddQualityLines(model, saturated, critical, Map);
        AddIsotherms(model, properties, options, units, tStart, tTop, pMin, pMax, Map);
        AddIsentropes(model, properties, units, m, saturated, critical, pMin, pMax, Map);
        if (options.Isochores is not null)
        {
            AddIsochores(model, properties, options, units, m, saturated, tStart, tTop, Map);
        }

        model.Series.Add(Chart.Critical([Map(critical.Enthalpy!.Value, critical.Pressure)]));
        if (options.Cycle is not null)
        {
            VapourCompressionCycle cycle;
            try
            {
                cycle = VapourCompressionCycle.Compute(properties, options.Cycle);
            }
            catch (Core.Errors.InvalidInputException ex)
            {
                // One field for every refusal of the cycle, so that a caller can say which option it came from.
                throw new Core.Errors.InvalidInputException("cycle", ex.Value, ex.Message);
            }

            AddCycle(model, cycle, units, Map);
        }

        return model;
    }

    private static readonly OxyColor QualityColour = OxyColor.FromRgb(130, 130, 130);
    private static readonly OxyColor IsothermColour = HouseStyle.Colour(0);
    private static readonly OxyColor IsentropeColour = HouseStyle.Colour(2);
    private static readonly OxyColor IsochoreColour = HouseStyle.Colour(4);
    private static readonly OxyColor CycleColour = HouseStyle.Colour(1);

    private static void AddQualityLines(PlotModel model, List<CoexistenceProperties> saturated, ThermodynamicState critical, Func<double, double, DataPoint> map)
    {
        bool first = true;
        // Labels a quarter of the way up the dome (by temperature), where the lines are well apart.
        int at = saturated.Count / 4;
        foreach (double x in Qualities)
        {
            var line = saturated.Select(s => map(s.Liquid.State.Enthalpy!.Value + x * (s.Vapour.State.Enthalpy!.Value - s.Liquid.State.Enthalpy!.Value), s.Point.Pressure))
                .Append(map(critical.Enthalpy!.Value, critical.Pressure)).ToList();
            model.Series.Add(Chart.Line(first ? QualityTitle : null, QualityColour, line, 1, LineStyle.Dot));
            // The first reads "x = 0.1" and stands left of its line, so that it does not run into 0.2.
            Chart.Label(model, (first ? "x = " : "") + Chart.Number(x), line[at], QualityColour, first ? HorizontalAlignment.Right : HorizontalAlignment.Center,
                VerticalAlignment.Middle, dx: first ? 8 : 0);
            first = false;
        }
    }

    private static void AddIsotherms(PlotModel model, PropertyModel properties, DiagramOptions options, UnitScale units,
        double tStart, double tTop, double pMin, double pMax, Func<double, double, DataPoint> map)
    {
        var solver = properties.Solver;
        double tc = solver.CriticalTemperature;
        var temperatures = options.Isotherms
            ?? [.. RoundValues.Linear(units.Temperature(tStart), units.Temperature(tTop), MostIsotherms).Select(units.TemperatureToSi).Where(t => t >= tStart * (1 - 1e-12))];
        bool first = true;
        foreach (double t in temperatures)
        {
            var points = new List<DataPoint>();
            if (t < tc)
            {
                var sat = properties.Coexistence(solver.AtTemperature(t));
                double pSat = sat.Point.Pressure;
                // At exactly Psat the stable root is either phase: the saturated states stand in for it.
                if (pSat < pMax)
                {
                    points.AddRange(LogSpaced(pMax, Math.Max(pSat, pMin), IsothermPoints).SkipLast(pSat >= pMin ? 1 : 0)
                        .Select(p => map(properties.AtPressure(t, p).Enthalpy!.Value, p)));
                }

                if (pSat >= pMin && pSat <= pMax)
                {
                    points.Add(map(sat.Liquid.State.Enthalpy!.Value, pSat));
                    points.Add(map(sat.Vapour.State.Enthalpy!.Value, pSat));
                }

                if (pSat > pMin)
                {
                    points.AddRange(LogSpaced(Math.Min(pSat, pMax), pMin, IsothermPoints).Skip(pSat <= pMax ? 1 : 0)
                        .Select(p => map(properties.AtPressure(t, p).Enthalpy!.Value, p)));
                }
            }
            else
            {
                points.AddRange(LogSpaced(pMax, pMin, 2 * IsothermPoints).Select(p => map(properties.AtPressure(t, p).Enthalpy!.Value, p)));
            }

            if (points.Count == 0)
            {
                continue;
            }

            model.Series.Add(Chart.Line(first ? $"{IsothermTitle} ({units.TemperatureUnit})" : null, IsothermColour, points, Chart.Thin));
            // At the top of the chart, where the liquid (or dense-fluid) branches stand well apart.
            Chart.Label(model, Chart.Number(units.Temperature(t)), points[0], IsothermColour, vertical: VerticalAlignment.Top, dy: 2);
            first = false;
        }
    }

    private static void AddIsentropes(PlotModel model, PropertyModel properties, UnitScale units, double m,
        List<CoexistenceProperties> saturated, ThermodynamicState critical, double pMin, double pMax, Func<double, double, DataPoint> map)
    {
        // Round values from the critical entropy to the highest of the saturated vapour plus a
        // quarter of the entropy of vaporization at the bottom of the dome: the region a compressor
        // works in. At or above the critical entropy no state below Pc is a liquid, so every point
        // found off the dome is vapour or supercritical fluid.
        double sLow = critical.Entropy!.Value;
        double sHigh = saturated.Max(x => x.Vapour.State.Entropy!.Value) + 0.25 * saturated[0].EntropyOfVaporization;
        var entropies = RoundValues.Linear(units.Entropy(sLow, m), units.Entropy(sHigh, m), MostLines)
            .Select(v => units.EntropyToSi(v, m)).Where(v => v >= sLow).ToList();
        bool first = true;
        foreach (double s in entropies)
        {
            // Only the single-phase part: a run of points, broken where the line enters the dome.
            var segments = new List<List<DataPoint>> { new() };
            foreach (double p in LogSpaced(pMin, pMax, IsothermPoints))
            {
                // A flash outside what the model reaches (hotter than cp°'s range) ends the line there.
                FluidState? state = null;
                try
                {
                    state = properties.Flash(StateProperty.Pressure, p, StateProperty.Entropy, s);
                }
                catch (InvalidInputException)
                {
                }

                if (state is { Quality: null })
                {
                    segments[^1].Add(map(state.Enthalpy!.Value, p));
                }
                else if (segments[^1].Count > 0)
                {
                    segments.Add([]);
                }
            }

            foreach (var segment in segments.Where(g => g.Count > 1))
            {
                model.Series.Add(Chart.Line(first ? $"{IsentropeTitle} ({units.EntropyUnit})" : null, IsentropeColour, segment, 1, LineStyle.Dash));
                Chart.Label(model, Chart.Number(units.Entropy(s, m)), segment[segment.Count * 3 / 4], IsentropeColour, HorizontalAlignment.Left, VerticalAlignment.Middle, dx: 3);
                first = false;
            }
        }
    }

    private static void AddIsochores(PlotModel model, PropertyModel properties, DiagramOptions options, UnitScale units, double m,
        List<CoexistenceProperties> saturated, double tStart, double tTop, Func<double, double, DataPoint> map)
    {
        var densities = Isochores(options, units, m, saturated, properties.Solver.CriticalDensity);
        bool first = true;
        foreach (double rho in densities)
        {
            var points = IsochorePoints(properties, rho, tStart, tTop).Select(s => map(s.Enthalpy!.Value, s.Pressure)).ToList();
            if (points.Count < 2)
            {
                continue;
            }

            model.Series.Add(Chart.Line(first ? $"{IsochoreTitle} ({units.DensityUnit})" : null, IsochoreColour, points, 1, LineStyle.DashDot));
            Chart.Label(model, Chart.Number(units.Density(rho, m)), points[^1], IsochoreColour, HorizontalAlignment.Left, VerticalAlignment.Middle, dx: 3);
            first = false;
        }
    }

    /// <summary>The isochores' densities: the user's, or round values from the saturated vapour at
    /// the bottom of the dome to the critical density.</summary>
    internal static IReadOnlyList<double> Isochores(DiagramOptions options, UnitScale units, double m, List<CoexistenceProperties> saturated, double criticalDensity)
        => options.Isochores is { Count: > 0 } given ? given
            : [.. RoundValues.Logarithmic(units.Density(saturated[0].Vapour.State.Density, m), units.Density(criticalDensity, m), MostLines)
                .Select(v => units.DensityToSi(v, m))];

    /// <summary>States along an isochore from <paramref name="tLow"/> to <paramref name="tHigh"/>
    /// (flashes at T and ρ: inside the dome the two-phase mixture of that overall density); states
    /// at a pressure not above zero (a stretched liquid) are left out.</summary>
    internal static IEnumerable<FluidState> IsochorePoints(PropertyModel properties, double density, double tLow, double tHigh)
        => Enumerable.Range(0, IsothermPoints).Select(k => tLow + (tHigh - tLow) * k / (IsothermPoints - 1.0))
            .Select(t => properties.Flash(StateProperty.Temperature, t, StateProperty.Density, density))
            .Where(s => s.Pressure > 0);

    private static void AddCycle(PlotModel model, VapourCompressionCycle cycle, UnitScale units, Func<double, double, DataPoint> map)
    {
        // 1 → 2 (compressor, drawn straight: the real path is unknown), 2 → 3 along the condensing
        // isobar, 3 → 4 the throttle (constant h), 4 → 1 along the evaporating isobar.
        var path = new[] { cycle.Suction, cycle.Discharge, cycle.CondenserOutlet, cycle.EvaporatorInlet, cycle.Suction }
            .Select(s => map(s.Enthalpy!.Value, s.Pressure)).ToList();
        string cop = $"cycle: COP {Chart.Number(cycle.CoefficientOfPerformance)} (heating {Chart.Number(cycle.HeatingCoefficientOfPerformance)}), "
            + $"{Chart.Number(units.Temperature(cycle.Specification.EvaporatingTemperature))}/{Chart.Number(units.Temperature(cycle.Specification.CondensingTemperature))} {units.TemperatureUnit}";
        model.Series.Add(Chart.Line(cop, CycleColour, path, Chart.Thick));
        var isentropic = map(cycle.IsentropicDischarge.Enthalpy!.Value, cycle.IsentropicDischarge.Pressure);
        model.Series.Add(Chart.Line(null, CycleColour, [path[0], isentropic], 1, LineStyle.Dot));
        var marks = new OxyPlot.Series.ScatterSeries { MarkerType = MarkerType.Circle, MarkerSize = 4, MarkerFill = CycleColour, Tag = new HouseStyle.BaseSize(4) };
        foreach (var (label, state) in cycle.States)
        {
            var at = map(state.Enthalpy!.Value, state.Pressure);
            marks.Points.Add(new OxyPlot.Series.ScatterPoint(at.X, at.Y));
            bool right = label is "1" or "2" or "2s";
            Chart.Label(model, label, at, CycleColour, right ? HorizontalAlignment.Left : HorizontalAlignment.Right, label is "2s" ? VerticalAlignment.Bottom : VerticalAlignment.Top,
                dx: right ? 5 : -5, dy: label is "2s" ? -3 : 3);
        }

        model.Series.Add(marks);
    }

    /// <summary><paramref name="n"/> pressures spaced evenly in ln P from <paramref name="a"/> to <paramref name="b"/>.</summary>
    internal static IEnumerable<double> LogSpaced(double a, double b, int n)
        => Enumerable.Range(0, n).Select(k => k == n - 1 ? b : a * Math.Pow(b / a, k / (n - 1.0)));
}
