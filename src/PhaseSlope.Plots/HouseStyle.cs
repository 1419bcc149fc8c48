using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Legends;
using SkiaSharp;

namespace PhaseSlope.Plots;

/// <summary>The look of every PhaseSlope figure: a colour-blind-safe palette, one sans-serif
/// font, axis titles with their units in parentheses, a light grid and a legend outside the
/// plot area so that it never covers a curve.</summary>
/// <remarks>The palette is the eight-colour set published by Okabe and Ito (2002), "Color
/// Universal Design", which stays distinguishable under the common forms of colour-vision
/// deficiency. Black is kept for the critical point and tie lines, so series use the other seven.</remarks>
public static class HouseStyle
{
    /// <summary>The font the figures ask for; DejaVu Sans ships with most Linux systems.</summary>
    public const string PreferredFont = "DejaVu Sans";

    /// <summary>Default figure width in pixels.</summary>
    public const int DefaultWidth = 1200;

    /// <summary>Default figure height in pixels.</summary>
    public const int DefaultHeight = 800;

    /// <summary>Smallest accepted width or height in pixels (below it the labels cannot fit).</summary>
    public const int MinimumSize = 300;

    /// <summary>Largest accepted width or height in pixels.</summary>
    public const int MaximumSize = 8000;

    /// <summary>Okabe–Ito black, for the critical point, tie lines and text.</summary>
    public static readonly OxyColor Ink = OxyColor.FromRgb(0, 0, 0);

    /// <summary>The series colours in order: the Okabe–Ito palette without black (blue,
    /// vermillion, bluish green, orange, reddish purple, sky blue, yellow).</summary>
    public static readonly IReadOnlyList<OxyColor> Palette =
    [
        OxyColor.FromRgb(0, 114, 178),   // blue
        OxyColor.FromRgb(213, 94, 0),    // vermillion
        OxyColor.FromRgb(0, 158, 115),   // bluish green
        OxyColor.FromRgb(230, 159, 0),   // orange
        OxyColor.FromRgb(204, 121, 167), // reddish purple
        OxyColor.FromRgb(86, 180, 233),  // sky blue
        OxyColor.FromRgb(240, 228, 66),  // yellow
    ];

    /// <summary>Grid line colour: a light grey that stays behind the data.</summary>
    public static readonly OxyColor Grid = OxyColor.FromRgb(225, 225, 225);

    private static readonly Lazy<string?> ResolvedFont = new(ResolveFont);

    /// <summary>The font family actually used: <see cref="PreferredFont"/> when the machine has
    /// it, else null (the renderer's default sans-serif face).</summary>
    public static string? Font => ResolvedFont.Value;

    /// <summary>The series colour for index <paramref name="i"/> (cycling through the palette).</summary>
    public static OxyColor Colour(int i) => Palette[((i % Palette.Count) + Palette.Count) % Palette.Count];

    /// <summary>A new, empty model in the house style with a legend outside the plot area, top right.</summary>
    public static PlotModel NewModel(string title)
    {
        var model = new PlotModel
        {
            Title = title,
            TitleFontSize = BaseTitleFontSize,
            TitleFontWeight = FontWeights.Normal,
            SubtitleFontSize = BaseLegendFontSize,
            DefaultFont = Font ?? "sans-serif",
            DefaultFontSize = BaseFontSize,
            TextColor = Ink,
            Background = OxyColors.White,
            PlotAreaBackground = OxyColors.White,
            PlotAreaBorderColor = OxyColor.FromRgb(120, 120, 120),
            PlotAreaBorderThickness = new OxyThickness(1),
            Padding = new OxyThickness(12, 12, 24, 12),
        };
        model.Legends.Add(new Legend
        {
            LegendPlacement = LegendPlacement.Outside,
            LegendPosition = LegendPosition.RightTop,
            LegendOrientation = LegendOrientation.Vertical,
            LegendBorder = OxyColors.Undefined,
            LegendBackground = OxyColors.Undefined,
            LegendFontSize = BaseLegendFontSize,
            LegendSymbolLength = 28,
            LegendItemSpacing = 6,
        });
        return model;
    }

    /// <summary>A linear axis titled "<paramref name="title"/> (<paramref name="unit"/>)".</summary>
    public static LinearAxis Linear(AxisPosition position, string title, string? unit)
        => Style(new LinearAxis { Position = position, Title = title, Unit = unit });

    /// <summary>A base-10 logarithmic axis titled "<paramref name="title"/> (<paramref name="unit"/>)".</summary>
    public static LogarithmicAxis Logarithmic(AxisPosition position, string title, string? unit)
        => Style(new LogarithmicAxis { Position = position, Title = title, Unit = unit, Base = 10, UseSuperExponentialFormat = false });

    /// <summary>A tick label: plain decimals from 0.001 to 10⁶ ("0.002", "4000"), else one
    /// short exponent form ("1e-5", "2.5e+7"), never mixed within a decade.</summary>
    public static string Tick(double value)
    {
        var invariant = System.Globalization.CultureInfo.InvariantCulture;
        double magnitude = Math.Abs(value);
        // Round away binary noise such as 0.30000000000000004 before choosing the form.
        double rounded = double.Parse(value.ToString("g10", invariant), invariant);
        return magnitude == 0 ? "0"
            : magnitude >= 1e-3 && magnitude < 1e6 ? rounded.ToString("0.######", invariant)
            : rounded.ToString("0.##e+0", invariant);
    }

