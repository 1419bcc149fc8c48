using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Core.Properties;

/// <summary>Classification of a fluid's saturated-vapour line as wet, isentropic or dry, and the
/// temperature at which its entropy is highest.</summary>
/// <param name="Class">The class.</param>
/// <param name="ReducedSlope">ξ = (Tc/R)·ds_V/dT|σ at T/Tc = 0.7 (dimensionless), the number the class
/// is read from.</param>
/// <param name="MaximumEntropyTemperature">Where ds_V/dT|σ changes sign from + to − (the vapour
/// line turns toward the critical point), K; null when it is negative all along (wet fluids).</param>
/// <remarks>
/// The slope of the vapour line follows from the change-of-constraint rule,
/// ds_V/dT|σ = (∂s/∂T)_P + (∂s/∂P)_T·dPsat/dT = cp/T − (∂v/∂T)_P·dPsat/dT.
/// The class is read at T/Tc = 0.7, where the acentric factor is defined and where organic
/// Rankine cycles typically evaporate: wet below ξ = −<see cref="IsentropicBand"/>, dry above
/// +<see cref="IsentropicBand"/>, isentropic in between. The band is a convention of this tool
/// (common practice reads the sign of ds/dT; we add a band so that nearly vertical lines are
/// called isentropic rather than by the sign of a small number).
/// </remarks>
public sealed record VapourLine(VapourLineClass Class, double ReducedSlope, double? MaximumEntropyTemperature)
{
    /// <summary>Half-width of the isentropic band in ξ = (Tc/R)·ds_V/dT.</summary>
    public const double IsentropicBand = 0.5;

    /// <summary>Reduced temperature at which the class is read.</summary>
    public const double ReadingReducedTemperature = 0.7;

    /// <summary>Classifies the vapour line of a property model.</summary>
    public static VapourLine Classify(PropertyModel engine)
    {
        ArgumentNullException.ThrowIfNull(engine);
        var solver = engine.Solver;
        double tc = engine.Solver.CriticalTemperature;
        CoexistencePoint? near = null;
        double Slope(double t) => engine.Coexistence(solver.AtTemperature(t, near)).Vapour.EntropySlope!.Value;

        double reading = Math.Max(ReadingReducedTemperature * tc, solver.MinimumTemperature);
        double xi = tc / Constants.GasConstant * Slope(reading);
        var cls = xi < -IsentropicBand ? VapourLineClass.Wet : xi > IsentropicBand ? VapourLineClass.Dry : VapourLineClass.Isentropic;

        // Scan for the last + to − change of sign below Tc; the slope always ends negative near
        // Tc, where the vapour line bends into the dome.
        var grid = CoexistenceCurve.Trace(solver, solver.MinimumTemperature, tc * (1 - 1e-3), 48);
        // One slope per traced state, from the states the curve already solved.
        double[] slopes = [.. grid.Select(point => engine.Coexistence(point).Vapour.EntropySlope!.Value)];
        double? turn = null;
        for (int i = grid.Count - 2; i >= 0; i--)
        {
            double a = grid[i].Temperature;
            double b = grid[i + 1].Temperature;
            if (slopes[i] > 0 && slopes[i + 1] <= 0)
            {
                // Every state of the root search starts from the bracketing grid point.
                near = grid[i];
                // MathNet's Brent stops when either the bracket or |f| is below the accuracy, so
                // the root is sought for the dimensionless ξ(τ), τ = T/Tc, where one accuracy
                // serves both (in T and ds/dT it stopped at |ds/dT| ~ 1e-9·Tc J/(mol·K²), some
                // 1e-5 K from the root).
                turn = tc * Brent.FindRoot(tau => tc / Constants.GasConstant * Slope(tau * tc), a / tc, b / tc, 1e-10, 100);
                break;
            }
        }

        return new VapourLine(cls, xi, turn);
    }
}
