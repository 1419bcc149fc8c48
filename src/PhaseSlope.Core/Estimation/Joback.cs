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
/// O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), Table 2-2 (from memory; see
/// the notes beside the table). Average errors quoted there for the method (from memory): about
/// 13 K (3–4 %) in Tb; about 5 K (1 %) in Tc with a measured Tb and about 4–5 % with the estimated
/// one; about 2 bar (5 %) in Pc; about 7 cm³/mol (2–3 %) in Vc; cp° within a few percent between
/// about 280 and 1100 K. Errors are largest for small, polar, associating and highly branched
/// molecules.
/// </remarks>
public static class Joback
{
    /// <summary>Lowest temperature of the cp° range commonly quoted for the method, K.</summary>
    public const double HeatCapacityMinimumTemperature = 280;

    /// <summary>Highest temperature of the cp° range commonly quoted for the method, K.</summary>
    public const double HeatCapacityMaximumTemperature = 1100;

    /// <summary>Largest count of one group in a molecule (far above any fluid this tool models; it
    /// keeps the sums finite and the atom counts within <see cref="ChemicalFormula.MaximumCount"/>).</summary>
    public const int MaximumCount = 1000;

    /// <summary>The groups of the published table, in its order: non-ring carbon, ring carbon,
    /// halogen, oxygen, nitrogen and sulfur groups.</summary>
    /// <remarks>Columns: identifier (ours), drawing, atoms, tc, pc, vc [cm³/mol], tb [K], and the
    /// cp° terms a, b, c, d. Source: Joback &amp; Reid (1987) as tabulated in Poling, Prausnitz &amp;
    /// O'Connell, 5th ed. (2001), Table 2-2; every value from memory. The table also gives melting
    /// point, formation enthalpy and Gibbs energy, fusion and vaporization enthalpy and viscosity
    /// contributions, which this tool does not model and so does not carry. A null is a blank in
    /// the published table (the method then gives no value for a molecule with that group).</remarks>
    public static IReadOnlyList<JobackGroup> Groups { get; } =
    [
        // Non-ring increments.
        new("CH3", "-CH3", "CH3", 0.0141, -0.0012, 65, 23.58, new(19.5, -8.08e-3, 1.53e-4, -9.67e-8)),
        new("CH2", "-CH2-", "CH2", 0.0189, 0.0000, 56, 22.88, new(-0.909, 9.50e-2, -5.44e-5, 1.19e-8)),
        new("CH", ">CH-", "CH", 0.0164, 0.0020, 41, 21.74, new(-23.0, 2.04e-1, -2.65e-4, 1.20e-7)),
        new("C", ">C<", "C", 0.0067, 0.0043, 27, 18.25, new(-66.2, 4.27e-1, -6.41e-4, 3.01e-7)),
        new("=CH2", "=CH2", "CH2", 0.0113, -0.0028, 56, 18.18, new(23.6, -3.81e-2, 1.72e-4, -1.03e-7)),
        new("=CH", "=CH-", "CH", 0.0129, -0.0006, 46, 24.96, new(-8.00, 1.05e-1, -9.63e-5, 3.56e-8)),
        new("=C", "=C<", "C", 0.0117, 0.0011, 38, 24.14, new(-28.1, 2.08e-1, -3.06e-4, 1.46e-7)),
        new("=C=", "=C=", "C", 0.0026, 0.0028, 36, 26.15, new(27.4, -5.57e-2, 1.01e-4, -5.02e-8)),
        new("#CH", "≡CH", "CH", 0.0027, -0.0008, 46, 9.20, new(24.5, -2.71e-2, 1.11e-4, -6.78e-8)),
        new("#C", "≡C-", "C", 0.0020, 0.0016, 37, 27.38, new(7.87, 2.01e-2, -8.33e-6, 1.39e-9)),

        // Ring increments.
        new("ring-CH2", "-CH2- (ring)", "CH2", 0.0100, 0.0025, 48, 27.15, new(-6.03, 8.54e-2, -8.00e-6, -1.80e-8)),
        new("ring-CH", ">CH- (ring)", "CH", 0.0122, 0.0004, 38, 21.78, new(-20.5, 1.62e-1, -1.60e-4, 6.24e-8)),
        new("ring-C", ">C< (ring)", "C", 0.0042, 0.0061, 27, 21.32, new(-90.9, 5.57e-1, -9.00e-4, 4.69e-7)),
        new("ring=CH", "=CH- (ring)", "CH", 0.0082, 0.0011, 41, 26.73, new(-2.14, 5.74e-2, -1.64e-6, -1.59e-8)),
        new("ring=C", "=C< (ring)", "C", 0.0143, 0.0008, 32, 31.01, new(-8.25, 1.01e-1, -1.42e-4, 6.78e-8)),

        // Halogen increments.
        new("F", "-F", "F", 0.0111, -0.0057, 27, -0.03, new(26.5, -9.13e-2, 1.91e-4, -1.03e-7)),
        new("Cl", "-Cl", "Cl", 0.0105, -0.0049, 58, 38.13, new(33.3, -9.63e-2, 1.87e-4, -9.96e-8)),
        new("Br", "-Br", "Br", 0.0133, 0.0057, 71, 66.86, new(28.6, -6.49e-2, 1.36e-4, -7.45e-8)),
        new("I", "-I", "I", 0.0068, -0.0034, 97, 93.84, new(32.1, -6.41e-2, 1.26e-4, -6.87e-8)),

        // Oxygen increments.
        new("OH", "-OH (alcohol)", "OH", 0.0741, 0.0112, 28, 92.88, new(25.7, -6.91e-2, 1.77e-4, -9.88e-8)),
        // The phenol -OH has a negative vc in the table (from memory, and recalled as unusual).
        new("phenol-OH", "-OH (phenol)", "OH", 0.0240, 0.0184, -25, 76.34, new(-2.81, 1.11e-1, -1.16e-4, 4.94e-8)),
        new("O", "-O- (non-ring)", "O", 0.0168, 0.0015, 18, 22.42, new(25.5, -6.32e-2, 1.11e-4, -5.48e-8)),
        new("ring-O", "-O- (ring)", "O", 0.0098, 0.0048, 13, 31.22, new(12.2, -1.26e-2, 6.03e-5, -3.86e-8)),
        new("C=O", ">C=O (non-ring)", "CO", 0.0380, 0.0031, 62, 76.75, new(6.45, 6.70e-2, -3.57e-5, 2.86e-9)),
        // cp° terms of the ring ketone group: from memory, less sure than the rest.
        new("ring-C=O", ">C=O (ring)", "CO", 0.0284, 0.0028, 55, 94.97, new(30.4, -8.29e-2, 2.36e-4, -1.31e-7)),
        new("CHO", "O=CH- (aldehyde)", "CHO", 0.0379, 0.0030, 82, 72.24, new(30.9, -3.36e-2, 1.60e-4, -9.88e-8)),
        new("COOH", "-COOH (acid)", "CHO2", 0.0791, 0.0077, 89, 169.09, new(24.1, 4.27e-2, 8.04e-5, -6.87e-8)),
        new("COO", "-COO- (ester)", "CO2", 0.0481, 0.0005, 82, 81.10, new(24.5, 4.02e-2, 4.02e-5, -4.52e-8)),
        // Oxygen double-bonded other than in the groups above; tb is negative in the table (from memory).
        new("=O", "=O (other than above)", "O", 0.0143, 0.0101, 36, -10.50, new(6.82, 1.96e-2, 1.27e-5, -1.78e-8)),

        // Nitrogen increments.
        new("NH2", "-NH2", "NH2", 0.0243, 0.0109, 38, 73.23, new(26.9, -4.12e-2, 1.64e-4, -9.76e-8)),
        new("NH", ">NH (non-ring)", "NH", 0.0295, 0.0077, 35, 50.17, new(-1.21, 7.62e-2, -4.86e-5, 1.05e-8)),
        new("ring-NH", ">NH (ring)", "NH", 0.0130, 0.0114, 29, 52.82, new(11.8, -2.30e-2, 1.07e-4, -6.28e-8)),
        new("N", ">N- (non-ring)", "N", 0.0169, 0.0074, 9, 11.74, new(-31.1, 2.27e-1, -3.20e-4, 1.46e-7)),
        // The non-ring -N= has blanks for vc and cp° in the table (from memory).
        new("=N", "-N= (non-ring)", "N", 0.0255, -0.0099, null, 74.60, null),
        // cp° terms of the ring -N=: from memory, less sure than the rest.
        new("ring=N", "-N= (ring)", "N", 0.0085, 0.0076, 34, 57.55, new(8.83, -3.84e-3, 4.35e-5, -2.60e-8)),
        // =NH has blanks for tc, pc and vc in the table; its cp° terms are from memory, less sure.
        new("=NH", "=NH", "NH", null, null, null, 83.08, new(5.69, -4.12e-3, 1.28e-4, -8.88e-8)),
        new("CN", "-CN", "CN", 0.0496, -0.0101, 91, 125.66, new(36.5, -7.33e-2, 1.84e-4, -1.03e-7)),
        // cp° terms of -NO2: from memory, less sure than the rest.
        new("NO2", "-NO2", "NO2", 0.0437, 0.0064, 91, 152.54, new(25.9, -3.74e-3, 1.29e-4, -8.88e-8)),

        // Sulfur increments.
        new("SH", "-SH", "SH", 0.0031, 0.0084, 63, 63.56, new(35.3, -7.58e-2, 1.85e-4, -1.03e-7)),
        new("S", "-S- (non-ring)", "S", 0.0119, 0.0049, 54, 68.78, new(19.6, -5.61e-3, 4.02e-5, -2.76e-8)),
        new("ring-S", "-S- (ring)", "S", 0.0019, 0.0051, 38, 52.10, new(16.7, 4.81e-3, 2.77e-5, -2.11e-8)),
    ];

