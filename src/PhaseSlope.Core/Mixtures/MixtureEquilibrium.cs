using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Phase equilibrium of one mixture model: the stability test, the P–T flash (and the
/// P–h and P–s flashes around it), bubble and dew points at given T or P, and the temperature
/// glide. Partial files: .Flash (P–T), .EnergyFlash (P–h, P–s), .Saturation (bubble, dew, glide).</summary>
/// <remarks>Thread-safe: the engine holds only immutable data; each call works on its own arrays.
/// Compositions are mole fractions in component order.</remarks>
public sealed partial class MixtureEquilibrium
{
    private const double R = Constants.GasConstant;
    private readonly double[] _tc;
    private readonly double[] _pc;
    private readonly double[] _omega;

    /// <summary>Builds the engine for a mixture model and the fluids of its components (their
    /// acentric factors start the Wilson K-values; their cp° give h and s).</summary>
    /// <exception cref="InvalidInputException">The number of fluids differs from the model's components.</exception>
    public MixtureEquilibrium(CubicMixtureModel model, IReadOnlyList<Fluid> components)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(components);
        if (components.Count != model.ComponentCount)
        {
            throw new InvalidInputException("components", components.Count, $"the model has {model.ComponentCount} components; got {components.Count} fluids");
        }

        Model = model;
        Components = [.. components];
        Properties = new MixtureProperties(components);
        _tc = model.Components.Select(c => c.CriticalTemperature).ToArray();
        _pc = model.Components.Select(c => c.CriticalPressure).ToArray();
        _omega = components.Select(c => c.AcentricFactor.Value).ToArray();
    }

    /// <summary>The mixture model.</summary>
    public CubicMixtureModel Model { get; }

    /// <summary>The component fluids, in component order.</summary>
    public IReadOnlyList<Fluid> Components { get; }

    /// <summary>The enthalpy and entropy rules (ideal-gas part from each component's cp°).</summary>
    public MixtureProperties Properties { get; }

    /// <summary>The engine for components of the embedded catalog with one published cubic and the
    /// given k_ij (row-major n×n, or null for none).</summary>
    public static MixtureEquilibrium For(IReadOnlyList<Fluid> components, CubicModelKind kind, double[]? interaction = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        return new MixtureEquilibrium(new CubicMixtureModel(components.Select(c => CubicModel.For(kind, c)).ToList(), interaction), components);
    }

    /// <summary>Wilson's ln K_i at (T, P).</summary>
    public void WilsonLnK(double temperature, double pressure, Span<double> lnK)
        => WilsonKValues.LnK(temperature, pressure, _tc, _pc, _omega, lnK);

    /// <summary>The tangent-plane-distance test of a feed at (T, P), trials from Wilson's K-values.</summary>
    /// <exception cref="InvalidInputException">Bad T, P or composition.</exception>
    public StabilityResult Stability(double temperature, double pressure, IReadOnlyList<double> feed)
    {
        var z = Feed(feed, requirePresent: true);
        Span<double> lnK = stackalloc double[z.Length];
        WilsonLnK(temperature, pressure, lnK);
        return StabilityAnalysis.Test(Model, temperature, pressure, z, lnK);
    }

    /// <summary>A phase record at (T, P) of composition <paramref name="x"/> on density
    /// <paramref name="density"/>, with h and s where cp° is available (one residual evaluation).</summary>
    private MixturePhase Phase(double temperature, double pressure, double[] x, double density, ref int evaluations)
    {
        evaluations++;
        var residual = Model.Residual(temperature, density, x);
        var caloric = Properties.Caloric(residual, pressure, x);
        return new MixturePhase(x, density, residual.CompressibilityFactor(pressure), caloric?.Enthalpy, caloric?.Entropy);
    }

    /// <summary>Checks and copies a feed: finite, non-negative, summing to 1 within 1e-9 (the
    /// command line checks a user's fractions to 1e-6 and normalises them); the copy is normalised
    /// to rounding so that the material balance of a split closes to rounding.</summary>
    private double[] Feed(IReadOnlyList<double> feed, bool requirePresent)
    {
        ArgumentNullException.ThrowIfNull(feed);
        if (feed.Count != Model.ComponentCount)
        {
            throw new InvalidInputException("composition", feed.Count, $"this mixture has {Model.ComponentCount} components; got {feed.Count} mole fractions");
        }

        var z = feed.ToArray();
        if (requirePresent)
        {
            StabilityAnalysis.RequirePresent(z);
            return Normalised(z);
        }

        double sum = 0;
        foreach (double x in z)
        {
            if (!(x >= 0) || !double.IsFinite(x))
            {
                throw new InvalidInputException("composition", x, $"mole fraction {Preconditions.Format(x)} is not a finite non-negative number");
            }

            sum += x;
        }

        if (Math.Abs(sum - 1) > 1e-9)
        {
            throw new InvalidInputException("composition", sum, $"mole fractions sum to {Preconditions.Format(sum)}, not 1");
        }

        return Normalised(z);
    }

    /// <summary>Normalised copy of amounts.</summary>
    private static double[] Normalised(ReadOnlySpan<double> amounts)
    {
        double sum = 0;
        foreach (double a in amounts)
        {
            sum += a;
        }

        var x = new double[amounts.Length];
        for (int i = 0; i < x.Length; i++)
        {
            x[i] = amounts[i] / sum;
        }

        return x;
    }
}
