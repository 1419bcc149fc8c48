using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>Results of the tool checked against measured values from the literature, within the
/// accuracy the Peng–Robinson model is known to have. Reference values are recalled, not looked up.</summary>
public class CoexistCommandReferenceTests
{
    /// <summary>Normal boiling point of water: 373.124 K (IAPWS-95, Wagner &amp; Pruß, J. Phys.
    /// Chem. Ref. Data 31, 387 (2002); the CRC Handbook of Chemistry and Physics gives 99.97 degC;
    /// from memory).</summary>
    private const double WaterNormalBoilingPointK = 373.124;

    /// <summary>Normal boiling point of propane: 231.036 K (Lemmon, McLinden &amp; Wagner, J. Chem.
    /// Eng. Data 54, 3141 (2009); from memory).</summary>
    private const double PropaneNormalBoilingPointK = 231.036;

    [Fact]
    public void Json_WaterAtOneAtmosphere_BoilsNear373K()
    {
        // Tolerance 2 K. The model's alpha function is tied to the vapour pressure at T/Tc = 0.7
        // through the acentric factor; water's normal boiling point lies at T/Tc = 0.577, and for
        // a strongly polar, hydrogen-bonded fluid the Peng-Robinson vapour pressure there is off
        // by several percent. With d ln P/dT = dH_vap/(R T^2) ≈ 40.7 kJ/mol / (8.314 J/(mol K) ×
        // (373 K)^2) ≈ 0.035 per K, a 5-7 % pressure error moves the boiling point by 1.5-2 K.
        // (This model gives about 374.5 K.)
        var json = RunJson("coexist", "water", "--pressure", "1 atm", "--format", "json");

        double t = json.GetProperty("temperature_K").GetDouble();
        Assert.True(Math.Abs(t - WaterNormalBoilingPointK) <= 2.0, $"water boils at {t:R} K under 1 atm in this model");
        AssertRelative(101325, json.GetProperty("pressure_Pa").GetDouble(), 1e-9, "pressure_Pa");
    }

    [Fact]
    public void Json_PropaneAtOneAtmosphere_BoilsNear231K()
    {
        // Tolerance 0.5 K. Propane is a small nonpolar molecule, the kind the model was fitted to;
        // its vapour pressure at T/Tc = 0.62 is good to about 1-2 %, and with d ln P/dT ≈
        // 19 kJ/mol / (8.314 J/(mol K) × (231 K)^2) ≈ 0.043 per K that is 0.25-0.5 K.
        var json = RunJson("coexist", "propane", "--pressure", "1 atm", "--format", "json");

        double t = json.GetProperty("temperature_K").GetDouble();
        Assert.True(Math.Abs(t - PropaneNormalBoilingPointK) <= 0.5, $"propane boils at {t:R} K under 1 atm in this model");
    }
}
