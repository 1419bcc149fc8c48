using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class CubicModelTests
{
    private const double R = Constants.GasConstant;

    /// <summary>Cases for the critical-point checks: every model with propane; water and the
    /// two alcohols put ω above 0.491, where the 1978 Peng–Robinson κ(ω) differs from 1976.</summary>
    public static TheoryData<string, CubicModelKind> CriticalCases()
    {
        var data = new TheoryData<string, CubicModelKind>();
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            data.Add("propane", kind);
            data.Add("water", kind);
        }

        data.Add("methanol", CubicModelKind.PengRobinson1978);
        data.Add("ethanol", CubicModelKind.PengRobinson1978);
        data.Add("nitrogen", CubicModelKind.SoaveRedlichKwong);
        return data;
    }

    /// <summary>The density of the inflection of the isotherm at T, the root of (∂²P/∂ρ²)_T in
    /// (0, 1/b): there (∂P/∂ρ)_T has its minimum over ρ. Found by a grid scan for the first sign
    /// change and MathNet's Brent, without the model's stored critical constants.</summary>
    private static double InflectionDensity(CubicModel model, double temperature)
    {
        // In the packing fraction x = bρ and scaled to O(1) by RT/(1/b)²: MathNet's Brent also
        // stops when |f| falls below the accuracy, so the function must not be tiny in SI units.
        double rhoMax = model.MaximumDensity;
        double scale = rhoMax * rhoMax / (Constants.GasConstant * temperature);
        double Curvature(double x) => model.Residual(temperature, x * rhoMax).PressureDRhoRho * scale;
        const int cells = 400;
        for (int i = 1; i < cells; i++)
        {
            double lo = (double)i / cells;
            double hi = (double)(i + 1) / cells;
            if (Curvature(lo) < 0 && Curvature(hi) >= 0)
            {
                return Brent.FindRoot(Curvature, lo, hi, 1e-16, 200) * rhoMax;
            }
        }

        throw new InvalidOperationException($"no inflection of the isotherm at {temperature} K");
    }

    /// <summary>The model's critical point located numerically from the critical conditions
    /// (∂P/∂ρ)_T = (∂²P/∂ρ²)_T = 0: the temperature at which the minimum over ρ of (∂P/∂ρ)_T is
    /// zero. Brent brackets ±20 % around the input Tc, so a wrong constant would be found, not
    /// assumed.</summary>
    private static (double Temperature, double Density, double Pressure) LocateCriticalPoint(CubicModel model)
    {
        double guess = model.CriticalTemperature;
        double MinimumSlope(double t) => model.Residual(t, InflectionDensity(model, t)).PressureDRho;
        double tc = Brent.FindRoot(MinimumSlope, 0.8 * guess, 1.2 * guess, 1e-15 * guess, 200);
        double rhoc = InflectionDensity(model, tc);
        return (tc, rhoc, model.Pressure(tc, rhoc));
    }

    [Theory]
    [MemberData(nameof(CriticalCases))]
    public void Residual_NumericalCriticalPoint_ReproducesInputTcAndPc(string fluidName, CubicModelKind kind)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(fluidName);
        var model = CubicModel.For(kind, fluid);

        var (tc, rhoc, pc) = LocateCriticalPoint(model);

        // 1e-12: the minimum slope is linear in T − Tc with an O(R) coefficient and has
        // rounding noise of a few ε·RT, so Tc is found to ~1e-15 relative; P then carries
        // (∂ln P/∂ln T)_ρ ≈ 4–8 times that, plus the rounding of P itself.
        AssertClose.Relative(fluid.CriticalTemperature.Value, tc, 1e-12, $"{fluidName} {kind} Tc");
        AssertClose.Relative(fluid.CriticalPressure.Value, pc, 1e-12, $"{fluidName} {kind} Pc");
        // The stored critical density and Zc = Pc/(ρc·R·Tc) of the form agree with the located
        // ones; the inflection density is a simple root found to 1e-15 of 1/b.
        AssertClose.Relative(model.CriticalDensity, rhoc, 1e-12, $"{fluidName} {kind} critical density");
        AssertClose.Relative(model.Form.CriticalCompressibility, pc / (rhoc * R * tc), 1e-12, $"{fluidName} {kind} Zc");
    }

    [Theory]
    [MemberData(nameof(CriticalCases))]
    public void Residual_AtStoredCriticalState_PressureIsPcAndBothDerivativesVanish(string fluidName, CubicModelKind kind)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(fluidName);
        var model = CubicModel.For(kind, fluid);
        double tc = model.CriticalTemperature;
        double rhoc = model.CriticalDensity;

        var d = model.Residual(tc, rhoc);

        AssertClose.Relative(fluid.CriticalPressure.Value, d.Pressure, 1e-12, $"{fluidName} {kind} P(Tc, rho_c)");
        // Scaled to be dimensionless by RT (the size of each term in (∂P/∂ρ)_T) and ρc: the
        // sums cancel O(1) terms, so 1e-12 is ~100 ε.
        AssertClose.Absolute(0, d.PressureDRho / (R * tc), 1e-12, $"{fluidName} {kind} (dP/drho)/RT at the critical point");
        AssertClose.Absolute(0, d.PressureDRhoRho * rhoc / (R * tc), 1e-12, $"{fluidName} {kind} rho (d2P/drho2)/RT at the critical point");
    }

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void Residual_DilutePropaneVapour_ApproachesIdealGas(CubicModelKind kind)
    {
        // Z = 1 + B·ρ + … : at ρ = 1e-6 mol/m³ Z − 1 is of order B·ρ ≈ 1e-9 (B ~ −1e-3 m³/mol for
        // propane at 300 K), so Z equals 1 within 1e-8.
        Fluid propane = FluidCatalog.Embedded.Find("propane");
        var model = CubicModel.For(kind, propane);
        double rho = 1e-6;

        double z = model.Pressure(300, rho) / (rho * R * 300);

        AssertClose.Absolute(1, z, 1e-8, $"{kind} Z of a dilute gas");
    }

    [Theory]
    [InlineData(double.NaN, 4.2512e6, 0.152, "critical temperature")]
    [InlineData(0.0, 4.2512e6, 0.152, "critical temperature")]
    [InlineData(-369.89, 4.2512e6, 0.152, "critical temperature")]
    [InlineData(double.PositiveInfinity, 4.2512e6, 0.152, "critical temperature")]
    [InlineData(369.89, double.NaN, 0.152, "critical pressure")]
    [InlineData(369.89, 0.0, 0.152, "critical pressure")]
    [InlineData(369.89, -1.0, 0.152, "critical pressure")]
    [InlineData(369.89, 4.2512e6, double.NaN, "acentric factor")]
    [InlineData(369.89, 4.2512e6, double.NegativeInfinity, "acentric factor")]
    public void For_InvalidConstant_ThrowsNamingTheField(double tc, double pc, double omega, string field)
    {
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            var ex = Assert.Throws<InvalidInputException>(() => CubicModel.For(kind, tc, pc, omega));

            Assert.Equal(field, ex.Field);
            Assert.Contains(field, ex.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void For_ParametersFollowFromTheForm()
    {
        // b = Ωb·R·Tc/Pc and a = Ωa·(R·Tc)²/Pc (Peng & Robinson 1976; from memory), checked
        // against the form's constants: pure arithmetic, so 1e-15.
        var model = CubicModel.For(CubicModelKind.PengRobinson, 369.89, 4.2512e6, 0.152);

        AssertClose.Relative(CubicForm.PengRobinson.OmegaB * R * 369.89 / 4.2512e6, model.CovolumeB, 1e-15, "b");
        AssertClose.Relative(CubicForm.PengRobinson.OmegaA * R * R * 369.89 * 369.89 / 4.2512e6, model.AttractionA, 1e-15, "a");
    }
}
