using System.Globalization;
using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Output;

/// <summary>Numbers are always written with the invariant culture: culture invariance of every format, checked by running the tool under de-DE (decimal
/// comma) and comparing with the invariant culture.</summary>
public class NumberTextTests
{
    public static TheoryData<string[]> Commands => new()
    {
        { ["coexist", "propane", "--temperature", "300.5", "--format", "json"] },
        { ["coexist", "propane", "--temperature", "300.5", "--format", "csv"] },
        { ["coexist", "propane", "--temperature", "300.5"] },
        { ["coexist", "propane", "--pressure", "1.5 bar", "--units", "engineering"] },
        { ["curve", "water", "--points", "6", "--format", "json"] },
        { ["curve", "water", "--points", "6", "--format", "csv"] },
        { ["curve", "water", "--points", "6"] },
        { ["curve", "water", "--points", "6", "--units", "engineering"] },
        { ["curve", "water", "--points", "6", "--format", "csv", "--units", "engineering"] },
        { ["curve", "r-134a", "--from", "-40 degC", "--to", "80 degC", "--step", "7.5", "--units", "engineering"] },
        { ["curve", "water", "--pressures", "0.5,1,2 bar", "--uncertainty", "linear"] },
        { ["fluids", "list"] },
        { ["fluids", "list", "--format", "csv"] },
        { ["fluids", "show", "r-134a"] },
        { ["fluids", "show", "r-134a", "--format", "json"] },
        { ["state", "propane", "-T", "300.5", "-P", "1.5 MPa", "--format", "json"] },
        { ["state", "propane", "-T", "300.5", "-P", "1.5 MPa", "--format", "csv"] },
        { ["state", "propane", "-T", "300.5", "-P", "1.5 MPa"] },
        { ["state", "water", "-T", "26.85 degC", "-P", "1 atm", "--units", "engineering", "--reference", "nbp"] },
        { ["state", "propane", "-T", "300.5", "--density", "515.5 kg/m3", "--format", "json", "--reference", "refrigeration"] },
        { ["derive", "propane", "--of", "T", "--by", "P", "--hold", "H", "-T", "300.5", "-P", "0.5 bar", "--format", "json"] },
        { ["derive", "propane", "--of", "T", "--by", "P", "--hold", "H", "-T", "300.5", "-P", "0.5 bar", "--format", "csv"] },
        { ["derive", "propane", "--of", "T", "--by", "P", "--hold", "H", "-T", "300.5", "-P", "0.5 bar"] },
        { ["fit", ExampleCsv, "--fluid", ExampleFluid, "--format", "json"] },
        { ["fit", ExampleCsv, "--fluid", ExampleFluid, "--format", "csv"] },
        { ["fit", ExampleCsv, "--fluid", ExampleFluid] },
        { ["latent", ExampleCsv, "--fluid", ExampleFluid, "--format", "json"] },
        { ["latent", ExampleCsv, "--fluid", ExampleFluid, "--format", "csv"] },
        { ["latent", ExampleCsv, "--fluid", ExampleFluid] },
        { ["latent", ExampleCsv, "--tc", "540", "--pc", "3.1 MPa", "--form", "wagner-2.5-5", "-T", "26.85 degC"] },
    };

    private static string ExampleCsv => PhaseSlope.Cli.Tests.Commands.FitData.ExampleCsv;

    private static string ExampleFluid => PhaseSlope.Cli.Tests.Commands.FitData.ExampleFluid;

    private static CliResult RunIn(string culture, string[] args)
    {
        using var scope = new CultureScope(culture);
        // Guard against a vacuous test: the culture must really use a decimal comma.
        if (culture == "de-DE")
        {
            Assert.Equal("1,5", 1.5.ToString(CultureInfo.CurrentCulture));
        }

        return Run(args);
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public void Render_GermanCulture_SameTextAsInvariantCulture(string[] args)
    {
        var german = RunIn("de-DE", args);
        var invariant = RunIn("", args);

        Assert.True(german.ExitCode == 0, german.ToString());
        Assert.Equal(invariant.Stdout, german.Stdout);
        Assert.Equal(invariant.Stderr, german.Stderr);
    }

    [Fact]
    public void Render_GermanCulture_DotDecimalsAndInputsReadWithDot()
    {
        var json = RunIn("de-DE", ["coexist", "propane", "--temperature", "300.5", "--format", "json"]);
        using var document = StrictJson.Parse(json.Stdout);
        Assert.Equal(300.5, document.RootElement.GetProperty("temperature_K").GetDouble());

        var csv = RunIn("de-DE", ["curve", "propane", "--points", "3", "--format", "csv"]);
        var rows = PhaseSlope.Cli.Tests.Commands.CurveCommandTests.ParseCsv(csv.Stdout);
        Assert.All(rows, row => Assert.Equal(rows[0].Length, row.Length));
        int t = Array.IndexOf(rows[0], "temperature_K");
        Assert.All(rows.Skip(1), row => Assert.Matches(@"^-?[0-9]+(\.[0-9]+)?(E[-+][0-9]+)?$", row[t]));
        Assert.All(rows.Skip(1).SelectMany(r => r), cell => Assert.DoesNotMatch(@"^-?[0-9]+,[0-9]+$", cell));

        var table = RunIn("de-DE", ["coexist", "propane", "--temperature", "300.5"]);
        Assert.Contains("saturation temperature  300.5 K\n", table.Stdout, StringComparison.Ordinal);
        Assert.DoesNotMatch(@"[0-9],[0-9]", table.Stdout);
    }

    [Fact]
    public void Render_GermanCulture_ErrorMessagesUseDotDecimals()
    {
        var result = RunIn("de-DE", ["coexist", "propane", "--temperature", "400.5"]);

        AssertFailure(result, ExitCodes.OutOfRange, "400.5 K");
        Assert.Contains("369.89 K", result.Stderr, StringComparison.Ordinal);
    }
}
