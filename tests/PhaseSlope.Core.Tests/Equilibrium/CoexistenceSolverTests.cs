using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Equilibrium;

public class CoexistenceSolverTests
{
    private const double R = Constants.GasConstant;
    private const double Atmosphere = Constants.StandardAtmosphere;

    private static CoexistenceSolver Solver(string fluid, CubicModelKind kind = CubicModelKind.PengRobinson)
        => CoexistenceSolver.For(FluidCatalog.Embedded.Find(fluid), kind);

    /// <summary>(gL − gV)/RT from the Helmholtz energies at the two densities and the returned
    /// pressure: g = A_ig(T, ρ) + A_r + P/ρ with A_ig = RT·ln ρ + f(T). This is the same
    /// quantity as ln φL − ln φV but evaluated without Z or ln Z.</summary>
    private static double GibbsDifference(CubicModel model, CoexistencePoint point)
    {
        double t = point.Temperature;
        double rt = R * t;
        double rhoL = point.Liquid.Density;
        double rhoV = point.Vapour.Density;
        double arL = model.Residual(t, rhoL).Value;
        double arV = model.Residual(t, rhoV).Value;
        return Math.Log(rhoL / rhoV) + (arL - arV) / rt + point.Pressure * (1 / rhoL - 1 / rhoV) / rt;
    }

    // ---- (a) normal boiling point and enthalpy of vaporization against handbook values ----

    [Theory]
    // CRC Handbook of Chemistry and Physics (from memory): propane Tb = 231.04 K, ΔHvap(Tb) =
    // 19.04 kJ/mol. Peng–Robinson fits ω, i.e. Psat at Tr = 0.7, so for a light alkane Tb
    // (Tr ≈ 0.62) is within a few tenths of a kelvin: 0.5 K. Its ΔHvap for non-polar fluids
    // is typically within a couple of percent (common practice): 2.5 %. (Measured when written:
    // Tb 230.95 K, −0.09 K; ΔHvap 18.70 kJ/mol, −1.8 %.)
    [InlineData("propane", 231.04, 19.04e3, 0.5, 0.025)]
    // CRC Handbook (from memory): water Tb = 373.12 K, ΔHvap(Tb) = 40.65 kJ/mol. Water is
    // polar and hydrogen-bonded; a cubic model with ω still gets Psat to a few percent, so Tb
    // within 3 K, and ΔHvap within several percent: 5 %. (Measured when written: Tb 374.50 K,
    // +1.38 K; ΔHvap 41.99 kJ/mol, +3.3 %.)
    [InlineData("water", 373.12, 40.65e3, 3.0, 0.05)]
    public void AtPressure_OneAtmosphere_DefaultModelMatchesHandbookBoilingPointAndLatentHeat(
        string fluid, double boilingPoint, double latentHeat, double temperatureTolerance, double latentHeatTolerance)
    {
        var point = Solver(fluid).AtPressure(Atmosphere);

        AssertClose.Absolute(boilingPoint, point.Temperature, temperatureTolerance, $"{fluid} normal boiling point (K)");
        AssertClose.Relative(latentHeat, point.EnthalpyOfVaporization, latentHeatTolerance, $"{fluid} enthalpy of vaporization (J/mol)");
        // The temperature iteration stops at 1e-13 in T/Tc; d ln Psat/d ln T ≈ 6–12 at Tb.
        AssertClose.Relative(Atmosphere, point.Pressure, 1e-11, $"{fluid} saturation pressure at Tb");
    }

    // ---- (b) Trouton's rule ----

