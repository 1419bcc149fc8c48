using OxyPlot;
using OxyPlot.Series;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Errors;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Plots.Tests;

/// <summary>The plotted numbers are the solver's own.</summary>
public class DiagramDataTests
{
    private static readonly DiagramOptions Few = new() { Points = 30 };

    private static LineSeries Titled(PlotModel model, string title)
        => model.Series.OfType<LineSeries>().Single(s => s.Title == title);

    private static void Near(double expected, double actual, double relative, string what)
        => Assert.True(Math.Abs(actual - expected) <= relative * Math.Abs(expected), $"{what}: expected {expected:R}, got {actual:R}");

    [Fact]
    public void P_t_curve_ends_at_the_critical_point()
    {
        var propane = TestFluids.Propane;
        var critical = propane.Solver().CriticalPoint();
        var model = PressureTemperatureDiagram.Build([propane], Few);
        var curve = Titled(model, "propane");
        // SI axes: K and kPa. The last traced state is the solver's critical point itself.
        Near(critical.Temperature, curve.Points[^1].X, 1e-12, "Tc");
        Near(critical.Pressure / 1e3, curve.Points[^1].Y, 1e-12, "Pc");
        Assert.Equal(propane.Model.CriticalTemperature, critical.Temperature, 6);
        // Saturation pressure rises monotonically along the curve.
        Assert.True(curve.Points.Zip(curve.Points.Skip(1)).All(p => p.Second.Y > p.First.Y && p.Second.X > p.First.X));
        var marker = model.Series.OfType<ScatterSeries>().Single();
        Assert.Equal(curve.Points[^1].X, marker.Points.Single().X);
        Assert.Equal(curve.Points[^1].Y, marker.Points.Single().Y);
    }

    [Fact]
    public void Reduced_p_t_ends_at_one_one_for_every_fluid()
    {
        var fluids = new[] { TestFluids.Propane, TestFluids.Get("methane"), TestFluids.Get("water") };
        var model = PressureTemperatureDiagram.Build(fluids, Few with { Reduced = true });
        foreach (var fluid in fluids)
        {
            var curve = Titled(model, fluid.Name);
            Near(1, curve.Points[^1].X, 1e-9, $"{fluid.Name} T/Tc");
            Near(1, curve.Points[^1].Y, 1e-6, $"{fluid.Name} P/Pc");
        }

        // Three colours from the palette, one per fluid.
        Assert.Equal(3, model.Series.OfType<LineSeries>().Select(s => s.Color).Distinct().Count());
    }

    [Fact]
    public void Engineering_units_convert_the_axes()
    {
        var propane = TestFluids.Propane;
        var critical = propane.Solver().CriticalPoint();
        var curve = Titled(PressureTemperatureDiagram.Build([propane], Few with { Units = PlotUnits.Engineering }), "propane");
        Near(critical.Temperature - 273.15, curve.Points[^1].X, 1e-12, "Tc in degC");
        Near(critical.Pressure / 1e5, curve.Points[^1].Y, 1e-12, "Pc in bar");
    }

    [Fact]
    public void Highest_point_of_the_t_rho_dome_is_the_critical_point()
    {
        var propane = TestFluids.Propane;
        var critical = propane.Solver().CriticalPoint();
        var dome = Titled(TemperatureDensityDiagram.Build([propane], Few), "propane");
        var top = dome.Points.MaxBy(p => p.Y);
        Near(critical.Temperature, top.Y, 1e-12, "T at the top");
        Near(critical.Liquid.Density, top.X, 1e-9, "density at the top");
        Near(propane.Model.CriticalDensity, top.X, 1e-6, "model critical density");
        // The dome starts on the vapour branch and ends on the liquid branch at the lowest temperature.
        Assert.True(dome.Points[0].X < dome.Points[^1].X);
        Assert.Equal(dome.Points[0].Y, dome.Points[^1].Y);

        var diameter = Titled(TemperatureDensityDiagram.Build([propane], Few), "propane: diameter (ρL + ρV)/2");
        var low = propane.Solver().AtTemperature(diameter.Points[0].Y);
        Near((low.Liquid.Density + low.Vapour.Density) / 2, diameter.Points[0].X, 1e-9, "diameter at the lowest T");
    }

