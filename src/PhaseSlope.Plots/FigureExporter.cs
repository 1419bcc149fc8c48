using OxyPlot;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Plots;

/// <summary>Writes a plot model to a PNG or SVG file, chosen by the file's extension, through a
/// temporary file in the same folder that is then renamed over the target.</summary>
public static partial class FigureExporter
{
    /// <summary>Renders <paramref name="model"/> at <paramref name="width"/> × <paramref name="height"/>
    /// pixels into <paramref name="stream"/>, first fitting text sizes and the legend's place to
    /// that size (<see cref="HouseStyle.FitTo"/>).</summary>
    /// <exception cref="InvalidInputException">A size outside
    /// [<see cref="HouseStyle.MinimumSize"/>, <see cref="HouseStyle.MaximumSize"/>].</exception>
    public static void Export(PlotModel model, Stream stream, FigureFormat format, int width = HouseStyle.DefaultWidth, int height = HouseStyle.DefaultHeight)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(stream);
        CheckSize(width, "width");
        CheckSize(height, "height");
        HouseStyle.FitTo(model, width, height);
        if (format == FigureFormat.Png)
        {
            // Text shaping would need the HarfBuzz native library; plain glyph runs are enough
            // for the labels these figures carry.
            var png = new OxyPlot.SkiaSharp.PngExporter { Width = width, Height = height, Dpi = 96, UseTextShaping = false };
            png.Export(model, stream);
        }
        else
        {
            var svg = new OxyPlot.SkiaSharp.SvgExporter { Width = width, Height = height };
            using var raw = new MemoryStream();
            svg.Export(model, raw);
            byte[] fixedText = System.Text.Encoding.UTF8.GetBytes(ValidGlyphPositions(System.Text.Encoding.UTF8.GetString(raw.ToArray())));
            stream.Write(fixedText);
        }
    }

    /// <summary>Skia writes per-glyph positions as <c>x="1.5, 2.5, "</c>; the trailing comma
    /// makes the list invalid SVG, and strict viewers then drop the positions. This removes it.</summary>
    internal static string ValidGlyphPositions(string svg)
        => TrailingSeparator().Replace(svg, "$1=\"$2\"");

    [System.Text.RegularExpressions.GeneratedRegex(@"\b([xy])=""([^""]*?)[,\s]+""")]
    private static partial System.Text.RegularExpressions.Regex TrailingSeparator();

    /// <summary>Renders <paramref name="model"/> to the file <paramref name="path"/>: PNG for
    /// <c>.png</c>, SVG for <c>.svg</c>. A failed write leaves an existing file untouched.</summary>
    /// <exception cref="InvalidInputException">The extension is neither .png nor .svg, or the
    /// size is out of range.</exception>
    /// <exception cref="FigureFileException">The file cannot be written.</exception>
    public static void Export(PlotModel model, string path, int width = HouseStyle.DefaultWidth, int height = HouseStyle.DefaultHeight)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (!FigureFormats.TryFromPath(path, out var format))
        {
            throw new InvalidInputException("path", double.NaN, $"'{path}': a figure file must end in .png or .svg");
        }

        CheckSize(width, "width");
        CheckSize(height, "height");

        // Render into memory first: a rendering failure never touches the file system.
        using var buffer = new MemoryStream();
        Export(model, buffer, format, width, height);

        string full;
        try
        {
            full = Path.GetFullPath(path);
        }
        catch (Exception ex) when (ex is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new FigureFileException($"cannot write figure file '{path}': {ex.Message}", ex);
        }

        if (Directory.Exists(full))
        {
            throw new FigureFileException($"cannot write figure file '{path}': it is a directory");
        }

        string folder = Path.GetDirectoryName(full) ?? ".";
        string temp = Path.Combine(folder, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var file = new FileStream(temp, FileMode.CreateNew, FileAccess.Write))
            {
                buffer.Position = 0;
                buffer.CopyTo(file);
            }

            File.Move(temp, full, overwrite: true);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            string reason = ex is DirectoryNotFoundException ? "folder does not exist" : ex.Message;
            throw new FigureFileException($"cannot write figure file '{path}': {reason}", ex);
        }
    }

    private static void CheckSize(int pixels, string field)
    {
        if (pixels < HouseStyle.MinimumSize || pixels > HouseStyle.MaximumSize)
        {
            throw new InvalidInputException(field, pixels,
                $"figure {field} must be {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize} pixels, got {pixels}");
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // The temporary file may never have been created; nothing else to do.
        }
    }
}
