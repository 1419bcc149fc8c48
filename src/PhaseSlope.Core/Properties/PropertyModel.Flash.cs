using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>Flashes: the equilibrium state from any two of T, P, ρ, h, s, u and the quality.</summary>
public sealed partial class PropertyModel
{
    /// <summary>Relative tolerance to which a flash meets its specification: a specified h or u
    /// within 1e-12 of the larger of |value| and RT, s within 1e-12 of the larger of |s| and R, T,
    /// P and ρ within 1e-12 relative. 1e-12 leaves two orders of margin on the 1e-10 promised in
    /// the documentation; the coexistence solver underneath is converged to about 1e-12 itself.</summary>
    public const double FlashTolerance = 1e-12;

    /// <summary>Grid points per branch when a flash must look for every root of a function that
    /// need not be monotone (h at fixed T, for instance, falls and then rises with density where
    /// the Joule–Thomson coefficient changes sign); each sign change is then refined by Brent's
    /// method. Twenty-four points per decade-spanning branch separate roots that differ by more
    /// than a few per cent in density; closer pairs are a turning point of the function, where
    /// the specification fixes the state poorly anyway.</summary>
    private const int ScanPoints = 24;

    /// <summary>How far outside 0…1 a lever-rule quality may fall and still be the saturated phase
    /// itself: 1e-10 of the jump across the dome, a hundred times the coexistence solver's
    /// 1e-12 precision, which is how far the same saturated state re-solved at P instead of at T
    /// moves.</summary>
    private const double SaturationRounding = 1e-10;

    /// <summary>Newton steps along an isobar before the iteration only bisects its bracket (from
    /// there 50 bisections shrink any bracket below 1e-13 of T); Newton needs 3–6 steps.</summary>
    private const int NewtonIterations = 30;

    private double? _bottomPressure;

    /// <summary>The lowest temperature a flash searches: the fluid's lowest valid temperature.</summary>
    public double FlashMinimumTemperature => Solver.MinimumTemperature;

    /// <summary>The highest temperature a flash searches, K: the upper end of the ideal-gas heat
    /// capacity's stated range when the fluid gives cp° (beyond it h, s and u are extrapolated
    /// and need not stay monotone in T), otherwise ten times the critical temperature.</summary>
    public double FlashMaximumTemperature => _heatCapacity?.MaximumTemperature ?? 10 * Solver.CriticalTemperature;

