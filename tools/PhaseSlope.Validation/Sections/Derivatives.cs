using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.Derivatives;
using PhaseSlope.Core.Tests.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Validation.Sections;

/// <summary>First derivatives reduced to measurable quantities, and the exact second derivatives
/// (tests/PhaseSlope.Core.Tests/Derivatives/JacobianReductionTests, Properties/SecondDerivativesTests,
/// and the measured-input checks of Cli.Tests/Commands/DeriveExplainTests).</summary>
internal static class Derivatives
{
    private static readonly StateVariable[] Variables = Enum.GetValues<StateVariable>();

    public static void Write(Page page)
    {
        page.Heading(2, "Derivatives in measurable quantities (`derive`)");
        page.Paragraph("""
            Every first derivative (∂X/∂Y)_Z of T, P, V, S, U, H, A, G (8 × 7 × 6 = 336) is reduced symbolically to
            T, P, v, s, α, κ_T and c_p (Jacobian reduction); fed a state's values, the expression must give what
            the model's Jacobian in (T, V) gives. Peng–Robinson; the states are the tests' (propane gas at 300 K and
            0.1 MPa, compressed liquid at 250 K and 2 MPa, water liquid at 400 K and 1 MPa, carbon dioxide
            supercritical at 320 K and 9 MPa).
            """);
        var rows = new List<string[]>();
        AllFirstDerivatives(rows);
        Identities(rows);
        InternalPressure(rows);
        SecondOrder(rows);
        page.Table(["check", "reference (source)", "result", "held to", "where"], rows);
    }

    private static IEnumerable<(string Fluid, double T, double P)> States(IEnumerable<object[]> data)
        => data.Select(row => ((string)row[0], (double)row[1], (double)row[2]));

    private static void AllFirstDerivatives(List<string[]> rows)
    {
        int count = 0, states = 0;
        double worst = 0, worstRatio = 0;
        foreach (var (fluid, t, p) in States(JacobianReductionTests.States))
        {
            states++;
            foreach (var c in JacobianReductionTests.Compare(fluid, t, p))
            {
                worst = Math.Max(worst, c.Deviation);
                worstRatio = Math.Max(worstRatio, c.Deviation / c.Allowed);
                count++;
            }
        }

        rows.Add([$"all 336 first derivatives through their reduced expression, at {states} states ({Fmt.N(count)} values)", "the model's Jacobian in (T, V) (`PartialDerivatives`, other formulas)",
            $"worst relative difference {Fmt.Below(worst, 4.5e-13)}; worst against its own allowance {Fmt.Below(worstRatio)} of it",
            "1e-13 × (the expression's cancellation factor + 20) each, and the worst below 1e-12", "`Derivatives/JacobianReductionTests`"]);
    }

    private static void Identities(List<string[]> rows)
    {
        static string Name(StateVariable x, StateVariable y, StateVariable z) => $"(∂{x}/∂{y})_{z}";
        int equal = 0;
        var listed = new List<string>();
        foreach (var (x, y, z, textbook) in References.ClassicIdentities)
        {
            var derived = JacobianReduction.Reduce(x, y, z);
            bool same = derived.Text == ExpressionParser.Parse(textbook).Text;
            equal += same ? 1 : 0;
            listed.Add($"{Name(x, y, z)} = `{derived.Text}`{(same ? "" : " (differs from the textbook form)")}");
        }

        rows.Add([$"classic identities, derived by the reduction and brought to canonical form: {string.Join("; ", listed)}",
            $"the textbook forms ({References.Callen}), parsed to the same canonical form",
            $"{equal} of {References.ClassicIdentities.Length} canonical texts equal", "equal texts (equal rational functions)", "`Derivatives/JacobianReductionTests`"]);

        var cp = JacobianReduction.Reduce(H, T, P);
        var cv = JacobianReduction.Reduce(U, T, V);
        var difference = ExpressionParser.Parse($"({cp.Text}) - ({cv.Text})");
        string expected = ExpressionParser.Parse("T*v*alpha^2/kappa_T").Text;
        rows.Add([$"c_p − c_v from the two reduced expressions (`{cp.Text}`) − (`{cv.Text}`)", $"`{expected}` (Callen 1985, eq. 7.48; from memory)",
            $"`{difference.Text}`: {(difference.Text == expected ? "equal" : "differs")}", "equal canonical texts", "`Derivatives/JacobianReductionTests`"]);
    }

