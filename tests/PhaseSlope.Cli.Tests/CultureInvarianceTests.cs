using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests;

/// <summary>Every printed result is byte-identical whatever the culture of the process: a
/// comma-decimal culture, a culture with non-Latin digits and grouping, and the invariant one.</summary>
public class CultureInvarianceTests
{
    public static TheoryData<string[]> Invocations()
    {
        string data = PhaseSlope.Cli.Tests.Commands.FitData.ExampleCsv;
        string fluid = PhaseSlope.Cli.Tests.Commands.FitData.ExampleFluid;
        var rows = new TheoryData<string[]>();
        foreach (string format in new[] { "table", "csv", "json" })
        {
            rows.Add(["coexist", "propane", "--temperature", "26.85 degC", "--format", format]);
            rows.Add(format == "table"
                ? ["coexist", "r-134a", "--pressure", "1.2 bar", "--format", format, "--units", "engineering"]
                : ["coexist", "r-134a", "--pressure", "1.2 bar", "--format", format]);
            rows.Add(["curve", "water", "--points", "12", "--format", format]);
            rows.Add(["curve", "water", "--line", "melting", "--points", "4", "--format", format]);
            rows.Add(["curve", "carbon dioxide", "--line", "sublimation", "--points", "4", "--format", format]);
            rows.Add(["state", "toluene", "--temperature", "25 degC", "--pressure", "3 bar", "--format", format]);
            rows.Add(["fit", data, "--fluid", fluid, "--format", format]);
        }

        rows.Add(["derive", "toluene", "--of", "U", "--by", "V", "--hold", "T", "--temperature", "25 degC", "--pressure", "3 bar", "--format", "json"]);
        rows.Add(["fluids", "show", "propane", "--format", "json"]);
        rows.Add(["fluids", "show", "water", "--format", "json"]);
        rows.Add(["fluids", "show", "water"]);
        rows.Add(["fluids", "list"]);
        rows.Add(["latent", data, "--fluid", fluid, "--format", "json"]);
        // Fractions and k_ij are read with a '.' decimal point whatever the culture.
        rows.Add(["mixture", "R-32=0.23,R-125=0.25,R-134a=0.52", "--mass-fractions", "--kij", "R-32,R-125=0.01"]);
        rows.Add(["mixture", "methane=0.85,CO2=0.1,N2=0.05", "--format", "json"]);
        // Mixture equilibrium: tables and JSON of a bubble point with its glide and of a split.
        rows.Add(["bubble", "R-32=0.23,R-125=0.25,R-134a=0.52", "--mass-fractions", "--pressure", "1 atm"]);
        rows.Add(["dew", "R-32=0.23,R-125=0.25,R-134a=0.52", "--mass-fractions", "--pressure", "1 atm", "--format", "json"]);
        rows.Add(["flash", "methane=0.2,propane=0.8", "--temperature", "250 K", "--pressure", "1 MPa"]);
        rows.Add(["flash", "methane=0.2,propane=0.8", "--pressure", "1 MPa", "--enthalpy", "-15 kJ/mol", "--format", "json"]);
        return rows;
    }

    [Theory]
    [MemberData(nameof(Invocations))]
    public void Output_UnderAnyCulture_IsByteIdentical(string[] args)
    {
        CliResult reference;
        using (new CultureScope("en-US"))
        {
            reference = Run(args);
        }

        Assert.True(reference.ExitCode == 0, reference.ToString());
        if (args.Contains("json"))
        {
            using var strict = StrictJson.Parse(reference.Stdout);
        }

        // German and French write decimal commas; Arabic (Saudi Arabia) has its own digits,
        // separators and calendar; Turkish has the dotless i that breaks case-insensitive ids.
        foreach (string culture in new[] { "de-DE", "fr-FR", "ar-SA", "tr-TR" })
        {
            using var scope = new CultureScope(culture);
            var result = Run(args);
            Assert.Equal(reference.ExitCode, result.ExitCode);
            Assert.True(reference.Stdout == result.Stdout, $"{culture}: stdout differs for {string.Join(' ', args)}");
            Assert.Equal(reference.Stderr, result.Stderr);
        }
    }
}