    [Theory]
    // Trouton's rule (common practice, no source): Δs_vap(Tb) ≈ 85–90 J/(mol·K) for non-polar,
    // non-associating liquids boiling well above the cryogenic range. Benzene and toluene are
    // the textbook examples; propane and n-butane are non-polar alkanes boiling at 231 K and
    // 273 K (their handbook Δs_vap, 19.04/231.04 and 22.4/272.7 kJ/(mol K) from memory, is
    // already ~82). Argon, methane and nitrogen are left out: very low boilers fall below the
    // rule (~72–75). The band is widened to 80–95 because the model (PR underestimates
    // propane's ΔHvap by ~2 %) and the light alkanes themselves sit at its low edge.
    [InlineData("propane")]
    [InlineData("n-butane")]
    [InlineData("benzene")]
    [InlineData("toluene")]
    public void AtPressure_NonPolarLiquidAtNormalBoilingPoint_FollowsTroutonsRule(string fluid)
    {
        var point = Solver(fluid).AtPressure(Atmosphere);

        AssertClose.InRange(80, 95, point.EntropyOfVaporization, $"{fluid} entropy of vaporization at Tb, J/(mol K)");
    }

    [Theory]
    // The known exceptions to Trouton's rule (common practice): hydrogen-bonded liquids lie above
    // it (water's handbook value 40.65/373.12 ≈ 109 J/(mol K), from memory), very low boilers
    // below it (argon 6.43/87.3 ≈ 74, from memory). The model, which carries this only
    // through ω, must show both departures.
    [InlineData("water", 100, 125)]
    [InlineData("argon", 65, 80)]
    public void AtPressure_TroutonExceptions_LieOutsideTheBand(string fluid, double low, double high)
    {
        var point = Solver(fluid).AtPressure(Atmosphere);

        AssertClose.InRange(low, high, point.EntropyOfVaporization, $"{fluid} entropy of vaporization at Tb, J/(mol K)");
    }

    // ---- (c) Clapeyron slope vs the solver's own Psat(T) ----

    public static TheoryData<string, CubicModelKind> SlopeCases() => new()
    {
        { "propane", CubicModelKind.PengRobinson },
        { "water", CubicModelKind.PengRobinson },
        { "ethanol", CubicModelKind.PengRobinson1978 },
        { "methane", CubicModelKind.SoaveRedlichKwong },
        { "r-134a", CubicModelKind.SoaveRedlichKwong },
        { "benzene", CubicModelKind.RedlichKwong },
        { "n-butane", CubicModelKind.VanDerWaals },
    };

    private static readonly double[] ReducedTemperatures = [0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.99];

    [Theory]
    [MemberData(nameof(SlopeCases))]
    public void Slope_EqualsFivePointDerivativeOfSaturationPressure(string fluid, CubicModelKind kind)
    {
        // Clapeyron (1834): dPsat/dT = Δh/(T·Δv). The 5-point stencil with h = 1e-4·T has
        // truncation h⁴·Psat⁽⁵⁾/30; Psat is close to exponential in 1/T, so relative to the slope
        // that is ≈ (1e-4·d ln Psat/d ln T)⁴/30 ≤ 1e-12 for d ln Psat/d ln T ≤ 20 (a classical
        // model's Psat(T) stays analytic up to Tc, so 0.99·Tc is no worse). Rounding is
        // 1.5·δ/(1e-4·d ln Psat/d ln T) with δ the relative accuracy of Psat (~1e-14: fugacity
        // residual ≤ 1e-12, typically 1e-15), i.e. ≤ 1e-10. 1e-7 keeps ample margin while any
        // error in Δh or Δv shows at O(1).
        var solver = Solver(fluid, kind);
        double tc = solver.CriticalTemperature;
        foreach (double tr in ReducedTemperatures)
        {
            double t = tr * tc;
            double h = 1e-4 * t;
            double P(double x) => solver.AtTemperature(x).Pressure;
            double fd = (P(t - 2 * h) - 8 * P(t - h) + 8 * P(t + h) - P(t + 2 * h)) / (12 * h);

            AssertClose.Relative(fd, solver.AtTemperature(t).Slope, 1e-7, $"{fluid} {kind} dPsat/dT at Tr = {tr}");
        }
    }

    // ---- (d) round trip T → Psat → Tsat ----

