using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>Default standard uncertainties of Tc, Pc and ω for a family of fluids, used where a
/// fluid file states none.</summary>
/// <param name="Family">The family as written on a fluid file's <c>family</c> line.</param>
/// <param name="CriticalTemperature">u(Tc) in K.</param>
/// <param name="CriticalPressureRelative">u(Pc)/Pc.</param>
/// <param name="AcentricFactor">u(ω).</param>
/// <param name="Basis">Why these values (common practice, from memory).</param>
public sealed record FamilyDefault(string Family, double CriticalTemperature, double CriticalPressureRelative, double AcentricFactor, string Basis);

/// <summary>The uncertainties of a fluid's critical constants and acentric factor: the file's own
/// where it states one (<c>value unit ± u | source</c>), else a documented default by family.</summary>
/// <remarks>The defaults are this tool's reading of common practice, from memory, not values
/// from one review: critical-property reviews of the IUPAC series (Ambrose, Tsonopoulos, Young
/// and co-authors, J. Chem. Eng. Data 1995–2000s) typically recommend Tc to a few tenths of a
/// kelvin and Pc to 0.5–1 % for well-studied stable hydrocarbons, better for gases and
/// refrigerants measured for reference equations, and worse (about 1 K, 1–2 %) for alcohols and
/// other compounds that decompose or associate near their critical point. ω is derived from
/// the vapour pressure at Tr = 0.7 and Pc, so u(ω) ≈ u(ln Psat)/ln 10 plus the share of u(Pc):
/// about 0.005 for well-measured fluids, 0.01 for polar ones. Values estimated by a method
/// (source beginning "estimated by") get the method's typical error instead (Joback Tc about
/// 1 %, Pc about 5 %, common practice). docs/uncertainty.md lists the table.</remarks>
public static class FamilyUncertainty
{
    private const string Reviews = "common practice for critical-property reviews, from memory";

    private static readonly FamilyDefault[] Table =
    [
        new("alkane", 0.3, 0.005, 0.005, $"stable, well-studied hydrocarbons: u(Tc) 0.3 K, u(Pc) 0.5 %, u(omega) 0.005 ({Reviews})"),
        new("alkene", 0.3, 0.005, 0.005, $"stable hydrocarbons: u(Tc) 0.3 K, u(Pc) 0.5 %, u(omega) 0.005 ({Reviews})"),
        new("cycloalkane", 0.3, 0.005, 0.005, $"stable hydrocarbons: u(Tc) 0.3 K, u(Pc) 0.5 %, u(omega) 0.005 ({Reviews})"),
        new("aromatic", 0.3, 0.005, 0.005, $"stable hydrocarbons: u(Tc) 0.3 K, u(Pc) 0.5 %, u(omega) 0.005 ({Reviews})"),
        new("hydrofluorocarbon", 0.1, 0.003, 0.005, $"refrigerants measured for reference equations: u(Tc) 0.1 K, u(Pc) 0.3 %, u(omega) 0.005 ({Reviews})"),
        new("hydrochlorofluorocarbon", 0.1, 0.003, 0.005, $"refrigerants measured for reference equations: u(Tc) 0.1 K, u(Pc) 0.3 %, u(omega) 0.005 ({Reviews})"),
        new("hydrofluoroolefin", 0.1, 0.003, 0.005, $"refrigerants measured for reference equations: u(Tc) 0.1 K, u(Pc) 0.3 %, u(omega) 0.005 ({Reviews})"),
        new("hydrochlorofluoroolefin", 0.1, 0.003, 0.005, $"refrigerants measured for reference equations: u(Tc) 0.1 K, u(Pc) 0.3 %, u(omega) 0.005 ({Reviews})"),
        new("refrigerant", 0.1, 0.003, 0.005, $"refrigerants measured for reference equations: u(Tc) 0.1 K, u(Pc) 0.3 %, u(omega) 0.005 ({Reviews})"),
        new("inorganic", 0.1, 0.002, 0.005, $"small inorganic molecules with reference equations: u(Tc) 0.1 K, u(Pc) 0.2 %, u(omega) 0.005 ({Reviews})"),
        new("noble gas", 0.05, 0.002, 0.003, $"noble gases: u(Tc) 0.05 K, u(Pc) 0.2 %, u(omega) 0.003 ({Reviews})"),
        new("alcohol", 1.0, 0.01, 0.01, $"associating, partly decomposing near Tc: u(Tc) 1 K, u(Pc) 1 %, u(omega) 0.01 ({Reviews})"),
        new("ketone", 0.5, 0.01, 0.01, $"polar organics: u(Tc) 0.5 K, u(Pc) 1 %, u(omega) 0.01 ({Reviews})"),
        new("ether", 0.5, 0.01, 0.01, $"polar organics: u(Tc) 0.5 K, u(Pc) 1 %, u(omega) 0.01 ({Reviews})"),
    ];

