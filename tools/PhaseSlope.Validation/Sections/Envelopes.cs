using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Tests.Mixtures;

namespace PhaseSlope.Validation.Sections;

internal static class Envelopes
{
    public static void Write(Page page)
    {
        page.Heading(2, "Phase envelopes and mixture critical points (`envelope`)");
        page.Paragraph("""
            Peng–Robinson with k_ij = 0. **Two routes to the critical point**: the envelope's crossing of ln K
            through zero against the Heidemann–Khalil criteria, for the feeds of `Mixtures/EnvelopeTracerTests`
            (read from its `AllFeeds` table; the six-component lean gas is invented), held to 1e-5 relative:
            """);
        var rows = new List<string[]>();
        foreach (object[] feed in EnvelopeTracerTests.AllFeeds())
        {
            var names = (string[])feed[0];
            var composition = (double[])feed[1];
            var model = EnvelopeTracerTests.Mixture(names);
            var envelope = new EnvelopeTracer(model).Trace(composition);
            string label = names.Length > 2 ? "invented lean gas (" + string.Join(", ", names.Zip(composition, (n, x) => $"{n} {x}")) + ")" : string.Join("–", names) + " " + string.Join("/", composition);
            if (envelope.CriticalPoint is not EnvelopeLandmark critical)
            {
                rows.Add([label, "no critical point on the trace (" + envelope.StopReason + ")", "–", "–", "–"]);
                continue;
            }

            var nearest = CriticalPointCriteria.Locate(model, composition).MinBy(c => Math.Abs(c.Temperature - critical.Temperature))!;
            rows.Add([label, $"{Fmt.F(critical.Temperature, 2)} K, {Fmt.F(critical.Pressure / 1e6, 3)} MPa",
                Fmt.Below(critical.Temperature / nearest.Temperature - 1, 1.5e-7), Fmt.Below(critical.Pressure / nearest.Pressure - 1, 1.5e-7), "1e-5"]);
        }

        page.Table(["feed (mole fractions)", "critical point (envelope)", "T vs Heidemann–Khalil", "P vs Heidemann–Khalil", "held to"], rows, 1);

        // The methane–ethane critical locus, as CriticalPointCriteriaTests computes it.
        var pair = EnvelopeTracerTests.Mixture("methane", "ethane");
        var locus = Enumerable.Range(1, 19).Select(k => k * 0.05).Select(x => (x, Point: CriticalPointCriteria.Locate(pair, [x, 1 - x]).Single())).ToList();
        var peak = locus.MaxBy(p => p.Point.Pressure);
        var gas = new EnvelopeTracer(EnvelopeTracerTests.Mixture(EnvelopeTracerTests.GasNames)).Trace(EnvelopeTracerTests.GasComposition);
        page.Bullets([
            $"""
            **Published critical locus.** Methane–ethane's critical pressures (Heidemann–Khalil, methane 0.05 … 0.95)
              rise to a maximum of {Fmt.F(peak.Point.Pressure / 1e6, 2)} MPa at {Fmt.F(peak.Point.Temperature, 0)} K and {Fmt.F(100 * peak.x, 0)} % methane; the
              measured locus (Bloomer, Gami & Parent 1953; from memory) peaks at about 1000 psia (6.9 MPa) near 250 K:
              {Fmt.Pct(peak.Point.Pressure / 6.9e6 - 1, 1)} (held to 5 % in P, 235–265 K, 50–70 % methane by `Mixtures/CriticalPointCriteriaTests`).
            """,
            $"""
            **Lean gas landmarks** (the invented feed above): critical point {Landmark(gas.CriticalPoint)}, cricondenbar
              {Landmark(gas.Cricondenbar)}, cricondentherm {Landmark(gas.Cricondentherm)}; a lean gas has both extrema on the dew
              branch (common practice; `EnvelopeTracerTests.NaturalGas_LandmarksAreSensible`).
            """,
            """
            **Also checked by the test suite**: the pure limit against the pure saturation curve, the envelope against
              an independent tangent-plane stability test on both sides, the extrema against a five times denser
              trace, and the traces that stop before the critical point with their reason (`EnvelopeTracerTests`,
              `CriticalPointCriteriaTests`, the `envelope` command tests).
            """,
        ]);
    }

    private static string Landmark(EnvelopeLandmark? landmark)
        => landmark is EnvelopeLandmark l ? $"{Fmt.F(l.Temperature, 1)} K and {Fmt.F(l.Pressure / 1e6, 2)} MPa ({l.Branch.ToString().ToLowerInvariant()} branch)" : "not reached";
}
