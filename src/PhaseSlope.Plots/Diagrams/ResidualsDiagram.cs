using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>residuals: 100·(P_fit − P_data)/P_data against T for the correlation forms with the
/// lowest AICc (as <c>phaseslope fit --form auto</c> chooses them), with the data's stated
/// relative uncertainties as a band around zero when the data carry them.</summary>
public static class ResidualsDiagram
{
    /// <summary>How many of the best forms are drawn.</summary>
    public const int FormsShown = 3;

    /// <summary>Builds the diagram; the fluid gives Tc and Pc for the Wagner forms.</summary>
    public static PlotModel Build(PlotFluid fluid, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(options);
        var data = options.Data ?? throw new ArgumentException("the residuals diagram needs data", nameof(options));
        var units = new UnitScale(options.Units);
        double tc = fluid.Model.CriticalTemperature;
        double pc = fluid.Model.CriticalPressure;
        VapourPressureForm[] candidates =
        [
            new ClausiusClapeyronForm(), new AntoineForm(), new KirchhoffForm(), new RiedelForm(),
            WagnerForm.ThreeSix(tc, pc), WagnerForm.TwoHalfFive(tc, pc), WagnerForm.SixTerm(tc, pc),
        ];
        var fits = VapourPressureFitter.FitAll(candidates, data).Take(FormsShown).ToArray();

        var model = HouseStyle.NewModel($"Vapour-pressure fit residuals, {options.DataLabel} ({fluid.Name})");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Left, "deviation 100 (P_fit - P_data)/P_data", "%"));

        var sorted = data.OrderBy(d => d.Temperature).ToArray();
        Chart.AddDeviationBaseline(model, sorted, units);
        MarkerType[] markers = [MarkerType.Circle, MarkerType.Square, MarkerType.Triangle];
        for (int i = 0; i < fits.Length; i++)
        {
            var fit = fits[i];
            var series = new ScatterSeries
            {
                Title = $"{fit.Form.Id} (AICc {Chart.Number(fit.Aicc!.Value)}, AAD {Chart.Number(fit.AadPercent)} %)",
                MarkerType = markers[i],
                MarkerSize = 4.5,
                Tag = new HouseStyle.BaseSize(4.5),
                MarkerFill = HouseStyle.Colour(i),
                MarkerStroke = HouseStyle.Colour(i),
            };
            var deviations = fit.DeviationsPercent; // computed on each access: once, not per point
            for (int k = 0; k < fit.Data.Count; k++)
            {
                series.Points.Add(new ScatterPoint(units.Temperature(fit.Data[k].Temperature), deviations[k]));
            }

            model.Series.Add(series);
        }

        return model;
    }
}
