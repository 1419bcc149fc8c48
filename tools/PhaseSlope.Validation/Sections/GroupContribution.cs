namespace PhaseSlope.Validation.Sections;

internal static class GroupContribution
{
    public static void Write(Page page)
    {
        page.Heading(2, "GroupContribution");
    }
}
