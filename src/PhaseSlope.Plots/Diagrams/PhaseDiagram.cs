using System.Globalization;
using MathNet.Numerics.RootFinding;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>phase: the whole pressure–temperature phase diagram of one fluid on a logarithmic
/// pressure axis: the vaporization line of the model from the triple point to its critical point,
/// the sublimation line below the triple point and the melting line above it (each by the fluid's
/// published equation where its file has one, else by the Clapeyron equation from the sourced
/// triple point; <see cref="SolidPhaseLines"/>), the triple and critical points with their
/// temperature and pressure, and the regions named where they lie.</summary>
/// <remarks>
/// <para>Default window: the sublimation line from where its pressure falls to
/// <see cref="LowestPressureFraction"/>·P_t (or from its own lower end, if higher) up to
/// <see cref="TopPressureFactor"/>·Pc, and from that temperature to beyond Tc by
/// <see cref="RightMargin"/> of the span; a melting line that rises past the top is drawn up to
/// it and a note gives where the line goes on. A <see cref="DiagramOptions.TemperatureRange"/>
/// or <see cref="DiagramOptions.PressureRange"/> sets the axis instead (both must contain the
/// triple point).</para>
/// <para>The region labels are placed by the lines, not at fixed coordinates: on a grid over the
/// plot area, each point is classified from the drawn lines (below the triple-point pressure: solid
/// below the sublimation temperature, else vapour; above it: solid below the melting temperature,
/// whichever way the melting line leans, then liquid or vapour by the vaporization line up to Pc,
/// and liquid or supercritical fluid above Pc, left or right of Tc), and each label goes where its
/// box stays farthest from every line, marker label and the frame. A region with no room is not
/// labelled.</para>
/// </remarks>
public static class PhaseDiagram
{
    /// <summary>The default lowest pressure of the sublimation line, as a fraction of P_t.</summary>
    public const double LowestPressureFraction = 1e-3;

    /// <summary>The default top of the pressure axis, as a multiple of Pc.</summary>
    public const double TopPressureFactor = 10;

    /// <summary>Room right of Tc (or the hottest point of a line), as a fraction of the temperature span.</summary>
    public const double RightMargin = 0.3;

    /// <summary>Room left of the coldest point of a line, as a fraction of the temperature span.</summary>
    public const double LeftMargin = 0.08;

    /// <summary>The region labels.</summary>
    public const string Solid = "solid", Liquid = "liquid", Vapour = "vapour", Supercritical = "supercritical fluid";

    /// <summary>The label text of a region (the supercritical label on two lines, to fit beside Tc).</summary>
    public static string LabelText(string region) => region == Supercritical ? "supercritical\nfluid" : region;

    /// <summary>Legend titles of the lines (the solid lines' titles add their method in brackets).</summary>
    public const string VaporizationTitle = "vaporization (model)", SublimationTitle = "sublimation", MeltingTitle = "melting",
        TriplePointTitle = "triple point", CriticalPointTitle = "critical point (model)", CriticalBoundsTitle = "Tc and Pc";

    /// <summary>The text of a line's method in its legend entry.</summary>
    public const string PublishedMethod = "published equation", ClapeyronMethod = "Clapeyron";

    /// <summary>Builds the diagram for one fluid.</summary>
    /// <exception cref="FluidDataException">The fluid gives no triple-point temperature or pressure,
    /// or neither a sublimation equation nor an enthalpy of fusion.</exception>
    /// <exception cref="InvalidInputException">A range that does not contain the triple point.</exception>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        Require(fluid);
        var units = new UnitScale(options.Units);
        var solver = fluid.Solver();
        var lines = new SolidPhaseLines(fluid.Fluid, solver);
        double tt = lines.TriplePointTemperature, pt = lines.TriplePointPressure;
        double tc = solver.CriticalTemperature, pc = solver.CriticalPressure;
        CheckRanges(fluid, options);
        var notes = new List<string>();
        int n = options.Points;

