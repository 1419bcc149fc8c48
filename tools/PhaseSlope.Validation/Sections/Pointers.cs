namespace PhaseSlope.Validation.Sections;

internal static class Pointers
{
    public static void Write(Page page)
    {
        page.Heading(2, "Uncertainty and performance");
        page.Paragraph("""
            How input uncertainties (Tc, Pc, ω, tuned α parameters) are propagated, linearly and by Monte Carlo, and
            how the two are checked against each other is in [uncertainty.md](uncertainty.md) (tests in
            `Uncertainty/`). Speed is measured only with BenchmarkDotNet (`tests/PhaseSlope.Benchmarks`), never on
            this page, whose numbers must not change from one run to the next: see [performance.md](performance.md).
            """);
    }
}
