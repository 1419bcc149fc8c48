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
            TitleFontSize = 18,
            TitleFontWeight = FontWeights.Normal,
            SubtitleFontSize = 13,
            DefaultFont = Font ?? "sans-serif",
            DefaultFontSize = 14,
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
            LegendFontSize = 13,
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
        axis.StringFormat = "g6";
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
