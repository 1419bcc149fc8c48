using PhaseSlope.Core.Properties;

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

    /// <summary>IAPWS (2011) equations for ice Ih (Wagner, Riethmann, Feistel &amp; Harvey, J. Phys. Chem.
    /// Ref. Data 40, 043103 (2011); IAPWS R14-08(2011); from memory), as in <c>Solids/WaterSolidLinesTests</c>
    /// (its private constants): triple point, sublimation ln(P/P_t) = θ⁻¹ Σ a_i θ^b_i and melting
    /// P/P_t = 1 + Σ a_i (1 − θ^b_i), θ = T/T_t.</summary>
    public const string Iapws2011 = "IAPWS (2011) ice Ih equations, Wagner et al., J. Phys. Chem. Ref. Data 40, 043103 (2011); from memory";
    public const double IapwsTt = 273.16, IapwsPt = 611.657;
    public static readonly double[] IapwsSublimationA = [-0.212144006e2, 0.273203819e2, -0.610598130e1];
    public static readonly double[] IapwsSublimationB = [0.333333333e-2, 0.120666667e1, 0.170333333e1];
    public static readonly double[] IapwsMeltingA = [0.119539337e7, 0.808183159e5, 0.333826860e4];
    public static readonly double[] IapwsMeltingB = [0.300000e1, 0.257500e2, 0.103750e3];

    /// <summary>The temperatures of <c>WaterSolidLinesTests.Sublimation_ClapeyronRoute_WithinThreePercentOfIapws</c> (its InlineData).</summary>
    public static readonly double[] WaterSublimationTemperatures = [200.0, 215.0, 230.0, 245.0, 260.0, 270.0, 273.16];

    public static double IapwsSublimation(double t)
    {
        double theta = t / IapwsTt, sum = 0;
        for (int i = 0; i < 3; i++)
        {
            sum += IapwsSublimationA[i] * Math.Pow(theta, IapwsSublimationB[i]);
        }

        return IapwsPt * Math.Exp(sum / theta);
    }

    /// <summary>dP/dT of the IAPWS melting equation at T_t: −(P_t/T_t) Σ a_i b_i.</summary>
    public static double IapwsMeltingSlopeAtTriplePoint() => -IapwsPt / IapwsTt * IapwsMeltingA.Select((a, i) => a * IapwsMeltingB[i]).Sum();

    /// <summary>Carbon dioxide's triple point and normal sublimation temperature (CRC Handbook, triple
    /// points table and sublimation at 1 atm; from memory), as in <c>Solids/CarbonDioxideSolidLinesTests</c>.</summary>
    public const double Co2HandbookTt = 216.59, Co2HandbookPt = 0.518e6, Co2HandbookSublimation = 194.7;

    /// <summary>Nitrogen's Simon–Glatzel melting line P/P_t = 1 + A[(T/T_t)^B − 1] (Span, Lemmon, Jacobsen,
    /// Wagner &amp; Yokozeki, J. Phys. Chem. Ref. Data 29, 1361 (2000); from memory), as in
    /// <c>Solids/SimonGlatzelTests</c> (which writes it into a fluid file of its own).</summary>
    public const double N2Tt = 63.151, N2Pt = 12.5198e3, N2A = 12798.61, N2B = 1.78963;

    /// <summary>Propane's triple point, 85.525 K and about 1.7e-4 Pa (Lemmon, McLinden &amp; Wagner,
    /// J. Chem. Eng. Data 54, 3141 (2009); from memory), as in
    /// <c>Equilibrium/TriplePointRangeTests.Propane_AtItsTriplePoint_IsSolvedNearTheReferencePressure</c>
    /// with its bounds on |ln(P/P_ref)|.</summary>
    public const double PropaneTt = 85.525, PropanePt = 1.7e-4, PropaneTunedLnBound = 0.10, PropaneDefaultLnBound = 0.92;

    /// <summary>Liquid water and toluene at 25 °C, 1 atm: α [1/K], κ_T [1/Pa] (CRC Handbook; from memory),
    /// and water's internal pressure 41 cal/cm³ (Dack, Chem. Soc. Rev. 4 (1975) 211; from memory), as in
    /// <c>Commands/DeriveExplainTests</c> (PhaseSlope.Cli.Tests), with its model-to-measured bands.</summary>
    public const double WaterAlpha = 2.572e-4, WaterKappa = 4.525e-10, WaterDackInternalPressure = 41 * 4.184e6;
    public const double TolueneAlpha = 1.07e-3, TolueneKappa = 92e-11;

    /// <summary>Callen, Thermodynamics and an Introduction to Thermostatistics, 2nd ed. (1985), ch. 7; from memory.</summary>
    public const string Callen = "Callen, Thermodynamics and an Introduction to Thermostatistics, 2nd ed. (1985), ch. 7; from memory";

    /// <summary>The textbook forms of <c>JacobianReductionTests.ClassicIdentities_MatchTheirTextbookForms</c>
    /// (its InlineData: Maxwell relations, the thermodynamic equation of state, natural-variable
    /// derivatives, c_v and the Joule–Thomson coefficient), in the tool's notation.</summary>
    public static readonly (PhaseSlope.Core.Properties.StateVariable Of, PhaseSlope.Core.Properties.StateVariable By, PhaseSlope.Core.Properties.StateVariable Hold, string Textbook)[] ClassicIdentities =
    [
        (StateVariable.S, StateVariable.V, StateVariable.T, "alpha/kappa_T"),
        (StateVariable.S, StateVariable.P, StateVariable.T, "-v*alpha"),
        (StateVariable.T, StateVariable.V, StateVariable.S, "-(T*alpha)/(kappa_T*cp - T*v*alpha^2)"),
        (StateVariable.T, StateVariable.P, StateVariable.S, "T*v*alpha/cp"),
        (StateVariable.U, StateVariable.V, StateVariable.T, "T*alpha/kappa_T - P"),
        (StateVariable.H, StateVariable.P, StateVariable.T, "v*(1 - T*alpha)"),
        (StateVariable.H, StateVariable.S, StateVariable.P, "T"),
        (StateVariable.H, StateVariable.P, StateVariable.S, "v"),
        (StateVariable.G, StateVariable.T, StateVariable.P, "-s"),
        (StateVariable.A, StateVariable.V, StateVariable.T, "-P"),
        (StateVariable.H, StateVariable.T, StateVariable.P, "cp"),
        (StateVariable.U, StateVariable.T, StateVariable.V, "cp - T*v*alpha^2/kappa_T"),
        (StateVariable.T, StateVariable.P, StateVariable.H, "v*(T*alpha - 1)/cp"),
    ];

    /// <summary>The 13 states (T [K], P [MPa]) that failed before the restricted-step Newton, the InlineData of
    /// <c>MixtureCriticalRegionTests.Flash_StatesThatFailedBefore_Converge</c> (measured on this code's
    /// earlier version; no outside source).</summary>
    public static readonly (double T, double MPa)[] CriticalRegionFailedBefore =
    [
        (207, 6.05), (216, 7.10), (218, 7.35), (220, 7.60), (222, 7.85), (224, 8.10), (229, 8.70),
        (232, 9.05), (239, 9.70), (240, 9.75), (242, 9.90), (242, 9.95), (243, 9.95),
    ];

    /// <summary>Carbon dioxide–ethane maximum-pressure azeotrope of about two-thirds carbon dioxide (Fredenslund
    /// &amp; Mollerup, J. Chem. Soc. Faraday Trans. 1 70, 1653 (1974); from memory), at the temperatures of
    /// <c>BinaryDiagramTests.CarbonDioxideEthane_MaximumPressureAzeotrope_WithThePublishedKij</c>.</summary>
    public const string Co2EthaneAzeotropeSource = "Fredenslund & Mollerup, J. Chem. Soc. Faraday Trans. 1 70, 1653 (1974); from memory";
    public static readonly double[] Co2EthaneAzeotropeTemperatures = [230.0, 250.0, 270.0];
}
