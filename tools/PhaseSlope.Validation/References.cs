namespace PhaseSlope.Validation;

/// <summary>Reference values that the tests hold inline (in attributes or assertions, where
/// another project cannot read them), repeated here once with the same source and the test that
/// holds the same number. Tables the tests keep as public <c>TheoryData</c> are read from the
/// tests directly (see the sections) and are not repeated here.</summary>
internal static class References
{
    public const string Crc = "CRC Handbook of Chemistry and Physics (from memory)";

    /// <summary>Normal boiling point [K] and enthalpy of vaporization there [J/mol], with the
    /// tolerances of <c>CoexistenceSolverTests.AtPressure_OneAtmosphere_DefaultModelMatchesHandbookBoilingPointAndLatentHeat</c>
    /// (its InlineData rows; the reasons are given there).</summary>
    public static readonly (string Fluid, double Tb, double LatentHeat, double TbTolerance, double LatentHeatTolerance)[] BoilingPoints =
    [
        ("propane", 231.04, 19.04e3, 0.5, 0.025),
        ("water", 373.12, 40.65e3, 3.0, 0.05),
    ];

    /// <summary>Çengel &amp; Boles, Thermodynamics: An Engineering Approach, worked example of the ideal
    /// vapour-compression refrigeration cycle, R-134a between 0.14 and 0.8 MPa (book values from its
    /// R-134a tables; from memory), kJ/kg; as in <c>VapourCompressionCycleTests</c>.</summary>
    public const string CycleBook = "Çengel & Boles, Thermodynamics: An Engineering Approach, ideal vapour-compression cycle example; from memory";
    public const double CycleLowPressure = 0.14e6;
    public const double CycleHighPressure = 0.8e6;
    public const double CycleH1 = 239.16;
    public const double CycleH2 = 275.39;
    public const double CycleH3 = 95.47;
    public const double CycleCop = 3.97;
    public const double CycleLatentHeat = 212.08;

    /// <summary>Dry air at 1 atm (Lemmon, Jacobsen, Penoncello &amp; Friend, J. Phys. Chem. Ref. Data
    /// 29, 331 (2000); from memory), as in <c>MixtureSaturationTests.Air_AtOneAtmosphere_MatchesItsPublishedBubbleAndDewPoints</c>.</summary>
    public const double AirBubble = 78.90, AirDew = 81.72, AirTolerance = 0.6;

    /// <summary>R-407C and R-410A at 1 atm (ASHRAE Standard 34 refrigerant data and the ASHRAE
    /// Handbook, Fundamentals; from memory), as in <c>MixtureSaturationTests</c>.</summary>
    public const double R407CBubbleCelsius = -43.8, R407CDewCelsius = -36.7, R407CGlide = 7.1, R407CTolerance = 1.0;
    public const double R410ABubbleCelsius = -51.6, R410AGlideLimit = 0.2, R410ATolerance = 1.0;

    /// <summary>Benzene–cyclohexane azeotrope at 1 atm: 77.6 °C at x_benzene ≈ 0.57 (CRC Handbook,
    /// azeotrope table; from memory), as in <c>BinaryDiagramTests.BenzeneCyclohexane_AzeotropeAtOneAtmosphere_NearHandbookValue</c>.</summary>
    public const double BenzeneCyclohexaneAzeotropeCelsius = 77.6, BenzeneCyclohexaneAzeotropeX = 0.57;

    /// <summary>Propane's saturated-liquid density at its normal boiling point, kg/m³ (Lemmon et al.
    /// 2009; from memory), as in <c>VolumeShiftTests</c>.</summary>
    public const double PropaneLiquidDensityAtTb = 580.9;

    /// <summary>Internal pressure (∂u/∂v)_T of liquid toluene at 25 °C, about 3.5e8 Pa, from handbook
    /// expansivity and compressibility (CRC Handbook; from memory). No test holds it: the page
    /// shows it as a known limit of the model, not as a check.</summary>
    public const double TolueneInternalPressure = 3.5e8;
}