    /// <summary>The equilibrium state fixed by two properties, in either order: a single phase
    /// (named compressed liquid, superheated vapour, gas or supercritical fluid, with the
    /// saturation temperature at its pressure) or, on and inside the dome, the saturated phases
    /// and the quality.</summary>
    /// <param name="first">One property.</param>
    /// <param name="firstValue">Its value, molar SI (h, s, u on this engine's reference).</param>
    /// <param name="second">Another property.</param>
    /// <param name="secondValue">Its value.</param>
    /// <remarks>
    /// <para>Methods. With T: at T &lt; Tc the saturated phases at T decide whether the state is
    /// two-phase (lever rule: x from v, h, s or u); otherwise the single phase is the root in
    /// density on the liquid branch (above ρL), the vapour branch (below ρV) or, above Tc, the one
    /// fluid branch, found by a scan and Brent's method so that a second root is noticed.
    /// With P: below Pc the saturated phases at P decide two-phase; otherwise a safeguarded
    /// Newton iteration in T along the isobar (exact (∂X/∂T)_P from the Jacobian engine, bisection
    /// whenever a step would leave the bracket) on the liquid side (up to Tsat), the vapour side
    /// (from Tsat) or, at or above Pc, the whole range. Two properties without T or P: Brent's
    /// method in T on the state fixed by T and one of them (ρ, s or the quality), whose value of
    /// the other is monotone in T for (ρ, h/s/u/P), (h, s) and (s, u) and scanned for several roots
    /// with the quality.</para>
    /// <para>The search covers <see cref="FlashMinimumTemperature"/> to
    /// <see cref="FlashMaximumTemperature"/>, densities from 1e-12 of the saturated vapour (or
    /// critical) density up to 1 − 1e-6 of the model's limit 1/b; a specification outside what
    /// the model reaches there is refused with the range it does reach.</para>
    /// </remarks>
    /// <exception cref="InvalidInputException">The same property twice; a value out of its range
    /// (T, P, ρ not positive, quality outside 0…1); h and u together (for a near-ideal gas both
    /// depend on T alone, so they do not fix a state); a quality at or above the critical
    /// temperature or pressure; a specification no state reaches, or that two states meet.</exception>
    /// <exception cref="FluidDataException">h, s or u given for a fluid without cp°.</exception>
    public FluidState Flash(StateProperty first, double firstValue, StateProperty second, double secondValue)
    {
        if (first == second)
        {
            throw new InvalidInputException(Field(first), firstValue, $"the {Name(first)} was given twice: a state needs two different properties");
        }

        CheckValue(first, firstValue);
        CheckValue(second, secondValue);
        if (second < first)
        {
            (first, firstValue, second, secondValue) = (second, secondValue, first, firstValue);
        }

        foreach (var p in new[] { first, second })
        {
            if (IsCaloric(p))
            {
                RequireIdealGas($"a state given by its {Name(p)}");
            }
        }

        return (first, second) switch
        {
            (StateProperty.Temperature, _) => AtTemperatureWith(firstValue, second, secondValue),
            (StateProperty.Pressure, _) => AtPressureWith(firstValue, second, secondValue),
            (StateProperty.Enthalpy, StateProperty.InternalEnergy) => throw new InvalidInputException("internal energy", secondValue,
                "enthalpy and internal energy together do not fix a state: for a near-ideal gas both depend on the temperature alone; give T, P, the density, the entropy or the quality with one of them"),
            (_, StateProperty.Quality) => AlongDome(first, firstValue, secondValue),
            (StateProperty.Density, _) => OverTemperature(t => AtTemperatureWith(t, StateProperty.Density, firstValue), second, secondValue,
                FlashMinimumTemperature, FlashMaximumTemperature, $"density {Preconditions.Format(firstValue)} mol/m3"),
            (StateProperty.Enthalpy, StateProperty.Entropy) => OverTemperature(t => AtTemperatureWith(t, StateProperty.Entropy, secondValue), first, firstValue,
                FlashMinimumTemperature, FlashMaximumTemperature, $"entropy {Preconditions.Format(secondValue)} J/(mol K)"),
            _ => OverTemperature(t => AtTemperatureWith(t, StateProperty.Entropy, firstValue), second, secondValue,
                FlashMinimumTemperature, FlashMaximumTemperature, $"entropy {Preconditions.Format(firstValue)} J/(mol K)"),
        };
    }

    /// <summary>The state at temperature and pressure (<see cref="AtPressure"/>) described as a
    /// <see cref="FluidState"/>: its region and the saturation temperature at its pressure.</summary>
    public FluidState Describe(ThermodynamicState state)
    {
        ArgumentNullException.ThrowIfNull(state);
        return Single(state, SaturationTemperatureAt(state.Pressure));
    }

    private static bool IsCaloric(StateProperty p) => p is StateProperty.Enthalpy or StateProperty.Entropy or StateProperty.InternalEnergy;

    private static string Name(StateProperty p) => p switch
    {
        StateProperty.InternalEnergy => "internal energy",
        _ => p.ToString().ToLowerInvariant(),
    };

    private static string Field(StateProperty p) => Name(p);

    /// <summary>A property's value with its molar SI unit, for messages ("enthalpy 48641.22 J/mol").</summary>
    private static string Show(StateProperty p, double value) => $"{Name(p)} {Preconditions.Format(value)}{Unit(p)}";

    private static string Unit(StateProperty p) => p switch
    {
        StateProperty.Temperature => " K",
        StateProperty.Pressure => " Pa",
        StateProperty.Density => " mol/m3",
        StateProperty.Enthalpy or StateProperty.InternalEnergy => " J/mol",
        StateProperty.Entropy => " J/(mol K)",
        _ => "",
    };

