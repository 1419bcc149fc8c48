using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Series;
using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Plots.Tests;

/// <summary>The p-h and t-s charts an engineer reads: reference, round-valued lines, isentropes,
/// isochores, ranges, names and the vapour-compression cycle.</summary>
public class PropertyChartTests
{
    private static readonly DiagramOptions Engineering = new() { Points = 30, Units = PlotUnits.Engineering };
    private static readonly PlotFluid R134a = TestFluids.Get("r-134a");

    private static LineSeries Titled(PlotModel model, string title) => model.Series.OfType<LineSeries>().Single(s => s.Title == title);

    private static PropertyModel Properties(ReferenceState reference) => new(R134a.Fluid, R134a.Model, reference);

    private static double M => R134a.Fluid.MolarMass!.Value;

    [Fact]
    public void Refrigeration_reference_puts_the_saturated_liquid_at_0_degC_at_200_kJ_per_kg()
    {
        // The refrigeration convention (common practice): saturated liquid at 0 °C, h = 200 kJ/kg.
        // One isotherm asked for at 0 °C: its left end inside the dome is that liquid. The offset
        // is added once to h values of ~4e4 J/mol, so the kJ/kg value carries ~1e-12 rounding.
        var model = PressureEnthalpyDiagram.Build(R134a, Engineering with { Reference = ReferenceState.Refrigeration, Isotherms = [273.15] });
        var isotherm = Titled(model, "isotherms (°C)");
        double pSat = R134a.Solver().AtTemperature(273.15).Pressure / 1e5;
        var flat = isotherm.Points.Where(p => p.Y == pSat).ToList();
        Assert.Equal(2, flat.Count);
        Assert.Equal(200, flat[0].X, 9);
        Assert.Contains("saturated liquid at 0 degC", model.Subtitle, StringComparison.Ordinal);

        // On the default reference the same liquid sits elsewhere: the option is honoured.
        var ideal = Titled(PressureEnthalpyDiagram.Build(R134a, Engineering with { Isotherms = [273.15] }), "isotherms (°C)");
        Assert.True(Math.Abs(ideal.Points.First(p => p.Y == pSat).X - 200) > 50);
    }

    [Fact]
    public void Automatic_isotherms_and_isobars_sit_at_round_values_of_the_display_unit()
    {
        var ph = PressureEnthalpyDiagram.Build(R134a, Engineering);
        var isothermLabels = ph.Annotations.OfType<TextAnnotation>().Where(a => a.TextColor == HouseStyle.Colour(0)).Select(a => double.Parse(a.Text!, System.Globalization.CultureInfo.InvariantCulture)).ToList();
        // Default span 0.55 Tc (−67 °C) to 1.2 Tc (176 °C): a 20 K step, −60 … 160 °C.
        Assert.Equal([-60, -40, -20, 0, 20, 40, 60, 80, 100, 120, 140, 160], isothermLabels);
        // Each isotherm below Tc is flat across the dome at the model's saturation pressure at that
        // temperature (the solver's own value; the same double, so equality).
        var isotherms = ph.Series.OfType<LineSeries>().Where(s => s.Color == HouseStyle.Colour(0)).ToList();
        Assert.Equal(isothermLabels.Count, isotherms.Count);
        double pSat = R134a.Solver().AtTemperature(273.15 + 40).Pressure / 1e5;
        Assert.Equal(2, isotherms[5].Points.Count(p => Math.Abs(p.Y - pSat) <= 1e-12 * pSat));

        var ts = TemperatureEntropyDiagram.Build(R134a, Engineering);
        var isobarLabels = ts.Annotations.OfType<TextAnnotation>().Where(a => a.TextColor == HouseStyle.Colour(0)).Select(a => a.Text).ToList();
        // From above the dome's lowest pressure (0.0043 bar at 169.85 K) up to 2 Pc (81 bar): 1-2-5
        // values would be 13 lines, more than 10, so 1 and 3 per decade.
        Assert.Equal(["0.01", "0.03", "0.1", "0.3", "1", "3", "10", "30"], isobarLabels);
    }

    [Theory]
    [InlineData(new[] { 1.0, 2.0, 5.0 }, 0.9, 6.0, 10)]
    public void Round_values_follow_the_1_2_5_rule(double[] expected, double low, double high, int most)
        => Assert.Equal(expected, RoundValues.Logarithmic(low, high, most));

    [Fact]
    public void Round_linear_steps()
    {
        Assert.Equal([-40, -20, 0, 20, 40], RoundValues.Linear(-45, 41, 5));
        Assert.Equal([1.7, 1.8, 1.9, 2.0], RoundValues.Linear(1.69, 2.05, 4));
        Assert.Equal(0.05, RoundValues.Step(0.043), 15);
    }

