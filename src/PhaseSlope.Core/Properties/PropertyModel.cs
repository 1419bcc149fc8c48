using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>The complete property engine of one fluid: a cubic model for the residual part, the
/// fluid's ideal-gas heat capacity for the ideal part, and a reference convention.</summary>
/// <remarks>
/// Ideal part on the base convention (h = s = 0 for the ideal gas at T0 = 298.15 K, P0 = 1 bar):
/// h_ig(T) = ∫_{T0}^{T} cp° dT, s_ig(T, ρ) = ∫_{T0}^{T} cp°/T dT − R·ln(ρRT/P0). The chosen
/// <see cref="ReferenceState"/> adds constant offsets to h and s. Then u = h_ig − RT + u_r,
/// h = u + P/ρ, s = s_ig − A_r,T, a = u − Ts, g = h − Ts and cv = cp° − R − T·A_r,TT, with the
/// residual terms from <see cref="IResidualModel.Residual"/> (through <see cref="PhaseState"/>,
/// where each residual formula is written once).
/// <para>A fluid without cp° (<see cref="Fluid.IdealGasHeatCapacity"/> null) still gets every
/// property that does not need it: ρ, Z, ln φ, the residual h and s, (∂P/∂T)_V, (∂P/∂ρ)_T, α, κT,
/// the internal pressure and cp − cv; u, h, s, a, g, cv, cp, cp°, w, κS and μJT are null with
/// <see cref="ThermodynamicState.IdealGasUnavailableReason"/>. A reference convention other than
/// the base one needs cp° and is refused.</para>
/// </remarks>
public sealed partial class PropertyModel
{
    private const double R = Constants.GasConstant;
    private readonly IdealGasHeatCapacity? _heatCapacity;
    private readonly double _enthalpyOffset;
    private readonly double _entropyOffset;

    /// <summary>Where the fluid's own data place the solid (every described state is checked against it).</summary>
    private readonly Solids.SolidRegion _solid;

    /// <summary>The antiderivatives of cp° and cp°/T at T0 = 298.15 K, subtracted from every state.</summary>
    private readonly (double Enthalpy, double Entropy) _idealGasAnchor;

    /// <summary>Builds the engine for a fluid, a cubic model and a reference convention.</summary>
    /// <exception cref="FluidDataException">The fluid has no ideal-gas heat capacity and a
    /// reference convention other than the base one (<see cref="ReferenceState.IdealGas"/>) is asked
    /// for: every convention sets the zero of h and s, which need cp°.</exception>
    /// <exception cref="InvalidInputException">The reference convention's anchor state does not exist for this fluid (for example 0 °C above
    /// its critical temperature).</exception>
    public PropertyModel(Fluid fluid, IResidualModel model, ReferenceState? reference = null, CoexistenceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(model);
        Fluid = fluid;
        Model = model;
        Reference = reference ?? ReferenceState.IdealGas;
        _heatCapacity = fluid.IdealGasHeatCapacity;
        Solver = new CoexistenceSolver(model, fluid, options);
        _solid = new Solids.SolidRegion(fluid, Solver);
        if (_heatCapacity is null)
        {
            if (!ReferenceEquals(Reference, ReferenceState.IdealGas) && Reference.Id != ReferenceState.IdealGas.Id)
            {
                throw RequireIdealGasFailure($"the reference state '{Reference.Id}' (it sets the zero of h and s)");
            }

            IdealGasUnavailableReason = $"needs the ideal-gas heat capacity cp°, which fluid '{fluid.Name}' does not give (residual properties, density, Z, ln φ, α, κT, (∂P/∂T)_V, the internal pressure and cp − cv do not need it)";
            return;
        }

        var anchor = _heatCapacity.Terms(ReferenceState.IdealGasTemperature);
        _idealGasAnchor = (anchor.Enthalpy, anchor.Entropy);
        (_enthalpyOffset, _entropyOffset) = Offsets(Reference);
    }

    /// <summary>Why the properties that need cp° are null for this fluid, or null when it has cp°.</summary>
    public string? IdealGasUnavailableReason { get; }

