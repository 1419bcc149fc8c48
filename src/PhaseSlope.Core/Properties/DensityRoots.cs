using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Properties;

/// <summary>The mechanically stable density roots of P(T, ρ) = P for a pure-fluid model, labelled.</summary>
internal static class DensityRoots
{
    /// <summary>Below Tc the vapour and liquid roots (either may be missing beyond its spinodal);
    /// at and above Tc the single root, labelled <see cref="PhaseLabel.Supercritical"/>.</summary>
    /// <remarks>A lone root below Tc is labelled by the curvature of the isotherm there: the
    /// vapour branch lies below the inflection of P(ρ), where (∂²P/∂ρ²)_T &lt; 0, the liquid
    /// branch above it. Each returned root carries its Helmholtz derivatives, evaluated once.</remarks>
    public static IReadOnlyList<(HelmholtzDerivatives Helmholtz, PhaseLabel Phase)> Find(IResidualModel model, double temperature, double pressure)
    {
        Span<double> roots = stackalloc double[2];
        int count = model.DensityRoots(temperature, pressure, Composition.Pure, roots);
        double tc = model.CriticalPoint(Composition.Pure).Temperature;
        var result = new List<(HelmholtzDerivatives, PhaseLabel)>(count);
        for (int i = 0; i < count; i++)
        {
            var d = model.Residual(temperature, roots[i], Composition.Pure);
            PhaseLabel label = temperature >= tc ? PhaseLabel.Supercritical
                : count == 2 ? (i == 0 ? PhaseLabel.Vapour : PhaseLabel.Liquid)
                : d.PressureDRhoRho < 0 ? PhaseLabel.Vapour : PhaseLabel.Liquid;
            result.Add((d, label));
        }

        return result;
    }
}