    /// <summary>Finds a group by identifier, case-insensitively.</summary>
    public static bool TryFindGroup(string id, out JobackGroup? group)
    {
        group = Groups.FirstOrDefault(g => string.Equals(g.Id, id, StringComparison.OrdinalIgnoreCase));
        return group is not null;
    }

    /// <summary>The element counts of a molecule given as (group, count) pairs.</summary>
    public static IReadOnlyDictionary<string, int> Composition(IReadOnlyList<(JobackGroup Group, int Count)> groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var counts = new SortedDictionary<string, int>(StringComparer.Ordinal);
        foreach (var (group, count) in groups)
        {
            foreach (var (element, n) in group.Composition)
            {
                counts[element] = counts.GetValueOrDefault(element) + n * count;
            }
        }

        return counts;
    }

    /// <summary>Estimates for a molecule given as (group, count) pairs.</summary>
    /// <param name="groups">The molecule's groups with their counts (each count 1 … <see cref="MaximumCount"/>).</param>
    /// <param name="measuredBoilingPoint">A measured normal boiling point in K, used in the Tc
    /// relation instead of the estimated one (the method's recommendation), or null.</param>
    /// <exception cref="InvalidInputException">No groups, a count out of range, a non-positive
    /// boiling point, or an estimated Tb, Tc, Pc or Vc that is not positive and finite (the sums of
    /// a group list that is no molecule can leave the relations' domain).</exception>
    public static JobackEstimate Estimate(IReadOnlyList<(JobackGroup Group, int Count)> groups, double? measuredBoilingPoint = null)
    {
        ArgumentNullException.ThrowIfNull(groups);
        if (groups.Count == 0)
        {
            throw new InvalidInputException("groups", 0, "the Joback method needs at least one group");
        }

        foreach (var (group, count) in groups)
        {
            if (count < 1 || count > MaximumCount)
            {
                throw new InvalidInputException("groups", count, $"group {group.Id} has count {count}; counts must be from 1 to {MaximumCount}");
            }
        }

        if (measuredBoilingPoint is double tbMeasured)
        {
            Preconditions.Positive(tbMeasured, "normal boiling point");
        }

        string list = string.Join(", ", groups.Select(g => $"{g.Count} {g.Group.Description}"));
        double? Sum(Func<JobackGroup, double?> value)
        {
            double total = 0;
            foreach (var (group, count) in groups)
            {
                if (value(group) is not double v)
                {
                    return null;
                }

                total += count * v;
            }

            return total;
        }

        var composition = Composition(groups);
        int atoms = composition.Values.Sum();
        double tb = Positive(198 + Sum(g => g.Tb)!.Value, "normal boiling point", list);
        double tbForTc = measuredBoilingPoint ?? tb;
        double? tc = Sum(g => g.Tc) is double sumTc
            ? Positive(tbForTc / (0.584 + 0.965 * sumTc - sumTc * sumTc), "critical temperature", list)
            : null;
        double? pc = Sum(g => g.Pc) is double sumPc
            ? Positive(1e5 * Math.Pow(0.113 + 0.0032 * atoms - sumPc, -2), "critical pressure", list)
            : null;
        double? vc = Sum(g => g.Vc) is double sumVc ? Positive(1e-6 * (17.5 + sumVc), "critical volume", list) : null;
        string source = $"estimated by the Joback group-contribution method (Joback & Reid 1987), groups: {list}; group values from memory";
        IdealGasHeatCapacity? cp = null;
        if (Sum(g => g.HeatCapacity?.A) is double sa)
        {
            double a = sa - 37.93;
            double b = Sum(g => g.HeatCapacity?.B)!.Value + 0.210;
            double c = Sum(g => g.HeatCapacity?.C)!.Value - 3.91e-4;
            double d = Sum(g => g.HeatCapacity?.D)!.Value + 2.06e-7;
            const double R = Constants.GasConstant;
            cp = new IdealGasHeatCapacity(
                [(a / R, 0), (b / R, 1), (c / R, 2), (d / R, 3)], 1, [],
                HeatCapacityMinimumTemperature, HeatCapacityMaximumTemperature, source);
        }

        return new JobackEstimate(tb, tc, pc, vc, cp, composition, groups.ToArray(), list, source, measuredBoilingPoint is not null);
    }

    // Group sums of a list that is no molecule (say, many -OH and nothing else) can make the
    // denominators of the Tc and Pc relations zero or negative; refuse rather than return the number.
    private static double Positive(double value, string what, string list)
        => value > 0 && double.IsFinite(value)
            ? value
            : throw new InvalidInputException("groups", value, $"the Joback {what} of the groups {list} is {Preconditions.Format(value)}, not a positive number: check the group list");
}
