namespace PhaseSlope.Core.Properties;

/// <summary>A complete single-phase state of a fluid model: the primary variables, absolute
/// caloric properties on the model's reference convention, heat capacities, sound speed,
/// expansivity, compressibilities and the Joule–Thomson coefficient.</summary>
/// <remarks>
/// Molar SI units throughout: K, mol/m³, Pa, m³/mol, J/mol, J/(mol·K), m/s, 1/K, 1/Pa, K/Pa.
/// With P_T = (∂P/∂T)_V, P_ρ = (∂P/∂ρ)_T and cv = cv° − T·A_r,TT:
/// cp = cv + T·P_T²/(ρ²·P_ρ); w² = (P_ρ + T·P_T²/(ρ²·cv))/M; α = P_T/(ρ·P_ρ);
/// κT = 1/(ρ·P_ρ); κS = κT·cv/cp; μJT = (T·α − 1)/(ρ·cp); (∂U/∂V)_T = T·P_T − P.
/// Quantities that diverge where P_ρ → 0 (critical point, spinodal) are null there and for
/// mechanically unstable states (P_ρ ≤ 0, or zero to rounding: see <see cref="MechanicallyStable"/>); the others are always finite.
/// Without the fluid's ideal-gas heat capacity cp°, cv and the absolute u, h, s are unknown: they
/// and everything built on them (a, g, cp, w, κS, μJT) are null, with
/// <see cref="IdealGasUnavailableReason"/>; without a molar mass the speed of sound is null too.
/// </remarks>
public sealed record ThermodynamicState
{
    /// <summary>Temperature, K.</summary>
    public required double Temperature { get; init; }

    /// <summary>Molar density, mol/m³.</summary>
    public required double Density { get; init; }

    /// <summary>Pressure, Pa.</summary>
    public required double Pressure { get; init; }

    /// <summary>Molar volume, m³/mol.</summary>
    public double MolarVolume => 1 / Density;

    /// <summary>Molar mass, kg/mol, or null when the fluid gives none.</summary>
    public required double? MolarMass { get; init; }

    /// <summary>Which kind of root this is.</summary>
    public required PhaseLabel Phase { get; init; }

    /// <summary>True when another root at the same (T, P) has a lower Gibbs energy.</summary>
    public bool Metastable { get; init; }

    /// <summary>True when T lies outside the stated range of the ideal-gas heat-capacity correlation.</summary>
    public bool IdealGasExtrapolated { get; init; }

    /// <summary>Compressibility factor P/(ρRT).</summary>
    public required double CompressibilityFactor { get; init; }

    /// <summary>Molar internal energy, J/mol; null without cp° (see <see cref="IdealGasUnavailableReason"/>).</summary>
    public required double? InternalEnergy { get; init; }

    /// <summary>Molar enthalpy, J/mol; null without cp°.</summary>
    public required double? Enthalpy { get; init; }

    /// <summary>Molar entropy, J/(mol·K); null without cp°.</summary>
    public required double? Entropy { get; init; }

    /// <summary>Molar Helmholtz energy u − Ts, J/mol; null without cp°.</summary>
    public double? HelmholtzEnergy => InternalEnergy - Temperature * Entropy;

    /// <summary>Molar Gibbs energy h − Ts, J/mol; null without cp°.</summary>
    public double? GibbsEnergy => Enthalpy - Temperature * Entropy;

    /// <summary>Residual enthalpy h − h_ig(T), J/mol.</summary>
    public required double ResidualEnthalpy { get; init; }

    /// <summary>Residual entropy s − s_ig(T, P), J/(mol·K); null where P ≤ 0 (ln Z undefined,
    /// see <see cref="UndefinedReason"/>).</summary>
    public required double? ResidualEntropy { get; init; }

    /// <summary>Natural logarithm of the fugacity coefficient; null where P ≤ 0 (ln Z undefined,
    /// see <see cref="UndefinedReason"/>).</summary>
    public required double? LnFugacityCoefficient { get; init; }

    /// <summary>Why properties that are always defined elsewhere are null at this state (a
    /// liquid under tension), or null.</summary>
    public string? UndefinedReason { get; init; }

