namespace PhaseSlope.Validation.Sections;

internal static class Tuning
{
    public static void Write(Page page)
    {
        page.Heading(2, "Tuning");
    }
}