    /// <summary>Throws unless the fluid has an ideal-gas heat capacity.</summary>
    /// <param name="purpose">What needs it, for the message (e.g. "a pressure–enthalpy diagram").</param>
    /// <exception cref="FluidDataException">The fluid has no cp°.</exception>
    public void RequireIdealGas(string purpose)
    {
        if (_heatCapacity is null)
        {
            throw RequireIdealGasFailure(purpose);
        }
    }

    private FluidDataException RequireIdealGasFailure(string purpose)
        => new(Fluid.Origin, 0, "ideal_gas_cp",
            $"fluid '{Fluid.Name}' has no ideal-gas heat capacity cp°, which {purpose} needs (coexistence and residual properties work without it)");

    /// <summary>The engine for a fluid with one of the published models.</summary>
    public static PropertyModel For(Fluid fluid, CubicModelKind kind, ReferenceState? reference = null)
        => new(fluid, CubicModel.For(kind, fluid), reference);

    /// <summary>The fluid.</summary>
    public Fluid Fluid { get; }

    /// <summary>The model of the residual part.</summary>
    public IResidualModel Model { get; }

    /// <summary>The reference convention.</summary>
    public ReferenceState Reference { get; }

    /// <summary>The coexistence solver of the same model.</summary>
    public CoexistenceSolver Solver { get; }

    /// <summary>Molar mass, kg/mol, or null when the fluid gives none.</summary>
    public double? MolarMass => Fluid.MolarMass?.Value;

    /// <summary>Relative distance in T and in P (or ρ) from the model's critical point within
    /// which a state is taken to be the critical point itself.</summary>
    /// <remarks>1e-9 is the coexistence solver's own floor: it accepts a point whose density
    /// correction is below 1e-9 and states that uncertainty, so two states closer than that
    /// cannot be told apart by it. At the critical point (∂P/∂ρ)_T = 0; a density root solved at
    /// (Tc, Pc) carries the cube root of the rounding (about 1e-5 relative), which left a finite
    /// (∂P/∂ρ)_T and printed cp = 5e12 J/(mol·K) instead of "undefined".</remarks>
    public const double CriticalPointTolerance = 1e-9;

    /// <summary>The state at temperature (K) and molar density (mol/m³).</summary>
    /// <param name="temperature">T, K.</param>
    /// <param name="density">ρ, mol/m³.</param>
    /// <param name="phase"><see cref="PhaseChoice.Stable"/> (default): a density between the
    /// saturated densities at T &lt; Tc is the two-phase state, which is refused (it is not a
    /// single phase). <see cref="PhaseChoice.Liquid"/> or <see cref="PhaseChoice.Vapour"/>: such a
    /// density is the single phase of that branch, returned flagged
    /// <see cref="ThermodynamicState.Metastable"/> (a superheated or stretched liquid, a subcooled
    /// vapour) as long as it is mechanically stable.</param>
    /// <remarks>A liquid under tension (P &lt; 0 with (∂P/∂ρ)_T &gt; 0) is a metastable liquid:
    /// every property defined there is given; ln φ and the residual entropy, which need ln Z, are
    /// null with <see cref="ThermodynamicState.UndefinedReason"/>. A state within
    /// <see cref="CriticalPointTolerance"/> of the model's critical point is that point.</remarks>
    /// <exception cref="InvalidInputException">T or ρ not positive, or ρ at or above the model's
    /// 1/b; a two-phase density without a chosen phase; a density inside the spinodal or on the
    /// other branch than the chosen one; a phase chosen at or above Tc.</exception>
    public ThermodynamicState AtDensity(double temperature, double density, PhaseChoice phase = PhaseChoice.Stable)
        => AtDensity(temperature, density, phase, saturation: null);

    /// <summary><see cref="AtDensity(double, double, PhaseChoice)"/> with the coexistence point at
    /// T when the caller has it already (a flash), so it is not solved twice.</summary>
    private ThermodynamicState AtDensity(double temperature, double density, PhaseChoice phase, CoexistencePoint? saturation)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(density, "density");
        double bound = Model.DensityBound(Composition.Pure);
        if (density >= bound)
        {
            throw new InvalidInputException("density", density,
                $"density {Preconditions.Format(density)} mol/m3 is at or above the model's limit 1/b = {Preconditions.Format(bound)} mol/m3");
        }

        var critical = Model.CriticalPoint(Composition.Pure);
        if (IsCritical(temperature, density, critical.Density, critical))
        {
            return CriticalState(critical, phase);
        }