    [Theory]
    [MemberData(nameof(SlopeCases))]
    public void AtPressure_SaturationPressureOfT_ReturnsT(string fluid, CubicModelKind kind)
    {
        // Inverse functions. AtPressure iterates to 1e-13 in T/Tc on ln P, so 1e-10 relative
        // allows for the ~1e-14 noise in Psat divided by d ln Psat/d ln T (≥ 5).
        var solver = Solver(fluid, kind);
        double tc = solver.CriticalTemperature;
        foreach (double tr in ReducedTemperatures.Append(0.999))
        {
            double t = tr * tc;
            var forward = solver.AtTemperature(t);

            var back = solver.AtPressure(forward.Pressure);

            AssertClose.Relative(t, back.Temperature, 1e-10, $"{fluid} {kind} Tsat(Psat) at Tr = {tr}");
            Assert.Equal(CoexistenceMethod.TemperatureIteration, back.Report.Method);
            Assert.Equal(StopReason.Converged, back.Report.StopReason);
        }
    }

    // ---- (e) near-critical convergence for every fluid and model ----

    [Theory]
    [MemberData(nameof(Cases.EveryFluidAndModel), MemberType = typeof(Cases))]
    public void AtTemperature_OneMinus1e8OfTc_ConvergesToTwoDistinctPhases(string fluid, CubicModelKind kind)
    {
        var solver = Solver(fluid, kind);
        var model = (CubicModel)solver.Model;
        double tc = model.CriticalTemperature;
        double epsilon = 1e-8;

        var point = solver.AtTemperature(tc * (1 - epsilon));

        Assert.Equal(StopReason.Converged, point.Report.StopReason);
        Assert.False(point.IsCritical);
        Assert.True(point.Liquid.Density > point.Vapour.Density, $"rhoL {point.Liquid.Density} <= rhoV {point.Vapour.Density}");
        // The solver's fugacity tolerance (CoexistenceOptions default), and the same condition
        // evaluated independently through the Helmholtz energies (rounding level at 1e-12).
        Assert.True(point.Report.FugacityResidual < 1e-12, $"residual {point.Report.FugacityResidual}");
        AssertClose.Absolute(0, GibbsDifference(model, point), 1e-12, $"{fluid} {kind} (gL - gV)/RT");
        Assert.True(point.Liquid.PressureDensityDerivative > 0 && point.Vapour.PressureDensityDerivative > 0, "a phase is mechanically unstable");
        // Psat is Pc less (d ln P/d ln T ≈ 5–8)·1e-8 relative.
        AssertClose.Relative(model.CriticalPressure, point.Pressure, 1e-6, $"{fluid} {kind} Psat at 1 - 1e-8 of Tc");

        // Classical (mean-field) models have order-parameter exponent β = 1/2 (van der Waals
        // 1873; Landau theory; e.g. Stanley, Introduction to Phase Transitions and Critical
        // Phenomena (1971), from memory): (ρL − ρV)/√(1 − T/Tc) tends to a constant. Compared
        // with 1e-6 below Tc the ratio changes by O(1 − T/Tc) = O(1e-6) times an O(1) coefficient
        // (2e-6 at worst over the catalog, measured), and rounding in the near-critical densities
        // is smaller still: 2e-5. A route that converged on the wrong branch or stopped early
        // would miss by O(1).
        var farther = solver.AtTemperature(tc * (1 - 1e-6));
        double amplitudeNear = (point.Liquid.Density - point.Vapour.Density) / Math.Sqrt(epsilon);
        double amplitudeFar = (farther.Liquid.Density - farther.Vapour.Density) / Math.Sqrt(1e-6);
        AssertClose.Relative(amplitudeFar, amplitudeNear, 2e-5, $"{fluid} {kind} (rhoL - rhoV)/sqrt(1 - Tr)");
    }

    // ---- (f) from the lowest valid temperature up, every fluid and model ----

