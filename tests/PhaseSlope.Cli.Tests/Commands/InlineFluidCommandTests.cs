using System.Globalization;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>FLUID given inline from critical constants, and a fluid without cp° or a molar mass.</summary>
public class InlineFluidCommandTests
{
    // fluids/propane.fluid writes exactly these texts (Lemmon, McLinden & Wagner 2009 for Tc and Pc,
    // Poling, Prausnitz & O'Connell 2001 for ω, the IUPAC 2005 atomic weights for M; from memory).
    private const string Propane = "inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=44.09562g/mol,name=propane";
    private const string PropaneNoMass = "inline:tc=369.89K,pc=4.2512MPa,omega=0.152";

    [Theory]
    [InlineData("--temperature", "250")]
    [InlineData("--temperature", "369.8")]
    [InlineData("--pressure", "3 bar")]
    public void Coexist_InlineFromCatalogText_SameJsonAsCatalog(string option, string value)
    {
        // Byte-for-byte: the same texts read by the same fluid-file code give the same doubles, the
        // model sees only Tc, Pc and ω, and without cp° the catalog's coexist JSON and the inline
        // one differ only where cp° enters (absent here: the comparison drops the full-phase keys).
        var inline = RunJson("coexist", Propane, option, value, "--format", "json");
        var catalog = RunJson("coexist", "propane", option, value, "--format", "json");

        foreach (string key in new[] { "temperature_K", "pressure_Pa", "slope_Pa_K", "enthalpy_of_vaporization_J_mol" })
        {
            if (catalog.TryGetProperty(key, out var expected))
            {
                AssertSameDouble(expected.GetDouble(), inline.GetProperty(key).GetDouble(), key);
            }
        }

        foreach (string phase in new[] { "liquid", "vapour" })
        {
            foreach (string key in new[] { "density_mol_m3", "compressibility_factor", "ln_fugacity_coefficient", "residual_enthalpy_J_mol" })
            {
                AssertSameDouble(catalog.GetProperty(phase).GetProperty(key).GetDouble(), inline.GetProperty(phase).GetProperty(key).GetDouble(), $"{phase}.{key}");
            }
        }
    }

    [Theory]
    [InlineData(300.0, 2e6)]
    [InlineData(300.0, 1e5)]
    [InlineData(450.0, 6e6)]
    public void State_InlineWithoutCp_ResidualKeysAsCatalogAndCpKeysNullWithReason(double t, double p)
    {
        string T = t.ToString("R", CultureInfo.InvariantCulture), P = p.ToString("R", CultureInfo.InvariantCulture);
        var inline = RunJson("state", Propane, "-T", T, "-P", P, "--format", "json");
        var catalog = RunJson("state", "propane", "-T", T, "-P", P, "--format", "json");

        // Bit-for-bit: the residual part is the same function of the same doubles.
        foreach (string key in new[]
        {
            "temperature_K", "pressure_Pa", "density_mol_m3", "molar_volume_m3_mol", "compressibility_factor",
            "isobaric_expansivity_1_K", "isothermal_compressibility_1_Pa", "internal_pressure_Pa", "ln_fugacity_coefficient",
            "residual_enthalpy_J_mol", "residual_entropy_J_molK", "heat_capacity_difference_J_molK", "density_kg_m3",
        })
        {
            AssertSameDouble(catalog.GetProperty(key).GetDouble(), inline.GetProperty(key).GetDouble(), key);
        }

        foreach (string key in new[]
        {
            "internal_energy_J_mol", "enthalpy_J_mol", "entropy_J_molK", "helmholtz_energy_J_mol", "gibbs_energy_J_mol",
            "isobaric_heat_capacity_J_molK", "isochoric_heat_capacity_J_molK", "ideal_gas_heat_capacity_J_molK",
            "speed_of_sound_m_s", "isentropic_compressibility_1_Pa", "joule_thomson_coefficient_K_Pa",
        })
        {
            Assert.Equal(JsonValueKind.Number, catalog.GetProperty(key).ValueKind);
            Assert.Equal(JsonValueKind.Null, inline.GetProperty(key).ValueKind);
        }

        Assert.Contains("cp°", inline.GetProperty("ideal_gas_unavailable_reason").GetString(), StringComparison.Ordinal);
        Assert.False(catalog.TryGetProperty("ideal_gas_unavailable_reason", out _));
        // cp − cv written by the catalog fluid equals its cp minus its cv to rounding (1e-12 relative).
        AssertRelative(catalog.GetProperty("isobaric_heat_capacity_J_molK").GetDouble() - catalog.GetProperty("isochoric_heat_capacity_J_molK").GetDouble(),
            catalog.GetProperty("heat_capacity_difference_J_molK").GetDouble(), 1e-12, "cp - cv");
    }

