using MathNet.Numerics.RootFinding;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Solids;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Plots.Tests;

/// <summary>The whole P–T phase diagram: its three lines from the sourced triple point, the melting
/// line's direction, the logarithmic pressure axis and the region labels, checked against the
/// solid lines and the solver computed afresh.</summary>
/// <remarks>Reference data (all from memory): water's triple point 273.16 K, 611.657 Pa (IAPWS-95,
/// Wagner and Pruß 2002) and ice Ih's melting line falling with pressure (IAPWS R14-08(2011),
/// Wagner et al. 2011; ice is less dense than water); carbon dioxide's triple point 216.592 K,
/// 0.51795 MPa and its melting line rising with pressure (Span and Wagner 1996).</remarks>
public class PhaseDiagramTests
{
    private static readonly DiagramOptions Few = new() { Points = 30 };

    public static TheoryData<string, double, double, int> Fluids => new()
    {
        // name, Tt (K), Pt (Pa), sign of the melting slope dP/dT
        { "water", 273.16, 611.657, -1 },
        { "carbon dioxide", 216.592, 0.51795e6, +1 },
    };

    private static LineSeries Line(PlotModel model, string prefix)
        => model.Series.OfType<LineSeries>().Single(s => s.Title is not null && s.Title.StartsWith(prefix, StringComparison.Ordinal));

