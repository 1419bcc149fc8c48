namespace PhaseSlope.Validation.Sections;

internal static class Mixtures
{
    public static void Write(Page page)
    {
        page.Heading(2, "Mixtures");
    }
}
