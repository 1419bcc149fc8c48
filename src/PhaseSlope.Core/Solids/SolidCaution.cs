using System.Globalization;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Solids;

/// <summary>Cautions for mixture results at temperatures below a component's triple point, where
/// that component may freeze out: the mixture models have no solid phase, so the result is given
/// (a dissolved component's freezing point is lowered, so this is not a refusal) with the caution.</summary>
public static class SolidCaution
{
    /// <summary>One caution per component whose sourced triple-point temperature lies above
    /// <paramref name="temperature"/>, in component order; none when every component is above its own.</summary>
    /// <param name="components">The mixture's components.</param>
    /// <param name="temperature">The result's temperature (or the lowest temperature of a traced result), K.</param>
    public static IEnumerable<string> BelowTriplePoints(IEnumerable<Fluid> components, double temperature)
    {
        ArgumentNullException.ThrowIfNull(components);
        foreach (var fluid in components)
        {
            if (fluid.TriplePointTemperature?.Value is double tt && temperature < tt)
            {
                yield return string.Create(CultureInfo.InvariantCulture,
                    $"{temperature:G6} K is below the triple point of {fluid.Name} ({tt:G6} K): a solid may form; this tool does not model solid phases");
            }
        }
    }
}