    private static void InternalPressure(List<string[]> rows)
    {
        const double T0 = 298.15, P0 = 101325;
        foreach (var (name, alpha, kappa, low, high) in new[] { ("water", References.WaterAlpha, References.WaterKappa, 5.0, 15.0), ("toluene", References.TolueneAlpha, References.TolueneKappa, 0.6, 0.9) })
        {
            var values = new MeasuredValues()
                .Set(MeasurableQuantity.Temperature, T0).Set(MeasurableQuantity.Pressure, P0)
                .Set(MeasurableQuantity.Expansivity, alpha).Set(MeasurableQuantity.Compressibility, kappa);
            double measured = values.Evaluate(JacobianReduction.Reduce(U, V, T)).Value;
            var engine = PropertyModel.For(FluidCatalog.Embedded.Find(name), CubicModelKind.PengRobinson);
            var state = engine.AtPressure(T0, P0);
            double model = PartialDerivatives.Of(state, U, V, T);
            string handbook = name == "water"
                ? $"; against the handbook internal pressure {Fmt.F(References.WaterDackInternalPressure / 1e6, 1)} MPa (Dack, Chem. Soc. Rev. 4 (1975) 211; from memory): {Fmt.Pct(measured / References.WaterDackInternalPressure - 1, 1)}, held to 10 %"
                : " (no handbook internal pressure is recalled with confidence; the test checks the hand formula)";
            rows.Add([$"internal pressure (∂U/∂V)_T = T·α/κ_T − P of liquid {name} at 25 °C, 1 atm, from measured α = {alpha.ToString("0.###e0", System.Globalization.CultureInfo.InvariantCulture)} 1/K, κ_T = {kappa.ToString("0.###e0", System.Globalization.CultureInfo.InvariantCulture)} 1/Pa",
                $"α, κ_T: CRC Handbook; from memory",
                $"measured route {Fmt.F(measured / 1e6, 1)} MPa{handbook}. The model (Peng–Robinson, its own α = {state.IsobaricExpansivity!.Value.ToString("0.00e0", System.Globalization.CultureInfo.InvariantCulture)} 1/K, κ_T = {state.IsothermalCompressibility!.Value.ToString("0.00e0", System.Globalization.CultureInfo.InvariantCulture)} 1/Pa): {Fmt.F(model / 1e6, 1)} MPa, {Fmt.F(model / measured, 2)} × the measured route",
                $"hand formula 1e-14; model / measured within {low}–{high} (documents the cubic's liquid error, not a target)", "`Commands/DeriveExplainTests` (Cli.Tests)"]);
        }
    }

