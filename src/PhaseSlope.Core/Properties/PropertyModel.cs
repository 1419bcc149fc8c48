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
/// </remarks>
public sealed class PropertyModel
{
    private const double R = Constants.GasConstant;
    private readonly IdealGasHeatCapacity _heatCapacity;
    private readonly double _enthalpyOffset;
    private readonly double _entropyOffset;

    /// <summary>The antiderivatives of cp° and cp°/T at T0 = 298.15 K, subtracted from every state.</summary>
    private readonly (double Enthalpy, double Entropy) _idealGasAnchor;

    /// <summary>Builds the engine for a fluid, a cubic model and a reference convention.</summary>
    /// <exception cref="FluidDataException">The fluid has no ideal-gas heat capacity.</exception>
    /// <exception cref="InvalidInputException">The reference convention's anchor state does not exist for this fluid (for example 0 °C above
    /// its critical temperature).</exception>
    public PropertyModel(Fluid fluid, IResidualModel model, ReferenceState? reference = null, CoexistenceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(model);
        Fluid = fluid;
        Model = model;
        Reference = reference ?? ReferenceState.IdealGas;
        _heatCapacity = fluid.IdealGasHeatCapacity ?? throw new FluidDataException(fluid.Origin, 0, "ideal_gas_cp",
            $"fluid '{fluid.Name}' has no ideal-gas heat capacity, which absolute caloric properties need (coexistence and residual properties work without it)");
        Solver = new CoexistenceSolver(model, CoexistenceSolver.LowestValidTemperature(fluid), options);
        var anchor = _heatCapacity.Terms(ReferenceState.IdealGasTemperature);
        _idealGasAnchor = (anchor.Enthalpy, anchor.Entropy);
        (_enthalpyOffset, _entropyOffset) = Offsets(Reference);
    }

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

    /// <summary>Molar mass, kg/mol.</summary>
    public double MolarMass => Fluid.MolarMass.Value;

    /// <summary>The state at temperature (K) and molar density (mol/m³).</summary>
    /// <exception cref="InvalidInputException">T or ρ not positive, or ρ at or above the model's 1/b.</exception>
    public ThermodynamicState AtDensity(double temperature, double density)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(density, "density");
        double bound = Model.DensityBound(Composition.Pure);
        if (density >= bound)
        {
            throw new InvalidInputException("density", density,
                $"density {Preconditions.Format(density)} mol/m3 is at or above the model's limit 1/b = {Preconditions.Format(bound)} mol/m3");
        }

        var residual = Model.Residual(temperature, density, Composition.Pure);
        double pressure = residual.Pressure;
        if (!(pressure > 0))
        {
            // A liquid under tension can be mechanically stable ((∂P/∂ρ)_T > 0); only where the
            // isotherm falls is the state inside the spinodal loop.
            string where = residual.PressureDRho > 0 ? "a liquid under tension, where ln Z is undefined" : "inside the spinodal loop";
            throw new InvalidInputException("density", density,
                $"the model gives a non-positive pressure ({Preconditions.Format(pressure)} Pa) at {Preconditions.Format(temperature)} K and {Preconditions.Format(density)} mol/m3 ({where})");
        }

