using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Tests.Units;

public class UnitFormatterTests
{
    private const double Water = 0.018015268; // kg/mol
    private const double CarbonDioxide = 0.04401; // kg/mol

    [Fact]
    public void Temperature_Engineering_ConvertsKelvinToCelsius()
    {
        Assert.Equal(26.85, UnitFormatter.Temperature(300.0, UnitSystem.Engineering), 12);
        Assert.Equal(0.0, UnitFormatter.Temperature(273.15, UnitSystem.Engineering), 12);
    }

    [Fact]
    public void Temperature_Si_IsKelvinUnchanged()
    {
        Assert.Equal(300.0, UnitFormatter.Temperature(300.0, UnitSystem.Si));
    }

    [Fact]
    public void Pressure_Engineering_ConvertsPascalToBar()
    {
        Assert.Equal(1.0, UnitFormatter.Pressure(1.0e5, UnitSystem.Engineering));
        Assert.Equal(1.01325, UnitFormatter.Pressure(101325.0, UnitSystem.Engineering), 12);
    }

    [Fact]
    public void Pressure_Si_ConvertsPascalToKilopascal()
    {
        Assert.Equal(101.325, UnitFormatter.Pressure(101325.0, UnitSystem.Si), 12);
    }

    [Fact]
    public void Density_Engineering_MultipliesByMolarMass()
    {
        // 1000 mol/m3 of water is 18.015268 kg/m3
        Assert.Equal(18.015268, UnitFormatter.Density(1000.0, Water, UnitSystem.Engineering), 12);
        // 55 345 mol/m3 × 0.018015268 kg/mol = 997.05500746 kg/m3
        Assert.Equal(997.05500746, UnitFormatter.Density(55345.0, Water, UnitSystem.Engineering), 9);
    }

    [Fact]
    public void Density_Si_IsMolarDensityUnchanged()
    {
        Assert.Equal(1000.0, UnitFormatter.Density(1000.0, Water, UnitSystem.Si));
    }

    [Fact]
    public void MolarVolume_Engineering_DividesByMolarMass()
    {
        // 1e-3 m3/mol at 0.002 kg/mol is 0.5 m3/kg
        Assert.Equal(0.5, UnitFormatter.MolarVolume(1.0e-3, 0.002, UnitSystem.Engineering), 15);
        Assert.Equal(1.0e-3, UnitFormatter.MolarVolume(1.0e-3, 0.002, UnitSystem.Si));
    }

    [Fact]
    public void MolarVolume_And_Density_Engineering_AreReciprocal()
    {
        double rho = 1234.5; // mol/m3
        double massDensity = UnitFormatter.Density(rho, CarbonDioxide, UnitSystem.Engineering);
        double specificVolume = UnitFormatter.MolarVolume(1.0 / rho, CarbonDioxide, UnitSystem.Engineering);
        Assert.Equal(1.0, massDensity * specificVolume, 12);
    }

    [Fact]
    public void MolarEnergy_Engineering_ConvertsToKilojoulePerKilogram()
    {
        // 44 000 J/mol at 0.044 kg/mol is 1 000 000 J/kg = 1000 kJ/kg
        Assert.Equal(1000.0, UnitFormatter.MolarEnergy(44000.0, 0.044, UnitSystem.Engineering), 9);
        Assert.Equal(44000.0, UnitFormatter.MolarEnergy(44000.0, 0.044, UnitSystem.Si));
    }

    [Fact]
    public void MolarEntropy_Engineering_ConvertsToKilojoulePerKilogramKelvin()
    {
        // 88 J/(mol K) at 0.044 kg/mol is 2 kJ/(kg K)
        Assert.Equal(2.0, UnitFormatter.MolarEntropy(88.0, 0.044, UnitSystem.Engineering), 12);
        Assert.Equal(88.0, UnitFormatter.MolarEntropy(88.0, 0.044, UnitSystem.Si));
    }