    /// <summary>Why the properties that need the ideal-gas heat capacity cp° (u, h, s, a, g, cv,
    /// cp, cp°, w, κS, μJT) are null: the fluid gives no cp°. Null when it does.</summary>
    public string? IdealGasUnavailableReason { get; init; }

    /// <summary>True when the state is the model's critical point (recognised within
    /// <see cref="PropertyModel.CriticalPointTolerance"/>, however it was specified).</summary>
    public bool Critical { get; init; }

    /// <summary>Isochoric molar heat capacity, J/(mol·K); null without cp°.</summary>
    public required double? IsochoricHeatCapacity { get; init; }

    /// <summary>Ideal-gas isobaric heat capacity cp°(T), J/(mol·K); null when the fluid gives none.</summary>
    public required double? IdealGasHeatCapacity { get; init; }

    /// <summary>(∂P/∂T)_V, Pa/K.</summary>
    public required double PressureTemperatureDerivative { get; init; }

    /// <summary>(∂P/∂ρ)_T, Pa·m³/mol.</summary>
    public required double PressureDensityDerivative { get; init; }

    /// <summary>(∂P/∂V)_T = −ρ²·(∂P/∂ρ)_T, Pa·mol/m³.</summary>
    public double PressureVolumeDerivative => -Density * Density * PressureDensityDerivative;

    /// <summary>Internal pressure (∂U/∂V)_T = T·(∂P/∂T)_V − P, Pa.</summary>
    public double InternalPressure => Temperature * PressureTemperatureDerivative - Pressure;

    /// <summary>True when (∂P/∂ρ)_T &gt; 0 by more than rounding: (∂P/∂ρ)_T is a difference of
    /// terms of order RT, so a value below 1e-13·RT (as at the model's critical point, where it
    /// comes out as ±1e-12 J/mol of noise) counts as zero.</summary>
    public bool MechanicallyStable => PressureDensityDerivative > 1e-13 * Constants.GasConstant * Temperature;

    /// <summary>cp − cv = T·(∂P/∂T)_V²/(ρ²·(∂P/∂ρ)_T), J/(mol·K), which needs no cp°; null where
    /// the state is not <see cref="MechanicallyStable"/>.</summary>
    public double? HeatCapacityDifference => MechanicallyStable
        ? Temperature * PressureTemperatureDerivative * PressureTemperatureDerivative / (Density * Density * PressureDensityDerivative)
        : null;

    /// <summary>Isobaric molar heat capacity, J/(mol·K); null where the state is not
    /// <see cref="MechanicallyStable"/>, and without cp°.</summary>
    public double? IsobaricHeatCapacity => IsochoricHeatCapacity + HeatCapacityDifference;

    /// <summary>Speed of sound, m/s; null where w² ≤ 0, and without cp° or a molar mass.</summary>
    public double? SpeedOfSound
    {
        get
        {
            if (IsochoricHeatCapacity is not double cv || MolarMass is not double m)
            {
                return null;
            }

            double pt = PressureTemperatureDerivative;
            double w2 = (PressureDensityDerivative + Temperature * pt * pt / (Density * Density * cv)) / m;
            return w2 > 0 ? Math.Sqrt(w2) : null;
        }
    }

    /// <summary>Isobaric expansivity α = (1/V)(∂V/∂T)_P, 1/K; null where the state is not <see cref="MechanicallyStable"/>.</summary>
    public double? IsobaricExpansivity => MechanicallyStable ? PressureTemperatureDerivative / (Density * PressureDensityDerivative) : null;

    /// <summary>Isothermal compressibility κT = −(1/V)(∂V/∂P)_T, 1/Pa; null where the state is not <see cref="MechanicallyStable"/>.</summary>
    public double? IsothermalCompressibility => MechanicallyStable ? 1 / (Density * PressureDensityDerivative) : null;

    /// <summary>Isentropic compressibility κS = κT·cv/cp, 1/Pa; null where the state is not <see cref="MechanicallyStable"/>.</summary>
    public double? IsentropicCompressibility => IsothermalCompressibility * IsochoricHeatCapacity / IsobaricHeatCapacity;