    private static void Near(double expected, double actual, double relative, string what)
        => Assert.True(Math.Abs(actual - expected) <= relative * Math.Abs(expected), $"{what}: expected {expected:R}, got {actual:R} (relative {(actual - expected) / expected:E2})");

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Three_lines_share_the_sourced_triple_point(string name, double tt, double pt, int _)
    {
        var fluid = TestFluids.Get(name);
        var model = PhaseDiagram.Build(fluid, Few);
        var sublimation = Line(model, PhaseDiagram.SublimationTitle);
        var melting = Line(model, PhaseDiagram.MeltingTitle);
        var vaporization = Line(model, PhaseDiagram.VaporizationTitle);

        // SI axes: K and kPa. The solid lines are evaluated at T_t itself, where both published
        // equations reduce to P_r = P_t exactly; 1e-9 leaves room only for rounding in the kPa conversion.
        Near(tt, sublimation.Points[^1].X, 1e-9, "sublimation end T");
        Near(pt / 1e3, sublimation.Points[^1].Y, 1e-9, "sublimation end P");
        Near(tt, melting.Points[0].X, 1e-9, "melting start T");
        Near(pt / 1e3, melting.Points[0].Y, 1e-9, "melting start P");
        Near(tt, vaporization.Points[0].X, 1e-9, "vaporization start T");
        // The vaporization line is the model's: it starts at the model's vapour pressure at T_t
        // (the solver's own number to 1e-9), which misses P_t by the model's error there; the
        // figure says by how much.
        var solver = fluid.Solver();
        double modelPt = solver.AtTemperature(tt).Pressure;
        Near(modelPt / 1e3, vaporization.Points[0].Y, 1e-9, "vaporization start P");
        double deviation = new SolidPhaseLines(fluid.Fluid, solver).Check.RelativeDeviation;
        Assert.Contains(FormattableString.Invariant($"{100 * deviation:+0.00;-0.00;0} %"), model.Subtitle, StringComparison.Ordinal);

        var triple = model.Series.OfType<ScatterSeries>().Single(s => s.Title == PhaseDiagram.TriplePointTitle).Points.Single();
        Near(tt, triple.X, 1e-12, "triple point marker T");
        Near(pt / 1e3, triple.Y, 1e-12, "triple point marker P");
        Assert.Contains(model.Annotations.OfType<TextAnnotation>(), a => a.Text?.StartsWith("triple point: ", StringComparison.Ordinal) == true && a.Text.Contains(" K, ", StringComparison.Ordinal));

        // The vaporization line ends at the model's critical point, marked there.
        var critical = model.Series.OfType<ScatterSeries>().Single(s => s.Title == PhaseDiagram.CriticalPointTitle).Points.Single();
        Near(solver.CriticalTemperature, vaporization.Points[^1].X, 1e-12, "Tc");
        Near(solver.CriticalPressure / 1e3, critical.Y, 1e-12, "Pc marker");
        Assert.Contains(model.Annotations.OfType<TextAnnotation>(), a => a.Text?.StartsWith("critical point: ", StringComparison.Ordinal) == true);
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Melting_slope_has_the_fluids_sign_and_the_lines_rise_with_temperature(string name, double tt, double pt, int sign)
    {
        var model = PhaseDiagram.Build(TestFluids.Get(name), Few);
        var melting = Line(model, PhaseDiagram.MeltingTitle).Points;
        // Every plotted step of the melting line climbs in pressure and moves in temperature the
        // way the sign of dv_fus says: towards lower T for water, higher T for carbon dioxide.
        for (int i = 1; i < melting.Count; i++)
        {
            double dp = melting[i].Y - melting[i - 1].Y, dt = melting[i].X - melting[i - 1].X;
            Assert.True(dp > 0, $"{name}: melting pressure falls at point {i}");
            Assert.Equal(sign, Math.Sign(dp / dt));
        }

        foreach (string title in new[] { PhaseDiagram.SublimationTitle, PhaseDiagram.VaporizationTitle })
        {
            var points = Line(model, title).Points;
            Assert.True(points.Zip(points.Skip(1)).All(p => p.Second.X > p.First.X && p.Second.Y > p.First.Y), $"{name}: {title} is not rising");
        }

        // The sublimation line reaches down to 1e-3 P_t, or stops at its own lower end above it.
        var sublimation = Line(model, PhaseDiagram.SublimationTitle).Points;
        Assert.True(sublimation[0].Y >= PhaseDiagram.LowestPressureFraction * pt / 1e3 * (1 - 1e-6), $"{name}: sublimation starts below 1e-3 Pt");
        Assert.True(sublimation[0].X < tt);
        Assert.Contains(PhaseDiagram.PublishedMethod, Line(model, PhaseDiagram.SublimationTitle).Title, StringComparison.Ordinal);
        Assert.Contains(PhaseDiagram.PublishedMethod, Line(model, PhaseDiagram.MeltingTitle).Title, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Pressure_axis_is_logarithmic_from_the_sublimation_line_to_ten_times_pc(string name, double tt, double pt, int sign)
    {
        var fluid = TestFluids.Get(name);
        var model = PhaseDiagram.Build(fluid, Few);
        var pAxis = Assert.IsType<LogarithmicAxis>(model.Axes.Single(a => a.Position == AxisPosition.Left));
        Assert.Equal(10, pAxis.Base);
        Assert.IsType<LinearAxis>(model.Axes.Single(a => a.Position == AxisPosition.Bottom));
        Near(PhaseDiagram.TopPressureFactor * fluid.Solver().CriticalPressure / 1e3, pAxis.Maximum, 1e-12, "top of the axis");
        // The bottom sits below the sublimation line's first point, which is at the triple point's
        // temperature or below (both melting directions: sign {sign}).
        Assert.True(pAxis.Minimum < Line(model, PhaseDiagram.SublimationTitle).Points[0].Y && pAxis.Minimum < pt / 1e3, $"{name}: bottom {pAxis.Minimum} kPa, sign {sign}");
        Assert.True(model.Axes.Single(a => a.Position == AxisPosition.Bottom).Minimum < tt);
        // Every plotted point lies inside the axis.
        foreach (var line in model.Series.OfType<LineSeries>())
        {
            Assert.All(line.Points, p => Assert.InRange(p.Y, pAxis.Minimum * (1 - 1e-12), pAxis.Maximum * (1 + 1e-12)));
        }
    }

    [Fact]
    public void Melting_line_of_carbon_dioxide_is_cut_at_the_top_with_a_note_and_water_ends_at_its_equations_range()
    {
        var co2 = PhaseDiagram.Build(TestFluids.Get("carbon dioxide"), Few);
        double top = co2.Axes.Single(a => a.Position == AxisPosition.Left).Maximum;
        Near(top, Line(co2, PhaseDiagram.MeltingTitle).Points[^1].Y, 1e-9, "carbon dioxide melting line end");
        Assert.Contains("note: the melting line goes on beyond the plot, to 799", co2.Subtitle, StringComparison.Ordinal);

        // Ice Ih's equation ends at 251.165 K (IAPWS R14-08(2011), its range), below 10 Pc.
        var water = PhaseDiagram.Build(TestFluids.Get("water"), Few);
        Near(251.165, Line(water, PhaseDiagram.MeltingTitle).Points[^1].X, 1e-12, "ice Ih melting line end");
        Assert.Contains("note: the melting line ends at 251.1", water.Subtitle, StringComparison.Ordinal);
    }

    /// <summary>The region at (T, P) from the lines computed afresh (not from the drawn points): below
    /// P_t solid left of the sublimation temperature; above it solid left of the melting temperature
    /// (melting happens on heating, whichever way the line leans); then liquid left of the model's
    /// saturation temperature or of Tc above Pc, supercritical fluid above both Tc and Pc.</summary>
    private static string Region(PlotFluid fluid, double t, double p)
    {
        var solver = fluid.Solver();
        var lines = new SolidPhaseLines(fluid.Fluid, solver);
        double tt = lines.TriplePointTemperature, pt = lines.TriplePointPressure;
        if (p < pt)
        {
            var (low, _) = lines.DefaultRange(PhaseLineKind.Sublimation);
            double ts = Brent.FindRoot(x => lines.Sublimation(x).Pressure - p, low, tt, 1e-10, 200);
            return t < ts ? PhaseDiagram.Solid : PhaseDiagram.Vapour;
        }

        var (mLow, mHigh) = lines.DefaultRange(PhaseLineKind.Melting);
        double tm = Brent.FindRoot(x => lines.Melting(x).Pressure - p, mLow, mHigh, 1e-10, 200);
        if (t < tm)
        {
            return PhaseDiagram.Solid;
        }

        double tc = solver.CriticalTemperature, pc = solver.CriticalPressure;
        if (p >= pc)
        {
            return t < tc ? PhaseDiagram.Liquid : PhaseDiagram.Supercritical;
        }

        return t < solver.AtPressure(p).Temperature ? PhaseDiagram.Liquid : PhaseDiagram.Vapour;
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Region_labels_lie_inside_their_regions(string name, double tt, double pt, int sign)
    {
        var fluid = TestFluids.Get(name);
        var model = PhaseDiagram.Build(fluid, Few);
        var labels = model.Annotations.OfType<TextAnnotation>()
            .Where(a => a.Text is "solid" or "liquid" or "vapour" || a.Text == PhaseDiagram.LabelText(PhaseDiagram.Supercritical))
            .ToDictionary(a => a.Text!.Replace('\n', ' '), a => a.TextPosition);
        Assert.Equal(["liquid", "solid", "supercritical fluid", "vapour"], labels.Keys.Order(StringComparer.Ordinal));
        foreach (var (region, at) in labels)
        {
            // SI axes: K and kPa.
            Assert.Equal(region, Region(fluid, at.X, at.Y * 1e3));
        }

        // The solid label of water sits left of its melting line at its own pressure, which for the
        // negative slope means left of T_t too; carbon dioxide's liquid sits right of its rising line.
        var solid = labels["solid"];
        var lines = new SolidPhaseLines(fluid.Fluid, fluid.Solver());
        if (sign < 0)
        {
            Assert.True(solid.X < tt, $"water: solid label at {solid.X} K is not left of the triple point");
        }
        else
        {
            var liquid = labels["liquid"];
            double tm = Brent.FindRoot(x => lines.Melting(x).Pressure - liquid.Y * 1e3, tt, lines.DefaultRange(PhaseLineKind.Melting).High, 1e-10, 200);
            Assert.True(liquid.X > tm && tm > tt, $"carbon dioxide: liquid label at {liquid.X} K is not right of the melting line ({tm} K)");
        }

        var critical = model.Series.OfType<ScatterSeries>().Single(s => s.Title == PhaseDiagram.CriticalPointTitle).Points.Single();
        Assert.True(labels["supercritical fluid"].X > critical.X && labels["supercritical fluid"].Y > critical.Y);
        _ = pt;
    }

    [Fact]
    public void Engineering_units_convert_the_axes_and_the_point_labels()
    {
        var model = PhaseDiagram.Build(TestFluids.Get("water"), Few with { Units = PlotUnits.Engineering });
        var triple = model.Series.OfType<ScatterSeries>().Single(s => s.Title == PhaseDiagram.TriplePointTitle).Points.Single();
        // 273.16 K is 0.01 °C and 611.657 Pa is 0.00611657 bar (exact conversions).
        Assert.Equal(0.01, triple.X, 9);
        Near(0.00611657, triple.Y, 1e-12, "Pt in bar");
        Assert.Contains(model.Annotations.OfType<TextAnnotation>(), a => a.Text == "triple point: 0.01 °C, 0.0061166 bar");
        Assert.Equal("bar", model.Axes.Single(a => a.Position == AxisPosition.Left).Unit);
    }

    [Fact]
    public void Ranges_set_the_window_and_must_contain_the_triple_point()
    {
        var water = TestFluids.Get("water");
        var model = PhaseDiagram.Build(water, Few with { TemperatureRange = new ValueRange(240, 420), PressureRange = new ValueRange(100, 1e6) });
        var tAxis = model.Axes.Single(a => a.Position == AxisPosition.Bottom);
        var pAxis = model.Axes.Single(a => a.Position == AxisPosition.Left);
        Assert.Equal((240, 420), (tAxis.Minimum, tAxis.Maximum));
        Assert.Equal((0.1, 1000), (pAxis.Minimum, pAxis.Maximum));
        // The vaporization line stops at the right end; Tc is off the chart, so it has no marker.
        Near(420, Line(model, PhaseDiagram.VaporizationTitle).Points[^1].X, 1e-12, "vaporization end");
        Assert.DoesNotContain(model.Series, s => s.Title == PhaseDiagram.CriticalPointTitle);
        // The melting line is cut at 1 MPa; the note gives the end of ice Ih's equation (251.165 K).
        Near(1000, Line(model, PhaseDiagram.MeltingTitle).Points[^1].Y, 1e-9, "melting line cut at the top");
        Assert.Contains("note: the melting line goes on beyond the plot, to 208567 kPa at 251.1", model.Subtitle, StringComparison.Ordinal);

        var ex = Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [water], Few with { TemperatureRange = new ValueRange(280, 700) }));
        Assert.Equal("temperature range", ex.Field);
        ex = Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [water], Few with { PressureRange = new ValueRange(1e3, 1e8) }));
        Assert.Equal("pressure range", ex.Field);
    }

