using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The ideal-gas heat capacities of the shipped catalog against published values.</summary>
public class IdealGasCatalogTests
{
    private const double R = Constants.GasConstant;
    private const double StandardTemperature = 298.15;

    private const string Janaf = "Chase, NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem. Ref. Data Monograph 9 (1998), ideal gas at 298.15 K; from memory";
    private const string Crc = "CRC Handbook of Chemistry and Physics, table of standard thermodynamic properties of chemical substances, gas at 298.15 K, rounded to 0.1 J/(mol·K); from memory";

    // Tolerances:
    // * 0.3 % where the catalog carries the ideal-gas part of a reference equation of state: those
    //   parts reproduce the statistical-mechanical cp° of the tables to about 0.1 % or better, and
    //   the rest allows for recalled rather than looked-up reference values.
    // * 1 % where the catalog carries a handbook polynomial (fits of a few tenths of a percent),
    //   or where the reference value is itself recalled only to 0.1 J/(mol·K).
    // * 5 % where the catalog carries a Joback group-contribution estimate: errors of a few
    //   percent are typical for the method (common practice; Poling et al. 5th ed. ch. 3 quote
    //   errors of this size; from memory), and the three xylenes share one estimate.
    private const double ReferenceEquationTolerance = 0.003;
    private const double PolynomialTolerance = 0.01;
    private const double GroupContributionTolerance = 0.05;

    public static TheoryData<string, double, double, string> StandardHeatCapacities => new()
    {
        // fluid, cp° at 298.15 K in J/(mol·K), relative tolerance, source of the value
        { "nitrogen", 29.124, ReferenceEquationTolerance, Janaf },
        { "carbon dioxide", 37.135, ReferenceEquationTolerance, Janaf },
        { "methane", 35.639, ReferenceEquationTolerance, Janaf },
        { "water", 33.590, ReferenceEquationTolerance, Janaf },
        { "argon", 20.786, 1e-4, Janaf },
        { "ammonia", 35.630, PolynomialTolerance, Janaf },
        { "ethane", 52.5, PolynomialTolerance, Crc },
        { "propane", 73.6, PolynomialTolerance, Crc },
        { "n-butane", 98.5, PolynomialTolerance, Crc },
        { "n-pentane", 120.1, PolynomialTolerance, Crc },
        { "benzene", 82.4, PolynomialTolerance, Crc },
        { "toluene", 103.7, PolynomialTolerance, Crc },
        { "methanol", 44.1, PolynomialTolerance, Crc },
        { "ethanol", 65.6, PolynomialTolerance, Crc },
        { "isobutane", 96.65, PolynomialTolerance, Crc },
        { "isopentane", 118.9, PolynomialTolerance, Crc },
        { "ethylene", 42.886, PolynomialTolerance, Janaf },
        { "cyclohexane", 106.3, PolynomialTolerance, Crc },
        { "n-hexane", 143.1, PolynomialTolerance, Crc },
        { "n-heptane", 165.2, PolynomialTolerance, Crc },
        { "n-octane", 188.9, PolynomialTolerance, Crc },
        { "propylene", 64.3, PolynomialTolerance, Crc },
        { "neopentane", 121.6, GroupContributionTolerance, Crc },
        { "n-nonane", 211.7, GroupContributionTolerance, Crc },
        { "n-decane", 233.1, GroupContributionTolerance, Crc },
        { "isohexane", 144.2, GroupContributionTolerance, Crc },
        { "cyclopentane", 82.9, GroupContributionTolerance, Crc },
        { "1-butene", 85.6, GroupContributionTolerance, Crc },
        { "isobutene", 89.1, GroupContributionTolerance, Crc },
        { "o-xylene", 133.3, GroupContributionTolerance, Crc },
        { "m-xylene", 127.6, GroupContributionTolerance, Crc },
        { "p-xylene", 126.9, GroupContributionTolerance, Crc },
        { "ethylbenzene", 128.4, GroupContributionTolerance, Crc },
        { "1-propanol", 85.6, PolynomialTolerance, Crc },
        { "2-propanol", 89.3, PolynomialTolerance, Crc },
        { "1-butanol", 108.4, PolynomialTolerance, Crc },
        { "acetone", 74.5, PolynomialTolerance, Crc },
        { "r-32", 42.9, PolynomialTolerance, Janaf },
        { "r-23", 51.0, GroupContributionTolerance, Janaf },
        { "r-22", 55.9, GroupContributionTolerance, Janaf },
        { "oxygen", 29.376, PolynomialTolerance, Janaf },
        { "carbon monoxide", 29.142, PolynomialTolerance, Janaf },
        { "chlorine", 33.949, PolynomialTolerance, Janaf },
        { "hydrogen", 28.836, ReferenceEquationTolerance, Janaf },
        { "neon", 20.786, 1e-4, Janaf },
        { "krypton", 20.786, 1e-4, Janaf },
        { "xenon", 20.786, 1e-4, Janaf },
        { "helium", 20.786, 1e-4, Janaf },
        { "sulfur dioxide", 39.9, PolynomialTolerance, Crc },
        { "hydrogen sulfide", 34.2, PolynomialTolerance, Crc },
    };

