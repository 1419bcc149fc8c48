namespace PhaseSlope.Validation.Sections;

internal static class Pointers
{
    public static void Write(Page page)
    {
        page.Heading(2, "Pointers");
    }
}