    [Fact]
    public void A_fluid_without_a_triple_point_pressure_is_refused_naming_the_key()
    {
        var propane = TestFluids.Propane;
        var fluid = propane with { Fluid = propane.Fluid with { TriplePointPressure = null } };
        var ex = Assert.Throws<FluidDataException>(() => Diagram.Build(DiagramKind.Phase, [fluid], Few));
        Assert.Equal("triple_point_pressure", ex.Field);
    }

    [Fact]
    public void Without_melting_data_the_melting_line_is_left_out_with_a_note_and_without_sublimation_data_refused()
    {
        var water = TestFluids.Get("water");
        var noMelting = water with { Fluid = water.Fluid with { MeltingPressureEquation = null, FusionVolumeChange = null, SolidDensity = null, TriplePointLiquidDensity = null } };
        var model = Diagram.Build(DiagramKind.Phase, [noMelting], Few);
        Assert.DoesNotContain(model.Series, s => s.Title?.StartsWith(PhaseDiagram.MeltingTitle, StringComparison.Ordinal) == true);
        Assert.Contains("note: no melting line: no melting_pressure_equation, nor the fusion_volume_change", model.Subtitle, StringComparison.Ordinal);
        Line(model, PhaseDiagram.SublimationTitle);

        var noSublimation = water with { Fluid = water.Fluid with { SublimationPressureEquation = null, EnthalpyOfFusion = null } };
        var ex = Assert.Throws<FluidDataException>(() => Diagram.Build(DiagramKind.Phase, [noSublimation], Few));
        Assert.Equal("enthalpy_of_fusion", ex.Field);
    }