    private static void CheckValue(StateProperty p, double value)
    {
        Preconditions.Finite(value, Field(p));
        if (p is StateProperty.Temperature or StateProperty.Pressure or StateProperty.Density)
        {
            Preconditions.Positive(value, Field(p));
        }

        if (p == StateProperty.Quality && (value < 0 || value > 1))
        {
            throw new InvalidInputException("quality", value, $"quality {Preconditions.Format(value)} is outside 0 to 1 (the vapour fraction of a liquid-vapour mixture)");
        }
    }

    /// <summary>The saturation temperature at P, or null at or above Pc and below the saturation
    /// pressure at the lowest valid temperature or the fluid's sourced triple-point pressure.</summary>
    private double? SaturationTemperatureAt(double pressure)
        => Coexists(pressure) ? Solver.AtPressure(pressure).Temperature : null;

    /// <summary>Whether the model has liquid–vapour coexistence at P within the fluid's data: below
    /// Pc, at or above the saturation pressure at the lowest valid temperature and at or above the
    /// sourced triple-point pressure (the 1e-12 is the solver's own rounding allowance).</summary>
    private bool Coexists(double pressure)
        => pressure < Solver.CriticalPressure && pressure >= BottomPressure
           && !(Solver.TriplePoint?.Pressure is double pt && pressure < pt * (1 - 1e-12));

    /// <summary>The saturation pressure at the lowest valid temperature (solved once).</summary>
    private double BottomPressure => _bottomPressure ??= Solver.AtTemperature(Solver.MinimumTemperature).Pressure;

    /// <exception cref="InvalidInputException">The fluid's own data place the state in the solid
    /// region, or rule out the liquid the model gives (<see cref="Solids.SolidRegion"/>).</exception>
    private FluidState Single(ThermodynamicState state, double? saturationTemperature)
    {
        if (_solid.Refusal(state.Temperature, state.Pressure, state.Phase, state.Metastable) is string refusal)
        {
            throw new InvalidInputException("state", state.Temperature, refusal);
        }

        double tc = Solver.CriticalTemperature;
        var region = state.Critical ? FluidRegion.CriticalPoint
            : state.Temperature >= tc ? (state.Pressure >= Solver.CriticalPressure ? FluidRegion.SupercriticalFluid : FluidRegion.Gas)
            : state.Phase == PhaseLabel.Vapour ? (state.Metastable ? FluidRegion.MetastableVapour : FluidRegion.SuperheatedVapour)
            : state.Metastable ? FluidRegion.MetastableLiquid : FluidRegion.CompressedLiquid;
        return new FluidState
        {
            Region = region,
            Temperature = state.Temperature,
            Pressure = state.Pressure,
            Density = state.Density,
            MolarMass = MolarMass,
            Enthalpy = state.Enthalpy,
            Entropy = state.Entropy,
            InternalEnergy = state.InternalEnergy,
            Single = state,
            SaturationTemperature = region == FluidRegion.CriticalPoint ? null : saturationTemperature,
        };
    }

    /// <summary>The mixture of quality <paramref name="quality"/> at a coexistence point.</summary>
    /// <exception cref="InvalidInputException">The point lies below the lowest valid temperature
    /// (the fluid's triple point), where no liquid exists.</exception>
    private FluidState TwoPhase(CoexistencePoint point, double quality)
    {
        if (point.Temperature < Solver.MinimumTemperature * (1 - 1e-12))
        {
            // The solver's own refusal, with the triple point and the solid named (it throws before solving).
            Solver.AtTemperature(point.Temperature);
        }

        var saturation = _heatCapacity is null ? null : Coexistence(point);
        var liquid = saturation?.Liquid.State ?? Build(point.Liquid, PhaseLabel.Liquid, false);
        var vapour = saturation?.Vapour.State ?? Build(point.Vapour, PhaseLabel.Vapour, false);
        double? Lever(double? l, double? v) => l + quality * (v - l);
        return new FluidState
        {
            Region = quality == 0 ? FluidRegion.SaturatedLiquid : quality == 1 ? FluidRegion.SaturatedVapour : FluidRegion.TwoPhase,
            Temperature = point.Temperature,
            Pressure = point.Pressure,
            Density = 1 / Lever(liquid.MolarVolume, vapour.MolarVolume)!.Value,
            MolarMass = MolarMass,
            Quality = quality,
            Enthalpy = Lever(liquid.Enthalpy, vapour.Enthalpy),
            Entropy = Lever(liquid.Entropy, vapour.Entropy),
            InternalEnergy = Lever(liquid.InternalEnergy, vapour.InternalEnergy),
            // On the dome's edge the state is also that saturated phase itself.
            Single = quality == 0 ? liquid : quality == 1 ? vapour : null,
            Liquid = liquid,
            Vapour = vapour,
            Coexistence = point,
            Saturation = saturation,
        };
    }

