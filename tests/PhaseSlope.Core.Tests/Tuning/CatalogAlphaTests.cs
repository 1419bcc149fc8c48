using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using PhaseSlope.Core.Tuning;
using Xunit.Abstractions;

namespace PhaseSlope.Core.Tests.Tuning;

/// <summary>The catalog's Mathias–Copeman constants are derived by the tuner from each fluid's
/// published vapour-pressure equation (also in the catalog file): recomputing them here must give
/// the numbers in the file, so they can never drift from the code and the equation.</summary>
public sealed class CatalogAlphaTests(ITestOutputHelper output)
{
    /// <summary>The recipe written in the catalog files' source text: 50 temperatures evenly spaced
    /// from the lowest valid temperature to 0.98 of the equation's Tc. The constants were derived when
    /// the lowest valid temperature was the triple point or 0.3 Tc, whichever is higher; it is now the
    /// triple point down to 0.1 Tc (<see cref="CoexistenceSolver.LowestValidTemperature"/>), which moves
    /// it for propane and ethane, so the recipe keeps the range the files' constants were derived on.</summary>
    public static VapourPressurePoint[] EquationData(Fluid fluid)
    {
        var equation = fluid.VapourPressureEquation!;
        double low = Math.Max(fluid.TriplePointTemperature?.Value ?? 0, CoexistenceSolver.UnknownTriplePointReducedTemperature * fluid.CriticalTemperature.Value);
        double high = 0.98 * Math.Min(equation.Form.CriticalTemperature, fluid.CriticalTemperature.Value);
        return [.. Enumerable.Range(0, 50).Select(i => low + (high - low) * i / 49).Select(t => new VapourPressurePoint(t, equation.Pressure(t)))];
    }

    public static TheoryData<string> FluidsWithEquations()
    {
        var data = new TheoryData<string>();
        foreach (var name in FluidCatalog.Embedded.All.Where(f => f.VapourPressureEquation is not null).Select(f => f.Name))
        {
            data.Add(name);
        }

        return data;
    }

    [Fact]
    public void EightCatalogFluids_CarryAPublishedEquation()
        => Assert.True(FluidsWithEquations().Count >= 8, $"{FluidsWithEquations().Count} fluids");

    [Theory]
    [MemberData(nameof(FluidsWithEquations))]
    public void PublishedEquation_GivesTheNormalBoilingPoint(string name)
    {
        // The equations' coefficients are recalled: each must reproduce the fluid's normal boiling
        // point (from its reference equation of state, in the same file) to 1e-4 in pressure. A
        // misremembered digit in any coefficient shows here; the reference equations and their
        // ancillary equations agree to about 1e-5 at Tb.
        var fluid = FluidCatalog.Embedded.Find(name);
        if (fluid.NormalBoilingPoint is null)
        {
            return; // carbon dioxide: the triple point lies above one atmosphere
        }

        AssertClose.Relative(Constants.StandardAtmosphere, fluid.VapourPressureEquation!.Pressure(fluid.NormalBoilingPoint.Value), 1e-4, $"{name} at Tb");
    }

    [Theory]
    [MemberData(nameof(FluidsWithEquations))]
    public void CatalogMathiasCopemanConstants_AreWhatTheTunerDerivesFromTheEquation(string name)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        var data = EquationData(fluid);
        var kinds = new[] { CubicModelKind.PengRobinson, CubicModelKind.SoaveRedlichKwong };
        // Fitted without the file's own constants (the base model is the model's own alpha).
        var bare = fluid with { AlphaParameters = [], PreferredAlpha = AlphaForm.Default };
        var results = kinds.Select(kind => AlphaTuner.Tune(new TuningRequest { BaseFluid = bare, Kind = kind, Form = AlphaForm.MathiasCopeman, VapourPressures = data, Date = new DateOnly(2026, 12, 2) })).ToArray();
        foreach (var (kind, result) in kinds.Zip(results))
        {
            string key = kind == CubicModelKind.PengRobinson ? "pr" : "srk";
            output.WriteLine($"{name} {key}: {string.Join(' ', result.Parameters.Select(p => p.Value.ToString("G7", System.Globalization.CultureInfo.InvariantCulture)))}  AAD {result.AadAfterPercent:0.####} % (own alpha {result.AadBeforePercent:0.###} %), max {result.MaximumAfterPercent:0.###} %");
        }

        foreach (var (kind, result) in kinds.Zip(results))
        {
            string key = kind == CubicModelKind.PengRobinson ? "pr" : "srk";
            var set = fluid.AlphaParameters.SingleOrDefault(s => s.Form == AlphaForm.MathiasCopeman && s.Model == kind);
            Assert.True(set is not null, $"{name} has no alpha_mathias_copeman_{key} line");
            for (int j = 0; j < 3; j++)
            {
                // The file holds the tuner's numbers to 7 significant digits; the tuner's own
                // stopping tolerance moves them by far less (~1e-8).
                AssertClose.Absolute(result.Parameters[j].Value, set!.Values[j], 1e-6, $"{name} {key} c{j + 1}");
            }

            // And the constants must improve on the model's own alpha function.
            Assert.True(result.AadAfterPercent < result.AadBeforePercent, $"{name} {key}");
        }
    }
}

public sealed class VapourPressureEquationLineTests
{
    private const string Header = "format phaseslope-fluid 1\nname x\ncritical_temperature 647.096 K | t\ncritical_pressure 22.064 MPa | t\nacentric_factor 0.344 | t\n";

    [Fact]
    public void Line_ReadAndWrittenBack_GivesTheSamePressures()
    {
        // The IAPWS saturation equation (Wagner & Pruss 1993, coefficients from memory) written as a
        // file line, read, written by the writer and read again: the same pressure to the bit.
        string line = "vapour_pressure_equation reduce 647.096 K 22.064 MPa terms -7.85951783^1 1.84408259^1.5 -11.7866497^3 22.6807411^3.5 -15.9618719^4 1.80122502^7.5 | test\n";
        var fluid = FluidFile.Parse(new StringReader(Header + line), "t.fluid");
        var again = FluidFile.Parse(new StringReader(FluidFileWriter.Format(fluid)), "u.fluid");
        // 101.418 kPa at 100 °C from the equation (the steam-table value, to its digits).
        AssertClose.Relative(101418, fluid.VapourPressureEquation!.Pressure(373.15), 1e-5, "Psat at 100 °C");
        Assert.Equal(fluid.VapourPressureEquation.Pressure(400), again.VapourPressureEquation!.Pressure(400));
    }

    [Theory]
    [InlineData("reduce 647.096 K 22.064 mpa terms -7.8^1 | s", "wrong pressure unit 'mpa'")]
    [InlineData("reduce 647.096 K 22.064 MPa terms -7.8 | s", "malformed term '-7.8'")]
    [InlineData("reduce 647.096 K 22.064 MPa terms -7.8^0 | s", "positive exponent")]
    [InlineData("647.096 K 22.064 MPa terms -7.8^1 | s", "malformed equation")]
    public void BadLine_IsRefusedNamingTheProblem(string value, string message)
    {
        var ex = Assert.Throws<PhaseSlope.Core.Errors.FluidDataException>(() => FluidFile.Parse(new StringReader(Header + "vapour_pressure_equation " + value + "\n"), "t.fluid"));
        Assert.Contains(message, ex.Message, StringComparison.Ordinal);
    }
}