    /// <summary>Fitted correlations for which no trustworthy cp° table value is recalled (R-134a is
    /// also checked by its power coefficients following from the published Helmholtz constants;
    /// for dimethyl ether the recalled 64.4 J/(mol·K) disagrees by 2 % with both its reference
    /// equation and a Poling polynomial, so the table value is the suspect recall).
    /// Group-contribution estimates are not required to have a table value.</summary>
    private static readonly string[] WithoutRecalledReference = ["dimethyl ether", "r-1234yf", "r-1234ze-e", "r-134a", "r-245fa"];

    [Theory]
    [MemberData(nameof(StandardHeatCapacities))]
    public void HeatCapacity_At298K_MatchesPublishedValue(string name, double expected, double tolerance, string source)
    {
        IdealGasHeatCapacity cp = FluidCatalog.Embedded.Find(name).IdealGasHeatCapacity!;

        AssertClose.Relative(expected, cp.HeatCapacity(StandardTemperature), tolerance, $"{name} cp° at 298.15 K vs {source}");
    }

    [Fact]
    public void Argon_IsExactlyTheMonatomicValue()
    {
        // Kinetic theory: cp° = 5R/2 for translation only, at every temperature of the range.
        IdealGasHeatCapacity cp = FluidCatalog.Embedded.Find("argon").IdealGasHeatCapacity!;

        foreach (double t in new[] { cp.MinimumTemperature, StandardTemperature, cp.MaximumTemperature })
        {
            AssertClose.Relative(2.5 * R, cp.HeatCapacity(t), 1e-15, $"argon cp° at {t} K");
            Assert.Equal(0.0, cp.HeatCapacityDerivative(t));
        }
    }

    [Fact]
    public void EveryCatalogFluid_HasAnIdealGasHeatCapacityWithAMemorySource()
    {
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            Assert.True(fluid.IdealGasHeatCapacity is not null, $"{fluid.Name} has no ideal_gas_cp");
            Assert.Contains("from memory", fluid.IdealGasHeatCapacity!.Source, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void EveryFittedCorrelation_HasAPublishedReferenceValueTestedAbove_ExceptTheListed()
    {
        // R-134a has no recalled cp° table value to compare with; its correlation is checked by
        // R134a_PowerCoefficients_FollowFromTheHelmholtzConstants instead.
        var tested = new HashSet<string>(StandardHeatCapacities.Select(row => (string)row[0]), StringComparer.Ordinal);

        string[] untested = [.. FluidCatalog.Embedded.All
            .Where(f => !f.IdealGasHeatCapacity!.Source.Contains("estimated by", StringComparison.OrdinalIgnoreCase))
            .Select(f => f.Name).Where(n => !tested.Contains(n))];

        Assert.Equal(WithoutRecalledReference, untested);
    }

    [Fact]
    public void EveryCatalogFluid_HeatCapacityAtLeastMonatomicOverItsRange()
    {
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            IdealGasHeatCapacity cp = fluid.IdealGasHeatCapacity!;
            for (int i = 0; i <= 2000; i++)
            {
                double t = cp.MinimumTemperature + (cp.MaximumTemperature - cp.MinimumTemperature) * i / 2000.0;
                double reduced = cp.HeatCapacity(t) / R;
                Assert.True(reduced >= 2.5 * (1 - 1e-12), $"{fluid.Name}: cp°/R = {reduced} at {t} K");
            }
        }
    }

    [Fact]
    public void EveryCatalogFluid_RangeCoversRoomTemperatureAndTheLiquidRegion()
    {
        // The range must include 298.15 K and, for fitted correlations, reach down to the normal
        // boiling point (or the triple point where there is none, as for carbon dioxide), so
        // caloric properties are available along the saturation curve. A group-contribution
        // estimate keeps the range its method states; states below it are flagged as
        // extrapolated at run time instead.
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            IdealGasHeatCapacity cp = fluid.IdealGasHeatCapacity!;
            double low = (fluid.NormalBoilingPoint ?? fluid.TriplePointTemperature)!.Value;

            Assert.True(cp.InRange(StandardTemperature), $"{fluid.Name}: 298.15 K outside {cp.MinimumTemperature}-{cp.MaximumTemperature} K");
            if (!cp.Source.Contains("estimated by", StringComparison.OrdinalIgnoreCase))
            {
                Assert.True(cp.InRange(low), $"{fluid.Name}: {low} K outside {cp.MinimumTemperature}-{cp.MaximumTemperature} K");
            }
        }
    }