    [Fact]
    public void Slope_ConvertsPascalPerKelvin()
    {
        Assert.Equal(3.0, UnitFormatter.Slope(3000.0, UnitSystem.Si), 12);
        Assert.Equal(0.03, UnitFormatter.Slope(3000.0, UnitSystem.Engineering), 12);
    }

    [Theory]
    [InlineData("Si", "K", "kPa", "mol/m3", "m3/mol", "J/mol", "J/(mol·K)", "kPa/K")]
    [InlineData("Engineering", "degC", "bar", "kg/m3", "m3/kg", "kJ/kg", "kJ/(kg·K)", "bar/K")]
    public void Labels_PerSystem_AreTheDocumentedUnits(string systemName, string t, string p, string rho,
        string v, string e, string s, string slope)
    {
        UnitSystem system = Enum.Parse<UnitSystem>(systemName);
        Assert.Equal(t, UnitFormatter.TemperatureLabel(system));
        Assert.Equal(p, UnitFormatter.PressureLabel(system));
        Assert.Equal(rho, UnitFormatter.DensityLabel(system));
        Assert.Equal(v, UnitFormatter.MolarVolumeLabel(system));
        Assert.Equal(e, UnitFormatter.MolarEnergyLabel(system));
        Assert.Equal(s, UnitFormatter.MolarEntropyLabel(system));
        Assert.Equal(slope, UnitFormatter.SlopeLabel(system));
    }

    [Fact]
    public void Table_EveryQuantityAndSystem_HasAUnit()
    {
        foreach (DisplayQuantity q in Enum.GetValues<DisplayQuantity>())
        {
            foreach (UnitSystem system in Enum.GetValues<UnitSystem>())
            {
                Assert.False(string.IsNullOrWhiteSpace(UnitFormatter.Label(q, system)));
            }
        }
    }

    [Theory]
    [InlineData("Density", true)]
    [InlineData("MolarVolume", true)]
    [InlineData("MolarEnergy", true)]
    [InlineData("MolarEntropy", true)]
    [InlineData("Temperature", false)]
    [InlineData("Pressure", false)]
    [InlineData("Slope", false)]
    public void NeedsMolarMass_Engineering_OnlyForMassBasedUnits(string quantityName, bool expected)
    {
        DisplayQuantity q = Enum.Parse<DisplayQuantity>(quantityName);
        Assert.Equal(expected, UnitFormatter.NeedsMolarMass(q, UnitSystem.Engineering));
        Assert.False(UnitFormatter.NeedsMolarMass(q, UnitSystem.Si));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-0.018)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Density_EngineeringWithBadMolarMass_Throws(double molarMass)
    {
        Assert.Throws<ArgumentOutOfRangeException>(
            () => UnitFormatter.Density(1000.0, molarMass, UnitSystem.Engineering));
        Assert.Throws<ArgumentOutOfRangeException>(
            () => UnitFormatter.MolarEnergy(1000.0, molarMass, UnitSystem.Engineering));
    }

    [Fact]
    public void Density_SiWithoutMolarMass_DoesNotNeedIt()
    {
        Assert.Equal(5.0, UnitFormatter.Density(5.0, double.NaN, UnitSystem.Si));
    }

    [Fact]
    public void Convert_UndefinedSystem_Throws()
    {
        Assert.Throws<ArgumentOutOfRangeException>(
            () => UnitFormatter.Convert(DisplayQuantity.Pressure, 1.0, (UnitSystem)42));
    }

    [Theory]
    [InlineData("26.85 degC", 26.85)]
    [InlineData("80 degF", 26.666666666666668)]
    [InlineData("491.67 degR", 0.0)]
    public void ParsedTemperature_ShownInEngineering_RoundTripsToCelsius(string text, double celsius)
    {
        double kelvin = QuantityParser.ParseTemperature(text, "--temperature");
        Assert.Equal(celsius, UnitFormatter.Temperature(kelvin, UnitSystem.Engineering), 10);
    }
}