        var critical = Model.CriticalPoint(Composition.Pure);
        PhaseLabel label = temperature >= critical.Temperature ? PhaseLabel.Supercritical
            : density >= critical.Density ? PhaseLabel.Liquid : PhaseLabel.Vapour;
        return Build(PhaseState.From(residual, pressure), label, metastable: false);
    }

    /// <summary>The state at temperature (K) and pressure (Pa): the stable root, or the chosen
    /// one (which may be metastable).</summary>
    /// <exception cref="InvalidInputException">T or P not positive; the chosen phase has no
    /// root there (beyond its spinodal); a phase was chosen at or above Tc.</exception>
    public ThermodynamicState AtPressure(double temperature, double pressure, PhaseChoice phase = PhaseChoice.Stable)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(pressure, "pressure");
        var roots = DensityRoots.Find(Model, temperature, pressure);
        if (roots.Count == 1 && roots[0].Phase == PhaseLabel.Supercritical && phase != PhaseChoice.Stable)
        {
            throw new InvalidInputException("phase", double.NaN,
                $"at {Preconditions.Format(temperature)} K, at or above the critical temperature {Preconditions.Format(Solver.CriticalTemperature)} K, there is one fluid phase: do not choose liquid or vapour");
        }

        var states = roots.Select(r => Build(PhaseState.From(r.Helmholtz, pressure), r.Phase, metastable: false)).ToList();
        var stable = states.MinBy(s => s.LnFugacityCoefficient)!;
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
    public CoexistenceProperties Coexistence(CoexistencePoint point)
    {
        ArgumentNullException.ThrowIfNull(point);
        // Both phases share T, so their temperature-dependent ideal-gas part is computed once.
        var idealGas = _heatCapacity.Terms(point.Temperature);
        var liquid = Build(point.Liquid, PhaseLabel.Liquid, false, idealGas);
        var vapour = Build(point.Vapour, PhaseLabel.Vapour, false, idealGas);
        return new CoexistenceProperties(point, SaturatedPhase.Along(liquid, point), SaturatedPhase.Along(vapour, point));
    }

    /// <summary>The complete state from its residual part: the ideal-gas part added, nothing
    /// evaluated again.</summary>
    private ThermodynamicState Build(PhaseState residual, PhaseLabel label, bool metastable)
        => Build(residual, label, metastable, _heatCapacity.Terms(residual.Temperature));

    private ThermodynamicState Build(PhaseState residual, PhaseLabel label, bool metastable, (double HeatCapacity, double Enthalpy, double Entropy) idealGasAtT)
    {
        var d = residual.Helmholtz;
        double t = residual.Temperature;
        double density = residual.Density;
        double pressure = residual.Pressure;
        double rt = R * t;
        double cp0 = idealGasAtT.HeatCapacity;
        var (hig, sig) = IdealGas(idealGasAtT, density * rt);
        double u = _enthalpyOffset + hig - rt + residual.ResidualInternalEnergy;
        return new ThermodynamicState
        {
            Temperature = t,
            Density = density,
            Pressure = pressure,
            MolarMass = MolarMass,
            Phase = label,
            Metastable = metastable,
            IdealGasExtrapolated = !_heatCapacity.InRange(t),
            CompressibilityFactor = residual.CompressibilityFactor,
            InternalEnergy = u,
            Enthalpy = u + pressure / density,
            Entropy = _entropyOffset + sig - d.DT,
            ResidualEnthalpy = residual.ResidualEnthalpy,
            ResidualEntropy = residual.ResidualEntropy,
            LnFugacityCoefficient = residual.LnFugacityCoefficient,
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
        double m = MolarMass;
        double hTarget = reference.PerMass ? reference.Enthalpy * m : reference.Enthalpy;
        double sTarget = reference.PerMass ? reference.Entropy * m : reference.Entropy;
        ThermodynamicState anchor;
        switch (reference.Anchor)
        {
            case ReferenceAnchor.IdealGas:
                // The base convention itself, shifted by the targets at its own anchor.
                var (hBase, sBase) = IdealGas(_heatCapacity.Terms(reference.Temperature!.Value), reference.Pressure!.Value);
                return (hTarget - hBase, sTarget - sBase);
            case ReferenceAnchor.SaturatedLiquid:
                var point = AnchorPoint(reference);
                anchor = Build(point.Liquid, PhaseLabel.Liquid, false);
                break;
            default:
                anchor = AtPressure(reference.Temperature!.Value, reference.Pressure!.Value);
                break;
        }

        return (hTarget - anchor.Enthalpy, sTarget - anchor.Entropy);
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