    [Theory]
    [MemberData(nameof(Cases.EveryFluidAndModel), MemberType = typeof(Cases))]
    public void AtTemperature_FromLowestValidTemperatureUp_ConvergesToStablePhases(string fluid, CubicModelKind kind)
    {
        var solver = Solver(fluid, kind);
        var model = (CubicModel)solver.Model;
        double tmin = solver.MinimumTemperature;
        double top = 0.999 * model.CriticalTemperature;
        double previous = 0;
        for (int i = 0; i < 20; i++)
        {
            double t = tmin + (top - tmin) * i / 19;

            var point = solver.AtTemperature(t);

            string where = $"{fluid} {kind} at {t} K (Tr = {t / model.CriticalTemperature:F4})";
            Assert.Equal(StopReason.Converged, point.Report.StopReason);
            AssertClose.Absolute(0, point.Liquid.LnFugacityCoefficient - point.Vapour.LnFugacityCoefficient, 1e-12, $"{where}: ln phiL - ln phiV");
            // Independently of ln Z: at low T the liquid's Z is ~1e-5 and its ln φ ≈ 10, so the
            // terms of (gL − gV)/RT are O(10) and cancel; 1e-12 is still ~100 ε of them.
            AssertClose.Absolute(0, GibbsDifference(model, point), 1e-12, $"{where}: (gL - gV)/RT");
            Assert.True(point.Liquid.PressureDensityDerivative > 0, $"{where}: liquid dP/drho = {point.Liquid.PressureDensityDerivative}");
            Assert.True(point.Vapour.PressureDensityDerivative > 0, $"{where}: vapour dP/drho = {point.Vapour.PressureDensityDerivative}");
            Assert.True(point.Liquid.Density > point.Vapour.Density, $"{where}: rhoL <= rhoV");
            Assert.True(point.Pressure > previous, $"{where}: Psat not increasing");
            previous = point.Pressure;
        }
    }

    // ---- (k) equal Gibbs energy of the two phases ----

    [Theory]
    [MemberData(nameof(SlopeCases))]
    public void AtTemperature_Phases_HaveEqualTemperaturePressureAndGibbsEnergy(string fluid, CubicModelKind kind)
    {
        // Coexistence (Gibbs): equal T, P and g. The ideal-gas parts g_ig(T, P) of the two
        // phases are equal at the same T and P, so gL = gV is g_r,L = g_r,V, i.e. ln φL = ln φV.
        var solver = Solver(fluid, kind);
        var model = (CubicModel)solver.Model;
        foreach (double tr in ReducedTemperatures)
        {
            double t = tr * model.CriticalTemperature;
            var point = solver.AtTemperature(t);
            double rt = R * t;

            Assert.Equal(t, point.Liquid.Temperature);
            Assert.Equal(t, point.Vapour.Temperature);
            Assert.Equal(point.Pressure, point.Liquid.Pressure);
            Assert.Equal(point.Pressure, point.Vapour.Pressure);
            AssertClose.Absolute(point.Vapour.ResidualGibbsEnergy, point.Liquid.ResidualGibbsEnergy, 1e-12 * rt, $"{fluid} {kind} g_r at Tr = {tr}");
            Assert.True(point.Report.FugacityResidual <= 1e-12);

            // Mechanical equilibrium from the model itself: P(T, ρ) at each density is Psat.
            // The liquid's P is a small difference of terms of size ρ·RT·(1 + |ρA_ρ|/RT), and
            // the density carries ~1e-15 relative error amplified by ρ·(∂P/∂ρ)_T; 1e-12 of
            // that scale bounds both.
            foreach (var phase in new[] { point.Liquid, point.Vapour })
            {
                var d = model.Residual(t, phase.Density);
                double scale = phase.Density * (rt + Math.Abs(phase.Density * d.DRho)) + phase.Density * d.PressureDRho;
                AssertClose.Absolute(point.Pressure, d.Pressure, 1e-12 * scale, $"{fluid} {kind} P(T, rho) at Tr = {tr}");
            }
        }
    }