    [Fact]
    public void State_TableAndCsvWithoutCpOrMolarMass_NotApplicableWithNotesAndEmptyCells()
    {
        string table = RunText("state", PropaneNoMass, "-T", "300", "-P", "2e6");
        Assert.Matches(@"enthalpy h\s+n/a", table);
        Assert.Matches(@"speed of sound\s+n/a", table);
        Assert.Matches(@"residual enthalpy\s+-?\d", table);
        Assert.Contains("note: n/a: needs the ideal-gas heat capacity cp°", table, StringComparison.Ordinal);
        Assert.Contains("note: n/a: the speed of sound and mass-based values need the molar mass", table, StringComparison.Ordinal);

        var rows = CurveCommandTests.ParseCsv(RunText("state", PropaneNoMass, "-T", "300", "-P", "2e6", "--format", "csv"));
        string[] keys = rows[0];
        string[] cells = rows[1];
        Assert.Equal("", cells[Array.IndexOf(keys, "enthalpy_J_mol")]);
        Assert.Equal("", cells[Array.IndexOf(keys, "speed_of_sound_m_s")]);
        Assert.NotEqual("", cells[Array.IndexOf(keys, "residual_enthalpy_J_mol")]);

        var json = RunJson("state", PropaneNoMass, "-T", "300", "-P", "2e6", "--format", "json");
        Assert.Equal(JsonValueKind.Null, json.GetProperty("molar_mass_kg_mol").ValueKind);
        Assert.Equal(JsonValueKind.Null, json.GetProperty("density_kg_m3").ValueKind);
        Assert.Contains("molar mass", json.GetProperty("molar_mass_unavailable_reason").GetString(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("U", "V", "T")]
    [InlineData("H", "S", "P")]
    [InlineData("V", "T", "P")]
    [InlineData("P", "T", "V")]
    public void Derive_NotNeedingCp_SameValueAsCatalogToRounding(string of, string by, string hold)
    {
        var inline = RunJson("derive", Propane, "--of", of, "--by", by, "--hold", hold, "-T", "300", "-P", "2e6", "--format", "json");
        var catalog = RunJson("derive", "propane", "--of", of, "--by", by, "--hold", hold, "-T", "300", "-P", "2e6", "--format", "json");

        // The catalog path evaluates the Jacobian with cv, the inline one without (see
        // PartialDerivatives); they agree to a few roundings, 1e-12 relative.
        AssertRelative(catalog.GetProperty("value").GetDouble(), inline.GetProperty("value").GetDouble(), 1e-12, $"(d{of}/d{by})_{hold}");
    }

    [Theory]
    [InlineData("H", "T", "P")]
    [InlineData("T", "P", "S")]
    [InlineData("G", "T", "P")]
    [InlineData("S", "T", "V")]
    public void Derive_NeedingCp_RefusedExit3NamingCp(string of, string by, string hold)
    {
        var result = Run("derive", Propane, "--of", of, "--by", by, "--hold", hold, "-T", "300", "-P", "2e6");

        AssertFailure(result, ExitCodes.Fluid, "ideal_gas_cp");
        Assert.Contains("cp°", result.Stderr, StringComparison.Ordinal);
        Assert.Contains($"(d{of}/d{by}) at constant {hold}", result.Stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("inline:tc=369.89,pc=4.2512MPa,omega=0.152", "'tc'")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa", "'omega'")]
    [InlineData("inline:tcc=369.89K,pc=4.2512MPa,omega=0.152", "'tcc'")]
    [InlineData("inline:tc=369.89K,pc=0MPa,omega=0.152", "'pc'")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=44", "'molar_mass'")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,name=A;B", "'name'")]
    [InlineData("inline:tc=369.89K±0.1bar,pc=4.2512MPa,omega=0.152", "'tc'")]
    [InlineData("inline:", "inline fluid")]
    public void AnyCommand_BadInlineDefinition_UsageErrorNamingTheKey(string fluid, string named)
    {
        foreach (string[] args in new[]
        {
            new[] { "coexist", fluid, "-T", "300" },
            ["state", fluid, "-T", "300", "-P", "1e5"],
            ["derive", fluid, "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1e5"],
            ["curve", fluid],
            ["fluids", "show", fluid],
        })
        {
            var result = Run(args);
            AssertFailure(result, ExitCodes.Usage, named);
            Assert.Contains("FLUID: inline fluid", result.Stderr, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void EngineeringUnits_WithoutMolarMass_RefusedNamingIt()
    {
        foreach (string[] args in new[]
        {
            new[] { "coexist", PropaneNoMass, "-T", "300", "--units", "engineering" },
            ["curve", PropaneNoMass, "--units", "engineering"],
            ["state", PropaneNoMass, "-T", "300", "-P", "1e5", "--units", "engineering"],
            ["fluids", "show", PropaneNoMass, "--units", "engineering"],
        })
        {
            AssertFailure(Run(args), ExitCodes.Fluid, "gives no molar mass");
        }

        // The same with a molar mass works.
        Assert.Contains("kJ/kg", RunText("coexist", Propane, "-T", "300", "--units", "engineering"), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("coexist", "-T", "300")]
    [InlineData("curve", "--points", "3")]
    [InlineData("state", "-T", "300", "-P", "1e5")]
    public void Reference_OtherThanBaseWithoutCp_RefusedNotIgnored(string command, params string[] rest)
    {
        // A reference sets the zero of h and s, which a fluid without cp° does not have.
        AssertFailure(Run([command, PropaneNoMass, .. rest, "--reference", "nbp"]), ExitCodes.Fluid, "reference state 'nbp'");
        Assert.Equal(0, Run([command, PropaneNoMass, .. rest, "--reference", "ideal-gas"]).ExitCode);
    }

    [Fact]
    public void State_MassDensityWithoutMolarMass_UsageError()
        => AssertFailure(Run("state", PropaneNoMass, "-T", "300", "--density", "500 kg/m3"), ExitCodes.Usage, "--density");

    [Fact]
    public void FluidsShow_Inline_SourcesAndUncertaintiesShown()
    {
        var json = RunJson("fluids", "show", "inline:tc=369.89K±0.05K,pc=4.2512MPa±5kPa,omega=0.152,name=my-propane", "--format", "json");

        Assert.Equal("my-propane", json.GetProperty("name").GetString());
        Assert.Equal(InlineFluid.Source, json.GetProperty("sources").GetProperty("critical_temperature_K").GetString());
        Assert.Equal(InlineFluid.Source, json.GetProperty("sources").GetProperty("acentric_factor").GetString());
        string table = RunText("fluids", "show", "inline:tc=369.89K±0.05K,pc=4.2512MPa±5kPa,omega=0.152,name=my-propane");
        Assert.Contains("given on the command line", table, StringComparison.Ordinal);
        Assert.Matches(@"critical pressure\s+4251\.2\s+5\s+kPa", table);
    }

    [Fact]
    public void Resolve_PrefixInAnyCase_ReadInlineNotAsAPath()
    {
        // "kg/mol" holds a '/', which would make any other argument a path.
        Assert.Equal(44.1e-3, FluidResolver.Resolve("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=0.0441kg/mol").MolarMass!.Value, 15);
        Assert.Equal("inline-fluid", FluidResolver.Resolve("  INLINE:tc=369.89K,pc=4.2512MPa,omega=0.152").Name);
    }

    [Theory]
    [InlineData("propane,butane", new[] { "propane", "butane" })]
    [InlineData("propane,inline:tc=369.89K,pc=4.2512MPa,omega=0.152,butane", new[] { "propane", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "butane" })]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,inline:tc=425.125K,pc=3.796MPa,omega=0.201", new[] { "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "inline:tc=425.125K,pc=3.796MPa,omega=0.201" })]
    public void SplitList_InlineDefinitionKeepsItsKeyValueItems(string text, string[] expected)
        => Assert.Equal(expected, FluidResolver.SplitList(text));

    [Fact]
    public void Plot_InlineFluidInAList_Rendered()
    {
        using var folder = new TempFolder();
        string path = folder.File("pt.svg");
        var result = Run("plot", "propane,inline:tc=425.125K,pc=3.796MPa,omega=0.201,name=my-butane", "--diagram", "p-t", "--out", path);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Contains("my-butane", File.ReadAllText(path), StringComparison.Ordinal);
    }

    [Fact]
    public void Plot_PressureEnthalpyWithoutCp_RefusedNamingCp()
    {
        using var folder = new TempFolder();
        string path = folder.File("ph.svg");

        AssertFailure(Run("plot", PropaneNoMass, "--diagram", "p-h", "--out", path), ExitCodes.Fluid, "ideal_gas_cp");
        Assert.False(File.Exists(path));
    }
}
