using System.Text.Json;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Uncertainty;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class UncertaintyCommandTests
{
    private static readonly string[] Keys =
        ["temperature_K", "pressure_Pa", "enthalpy_of_vaporization_J_mol", "liquid_density_mol_m3", "vapour_density_mol_m3"];

    [Fact]
    public void Coexist_Linear_JsonMatchesTheCoreAndNamesTheDefault()
    {
        var json = RunJson("coexist", "propane", "-T", "300", "--uncertainty", "linear", "--format", "json");
        var u = json.GetProperty("standard_uncertainty");

        var parameters = new CubicParameterization(FluidCatalog.Embedded.Find("propane"), Core.Models.CubicModelKind.PengRobinson);
        var point = new CoexistenceSolver(parameters.Nominal, parameters.MinimumTemperature).AtTemperature(300);
        var expected = LinearPropagation.Propagate(point, parameters, atFixedPressure: false);
        Assert.Equal("linear", u.GetProperty("method").GetString());
        AssertSameDouble(expected.Pressure!.Value, u.GetProperty("pressure_Pa").GetDouble(), "u(P)");
        AssertSameDouble(expected.EnthalpyOfVaporization!.Value, u.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble(), "u(dH)");
        AssertSameDouble(expected.LiquidDensity!.Value, u.GetProperty("liquid_density_mol_m3").GetDouble(), "u(rhoL)");
        AssertSameDouble(expected.VapourDensity!.Value, u.GetProperty("vapour_density_mol_m3").GetDouble(), "u(rhoV)");
        Assert.Equal(0, u.GetProperty("temperature_K").GetDouble());
        Assert.Equal(JsonValueKind.Null, u.GetProperty("undefined_reason").ValueKind);
        var inputs = u.GetProperty("inputs").EnumerateArray().ToArray();
        Assert.Equal(["critical_temperature_K", "critical_pressure_Pa", "acentric_factor"], inputs.Select(i => i.GetProperty("name").GetString()));
        Assert.All(inputs, i => Assert.StartsWith("family default (alkane", i.GetProperty("uncertainty_source").GetString()));
    }

    [Fact]
    public void Coexist_AtPressure_GivesTheUncertaintyOfTheTemperature()
    {
        var json = RunJson("coexist", "carbon dioxide", "-P", "3 MPa", "--uncertainty", "linear", "--format", "json");
        var u = json.GetProperty("standard_uncertainty");

        Assert.True(u.GetProperty("temperature_K").GetDouble() > 0);
        Assert.Equal(0, u.GetProperty("pressure_Pa").GetDouble());
        // Carbon dioxide's file states u(Tc) and u(Pc) (Span & Wagner 1996, from memory).
        Assert.StartsWith("stated in the fluid file", u.GetProperty("inputs")[0].GetProperty("uncertainty_source").GetString());
    }

    [Fact]
    public void Curve_MonteCarlo_SameSeedSameOutput_OtherSeedOtherNumbers()
    {
        string[] args = ["curve", "propane", "-n", "8", "--uncertainty", "monte-carlo", "--samples", "300", "--format", "json"];
        string first = RunText(args);
        string again = RunText(args);
        string other = RunText([.. args, "--seed", "9"]);

        Assert.Equal(first, again);
        Assert.NotEqual(first, other);
        using var document = StrictJson.Parse(first);
        var rows = document.RootElement.EnumerateArray().ToArray();
        foreach (var row in rows[..^1])
        {
            var u = row.GetProperty("standard_uncertainty");
            Assert.Equal("monte-carlo", u.GetProperty("method").GetString());
            Assert.Equal(300, u.GetProperty("samples").GetInt32());
            Assert.Equal(1, u.GetProperty("seed").GetInt32());
            Assert.All(Keys[1..], k => Assert.True(u.GetProperty(k).GetDouble() > 0, k));
        }

        // The last row is the critical point: about half the samples have their Tc below it.
        var last = rows[^1].GetProperty("standard_uncertainty");
        Assert.All(Keys, k => Assert.Equal(JsonValueKind.Null, last.GetProperty(k).ValueKind));
        Assert.Contains("samples have no coexistence state here", last.GetProperty("undefined_reason").GetString());
    }

    [Fact]
    public void Curve_Csv_HasUColumns_EmptyWithAReasonWhereUndefined()
    {
        var rows = CurveCommandTests.ParseCsv(RunText("curve", "propane", "-n", "5", "--uncertainty", "linear", "--format", "csv"));
        string[] keys = ["standard_uncertainty_temperature_K", "standard_uncertainty_pressure_Pa", "standard_uncertainty_enthalpy_of_vaporization_J_mol",
            "standard_uncertainty_liquid_density_mol_m3", "standard_uncertainty_vapour_density_mol_m3"];
        int[] columns = [.. keys.Select(k => Array.IndexOf(rows[0], k))];
        int reason = Array.IndexOf(rows[0], "standard_uncertainty_undefined_reason");

        Assert.All(columns, c => Assert.True(c >= 0));
        Assert.All(columns, c => Assert.NotEqual("", rows[1][c]));
        Assert.Equal("", rows[1][reason]);
        Assert.All(columns, c => Assert.Equal("", rows[^1][c]));
        Assert.Contains("critical point", rows[^1][reason]);
    }

    [Fact]
    public void Curve_Table_ShowsUColumnsAndTheInputs()
    {
        string text = RunText("curve", "propane", "-n", "5", "--uncertainty", "linear");

        Assert.Contains("u(P) [kPa]", text);
        Assert.Contains("u(rho_L) [mol/m3]", text);
        Assert.Contains("u(dH_vap) [J/mol]", text);
        Assert.Contains("critical_temperature_K = 369.89 +/- 0.3", text);
        Assert.Contains("u undefined: at or next to the critical point", text);
    }

    [Fact]
    public void Curve_Table_UncertaintiesWithTwoSignificantDigits()
    {
        var table = Assert.Single(TableLayout.Find(RunText("curve", "propane", "-n", "5", "--uncertainty", "linear")));
        int[] columns = [.. table.HeaderCells.Select((h, i) => (h, i)).Where(c => c.h.StartsWith("u(", StringComparison.Ordinal)).Select(c => c.i)];

        Assert.Equal(4, columns.Length);
        foreach (var row in table.Rows.SkipLast(1)) // the last row is the critical point: "undefined"
        {
            foreach (int i in columns)
            {
                // Two significant digits (GUM, JCGM 100:2008 7.2.6): the digits after leading zeros,
                // before any exponent, trailing zeros of an integer part not counted.
                string mantissa = table.Cells(row)[i].Split('E')[0].Replace("-", "").Replace(".", "").TrimStart('0').TrimEnd('0');
                Assert.InRange(mantissa.Length, 1, 2);
            }
        }
    }

    [Fact]
    public void Coexist_WithoutUncertainty_HasNoUncertaintyMember()
    {
        var json = RunJson("coexist", "propane", "-T", "300", "--format", "json");

        Assert.False(json.TryGetProperty("standard_uncertainty", out _));
    }
}