    // ---- (g) invalid input ----

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(0.0)]
    [InlineData(-100.0)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void AtTemperature_NotAFinitePositiveNumber_ThrowsNamingTemperature(double t)
    {
        var ex = Assert.Throws<InvalidInputException>(() => Solver("propane").AtTemperature(t));

        Assert.Equal("temperature", ex.Field);
        Assert.Equal(t, ex.Value);
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(1.0 + 1e-12)]
    [InlineData(1.5)]
    public void AtTemperature_AtOrAboveTc_ThrowsNamingTemperature(double reduced)
    {
        var solver = Solver("propane");
        double t = reduced * solver.CriticalTemperature;

        var ex = Assert.Throws<InvalidInputException>(() => solver.AtTemperature(t));

        Assert.Equal("temperature", ex.Field);
        Assert.Contains("critical temperature", ex.Message, StringComparison.Ordinal);
        Assert.False(solver.TryAtTemperature(t, out var point));
        Assert.Null(point);
    }

    [Fact]
    public void AtTemperature_BelowLowestValidTemperature_ThrowsNamingTemperature()
    {
        var solver = Solver("water");
        double t = solver.MinimumTemperature * (1 - 1e-9);

        var ex = Assert.Throws<InvalidInputException>(() => solver.AtTemperature(t));

        Assert.Equal("temperature", ex.Field);
        // Water's lowest valid temperature is its triple point (273.16 K, IAPWS-95, from memory):
        // the message names it and the solid.
        Assert.Contains("below the triple point 273.16 K of water", ex.Message, StringComparison.Ordinal);
        Assert.Contains("solid", ex.Message, StringComparison.Ordinal);
        // A solver built from a model alone knows no triple point and names its lowest temperature.
        var bare = new CoexistenceSolver(solver.Model, solver.MinimumTemperature);
        Assert.Contains("lowest valid temperature", Assert.Throws<InvalidInputException>(() => bare.AtTemperature(t)).Message, StringComparison.Ordinal);
        // Exactly at the limit is valid.
        Assert.True(solver.TryAtTemperature(solver.MinimumTemperature, out var point));
        Assert.NotNull(point);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(0.0)]
    [InlineData(-101325.0)]
    [InlineData(double.PositiveInfinity)]
    public void AtPressure_NotAFinitePositiveNumber_ThrowsNamingPressure(double p)
    {
        var ex = Assert.Throws<InvalidInputException>(() => Solver("propane").AtPressure(p));

        Assert.Equal("pressure", ex.Field);
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    public void AtPressure_AtOrAbovePc_ThrowsNamingPressure(double reduced)
    {
        var solver = Solver("propane");
        double p = reduced * solver.CriticalPressure;

        var ex = Assert.Throws<InvalidInputException>(() => solver.AtPressure(p));

        Assert.Equal("pressure", ex.Field);
        Assert.Contains("critical pressure", ex.Message, StringComparison.Ordinal);
        Assert.False(solver.TryAtPressure(p, out var point));
        Assert.Null(point);
    }

    [Fact]
    public void AtPressure_BelowSaturationPressureAtLowestTemperature_ThrowsNamingPressure()
    {
        // A solver built from the model alone (no fluid, so no triple-point pressure to refuse first).
        var solver = new CoexistenceSolver(Solver("water").Model, Solver("water").MinimumTemperature);
        double bottom = solver.AtTemperature(solver.MinimumTemperature).Pressure;

        var ex = Assert.Throws<InvalidInputException>(() => solver.AtPressure(0.5 * bottom));

        Assert.Equal("pressure", ex.Field);
        Assert.Contains("lowest valid temperature", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    public void Constructor_InvalidMinimumTemperature_ThrowsNamingIt(double tmin)
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, 369.89, 4.2512e6, 0.152);

        var ex = Assert.Throws<InvalidInputException>(() => new CoexistenceSolver(model, tmin));

        Assert.Equal("minimum temperature", ex.Field);
    }

    [Fact]
    public void Constructor_MinimumTemperatureAtTc_ThrowsNamingIt()
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, 369.89, 4.2512e6, 0.152);

        var ex = Assert.Throws<InvalidInputException>(() => new CoexistenceSolver(model, 369.89));

        Assert.Equal("minimum temperature", ex.Field);
    }

    [Theory]
    // The lowest valid temperature is the triple point when known (not below 0.1·Tc), else 0.3·Tc.
    // Triple points: Wagner & Pruß (2002) for water, 273.16 K; Lemmon et al. (2009) for
    // propane, 85.525 K, below 0.3·369.89 K, which was the floor before (catalog values, from memory).
    // Helium-4 has no triple point (catalog file), so 0.3·Tc with McCarty & Arp's Tc 5.1953 K.
    [InlineData("water", 273.16)]
    [InlineData("propane", 85.525)]
    [InlineData("helium", 0.3 * 5.1953)]
    public void LowestValidTemperature_IsTriplePointOrThreeTenthsOfTc(string fluid, double expected)
    {
        AssertClose.Relative(expected, CoexistenceSolver.LowestValidTemperature(FluidCatalog.Embedded.Find(fluid)), 1e-15, fluid);
    }

    // ---- (h) the critical point ----

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void CriticalPoint_IsTheInputCriticalStateWithNoJumps(CubicModelKind kind)
    {
        foreach (string fluid in new[] { "propane", "water", "ethanol" })
        {
            var solver = Solver(fluid, kind);
            var model = (CubicModel)solver.Model;

            var point = solver.CriticalPoint();

            Assert.True(point.IsCritical);
            Assert.Equal(StopReason.CriticalPoint, point.Report.StopReason);
            Assert.Equal(CoexistenceMethod.CriticalState, point.Report.Method);
            Assert.Equal(model.CriticalTemperature, point.Temperature);
            // P(Tc, ρc) of the stored constants: rounding in Ωa, Ωb and the sum of O(Pc/Zc) terms.
            AssertClose.Relative(model.CriticalPressure, point.Pressure, 1e-12, $"{fluid} {kind} Pc");
            Assert.Equal(point.Liquid.Density, point.Vapour.Density);
            Assert.Equal(model.CriticalDensity, point.Liquid.Density);
            Assert.Equal(0.0, point.EnthalpyOfVaporization);
            Assert.Equal(0.0, point.EntropyOfVaporization);
            Assert.Equal(0.0, point.VolumeChange);
            Assert.Equal(0.0, point.InternalEnergyChange);
            Assert.Equal(0.0, point.CompressibilityChange);
            AssertClose.Relative(model.Form.CriticalCompressibility, point.Liquid.CompressibilityFactor, 1e-12, $"{fluid} {kind} Zc");
        }
    }

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void CriticalPoint_Slope_IsTheLimitOfTheClapeyronSlope(CubicModelKind kind)
    {
        // For an analytic (classical) model, Δh/(T·Δv) → (∂P/∂T)_ρ at ρc as T → Tc (L'Hôpital on
        // the Clapeyron equation with ρL, ρV → ρc; see CoexistencePoint remarks). The approach is
        // linear in 1 − T/Tc, so at 1e-6 below Tc the slopes agree to ~1e-5: tolerance 1e-4.
        var solver = Solver("propane", kind);
        double tc = solver.CriticalTemperature;

        var critical = solver.CriticalPoint();
        var below = solver.AtTemperature(tc * (1 - 1e-6));

        Assert.True(critical.Slope > 0);
        AssertClose.Relative(critical.Slope, below.Slope, 1e-4, $"{kind} slope at Tc");
        AssertClose.Relative(1 / critical.Slope, critical.InverseSlope, 1e-15, "inverse slope");
    }
}