    [Fact]
    public void Isentropes_hold_their_entropy_along_the_whole_line()
    {
        var reference = ReferenceState.Refrigeration;
        var model = PressureEnthalpyDiagram.Build(R134a, Engineering with { Reference = reference });
        var isentropes = model.Series.OfType<LineSeries>().Where(s => s.LineStyle == LineStyle.Dash).ToList();
        Assert.True(isentropes.Count >= 5, $"{isentropes.Count} isentropes");
        var properties = Properties(reference);
        foreach (var line in isentropes)
        {
            // Each plotted (h, P) read back by the (P, h) flash, an independent root from the (P, s)
            // one that drew it: both meet their specification to 1e-12 relative, so s agrees to
            // far better than the 1e-7 kJ/(kg K) asked here.
            var s = line.Points.Select(p =>
            {
                var state = properties.Flash(StateProperty.Pressure, p.Y * 1e5, StateProperty.Enthalpy, p.X * 1e3 * M);
                Assert.Null(state.Quality);
                return state.Entropy!.Value / M / 1e3;
            }).ToList();
            foreach (double v in s)
            {
                Assert.Equal(s[0], v, 1e-7);
            }

            // A round value in kJ/(kg K): a multiple of 0.05.
            Assert.Equal(Math.Round(s[0] / 0.05) * 0.05, s[0], 1e-7);
        }
    }

    [Fact]
    public void Quality_lines_are_labelled_and_isochores_are_drawn_when_asked()
    {
        var plain = PressureEnthalpyDiagram.Build(R134a, Engineering);
        var labels = plain.Annotations.OfType<TextAnnotation>().Select(a => a.Text).ToList();
        Assert.Contains("x = 0.1", labels);
        Assert.Contains("0.9", labels);
        Assert.DoesNotContain(plain.Series.OfType<LineSeries>(), s => s.LineStyle == LineStyle.DashDot);

        // Two isochores asked for in mol/m³ (converted from 20 and 100 kg/m³): on the vapour side of
        // the dome each point is the model's state at that density (checked at the hottest point).
        double[] rho = [20 / M, 100 / M];
        var with = PressureEnthalpyDiagram.Build(R134a, Engineering with { Isochores = rho });
        var isochores = with.Series.OfType<LineSeries>().Where(s => s.LineStyle == LineStyle.DashDot).ToList();
        Assert.Equal(2, isochores.Count);
        var properties = Properties(ReferenceState.IdealGas);
        var hot = properties.AtDensity(1.2 * R134a.Model.CriticalTemperature, rho[0]);
        Assert.Equal(hot.Enthalpy!.Value / M / 1e3, isochores[0].Points[^1].X, 1e-9);
        Assert.Equal(hot.Pressure / 1e5, isochores[0].Points[^1].Y, 1e-9);
    }

    [Fact]
    public void Ranges_set_the_axes_and_the_dome_start()
    {
        var options = Engineering with
        {
            TemperatureRange = new ValueRange(233.15, 373.15),
            PressureRange = new ValueRange(0.5e5, 50e5),
            EnthalpyRange = new ValueRange(150e3 * M, 480e3 * M),
        };
        var model = PressureEnthalpyDiagram.Build(R134a, options);
        var h = model.Axes.Single(a => a.Position == OxyPlot.Axes.AxisPosition.Bottom);
        var p = model.Axes.Single(a => a.Position == OxyPlot.Axes.AxisPosition.Left);
        Assert.Equal(150, h.Minimum, 9);
        Assert.Equal(480, h.Maximum, 9);
        Assert.Equal(0.5, p.Minimum, 12);
        Assert.Equal(50, p.Maximum, 12);
        // The dome starts at -40 °C: its lowest point is the saturation pressure there.
        var dome = Titled(model, "saturated liquid and vapour");
        Assert.Equal(R134a.Solver().AtTemperature(233.15).Pressure / 1e5, dome.Points[0].Y, 9);

        var ts = TemperatureEntropyDiagram.Build(R134a, Engineering with { TemperatureRange = new ValueRange(233.15, 373.15) });
        var t = ts.Axes.Single(a => a.Position == OxyPlot.Axes.AxisPosition.Left);
        Assert.Equal(-40, t.Minimum, 9);
        Assert.Equal(100, t.Maximum, 9);
    }

    [Fact]
    public void An_isotherm_at_the_bottom_of_the_dome_runs_liquid_then_across_without_a_stray_point()
    {
        // The range starts at -40 °C, itself a round value: that isotherm meets the lowest pressure
        // exactly at its saturation pressure. The line is the liquid down to Psat, then across the
        // dome, ending at the saturated vapour; no point of the liquid branch may be a vapour state
        // (at exactly Psat the stable root is either phase). The compressed liquid's h differs
        // from the saturated liquid's by ∫v(1 − Tα)dP, about 10 kJ/kg at 3 Pc (122 bar); the vapour
        // is ~200 kJ/kg away, so a band of ±20 kJ/kg tells them apart.
        var model = PressureEnthalpyDiagram.Build(R134a, Engineering with { TemperatureRange = new ValueRange(233.15, 373.15), Isotherms = [233.15] });
        var line = Titled(model, "isotherms (°C)");
        var sat = Properties(ReferenceState.IdealGas).Coexistence(R134a.Solver().AtTemperature(233.15));
        double hL = sat.Liquid.State.Enthalpy!.Value / M / 1e3, hV = sat.Vapour.State.Enthalpy!.Value / M / 1e3;
        Assert.Equal(hV, line.Points[^1].X, 1e-9);
        Assert.Equal(hL, line.Points[^2].X, 1e-9);
        Assert.All(line.Points.SkipLast(1), p => Assert.InRange(p.X, hL - 20, hL + 20));
        Assert.True(line.Points.Zip(line.Points.Skip(1)).All(p => p.Second.Y <= p.First.Y), "P falls along the isotherm");
    }

