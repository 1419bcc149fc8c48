using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The <c>ideal_gas_cp</c> and alpha-parameter keys of the fluid-file parser.</summary>
public class FluidFileCorrelationTests
{
    private const double R = Constants.GasConstant;

    // The examples of docs/fluid-files.md, section "Ideal-gas heat capacity", verbatim.
    // Propane: Lemmon, McLinden & Wagner, J. Chem. Eng. Data 54, 3141 (2009); methanol: Poling,
    // Prausnitz & O'Connell, 5th ed. (2001), Appendix A; carbon dioxide (first two terms): Span &
    // Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996); all from memory.
    private const string PropaneExample = "ideal_gas_cp   power 4^0  einstein 3.043@393 5.874@1237 9.337@1984 7.922@4351  range 85.525-650 K | Lemmon, McLinden & Wagner (2009); from memory";
    private const string MethanolExample = "ideal_gas_cp   power 4.714^0 -6.986e-3^1 4.211e-5^2 -4.443e-8^3 1.535e-11^4  range 50-1000 K | Poling, Prausnitz & O'Connell, 5th ed. (2001), Appendix A; from memory";
    private const string ReducedExample = "ideal_gas_cp   reduce 304.1282 K  power 3.5^0  einstein 1.99427042@3.15163 0.62105248@6.11190  range 216.592 - 1100 K | Span & Wagner (1996), first two terms only; from memory";
    private const string MonatomicExample = "ideal_gas_cp   power 2.5^0  range 83.8058–700 K | kinetic theory of the monatomic ideal gas";

    // Parser input only: these numbers exercise the syntax and are not a published parameter set.
    private const string NotPublished = "parser test input, not a published parameter set";

    private static Fluid ParseWith(string extraLine) =>
        FluidFile.Parse(new StringReader(FluidFileTestData.WithExtraLine(extraLine)), FluidFileTestData.Origin);

    private static IdealGasHeatCapacity CpOf(string line) => ParseWith(line).IdealGasHeatCapacity!;

    [Fact]
    public void PropaneExample_EinsteinTemperaturesInKelvin()
    {
        IdealGasHeatCapacity cp = CpOf(PropaneExample);

        Assert.Equal(1.0, cp.ReducingTemperature);
        Assert.Equal(new[] { (4.0, 0.0) }, cp.PowerTerms);
        Assert.Equal(new[] { (3.043, 393.0), (5.874, 1237.0), (9.337, 1984.0), (7.922, 4351.0) }, cp.EinsteinTerms);
        Assert.Equal(85.525, cp.MinimumTemperature);
        Assert.Equal(650.0, cp.MaximumTemperature);
        Assert.Equal("Lemmon, McLinden & Wagner (2009); from memory", cp.Source);
    }

    [Fact]
    public void MethanolExample_PolynomialInKelvin()
    {
        IdealGasHeatCapacity cp = CpOf(MethanolExample);

        Assert.Equal(new[] { (4.714, 0.0), (-6.986e-3, 1.0), (4.211e-5, 2.0), (-4.443e-8, 3.0), (1.535e-11, 4.0) }, cp.PowerTerms);
        Assert.Empty(cp.EinsteinTerms);
        // The polynomial written out at 400 K.
        double t = 400;
        double reduced = 4.714 - 6.986e-3 * t + 4.211e-5 * t * t - 4.443e-8 * t * t * t + 1.535e-11 * t * t * t * t;
        AssertClose.Relative(R * reduced, cp.HeatCapacity(t), 1e-13, "methanol example cp° at 400 K");
    }

    [Fact]
    public void ReducedExample_ScalesEinsteinTemperaturesAndPowerTermsByTr()
    {
        IdealGasHeatCapacity cp = CpOf(ReducedExample);

        Assert.Equal(304.1282, cp.ReducingTemperature);
        Assert.Equal(3.15163 * 304.1282, cp.EinsteinTerms[0].Temperature);
        Assert.Equal(6.11190 * 304.1282, cp.EinsteinTerms[1].Temperature);
        Assert.Equal(216.592, cp.MinimumTemperature);
        Assert.Equal(1100.0, cp.MaximumTemperature);
    }

    [Fact]
    public void MonatomicExample_EnDashRange()
    {
        IdealGasHeatCapacity cp = CpOf(MonatomicExample);

        Assert.Equal(83.8058, cp.MinimumTemperature);
        Assert.Equal(700.0, cp.MaximumTemperature);
        Assert.Equal(2.5 * R, cp.HeatCapacity(300), 12);
    }

