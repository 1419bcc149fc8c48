namespace PhaseSlope.Validation.Sections;

internal static class Envelopes
{
    public static void Write(Page page)
    {
        page.Heading(2, "Envelopes");
    }
}