    [Fact]
    public void Titles_name_the_fluid_as_the_trade_writes_it_without_nested_brackets()
    {
        Assert.Equal("R-134a", R134a.Name);
        Assert.Equal("R-1233zd(E)", TestFluids.Get("r-1233zd-e").Name);
        Assert.Equal("R-32", TestFluids.Get("r-32").Name);
        Assert.Equal("propane", TestFluids.Propane.Name);
        Assert.Equal("P–h diagram of R-134a", PressureEnthalpyDiagram.Build(R134a, Engineering).Title);
        var two = new[] { TestFluids.Get("r-134a"), TestFluids.Get("r-32") };
        foreach (var kind in new[] { DiagramKind.PressureTemperature, DiagramKind.Slope, DiagramKind.Latent, DiagramKind.TemperatureDensity, DiagramKind.LnPressureInverseTemperature })
        {
            AssertNoNestedBrackets(Diagram.Build(kind, two, Engineering));
        }

        foreach (var kind in new[] { DiagramKind.PressureVolume, DiagramKind.TemperatureEntropy, DiagramKind.PressureEnthalpy })
        {
            AssertNoNestedBrackets(Diagram.Build(kind, [R134a], Engineering));
        }
    }

    private static void AssertNoNestedBrackets(PlotModel model)
    {
        foreach (string text in new[] { model.Title, model.Subtitle ?? "" })
        {
            int depth = 0, deepest = 0;
            foreach (char c in text)
            {
                depth += c == '(' ? 1 : c == ')' ? -1 : 0;
                deepest = Math.Max(deepest, depth);
            }

            Assert.True(deepest <= 1, $"nested brackets in '{text}'");
        }
    }

    [Fact]
    public void Cycle_is_drawn_through_its_states_with_its_COP_in_the_legend()
    {
        var spec = new VapourCompressionSpecification(263.15, 313.15, 5, 3, 0.75);
        var model = PressureEnthalpyDiagram.Build(R134a, Engineering with { Reference = ReferenceState.Refrigeration, Cycle = spec });
        var cycle = VapourCompressionCycle.Compute(Properties(ReferenceState.Refrigeration), spec);
        var line = model.Series.OfType<LineSeries>().Single(s => s.Title?.StartsWith("cycle", StringComparison.Ordinal) == true);
        Assert.Contains($"COP {Chart.Number(cycle.CoefficientOfPerformance)}", line.Title, StringComparison.Ordinal);
        // 1 → 2 → 3 → 4 → 1, in kJ/kg and bar.
        var path = new[] { cycle.Suction, cycle.Discharge, cycle.CondenserOutlet, cycle.EvaporatorInlet, cycle.Suction };
        Assert.Equal(path.Length, line.Points.Count);
        foreach (var (state, point) in path.Zip(line.Points))
        {
            Assert.Equal(state.Enthalpy!.Value / M / 1e3, point.X, 1e-12);
            Assert.Equal(state.Pressure / 1e5, point.Y, 1e-12);
        }

        // The throttle is vertical (h4 = h3) and the evaporator horizontal (P4 = P1).
        Assert.Equal(line.Points[2].X, line.Points[3].X);
        Assert.Equal(line.Points[3].Y, line.Points[4].Y);
    }

    [Fact]
    public void Property_chart_options_are_refused_on_charts_without_them()
    {
        var propane = TestFluids.Propane;
        var few = new DiagramOptions { Points = 20 };
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.PressureTemperature, [propane], few with { Reference = ReferenceState.NormalBoilingPoint }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.TemperatureEntropy, [propane], few with { Isotherms = [250] }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.PressureEnthalpy, [propane], few with { Isobars = [1e5] }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.TemperatureEntropy, [propane], few with { Cycle = new VapourCompressionSpecification(250, 300, 0, 0, 1) }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.PressureEnthalpy, [propane], few with { Cycle = new VapourCompressionSpecification(250, 400, 0, 0, 1) }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.PressureEnthalpy, [propane], few with { TemperatureRange = new ValueRange(300, 250) }));
        Assert.Throws<InvalidInputException>(() => Diagram.Check(DiagramKind.PressureEnthalpy, [propane], few with { Isotherms = [50] }));
        Diagram.Check(DiagramKind.PressureEnthalpy, [propane], few with { Isotherms = [250, 300], Isochores = [], Reference = ReferenceState.NormalBoilingPoint });
    }
}
