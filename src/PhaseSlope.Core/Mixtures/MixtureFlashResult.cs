namespace PhaseSlope.Core.Mixtures;

/// <summary>The equilibrium state of a feed at (T, P): a stable single phase or the stable
/// liquid–vapour split.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Feed">The feed mole fractions.</param>
/// <param name="VapourFraction">β, moles of vapour per mole of feed: in (0, 1) for a split; 0 for a
/// single liquid-like phase, 1 for a single vapour-like phase.</param>
/// <param name="Liquid">The liquid phase (the feed itself for a single liquid-like phase; null for
/// a single vapour-like phase).</param>
/// <param name="Vapour">The vapour phase (the feed itself for a single vapour-like phase; null for
/// a single liquid-like phase).</param>
/// <param name="Stability">The tangent-plane-distance test of the feed that decided single phase
/// or split. For a split it stopped at the first trial phase with negative tm (proof enough, and
/// the start of the split), so its trial is not a stationary point; <see cref="MixtureEquilibrium.Stability"/>
/// converges both trials.</param>
/// <param name="GibbsEnergyChange">For a split, (G_split − G_feed)/(RT) per mole of feed, negative
/// (the split is the stable state); 0 for a single phase.</param>
/// <param name="Report">Iterations and model evaluations.</param>
public sealed record MixtureFlashResult(
    double Temperature,
    double Pressure,
    IReadOnlyList<double> Feed,
    double VapourFraction,
    MixturePhase? Liquid,
    MixturePhase? Vapour,
    StabilityResult Stability,
    double GibbsEnergyChange,
    MixtureSolverReport Report)
{
    /// <summary>Whether the feed splits into liquid and vapour.</summary>
    public bool IsTwoPhase => Liquid is not null && Vapour is not null;

    /// <summary>Molar enthalpy of the whole feed, J/mol, or null without cp°.</summary>
    public double? Enthalpy => Combine(Liquid?.Enthalpy, Vapour?.Enthalpy);

    /// <summary>Molar entropy of the whole feed, J/(mol·K), or null without cp°.</summary>
    public double? Entropy => Combine(Liquid?.Entropy, Vapour?.Entropy);

    /// <summary>Molar density of the whole feed, mol/m³: 1/((1 − β)/ρL + β/ρV).</summary>
    public double Density => IsTwoPhase ? 1 / ((1 - VapourFraction) / Liquid!.Density + VapourFraction / Vapour!.Density) : (Liquid ?? Vapour)!.Density;

    private double? Combine(double? liquid, double? vapour)
    {
        if (IsTwoPhase)
        {
            return liquid is null || vapour is null ? null : (1 - VapourFraction) * liquid + VapourFraction * vapour;
        }

        return Liquid is null ? vapour : liquid;
    }
}