    /// <summary>Base font size of axis labels and titles at the default size.</summary>
    public const double BaseFontSize = 14;

    /// <summary>Base size of the figure title at the default size.</summary>
    public const double BaseTitleFontSize = 18;

    /// <summary>Base size of the legend text and the subtitle at the default size.</summary>
    public const double BaseLegendFontSize = 13;

    /// <summary>Base size of small labels on curves (quality values) at the default size.</summary>
    public const double BaseLabelFontSize = 11;

    /// <summary>Scales the text to the figure size and moves the legend below the plot area
    /// when beside it would leave too little room for the data; the title shrinks to fit the
    /// width. Safe to call again for another size.</summary>
    public static void FitTo(PlotModel model, int width, int height)
    {
        ArgumentNullException.ThrowIfNull(model);
        // A layout bound, not a value correction: the accepted sizes (300–8000 px, checked by the
        // plot command) would scale text by about 0.25–10 against 1200×800; between 0.6 and 2.5
        // times the default it stays legible without crowding the data.
        double scale = Math.Clamp(Math.Min(width / (double)DefaultWidth, height / (double)DefaultHeight), 0.6, 2.5);
        model.DefaultFontSize = BaseFontSize * scale;
        model.TitleFontSize = FitText(model.Title, BaseTitleFontSize * scale, width);
        model.SubtitleFontSize = FitText(model.Subtitle, BaseLegendFontSize * scale, width);
        foreach (var axis in model.Axes)
        {
            axis.FontSize = BaseFontSize * scale;
            axis.IntervalLength = (axis.IsHorizontal() ? 90 : 60) * scale;
        }

        foreach (var series in model.Series)
        {
            switch (series)
            {
                case OxyPlot.Series.LineSeries line when line.Tag is BaseSize b:
                    line.StrokeThickness = b.Value * Math.Max(scale, 0.8);
                    break;
                case OxyPlot.Series.ScatterSeries scatter when scatter.Tag is BaseSize b:
                    scatter.MarkerSize = b.Value * Math.Max(scale, 0.7);
                    break;
            }
        }

        foreach (var label in model.Annotations.OfType<OxyPlot.Annotations.TextAnnotation>())
        {
            label.FontSize = (label.Tag is BaseSize b ? b.Value : BaseLabelFontSize) * scale;
        }

        double legendFont = BaseLegendFontSize * scale;
        int longest = model.Series.Where(s => s.Title is not null).Select(s => s.Title!.Length).DefaultIfEmpty(0).Max();
        // DejaVu Sans averages about 0.6 em per character; add the symbol and the margins.
        double legendWidth = longest * 0.6 * legendFont + 28 * scale + 24;
        bool below = legendWidth > 0.3 * width;
        foreach (var legend in model.Legends.OfType<Legend>())
        {
            legend.LegendFontSize = legendFont;
            legend.LegendSymbolLength = 28 * scale;
            legend.LegendPlacement = LegendPlacement.Outside;
            legend.LegendPosition = below ? LegendPosition.BottomCenter : LegendPosition.RightTop;
            legend.LegendOrientation = below ? LegendOrientation.Horizontal : LegendOrientation.Vertical;
        }
    }

    /// <summary>The line width or marker size a series has at the default figure size, kept in
    /// its <c>Tag</c> so that <see cref="FitTo"/> can scale it for any size.</summary>
    public sealed record BaseSize(double Value);

    private static double FitText(string? text, double size, int width)
    {
        if (string.IsNullOrEmpty(text))
        {
            return size;
        }

        // A title of several lines needs the width of its longest.
        double needed = text.Split('\n').Max(line => line.Length) * 0.58 * size;
        double room = width - 40;
        return needed <= room ? size : Math.Max(8, size * room / needed);
    }

    private static T Style<T>(T axis) where T : Axis
    {
        axis.TitleFormatString = "{0} ({1})";
        axis.MajorGridlineStyle = LineStyle.Solid;
        axis.MajorGridlineColor = Grid;
        axis.MinorGridlineStyle = LineStyle.None;
        axis.TicklineColor = OxyColor.FromRgb(120, 120, 120);
        axis.TickStyle = TickStyle.Outside;
        // Wide enough intervals that tick labels never touch at any accepted size.
        axis.IntervalLength = axis.IsHorizontal() ? 90 : 60;
        axis.LabelFormatter = Tick;
        axis.AxisTitleDistance = 8;
        // Keep markers and curve ends off the frame.
        axis.MinimumPadding = 0.03;
        axis.MaximumPadding = 0.03;
        return axis;
    }

    private static string? ResolveFont()
    {
        try
        {
            using var typeface = SKTypeface.FromFamilyName(PreferredFont);
            return typeface is not null && string.Equals(typeface.FamilyName, PreferredFont, StringComparison.OrdinalIgnoreCase)
                ? PreferredFont
                : null;
        }
        catch (Exception ex) when (ex is DllNotFoundException or TypeInitializationException)
        {
            return null;
        }
    }
}