    /// <summary>The default for a fluid whose family is missing or not in the table: u(Tc) 1 K,
    /// u(Pc) 2 %, u(ω) 0.02, wide enough for a compound whose critical point was measured once.</summary>
    public static FamilyDefault Unknown { get; } =
        new("unknown", 1.0, 0.02, 0.02, $"family not listed: u(Tc) 1 K, u(Pc) 2 %, u(omega) 0.02 ({Reviews})");

    /// <summary>Typical errors of a group-contribution estimate, for values whose source begins
    /// "estimated by": u(Tc) 1 % of Tc (given here as 1 % × Tc at use), u(Pc) 5 %, u(ω) 0.03
    /// (common practice for Joback and similar methods, from memory).</summary>
    public static FamilyDefault Estimated { get; } =
        new("estimated", double.NaN, 0.05, 0.03, "estimated value: u(Tc) 1 % of Tc, u(Pc) 5 %, u(omega) 0.03 (typical errors of group-contribution estimates, common practice, from memory)");

    /// <summary>Every family default, in the order docs/uncertainty.md lists them.</summary>
    public static IReadOnlyList<FamilyDefault> Defaults => Table;

    /// <summary>The default for a family (case-insensitive), or <see cref="Unknown"/>.</summary>
    public static FamilyDefault For(string? family)
        => family is null ? Unknown
            : Array.Find(Table, f => string.Equals(f.Family, family.Trim(), StringComparison.OrdinalIgnoreCase)) ?? Unknown;

    /// <summary>Tc, Pc and ω of a fluid with their standard uncertainties, in that order.</summary>
    /// <param name="fluid">The fluid.</param>
    /// <returns>Three inputs named critical_temperature_K, critical_pressure_Pa and acentric_factor.</returns>
    public static IReadOnlyList<UncertainInput> CriticalConstants(Fluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        var family = For(fluid.Family);
        double tc = fluid.CriticalTemperature.Value;
        return
        [
            Input("critical_temperature_K", fluid.CriticalTemperature, family, family.CriticalTemperature, 0.01 * tc),
            Input("critical_pressure_Pa", fluid.CriticalPressure, family, family.CriticalPressureRelative * fluid.CriticalPressure.Value,
                Estimated.CriticalPressureRelative * fluid.CriticalPressure.Value),
            Input("acentric_factor", fluid.AcentricFactor, family, family.AcentricFactor, Estimated.AcentricFactor),
        ];
    }

    private static UncertainInput Input(string name, SourcedValue value, FamilyDefault family, double byFamily, double byEstimate)
    {
        if (value.StandardUncertainty is double stated)
        {
            return new UncertainInput(name, value.Value, stated, $"stated in the fluid file: {value.Source}");
        }

        return value.Source.StartsWith("estimated", StringComparison.OrdinalIgnoreCase)
            ? new UncertainInput(name, value.Value, byEstimate, $"estimate default ({Estimated.Basis})")
            : new UncertainInput(name, value.Value, byFamily, $"family default ({family.Family}: {family.Basis})");
    }
}
