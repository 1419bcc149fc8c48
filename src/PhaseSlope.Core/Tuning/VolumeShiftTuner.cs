using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tuning;

/// <summary>A measured saturated-liquid density.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Density">ρ_L, mol/m³.</param>
public sealed record LiquidDensityPoint(double Temperature, double Density);

/// <summary>One measured saturated-liquid density against the model before and after the shift.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Measured">Measured ρ_L, mol/m³.</param>
/// <param name="Before">The unshifted model's ρ_L, mol/m³.</param>
/// <param name="After">The shifted model's ρ_L, mol/m³.</param>
public sealed record LiquidDensityComparison(double Temperature, double Measured, double Before, double After)
{
    /// <summary>100·(Before/Measured − 1).</summary>
    public double DeviationBeforePercent => 100 * (Before / Measured - 1);

    /// <summary>100·(After/Measured − 1).</summary>
    public double DeviationAfterPercent => 100 * (After / Measured - 1);
}

/// <summary>A constant volume translation fitted to saturated-liquid densities.</summary>
/// <param name="Shift">c in m³/mol (v = v_cubic − c).</param>
/// <param name="StandardError">Its standard error (the scatter of the individual differences
/// over √n), m³/mol, or null for one point.</param>
/// <param name="Comparisons">Each point before and after.</param>
public sealed record VolumeShiftFit(double Shift, double? StandardError, IReadOnlyList<LiquidDensityComparison> Comparisons)
{
    /// <summary>Mean |deviation| of ρ_L before, %.</summary>
    public double AadBeforePercent => Comparisons.Average(c => Math.Abs(c.DeviationBeforePercent));

    /// <summary>Mean |deviation| of ρ_L after, %.</summary>
    public double AadAfterPercent => Comparisons.Average(c => Math.Abs(c.DeviationAfterPercent));
}

/// <summary>Fits the constant Péneloux-type volume translation c to measured saturated-liquid
/// densities: a translation v = v_cubic − c moves both phases' volumes by the same c, so the
/// coexistence pressure, the Gibbs energies and every difference between the phases (latent heat,
/// Δv) are unchanged, and only densities move (Péneloux, Rauzy &amp; Fréze 1982).</summary>
/// <remarks>Least squares in relative molar volume (≈ relative density): c minimises
/// Σ[(v_cubic,i − c − v_i)/v_i]², so c = Σ w_i·d_i / Σ w_i with d_i = v_cubic,i − v_i and
/// w_i = 1/v_i². Weighting by 1/v² keeps the large, poorly modelled near-critical volumes from
/// dominating the dense liquid that the translation is for. Its standard error is
/// √(Σ w_i(d_i − c)² / ((n − 1)·Σ w_i)). A published temperature-dependent translation is not
/// fitted: with a constant c the saturation line keeps its exact shape.</remarks>
public static class VolumeShiftTuner
{
    /// <summary>Fits c for <paramref name="model"/> (its own translation, if any, is replaced).</summary>
    /// <exception cref="InvalidInputException">No points, a point outside the liquid–vapour range,
    /// or a shift beyond the model's bound (|c| &lt; b).</exception>
    public static VolumeShiftFit Fit(CubicModel model, IReadOnlyList<LiquidDensityPoint> data, double minimumTemperature)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(data);
        if (data.Count == 0)
        {
            throw new InvalidInputException("liquid densities", 0, "no liquid densities to fit a volume translation to");
        }

        var unshifted = model.WithVolumeShift(0);
        var sorted = data.OrderBy(d => d.Temperature).ToArray();
        foreach (var point in sorted)
        {
            if (!(point.Temperature < unshifted.CriticalTemperature && point.Temperature >= minimumTemperature))
            {
                throw new InvalidInputException("temperature", point.Temperature,
                    $"the liquid density at {Preconditions.Format(point.Temperature)} K is outside the liquid-vapour range {Preconditions.Format(minimumTemperature)} K to Tc = {Preconditions.Format(unshifted.CriticalTemperature)} K");
            }
        }

        var solver = new CoexistenceSolver(unshifted, minimumTemperature);
        var points = CoexistenceCurve.Through(solver, [.. sorted.Select(d => d.Temperature)]);
        double[] differences = [.. sorted.Select((d, i) => points[i].Liquid.MolarVolume - 1 / d.Density)];
        double[] weights = [.. sorted.Select(d => d.Density * d.Density)];
        double sumWeights = weights.Sum();
        double shift = differences.Select((x, i) => weights[i] * x).Sum() / sumWeights;
        double? error = differences.Length > 1
            ? Math.Sqrt(differences.Select((x, i) => weights[i] * (x - shift) * (x - shift)).Sum() / ((differences.Length - 1) * sumWeights))
            : null;
        CubicModel shifted;
        try
        {
            shifted = unshifted.WithVolumeShift(shift);
        }
        catch (InvalidInputException ex)
        {
            throw new InvalidInputException("liquid densities", shift,
                $"the liquid densities need a volume translation of {Preconditions.Format(shift)} m3/mol, which the model does not allow ({ex.Message}); check the density unit");
        }

        var comparisons = sorted.Select((d, i) => new LiquidDensityComparison(d.Temperature, d.Density, points[i].Liquid.Density,
            1 / (points[i].Liquid.MolarVolume - shifted.VolumeShift))).ToArray();
        return new VolumeShiftFit(shift, error, comparisons);
    }
}