        // The pressure window first: it bounds the solid lines.
        double pTop = options.PressureRange?.High ?? TopPressureFactor * pc;
        double pFloor = options.PressureRange?.Low ?? LowestPressureFraction * pt;

        // Sublimation: from its default start, or higher where its pressure reaches the floor.
        var (subLow, _) = lines.DefaultRange(PhaseLineKind.Sublimation);
        if (options.TemperatureRange is { } tr0 && tr0.Low > subLow)
        {
            subLow = tr0.Low;
        }

        if (lines.Sublimation(subLow).Pressure < pFloor)
        {
            subLow = Brent.FindRoot(t => Math.Log(lines.Sublimation(t).Pressure / pFloor), subLow, tt, 1e-9 * tt, 200);
        }

        var sublimation = Enumerable.Range(0, n).Select(i => i == n - 1 ? tt : subLow + (tt - subLow) * i / (n - 1))
            .Select(t => (t, lines.Sublimation(t).Pressure)).ToList();

        // Melting: evenly in ln P from the triple point to the top, or to its own end.
        List<(double T, double P)> melting = [];
        string? meltingMissing = MeltingMissing(fluid);
        if (meltingMissing is null)
        {
            var (mLow, mHigh) = lines.DefaultRange(PhaseLineKind.Melting);
            bool rising = mHigh > tt * (1 + 1e-12);
            double lineEnd = rising ? mHigh : mLow;
            double far = lineEnd;
            if (options.TemperatureRange is { } tr1)
            {
                far = rising ? Math.Min(far, tr1.High) : Math.Max(far, tr1.Low);
            }

            double pFar = lines.Melting(far).Pressure;
            double pEnd = Math.Min(pFar, pTop);
            if (pEnd < pFar)
            {
                far = Brent.FindRoot(t => lines.Melting(t).Pressure - pEnd, Math.Min(tt, far), Math.Max(tt, far), 1e-12 * tt, 200);
            }

            bool published = fluid.Fluid.MeltingPressureEquation is not null;
            notes.Add(far != lineEnd
                ? $"the melting line goes on beyond the plot, to {Show(units.Pressure(lines.Melting(lineEnd).Pressure))} {units.PressureUnit} at {Show(units.Temperature(lineEnd))} {units.TemperatureUnit}"
                    + (published ? " (its published equation's range)" : " (the Clapeyron line's default end)")
                : $"the melting line ends at {Show(units.Temperature(far))} {units.TemperatureUnit}, {Show(units.Pressure(pFar))} {units.PressureUnit}"
                    + (published ? " (its published equation's range; other solid phases are not drawn)"
                        : " (Clapeyron with dh_fus and dv_fus held at the triple point: an extrapolation beyond)"));

            melting.Add((tt, lines.Melting(tt).Pressure));
            for (int i = 1; i < n; i++)
            {
                double p = pt * Math.Pow(pEnd / pt, i / (double)(n - 1));
                double t = i == n - 1 ? far : Brent.FindRoot(x => lines.Melting(x).Pressure - p, Math.Min(tt, far), Math.Max(tt, far), 1e-12 * tt, 200);
                melting.Add((t, lines.Melting(t).Pressure));
            }
        }
        else
        {
            notes.Add(meltingMissing);
        }

        // Vaporization: the model's coexistence from the triple point (or its lowest valid
        // temperature) to the critical point, or to the right end of a chosen range.
        double vapLow = Math.Max(tt, solver.MinimumTemperature);
        double vapHigh = options.TemperatureRange is { } tr2 ? Math.Min(tc, tr2.High) : tc;
        if (vapLow > tt)
        {
            notes.Add($"the model's vaporization line starts at its lowest valid temperature {Show(units.Temperature(vapLow))} {units.TemperatureUnit}, above the triple point");
        }

