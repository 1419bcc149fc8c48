namespace PhaseSlope.Validation.Sections;

internal static class Intro
{
    public static void Write(Page page)
    {
        page.Heading(1, "Validation");
        page.Paragraph("""
            What has been checked, against what, and how well the models do. **This page is generated:**
            `bash docs/make-validation.sh` rebuilds it from the code (`tools/PhaseSlope.Validation`), and CI
            fails when the committed page differs from what the script writes, so every number below is what
            the code gives today. Do not edit it by hand.

            Each row names what is checked, the reference and its source, the model's value, the deviation,
            the tolerance a test holds it to and the test that does. Reference values are the ones the tests
            use (read from the test code itself where the tests hold them as tables). Most are recalled from
            the named sources ("from memory"): they are the commonly tabulated values, but were not re-read
            from the printed source. Quantities at the rounding floor (residuals, round trips) are shown as
            the next 1·10^k or 3·10^k above them ("below 3e-13"), so the page does not change with the
            machine's last digits; seeded sweeps use the tests' seeds and sizes. Where a check is done only
            by the test suite, the section names the test instead of a number.
            """);
    }
}