    [Fact]
    public void Lnp_invt_is_ln_of_the_solver_pressure()
    {
        var propane = TestFluids.Propane;
        var curve = Titled(LnPressureInverseTemperatureDiagram.Build([propane], Few), "propane");
        var first = propane.Solver().AtTemperature(1000 / curve.Points[0].X);
        Near(Math.Log(first.Pressure / 1e3), curve.Points[0].Y, 1e-9, "ln(P/kPa)");
        var reduced = Titled(LnPressureInverseTemperatureDiagram.Build([propane], Few with { Reduced = true }), "propane");
        Near(1, reduced.Points[^1].X, 1e-9, "Tc/T at the critical point");
        Assert.True(Math.Abs(reduced.Points[^1].Y) < 1e-6, "ln(P/Pc) is 0 at the critical point");
    }

    [Fact]
    public void Slope_and_latent_follow_the_coexistence_points()
    {
        var propane = TestFluids.Propane;
        var point = propane.Solver().AtTemperature(300);
        var slope = Titled(SlopeDiagram.Build([propane], Few), "propane");
        var latent = Titled(LatentDiagram.Build([propane], Few), "propane (model)");
        var s0 = propane.Solver().AtTemperature(slope.Points[0].X);
        Near(s0.Slope / 1e3, slope.Points[0].Y, 1e-12, "dPsat/dT in kPa/K");
        Near(s0.EnthalpyOfVaporization / 1e3, latent.Points[0].Y, 1e-12, "dh in kJ/mol");
        Assert.True(Math.Abs(latent.Points[^1].Y) < 1e-6 * latent.Points[0].Y, "dh vanishes at Tc");
        Assert.True(point.Slope > 0);
    }

    [Fact]
    public void Latent_from_data_has_a_band_around_its_estimate()
    {
        var propane = TestFluids.Propane;
        var solver = propane.Solver();
        // Synthetic "measurements": the model's own vapour pressures with 0.5 % uncertainty, so
        // the Clapeyron estimate with the model's volume change must return the model's dh.
        var data = Enumerable.Range(0, 12).Select(i => 200.0 + 12 * i)
            .Select(t => new VapourPressurePoint(t, solver.AtTemperature(t).Pressure, 0.005 * solver.AtTemperature(t).Pressure)).ToList();
        var model = LatentDiagram.Build([propane], Few with { Data = data, DataLabel = "test.csv" });
        var band = model.Series.OfType<AreaSeries>().Single();
        Assert.Equal(LatentDiagram.DataPoints, band.Points.Count);
        Assert.All(band.Points.Zip(band.Points2), p => Assert.True(p.First.Y > p.Second.Y));
        var estimate = Titled(model, "from data");
        Assert.Contains("test.csv", model.Subtitle, StringComparison.Ordinal);
        var mid = estimate.Points[LatentDiagram.DataPoints / 2];
        // Wagner (3, 6) reproduces a cubic's vapour pressure to well under 0.1 % in ln P over this
        // range, and its slope to a few tenths of a percent.
        Near(solver.AtTemperature(mid.X).EnthalpyOfVaporization / 1e3, mid.Y, 5e-3, "dh from data");
    }

