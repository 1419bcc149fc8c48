using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The catalog's data against the default model and against outside values.</summary>
public class CatalogConsistencyTests
{
    private const string Crc = "CRC Handbook of Chemistry and Physics, tables of normal boiling points and of enthalpies of vaporization at the normal boiling point; from memory";

    [Fact]
    public void EveryCatalogFluid_DefaultModelReproducesItsNormalBoilingPoint()
    {
        // A fluid whose Tc, Pc, ω and Tb disagree is a data error (FluidCheck.BoilingPointTolerance
        // states the model's known accuracy: 1 %); the measured worst classical fluid is
        // 1-propanol at −0.44 %. One fluid lies outside the model, not the data: helium-4 is a
        // quantum fluid with ω = −0.39, far below the range the Peng–Robinson κ(ω) correlation was
        // fitted to (its own vapour pressure gives ω ≈ −0.39 to −0.40, so the data agree with each
        // other); there the model misses Tb by −1.4 %, and 2 % is allowed for it alone.
        var modelLimited = new Dictionary<string, double>(StringComparer.Ordinal) { ["helium"] = 0.02 };
        var failures = new List<string>();
        foreach (Fluid fluid in FluidCatalog.Embedded.All.Where(f => f.NormalBoilingPoint is not null))
        {
            var check = FluidCheck.Run(fluid);
            bool consistent = modelLimited.TryGetValue(fluid.Name, out double limit)
                ? Math.Abs(check.BoilingPointDeviation ?? 1) <= limit
                : check.BoilingPointConsistent;
            if (check.PredictedBoilingPoint is null || !consistent || !check.SolvesToCriticalPoint)
            {
                failures.Add($"{fluid.Name}: tabulated {fluid.NormalBoilingPoint!.Value} K, model {check.PredictedBoilingPoint} K, solves {check.SolvesToCriticalPoint} {check.Failure}");
            }
        }

        Assert.True(failures.Count == 0, string.Join("; ", failures));
    }

    [Fact]
    public void Catalog_HoldsAtLeastSixtyFluidsAcrossTheFamilies()
    {
        var all = FluidCatalog.Embedded.All;
        Assert.True(all.Count >= 60, $"{all.Count} fluids");
        foreach (string name in new[] { "nitrogen", "oxygen", "argon", "neon", "krypton", "xenon", "hydrogen", "helium", "carbon monoxide",
                     "water", "ammonia", "carbon dioxide", "sulfur dioxide", "hydrogen sulfide", "chlorine",
                     "methane", "n-decane", "isobutane", "ethylene", "toluene", "methanol", "acetone", "dimethyl ether",
                     "r-32", "r-1234yf", "r-134a" })
        {
            Assert.True(FluidCatalog.Embedded.TryFind(name, out _), $"{name} missing from the catalog");
        }
    }

    /// <summary>Normal boiling point (K) and enthalpy of vaporization there (kJ/mol), with the
    /// tolerance on the model's latent heat: 3 % for non-polar fluids (two-parameter cubics with a
    /// generalised alpha reproduce latent heats of normal fluids to a couple of percent), 8 % for
    /// polar and hydrogen-bonded ones (Peng–Robinson is 7 % high for methanol).</summary>
    public static TheoryData<string, double, double, double> Handbook => new()
    {
        { "methane", 111.66, 8.19, 0.03 },
        { "ethane", 184.6, 14.69, 0.03 },
        { "propane", 231.1, 19.04, 0.03 },
        { "n-butane", 272.7, 22.44, 0.03 },
        { "n-pentane", 309.2, 25.79, 0.03 },
        { "n-hexane", 341.9, 28.85, 0.03 },
        { "n-heptane", 371.6, 31.77, 0.03 },
        { "n-octane", 398.8, 34.41, 0.03 },
        { "benzene", 353.2, 30.72, 0.03 },
        { "toluene", 383.8, 33.18, 0.03 },
        { "cyclohexane", 353.9, 29.97, 0.03 },
        { "nitrogen", 77.35, 5.57, 0.03 },
        { "argon", 87.3, 6.43, 0.03 },
        { "water", 373.12, 40.65, 0.08 },
        { "ammonia", 239.8, 23.33, 0.08 },
        { "methanol", 337.8, 35.21, 0.08 },
        { "ethanol", 351.4, 38.56, 0.08 },
        { "acetone", 329.2, 29.10, 0.08 },
    };