    /// <summary>Ratio of the heat capacities γ = cp/cv; null where cp is (see <see cref="IsobaricHeatCapacity"/>).</summary>
    public double? HeatCapacityRatio => IsobaricHeatCapacity / IsochoricHeatCapacity;

    /// <summary>Isentropic exponent k = −(v/P)(∂P/∂v)_s = γ/(P·κT), the exponent of P·v^k = const
    /// along an isentrope through the state (equal to γ for an ideal gas); null where γ is, and
    /// where P ≤ 0.</summary>
    public double? IsentropicExponent => Pressure > 0 ? HeatCapacityRatio / (Pressure * IsothermalCompressibility) : null;

    /// <summary>Joule–Thomson coefficient (∂T/∂P)_H = (T·α − 1)/(ρ·cp), K/Pa; null where the state is not <see cref="MechanicallyStable"/>.</summary>
    public double? JouleThomsonCoefficient => (Temperature * IsobaricExpansivity - 1) / (Density * IsobaricHeatCapacity);

    /// <summary>The partial derivatives (∂X/∂T)_V and (∂X/∂V)_T of a state function, the
    /// building blocks of every other derivative (see <see cref="PartialDerivatives"/>).</summary>
    /// <remarks>S_T = cv/T and S_V = P_T (Maxwell, from dA = −S dT − P dV); U_T = cv,
    /// U_V = T·P_T − P; H = U + PV; A_T = −S, A_V = −P; G = A + PV.</remarks>
    /// <exception cref="InvalidOperationException">The partial needs cv or the absolute entropy
    /// and the state has no cp° (<see cref="IdealGasUnavailableReason"/>); use
    /// <see cref="PartialDerivatives.NeedsIdealGas"/> to ask first.</exception>
    public (double DT, double DV) Partials(StateVariable variable)
    {
        var split = SplitPartials(variable);
        if (IsochoricHeatCapacity is double cv && Entropy is double entropy)
        {
            double t = Temperature;
            double v = MolarVolume;
            double pt = PressureTemperatureDerivative;
            // Written out as before the split so that a state with cp° gives the same bits.
            double dt = variable switch
            {
                StateVariable.S => cv / t,
                StateVariable.U => cv,
                StateVariable.H => cv + v * pt,
                StateVariable.A => -entropy,
                StateVariable.G => -entropy + v * pt,
                _ => split.DT,
            };
            return (dt, split.DV);
        }

        if (split.DTPerCv != 0 || split.DTPerEntropy != 0)
        {
            throw new InvalidOperationException($"(d{variable}/dT)_V needs cv or the absolute entropy: {IdealGasUnavailableReason}");
        }

        return (split.DT, split.DV);
    }

    /// <summary>(∂X/∂T)_V split as DT + DTPerCv·cv + DTPerEntropy·s (each term known without cp°),
    /// and (∂X/∂V)_T, which never needs cp°: the form in which <see cref="PartialDerivatives"/>
    /// decides whether a derivative needs cp°.</summary>
    internal (double DT, double DTPerCv, double DTPerEntropy, double DV) SplitPartials(StateVariable variable)
    {
        double t = Temperature;
        double v = MolarVolume;
        double p = Pressure;
        double pt = PressureTemperatureDerivative;
        double pv = PressureVolumeDerivative;
        return variable switch
        {
            StateVariable.T => (1, 0, 0, 0),
            StateVariable.V => (0, 0, 0, 1),
            StateVariable.P => (pt, 0, 0, pv),
            StateVariable.S => (0, 1 / t, 0, pt),
            StateVariable.U => (0, 1, 0, t * pt - p),
            StateVariable.H => (v * pt, 1, 0, t * pt + v * pv),
            StateVariable.A => (0, 0, -1, -p),
            StateVariable.G => (v * pt, 0, -1, v * pv),
            _ => throw new ArgumentOutOfRangeException(nameof(variable), variable, "unknown state variable"),
        };
    }
}