    [Fact]
    public void P_v_tie_lines_obey_the_equal_area_rule()
    {
        var propane = TestFluids.Propane;
        var model = PressureVolumeDiagram.Build(propane, Few);
        var cubic = propane.Model;
        var ties = model.Series.OfType<LineSeries>().Where(s => s.Title is null && s.Points.Count == 2).ToList();
        Assert.Equal(3, ties.Count); // 0.75, 0.85 and 0.95 Tc
        foreach (double tr in new[] { 0.75, 0.85, 0.95 })
        {
            var sat = propane.Solver().AtTemperature(tr * cubic.CriticalTemperature);
            double vL = sat.Liquid.MolarVolume;
            double vV = sat.Vapour.MolarVolume;
            // SI volume axis in cm³/mol, pressure in kPa.
            Assert.Contains(ties, t => Math.Abs(t.Points[0].X - vL * 1e6) < 1e-9 * vL * 1e6 && Math.Abs(t.Points[1].X - vV * 1e6) < 1e-9 * vV * 1e6
                && Math.Abs(t.Points[0].Y - sat.Pressure / 1e3) < 1e-9);
            // Simpson's rule in ln v over the loop: ∫ P dv = ∫ P v d(ln v).
            const int n = 20000;
            double a = Math.Log(vL);
            double b = Math.Log(vV);
            double h = (b - a) / n;
            double sum = 0;
            for (int k = 0; k <= n; k++)
            {
                double v = Math.Exp(a + k * h);
                double w = k == 0 || k == n ? 1 : k % 2 == 1 ? 4 : 2;
                sum += w * cubic.Pressure(sat.Temperature, 1 / v) * v;
            }

            double area = sum * h / 3;
            // Equal fugacities to 1e-12 make the areas equal to far better than the quadrature's 1e-8.
            Near(sat.Pressure * (vV - vL), area, 1e-7, $"equal areas at {tr} Tc");
        }
    }

    [Fact]
    public void T_s_isobars_are_flat_inside_the_dome_and_p_h_quality_lines_interpolate()
    {
        var propane = TestFluids.Propane;
        // One isobar asked for: the only line of the family, so it carries the legend title.
        var ts = TemperatureEntropyDiagram.Build(propane, Few with { Isobars = [0.3 * propane.Model.CriticalPressure] });
        var isobar = Titled(ts, "isobars (kPa)");
        double tSat = propane.Solver().AtPressure(0.3 * propane.Model.CriticalPressure).Temperature;
        var flat = isobar.Points.Where(p => Math.Abs(p.Y - tSat) < 1e-9).ToList();
        Assert.Equal(2, flat.Count);
        Assert.True(flat[1].X > flat[0].X, "entropy rises across the dome");

        var ph = PressureEnthalpyDiagram.Build(propane, Few);
        var lines = ph.Series.OfType<LineSeries>().Where(s => s.LineStyle == LineStyle.Dot).ToList();
        Assert.Equal(PressureEnthalpyDiagram.Qualities.Count, lines.Count);
        var dome = Titled(ph, "saturated liquid and vapour");
        // Quality 0.5 at the lowest pressure: halfway between the two ends of the dome.
        var half = lines[4].Points[0];
        Near((dome.Points[0].X + dome.Points[^1].X) / 2, half.X, 1e-9, "h at x = 0.5");
        Assert.Equal(dome.Points[0].Y, half.Y);
    }