    /// <summary>The value of a property of a single-phase state (the molar volume for the density,
    /// which the lever rule is linear in).</summary>
    private static double Lever(ThermodynamicState state, StateProperty p) => p switch
    {
        StateProperty.Density => state.MolarVolume,
        StateProperty.Enthalpy => state.Enthalpy!.Value,
        StateProperty.Entropy => state.Entropy!.Value,
        StateProperty.InternalEnergy => state.InternalEnergy!.Value,
        _ => throw new ArgumentOutOfRangeException(nameof(p), p, "not a lever-rule property"),
    };

    /// <summary>The quality of a mixture whose lever-rule property is <paramref name="target"/>
    /// (the molar volume 1/ρ for a density), or null when it lies outside the saturated values.</summary>
    private static double? QualityOf(ThermodynamicState liquid, ThermodynamicState vapour, StateProperty p, double target)
    {
        double value = p == StateProperty.Density ? 1 / target : target;
        double l = Lever(liquid, p), v = Lever(vapour, p);
        double x = (value - l) / (v - l);
        // Within SaturationRounding of 0 or 1 the value is the saturated phase's own, re-solved
        // on another route (at T rather than at P) and equal to the solver's precision.
        return x >= -SaturationRounding && x <= 1 + SaturationRounding ? Math.Clamp(x, 0, 1) : null;
    }

    /// <summary>The scale against which a residual of this property is relative.</summary>
    private static double Scale(StateProperty p, double value, double temperature) => p switch
    {
        StateProperty.Enthalpy or StateProperty.InternalEnergy => Math.Max(Math.Abs(value), Constants.GasConstant * temperature),
        StateProperty.Entropy => Math.Max(Math.Abs(value), Constants.GasConstant),
        _ => Math.Abs(value),
    };

    private FluidState AtTemperatureWith(double t, StateProperty p, double value)
    {
        double tc = Solver.CriticalTemperature;
        switch (p)
        {
            case StateProperty.Pressure:
                return Describe(AtPressure(t, value));
            case StateProperty.Quality:
                if (t >= tc)
                {
                    throw new InvalidInputException("quality", value,
                        $"a quality needs liquid and vapour, which coexist only below the critical temperature {Preconditions.Format(tc)} K; {Preconditions.Format(t)} K is not below it");
                }

                return TwoPhase(SaturationAt(t), value);
        }

        if (t < tc)
        {
            var point = SaturationAt(t);
            var liquid = Build(point.Liquid, PhaseLabel.Liquid, false);
            var vapour = Build(point.Vapour, PhaseLabel.Vapour, false);
            if (p == StateProperty.Density)
            {
                // Strictly between the saturated densities is two-phase; on or outside them the
                // single phase, which AtDensity labels.
                if (value > vapour.Density && value < liquid.Density)
                {
                    return TwoPhase(point, QualityOf(liquid, vapour, p, value)!.Value);
                }

                var single = AtDensity(t, value, PhaseChoice.Stable, point);
                return Single(single, SaturationTemperatureAt(single.Pressure));
            }

            if (QualityOf(liquid, vapour, p, value) is double x)
            {
                return TwoPhase(point, x);
            }

            double bound = Model.DensityBound(Composition.Pure);
            var roots = new List<ThermodynamicState>();
            roots.AddRange(RootsInDensity(t, p, value, liquid.Density, bound * (1 - 1e-6), PhaseLabel.Liquid));
            roots.AddRange(RootsInDensity(t, p, value, vapour.Density * 1e-12, vapour.Density, PhaseLabel.Vapour));
            return OneRoot(roots, p, value, $"{Preconditions.Format(t)} K");
        }

        if (p == StateProperty.Density)
        {
            var state = AtDensity(t, value);
            return Single(state, SaturationTemperatureAt(state.Pressure));
        }

        var critical = Model.CriticalPoint(Composition.Pure);
        double top = Model.DensityBound(Composition.Pure) * (1 - 1e-6);
        var all = new List<ThermodynamicState>();
        all.AddRange(RootsInDensity(t, p, value, critical.Density * 1e-12, critical.Density, PhaseLabel.Supercritical));
        all.AddRange(RootsInDensity(t, p, value, critical.Density, top, PhaseLabel.Supercritical));
        return OneRoot(all.DistinctBy(s => s.Density).ToList(), p, value, $"{Preconditions.Format(t)} K");
    }

