namespace PhaseSlope.Plots;

/// <summary>The image formats a figure can be written in.</summary>
public enum FigureFormat
{
    /// <summary>Portable Network Graphics, a raster image.</summary>
    Png,

    /// <summary>Scalable Vector Graphics.</summary>
    Svg,
}

/// <summary>Maps file names to figure formats.</summary>
public static class FigureFormats
{
    /// <summary>The format named by the extension of <paramref name="path"/> (.png or .svg, any
    /// case); false for anything else.</summary>
    public static bool TryFromPath(string path, out FigureFormat format)
    {
        string extension = Path.GetExtension(path ?? string.Empty).ToLowerInvariant();
        (bool ok, format) = extension switch
        {
            ".png" => (true, FigureFormat.Png),
            ".svg" => (true, FigureFormat.Svg),
            _ => (false, FigureFormat.Png),
        };
        return ok;
    }
}
