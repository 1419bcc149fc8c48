using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Plots;

/// <summary>One fluid on a chart: the fluid and the cubic model whose solver supplies the data.</summary>
public sealed record PlotFluid(Fluid Fluid, CubicModel Model)
{
    /// <summary>The fluid's name as shown in titles and legends: the catalog name, except that a
    /// refrigerant number is written as the trade writes it ("R-134a", "R-1233zd(E)"), taken from
    /// the fluid's own synonym of that spelling when it has one (catalog names are lower case so
    /// that lookups are simple: "r-134a", "r-1233zd-e").</summary>
    public string Name => DisplayName(Fluid);

    /// <summary>The alpha form the model was built with (so that it can be rebuilt with another Tc
    /// and Pc for the uncertainty band of a latent-heat diagram).</summary>
    public AlphaForm Alpha { get; init; } = AlphaForm.Default;

    /// <summary>The same model with Tc and Pc replaced (volume shift dropped: it changes no ΔZ).</summary>
    public CubicModel WithCriticalPoint(double criticalTemperature, double criticalPressure)
        => CubicModel.For(Model.Kind, Fluid with
        {
            CriticalTemperature = Fluid.CriticalTemperature with { Value = criticalTemperature },
            CriticalPressure = Fluid.CriticalPressure with { Value = criticalPressure },
        }, Alpha);

    /// <summary>A coexistence solver of the model from the fluid's lowest valid temperature.</summary>
    public CoexistenceSolver Solver() => new(Model, Fluid);

    /// <summary>The display name of <paramref name="fluid"/> (see <see cref="Name"/>).</summary>
    internal static string DisplayName(Fluid fluid)
    {
        string name = fluid.Name;
        // A refrigerant number: "r-" and a digit (the R-number designations of refrigerants).
        if (name.Length < 3 || name[0] != 'r' || name[1] != '-' || !char.IsAsciiDigit(name[2]))
        {
            return name;
        }

        string key = Key(name);
        return fluid.Synonyms.FirstOrDefault(s => s.StartsWith("R-", StringComparison.Ordinal) && Key(s) == key) ?? "R" + name[1..];
    }

    /// <summary>"R-1233zd(E)" and "r-1233zd-e" both give "r1233zde".</summary>
    private static string Key(string text)
        => new([.. text.ToLowerInvariant().Where(c => c is not ('-' or '(' or ')' or ' '))]);
}
