using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Estimation;

/// <summary>Acentric factor from one vapour pressure, and chemical formulas (the group methods
/// are tested in <see cref="JobackTests"/> and <see cref="LydersenTests"/>).</summary>
public class EstimationTests
{
    [Theory]
    [InlineData(AcentricFactorMethod.Edmister, 0.02)]
    [InlineData(AcentricFactorMethod.LeeKesler, 0.01)]
    [InlineData(AcentricFactorMethod.AmbroseWalton, 0.01)]
    public void AcentricFactor_FromTheNormalBoilingPoint_IsCloseToTheCatalogValue(AcentricFactorMethod method, double tolerance)
    {
        // From (Tb, 1 atm) alone the corresponding-states relations recover ω of normal fluids to
        // about 0.01 (Lee-Kesler, Ambrose-Walton) and 0.02 (Edmister's straight line), common
        // practice (Poling et al. 5th ed. ch. 7 report errors of this size; from memory).
        foreach (string name in new[] { "propane", "n-butane", "n-hexane", "benzene", "toluene", "nitrogen", "argon" })
        {
            Fluid fluid = FluidCatalog.Embedded.Find(name);
            double omega = CorrespondingStates.AcentricFactor(method, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value,
                fluid.NormalBoilingPoint!.Value, Constants.StandardAtmosphere);
            AssertClose.Absolute(fluid.AcentricFactor.Value, omega, tolerance, $"{name} ω by {method}");
        }
    }

    [Fact]
    public void AcentricFactor_CorrespondingStatesRelations_InvertExactly()
    {
        // ln Pr = f0 + ω f1 (+ ω² f2): generating a vapour pressure from a chosen ω and inverting it
        // must return that ω to rounding.
        const double omega = 0.3;
        const double tr = 0.62;
        var (f0, f1) = CorrespondingStates.LeeKeslerTerms(tr);
        double pLk = Math.Exp(f0 + omega * f1) * 4e6;
        AssertClose.Absolute(omega, CorrespondingStates.AcentricFactor(AcentricFactorMethod.LeeKesler, 500, 4e6, tr * 500, pLk), 1e-12, "Lee-Kesler inversion");
        var (g0, g1, g2) = CorrespondingStates.AmbroseWaltonTerms(tr);
        double pAw = Math.Exp(g0 + omega * g1 + omega * omega * g2) * 4e6;
        AssertClose.Absolute(omega, CorrespondingStates.AcentricFactor(AcentricFactorMethod.AmbroseWalton, 500, 4e6, tr * 500, pAw), 1e-12, "Ambrose-Walton inversion");
        // Edmister at T/Tc = 0.7 is the definition itself.
        double p07 = Math.Pow(10, -1 - omega) * 4e6;
        AssertClose.Absolute(omega, CorrespondingStates.AcentricFactor(AcentricFactorMethod.Edmister, 500, 4e6, 350, p07), 1e-12, "Edmister at 0.7");
        AssertClose.Absolute(omega, CorrespondingStates.AcentricFactor(AcentricFactorMethod.Definition, 500, 4e6, 350, p07), 1e-12, "definition");
    }

    [Fact]
    public void AcentricFactor_DefinitionAwayFromTr07_IsRefused()
    {
        var ex = Assert.Throws<InvalidInputException>(() => CorrespondingStates.AcentricFactor(AcentricFactorMethod.Definition, 500, 4e6, 300, 1e5));
        Assert.Contains("T/Tc = 0.7", ex.Message, StringComparison.Ordinal);
        Assert.Throws<InvalidInputException>(() => CorrespondingStates.AcentricFactor(AcentricFactorMethod.LeeKesler, 500, 4e6, 600, 1e5));
        Assert.Throws<InvalidInputException>(() => CorrespondingStates.AcentricFactor(AcentricFactorMethod.LeeKesler, 500, 4e6, 400, 5e6));
    }

    [Fact]
    public void ChemicalFormula_MolarMass_FromIupacWeights()
    {
        // IUPAC 2005 weights (Wieser 2006; from memory): C 12.0107, H 1.00794, F 18.9984032, Cl 35.453.
        AssertClose.Relative(0.09213842, ChemicalFormula.MolarMass("C7H8"), 1e-12, "toluene");
        AssertClose.Relative(0.0520234, ChemicalFormula.MolarMass("CH2F2"), 1e-6, "R-32");
        AssertClose.Relative(0.0864684, ChemicalFormula.MolarMass("CHClF2"), 1e-6, "R-22");
        Assert.Throws<InvalidInputException>(() => ChemicalFormula.MolarMass("C7H8x"));
        Assert.Throws<InvalidInputException>(() => ChemicalFormula.MolarMass("Zz2"));
        Assert.Throws<InvalidInputException>(() => ChemicalFormula.MolarMass(""));
        Assert.Throws<InvalidInputException>(() => ChemicalFormula.MolarMass("C0H4"));
        Assert.Throws<InvalidInputException>(() => ChemicalFormula.MolarMass("C99999999999"));
    }

    [Theory]
    // Element counts: repeated symbols add up (ethanol written by its structure is C2H6O).
    [InlineData("CH3CH2OH", "C2H6O")]
    [InlineData("C7H8", "C7H8")]
    [InlineData("ClCH2Cl", "CH2Cl2")]
    // Hill order (Hill, J. Am. Chem. Soc. 22, 478 (1900)): C, H, then alphabetical; without carbon
    // all alphabetical (from memory, the convention of formula indexes).
    [InlineData("OSCCl2", "CCl2OS")]
    [InlineData("H2O", "H2O")]
    [InlineData("NH3", "H3N")]
    [InlineData("ClH", "ClH")]
    public void ChemicalFormula_ParseAndHill_CountsEachElementOnce(string formula, string hill)
    {
        var counts = ChemicalFormula.Parse(formula);
        Assert.Equal(hill, ChemicalFormula.Hill(counts));
        AssertClose.Relative(ChemicalFormula.MolarMass(hill), ChemicalFormula.MolarMass(counts), 1e-15, $"{formula} molar mass from the counts");
    }

    [Fact]
    public void ChemicalFormula_Difference_NamesTheElementsThatDiffer()
    {
        Assert.Null(ChemicalFormula.Difference(ChemicalFormula.Parse("C2H6O"), ChemicalFormula.Parse("CH3CH2OH")));
        Assert.Equal("C 3 vs 4, H 8 vs 10", ChemicalFormula.Difference(ChemicalFormula.Parse("C3H8"), ChemicalFormula.Parse("C4H10")));
        Assert.Equal("H 6 vs 5, Cl 0 vs 1", ChemicalFormula.Difference(ChemicalFormula.Parse("C6H6"), ChemicalFormula.Parse("C6H5Cl")));
    }
}