        var residual = Model.Residual(temperature, density, Composition.Pure);
        double pressure = residual.Pressure;
        if (temperature >= critical.Temperature)
        {
            RequireNoPhaseAboveCritical(temperature, phase);
            return Build(PhaseState.From(residual, pressure), PhaseLabel.Supercritical, metastable: false);
        }

        saturation ??= SaturationAt(temperature);
        double liquid = saturation.Liquid.Density;
        double vapour = saturation.Vapour.Density;
        // The saturated densities carry the solver's stated relative uncertainty (at most 1e-9,
        // see CriticalPointTolerance); a density equal to one of them within it is that
        // saturated phase, not a two-phase state.
        double slack = Math.Max(saturation.Report.DensityUncertainty, CriticalPointTolerance);
        bool twoPhase = density > vapour * (1 + slack) && density < liquid * (1 - slack);
        string where = $"{Preconditions.Format(density)} mol/m3 at {Preconditions.Format(temperature)} K";
        if (!twoPhase)
        {
            var label = density >= liquid * (1 - slack) ? PhaseLabel.Liquid : PhaseLabel.Vapour;
            if (phase != PhaseChoice.Stable && label != Wanted(phase))
            {
                throw new InvalidInputException("phase", density,
                    $"{where} is a stable {Name(label)}, not a {Name(Wanted(phase))}");
            }

            return Build(PhaseState.From(residual, pressure), label, metastable: false);
        }

        if (phase == PhaseChoice.Stable)
        {
            throw new InvalidInputException("density", density,
                $"{where} lies between the saturated vapour and liquid densities {Preconditions.Format(vapour)} and {Preconditions.Format(liquid)} mol/m3: at equilibrium that is two phases at {Preconditions.Format(saturation.Pressure)} Pa, which is not computed yet; give --phase liquid or vapour for the metastable single phase");
        }

        // Between the binodal and the spinodal the state is a metastable single phase on one
        // branch of the isotherm; between the spinodals ((∂P/∂ρ)_T ≤ 0) it is no phase at all.
        var metastable = Build(PhaseState.From(residual, pressure), PhaseLabel.Vapour, metastable: true);
        if (!metastable.MechanicallyStable)
        {
            throw new InvalidInputException("density", density,
                $"{where} is inside the spinodal ((dP/drho)_T = {Preconditions.Format(residual.PressureDRho)} Pa m3/mol <= 0): mechanically unstable, no single phase exists");
        }

        // The vapour branch of a subcritical isotherm is concave below its inflection, the liquid
        // branch convex above it (the same test labels a lone density root).
        var branch = residual.PressureDRhoRho < 0 ? PhaseLabel.Vapour : PhaseLabel.Liquid;
        if (branch != Wanted(phase))
        {
            throw new InvalidInputException("phase", density,
                $"{where} is on the metastable {Name(branch)} branch, not the {Name(Wanted(phase))} branch");
        }

