namespace PhaseSlope.Validation.Sections;

internal static class KnownLimits
{
    public static void Write(Page page)
    {
        page.Heading(2, "KnownLimits");
    }
}
