using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>Mixtures used by the equilibrium tests, Peng–Robinson with the catalog's constants.</summary>
internal static class MixtureTestSystems
{
    /// <summary>The engine for catalog components with one k_ij for every pair (0 by default).</summary>
    public static MixtureEquilibrium Engine(double kij, params string[] names)
    {
        int n = names.Length;
        var k = new double[n * n];
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                k[i * n + j] = i == j ? 0 : kij;
            }
        }

        return MixtureEquilibrium.For(names.Select(FluidCatalog.Embedded.Find).ToList(), CubicModelKind.PengRobinson, k);
    }

    /// <summary>Mole fractions from mass fractions with the catalog's molar masses.</summary>
    public static double[] FromMass(MixtureEquilibrium engine, params double[] massFractions)
    {
        var moles = massFractions.Select((w, i) => w / engine.Components[i].MolarMass!.Value).ToArray();
        double total = moles.Sum();
        return moles.Select(m => m / total).ToArray();
    }

    /// <summary>An invented 10-component lean natural gas (mole fractions, labelled invented:
    /// typical of a pipeline gas with a heavier tail, not a measured sample).</summary>
    public static readonly string[] NaturalGasNames =
        ["nitrogen", "carbon-dioxide", "methane", "ethane", "propane", "isobutane", "n-butane", "isopentane", "n-pentane", "n-hexane"];

    /// <summary>The invented natural gas's mole fractions, in <see cref="NaturalGasNames"/> order (sum 1).</summary>
    public static readonly double[] NaturalGas = [0.02, 0.01, 0.80, 0.08, 0.04, 0.015, 0.015, 0.008, 0.007, 0.005];
}
