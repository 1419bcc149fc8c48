using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>A non-cubic Helmholtz model written against <see cref="IResidualModel"/> alone, to
/// show that the solvers need nothing else: the Carnahan–Starling hard-sphere term (Carnahan &amp;
/// Starling, J. Chem. Phys. 51, 635 (1969)) with a van der Waals attraction,
/// A_r/RT = (4η − 3η²)/(1 − η)² − aρ/(RT), η = bρ. Its pressure is not a cubic in v, so the
/// density roots come from the interface's default Newton implementation.</summary>
/// <remarks>With f(η) = (4η − 3η²)/(1 − η)²: f′ = (4 − 2η)/(1 − η)³, f″ = (10 − 4η)/(1 − η)⁴,
/// f‴ = (36 − 12η)/(1 − η)⁵ (differentiated by hand; the tests check them by finite differences).
/// The critical point is located numerically from (∂P/∂ρ)_T = (∂²P/∂ρ²)_T = 0.</remarks>
internal sealed class CarnahanStarlingVanDerWaalsModel : IResidualModel
{
    private const double R = Constants.GasConstant;
    private readonly double _a;
    private readonly double _b;
    private readonly ModelCriticalPoint _critical;

    /// <param name="attraction">a in Pa·m⁶/mol².</param>
    /// <param name="packing">b in m³/mol (η = bρ).</param>
    public CarnahanStarlingVanDerWaalsModel(double attraction, double packing)
    {
        _a = attraction;
        _b = packing;
        _critical = LocateCriticalPoint();
    }

    public ModelIdentity Identity => new("cs-vdw", "Carnahan-Starling hard spheres with van der Waals attraction (test model)", "none (temperature-independent a)", 0);

    public int ComponentCount => 1;

    public double DensityBound(ReadOnlySpan<double> amounts) => 1 / _b;

    public ModelCriticalPoint CriticalPoint(ReadOnlySpan<double> amounts) => _critical;

    public HelmholtzDerivatives Residual(double temperature, double density, ReadOnlySpan<double> amounts)
    {
        double eta = _b * density;
        double m = 1 - eta;
        double f = (4 * eta - 3 * eta * eta) / (m * m);
        double f1 = (4 - 2 * eta) / (m * m * m);
        double f2 = (10 - 4 * eta) / (m * m * m * m);
        double f3 = (36 - 12 * eta) / (m * m * m * m * m);
        double rt = R * temperature;
        return new HelmholtzDerivatives(temperature, density,
            Value: rt * f - _a * density,
            DT: R * f,
            DTT: 0,
            DRho: rt * _b * f1 - _a,
            DRhoRho: rt * _b * _b * f2,
            DRhoRhoRho: rt * _b * _b * _b * f3,
            DTRho: R * _b * f1);
    }

    public void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients)
    {
        var d = Residual(temperature, density, amounts);
        lnFugacityCoefficients[0] = d.LnFugacityCoefficient(d.Pressure);
    }

    /// <summary>Newton on (T, ρ) for (∂P/∂ρ)_T = 0 and (∂²P/∂ρ²)_T = 0, the Jacobian by central
    /// differences of the exact derivatives; started from the van der Waals critical point with
    /// b/4 as its co-volume (an estimate within some tens of percent).</summary>
    private ModelCriticalPoint LocateCriticalPoint()
    {
        double t = 8 * _a / (27 * R * 4 * _b) * 0.75;
        double rho = 1 / (3 * 4 * _b) * 1.3;
        var pure = Composition.Pure;
        for (int i = 0; i < 100; i++)
        {
            var d = Residual(t, rho, pure);
            double g1 = d.PressureDRho;
            double g2 = d.PressureDRhoRho;
            double ht = 1e-6 * t;
            double hr = 1e-6 * rho;
            double g1T = (Residual(t + ht, rho, pure).PressureDRho - Residual(t - ht, rho, pure).PressureDRho) / (2 * ht);
            double g2T = (Residual(t + ht, rho, pure).PressureDRhoRho - Residual(t - ht, rho, pure).PressureDRhoRho) / (2 * ht);
            double g1R = g2;
            double g2R = (Residual(t, rho + hr, pure).PressureDRhoRho - Residual(t, rho - hr, pure).PressureDRhoRho) / (2 * hr);
            double det = g1T * g2R - g1R * g2T;
            double dt = -(g1 * g2R - g1R * g2) / det;
            double dr = -(g1T * g2 - g1 * g2T) / det;
            t += dt;
            rho += dr;
            if (Math.Abs(dt) < 1e-14 * t && Math.Abs(dr) < 1e-14 * rho)
            {
                break;
            }
        }

        return new ModelCriticalPoint(t, Residual(t, rho, pure).Pressure, rho);
    }
}
