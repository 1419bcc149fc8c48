using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>cycle</c>: the numbers of the core's cycle (whose textbook check is in
/// <c>VapourCompressionCycleTests</c>), printed as JSON, CSV and a table.</summary>
public class CycleCommandTests
{
    private const string Spec = "evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=75 %";

    [Fact]
    public void Json_IsTheCoreCycle_BitForBit()
    {
        var json = RunJson("cycle", "r-134a", Spec, "--reference", "refrigeration", "--format", "json");
        var engine = PropertyModel.For(FluidCatalog.Embedded.Find("r-134a"), CubicModelKind.PengRobinson, ReferenceState.Refrigeration);
        var cycle = VapourCompressionCycle.Compute(engine, new VapourCompressionSpecification(263.15, 313.15, 5, 3, 0.75));

        AssertSameDouble(cycle.CoefficientOfPerformance, json.GetProperty("coefficient_of_performance").GetDouble(), "COP");
        AssertSameDouble(cycle.CompressorWork, json.GetProperty("compressor_work_J_mol").GetDouble(), "work");
        var states = json.GetProperty("states").EnumerateArray().ToArray();
        Assert.Equal(["1", "2s", "2", "3", "4"], states.Select(s => s.GetProperty("label").GetString()));
        Assert.Equal("two-phase", states[4].GetProperty("state").GetProperty("phase").GetString());
        AssertSameDouble(cycle.EvaporatorInlet.Quality!.Value, states[4].GetProperty("state").GetProperty("quality").GetDouble(), "throttled quality");
        // Energy balance of the cycle: q_H = q_L + w, to rounding of the enthalpy differences.
        AssertRelative(json.GetProperty("heat_rejected_J_mol").GetDouble(),
            json.GetProperty("refrigerating_effect_J_mol").GetDouble() + json.GetProperty("compressor_work_J_mol").GetDouble(), 1e-12, "q_H = q_L + w");
    }

    [Fact]
    public void Csv_OneRowPerState_TableWithCopAndCaution()
    {
        var rows = CurveCommandTests.ParseCsv(RunText("cycle", "r-134a", Spec, "--format", "csv"));
        Assert.Equal(6, rows.Count);
        Assert.Equal("state", rows[0][0]);
        string table = RunText("cycle", "r-134a", Spec, "--reference", "refrigeration", "--units", "engineering");
        Assert.Contains("COP (refrigeration)", table, StringComparison.Ordinal);
        Assert.Contains("flammable", table, StringComparison.Ordinal);
        Assert.Contains("kJ/kg", table, StringComparison.Ordinal);
    }
}
