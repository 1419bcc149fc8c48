using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

/// <summary>The mixture cubic against its pure limits, its own Helmholtz energy (finite
/// differences in the amounts) and the exact identities of fugacity coefficients (Gibbs–Duhem,
/// symmetry of n·∂ln φ_i/∂n_j, g_r/RT = Σ x_i ln φ_i).</summary>
public sealed class CubicMixtureModelTests
{
    private static readonly string[] Names = ["methane", "ethane", "propane", "n-butane", "carbon-dioxide", "nitrogen"];

    private static CubicMixtureModel Mixture(string[] names, double kij = 0.0, double[]? shifts = null, CubicModelKind kind = CubicModelKind.PengRobinson)
    {
        var models = names.Select((n, i) => CubicModel.For(kind, FluidCatalog.Embedded.Find(n), volumeShift: shifts?[i] ?? 0)).ToList();
        int nc = names.Length;
        var k = new double[nc * nc];
        for (int i = 0; i < nc; i++)
        {
            for (int j = 0; j < nc; j++)
            {
                k[i * nc + j] = i == j ? 0 : kij * (1 + 0.1 * (i + j)); // distinct, symmetric values
            }
        }

        return new CubicMixtureModel(models, k);
    }

    [Theory]
    [InlineData(CubicModelKind.PengRobinson)]
    [InlineData(CubicModelKind.SoaveRedlichKwong)]
    [InlineData(CubicModelKind.VanDerWaals)]
    public void PureLimits_EqualThePureModel(CubicModelKind kind)
    {
        // A mixture with one component present is that component's model: the same formula with
        // the same constants, so equal to rounding (1e-13 relative; a and b are summed over the
        // absent components' zero fractions).
        var mixture = Mixture(["propane", "n-butane"], 0.02, kind: kind);
        var pure = CubicModel.For(kind, FluidCatalog.Embedded.Find("propane"));
        foreach (var (t, rho) in new[] { (450.0, 8000.0), (300.0, 40.0), (400.0, 3000.0) }) // P > 0, below 1/b of every form (van der Waals: 11 060 mol/m3)
        {
            var m = mixture.Residual(t, rho, [1.0, 0.0]);
            var p = pure.Residual(t, rho);
            AssertClose.Relative(p.Pressure, m.Pressure, 1e-13, "pressure");
            AssertClose.Relative(p.Value, m.Value, 1e-13, "a_r");
            var lnPhi = new double[2];
            mixture.LnFugacityCoefficients(t, rho, [2.5, 0.0], lnPhi);
            AssertClose.Absolute(p.LnFugacityCoefficient(p.Pressure), lnPhi[0], 1e-12, "ln phi of the pure component");
        }
    }

    [Theory]
    [InlineData(0.0, false)]
    [InlineData(0.05, false)]
    [InlineData(0.05, true)]
    public void LnPhi_IsTheAmountDerivativeOfTheTotalResidualHelmholtzEnergy(double kij, bool translated)
    {
        // ln φ_i = (∂(n a_r/RT)/∂n_i)_{T,V} − ln Z; central difference in n_i at fixed V with a
        // step of 1e-5 mol: truncation ~1e-10, rounding ~1e-16/1e-5 = 1e-11 (tolerance 1e-8).
        double[] shifts = [-4e-6, 1e-6, 3e-6, 5e-6, -2e-6, 2e-6];
        var model = Mixture(Names, kij, translated ? shifts : null);
        double[] n = [0.4, 0.2, 0.15, 0.1, 0.1, 0.05];
        double t = 250, v = 3e-4; // total V for Σn = 1 mol: a dense gas / light liquid
        double F(double[] amounts)
        {
            double total = amounts.Sum();
            var d = model.Residual(t, total / v, amounts);
            return total * d.Value / (Constants.GasConstant * t);
        }

        var lnPhi = new double[6];
        model.LnFugacityCoefficients(t, 1 / v, n, lnPhi);
        var state = model.Residual(t, 1 / v, n);
        double lnZ = Math.Log(state.CompressibilityFactor(state.Pressure));
        for (int i = 0; i < 6; i++)
        {
            double h = 1e-5;
            double[] up = [.. n], down = [.. n];
            up[i] += h;
            down[i] -= h;
            double numeric = (F(up) - F(down)) / (2 * h) - lnZ;
            AssertClose.Absolute(numeric, lnPhi[i], 1e-8, $"ln phi {i}");
        }
    }

