using System.Text.Json;
using PhaseSlope.Cli.Output;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Output;

/// <summary>No NaN or infinity reaches a table, CSV or JSON: undefined values are null, empty or
/// "undefined" with a reason; overflows are errors.</summary>
public class FiniteNumbersTests
{
    /// <summary>Temperatures a few nanokelvin apart: the three Antoine parameters cannot be told
    /// apart to double precision, so the covariance is singular.</summary>
    private const string NearDuplicates = "T [K],P [kPa]\n300,100\n300.000000001,100.0000001\n300.000000002,100.0000002\n300.000000003,100.0000003\n";

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void Writers_NonFiniteValue_Throw(double value)
    {
        Assert.Throws<NonFiniteResultException>(() => NumberText.Table(value));
        Assert.Throws<NonFiniteResultException>(() => NumberText.RoundTrip(value));
        var ex = Assert.Throws<NonFiniteResultException>(() => JsonText.Write(json =>
        {
            json.WriteStartObject();
            json.WriteFinite("molar_mass_kg_mol", value);
            json.WriteEndObject();
        }));
        Assert.Contains("molar_mass_kg_mol", ex.Message, StringComparison.Ordinal);
        Assert.Equal("", NumberText.RoundTripOrEmpty(value));
        Assert.Equal("undefined", NumberText.TableOrUndefined(value));
        string text = JsonText.Write(json =>
        {
            json.WriteStartObject();
            json.WriteNumberOrNull("cp", value);
            json.WriteEndObject();
        });
        Assert.Equal(JsonValueKind.Null, StrictJson.Parse(text).RootElement.GetProperty("cp").ValueKind);
    }

    [Fact]
    public void Guard_Overflow_ExitFourWithOneLine()
    {
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        var io = new CliIo(stdout, stderr);

        int code = io.Guard(() => stdout.Write(NumberText.Table(double.MaxValue * 10)));

        Assert.Equal(ExitCodes.OutOfRange, code);
        Assert.Equal("", stdout.ToString());
        Assert.Equal("phaseslope: error: the result overflows: a value is infinite; check the magnitudes of the inputs\n", stderr.ToString().ReplaceLineEndings("\n"));
    }

    [Fact]
    public void Fit_NearDuplicateTemperatures_JsonHasNullStandardErrorsWithAReason()
    {
        using var folder = new TempFolder();
        string data = folder.File("near.csv");
        File.WriteAllText(data, NearDuplicates);

        var json = RunJson("fit", data, "--form", "antoine", "--format", "json");

        Assert.Equal(JsonValueKind.Null, json.GetProperty("standard_errors").ValueKind);
        Assert.Equal(JsonValueKind.Null, json.GetProperty("covariance").ValueKind);
        Assert.Contains("temperatures too close together", json.GetProperty("covariance_undefined_reason").GetString(), StringComparison.Ordinal);
        Assert.Equal(4, json.GetProperty("residuals").GetArrayLength());
    }

    [Fact]
    public void Fit_NearDuplicateTemperatures_TableSaysUndefinedAndWhy()
    {
        using var folder = new TempFolder();
        string data = folder.File("near.csv");
        File.WriteAllText(data, NearDuplicates);

        string text = RunText("fit", data, "--form", "antoine");

        Assert.DoesNotContain("NaN", text, StringComparison.Ordinal);
        Assert.DoesNotContain("Infinity", text, StringComparison.Ordinal);
        Assert.Contains("standard errors undefined: the data do not determine the parameters", text, StringComparison.Ordinal);
        Assert.Equal(3, text.Split('\n').Count(l => l.TrimEnd().EndsWith("undefined", StringComparison.Ordinal) && !l.StartsWith("standard", StringComparison.Ordinal)));
    }

    [Fact]
    public void Fit_WellSpreadData_CovarianceStaysDefined()
    {
        using var folder = new TempFolder();
        string data = folder.File("data.csv");
        File.WriteAllText(data, "T [K],P [kPa]\n250,218.4\n270,415.6\n290,722.4\n310,1172.6\n330,1802.7\n");

        var json = RunJson("fit", data, "--form", "antoine", "--format", "json");

        Assert.Equal(JsonValueKind.Object, json.GetProperty("standard_errors").ValueKind);
        Assert.Equal(3, json.GetProperty("covariance").GetArrayLength());
        Assert.Equal(JsonValueKind.Null, json.GetProperty("covariance_undefined_reason").ValueKind);
    }

    [Theory]
    [InlineData("1e308 g/mol", "1E+308")]
    [InlineData("0.5 g/mol", "0.5")]
    [InlineData("20000 g/mol", "20000")]
    public void FluidFile_ImplausibleMolarMass_RefusedWithLineAndField(string molarMass, string shown)
    {
        using var folder = new TempFolder();
        string path = folder.File("odd.fluid");
        File.WriteAllText(path, CatalogFileText("propane.fluid").Replace("44.09562 g/mol", molarMass, StringComparison.Ordinal));
        string output = folder.File("out.json");
        File.WriteAllText(output, "kept\n");

        var result = Run("coexist", path, "-T", "300", "--format", "json", "-o", output);

        AssertFailure(result, ExitCodes.Fluid, $"{path}:9: field 'molar_mass': implausible value {shown} g/mol; expected between 1 and 10000 g/mol");
        Assert.Equal("kept\n", File.ReadAllText(output));
    }
}
