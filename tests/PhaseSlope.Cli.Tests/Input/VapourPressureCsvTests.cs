using System.Globalization;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Units;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Input;

public class VapourPressureCsvTests
{
    private const string Origin = "points.csv";

    private static readonly VapourPressureCsvOptions NoDefaults = new();

    private static IReadOnlyList<VapourPressureRecord> Read(string text, VapourPressureCsvOptions? options = null)
    {
        using var reader = new StringReader(text);
        return VapourPressureCsv.Read(reader, Origin, options ?? NoDefaults);
    }

    /// <summary>Reads text that must fail and checks the one-line message: it starts with
    /// "origin:line: " (or "origin: " when <paramref name="line"/> is null), names the column when
    /// one is given, and contains <paramref name="part"/>.</summary>
    private static DataFileException Fails(string text, int? line, string? column, string part, VapourPressureCsvOptions? options = null)
    {
        var error = Assert.Throws<DataFileException>(() => Read(text, options));
        string prefix = line is int n ? $"{Origin}:{n}: " : $"{Origin}: ";
        Assert.StartsWith(prefix, error.Message, StringComparison.Ordinal);
        if (column is not null)
        {
            Assert.StartsWith($"{prefix}column '{column}': ", error.Message, StringComparison.Ordinal);
        }
        Assert.Contains(part, error.Message, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', error.Message);
        Assert.DoesNotContain('\r', error.Message);
        Assert.Equal(Origin, error.Origin);
        Assert.Equal(line, error.Line);
        Assert.Equal(column, error.Column);
        return error;
    }

    // ---------------- accepted headers and units ----------------

    [Theory]
    [InlineData("T [K]")]
    [InlineData("t [K]")]
    [InlineData("temperature [K]")]
    [InlineData("Temperature [K]")]
    [InlineData("TEMPERATURE[K]")]
    [InlineData("  T  [ K ]  ")]
    public void Read_TemperatureHeaderForms_AreAccepted(string header)
    {
        var points = Read($"{header},P [Pa]\n300,1000\n310,2000\n");

        Assert.Equal([300.0, 310.0], points.Select(p => p.Temperature));
    }

    [Theory]
    [InlineData("P [Pa]")]
    [InlineData("p [Pa]")]
    [InlineData("pressure [Pa]")]
    [InlineData("Pressure [Pa]")]
    [InlineData("Psat [Pa]")]
    [InlineData("psat [Pa]")]
    [InlineData("PSAT[Pa]")]
    public void Read_PressureHeaderForms_AreAccepted(string header)
    {
        var points = Read($"T [K],{header}\n300,1000\n310,2000\n");

        Assert.Equal([1000.0, 2000.0], points.Select(p => p.Pressure));
    }

    [Theory]
    [InlineData("K", "300", 300.0)]
    [InlineData("degC", "25", 298.15)]
    [InlineData("°C", "-40", 233.15)]
    [InlineData("degC", "26.85", 300.0)]
    [InlineData("degC", "40.70", 313.85)] // 40.70 + 273.15 in double arithmetic is 1 ulp off
    [InlineData("degC", "-73.15", 200.0)] // likewise
    [InlineData("degC", "0.01", 273.16)] // likewise
    [InlineData("degF", "32", 273.15)]
    [InlineData("°F", "212", 373.15)]
    [InlineData("degR", "540", 300.0)]
    [InlineData("°R", "491.67", 273.15)]
    public void Read_TemperatureUnits_ConvertExactly(string unit, string cell, double kelvin)
    {
        // A second, warmer row keeps the file valid; the first row is the one checked.
        var points = Read($"T [{unit}],P [Pa]\n{cell},1000\n5000,2000\n");

        AssertSameDouble(kelvin, points[0].Temperature, $"{cell} {unit}");
    }

    [Theory]
    [InlineData("Pa", "101325", 101325.0)]
    [InlineData("kPa", "101.325", 101325.0)]
    [InlineData("kPa", "0.12", 120.0)]
    [InlineData("kPa", "8.005", 8005.0)] // 8.005 × 1000 in double arithmetic is 1 ulp off
    [InlineData("bar", "1.2328", 123280.0)] // 1.2328 × 1e5 likewise
    [InlineData("MPa", "0.101325", 101325.0)]
    [InlineData("mPa", "101325", 101.325)] // case-sensitive: the millipascal
    [InlineData("GPa", "0.000101325", 101325.0)]
    [InlineData("bar", "1.01325", 101325.0)]
    [InlineData("mbar", "1013.25", 101325.0)]
    [InlineData("atm", "1", 101325.0)]
    [InlineData("torr", "760", 101325.0)]
    [InlineData("mmHg", "1", 133.322387415)]
    [InlineData("psi", "1", 6894.757293168362)] // nearest double to 6894.75729316836133672…
    [InlineData("psia", "1", 6894.757293168362)]
    [InlineData("kPa", "1.5e2", 150000.0)]
    public void Read_PressureUnits_ConvertExactly(string unit, string cell, double pascal)
    {
        var points = Read($"T [K],P [{unit}]\n300,{cell}\n310,{cell}\n");

        AssertSameDouble(pascal, points[0].Pressure, $"{cell} {unit}");
    }

    [Theory]
    [InlineData("degC", "-73.15")]
    [InlineData("degC", "126.85")]
    [InlineData("degF", "80.33")]
    [InlineData("degR", "671.67")]
    [InlineData("K", "1.0e3")]
    public void Read_TemperatureUnits_AgreeWithTheCommandLineParser(string unit, string cell)
    {
        var points = Read($"T [{unit}],P [Pa]\n{cell},1000\n1e4,2000\n");

        // One table, one conversion path: the same double, not merely a close one.
        AssertSameDouble(QuantityParser.ParseTemperature($"{cell} {unit}", "--temperature"), points[0].Temperature, unit);
    }

    [Theory]
    [InlineData("kPa", "3.7")]
    [InlineData("bar", "12.34")]
    [InlineData("psi", "14.696")]
    [InlineData("mmHg", "512.5")]
    [InlineData("torr", "0.25")]
    [InlineData("atm", "2.5")]
    [InlineData("mbar", "3e-4")]
    [InlineData("Pa", "1e20")]
    public void Read_PressureUnits_AgreeWithTheCommandLineParser(string unit, string cell)
    {
        var points = Read($"T [K],P [{unit}]\n300,{cell}\n310,{cell}\n");

        AssertSameDouble(QuantityParser.ParsePressure($"{cell} {unit}", "--pressure"), points[0].Pressure, unit);
    }

    [Fact]
    public void Read_HeadersWithoutUnits_TakeTheUnitsOfTheOptions()
    {
        var options = new VapourPressureCsvOptions(TemperatureUnit: "degC", PressureUnit: "kPa");

        var points = Read("T,P,u(P)\n25,101.325,0.3\n30,120,0.4\n", options);

        AssertSameDouble(298.15, points[0].Temperature, "T");
        AssertSameDouble(101325.0, points[0].Pressure, "P");
        AssertSameDouble(300.0, points[0].StandardUncertainty!.Value, "u(P)");
    }

    [Fact]
    public void Read_UnitInTheHeaderContradictingAnOption_Refused()
    {
        // One unit, one place: a header that says K and an option that says degF contradict each
        // other, and neither silently wins (a header that agrees with the option is accepted).
        var ex = Assert.Throws<DataFileException>(() => Read("T [K],P [Pa]\n300,1000\n310,2000\n", new VapourPressureCsvOptions(TemperatureUnit: "degF")));
        Assert.Contains("the header gives the unit 'K' but --temperature-unit says 'degF'", ex.Message, StringComparison.Ordinal);
        Assert.Throws<DataFileException>(() => Read("T [K],P [Pa]\n300,1000\n310,2000\n", new VapourPressureCsvOptions(PressureUnit: "psi")));

        var points = Read("T [K],P [Pa]\n300,1000\n310,2000\n", new VapourPressureCsvOptions(TemperatureUnit: "K", PressureUnit: "Pa"));

        Assert.Equal(300.0, points[0].Temperature);
        Assert.Equal(1000.0, points[0].Pressure);
    }

    [Theory]
    [InlineData("u(P) [kPa]", "0.5", 500.0)]
    [InlineData("U(p) [Pa]", "7", 7.0)]
    [InlineData("uncertainty [bar]", "0.001", 100.0)]
    [InlineData("Uncertainty [Pa]", "2.5", 2.5)]
    [InlineData("sigma_P [kPa]", "0.25", 250.0)]
    [InlineData("SIGMA_p [atm]", "1", 101325.0)]
    public void Read_AbsoluteUncertaintyForms_AreInPascal(string header, string cell, double pascal)
    {
        var points = Read($"T [K],P [kPa],{header}\n300,200,{cell}\n310,300,{cell}\n");

        AssertSameDouble(pascal, points[0].StandardUncertainty!.Value, header);
        Assert.All(points, p => Assert.Null(p.Weight));
    }

    [Theory]
    [InlineData("u_r(P)", "0.003")]
    [InlineData("U_R(p)", "0.003")]
    [InlineData("u_r(P) [%]", "0.3")]
    [InlineData("u(P) [%]", "0.3")]
    [InlineData("uncertainty [%]", "0.3")]
    [InlineData("sigma_P [ % ]", "0.3")]
    public void Read_RelativeUncertainty_IsMultipliedByThePressure(string header, string cell)
    {
        var points = Read($"T [K],P [kPa],{header}\n300,200,{cell}\n310,50,{cell}\n");

        AssertRelative(600.0, points[0].StandardUncertainty!.Value, 1e-15, "0.3 % of 200 kPa");
        AssertRelative(150.0, points[1].StandardUncertainty!.Value, 1e-15, "0.3 % of 50 kPa");
    }

    [Theory]
    [InlineData("weight")]
    [InlineData("Weight")]
    [InlineData("WEIGHT [-]")]
    [InlineData("weight [1]")]
    public void Read_Weight_IsReadAsGiven(string header)
    {
        var points = Read($"T [K],P [Pa],{header}\n300,1000,2\n310,2000,0.5\n");

        Assert.Equal([2.0, 0.5], points.Select(p => p.Weight!.Value));
        Assert.All(points, p => Assert.Null(p.StandardUncertainty));
    }

    [Fact]
    public void Read_WithoutUncertaintyOrWeight_BothAreNull()
    {
        var points = Read("T [K],P [Pa]\n300,1000\n310,2000\n");

        Assert.All(points, p =>
        {
            Assert.Null(p.StandardUncertainty);
            Assert.Null(p.Weight);
        });
    }

    // ---------------- layout ----------------

    [Fact]
    public void Read_ColumnOrder_DoesNotMatter()
    {
        var expected = Read("T [K],P [kPa],u(P) [kPa]\n300,10,0.1\n310,20,0.2\n");

        foreach (string text in new[]
        {
            "P [kPa],T [K],u(P) [kPa]\n10,300,0.1\n20,310,0.2\n",
            "u(P) [kPa],P [kPa],T [K]\n0.1,10,300\n0.2,20,310\n",
            "note,u(P) [kPa],T [K],P [kPa]\na,0.1,300,10\nb,0.2,310,20\n",
        })
        {
            var points = Read(text);
            Assert.Equal(expected.Select(p => (p.Temperature, p.Pressure, p.StandardUncertainty)),
                points.Select(p => (p.Temperature, p.Pressure, p.StandardUncertainty)));
        }
    }

    [Fact]
    public void Read_UnknownColumns_AreIgnoredWhateverTheyHold()
    {
        var points = Read(
            "sample,T [K],operator,P [Pa],remark [free text],\n" +
            "S1,300,ann,1000,\"degassed, twice\",\n" +
            "S2,310,,2000,not a number here,x\n");

        Assert.Equal(2, points.Count);
        Assert.Equal(2000.0, points[1].Pressure);
    }

    [Fact]
    public void Read_CommentsAndBlankLinesAnywhere_AreSkippedAndCountedInLineNumbers()
    {
        string text =
            "# invented test data\n" +       // 1
            "\n" +                           // 2
            "   # an indented comment\n" +   // 3
            "T [K],P [Pa]\n" +               // 4
            "# between header and data\n" +  // 5
            "300,1000\n" +                   // 6
            "\n" +                           // 7
            "  \t \n" +                      // 8
            "#310,9999\n" +                  // 9
            "320,3000\n" +                   // 10
            "# at the end\n";                // 11

        var points = Read(text);

        Assert.Equal([300.0, 320.0], points.Select(p => p.Temperature));
        Assert.Equal([6, 10], points.Select(p => p.Line));
    }

    [Fact]
    public void Read_CrLfLineEndsAndByteOrderMark_AreAccepted()
    {
        var points = Read("\uFEFF# c\r\nT [K],P [Pa]\r\n300,1000\r\n\r\n310,2000\r\n");

        Assert.Equal([3, 5], points.Select(p => p.Line));
        Assert.Equal([1000.0, 2000.0], points.Select(p => p.Pressure));
    }

    [Fact]
    public void Read_LastLineWithoutLineBreak_IsRead()
    {
        var points = Read("T [K],P [Pa]\n300,1000\n310,2000");

        Assert.Equal(2, points.Count);
    }

    [Fact]
    public void Read_QuotedNumbersAndSpaces_AreRead()
    {
        var points = Read("T [K] , P [Pa]\n \"300\" , 1000 \n310,\"2000\"\n");

        Assert.Equal([1000.0, 2000.0], points.Select(p => p.Pressure));
    }

    [Fact]
    public void Read_Rows_AreSortedByTemperatureAndKeepTheirLines()
    {
        var points = Read("T [K],P [Pa]\n350,5000\n300,1000\n# c\n400,9000\n320,2000\n");

        Assert.Equal([300.0, 320.0, 350.0, 400.0], points.Select(p => p.Temperature));
        Assert.Equal([3, 6, 2, 5], points.Select(p => p.Line));
        Assert.Equal([1000.0, 2000.0, 5000.0, 9000.0], points.Select(p => p.Pressure));
    }

    [Theory]
    [InlineData("+300", 300.0)]
    [InlineData("3e2", 300.0)]
    [InlineData("3.E2", 300.0)]
    [InlineData(".3e3", 300.0)]
    [InlineData("300.", 300.0)]
    [InlineData("0300", 300.0)]
    public void Read_NumberForms_AreAccepted(string cell, double kelvin)
    {
        var points = Read($"T [K],P [Pa]\n{cell},1000\n400,2000\n");

        Assert.Equal(kelvin, points[0].Temperature);
    }

    [Theory]
    [InlineData("de-DE")]
    [InlineData("fr-FR")]
    [InlineData("tr-TR")]
    public void Read_UnderACommaDecimalCulture_StillReadsDotDecimals(string culture)
    {
        using var scope = new CultureScope(culture);

        var points = Read("T [degC],P [kPa],u_r(P) [%]\n25.5,101.325,0.25\n30.25,1.5e2,0.25\n");

        AssertSameDouble(298.65, points[0].Temperature, "25.5 degC");
        AssertSameDouble(101325.0, points[0].Pressure, "101.325 kPa");
        AssertSameDouble(150000.0, points[1].Pressure, "1.5e2 kPa");
    }

    [Fact]
    public void Read_UnderACommaDecimalCulture_RejectsAQuotedCommaDecimal()
    {
        using var scope = new CultureScope("de-DE");

        Fails("T [K],P [kPa]\n300,\"101,325\"\n310,200\n", 2, "P [kPa]", "'101,325' is not a number");
    }

    // ---------------- the shipped example ----------------

    private static string ExamplePath(string file)
        => Path.GetFullPath(Path.Combine(AppContext.BaseDirectory, "../../../../../docs/examples", file));

    [Fact]
    public void Read_ShippedExample_ParsesIntoTheStatedRange()
    {
        string path = ExamplePath("frc-7-vapour-pressure.csv");
        using var reader = new StreamReader(path);

        var points = VapourPressureCsv.Read(reader, path, NoDefaults);

        Assert.InRange(points.Count, 12, 15);
        Assert.InRange(points[0].Temperature, 295.0, 305.0);
        Assert.InRange(points[^1].Temperature, 475.0, 485.0);
        AssertSameDouble(300.0, points[0].Temperature, "26.85 degC");
        Assert.All(points, p =>
        {
            Assert.NotNull(p.StandardUncertainty);
            Assert.Null(p.Weight);
            // The stated uncertainty is 0.3 % of P, rounded to two digits in kPa.
            AssertRelative(0.003 * p.Pressure, p.StandardUncertainty!.Value, 0.05, "u(P)");
        });
        for (int i = 1; i < points.Count; i++)
        {
            Assert.True(points[i].Pressure > points[i - 1].Pressure, "vapour pressure rises with temperature");
        }
    }

    [Fact]
    public void Read_ShippedExample_StraddlesTheNormalBoilingPointOfTheExampleFluid()
    {
        string path = ExamplePath("frc-7-vapour-pressure.csv");
        using var reader = new StreamReader(path);
        var points = VapourPressureCsv.Read(reader, path, NoDefaults);

        // Interpolate ln P linearly in 1/T to 101325 Pa and compare with the fluid file's value.
        int above = points.ToList().FindIndex(p => p.Pressure > 101325.0);
        Assert.True(above > 0);
        var (low, high) = (points[above - 1], points[above]);
        double fraction = (Math.Log(101325.0) - Math.Log(low.Pressure)) / (Math.Log(high.Pressure) - Math.Log(low.Pressure));
        double tb = 1.0 / (1.0 / low.Temperature + fraction * (1.0 / high.Temperature - 1.0 / low.Temperature));

        string fluid = File.ReadAllText(ExamplePath("frc-7.fluid"));
        string line = fluid.Split('\n').Single(l => l.StartsWith("normal_boiling_point", StringComparison.Ordinal));
        double stated = double.Parse(line.Split(' ', StringSplitOptions.RemoveEmptyEntries)[1], CultureInfo.InvariantCulture);
        Assert.InRange(tb, stated - 1.0, stated + 1.0);
    }

    // ---------------- errors: header ----------------

    [Fact]
    public void Read_MissingTemperatureColumn_IsAnErrorAtTheHeader()
    {
        Fails("# c\nTemp [K],P [Pa]\n300,1000\n310,2000\n", 2, null, "no temperature column");
    }

    [Fact]
    public void Read_MissingPressureColumn_IsAnErrorAtTheHeader()
    {
        var error = Fails("T [K],p_sat [Pa]\n300,1000\n310,2000\n", 1, null, "no pressure column");
        Assert.Contains("'p_sat [Pa]'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_NumbersInTheFirstRow_AreReportedAsAMissingHeader()
    {
        Fails("# c\n300,1000\n310,2000\n", 2, null, "a header row is required");
    }

    [Theory]
    [InlineData("")]
    [InlineData("# only a comment\n\n")]
    public void Read_NoHeaderAtAll_IsAnErrorOfTheFile(string text)
    {
        Fails(text, null, null, "no header row");
    }

    [Fact]
    public void Read_TemperatureWithoutUnitAndNoOption_IsAnErrorNamingTheColumn()
    {
        Fails("T,P [Pa]\n300,1000\n310,2000\n", 1, "T", "--temperature-unit",
            new VapourPressureCsvOptions(PressureUnit: "kPa"));
    }

    [Fact]
    public void Read_PressureWithoutUnitAndNoOption_IsAnErrorNamingTheColumn()
    {
        Fails("T [K],Psat\n300,1000\n310,2000\n", 1, "Psat", "--pressure-unit",
            new VapourPressureCsvOptions(TemperatureUnit: "K"));
    }

    [Fact]
    public void Read_AbsoluteUncertaintyWithoutUnitAndNoOption_IsAnErrorNamingTheColumn()
    {
        Fails("T [K],P [Pa],sigma_P\n300,1000,1\n310,2000,1\n", 1, "sigma_P", "no pressure unit");
    }

    [Theory]
    [InlineData("T [C],P [Pa]", "T [C]", "unknown temperature unit 'C'")]
    [InlineData("T [K],P [%]", "P [%]", "unknown pressure unit '%'")]
    [InlineData("T [K],P [hPa]", "P [hPa]", "unknown pressure unit 'hPa'")]
    [InlineData("T [k],P [Pa]", "T [k]", "unknown temperature unit 'k'; did you mean K?")]
    [InlineData("T [K],P [KPA]", "P [KPA]", "unknown pressure unit 'KPA'; did you mean kPa?")]
    [InlineData("T [K],P [psig]", "P [psig]", "gauge pressures are not accepted")]
    [InlineData("T [K],P [Pa],u(P) [barg]", "u(P) [barg]", "gauge pressures are not accepted")]
    [InlineData("T [K],P [Pa],u(P) [degC]", "u(P) [degC]", "unknown pressure unit 'degC'")]
    [InlineData("T [],P [Pa]", "T []", "empty unit")]
    [InlineData("T [K],P [Pa],u_r(P) [kPa]", "u_r(P) [kPa]", "relative uncertainty")]
    [InlineData("T [K],P [Pa],weight [kg]", "weight [kg]", "dimensionless")]
    public void Read_BadUnitInHeader_IsAnErrorNamingTheColumn(string header, string column, string part)
    {
        Fails($"{header}\n300,1000,1\n310,2000,1\n", 1, column, part);
    }

    [Theory]
    [InlineData("T [K],temperature [degC],P [Pa]", "temperature [degC]", "'T [K]'")]
    [InlineData("T [K],P [Pa],Psat [kPa]", "Psat [kPa]", "'P [Pa]'")]
    [InlineData("T [K],P [Pa],t [K]", "t [K]", "'T [K]'")]
    [InlineData("T [K],P [Pa],u(P) [Pa],u_r(P)", "u_r(P)", "'u(P) [Pa]'")]
    [InlineData("T [K],P [Pa],uncertainty [%],sigma_P [Pa]", "sigma_P [Pa]", "'uncertainty [%]'")]
    [InlineData("T [K],P [Pa],weight,Weight", "Weight", "'weight'")]
    public void Read_AmbiguousHeader_IsAnErrorNamingBothColumns(string header, string column, string other)
    {
        var error = Fails($"{header}\n300,1000,1,1\n310,2000,1,1\n", 1, column, "ambiguous header");
        Assert.Contains(other, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_UncertaintyAndWeightTogether_IsAnError()
    {
        var error = Fails("T [K],P [Pa],weight,u(P) [Pa]\n300,1000,1,1\n310,2000,1,1\n", 1, "weight", "not both");
        Assert.Contains("'u(P) [Pa]'", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("kelvin", null, "--temperature-unit: unknown temperature unit 'kelvin'")]
    [InlineData(null, "hPa", "--pressure-unit: unknown pressure unit 'hPa'")]
    [InlineData(null, "psig", "--pressure-unit: gauge pressures are not accepted")]
    [InlineData(null, "kpa", "--pressure-unit: unknown pressure unit 'kpa'; did you mean kPa?")]
    [InlineData(null, "MPA", "--pressure-unit: unknown pressure unit 'MPA'; did you mean MPa or mPa?")]
    [InlineData("DEGC", null, "--temperature-unit: unknown temperature unit 'DEGC'; did you mean degC?")]
    public void Read_UnknownUnitInTheOptions_IsAUsageError(string? temperatureUnit, string? pressureUnit, string message)
    {
        // Reported even when the file's headers give their own units.
        var error = Assert.Throws<UsageException>(() =>
            Read("T [K],P [Pa]\n300,1000\n310,2000\n", new VapourPressureCsvOptions(temperatureUnit, pressureUnit)));

        Assert.StartsWith(message, error.Message, StringComparison.Ordinal);
    }

    // ---------------- errors: rows ----------------

    [Theory]
    [InlineData("3OO", "'3OO' is not a number")]
    [InlineData("300 K", "'300 K' is not a number")]
    [InlineData("1,000.5", "header has 2")] // unquoted: one field too many
    [InlineData("\"1,000.5\"", "'1,000.5' is not a number")]
    [InlineData("NaN", "'NaN' is not a number")]
    [InlineData("Infinity", "'Infinity' is not a number")]
    [InlineData("0x1F", "'0x1F' is not a number")]
    [InlineData("1e", "'1e' is not a number")]
    [InlineData("--3", "'--3' is not a number")]
    [InlineData("300 # note", "'300 # note' is not a number")]
    [InlineData("1e400", "'1e400' is too large")]
    public void Read_MalformedNumber_IsAnErrorAtItsLineAndColumn(string cell, string part)
    {
        string text = $"# c\nT [K],P [Pa]\n290,500\n{cell},1000\n310,2000\n";

        Fails(text, 4, part.StartsWith("header", StringComparison.Ordinal) ? null : "T [K]", part);
    }

    [Theory]
    [InlineData("T [K],P [Pa],u(P) [Pa]\n300,1000,1\n310,,1\n", 3, "P [Pa]")]
    [InlineData("T [K],P [Pa],u(P) [Pa]\n300,1000,1\n\"\",2000,1\n", 3, "T [K]")]
    [InlineData("T [K],P [Pa],u(P) [Pa]\n300,1000,\n310,2000,1\n", 2, "u(P) [Pa]")]
    [InlineData("T [K],P [Pa],weight\n300,1000,1\n310,2000,  \n", 3, "weight")]
    public void Read_EmptyCell_IsAnErrorAtItsLineAndColumn(string text, int line, string column)
    {
        Fails(text, line, column, "empty cell");
    }

    [Fact]
    public void Read_EmptyCellInAnIgnoredColumn_IsAccepted()
    {
        var points = Read("T [K],note,P [Pa]\n300,,1000\n310,,2000\n");

        Assert.Equal(2, points.Count);
    }

    [Theory]
    [InlineData("T [K]", "0", "not above absolute zero")]
    [InlineData("T [K]", "-5", "not above absolute zero")]
    [InlineData("T [degC]", "-273.15", "temperature is 0 K")]
    [InlineData("T [degC]", "-300", "temperature is -26.85 K")]
    [InlineData("T [degF]", "-500", "not above absolute zero")]
    [InlineData("T [degF]", "-459.67", "temperature is 0 K")]
    [InlineData("T [degR]", "0", "not above absolute zero")]
    public void Read_NonPositiveAbsoluteTemperature_IsAnError(string header, string cell, string part)
    {
        Fails($"{header},P [Pa]\n{cell},1000\n400,2000\n", 2, header, part);
    }

    [Theory]
    [InlineData("P [Pa]", "0")]
    [InlineData("P [kPa]", "-1")]
    [InlineData("P [bar]", "-0")]
    public void Read_NonPositivePressure_IsAnError(string header, string cell)
    {
        Fails($"T [K],{header}\n300,1000\n310,{cell}\n", 3, header, "pressure is not above zero");
    }

    [Theory]
    [InlineData("u(P) [Pa]", "0")]
    [InlineData("u(P) [kPa]", "-0.1")]
    [InlineData("u_r(P)", "0")]
    [InlineData("u(P) [%]", "-1")]
    public void Read_NonPositiveUncertainty_IsAnError(string header, string cell)
    {
        Fails($"T [K],P [Pa],{header}\n300,1000,1\n310,2000,{cell}\n", 3, header, "uncertainty must be greater than zero");
    }

    [Theory]
    [InlineData("0")]
    [InlineData("-2")]
    public void Read_NonPositiveWeight_IsAnError(string cell)
    {
        Fails($"T [K],P [Pa],weight\n300,1000,{cell}\n310,2000,1\n", 2, "weight", "weight must be greater than zero");
    }

    [Fact]
    public void Read_DuplicateTemperature_NamesBothLines()
    {
        Fails("T [K],P [Pa]\n300,1000\n310,2000\n# c\n300.0,1001\n", 5, "T [K]", "same as on line 2");
    }

    [Fact]
    public void Read_DuplicateTemperatureAfterConversion_IsDetected()
    {
        // Temperatures are compared after conversion to K: 26.85 and 26.850 degC are one temperature.
        Fails("T [degC],P [Pa]\n26.85,1000\n40,2000\n26.850,1000\n", 4, "T [degC]", "temperature 300 K is the same as on line 2");
    }

    [Theory]
    [InlineData("T [K],P [Pa]\n", 0)]
    [InlineData("# c\nT [K],P [Pa]\n# none\n", 0)]
    [InlineData("# c\nT [K],P [Pa]\n300,1000\n", 1)]
    public void Read_FewerThanTwoRows_IsAnErrorAtTheHeader(string text, int rows)
    {
        int headerLine = text.StartsWith('#') ? 2 : 1;
        Fails(text, headerLine, null, $"{rows} data {(rows == 1 ? "row" : "rows")} after the header; at least 2 are needed");
    }

    [Theory]
    [InlineData("T [K],P [Pa],u(P) [Pa]\n300,1000,1\n310,2000\n", 3, "u(P) [Pa]", "the row has 2 fields, the header has 3")]
    [InlineData("T [K],P [Pa],note\n300,1000,a\n310\n", 3, "P [Pa]", "the row has 1 field, the header has 3")]
    [InlineData("T [K],P [Pa],note\n300,1000\n310,2000,b\n", 2, "note", "the row has 2 fields, the header has 3")]
    public void Read_RowWithTooFewFields_IsAnErrorNamingTheFirstMissingColumn(string text, int line, string column, string part)
    {
        Fails(text, line, column, part);
    }

    [Fact]
    public void Read_CommaDecimalsInASemicolonFile_AreRejected()
    {
        // The separator is always a comma: "25,5;101,3" is three fields under a one-field header.
        Fails("T [degC];P [kPa]\n25,5;101,3\n30,0;120,0\n", 1, null, "no temperature column");
        Fails("T [degC],P [kPa]\n25,5,101,3\n30,0,120,0\n", 2, null, "the row has 4 fields, the header has 2");
    }

    [Fact]
    public void Read_ControlCharactersInAHeader_AreEscapedInTheMessage()
    {
        var error = Assert.Throws<DataFileException>(() => Read("T [K],\"P\n[hPa]\"\n300,1\n310,2\n"));

        Assert.DoesNotContain('\n', error.Message);
        Assert.Contains("\\u000A", error.Message, StringComparison.Ordinal);
    }
}