    private FluidState OneRoot(List<ThermodynamicState> roots, StateProperty p, double value, string where)
    {
        if (roots.Count == 1)
        {
            return Single(roots[0], SaturationTemperatureAt(roots[0].Pressure));
        }

        string spec = Show(p, value);
        if (roots.Count == 0)
        {
            throw new InvalidInputException(Field(p), value,
                $"no state at {where} has {spec}: the model reaches no such value there between 1e-12 of the vapour density and the model's density limit");
        }

        throw new InvalidInputException(Field(p), value,
            $"{roots.Count} states at {where} have {spec} (densities {string.Join(", ", roots.Select(r => Preconditions.Format(r.Density)))} mol/m3): give another pair of properties");
    }

    /// <summary>Every single-phase state at T between two densities on one branch whose property
    /// equals <paramref name="value"/>: a scan in ln ρ, then Brent's method on each sign change.</summary>
    private IEnumerable<ThermodynamicState> RootsInDensity(double t, StateProperty p, double value, double low, double high, PhaseLabel label)
    {
        double scale = Scale(p, value, t);
        ThermodynamicState At(double lnRho)
        {
            double rho = Math.Exp(lnRho);
            var d = Model.Residual(t, rho, Composition.Pure);
            return Build(PhaseState.From(d, d.Pressure), label, false);
        }

        double F(double lnRho) => (Lever(At(lnRho), p) - value) / scale;
        double a = Math.Log(low), b = Math.Log(high);
        double previousX = a, previousF = F(a);
        var found = new List<ThermodynamicState>();
        for (int i = 1; i <= ScanPoints; i++)
        {
            double x = a + (b - a) * i / ScanPoints;
            double f = F(x);
            if (Math.Abs(previousF) <= FlashTolerance)
            {
                found.Add(At(previousX));
            }
            else if (Math.Sign(f) != Math.Sign(previousF) && Math.Abs(f) > FlashTolerance)
            {
                found.Add(At(Brent.FindRoot(F, previousX, x, FlashTolerance, 200)));
            }

            (previousX, previousF) = (x, f);
        }

        if (Math.Abs(previousF) <= FlashTolerance)
        {
            found.Add(At(previousX));
        }

        // A root of the density scan is a single phase only where (∂P/∂ρ)_T > 0 and, on the
        // vapour branch below ρV or the liquid branch above ρL, it is the stable phase.
        return found.Where(s => s.MechanicallyStable && s.Pressure > 0).Select(s => label == PhaseLabel.Supercritical ? s : s with { Phase = label });
    }

