using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Solids;

/// <summary>Water's sublimation and melting lines against the IAPWS (2011) equations for ice Ih
/// (Wagner, Riethmann, Feistel &amp; Harvey, J. Phys. Chem. Ref. Data 40, 043103 (2011); IAPWS
/// R14-08(2011)), evaluated here from their published form with the published coefficients
/// (from memory, as in fluids/water.fluid), independently of <see cref="SolidLineEquation"/>.</summary>
public class WaterSolidLinesTests
{
    // IAPWS (2011), from memory: triple point T_t = 273.16 K, P_t = 611.657 Pa.
    private const double Tt = 273.16, Pt = 611.657;

    // Sublimation of ice Ih: ln(P/P_t) = θ⁻¹ Σ a_i θ^b_i, θ = T/T_t.
    private static readonly double[] SublimationA = [-0.212144006e2, 0.273203819e2, -0.610598130e1];
    private static readonly double[] SublimationB = [0.333333333e-2, 0.120666667e1, 0.170333333e1];

    // Melting of ice Ih: P/P_t = 1 + Σ a_i (1 − θ^b_i), 251.165 K ≤ T ≤ 273.16 K (the published
    // a_i are positive; the fluid file writes the form 1 + Σ a(θ^b − 1) with them negated).
    private static readonly double[] MeltingA = [0.119539337e7, 0.808183159e5, 0.333826860e4];
    private static readonly double[] MeltingB = [0.300000e1, 0.257500e2, 0.103750e3];

    private static double IapwsSublimation(double t)
    {
        double theta = t / Tt, sum = 0;
        for (int i = 0; i < 3; i++)
        {
            sum += SublimationA[i] * Math.Pow(theta, SublimationB[i]);
        }

        return Pt * Math.Exp(sum / theta);
    }

    private static double IapwsMelting(double t)
    {
        double theta = t / Tt, sum = 0;
        for (int i = 0; i < 3; i++)
        {
            sum += MeltingA[i] * (1 - Math.Pow(theta, MeltingB[i]));
        }

        return Pt * (1 + sum);
    }

    /// <summary>dP/dT of the melting equation at T_t: −(P_t/T_t) Σ a_i b_i.</summary>
    private static double IapwsMeltingSlopeAtTriplePoint() => -Pt / Tt * MeltingA.Select((a, i) => a * MeltingB[i]).Sum();

    private static Fluid Water => FluidCatalog.Embedded.Find("water");