public class StateUncertaintyCommandTests
{
    [Fact]
    public void State_Linear_JsonMatchesTheCore()
    {
        var json = RunJson("state", "propane", "-T", "300", "-P", "3MPa", "--uncertainty", "linear", "--format", "json");
        var u = json.GetProperty("standard_uncertainty");

        var parameters = new CubicParameterization(FluidCatalog.Embedded.Find("propane"), Core.Models.CubicModelKind.PengRobinson);
        var expected = StatePropagation.Linear(parameters, 300, json.GetProperty("density_mol_m3").GetDouble(), densityGiven: false);
        AssertSameDouble(expected.Density!.Value, u.GetProperty("density_mol_m3").GetDouble(), "u(rho)");
        AssertSameDouble(expected.ResidualEnthalpy!.Value, u.GetProperty("residual_enthalpy_J_mol").GetDouble(), "u(h_r)");
        Assert.Equal(0, u.GetProperty("pressure_Pa").GetDouble());
        Assert.Equal("linear", u.GetProperty("method").GetString());
    }

    [Fact]
    public void State_MonteCarlo_Csv_HasUColumns_AndIsReproducible()
    {
        string[] args = ["state", "propane", "-T", "300", "--density", "12000", "--uncertainty", "monte-carlo", "--samples", "200", "--format", "csv"];
        string first = RunText(args);

        Assert.Equal(first, RunText(args));
        string header = first.Split('\n')[0].TrimEnd('\r');
        // CSV is the flattened JSON: the standard_uncertainty object's members, prefixed.
        string[] columns = header.Split(',');
        foreach (string key in new[] { "method", "samples", "seed", "density_mol_m3", "pressure_Pa", "compressibility_factor", "residual_enthalpy_J_mol", "residual_entropy_J_molK", "isobaric_heat_capacity_J_molK", "isochoric_heat_capacity_J_molK", "isothermal_compressibility_1_Pa", "isobaric_expansivity_1_K", "joule_thomson_coefficient_K_Pa", "speed_of_sound_m_s", "undefined_reason", "response_functions_undefined_reason", "inputs_0_name" })
        {
            Assert.Contains($"standard_uncertainty_{key}", columns);
        }
    }
}

public class LatentUncertaintyCommandTests
{
    [Fact]
    public void Latent_Band_HeldAtTheDataEnd_AndMonteCarloReproducible()
    {
        // The invented FRC-7 example: data 300-480 K, Wagner 2.5-5 anchored at Tc = 540 K.
        string[] args = ["latent", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--form", "wagner-2.5-5", "--from", "460", "--to", "530", "--points", "8", "--format", "json"];
        var json = RunJson(args);
        var points = json.GetProperty("points").EnumerateArray().ToArray();
        double atEnd = RunJson(["latent", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--form", "wagner-2.5-5", "-T", "480", "--format", "json"])
            .GetProperty("points")[0].GetProperty("standard_uncertainty_J_mol").GetDouble();

        Assert.Equal("linear", json.GetProperty("uncertainty_method").GetString());
        Assert.Equal(2, json.GetProperty("uncertain_inputs").GetArrayLength());
        foreach (var p in points.Where(p => p.GetProperty("extrapolated").GetBoolean()))
        {
            Assert.True(p.GetProperty("standard_uncertainty_J_mol").GetDouble() >= atEnd, p.ToString());
            Assert.True(p.GetProperty("critical_point_uncertainty_J_mol").GetDouble() > 0, "the Wagner form uses Tc and Pc");
        }

        string[] mc = [.. args[..^8], "--from", "400", "--to", "470", "--points", "3", "--format", "json", "--uncertainty", "monte-carlo", "--samples", "200"];
        string first = RunText(mc);
        Assert.Equal(first, RunText(mc));
        using var document = StrictJson.Parse(first);
        Assert.Equal("monte-carlo", document.RootElement.GetProperty("uncertainty_method").GetString());
        Assert.Equal(200, document.RootElement.GetProperty("samples").GetInt32());
    }
}