    private FluidState AtPressureWith(double pressure, StateProperty p, double value)
    {
        double pc = Solver.CriticalPressure;
        if (p == StateProperty.Quality)
        {
            if (pressure >= pc)
            {
                throw new InvalidInputException("quality", value,
                    $"a quality needs liquid and vapour, which coexist only below the critical pressure {Preconditions.Format(pc)} Pa; {Preconditions.Format(pressure)} Pa is not below it");
            }

            return TwoPhase(Solver.AtPressure(pressure), value);
        }

        double tLow = FlashMinimumTemperature, tHigh = FlashMaximumTemperature;
        if (Coexists(pressure))
        {
            var point = Solver.AtPressure(pressure);
            var liquid = Build(point.Liquid, PhaseLabel.Liquid, false);
            var vapour = Build(point.Vapour, PhaseLabel.Vapour, false);
            if (QualityOf(liquid, vapour, p, value) is double x)
            {
                return TwoPhase(point, x);
            }

            // Every lever-rule property rises from liquid to vapour (the molar volume for the density).
            double target = p == StateProperty.Density ? 1 / value : value;
            bool liquidSide = target < Lever(liquid, p);
            return liquidSide
                ? AlongIsobar(pressure, p, value, tLow, null, liquid, PhaseChoice.Liquid, point.Temperature)
                : AlongIsobar(pressure, p, value, point.Temperature, vapour, null, PhaseChoice.Vapour, point.Temperature);
        }

        return AlongIsobar(pressure, p, value, tLow, null, null, PhaseChoice.Stable, SaturationTemperatureAt(pressure));
    }

