using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Estimation;

/// <summary>Lydersen's group-contribution method for the critical constants (A. L. Lydersen,
/// "Estimation of critical properties of organic compounds", Univ. Wisconsin Coll. Eng., Eng. Exp.
/// Stn. Rept. 3, Madison (1955)), used here as an independent cross-check of Joback's Tc and Pc on
/// the same groups.</summary>
/// <remarks>
/// Tc = Tb / (0.567 + ΣΔT − (ΣΔT)²); Pc [atm] = M / (0.34 + ΣΔP)² with M in g/mol;
/// Vc [cm³/mol] = 40 + ΣΔV. Increments as tabulated in Reid, Prausnitz &amp; Sherwood, The Properties
/// of Gases and Liquids, 3rd ed. (1977), Table 2-1 (from memory). Joback's groups are a refit of
/// Lydersen's structural groups, so the two share a group list; the relations differ (Lydersen's
/// Pc follows the molar mass, Joback's the number of atoms), and where the two disagree widely at
/// least one is far off. Average errors quoted for Lydersen's method (same book, from memory):
/// about 2 % in Tc (with a measured Tb), 4 % in Pc, 2–4 % in Vc. The increments the book printed
/// in parentheses (fitted to few compounds) are marked below; Joback groups without a Lydersen
/// increment recalled reliably give no cross-check.
/// </remarks>
public static class Lydersen
{
    /// <summary>The increments (ΔT, ΔP, ΔV in cm³/mol; see <see cref="LydersenIncrement"/>) by
    /// Joback group identifier.</summary>
    /// <remarks>Every value from memory (Reid, Prausnitz &amp; Sherwood, 3rd ed., Table 2-1); "few
    /// data" marks a value printed in parentheses there. Groups absent here: the ring >C&lt; (its
    /// increments not recalled reliably), the non-ring −N= and =NH, and the ring −N= (not in the
    /// table as recalled).</remarks>
    public static IReadOnlyDictionary<string, LydersenIncrement> Increments { get; } = new Dictionary<string, LydersenIncrement>(StringComparer.OrdinalIgnoreCase)
    {
        // Non-ring carbon.
        ["CH3"] = new(0.020, 0.227, 55),
        ["CH2"] = new(0.020, 0.227, 55),
        ["CH"] = new(0.012, 0.210, 51),
        ["C"] = new(0.000, 0.210, 41),
        ["=CH2"] = new(0.018, 0.198, 45),
        ["=CH"] = new(0.018, 0.198, 45),
        ["=C"] = new(0.000, 0.198, 36),
        ["=C="] = new(0.000, 0.198, 36),
        ["#CH"] = new(0.005, 0.153, 36), // ΔV few data
        ["#C"] = new(0.005, 0.153, 36), // ΔV few data

        // Ring carbon.
        ["ring-CH2"] = new(0.013, 0.184, 44.5),
        ["ring-CH"] = new(0.012, 0.192, 46),
        ["ring=CH"] = new(0.011, 0.154, 37),
        ["ring=C"] = new(0.011, 0.154, 36),

        // Halogens.
        ["F"] = new(0.018, 0.224, 18),
        ["Cl"] = new(0.017, 0.320, 49),
        ["Br"] = new(0.010, 0.50, 70), // ΔP, ΔV few data
        ["I"] = new(0.012, 0.83, 95), // ΔP, ΔV few data

        // Oxygen.
        ["OH"] = new(0.082, 0.06, 18), // ΔV few data
        ["phenol-OH"] = new(0.031, -0.02, 3), // ΔP, ΔV few data
        ["O"] = new(0.021, 0.16, 20),
        ["ring-O"] = new(0.014, 0.12, 8), // few data
        ["C=O"] = new(0.040, 0.29, 60),
        ["ring-C=O"] = new(0.033, 0.2, 50), // few data
        ["CHO"] = new(0.048, 0.33, 73),
        ["COOH"] = new(0.085, 0.4, 80), // ΔP few data
        ["COO"] = new(0.047, 0.47, 80),
        ["=O"] = new(0.02, 0.12, 11), // few data

        // Nitrogen.
        ["NH2"] = new(0.031, 0.095, 28),
        ["NH"] = new(0.031, 0.135, 37), // ΔV few data
        ["ring-NH"] = new(0.024, 0.09, 27), // few data
        ["N"] = new(0.014, 0.17, 42), // ΔV few data
        ["CN"] = new(0.060, 0.36, 80), // few data
        ["NO2"] = new(0.055, 0.42, 78), // few data

        // Sulfur.
        ["SH"] = new(0.015, 0.27, 55),
        ["S"] = new(0.015, 0.27, 55),
        ["ring-S"] = new(0.008, 0.24, 45), // few data
    };

    /// <summary>Lydersen's Tc, Pc and Vc for a molecule given by its Joback groups, or the groups
    /// that have no Lydersen increment.</summary>
    /// <param name="groups">The groups with their counts.</param>
    /// <param name="boilingPoint">The normal boiling point, K (measured, or Joback's estimate).</param>
    /// <param name="molarMass">The molar mass, kg/mol.</param>
    /// <exception cref="InvalidInputException">A non-positive input, or a Tc or Pc that is not
    /// positive and finite (group sums of a list that is no molecule).</exception>
    public static LydersenEstimate Estimate(IReadOnlyList<(JobackGroup Group, int Count)> groups, double boilingPoint, double molarMass)
    {
        ArgumentNullException.ThrowIfNull(groups);
        Preconditions.Positive(boilingPoint, "normal boiling point");
        Preconditions.Positive(molarMass, "molar mass");
        var missing = groups.Where(g => !Increments.ContainsKey(g.Group.Id)).Select(g => g.Group.Id).ToList();
        if (groups.Count == 0 || missing.Count > 0)
        {
            return new LydersenEstimate(null, null, null, groups.Count == 0 ? "no groups" : $"no Lydersen increment for {string.Join(", ", missing)}");
        }

        double sumT = groups.Sum(g => g.Count * Increments[g.Group.Id].T);
        double sumP = groups.Sum(g => g.Count * Increments[g.Group.Id].P);
        double sumV = groups.Sum(g => g.Count * Increments[g.Group.Id].V);
        double tc = boilingPoint / (0.567 + sumT - sumT * sumT);
        double pcAtm = molarMass * 1000 / ((0.34 + sumP) * (0.34 + sumP));
        double pc = pcAtm * Constants.StandardAtmosphere;
        double vc = (40 + sumV) * 1e-6;
        if (!(tc > 0 && double.IsFinite(tc) && pc > 0 && double.IsFinite(pc) && vc > 0))
        {
            throw new InvalidInputException("groups", tc, $"Lydersen's relations give no positive Tc, Pc and Vc for these groups (Tc {Preconditions.Format(tc)} K, Pc {Preconditions.Format(pc)} Pa): check the group list");
        }

        return new LydersenEstimate(tc, pc, vc, null);
    }
}