    [Fact]
    public void ReferenceEquationForms_ReduceByTheCriticalTemperatureOfTheFile()
    {
        // Where the file writes a reference equation in reduced form, the reducing temperature
        // must be that equation's Tc, which is also the file's critical temperature.
        foreach (string name in new[] { "water", "carbon dioxide", "methane", "ethane", "n-butane", "nitrogen", "r-134a" })
        {
            Fluid fluid = FluidCatalog.Embedded.Find(name);

            Assert.Equal(fluid.CriticalTemperature.Value, fluid.IdealGasHeatCapacity!.ReducingTemperature);
        }
    }

    [Fact]
    public void Nitrogen_PowerCoefficients_FollowFromTheHelmholtzConstants()
    {
        // Span, Lemmon, Jacobsen, Wagner & Yokozeki, J. Phys. Chem. Ref. Data 29, 1361 (2000),
        // ideal part a1 ln τ + a4/τ + a5/τ² + a6/τ³ + a7 ln(1 − e^(−a8 τ)); from memory.
        // cv°/R = −τ² ∂²α°/∂τ², so cp°/R = 1 + a1 − 2a4/τ − 6a5/τ² − 12a6/τ³ + a7 E(a8 τ).
        const double a1 = 2.5, a4 = -1.934819e-4, a5 = -1.247742e-5, a6 = 6.678326e-8, a7 = 1.012941, a8 = 26.65788;
        IdealGasHeatCapacity cp = FluidCatalog.Embedded.Find("nitrogen").IdealGasHeatCapacity!;
        double[] expected = [1 + a1, -2 * a4, -6 * a5, -12 * a6];

        Assert.Equal(new double[] { 0, 1, 2, 3 }, cp.PowerTerms.Select(p => p.Exponent));
        for (int i = 0; i < expected.Length; i++)
        {
            AssertClose.Relative(expected[i], cp.PowerTerms[i].Coefficient, 1e-14, $"nitrogen power coefficient {i}");
        }

        Assert.Single(cp.EinsteinTerms);
        AssertClose.Relative(a7, cp.EinsteinTerms[0].Coefficient, 1e-15, "nitrogen Einstein coefficient");
        AssertClose.Relative(a8 * 126.192, cp.EinsteinTerms[0].Temperature, 1e-15, "nitrogen Einstein temperature");
    }

    [Fact]
    public void R134a_PowerCoefficients_FollowFromTheHelmholtzConstants()
    {
        // Tillner-Roth & Baehr, J. Phys. Chem. Ref. Data 23, 657 (1994), ideal part
        // a3 ln τ + a4 τ^(−1/2) + a5 τ^(−3/4); from memory. −τ² ∂²/∂τ² of a τ^k is −k(k−1)·a τ^k,
        // so cp°/R = 1 + a3 − (3/4) a4 (T/Tc)^(1/2) − (21/16) a5 (T/Tc)^(3/4).
        const double a3 = -1.629789, a4 = -9.723916, a5 = -3.927170, tc = 374.18;
        IdealGasHeatCapacity cp = FluidCatalog.Embedded.Find("r-134a").IdealGasHeatCapacity!;

        foreach (double t in new[] { 169.85, 247.076, StandardTemperature, 455.0 })
        {
            double reduced = 1 + a3 - 0.75 * a4 * Math.Sqrt(t / tc) - 21.0 / 16.0 * a5 * Math.Pow(t / tc, 0.75);
            AssertClose.Relative(R * reduced, cp.HeatCapacity(t), 1e-14, $"r-134a cp° at {t} K");
        }

        Assert.Empty(cp.EinsteinTerms);
    }

    [Fact]
    public void EveryCatalogFluid_IntegralsOverOneKelvin_AreMidpointValues()
    {
        // Over 298.15 ± 0.5 K the midpoint rule is exact up to h²·f''/24 with h = 1 K; for cp°
        // and cp°/T, |f''/f| is below about 1e-4 K⁻² here, so 1e-5 relative is safe while any
        // slip in the antiderivatives (of order one) fails. Ties the catalog data to the
        // analytic integrals.
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            IdealGasHeatCapacity cp = fluid.IdealGasHeatCapacity!;
            AssertClose.Relative(cp.HeatCapacity(StandardTemperature), cp.EnthalpyIntegral(297.65, 298.65), 1e-5,
                $"{fluid.Name}: ∫cp° dT over 1 K");
            AssertClose.Relative(cp.HeatCapacity(StandardTemperature) / StandardTemperature, cp.EntropyIntegral(297.65, 298.65), 1e-5,
                $"{fluid.Name}: ∫cp°/T dT over 1 K");
        }
    }
}
