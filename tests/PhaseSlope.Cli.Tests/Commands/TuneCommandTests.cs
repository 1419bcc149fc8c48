using System.Globalization;
using System.Text.Json;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope tune</c>: the three-command job of a user with Tc, Pc and their own vapour
/// pressures (invented FRC-7 example data), and its refusals.</summary>
public sealed class TuneCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void BareCriticalPoint_TunesWritesAFluidAndTheFluidIsUsedEverywhere()
    {
        string fluid = _folder.File("frc-x.fluid");
        var result = Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "3.1MPa", "--molar-mass", "100g/mol", "--name", "frc-x", "--out", fluid, "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal($"phaseslope: wrote the tuned fluid frc-x to {fluid}\n", result.Stderr);
        using var report = StrictJson.Parse(result.Stdout);
        var root = report.RootElement;
        Assert.Equal("alpha_mathias_copeman", root.GetProperty("tuned").GetString());
        double before = root.GetProperty("aad_before_percent").GetDouble();
        double after = root.GetProperty("aad_after_percent").GetDouble();
        // The invented data carry 0.3 % noise in ln P (docs/examples/make-frc7-data.py): a tuned
        // three-parameter alpha cannot beat the noise by much, and must beat the untuned model.
        Assert.InRange(after, 0.05, 0.4);
        Assert.True(before > 3 * after, $"before {before} %, after {after} %");

        // The file is a valid fluid file whose model is the tuned one: coexist reproduces the
        // report's tuned pressure at the first data temperature.
        var tuned = FluidFile.Parse(new StringReader(File.ReadAllText(fluid)), fluid);
        Assert.Equal("frc-x", tuned.Name);
        Assert.Contains("sha256 ", tuned.Provenance, StringComparison.Ordinal);
        var first = root.GetProperty("points")[0];
        var coexist = RunJson("coexist", fluid, "-T", first.GetProperty("temperature_K").GetDouble().ToString("R", CultureInfo.InvariantCulture), "--format", "json");
        AssertRelative(first.GetProperty("pressure_after_Pa").GetDouble(), coexist.GetProperty("pressure_Pa").GetDouble(), 1e-12, "coexist with the tuned fluid");
        Assert.Contains("Mathias & Copeman", coexist.GetProperty("model").GetProperty("alpha").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void InlineFluidOrNoMolarMass_BothTune_AndTheFileHasNoMolarMass()
    {
        // The user's three facts: Tc, Pc and the data (invented FRC-7 example). No molar mass is
        // needed to tune; the file then carries none, and mass units are refused later.
        string viaOptions = _folder.File("a.fluid");
        string viaInline = _folder.File("b.fluid");
        var a = Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "3.1MPa", "--name", "frc-a", "--omega", "0.35", "--out", viaOptions);
        var b = Run("tune", FitData.ExampleCsv, "--fluid", "inline:tc=540K,pc=3.1MPa,omega=0.35,name=frc-a", "--out", viaInline);
        Assert.True(a.ExitCode == 0, a.ToString());
        Assert.True(b.ExitCode == 0, b.ToString());
        var fa = FluidFile.Parse(new StringReader(File.ReadAllText(viaOptions)), viaOptions);
        var fb = FluidFile.Parse(new StringReader(File.ReadAllText(viaInline)), viaInline);
        Assert.Null(fa.MolarMass);
        // Same constants by both routes give the same tuned parameters, to the bit.
        Assert.Equal(fa.AlphaParameters.Single().Values, fb.AlphaParameters.Single().Values);
    }

    [Fact]
    public void TunedFluid_CurveWithUncertainty_CarriesTheFittedParametersAsInputs()
    {
        // The third command of the job: a saturation table with an uncertainty on every value,
        // where the tuned alpha parameters' covariance from the fit is one of the inputs.
        string fluid = _folder.File("frc-u.fluid");
        Assert.Equal(0, Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "3.1MPa", "--name", "frc-u", "--out", fluid).ExitCode);
        var curve = Run("curve", fluid, "--points", "5", "--uncertainty", "linear", "--format", "json");
        Assert.True(curve.ExitCode == 0, curve.ToString());
        using var document = StrictJson.Parse(curve.Stdout);
        var row = document.RootElement[2].GetProperty("standard_uncertainty");
        string[] names = [.. row.GetProperty("inputs").EnumerateArray().Select(i => i.GetProperty("name").GetString()!)];
        Assert.Equal(["critical_temperature_K", "critical_pressure_Pa", "acentric_factor", "alpha_c1", "alpha_c2", "alpha_c3"], names);
        // Inside the data (row 2 is at 351 K; the data span 300-480 K) the tuned parameters follow
        // Tc and Pc (their critical sensitivity), so u(P) stays at the level of the data's 0.3 %
        // scatter over 14 points: measured 0.13 %; without the sensitivity it was 2.9 %, the
        // family-default u(Tc) and u(Pc) taken as if the data did not pin Psat there.
        double pressure = document.RootElement[2].GetProperty("pressure_Pa").GetDouble();
        Assert.InRange(row.GetProperty("pressure_Pa").GetDouble() / pressure, 1e-4, 0.005);
    }

    [Fact]
    public void LiquidDensityColumn_FitsAVolumeTranslation_ThatCoexistUses()
    {
        // Water: IAPWS saturation pressures and saturated-liquid densities (Wagner & Pruss 1993
        // equations, coefficients from memory) at 300, 350 and 400 K, as a user's file would hold them.
        string data = _folder.File("w.csv");
        File.WriteAllText(data, "T [K],P [kPa],rho_L [kg/m3]\n300,3.5368,996.51\n350,41.682,973.70\n400,245.77,937.49\n");
        string fluid = _folder.File("w.fluid");
        var result = Run("tune", data, "--fluid", "water", "--out", fluid, "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        using var document = StrictJson.Parse(result.Stdout);
        var shift = document.RootElement.GetProperty("volume_shift");
        // Peng–Robinson water is ~16 % light here; the translation brings it within ~2 %.
        Assert.True(shift.GetProperty("liquid_density_aad_before_percent").GetDouble() > 10);
        Assert.True(shift.GetProperty("liquid_density_aad_after_percent").GetDouble() < 2);
        var tuned = FluidFile.Parse(new StringReader(File.ReadAllText(fluid)), fluid);
        AssertRelative(shift.GetProperty("value_m3_mol").GetDouble(), Assert.Single(tuned.VolumeShifts).Shift.Value, 1e-15, "volume_shift_pr in the file");

        // coexist uses the file's translation by default and not with --volume-shift none; Psat is the same.
        var own = RunJson("coexist", fluid, "-T", "350", "--format", "json");
        var none = RunJson("coexist", fluid, "-T", "350", "--format", "json", "--volume-shift", "none");
        // Equal in exact arithmetic; the translated cubic's terms are summed differently (1e-13 covers that rounding).
        AssertRelative(none.GetProperty("pressure_Pa").GetDouble(), own.GetProperty("pressure_Pa").GetDouble(), 1e-13, "Psat with and without the translation");
        double measured = 973.70 / 0.018015268;
        double ownDensity = own.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble();
        double noneDensity = none.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble();
        Assert.True(Math.Abs(ownDensity / measured - 1) < Math.Abs(noneDensity / measured - 1) / 5, $"{ownDensity} vs {noneDensity}");
    }

    [Fact]
    public void MassDensityWithoutMolarMass_IsADataFileError()
    {
        string data = _folder.File("d.csv");
        File.WriteAllText(data, "T [K],P [kPa],rho_L [kg/m3]\n400,245.77,937.49\n450,932.2,890.3\n");
        string fluid = _folder.File("d.fluid");
        AssertFailure(Run("tune", data, "--tc", "647.096", "--pc", "22.064MPa", "--name", "w", "--out", fluid), ExitCodes.DataFile, "needs the molar mass");
        Assert.False(File.Exists(fluid));
    }

    [Fact]
    public void BaseAndTunedModels_PlotTogetherOverTheData()
    {
        // The figure of the job: the untuned and tuned models against the user's points.
        string fluid = _folder.File("frc-p.fluid");
        Assert.Equal(0, Run("tune", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--out", fluid).ExitCode);
        string figure = _folder.File("overlay.svg");
        var result = Run("plot", $"{FitData.ExampleFluid},{fluid}", "--diagram", "deviations", "--data", FitData.ExampleCsv, "--out", figure);
        Assert.True(result.ExitCode == 0, result.ToString());
        string svg = File.ReadAllText(figure);
        Assert.Contains("frc-7-tuned", svg, StringComparison.Ordinal);
        Assert.Contains("AAD", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void OnePoint_TunesTheAcentricFactorOnly()
    {
        string data = _folder.File("one.csv");
        // Propane's normal boiling point, 231.036 K at 101.325 kPa (Lemmon, McLinden & Wagner 2009, from memory).
        File.WriteAllText(data, "T [K],P [kPa]\n231.036,101.325\n");
        string fluid = _folder.File("p.fluid");
        var result = Run("tune", data, "--fluid", "propane", "--out", fluid, "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        using var document = StrictJson.Parse(result.Stdout);
        var json = document.RootElement;
        Assert.Equal("acentric_factor", json.GetProperty("tuned").GetString());
        double omega = json.GetProperty("parameters")[0].GetProperty("value").GetDouble();
        // Peng–Robinson through the measured Tb: within 0.01 of the tabulated 0.152 (Poling et al., from memory).
        Assert.InRange(omega, 0.142, 0.162);
        AssertRelative(101325, json.GetProperty("points")[0].GetProperty("pressure_after_Pa").GetDouble(), 1e-10, "tuned Psat at Tb");
    }

    [Theory]
    [InlineData(new[] { "--tc", "540" }, "--tc: conflicts with --fluid")]
    [InlineData(new[] { "--alpha", "cubic-spline" }, "--alpha: unknown alpha function 'cubic-spline'")]
    [InlineData(new[] { "--eos", "vdw" }, "--eos: van der Waals (1873) has no alpha function to tune")]
    [InlineData(new[] { "--format", "csv" }, "--format: unknown format 'csv' (use table or json)")]
    public void BadOption_IsAUsageError_AndWritesNothing(string[] extra, string message)
    {
        string fluid = _folder.File("t.fluid");
        AssertFailure(Run(["tune", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--out", fluid, .. extra]), ExitCodes.Usage, message);
        Assert.False(File.Exists(fluid));
    }

    [Fact]
    public void BareCriticalPointWithoutName_IsRefused()
        => AssertFailure(Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "3.1MPa", "--molar-mass", "100g/mol", "--out", _folder.File("t.fluid")),
            ExitCodes.Usage, "--name: needed with --tc and --pc");

    [Fact]
    public void CriticalPressureBelowTheData_IsOutOfRange()
    {
        // 31 Pa, a unit-less Pc read as pascals, lies below every data point.
        string fluid = _folder.File("t.fluid");
        AssertFailure(Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "31", "--molar-mass", "100g/mol", "--name", "x", "--out", fluid),
            ExitCodes.OutOfRange, "the critical pressure 31 Pa is not above the data point");
        Assert.False(File.Exists(fluid));
    }

    [Fact]
    public void ExistingOutputFile_IsLeftUntouchedOnFailure()
    {
        string fluid = _folder.File("keep.fluid");
        File.WriteAllText(fluid, "keep me");
        AssertFailure(Run("tune", FitData.ExampleCsv, "--fluid", FitData.ExampleFluid, "--out", fluid, "--alpha", "nonesuch"), ExitCodes.Usage);
        Assert.Equal("keep me", File.ReadAllText(fluid));
    }
}

public sealed class FluidShowModelDataTests
{
    [Fact]
    public void Propane_ShowsItsPublishedEquationAndDerivedConstants()
    {
        var json = RunJson("fluids", "show", "propane", "--format", "json");
        var equation = json.GetProperty("vapour_pressure_equation");
        // Lemmon, McLinden & Wagner 2009 ancillary equation (coefficients from memory): five terms.
        Assert.Equal(5, equation.GetProperty("coefficients").GetArrayLength());
        Assert.Contains("Lemmon", equation.GetProperty("source").GetString(), StringComparison.Ordinal);
        var sets = json.GetProperty("alpha_parameters").EnumerateArray().ToArray();
        Assert.Equal(["pr", "srk"], sets.Select(s => s.GetProperty("eos").GetString()!).ToArray());
        Assert.All(sets, s => Assert.Contains("derived by phaseslope tune", s.GetProperty("source").GetString(), StringComparison.Ordinal));
        Assert.Equal(JsonValueKind.Null, json.GetProperty("alpha_default").ValueKind);
    }
}

public sealed class TunedStateUncertaintyTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void State_LinearAndMonteCarlo_AgreeForATunedFluid()
    {
        // Both methods must see the same inputs, the tuned parameters included: Monte Carlo
        // (20 000 samples: the standard error of a standard deviation is 1/sqrt(2N) = 0.5 %) within
        // 3 % of the linear value for the liquid density and residual enthalpy (invented FRC-7 data).
        string fluid = _folder.File("s.fluid");
        Assert.Equal(0, Run("tune", FitData.ExampleCsv, "--tc", "540", "--pc", "3.1MPa", "--name", "frc-s", "--out", fluid).ExitCode);
        var linear = RunJson("state", fluid, "-T", "400", "-P", "1MPa", "--uncertainty", "linear", "--format", "json").GetProperty("standard_uncertainty");
        var monte = RunJson("state", fluid, "-T", "400", "-P", "1MPa", "--uncertainty", "monte-carlo", "--samples", "20000", "--seed", "7", "--format", "json").GetProperty("standard_uncertainty");
        foreach (string key in new[] { "density_mol_m3", "residual_enthalpy_J_mol" })
        {
            AssertRelative(linear.GetProperty(key).GetDouble(), monte.GetProperty(key).GetDouble(), 0.03, key);
        }
    }
}

public sealed class StateResponseUncertaintyTests
{
    [Fact]
    public void ResponseFunctionUncertainties_LinearAgreesWithMonteCarlo()
    {
        // Propane liquid at 300 K, 2 MPa with the alkane family defaults: u(cp), u(cv), u(kappa_T),
        // u(alpha) and u(mu_JT) by exact linear propagation against 8 000 Monte Carlo samples
        // (standard error of a standard deviation 1/sqrt(2N) = 0.8 %; held to 4 of them).
        var monte = RunJson("state", "propane", "-T", "300", "-P", "2MPa", "--uncertainty", "monte-carlo", "--samples", "8000", "--seed", "3", "--format", "json").GetProperty("standard_uncertainty");
        var linear = RunJson("state", "propane", "-T", "300", "-P", "2MPa", "--uncertainty", "linear", "--format", "json").GetProperty("standard_uncertainty");
        foreach (string key in new[] { "isobaric_heat_capacity_J_molK", "isochoric_heat_capacity_J_molK", "isothermal_compressibility_1_Pa", "isobaric_expansivity_1_K", "joule_thomson_coefficient_K_Pa", "speed_of_sound_m_s" })
        {
            AssertRelative(monte.GetProperty(key).GetDouble(), linear.GetProperty(key).GetDouble(), 4 / Math.Sqrt(2 * 8000.0), key);
        }

        Assert.Equal(JsonValueKind.Null, linear.GetProperty("response_functions_undefined_reason").ValueKind);
    }

    [Fact]
    public void WithoutIdealGasHeatCapacity_CpUncertaintyIsNullWithTheReason()
    {
        var linear = RunJson("state", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "-T", "300", "-P", "2MPa", "--uncertainty", "linear", "--format", "json").GetProperty("standard_uncertainty");
        Assert.Equal(JsonValueKind.Null, linear.GetProperty("isobaric_heat_capacity_J_molK").ValueKind);
        Assert.True(linear.GetProperty("isothermal_compressibility_1_Pa").GetDouble() > 0);
        Assert.Contains("ideal-gas heat capacity", linear.GetProperty("response_functions_undefined_reason").GetString(), StringComparison.Ordinal);
    }
}