    [Fact]
    public void DocumentedExamples_AppearVerbatimInTheSchema()
    {
        string docs = File.ReadAllText(Path.Combine(RepositoryRoot(), "docs", "fluid-files.md"));

        foreach (string example in new[] { PropaneExample, MethanolExample, ReducedExample, MonatomicExample })
        {
            Assert.Contains(example + "\n", docs.ReplaceLineEndings("\n"), StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("ideal_gas_cp range 50-1000 K power 4^0 | s")]
    [InlineData("ideal_gas_cp   power   4^0    range   50 - 1000   K   |   s")]
    [InlineData("ideal_gas_cp power 4^0 range 5e1-1e3 K | s")]
    [InlineData("ideal_gas_cp power 4^0 range 5.0E+1-1.0E+3 K | s")]
    [InlineData("ideal_gas_cp power 4^0 range 50–1000 K | s")]
    [InlineData("ideal_gas_cp reduce 1 K power 4^0 range 50-1000 K | s")]
    public void SpacingOrderAndNumberSpellings_GiveTheSameCorrelation(string line)
    {
        IdealGasHeatCapacity cp = CpOf(line);

        Assert.Equal(new[] { (4.0, 0.0) }, cp.PowerTerms);
        Assert.Equal(1.0, cp.ReducingTemperature);
        Assert.Equal(50.0, cp.MinimumTemperature);
        Assert.Equal(1000.0, cp.MaximumTemperature);
        Assert.Equal("s", cp.Source);
    }

    [Fact]
    public void NegativeAndFractionalExponents_Parse()
    {
        IdealGasHeatCapacity cp = CpOf("ideal_gas_cp reduce 374.18 K power -0.629789^0 7.292937^0.5 40^-1 range 169.85-455 K | s");

        Assert.Equal(new[] { (-0.629789, 0.0), (7.292937, 0.5), (40.0, -1.0) }, cp.PowerTerms);
        Assert.Equal(374.18, cp.ReducingTemperature);
    }

    [Fact]
    public void NoCorrelationKeys_GivesNullHeatCapacityAndNoAlphaParameters()
    {
        Fluid fluid = FluidFile.Parse(new StringReader(FluidFileTestData.Join(FluidFileTestData.ValidLines())), FluidFileTestData.Origin);

        Assert.Null(fluid.IdealGasHeatCapacity);
        Assert.Empty(fluid.AlphaParameters);
    }

    [Fact]
    public void AlphaKeys_ParseIntoAlphaParametersInFileOrder()
    {
        string text = FluidFileTestData.Join(
        [
            .. FluidFileTestData.ValidLines(),
            $"alpha_mathias_copeman_srk 0.7 -0.3 0.2 | {NotPublished}, srk",
            $"alpha_twu_pr              0.2 0.9 2.1  | {NotPublished}, twu pr",
            $"alpha_twu_srk             0.3 0.8 1.9  | {NotPublished}, twu srk",
            $"alpha_mathias_copeman_pr  0.6 -0.1 1e-2 | {NotPublished}, mc pr",
        ]);

        IReadOnlyList<AlphaParameterSet> sets = FluidFile.Parse(new StringReader(text), FluidFileTestData.Origin).AlphaParameters;

        Assert.Equal(4, sets.Count);
        Assert.Equal((AlphaForm.MathiasCopeman, CubicModelKind.SoaveRedlichKwong), (sets[0].Form, sets[0].Model));
        Assert.Equal((AlphaForm.Twu, CubicModelKind.PengRobinson), (sets[1].Form, sets[1].Model));
        Assert.Equal((AlphaForm.Twu, CubicModelKind.SoaveRedlichKwong), (sets[2].Form, sets[2].Model));
        Assert.Equal((AlphaForm.MathiasCopeman, CubicModelKind.PengRobinson), (sets[3].Form, sets[3].Model));
        Assert.Equal(new[] { 0.7, -0.3, 0.2 }, sets[0].Values);
        Assert.Equal(new[] { 0.2, 0.9, 2.1 }, sets[1].Values);
        Assert.Equal(new[] { 0.6, -0.1, 0.01 }, sets[3].Values);
        Assert.Equal($"{NotPublished}, twu pr", sets[1].Source);
    }

    [Fact]
    public void NewKeys_AreListedInKeys()
    {
        foreach (string key in new[] { "ideal_gas_cp", "alpha_twu_pr", "alpha_twu_srk", "alpha_mathias_copeman_pr", "alpha_mathias_copeman_srk" })
        {
            Assert.Contains(key, FluidFile.Keys);
        }
    }

    public static TheoryData<string, string, string?> InvalidLines => new()
    {
        // description, line appended as line 17, a text the message must contain (or null)
        { "power term without ^", "ideal_gas_cp power 4.0 range 50-1000 K | s", "malformed power term '4.0'" },
        { "power exponent not a number", "ideal_gas_cp power 4^x range 50-1000 K | s", "malformed power term" },
        { "power term with two ^", "ideal_gas_cp power 4^0^1 range 50-1000 K | s", "malformed power term" },
        { "power coefficient missing", "ideal_gas_cp power ^1 range 50-1000 K | s", "malformed power term" },
        { "power coefficient NaN", "ideal_gas_cp power NaN^0 range 50-1000 K | s", "malformed power term" },
        { "comma decimal in term", "ideal_gas_cp power 4,5^0 range 50-1000 K | s", "malformed power term" },
        { "Einstein term without @", "ideal_gas_cp power 4^0 einstein 3.043 range 50-1000 K | s", "malformed Planck-Einstein term" },
        { "Einstein temperature missing", "ideal_gas_cp power 4^0 einstein 3.043@ range 50-1000 K | s", "malformed Planck-Einstein term" },
        { "Einstein temperature zero", "ideal_gas_cp power 4^0 einstein 3.043@0 range 50-1000 K | s", "greater than zero" },
        { "Einstein temperature negative", "ideal_gas_cp power 4^0 einstein 3.043@-393 range 50-1000 K | s", "greater than zero" },
        { "empty correlation", "ideal_gas_cp range 50-1000 K | s", "empty correlation" },
        { "nothing before bar", "ideal_gas_cp | s", "empty correlation" },
        { "power with no terms", "ideal_gas_cp power range 50-1000 K | s", "'power' has no terms" },
        { "einstein with no terms", "ideal_gas_cp power 4^0 einstein range 50-1000 K | s", "'einstein' has no terms" },
        { "section twice", "ideal_gas_cp power 4^0 power 1e-3^1 range 50-1000 K | s", "'power' is given twice" },
        { "term before any section", "ideal_gas_cp 4^0 range 50-1000 K | s", "unexpected '4^0'" },
        { "misspelt section", "ideal_gas_cp power 4^0 einstien 3@393 range 50-1000 K | s", "malformed power term 'einstien'" },
        { "range reversed", "ideal_gas_cp power 4^0 range 1000-50 K | s", "not below the upper end" },
        { "range empty", "ideal_gas_cp power 4^0 range 300-300 K | s", "not below the upper end" },
        { "range from zero", "ideal_gas_cp power 4^0 range 0-300 K | s", "greater than zero" },
        { "range negative", "ideal_gas_cp power 4^0 range -5-300 K | s", "greater than zero" },
        { "range without unit", "ideal_gas_cp power 4^0 range 50-1000 | s", "malformed 'range'" },
        { "range in celsius", "ideal_gas_cp power 4^0 range 50-1000 C | s", "malformed 'range'" },
        { "range without dash", "ideal_gas_cp power 4^0 range 50 1000 K | s", "malformed 'range'" },
        { "range with no values", "ideal_gas_cp power 4^0 range | s", "malformed 'range'" },
        { "missing range", "ideal_gas_cp power 4^0 | s", "missing 'range" },
        { "missing source", "ideal_gas_cp power 4^0 range 50-1000 K", "missing source" },
        { "empty source", "ideal_gas_cp power 4^0 range 50-1000 K |   ", "missing source" },
        { "no value", "ideal_gas_cp", "no value" },
        { "reduce zero", "ideal_gas_cp reduce 0 K power 4^0 range 50-1000 K | s", "greater than zero" },
        { "reduce without unit", "ideal_gas_cp reduce 304.1282 power 4^0 range 50-1000 K | s", "malformed 'reduce'" },
        { "reduce in wrong unit", "ideal_gas_cp reduce 304.1282 C power 4^0 range 50-1000 K | s", "takes the unit K" },
        { "below monatomic everywhere", "ideal_gas_cp power 2.4^0 range 50-1000 K | s", "monatomic minimum" },
        // 4 − 0.002·T falls below 2.5 above 750 K: only the sampling of the range finds it.
        { "below monatomic at the hot end", "ideal_gas_cp power 4^0 -0.002^1 range 50-1000 K | s", "monatomic minimum" },
        // 3 − E(100 K/T) drops to about 2.0 at 1000 K.
        { "negative Einstein term below monatomic", "ideal_gas_cp power 3^0 einstein -1@100 range 50-1000 K | s", "monatomic minimum" },
        // A pole at T = 0 is outside any range, but a negative power can still dive: 4 − 1000/T at 60 K.
        { "negative power term below monatomic at the cold end", "ideal_gas_cp power 4^0 -1000^-1 range 60-1000 K | s", "monatomic minimum" },
        { "alpha with two numbers", $"alpha_twu_pr 0.2 0.9 | {NotPublished}", "expected 3 numbers 'L M N | source', found 2" },
        { "alpha with four numbers", $"alpha_mathias_copeman_srk 0.7 -0.3 0.2 0.1 | {NotPublished}", "expected 3 numbers 'c1 c2 c3 | source', found 4" },
        { "alpha malformed number", $"alpha_twu_srk 0.2 x 2.1 | {NotPublished}", "malformed parameter M 'x'" },
        { "alpha infinite number", $"alpha_mathias_copeman_pr 0.2 0.3 Infinity | {NotPublished}", "malformed parameter c3" },
        { "alpha missing source", "alpha_twu_pr 0.2 0.9 2.1", "missing source" },
        { "alpha empty source", "alpha_twu_pr 0.2 0.9 2.1 | ", "missing source" },
        { "alpha no value", "alpha_mathias_copeman_pr", "no value" },
    };

    [Theory]
    [MemberData(nameof(InvalidLines))]
    public void InvalidLine_ThrowsWithOriginLineAndField(string description, string line, string? messagePart)
    {
        string field = line.Split(' ')[0];

        var ex = Assert.Throws<FluidDataException>(() => ParseWith(line));

        Assert.True(ex.Origin == FluidFileTestData.Origin, description);
        Assert.Equal(17, ex.Line);
        Assert.Equal(field, ex.Field);
        Assert.Contains($"{FluidFileTestData.Origin}:17:", ex.Message, StringComparison.Ordinal);
        Assert.Contains($"'{field}'", ex.Message, StringComparison.Ordinal);
        if (messagePart is not null)
        {
            Assert.Contains(messagePart, ex.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void BelowMonatomic_MessageNamesTheTemperature()
    {
        var ex = Assert.Throws<FluidDataException>(() => ParseWith("ideal_gas_cp power 4^0 -0.002^1 range 50-1000 K | s"));

        // Samples are 50 + 0.95·i K; the first above 750 K is i = 737, 750.15 K, where cp°/R = 2.4997.
        Assert.Contains("cp°/R = 2.4997 at 750.1", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DuplicateIdealGasCp_IsRejectedOnTheSecondLine()
    {
        string line = "ideal_gas_cp power 4^0 range 50-1000 K | s";
        string text = FluidFileTestData.Join([.. FluidFileTestData.ValidLines(), line, line]);

        var ex = Assert.Throws<FluidDataException>(() => FluidFile.Parse(new StringReader(text), FluidFileTestData.Origin));

        Assert.Equal(18, ex.Line);
        Assert.Equal("ideal_gas_cp", ex.Field);
        Assert.Contains("duplicate key", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void DuplicateAlphaKey_IsRejected()
    {
        string line = $"alpha_twu_pr 0.2 0.9 2.1 | {NotPublished}";
        string text = FluidFileTestData.Join([.. FluidFileTestData.ValidLines(), line, line]);

        var ex = Assert.Throws<FluidDataException>(() => FluidFile.Parse(new StringReader(text), FluidFileTestData.Origin));

        Assert.Equal(18, ex.Line);
        Assert.Equal("alpha_twu_pr", ex.Field);
    }

    [Fact]
    public void MisspeltAlphaKey_SuggestsTheKnownOne()
    {
        var ex = Assert.Throws<FluidDataException>(() => ParseWith($"alpha_twu_rp 0.2 0.9 2.1 | {NotPublished}"));

        Assert.Contains("did you mean 'alpha_twu_pr'", ex.Message, StringComparison.Ordinal);
    }

    private static string RepositoryRoot()
    {
        for (DirectoryInfo? dir = new(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "PhaseSlope.sln")))
            {
                return dir.FullName;
            }
        }

        throw new DirectoryNotFoundException($"no PhaseSlope.sln above {AppContext.BaseDirectory}");
    }
}
