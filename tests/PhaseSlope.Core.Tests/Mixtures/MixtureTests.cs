using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The mixture record: checks on its fractions and components, mass to mole conversion of
/// published blend compositions, Kay's rule, and the model it builds.</summary>
public sealed class MixtureTests
{
    private static Fluid F(string name) => FluidCatalog.Embedded.Find(name);

    [Fact]
    public void FromMassFractions_R407C_GivesTheHandComputedMoleFractions()
    {
        // R-407C is 23/25/52 mass % R-32/R-125/R-134a (ASHRAE Standard 34; from memory). With the
        // catalog's molar masses 52.02339, 120.0214 and 102.0309 g/mol, by hand:
        //   w/M = 0.23/52.02339 = 0.004421088, 0.25/120.0214 = 0.002082962, 0.52/102.0309 = 0.005096495 mol/g,
        //   sum 0.011600545 mol/g, so x = 0.3811104, 0.1795572, 0.4393324 and M = 1/0.011600545 = 86.20284 g/mol.
        // Tolerance 5e-8: the hand values are written to 7 decimals (half a unit of the last digit).
        var mixture = Mixture.FromMassFractions([F("r-32"), F("r-125"), F("r-134a")], [0.23, 0.25, 0.52]);
        double[] expected = [0.3811104, 0.1795572, 0.4393324];
        for (int i = 0; i < 3; i++)
        {
            Assert.True(Math.Abs(mixture.MoleFractions[i] - expected[i]) < 5e-8, $"x[{i}] = {mixture.MoleFractions[i]:R}, hand {expected[i]}");
        }

        Assert.True(Math.Abs(mixture.MolarMass!.Value * 1e3 - 86.20284) < 5e-6, $"M = {mixture.MolarMass:R}");
        // ASHRAE Standard 34 lists R-407C's molar mass as 86.2 g/mol (from memory), three significant
        // digits: within half a unit of the last one.
        Assert.InRange(mixture.MolarMass.Value * 1e3, 86.15, 86.25);
        // Converting back gives the mass fractions as given, to rounding (1e-15 relative).
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(new[] { 0.23, 0.25, 0.52 }[i], mixture.MassFractions![i], 1e-15);
        }
    }

    [Fact]
    public void MolarMass_DryAir_MatchesThePublishedValue()
    {
        // Dry air as the ternary N2/O2/Ar with mole fractions 0.7812/0.2096/0.0092 has molar mass
        // 28.9586 g/mol (Lemmon, Jacobsen, Penoncello & Friend, J. Phys. Chem. Ref. Data 29, 331
        // (2000); from memory). By hand with the catalog's molar masses: 0.7812·28.0134 +
        // 0.2096·31.9988 + 0.0092·39.948 = 21.88407 + 6.70695 + 0.36752 = 28.95854 g/mol.
        // Tolerance 1e-4 g/mol: half a unit of the published value's last digit (5e-5) plus the
        // difference of the molar masses used (Lemmon et al. take 28.01348 g/mol for nitrogen, from
        // memory, against the catalog's 28.0134: 0.7812 · 8e-5 = 6.2e-5 g/mol).
        var air = Mixture.Create([F("nitrogen"), F("oxygen"), F("argon")], [0.7812, 0.2096, 0.0092]);
        Assert.InRange(air.MolarMass!.Value * 1e3, 28.9586 - 1e-4, 28.9586 + 1e-4);
    }

    [Fact]
    public void MolarMassOf_APhase_IsItsOwnCompositionsSum()
    {
        // A phase of the same components with other mole fractions: Σ x_i M_i of its own fractions.
        // By hand with the catalog's molar masses (methane 16.04246, n-butane 58.1222 g/mol): a liquid
        // 0.15 methane, 0.85 n-butane is 2.406369 + 49.40387 = 51.810239 g/mol, against the feed's
        // 0.3·16.04246 + 0.7·58.1222 = 4.812738 + 40.68554 = 45.498278 g/mol. Tolerance 5e-7 g/mol:
        // the hand sums are written to six decimals (half a unit of the last digit).
        var mixture = Mixture.Create([F("methane"), F("n-butane")], [0.3, 0.7]);
        Assert.True(Math.Abs(mixture.MolarMassOf([0.15, 0.85])!.Value * 1e3 - 51.810239) < 5e-7, $"{mixture.MolarMassOf([0.15, 0.85]):R}");
        Assert.True(Math.Abs(mixture.MolarMass!.Value * 1e3 - 45.498278) < 5e-7, $"{mixture.MolarMass:R}");
        // The feed's is the same sum over the feed's own fractions.
        Assert.Equal(mixture.MolarMass, mixture.MolarMassOf(mixture.MoleFractions));
        // One fraction per component, or the sum means nothing.
        Assert.Throws<ArgumentException>(() => mixture.MolarMassOf([1.0]));
    }

    [Fact]
    public void PseudoCritical_IsKaysRule()
    {
        // Kay's rule (Kay, Ind. Eng. Chem. 28, 1014 (1936); from memory): Tpc = Σ x_i Tc_i. For
        // 0.8 methane + 0.2 propane with the catalog's Tc (190.564 K, 369.89 K) by hand:
        // 0.8·190.564 + 0.2·369.89 = 152.4512 + 73.978 = 226.4292 K; Pc (4.5992, 4.2512 MPa):
        // 3.67936 + 0.85024 = 4.5296 MPa. Exact arithmetic on the stored values, so 1e-12 relative.
        var mixture = Mixture.Create([F("methane"), F("propane")], [0.8, 0.2]);
        Assert.Equal(226.4292, mixture.PseudoCriticalTemperature, 1e-9);
        Assert.Equal(4.5296e6, mixture.PseudoCriticalPressure, 1e-5);
    }

    [Theory]
    [InlineData(new[] { 0.5, 0.4 }, "sum to 0.9, not 1")]
    [InlineData(new[] { 0.5, 0.5000011 }, "sum to 1.0000011, not 1")]
    [InlineData(new[] { 1.1, -0.1 }, "the mole fraction of 'ethane' is -0.1")]
    [InlineData(new[] { double.NaN, 1.0 }, "the mole fraction of 'methane' is NaN")]
    public void Create_BadFractions_AreRefusedNamingTheComponent(double[] fractions, string message)
    {
        var ex = Assert.Throws<InvalidInputException>(() => Mixture.Create([F("methane"), F("ethane")], fractions));
        Assert.Contains(message, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_WithinTheSumTolerance_IsAcceptedAndNormalised()
    {
        // Three thirds written to six decimals sum to 0.999999, inside the 1e-6 tolerance; the
        // stored fractions are divided by that sum, so they sum to 1 to rounding (1e-15).
        var mixture = Mixture.Create([F("methane"), F("ethane"), F("propane")], [0.333333, 0.333333, 0.333333]);
        Assert.Equal(1.0, mixture.MoleFractions.Sum(), 1e-15);
        Assert.Equal(1.0 / 3, mixture.MoleFractions[0], 1e-15);
    }

    [Fact]
    public void Create_RepeatedComponent_ByASynonym_IsRefused()
    {
        // "CO2" and "carbon dioxide" are the same catalog fluid.
        var ex = Assert.Throws<InvalidInputException>(() => Mixture.Create([F("CO2"), F("methane"), F("carbon dioxide")], [0.2, 0.6, 0.2]));
        Assert.Contains("component 'carbon dioxide' is given twice (components 1 and 3)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromMassFractions_ComponentWithoutMolarMass_IsRefusedNamingIt()
    {
        var noMass = InlineFluid.Parse("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,name=my-fluid");
        var ex = Assert.Throws<FluidDataException>(() => Mixture.FromMassFractions([F("methane"), noMass], [0.5, 0.5]));
        Assert.Contains("fluid 'my-fluid' gives no molar mass", ex.Message, StringComparison.Ordinal);
        Assert.Null(Mixture.Create([F("methane"), noMass], [0.5, 0.5]).MolarMass);
    }

    [Theory]
    [InlineData(0, 0, 0.1, "needs two different components")]
    [InlineData(0, 2, 0.1, "needs two different components")]
    [InlineData(0, 1, 1.0, "must be between -1 and 1")]
    [InlineData(0, 1, double.PositiveInfinity, "must be between -1 and 1")]
    public void Create_BadInteraction_IsRefused(int first, int second, double value, string message)
    {
        var ex = Assert.Throws<InvalidInputException>(() => Mixture.Create([F("methane"), F("ethane")], [0.5, 0.5], [new GivenInteraction(first, second, value, "test")]));
        Assert.Contains(message, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_SamePairTwice_IsRefused()
    {
        var ex = Assert.Throws<InvalidInputException>(() => Mixture.Create([F("methane"), F("ethane")], [0.5, 0.5],
            [new GivenInteraction(0, 1, 0.01, "a"), new GivenInteraction(1, 0, 0.02, "b")]));
        Assert.Contains("k_ij of methane, ethane is given twice", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Interactions_GivenOverPublishedOverAssumedZero()
    {
        var mixture = Mixture.Create([F("methane"), F("carbon dioxide"), F("n-decane")], [0.6, 0.3, 0.1]);
        var pr = mixture.Interactions(CubicModelKind.PengRobinson);
        Assert.Equal(InteractionOrigin.Published, pr.Pair(0, 1).Origin);
        Assert.Equal(0.0919, pr[1, 0]);
        Assert.Equal(InteractionOrigin.AssumedZero, pr.Pair(2, 0).Origin);
        Assert.Equal(0.0, pr[0, 2]);
        Assert.True(pr.AnyAssumedZero);
        // No SRK table ships: the same pair is an assumed zero under srk.
        Assert.Equal(InteractionOrigin.AssumedZero, mixture.Interactions(CubicModelKind.SoaveRedlichKwong).Pair(0, 1).Origin);

        var overridden = mixture.WithInteractions([new GivenInteraction(1, 0, 0.1, "my fit")]);
        var given = overridden.Interactions(CubicModelKind.PengRobinson).Pair(0, 1);
        Assert.Equal((0.1, "my fit", InteractionOrigin.Given), (given.Value, given.Source, given.Origin));
        // A second override of the same pair replaces the first.
        Assert.Equal(0.05, overridden.WithInteractions([new GivenInteraction(0, 1, 0.05, "later")]).Interactions(CubicModelKind.PengRobinson)[0, 1]);
    }

    [Fact]
    public void InteractionMatrix_PairsAreInRowOrderAndSymmetric()
    {
        var names = new[] { "methane", "ethane", "propane", "n-butane" };
        var given = new List<GivenInteraction>();
        for (int i = 0; i < 4; i++)
        {
            for (int j = i + 1; j < 4; j++)
            {
                given.Add(new GivenInteraction(j, i, 0.01 * (10 * i + j), "test"));
            }
        }

        var matrix = Mixture.Create([.. names.Select(F)], [0.25, 0.25, 0.25, 0.25], given).Interactions(CubicModelKind.PengRobinson);
        var array = matrix.ToArray();
        for (int i = 0; i < 4; i++)
        {
            Assert.Equal(0.0, matrix[i, i]);
            for (int j = 0; j < 4; j++)
            {
                if (i != j)
                {
                    int lo = Math.Min(i, j), hi = Math.Max(i, j);
                    Assert.Equal(0.01 * (10 * lo + hi), matrix[i, j], 1e-15);
                    Assert.Equal(matrix[i, j], array[i * 4 + j]);
                    Assert.Equal((lo, hi), (matrix.Pair(i, j).First, matrix.Pair(i, j).Second));
                }
            }
        }

        Assert.Equal(6, matrix.Pairs.Count);
    }

    [Fact]
    public void CreateModel_IsTheMixtureOfThePureModels()
    {
        // The mixture model of one component at x = 1 is the pure model (CubicMixtureModelTests
        // checks the formula); here the factory's choices: same alpha function and volume shift per
        // component as CubicModel.For, and the k_ij of Interactions.
        var mixture = Mixture.Create([F("methane"), F("carbon dioxide")], [0.7, 0.3]);
        var model = mixture.CreateModel(CubicModelKind.PengRobinson, AlphaForm.Twu, f => f.Name == "methane" ? 1e-6 : -2e-6);
        var pure = CubicModel.For(CubicModelKind.PengRobinson, F("carbon dioxide"), AlphaForm.Twu, -2e-6);
        Assert.Equal(pure.Alpha.Description, model.Components[1].Alpha.Description);
        Assert.Equal(1e-6, model.Components[0].VolumeShift);
        Assert.Equal(-2e-6, model.Components[1].VolumeShift);
        Assert.Equal(0.0919, model.Interaction(0, 1));
        Assert.Equal(0.0919, model.Interaction(1, 0));

        // The pure limit through the factory: ln φ of the one present component equals the pure
        // model's (same formula, same constants: 1e-12 absolute).
        var limit = Mixture.Create([F("methane"), F("carbon dioxide")], [0, 1]).CreateModel(CubicModelKind.PengRobinson);
        var co2 = CubicModel.For(CubicModelKind.PengRobinson, F("carbon dioxide"));
        Span<double> lnPhi = stackalloc double[2];
        Span<double> pureLnPhi = stackalloc double[1];
        limit.LnFugacityCoefficients(280, 2000, [0, 1], lnPhi);
        co2.LnFugacityCoefficients(280, 2000, Composition.Pure, pureLnPhi);
        Assert.Equal(pureLnPhi[0], lnPhi[1], 1e-12);
    }
}