        var vaporization = CoexistenceCurve.Trace(solver, vapLow, vapHigh, n).Select(c => (T: c.Temperature, P: c.Pressure)).ToList();
        if (vapLow == tt)
        {
            var check = lines.Check;
            notes.Add(string.Create(CultureInfo.InvariantCulture,
                $"the model's vapour pressure at the triple point is {100 * check.RelativeDeviation:+0.00;-0.00;0} % from the sourced {Show(units.Pressure(pt))} {units.PressureUnit}"));
        }

        // The window.
        double coldest = Math.Min(sublimation[0].t, melting.Count > 0 ? melting.Min(m => m.T) : tt);
        double hottest = Math.Max(vaporization[^1].T, melting.Count > 0 ? melting.Max(m => m.T) : tt);
        double span = hottest - coldest;
        double tLo = options.TemperatureRange?.Low ?? coldest - LeftMargin * span;
        double tHi = options.TemperatureRange?.High ?? hottest + RightMargin * span;
        double pLo = options.PressureRange?.Low ?? sublimation[0].Item2 / 2;
        double pHi = pTop;

        string methods = $"vaporization: {Chart.ModelTitle(fluid)}; sublimation: {Cite(fluid.Fluid.SublimationPressureEquation?.Source)}"
            + (meltingMissing is null ? $"; melting: {Cite(fluid.Fluid.MeltingPressureEquation?.Source)}" : "");
        var model = Chart.NewModel($"Phase diagram of {fluid.Name}", methods + "\n" + string.Join("\n", notes.Select(s => "note: " + s)));
        var tAxis = HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit);
        var pAxis = HouseStyle.Logarithmic(AxisPosition.Left, "pressure P", units.PressureUnit);
        tAxis.Minimum = units.Temperature(tLo);
        tAxis.Maximum = units.Temperature(tHi);
        pAxis.Minimum = units.Pressure(pLo);
        pAxis.Maximum = units.Pressure(pHi);
        model.Axes.Add(tAxis);
        model.Axes.Add(pAxis);

        DataPoint Map(double t, double p) => new(units.Temperature(t), units.Pressure(p));
        model.Series.Add(Chart.Line(VaporizationTitle, HouseStyle.Colour(0), vaporization.Select(v => Map(v.T, v.P))));
        model.Series.Add(Chart.Line($"{SublimationTitle} ({Method(fluid.Fluid.SublimationPressureEquation)})", HouseStyle.Colour(1),
            sublimation.Select(s => Map(s.t, s.Item2)), style: LineStyle.Dash));
        if (melting.Count > 0)
        {
            model.Series.Add(Chart.Line($"{MeltingTitle} ({Method(fluid.Fluid.MeltingPressureEquation)})", HouseStyle.Colour(2),
                melting.Select(m => Map(m.T, m.P)), style: LineStyle.DashDot));
        }

        // Tc and Pc bound the supercritical region: thin dotted lines from the critical point.
        bool criticalShown = vapHigh >= tc && pc < pHi;
        if (criticalShown)
        {
            var bounds = Chart.Line(CriticalBoundsTitle, OxyColor.FromRgb(110, 110, 110), Chart.Thin, LineStyle.Dot);
            bounds.Points.AddRange([Map(tc, pHi), Map(tc, pc), Map(tHi, pc)]);
            model.Series.Add(bounds);
        }

        var triple = Marker(TriplePointTitle, MarkerType.Triangle, Map(tt, pt));
        model.Series.Add(triple);
        var tripleText = PointLabel(model, $"{TriplePointTitle}: {Show(units.Temperature(tt))} {units.TemperatureUnit}, {Show(units.Pressure(pt))} {units.PressureUnit}", Map(tt, pt), below: true);
        TextAnnotation? criticalText = null;
        if (criticalShown)
        {
            var critical = Chart.Critical([Map(tc, pc)]);
            critical.Title = CriticalPointTitle;
            model.Series.Add(critical);
            criticalText = PointLabel(model, $"critical point: {Show(units.Temperature(tc))} {units.TemperatureUnit}, {Show(units.Pressure(pc))} {units.PressureUnit}", Map(tc, pc), below: false);
        }

        var window = new Window(tLo, tHi, Math.Log(pLo), Math.Log(pHi));
        var map = new PhaseMap(tt, pt, tc, pc, sublimation, melting, vaporization);
        var obstacles = new List<(double X0, double Y0, double X1, double Y1)>();
        foreach (var line in new[] { sublimation.Select(s => (s.t, s.Item2)).ToList(), melting, vaporization,
            criticalShown ? [(tc, pHi), (tc, pc), (tHi, pc)] : [] })
        {
            for (int i = 1; i < line.Count; i++)
            {
                var (x0, y0) = window.Fraction(line[i - 1].Item1, line[i - 1].Item2);
                var (x1, y1) = window.Fraction(line[i].Item1, line[i].Item2);
                obstacles.Add((x0, y0, x1, y1));
            }
        }

        foreach (var (label, t, p, below) in new[] { (tripleText, tt, pt, true), (criticalText, tc, pc, false) })
        {
            if (label is not null)
            {
                // The triple point's label hangs below and right of its point, the critical point's
                // sits above and left of it (see PointLabel); each box is an obstacle for the regions'.
                var (x, y) = window.Fraction(t, p);
                double w = LabelHalfWidth(label.Text ?? "", MarkerLabelShare) * 2, h = LabelHalfHeight * 1.6;
                double x0 = below ? x : x - w, x1 = below ? x + w : x, y0 = y, y1 = below ? y - h : y + h;
                obstacles.Add((x0, y0, x1, y0));
                obstacles.Add((x0, y1, x1, y1));
                obstacles.Add((x0, y0, x0, y1));
                obstacles.Add((x1, y0, x1, y1));
            }
        }

        foreach (string region in new[] { Solid, Liquid, Vapour, Supercritical })
        {
            if (Place(region, map, window, obstacles) is var (t, p))
            {
                model.Annotations.Add(new TextAnnotation
                {
                    Text = LabelText(region),
                    TextPosition = Map(t, p),
                    TextHorizontalAlignment = HorizontalAlignment.Center,
                    TextVerticalAlignment = VerticalAlignment.Middle,
                    Stroke = OxyColors.Undefined,
                    Background = OxyColors.Undefined,
                    FontSize = RegionFontSize,
                    FontWeight = FontWeights.Bold,
                    TextColor = OxyColor.FromRgb(90, 90, 90),
                    Tag = new HouseStyle.BaseSize(RegionFontSize),
                });
            }
        }

        return model;
    }

    /// <summary>Font size of the region labels at the default figure size.</summary>
    public const double RegionFontSize = 16;

    /// <summary>Half the height of one line of a region label, as a fraction of the plot area's height.</summary>
    private const double LabelHalfHeight = 0.02;

    /// <summary>Half the width of one character of a region label, as a fraction of the plot area's
    /// width (about 0.6 em of the 16-point region font on the default plot area of about 800 pixels).</summary>
    private const double RegionLabelShare = 0.0063;

    /// <summary>The same for the smaller marker labels (11 points).</summary>
    private const double MarkerLabelShare = 0.0045;

    /// <summary>Half the width of a label's longest line as a fraction of the plot area's width, with a margin.</summary>
    private static double LabelHalfWidth(string text, double share = RegionLabelShare) => share * text.Split('\n').Max(l => l.Length) + 0.01;

    /// <summary>Refuses a fluid that lacks what every phase diagram needs.</summary>
    /// <exception cref="FluidDataException">No triple-point temperature or pressure, or no way to
    /// compute the sublimation line.</exception>
    public static void Require(PlotFluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        var f = fluid.Fluid;
        foreach (var (value, key) in new[] { (f.TriplePointTemperature, "triple_point_temperature"), (f.TriplePointPressure, "triple_point_pressure") })
        {
            if (value is null)
            {
                throw new FluidDataException(f.Origin, 0, key, $"fluid '{f.Name}' gives no {key.Replace('_', ' ')}, which the phase diagram starts its solid lines from");
            }
        }

        if (f.SublimationPressureEquation is null && f.EnthalpyOfFusion is null)
        {
            throw new FluidDataException(f.Origin, 0, "enthalpy_of_fusion",
                $"fluid '{f.Name}' gives neither a sublimation_pressure_equation nor an enthalpy_of_fusion, so the phase diagram has no sublimation line");
        }

        if (f.TriplePointTemperature!.Value >= fluid.Model.CriticalTemperature)
        {
            throw new FluidDataException(f.Origin, 0, "triple_point_temperature",
                $"fluid '{f.Name}': the triple point {Chart.Number(f.TriplePointTemperature.Value)} K is not below the model's critical temperature {Chart.Number(fluid.Model.CriticalTemperature)} K");
        }
    }

    /// <summary>Why the fluid has no melting line, or null when it has one.</summary>
    private static string? MeltingMissing(PlotFluid fluid)
    {
        var f = fluid.Fluid;
        if (f.MeltingPressureEquation is not null)
        {
            return null;
        }

        string? missing = f.EnthalpyOfFusion is null ? "enthalpy_of_fusion"
            : f.FusionVolumeChange is null ? "fusion_volume_change (or solid_density)" : null;
        return missing is null ? null
            : $"no melting line: no melting_pressure_equation, nor the {missing} Clapeyron needs";
    }

    /// <summary>Refuses a temperature or pressure range that does not contain the fluid's triple point.</summary>
    /// <exception cref="InvalidInputException">Field "temperature range" or "pressure range".</exception>
    public static void CheckRanges(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        Require(fluid);
        double tt = fluid.Fluid.TriplePointTemperature!.Value, pt = fluid.Fluid.TriplePointPressure!.Value;
        if (options.TemperatureRange is { } tr && !(tr.Low < tt && tr.High > tt))
        {
            throw new InvalidInputException("temperature range", tr.Low,
                $"the phase diagram's temperature range {Chart.Number(tr.Low)} to {Chart.Number(tr.High)} K must contain the triple point {Chart.Number(tt)} K of {fluid.Name}");
        }

        // The vaporization line starts at the triple point or at the model's lowest valid
        // temperature, whichever is higher: the range must reach beyond it.
        double start = Math.Max(tt, CoexistenceSolver.LowestValidTemperature(fluid.Fluid));
        if (options.TemperatureRange is { } reach && !(reach.High > start))
        {
            throw new InvalidInputException("temperature range", reach.High,
                $"the phase diagram's temperature range ends at {Chart.Number(reach.High)} K, not above {Chart.Number(start)} K where the model's vaporization line of {fluid.Name} starts");
        }

        if (options.PressureRange is { } pr && !(pr.Low < pt && pr.High > pt))
        {
            throw new InvalidInputException("pressure range", pr.Low,
                $"the phase diagram's pressure range {Chart.Number(pr.Low)} to {Chart.Number(pr.High)} Pa must contain the triple point {Chart.Number(pt)} Pa of {fluid.Name}");
        }
    }

    /// <summary>"published equation" or "Clapeyron".</summary>
    private static string Method(Core.Fluids.SolidLineEquation? equation) => equation is null ? ClapeyronMethod : PublishedMethod;

    /// <summary>A short citation of a published equation's source ("Span &amp; Wagner 1996", "Wagner et
    /// al. 2011"), or the Clapeyron route.</summary>
    internal static string Cite(string? source)
    {
        if (source is null)
        {
            return "Clapeyron from the triple point";
        }

        // "Span & Wagner, J. Phys. ... (1996)" gives "Span & Wagner 1996"; "Wagner, Riethmann,
        // Feistel & Harvey, ... (2011)" gives "Wagner et al. 2011".
        var year = System.Text.RegularExpressions.Regex.Match(source, @"\((1[89]\d\d|20\d\d)\)");
        int comma = source.IndexOf(',', StringComparison.Ordinal);
        int amp = source.IndexOf(" & ", StringComparison.Ordinal);
        if (!year.Success || comma <= 0)
        {
            return source.Length <= 40 ? source : source[..40].TrimEnd() + "…";
        }

        string authors = amp > 0 && amp < comma ? source[..comma].Trim()
            : amp > 0 && amp < year.Index ? source[..comma].Trim() + " et al."
            : source[..comma].Trim();
        return $"{authors} {year.Groups[1].Value}";
    }

    /// <summary>Numbers beside the points and in notes: five significant figures (273.16 K,
    /// 0.61166 kPa), whole numbers from 100000 on (208566 kPa rather than 2.0857e+05).</summary>
    private static string Show(double value)
        => Math.Abs(value) >= 1e5 ? value.ToString("0", CultureInfo.InvariantCulture) : value.ToString("g5", CultureInfo.InvariantCulture);

    private static ScatterSeries Marker(string title, MarkerType type, DataPoint at)
    {
        var series = new ScatterSeries
        {
            Title = title,
            MarkerType = type,
            MarkerSize = 7,
            Tag = new HouseStyle.BaseSize(7),
            MarkerFill = HouseStyle.Ink,
            MarkerStroke = OxyColors.White,
            MarkerStrokeThickness = 1,
        };
        series.Points.Add(new ScatterPoint(at.X, at.Y));
        return series;
    }

    /// <summary>A marker's label: below and right of the point, or above and left of it.</summary>
    private static TextAnnotation PointLabel(PlotModel model, string text, DataPoint at, bool below)
    {
        var label = new TextAnnotation
        {
            Text = text,
            TextPosition = at,
            TextHorizontalAlignment = below ? HorizontalAlignment.Left : HorizontalAlignment.Right,
            TextVerticalAlignment = below ? VerticalAlignment.Top : VerticalAlignment.Bottom,
            Offset = below ? new ScreenVector(8, 6) : new ScreenVector(-8, -6),
            Stroke = OxyColors.Undefined,
            Background = OxyColor.FromAColor(200, OxyColors.White),
            Padding = new OxyThickness(2),
            FontSize = HouseStyle.BaseLabelFontSize,
            TextColor = HouseStyle.Ink,
        };
        model.Annotations.Add(label);
        return label;
    }

    /// <summary>The place (T, P) of a region's label with the most room around it, or null.</summary>
    private static (double T, double P)? Place(string region, PhaseMap map, Window window, List<(double X0, double Y0, double X1, double Y1)> obstacles)
    {
        const int Grid = 60;
        string text = LabelText(region);
        double hx = LabelHalfWidth(text), hy = LabelHalfHeight * text.Split('\n').Length;
        (double T, double P)? best = null;
        double room = 1.05; // in label half-sizes: the box clear of every line, with a little space
        for (int i = 0; i <= Grid; i++)
        {
            for (int j = 0; j <= Grid; j++)
            {
                double x = (double)i / Grid, y = (double)j / Grid;
                // The frame is an obstacle too: the box stays inside the plot area.
                double clear = Math.Min(Math.Min(x / hx, (1 - x) / hx), Math.Min(y / hy, (1 - y) / hy));
                if (clear <= room)
                {
                    continue;
                }

                var (t, p) = window.Point(x, y);
                if (map.Region(t, p) != region)
                {
                    continue;
                }

                foreach (var s in obstacles)
                {
                    clear = Math.Min(clear, Distance(x, y, s, hx, hy));
                    if (clear <= room)
                    {
                        break;
                    }
                }

                if (clear > room)
                {
                    room = clear;
                    best = (t, p);
                }
            }
        }

        return best;
    }

    /// <summary>The distance from (x, y) to a segment, in label half-widths across and half-heights up.</summary>
    private static double Distance(double x, double y, (double X0, double Y0, double X1, double Y1) s, double hx, double hy)
    {
        double ax = s.X0 / hx, ay = s.Y0 / hy, bx = s.X1 / hx, by = s.Y1 / hy, px = x / hx, py = y / hy;
        double dx = bx - ax, dy = by - ay;
        double length2 = dx * dx + dy * dy;
        double u = length2 > 0 ? Math.Clamp(((px - ax) * dx + (py - ay) * dy) / length2, 0, 1) : 0;
        double ex = ax + u * dx - px, ey = ay + u * dy - py;
        return Math.Sqrt(ex * ex + ey * ey);
    }

    /// <summary>The plot area: T linear, ln P linear, as fractions 0..1 of its width and height.</summary>
    private readonly record struct Window(double TLow, double THigh, double LnPLow, double LnPHigh)
    {
        public (double X, double Y) Fraction(double t, double p) => ((t - TLow) / (THigh - TLow), (Math.Log(p) - LnPLow) / (LnPHigh - LnPLow));

        public (double T, double P) Point(double x, double y) => (TLow + x * (THigh - TLow), Math.Exp(LnPLow + y * (LnPHigh - LnPLow)));
    }
}