    [Theory]
    [MemberData(nameof(Handbook))]
    public void CatalogBoilingPointAndModelLatentHeat_MatchTheHandbook(string name, double boilingPoint, double latentHeat, double tolerance)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(name);

        // The catalog's Tb (from reference equations or Poling) against the handbook to 0.2 K
        // (handbook values are rounded to 0.1 K; a wider gap means one of the two is misquoted).
        AssertClose.Absolute(boilingPoint, fluid.NormalBoilingPoint!.Value, 0.2, $"{name} Tb vs {Crc}");
        var point = CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson).AtPressure(Constants.StandardAtmosphere);
        AssertClose.Relative(latentHeat * 1e3, point.EnthalpyOfVaporization, tolerance, $"{name} PR enthalpy of vaporization at Tb vs {Crc}");
    }

    /// <summary>Published vapour-pressure equations in the form ln(P/Pc) = (Tc/T)·Σ a_i·θ^t_i,
    /// θ = 1 − T/Tc, with their own Tc and Pc (K, MPa); all from memory.</summary>
    public static TheoryData<string, double, double, double[], double[], string> VapourPressureEquations => new()
    {
        { "water", 647.096, 22.064, [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502], [1, 1.5, 3, 3.5, 4, 7.5],
            "Wagner & Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993) (IAPWS saturation-pressure equation)" },
        { "argon", 150.687, 4.863, [-5.9409785, 1.3553888, -0.46497607, -1.5399043], [1, 1.5, 2, 4.5],
            "Tegeler, Span & Wagner, J. Phys. Chem. Ref. Data 28, 779 (1999), ancillary vapour-pressure equation" },
        { "carbon dioxide", 304.1282, 7.3773, [-7.0602087, 1.9391218, -1.6463597, -3.2995634], [1, 1.5, 2, 4],
            "Span & Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996), ancillary vapour-pressure equation" },
        { "methane", 190.564, 4.5992, [-6.036219, 1.409353, -0.4945199, -1.443048], [1, 1.5, 2, 4.5],
            "Setzmann & Wagner, J. Phys. Chem. Ref. Data 20, 1061 (1991), ancillary vapour-pressure equation" },
        { "nitrogen", 126.192, 3.3958, [-6.12445284, 1.26327220, -0.765910082, -1.77570564], [1, 1.5, 2.5, 5],
            "Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000), ancillary vapour-pressure equation" },
    };

    [Theory]
    [MemberData(nameof(VapourPressureEquations))]
    public void AcentricFactor_RecomputedFromItsDefinition_MatchesTheCatalog(string name, double tc, double pcMegapascal, double[] a, double[] t, string source)
    {
        double theta = 0.3;
        double lnPr = a.Zip(t).Sum(term => term.First * Math.Pow(theta, term.Second)) / 0.7;
        double pressure = Math.Exp(lnPr) * pcMegapascal * 1e6;

        double omega = CorrespondingStates.AcentricFactor(AcentricFactorMethod.Definition, tc, pcMegapascal * 1e6, 0.7 * tc, pressure);

        // The catalog quotes ω to three or four decimals (Poling et al. Appendix A): 1.5e-3 covers
        // that rounding and the different reference equations behind the tabulated values.
        AssertClose.Absolute(FluidCatalog.Embedded.Find(name).AcentricFactor.Value, omega, 1.5e-3, $"{name} ω from {source}");
    }
}
