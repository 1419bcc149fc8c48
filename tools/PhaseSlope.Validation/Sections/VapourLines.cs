using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Validation.Sections;

internal static class VapourLines
{
    private static readonly string[] Fluids = ["water", "methanol", "ammonia", "propane", "r-134a", "n-butane", "benzene", "n-pentane", "toluene"];

    public static void Write(Page page)
    {
        page.Heading(2, "Saturated-vapour line (wet, isentropic, dry)");
        page.Paragraph($"""
            Peng–Robinson with the catalog cp°, ξ = (Tc/R)·ds_V/dT|σ at T/Tc = {VapourLine.ReadingReducedTemperature}; the
            isentropic band is |ξ| ≤ {VapourLine.IsentropicBand}. Test: `Properties/VapourLineTests` (water, methanol and
            ammonia wet; toluene, n-pentane and benzene dry with an entropy maximum between 0.7 Tc and Tc).
            """);
        page.Table(["fluid", "ξ", "class", "T of maximum vapour entropy"],
            Fluids.Select(name =>
            {
                var fluid = FluidCatalog.Embedded.Find(name);
                var line = VapourLine.Classify(new PropertyModel(fluid, CubicModel.For(CubicModelKind.PengRobinson, fluid)));
                return new[]
                {
                    name, Fmt.Signed(line.ReducedSlope, 1), line.Class.ToString().ToLowerInvariant(),
                    line.MaximumEntropyTemperature is double t ? Fmt.F(t, 1) + " K" : "–",
                };
            }),
            1);
        page.Paragraph("""
            Water wet and toluene and n-pentane dry is the common-practice classification. R-134a is often called
            isentropic or slightly wet; the ±0.5 band decides here.
            """);
    }
}