/// <summary>Which region of the P–T diagram a point lies in, from the drawn lines (interpolated
/// in ln P between their points).</summary>
internal sealed class PhaseMap(double tt, double pt, double tc, double pc,
    IReadOnlyList<(double T, double P)> sublimation, IReadOnlyList<(double T, double P)> melting, IReadOnlyList<(double T, double P)> vaporization)
{
    /// <summary>The region at (T, P), or null where the drawn lines do not decide it (below the
    /// sublimation line's drawn end, above the melting line's, in the gap between the model's vapour
    /// pressure at the triple point and the sourced one, and for a gas above Tc below Pc).</summary>
    public string? Region(double t, double p)
    {
        if (p < pt)
        {
            double? tSub = TemperatureAt(sublimation, p);
            if (tSub is null)
            {
                return null;
            }

            return t < tSub ? PhaseDiagram.Solid : t < tc ? PhaseDiagram.Vapour : null;
        }

        if (melting.Count == 0)
        {
            // Without a melting line the solid's edge above P_t is unknown: only the regions right
            // of the vaporization line and above the critical point are decided.
            double? edge = p < pc ? TemperatureAt(vaporization, p) : null;
            return p >= pc && t >= tc ? PhaseDiagram.Supercritical
                : edge is not null && t > edge && t < tc ? PhaseDiagram.Vapour : null;
        }

        double? tMelt = TemperatureAt(melting, p);
        if (tMelt is null)
        {
            return null;
        }

        if (t < tMelt)
        {
            return PhaseDiagram.Solid;
        }

        if (p >= pc)
        {
            return t < tc ? PhaseDiagram.Liquid : PhaseDiagram.Supercritical;
        }

        double? tVap = TemperatureAt(vaporization, p);
        if (tVap is null)
        {
            return null;
        }

        return t < tVap ? PhaseDiagram.Liquid : t < tc ? PhaseDiagram.Vapour : null;
    }

    /// <summary>The temperature where a line (monotonic in P) reaches P, or null outside its drawn pressures.</summary>
    private static double? TemperatureAt(IReadOnlyList<(double T, double P)> line, double p)
    {
        for (int i = 1; i < line.Count; i++)
        {
            var (t0, p0) = line[i - 1];
            var (t1, p1) = line[i];
            if ((p >= p0 && p <= p1) || (p >= p1 && p <= p0))
            {
                double u = p0 == p1 ? 0 : Math.Log(p / p0) / Math.Log(p1 / p0);
                return t0 + u * (t1 - t0);
            }
        }

        return null;
    }

    /// <summary>The triple-point temperature the map was built with, K.</summary>
    public double TriplePointTemperature => tt;
}
