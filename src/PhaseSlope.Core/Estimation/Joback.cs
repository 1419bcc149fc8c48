using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Estimation;

/// <summary>The Joback group-contribution method (Joback &amp; Reid, Chem. Eng. Commun. 57, 233
/// (1987)) for the normal boiling point, the critical constants and the ideal-gas heat capacity
/// of a molecule described by its groups.</summary>
/// <remarks>
/// Tb = 198 + Σ tb; Tc = Tb / (0.584 + 0.965 Σ tc − (Σ tc)²); Pc [bar] = (0.113 + 0.0032 nA − Σ pc)⁻²;
/// Vc [cm³/mol] = 17.5 + Σ vc; cp° [J/(mol·K)] = (Σa − 37.93) + (Σb + 0.210)T + (Σc − 3.91e-4)T² + (Σd + 2.06e-7)T³.
/// nA is the number of atoms in the molecule. Group values as tabulated in Poling, Prausnitz &amp;
/// O'Connell, 5th ed. (2001), Table 2-2 (from memory). Typical errors quoted for the method:
/// about 12 K in Tb, 1 % in Tc (with a measured Tb), 5 % in Pc; cp° within a few percent
/// between about 280 and 1100 K.
/// </remarks>
public static class Joback
{
    /// <summary>Lowest temperature of the cp° range commonly quoted for the method, K.</summary>
    public const double HeatCapacityMinimumTemperature = 280;

    /// <summary>Highest temperature of the cp° range commonly quoted for the method, K.</summary>
    public const double HeatCapacityMaximumTemperature = 1100;

    /// <summary>The groups this implementation carries.</summary>
    public static IReadOnlyList<JobackGroup> Groups { get; } =
    [
        new("CH3", "-CH3", 0.0141, -0.0012, 65, 23.58, 19.5, -8.08e-3, 1.53e-4, -9.67e-8, 4),
        new("CH2", "-CH2-", 0.0189, 0.0000, 56, 22.88, -0.909, 9.50e-2, -5.44e-5, 1.19e-8, 3),
        new("CH", ">CH-", 0.0164, 0.0020, 41, 21.74, -23.0, 2.04e-1, -2.65e-4, 1.20e-7, 2),
        new("C", ">C<", 0.0067, 0.0043, 27, 18.25, -66.2, 4.27e-1, -6.41e-4, 3.01e-7, 1),
        new("=CH2", "=CH2", 0.0113, -0.0028, 56, 18.18, 23.6, -3.81e-2, 1.72e-4, -1.03e-7, 3),
        new("=CH", "=CH-", 0.0129, -0.0006, 46, 24.96, -8.00, 1.05e-1, -9.63e-5, 3.56e-8, 2),
        new("=C", "=C<", 0.0117, 0.0011, 38, 24.14, -28.1, 2.08e-1, -3.06e-4, 1.46e-7, 1),
        new("ring-CH2", "-CH2- (ring)", 0.0100, 0.0025, 48, 27.15, -6.03, 8.54e-2, -8.00e-6, -1.80e-8, 3),
        new("ring-CH", ">CH- (ring)", 0.0122, 0.0004, 38, 21.78, -20.5, 1.62e-1, -1.60e-4, 6.24e-8, 2),
        new("ring=CH", "=CH- (ring)", 0.0082, 0.0011, 41, 26.73, -2.14, 5.74e-2, -1.64e-6, -1.59e-8, 2),
        new("ring=C", "=C< (ring)", 0.0143, 0.0008, 32, 31.01, -8.25, 1.01e-1, -1.42e-4, 6.78e-8, 1),
        new("F", "-F", 0.0111, -0.0057, 27, -0.03, 26.5, -9.13e-2, 1.91e-4, -1.03e-7, 1),
        new("Cl", "-Cl", 0.0105, -0.0049, 58, 38.13, 33.3, -9.63e-2, 1.87e-4, -9.96e-8, 1),
        new("OH", "-OH (alcohol)", 0.0741, 0.0112, 28, 92.88, 25.7, -6.91e-2, 1.77e-4, -9.88e-8, 2),
        new("O", "-O- (non-ring)", 0.0168, 0.0015, 18, 22.42, 25.5, -6.32e-2, 1.11e-4, -5.48e-8, 1),
        new("C=O", ">C=O (non-ring)", 0.0380, 0.0031, 62, 76.75, 6.45, 6.70e-2, -3.57e-5, 2.86e-9, 2),
    ];

    /// <summary>Finds a group by identifier, case-insensitively.</summary>
    public static bool TryFindGroup(string id, out JobackGroup? group)
    {
        group = Groups.FirstOrDefault(g => string.Equals(g.Id, id, StringComparison.OrdinalIgnoreCase));
        return group is not null;
    }

    /// <summary>Estimates for a molecule given as (group, count) pairs.</summary>
    /// <param name="groups">The molecule's groups with their counts (each count ≥ 1).</param>
    /// <param name="measuredBoilingPoint">A measured normal boiling point in K, used in the Tc
    /// relation instead of the estimated one (the method's recommendation), or null.</param>
    public static JobackEstimate Estimate(IReadOnlyList<(JobackGroup Group, int Count)> groups, double? measuredBoilingPoint = null)
    {
        ArgumentNullException.ThrowIfNull(groups);
        if (groups.Count == 0)
        {
            throw new InvalidInputException("groups", 0, "the Joback method needs at least one group");
        }

        foreach (var (group, count) in groups)
        {
            if (count < 1)
            {
                throw new InvalidInputException("groups", count, $"group {group.Id} has count {count}; counts must be at least 1");
            }
        }

        if (measuredBoilingPoint is double tbMeasured)
        {
            Preconditions.Positive(tbMeasured, "normal boiling point");
        }

        double Sum(Func<JobackGroup, double> value) => groups.Sum(g => g.Count * value(g.Group));
        int atoms = groups.Sum(g => g.Count * g.Group.Atoms);
        double tb = 198 + Sum(g => g.Tb);
        double sumTc = Sum(g => g.Tc);
        double tbForTc = measuredBoilingPoint ?? tb;
        double tc = tbForTc / (0.584 + 0.965 * sumTc - sumTc * sumTc);
        double pcBar = Math.Pow(0.113 + 0.0032 * atoms - Sum(g => g.Pc), -2);
        double vc = 17.5 + Sum(g => g.Vc);
        double a = Sum(g => g.A) - 37.93;
        double b = Sum(g => g.B) + 0.210;
        double c = Sum(g => g.C) - 3.91e-4;
        double d = Sum(g => g.D) + 2.06e-7;
        string list = string.Join(", ", groups.Select(g => $"{g.Count} {g.Group.Description}"));
        const double R = Constants.GasConstant;
        var cp = new IdealGasHeatCapacity(
            [(a / R, 0), (b / R, 1), (c / R, 2), (d / R, 3)], 1, [],
            HeatCapacityMinimumTemperature, HeatCapacityMaximumTemperature,
            $"estimated by the Joback group-contribution method (Joback & Reid 1987), groups: {list}; group values from memory");
        return new JobackEstimate(tb, tc, pcBar * 1e5, vc * 1e-6, cp, atoms, list, measuredBoilingPoint is not null);
    }
}