    /// <summary>The single phase on the isobar between two temperatures with the property's value:
    /// safeguarded Newton in T with the exact (∂X/∂T)_P. A known end state (the saturated phase)
    /// is used as that end of the bracket.</summary>
    private FluidState AlongIsobar(double pressure, StateProperty p, double value, double tLow, ThermodynamicState? lowState,
        ThermodynamicState? highState, PhaseChoice branch, double? saturationTemperature)
    {
        double tc = Solver.CriticalTemperature;
        double tHigh = highState?.Temperature ?? FlashMaximumTemperature;
        ThermodynamicState At(double t) => AtPressure(t, pressure, t < tc ? branch : PhaseChoice.Stable) with { Metastable = false };

        // The residual, increasing in T (the density falls with T, so its sign is turned).
        double sign = p == StateProperty.Density ? -1 : 1;
        double scale = Scale(p, value, tLow);
        double F(ThermodynamicState s) => sign * ((p == StateProperty.Density ? s.Density : Lever(s, p)) - value) / scale;
        var low = lowState ?? At(tLow);
        var high = highState ?? At(tHigh);
        double fLow = F(low), fHigh = F(high);
        if (fLow > 0 || fHigh < 0)
        {
            double reachLow = p == StateProperty.Density ? low.Density : Lever(low, p);
            double reachHigh = p == StateProperty.Density ? high.Density : Lever(high, p);
            throw new InvalidInputException(Field(p), value,
                $"no state at {Preconditions.Format(pressure)} Pa has {Show(p, value)}: between {Preconditions.Format(tLow)} and {Preconditions.Format(tHigh)} K on this side of the dome the model reaches {Preconditions.Format(reachLow)} to {Preconditions.Format(reachHigh)}{Unit(p)}"
                + (fHigh < 0 && highState is null ? $" (the search stops at {Preconditions.Format(tHigh)} K, {(_heatCapacity is null ? "ten times the critical temperature" : "the upper end of the ideal-gas heat capacity's range")})" : "")
                + (fLow > 0 && lowState is null ? $" (the lowest valid temperature is {Preconditions.Format(tLow)} K)" : ""));
        }

        if (fLow == 0)
        {
            return Single(low, saturationTemperature);
        }

        if (fHigh == 0)
        {
            return Single(high, saturationTemperature);
        }

        var variable = p switch
        {
            StateProperty.Density => StateVariable.V,
            StateProperty.Enthalpy => StateVariable.H,
            StateProperty.Entropy => StateVariable.S,
            _ => StateVariable.U,
        };

        // Start from the end nearer in value, moved by its own slope; then Newton, bisecting
        // whenever a step leaves the bracket [a, b] (F(a) < 0 < F(b)).
        double a = tLow, b = tHigh;
        var nearer = -fLow < fHigh ? low : high;
        double t = nearer.Temperature - F(nearer) / Slope(nearer);
        if (!(t > a && t < b))
        {
            t = 0.5 * (a + b);
        }

        double Slope(ThermodynamicState s)
        {
            double d = PartialDerivatives.Of(s, variable, StateVariable.T, StateVariable.P);
            // (∂ρ/∂T)_P = −ρ²(∂v/∂T)_P; with the sign turned, the slope of F is ρ²(∂v/∂T)_P/scale.
            return (p == StateProperty.Density ? s.Density * s.Density * d : d) / scale;
        }

        for (int iteration = 0; iteration < NewtonIterations + 100; iteration++)
        {
            var state = At(t);
            double f = F(state);
            if (Math.Abs(f) <= FlashTolerance)
            {
                return Single(state, saturationTemperature);
            }

            if (f < 0)
            {
                a = t;
            }
            else
            {
                b = t;
            }

            double slope = state.MechanicallyStable ? Slope(state) : double.NaN;
            double next = t - f / slope;
            if (!(next > a && next < b) || iteration >= NewtonIterations)
            {
                next = 0.5 * (a + b);
            }

            // A step below 1e-13 of T fixes T far inside the promised 1e-10 where the residual
            // itself cannot fall below the tolerance: near the critical point h(T) along an
            // isobar carries the rounding of a nearly triple density root (about 1e-10 relative).
            if (Math.Abs(next - t) <= 1e-13 * t || b - a <= 1e-13 * t)
            {
                return Single(At(next), saturationTemperature);
            }

            t = next;
        }

        throw new ConvergenceException($"the state at {Preconditions.Format(pressure)} Pa with {Show(p, value)} did not converge", NewtonIterations + 100, double.NaN);
    }

    /// <summary>A state on the dome given its quality and one more property (ρ, h, s or u): every
    /// saturation temperature whose mixture of that quality has the value, by a scan and Brent's
    /// method (saturated-vapour enthalpy, for one, passes through a maximum).</summary>
    private FluidState AlongDome(StateProperty p, double value, double quality)
    {
        double top = Solver.CriticalTemperature * (1 - 1e-8);
        return OverTemperature(t => TwoPhase(SaturationAt(t), quality), p, value, FlashMinimumTemperature, top,
            $"quality {Preconditions.Format(quality)}");
    }

    /// <summary>The state fixed by a rule at each temperature (a density, an entropy, a quality)
    /// whose property <paramref name="p"/> has the value: a scan over T and Brent's method on
    /// each sign change; none or several is a refusal.</summary>
    private FluidState OverTemperature(Func<double, FluidState> at, StateProperty p, double value, double tLow, double tHigh, string given)
    {
        FluidState? Try(double t)
        {
            try
            {
                return at(t);
            }
            catch (InvalidInputException)
            {
                return null;
            }
        }

        double Residual(FluidState s) => (s.Get(p)!.Value - value) / Scale(p, value, s.Temperature);
        var roots = new List<FluidState>();
        double previousT = tLow;
        var previous = Try(tLow);
        for (int i = 1; i <= 2 * ScanPoints; i++)
        {
            double t = tLow + (tHigh - tLow) * i / (2 * ScanPoints);
            var state = Try(t);
            if (previous is not null && state is not null)
            {
                double f0 = Residual(previous), f1 = Residual(state);
                if (Math.Abs(f0) <= FlashTolerance)
                {
                    roots.Add(previous);
                }
                else if (Math.Sign(f0) != Math.Sign(f1) && Math.Abs(f1) > FlashTolerance)
                {
                    double root = Brent.FindRoot(x => Residual(at(x)), previousT, t, FlashTolerance, 200);
                    roots.Add(at(root));
                }
            }

            (previousT, previous) = (t, state);
        }

        if (previous is not null && Math.Abs(Residual(previous)) <= FlashTolerance)
        {
            roots.Add(previous);
        }

        string spec = $"{given} and {Show(p, value)}";
        return roots.Count switch
        {
            1 => roots[0],
            0 => throw new InvalidInputException(Field(p), value,
                $"no state has {spec} between {Preconditions.Format(tLow)} and {Preconditions.Format(tHigh)} K"),
            _ => throw new InvalidInputException(Field(p), value,
                $"{roots.Count} states have {spec} (at {string.Join(", ", roots.Select(r => Preconditions.Format(r.Temperature) + " K"))}): give another pair of properties"),
        };
    }
}
