namespace PhaseSlope.Validation.Sections;

internal static class LatentHeatFromData
{
    public static void Write(Page page)
    {
        page.Heading(2, "LatentHeatFromData");
    }
}