    [Fact]
    public void Clapeyron_lines_are_drawn_and_labelled_as_such_when_the_file_has_no_equations()
    {
        var water = TestFluids.Get("water");
        var clapeyron = water with { Fluid = water.Fluid with { MeltingPressureEquation = null, SublimationPressureEquation = null } };
        var model = PhaseDiagram.Build(clapeyron, Few);
        var melting = Line(model, PhaseDiagram.MeltingTitle);
        Assert.Contains(PhaseDiagram.ClapeyronMethod, melting.Title, StringComparison.Ordinal);
        Assert.Contains(PhaseDiagram.ClapeyronMethod, Line(model, PhaseDiagram.SublimationTitle).Title, StringComparison.Ordinal);
        // Constant dh_fus/dv_fus: still the negative slope of water, and the line meets P_t at T_t.
        Assert.True(melting.Points[^1].X < melting.Points[0].X);
        Near(611.657e-3, melting.Points[0].Y, 1e-9, "Clapeyron melting start");
        Near(611.657e-3, Line(model, PhaseDiagram.SublimationTitle).Points[^1].Y, 1e-9, "Clapeyron sublimation end");
    }

    [Fact]
    public void Vaporization_starts_at_the_triple_point_or_at_the_models_lowest_valid_temperature_with_a_note()
    {
        // Propane's triple point, 85.525 K and 1.72e-4 Pa (Lemmon, McLinden and Wagner, J. Chem. Eng.
        // Data 54, 3141 (2009)), and its enthalpy of fusion 3.53 kJ/mol (CRC Handbook), all from
        // memory, set on the catalog fluid for this test: the Clapeyron route draws the sublimation
        // line, and with no fusion volume there is no melting line.
        var propane = TestFluids.Propane;
        var catalog = propane.Fluid;
        var fluid = propane with
        {
            Fluid = catalog with
            {
                TriplePointTemperature = catalog.CriticalTemperature with { Value = 85.525 },
                TriplePointPressure = catalog.CriticalPressure with { Value = 1.72e-4 },
                EnthalpyOfFusion = catalog.CriticalPressure with { Value = 3530 },
                FusionVolumeChange = null,
                SolidDensity = null,
                TriplePointLiquidDensity = null,
                MeltingPressureEquation = null,
                SublimationPressureEquation = null,
            },
        };
        var model = PhaseDiagram.Build(fluid, Few);
        var vaporization = Line(model, PhaseDiagram.VaporizationTitle);
        double lowest = fluid.Solver().MinimumTemperature;
        // Where the model's lowest valid temperature (0.3 Tc for propane while it is above the
        // triple point) is above T_t, the line starts there and a note says so; else at T_t.
        Near(Math.Max(lowest, 85.525), vaporization.Points[0].X, 1e-12, "vaporization start");
        Assert.Equal(lowest > 85.525, model.Subtitle.Contains("starts at its lowest valid temperature", StringComparison.Ordinal));
        Assert.Contains(PhaseDiagram.ClapeyronMethod, Line(model, PhaseDiagram.SublimationTitle).Title, StringComparison.Ordinal);
        Near(1.72e-7, Line(model, PhaseDiagram.SublimationTitle).Points[^1].Y, 1e-9, "sublimation end at Pt (kPa)");
        Assert.Contains("note: no melting line", model.Subtitle, StringComparison.Ordinal);

        var ex = Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [fluid], Few with { TemperatureRange = new ValueRange(60, Math.Max(lowest, 85.525)) }));
        Assert.Equal("temperature range", ex.Field);
    }

    [Fact]
    public void Phase_diagram_refuses_options_it_does_not_have()
    {
        var water = TestFluids.Get("water");
        Assert.Equal("log", Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [water], Few with { Logarithmic = true })).Field);
        Assert.Equal("reduced", Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [water], Few with { Reduced = true })).Field);
        Assert.Equal("fluids", Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Phase, [water, TestFluids.Get("carbon dioxide")], Few)).Field);
    }

    [Theory]
    [InlineData("Span & Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996), melting pressure equation", "Span & Wagner 1996")]
    [InlineData("Wagner, Riethmann, Feistel & Harvey, J. Phys. Chem. Ref. Data 40, 043103 (2011) (IAPWS R14-08(2011))", "Wagner et al. 2011")]
    [InlineData("Smith, J. Chem. Eng. Data 10, 1 (1965)", "Smith 1965")]
    [InlineData("from memory", "from memory")]
    public void Sources_are_cited_short(string source, string expected)
        => Assert.Equal(expected, PhaseDiagram.Cite(source));
}
