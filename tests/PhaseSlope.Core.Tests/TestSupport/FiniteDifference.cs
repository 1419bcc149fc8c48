using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Tests.TestSupport;

/// <summary>Central finite differences used as independent checks of analytic derivatives.</summary>
internal static class FiniteDifference
{
    /// <summary>The five-point central difference [f(x−2δ) − 8f(x−δ) + 8f(x+δ) − f(x+2δ)]/(12δ):
    /// truncation error δ⁴·f⁽⁵⁾/30, rounding error about 1.5·ε_f/δ where ε_f is the absolute
    /// error of one evaluation of f.</summary>
    public static double Central5(Func<double, double> f, double x, double step)
        => (f(x - 2 * step) - 8 * f(x - step) + 8 * f(x + step) - f(x + 2 * step)) / (12 * step);
}

/// <summary>Property engines of the catalog fluids, built once per test class.</summary>
internal static class Engines
{
    /// <summary>The engine of a catalog fluid with a model, an alpha form, an optional Péneloux
    /// shift and a reference convention.</summary>
    public static PropertyModel For(string fluidName, CubicModelKind kind, AlphaForm alpha = AlphaForm.Default, bool peneloux = false, ReferenceState? reference = null)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(fluidName);
        double shift = peneloux
            ? VolumeShift.Peneloux(kind, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value, VolumeShift.RackettCompressibility(fluid.AcentricFactor.Value))
            : 0;
        return new PropertyModel(fluid, CubicModel.For(kind, fluid, alpha, shift), reference);
    }
}