    [Theory]
    [InlineData(MixtureRoot.Vapour, 300.0, 2e6)]
    [InlineData(MixtureRoot.Liquid, 250.0, 5e6)]
    public void Derivatives_MatchFiniteDifferences_AndSatisfyGibbsDuhem(MixtureRoot root, double t, double p)
    {
        var model = Mixture(Names, 0.03, [-4e-6, 1e-6, 3e-6, 5e-6, -2e-6, 2e-6]);
        double[] n = [0.3, 0.1, 0.3, 0.2, 0.05, 0.05];
        int nc = n.Length;
        var lnPhi = new double[nc];
        var dT = new double[nc];
        var dP = new double[nc];
        var dN = new double[nc * nc];
        model.LnFugacityCoefficientsAtPressure(t, p, n, root, lnPhi, dT, dP, dN);

        double[] At(double tt, double pp, double[] amounts)
        {
            var result = new double[nc];
            model.LnFugacityCoefficientsAtPressure(tt, pp, amounts, root, result);
            return result;
        }

        // Central differences: steps 1e-4 K, 1 Pa (1e-6 of P), 1e-6 mol; tolerances 1e-6 of the
        // derivative's scale cover their truncation (~1e-9) and rounding (~1e-10).
        var tUp = At(t + 1e-4, p, n);
        var tDown = At(t - 1e-4, p, n);
        var pUp = At(t, p + 1, n);
        var pDown = At(t, p - 1, n);
        for (int i = 0; i < nc; i++)
        {
            AssertClose.Absolute((tUp[i] - tDown[i]) / 2e-4, dT[i], 1e-6 * Math.Max(1e-2, Math.Abs(dT[i])), $"d ln phi {i}/dT");
            AssertClose.Absolute((pUp[i] - pDown[i]) / 2, dP[i], 1e-6 * Math.Max(1e-7, Math.Abs(dP[i])), $"d ln phi {i}/dP");
        }

        double total = n.Sum();
        for (int j = 0; j < nc; j++)
        {
            double[] up = [.. n], down = [.. n];
            up[j] += 1e-6;
            down[j] -= 1e-6;
            var a = At(t, p, up);
            var b = At(t, p, down);
            double gibbsDuhem = 0;
            for (int i = 0; i < nc; i++)
            {
                AssertClose.Absolute(total * (a[i] - b[i]) / 2e-6, dN[i * nc + j], 1e-6 * Math.Max(1, Math.Abs(dN[i * nc + j])), $"n d ln phi {i}/dn {j}");
                AssertClose.Absolute(dN[i * nc + j], dN[j * nc + i], 1e-12 * Math.Max(1, Math.Abs(dN[i * nc + j])), "symmetry");
                gibbsDuhem += n[i] * dN[i * nc + j];
            }

            // Gibbs–Duhem at constant T and P: Σ_i n_i ∂ln φ_i/∂n_j = 0, exact; rounding of a sum of
            // terms of order one.
            AssertClose.Absolute(0, gibbsDuhem, 1e-12, $"Gibbs-Duhem for n_{j}");
        }

        // g_r/RT = Σ x_i ln φ_i = a_r/RT + Z − 1 − ln Z on the same root.
        double rho = model.LnFugacityCoefficientsAtPressure(t, p, n, root, lnPhi);
        var d = model.Residual(t, rho, n);
        double z = d.CompressibilityFactor(p);
        double sum = 0;
        for (int i = 0; i < nc; i++)
        {
            sum += n[i] / total * lnPhi[i];
        }

        AssertClose.Absolute(d.Value / (Constants.GasConstant * t) + z - 1 - Math.Log(z), sum, 1e-12, "g_r/RT");
    }
}