        return metastable with { Phase = branch };
    }

    private static PhaseLabel Wanted(PhaseChoice phase) => phase == PhaseChoice.Liquid ? PhaseLabel.Liquid : PhaseLabel.Vapour;

    private static string Name(PhaseLabel label) => label.ToString().ToLowerInvariant();

    /// <summary>The coexistence point at T, also below the fluid's lowest valid temperature
    /// (a supercooled state still has a saturation line of the model).</summary>
    private CoexistencePoint SaturationAt(double temperature)
        => temperature >= Solver.MinimumTemperature
            ? Solver.AtTemperature(temperature)
            : new CoexistenceSolver(Model, temperature).AtTemperature(temperature);

    private bool IsCritical(double temperature, double value, double criticalValue, ModelCriticalPoint critical)
        => Math.Abs(temperature - critical.Temperature) <= CriticalPointTolerance * critical.Temperature
            && Math.Abs(value - criticalValue) <= CriticalPointTolerance * criticalValue;

    /// <summary>The model's critical point itself: evaluated at (Tc, ρc) exactly, where
    /// (∂P/∂ρ)_T vanishes to rounding and the divergent properties are null.</summary>
    private ThermodynamicState CriticalState(ModelCriticalPoint critical, PhaseChoice phase)
    {
        RequireNoPhaseAboveCritical(critical.Temperature, phase);
        var d = Model.Residual(critical.Temperature, critical.Density, Composition.Pure);
        return Build(PhaseState.From(d, critical.Pressure), PhaseLabel.Supercritical, metastable: false) with { Critical = true };
    }

    private void RequireNoPhaseAboveCritical(double temperature, PhaseChoice phase)
    {
        if (phase != PhaseChoice.Stable)
        {
            throw new InvalidInputException("phase", double.NaN,
                $"at {Preconditions.Format(temperature)} K, at or above the critical temperature {Preconditions.Format(Solver.CriticalTemperature)} K, there is one fluid phase: do not choose liquid or vapour");
        }
    }

    /// <summary>The state at temperature (K) and pressure (Pa): the stable root, or the chosen
    /// one (which may be metastable).</summary>
    /// <remarks>A state within <see cref="CriticalPointTolerance"/> of the model's (Tc, Pc) is the
    /// critical point itself.</remarks>
    /// <exception cref="InvalidInputException">T or P not positive; the chosen phase has no
    /// root there (beyond its spinodal); a phase was chosen at or above Tc.</exception>
    public ThermodynamicState AtPressure(double temperature, double pressure, PhaseChoice phase = PhaseChoice.Stable)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(pressure, "pressure");
        var critical = Model.CriticalPoint(Composition.Pure);
        if (IsCritical(temperature, pressure, critical.Pressure, critical))
        {
            return CriticalState(critical, phase);
        }

        var roots = DensityRoots.Find(Model, temperature, pressure);
        if (roots.Count == 1 && roots[0].Phase == PhaseLabel.Supercritical)
        {
            RequireNoPhaseAboveCritical(temperature, phase);
        }

        var states = roots.Select(r => Build(PhaseState.From(r.Helmholtz, pressure), r.Phase, metastable: false)).ToList();
        var stable = states.MinBy(s => s.LnFugacityCoefficient ?? double.PositiveInfinity)!;
        if (phase == PhaseChoice.Stable)
        {
            return stable;
        }

        var wanted = phase == PhaseChoice.Liquid ? PhaseLabel.Liquid : PhaseLabel.Vapour;
        var chosen = states.FirstOrDefault(s => s.Phase == wanted) ?? throw new InvalidInputException("phase", double.NaN,
            $"no {wanted.ToString().ToLowerInvariant()} root at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa: that phase is beyond its spinodal (mechanically unstable) there");
        return chosen with { Metastable = !ReferenceEquals(chosen, stable) && chosen.LnFugacityCoefficient > stable.LnFugacityCoefficient };
    }

    /// <summary>Both saturated phases of a coexistence point with their full properties and their
    /// derivatives along the coexistence line.</summary>
    /// <exception cref="FluidDataException">The fluid has no cp° (the along-line slopes of h, s
    /// and u need it); its coexistence points themselves need none.</exception>
    public CoexistenceProperties Coexistence(CoexistencePoint point)
    {
        ArgumentNullException.ThrowIfNull(point);
        RequireIdealGas("the full saturated-phase properties (h, s and their slopes along the line)");
        // Both phases share T, so their temperature-dependent ideal-gas part is computed once.
        var idealGas = _heatCapacity?.Terms(point.Temperature);
        var liquid = Build(point.Liquid, PhaseLabel.Liquid, false, idealGas);
        var vapour = Build(point.Vapour, PhaseLabel.Vapour, false, idealGas);
        return new CoexistenceProperties(point, SaturatedPhase.Along(liquid, point), SaturatedPhase.Along(vapour, point));
    }

    /// <summary>The complete state from its residual part: the ideal-gas part added, nothing
    /// evaluated again.</summary>
    private ThermodynamicState Build(PhaseState residual, PhaseLabel label, bool metastable)
        => Build(residual, label, metastable, _heatCapacity?.Terms(residual.Temperature));

    private ThermodynamicState Build(PhaseState residual, PhaseLabel label, bool metastable, (double HeatCapacity, double Enthalpy, double Entropy)? idealGasAtT)
    {
        var d = residual.Helmholtz;
        double t = residual.Temperature;
        double density = residual.Density;
        double pressure = residual.Pressure;
        double rt = R * t;
        double? cp0 = null, u = null, s = null;
        if (idealGasAtT is { } ig)
        {
            cp0 = ig.HeatCapacity;
            var (hig, sig) = IdealGas(ig, density * rt);
            u = _enthalpyOffset + hig - rt + residual.ResidualInternalEnergy;
            s = _entropyOffset + sig - d.DT;
        }

        return new ThermodynamicState
        {
            Temperature = t,
            Density = density,
            Pressure = pressure,
            MolarMass = MolarMass,
            Phase = label,
            Metastable = metastable,
            IdealGasExtrapolated = _heatCapacity is not null && !_heatCapacity.InRange(t),
            IdealGasUnavailableReason = IdealGasUnavailableReason,
            CompressibilityFactor = residual.CompressibilityFactor,
            InternalEnergy = u,
            Enthalpy = u + pressure / density,
            Entropy = s,
            ResidualEnthalpy = residual.ResidualEnthalpy,
            // ln Z is undefined for P ≤ 0 (a liquid under tension): ln φ and s_r, which contain it,
            // are null with the reason; every other property is finite there.
            ResidualEntropy = pressure > 0 ? residual.ResidualEntropy : null,
            LnFugacityCoefficient = pressure > 0 ? residual.LnFugacityCoefficient : null,
            UndefinedReason = pressure > 0 ? null
                : $"ln fugacity coefficient and residual entropy are undefined: the pressure {Preconditions.Format(pressure)} Pa is not positive (a liquid under tension), so ln Z is undefined",
            IsochoricHeatCapacity = cp0 - R - t * d.DTT,
            IdealGasHeatCapacity = cp0,
            PressureTemperatureDerivative = d.PressureDT,
            PressureDensityDerivative = d.PressureDRho,
        };
    }

    /// <summary>Ideal-gas enthalpy and entropy on the base convention (h = s = 0 for the ideal gas
    /// at T0 = 298.15 K and P0 = 1 bar) from the antiderivatives of cp° at T and the ideal-gas
    /// pressure <paramref name="idealPressure"/> (ρRT for a state of density ρ):
    /// h_ig = ∫_{T0}^{T} cp° dT, s_ig = ∫_{T0}^{T} cp°/T dT − R·ln(P/P0).</summary>
    private (double Enthalpy, double Entropy) IdealGas((double HeatCapacity, double Enthalpy, double Entropy) atT, double idealPressure)
        => (atT.Enthalpy - _idealGasAnchor.Enthalpy,
            atT.Entropy - _idealGasAnchor.Entropy - R * Math.Log(idealPressure / ReferenceState.IdealGasPressure));

    private (double Enthalpy, double Entropy) Offsets(ReferenceState reference)
    {
        double m = reference.PerMass ? Fluid.RequireMolarMass($"the reference state '{reference.Id}' (given per kilogram)") : 1;
        double hTarget = reference.PerMass ? reference.Enthalpy * m : reference.Enthalpy;
        double sTarget = reference.PerMass ? reference.Entropy * m : reference.Entropy;
        ThermodynamicState anchor;
        switch (reference.Anchor)
        {
            case ReferenceAnchor.IdealGas:
                // The base convention itself, shifted by the targets at its own anchor.
                var (hBase, sBase) = IdealGas(_heatCapacity!.Terms(reference.Temperature!.Value), reference.Pressure!.Value);
                return (hTarget - hBase, sTarget - sBase);
            case ReferenceAnchor.SaturatedLiquid:
                var point = AnchorPoint(reference);
                anchor = Build(point.Liquid, PhaseLabel.Liquid, false);
                break;
            default:
                anchor = AtPressure(reference.Temperature!.Value, reference.Pressure!.Value);
                break;
        }

        return (hTarget - anchor.Enthalpy!.Value, sTarget - anchor.Entropy!.Value);
    }

    private CoexistencePoint AnchorPoint(ReferenceState reference)
    {
        try
        {
            return reference.Temperature is double t ? Solver.AtTemperature(t) : Solver.AtPressure(reference.Pressure!.Value);
        }
        catch (InvalidInputException ex)
        {
            throw new InvalidInputException("reference", ex.Value,
                $"reference state '{reference.Id}' ({reference.Description}) does not exist for {Fluid.Name} with this model: {ex.Message}");
        }
    }
}