    [Fact]
    public void Requests_that_a_kind_cannot_show_are_refused()
    {
        var two = new[] { TestFluids.Propane, TestFluids.Get("n-butane") };
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.PressureVolume, two, Few));
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.TemperatureEntropy, [two[0]], Few with { Reduced = true }));
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.TemperatureDensity, [two[0]], Few with { Logarithmic = true }));
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Slope, [two[0]], Few with { Data = [] }));
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.PressureTemperature, [], Few));
        var model = Diagram.Build(DiagramKind.TemperatureDensity, two, Few);
        Assert.Equal(2, model.Series.OfType<ScatterSeries>().Single().Points.Count);
    }

    [Theory]
    [InlineData(0, "0")]
    [InlineData(0.30000000000000004, "0.3")]
    [InlineData(4000, "4000")]
    [InlineData(-2000, "-2000")]
    [InlineData(0.001, "0.001")]
    [InlineData(1e-5, "1e-5")]
    [InlineData(2.5e7, "2.5e+7")]
    public void Tick_labels_use_one_form_per_range(double value, string expected)
        => Assert.Equal(expected, HouseStyle.Tick(value));

    [Fact]
    public void Palette_is_okabe_ito_without_black()
    {
        // Okabe and Ito (2002), "Color Universal Design": the RGB values of the published set.
        string[] expected = ["#0072b2", "#d55e00", "#009e73", "#e69f00", "#cc79a7", "#56b4e9", "#f0e442"];
        Assert.Equal(expected, HouseStyle.Palette.Select(c => $"#{c.R:x2}{c.G:x2}{c.B:x2}"));
        Assert.Equal(HouseStyle.Palette[0], HouseStyle.Colour(7));
    }

    [Fact]
    public void Residuals_are_the_deviations_of_the_best_fits_by_AICc()
    {
        var data = TestFluids.ModelVapourPressures(TestFluids.Propane, 12);
        var model = ResidualsDiagram.Build(TestFluids.Propane, new DiagramOptions { Data = data });
        var best = VapourPressureFitter.FitAll(
            [new ClausiusClapeyronForm(), new AntoineForm(), new KirchhoffForm(), new RiedelForm(),
             WagnerForm.ThreeSix(TestFluids.Propane.Model.CriticalTemperature, TestFluids.Propane.Model.CriticalPressure),
             WagnerForm.TwoHalfFive(TestFluids.Propane.Model.CriticalTemperature, TestFluids.Propane.Model.CriticalPressure),
             WagnerForm.SixTerm(TestFluids.Propane.Model.CriticalTemperature, TestFluids.Propane.Model.CriticalPressure)], data)[0];

        var scatter = model.Series.OfType<ScatterSeries>().First();
        Assert.StartsWith(best.Form.Id, scatter.Title, StringComparison.Ordinal);
        Assert.Equal(best.DeviationsPercent, scatter.Points.Select(p => p.Y));
        Assert.Equal(ResidualsDiagram.FormsShown, model.Series.OfType<ScatterSeries>().Count());
        // The ±u band is drawn because every point states its uncertainty.
        Assert.Single(model.Series.OfType<AreaSeries>());
    }

    [Fact]
    public void Residuals_without_data_are_refused()
    {
        var ex = Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Residuals, [TestFluids.Propane], new DiagramOptions()));
        Assert.Contains("--data", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Deviations_are_each_models_pressure_against_the_data()
    {
        // The data are the PR model's own pressures moved by a fixed ±0.3 % pattern, so PR's line is
        // that pattern reversed (−0.3, 0, +0.3 % relative to the moved value) and SRK's differs from it.
        var data = TestFluids.ModelVapourPressures(TestFluids.Propane, 9);
        var srk = TestFluids.Get("propane", Core.Models.CubicModelKind.SoaveRedlichKwong);
        var model = DeviationsDiagram.Build([TestFluids.Propane, srk], new DiagramOptions { Data = data });
        var lines = model.Series.OfType<LineSeries>().Where(l => l is not AreaSeries && !string.IsNullOrEmpty(l.Title)).ToArray();
        Assert.Equal(2, lines.Length);
        var solver = TestFluids.Propane.Solver();
        for (int k = 0; k < data.Count; k++)
        {
            double expected = 100 * (solver.AtTemperature(data[k].Temperature).Pressure / data[k].Pressure - 1);
            // Traced (neighbour starts) and cold solves agree to the solver's 1e-12 in pressure.
            Assert.Equal(expected, lines[0].Points[k].Y, 1e-8);
        }

        Assert.Contains("AAD", lines[1].Title, StringComparison.Ordinal);
        Assert.NotEqual(lines[0].Points[0].Y, lines[1].Points[0].Y);
        Assert.Single(model.Series.OfType<AreaSeries>());
        Assert.Throws<InvalidInputException>(() => Diagram.Build(DiagramKind.Deviations, [TestFluids.Propane], new DiagramOptions()));
    }
}