    private static SolidPhaseLines Lines(Fluid fluid) => new(fluid, CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson));

    /// <summary>The Clapeyron route alone: the file's published solid lines removed.</summary>
    private static SolidPhaseLines ClapeyronLines() => Lines(Water with { SublimationPressureEquation = null, MeltingPressureEquation = null });

    [Theory]
    [InlineData(200.0)]
    [InlineData(215.0)]
    [InlineData(230.0)]
    [InlineData(245.0)]
    [InlineData(260.0)]
    [InlineData(270.0)]
    [InlineData(273.16)]
    public void Sublimation_ClapeyronRoute_WithinThreePercentOfIapws(double t)
    {
        var point = ClapeyronLines().Sublimation(t);

        // 3 % is the criterion (measured +0.63 % at 200 K, +0.47 % at 230 K, 0 at T_t). In ln P it is 0.03,
        // which at 200 K is an error of 0.36 % (185 J/mol) in the mean dh_sub over 200-273 K:
        // what holding dh_sub at its triple-point value allows, since ice's heat capacity (about
        // 38 J/(mol K) at 273 K, 27 at 200 K; CRC Handbook, from memory) against the vapour's
        // cp° (about 33.5 J/(mol K)) moves dh_sub by some 0.3 kJ/mol over that range, and the
        // CRC enthalpy of fusion (6.01 kJ/mol) is given to 0.1 %.
        AssertClose.Relative(IapwsSublimation(t), point.Pressure, 0.03, $"sublimation pressure at {t} K");
        Assert.True(point.Slope > 0, "a sublimation line rises with temperature");
    }

    [Fact]
    public void Melting_ClapeyronSlopeAtTriplePoint_MatchesIapwsAndIsNegative()
    {
        var point = ClapeyronLines().Melting(Tt);
        double expected = IapwsMeltingSlopeAtTriplePoint(); // about -1.3466e7 Pa/K

        Assert.True(point.Slope < 0, $"ice is less dense than water, so the melting line falls: slope {point.Slope}");
        Assert.True(point.VolumeChange < 0, "dv_fus = v_liquid - v_solid is negative for water");
        // Measured +0.047 %. The tolerance is what the sources allow: the CRC enthalpy of fusion is
        // 6.01 kJ/mol (3 digits, +-0.08 %); the two densities (999.793 and 916.72 kg/m3) are given
        // to 0.005 kg/m3, which moves dv_fus (9 % of either volume) by about 1e-4 relative: 0.1 %.
        AssertClose.Relative(expected, point.Slope, 1e-3, "melting slope at the triple point");
        AssertClose.Relative(Pt, point.Pressure, 1e-15, "the Clapeyron melting line starts at the triple point");
    }

    [Theory]
    [InlineData(50.0)]
    [InlineData(120.0)]
    [InlineData(200.0)]
    [InlineData(250.0)]
    [InlineData(273.16)]
    public void Sublimation_PublishedEquation_EqualsIapwsFormula(double t)
    {
        var point = Lines(Water).Sublimation(t);

        // The same formula in another order of operations (θ^(b−1) against θ⁻¹·θ^b): rounding of
        // a sum of magnitude up to 400 (at 50 K) inside exp, a few 1e-14 relative at most.
        AssertClose.Relative(IapwsSublimation(t), point.Pressure, 1e-12, $"sublimation pressure at {t} K");
        // The slope is the equation's analytic derivative; five-point central difference with a
        // step of 1e-3 K: truncation about (1e-3)^4 relative, rounding about 1e-16/1e-3.
        double numeric = FiniteDifference.Central5(IapwsSublimation, t == Tt ? t - 2e-3 : t, 1e-3);
        double analytic = t == Tt ? Lines(Water).Sublimation(t - 2e-3).Slope : point.Slope;
        AssertClose.Relative(numeric, analytic, 1e-8, $"sublimation slope at {t} K");
    }

    [Theory]
    [InlineData(251.165)]
    [InlineData(255.0)]
    [InlineData(265.0)]
    [InlineData(273.0)]
    [InlineData(273.16)]
    public void Melting_PublishedEquation_EqualsIapwsFormula(double t)
    {
        var point = Lines(Water).Melting(t);

        // 1 + Σ a(θ^b − 1) against 1 + Σ a(1 − θ^b) with a negated: identical terms, summed in
        // the same order; 1e-12 allows for the rounding of θ^103.75 (a few ulps times 103.75).
        AssertClose.Relative(IapwsMelting(t), point.Pressure, 1e-12, $"melting pressure at {t} K");
        Assert.True(point.Slope < 0, $"melting slope at {t} K");
    }

    [Fact]
    public void Melting_PublishedEquation_EnthalpyFromHeldVolumeChange()
    {
        var fluid = Water;
        var point = Lines(fluid).Melting(Tt);
        double dv = fluid.FusionVolumeChange!.Value;

        // With the published equation, dv is held at its triple-point value and dh = T dv dP/dT:
        // at T_t this must give back about the CRC enthalpy of fusion (6.01 kJ/mol, from memory)
        // to the 0.1 % of the slope test above.
        AssertClose.Relative(dv, point.VolumeChange!.Value, 1e-15, "dv held at the triple point");
        AssertClose.Relative(Tt * dv * point.Slope, point.EnthalpyChange!.Value, 1e-15, "dh = T dv dP/dT");
        AssertClose.Relative(fluid.EnthalpyOfFusion!.Value, point.EnthalpyChange!.Value, 1e-3, "dh_fus at the triple point");
    }
}