    private static void SecondOrder(List<string[]> rows)
    {
        double worstTT = 0, worstTRho = 0, worstCp = 0, worstCpForm = 0, worstAlpha = 0, worstCv = 0, worstW = 0, worstJt = 0;
        int states = 0;
        foreach (var (fluid, t, p) in States(SecondDerivativesTests.States))
        {
            var engine = Engines.For(fluid, CubicModelKind.PengRobinson);
            var model = (CubicModel)engine.Model;
            var state = engine.AtPressure(t, p);
            double rho = state.Density;
            var (dTTRho, dTRhoRho) = model.MixedThirdDerivatives(t, rho);
            worstTT = Math.Max(worstTT, Rel(FiniteDifference.Central5(x => model.Residual(x, rho).DTRho, t, 1e-3 * t), dTTRho));
            worstTRho = Math.Max(worstTRho, Rel(FiniteDifference.Central5(x => model.Residual(t, x).DTRho, rho, 1e-3 * rho), dTRhoRho));

            double exact = SecondDerivatives.IsobaricHeatCapacityByPressure(engine.Model, state);
            worstCp = Math.Max(worstCp, Rel(FiniteDifference.Central5(x => engine.AtPressure(t, x).IsobaricHeatCapacity!.Value, p, 1e-3 * p), exact));
            double alpha = state.IsobaricExpansivity!.Value;
            double alphaSlope = SecondDerivatives.ExpansivityByTemperature(engine.Model, state);
            worstCpForm = Math.Max(worstCpForm, Rel(-t * state.MolarVolume * (alpha * alpha + alphaSlope), exact));
            worstAlpha = Math.Max(worstAlpha, Rel(FiniteDifference.Central5(x => engine.AtPressure(x, p).IsobaricExpansivity!.Value, t, 1e-4 * t), alphaSlope));

            double cvExact = SecondDerivatives.IsochoricHeatCapacityByVolume(engine.Model, state);
            double v = state.MolarVolume;
            worstCv = Math.Max(worstCv, Rel(FiniteDifference.Central5(x => engine.AtDensity(t, 1 / x).IsochoricHeatCapacity!.Value, v, 1e-4 * v), cvExact));

            var values = MeasuredValues.FromState(state);
            double mw2 = values.Evaluate(JacobianReduction.MolarMassTimesSoundSpeedSquared()).Value;
            worstW = Math.Max(worstW, Rel(state.SpeedOfSound!.Value, Math.Sqrt(mw2 / state.MolarMass!.Value)));
            worstJt = Math.Max(worstJt, Rel(PartialDerivatives.Of(state, T, P, H), values.Evaluate(JacobianReduction.Reduce(T, P, H)).Value));
            states++;
        }

        string at = $"the {states} states above";
        rows.Add([$"mixed third derivatives ∂³A_r/∂T²∂ρ and ∂³A_r/∂T∂ρ² of the cubic, at {at}", "five-point central differences of the model's own A_Tρ (steps 1e-3·T, 1e-3·ρ)",
            $"worst relative difference {Fmt.Below(worstTT)} (in T), {Fmt.Below(worstTRho)} (in ρ)", "1e-7 (differencing rounding up to about 1e-9)", "`Properties/SecondDerivativesTests`"]);
        rows.Add([$"(∂c_p/∂P)_T exact, at {at}", "five-point central difference of the model's c_p(T, P) (step 1e-3·P); and the textbook form −T·v·(α² + (∂α/∂T)_P)",
            $"worst {Fmt.Below(worstCp)} against the difference; {Fmt.Below(worstCpForm)} against the textbook form; (∂α/∂T)_P against its difference {Fmt.Below(worstAlpha)}", "1e-6; 1e-12; 1e-6", "`Properties/SecondDerivativesTests`"]);
        rows.Add([$"(∂c_v/∂v)_T = T·(∂²P/∂T²)_v exact, at {at}", "five-point central difference of the model's c_v(T, v) (step 1e-4·v)",
            $"worst {Fmt.Below(worstCv)}", "1e-6", "`Properties/SecondDerivativesTests`"]);
        rows.Add([$"speed of sound w = √(v·c_p/(κ_T·c_p − T·v·α²)/M) and μ_JT = `{JacobianReduction.Reduce(T, P, H).Text}` from the model's own α, κ_T, c_p, at {at}", "the model's speed of sound and Joule–Thomson coefficient (other formulas, in (T, V))",
            $"worst {Fmt.Below(worstW, 1.5e-16)} (w), {Fmt.Below(worstJt, 1.5e-16)} (μ_JT)", "1e-13", "`Properties/SecondDerivativesTests`"]);
    }

    private static double Rel(double expected, double actual) => Math.Abs(actual - expected) / Math.Abs(expected);
}
