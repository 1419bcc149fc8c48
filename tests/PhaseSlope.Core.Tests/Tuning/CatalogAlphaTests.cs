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
    /// from the lowest valid temperature (triple point or 0.3 Tc) to 0.98 of the equation's Tc.</summary>
    public static VapourPressurePoint[] EquationData(Fluid fluid)
    {
        var equation = fluid.VapourPressureEquation!;
        double low = CoexistenceSolver.LowestValidTemperature(fluid);
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
