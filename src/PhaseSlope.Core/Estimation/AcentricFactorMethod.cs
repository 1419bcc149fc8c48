namespace PhaseSlope.Core.Estimation;

/// <summary>Published ways to obtain the acentric factor from Tc, Pc and one vapour pressure.</summary>
public enum AcentricFactorMethod
{
    /// <summary>Pitzer's definition, ω = −1 − log10(Psat/Pc) at T/Tc = 0.7 (Pitzer et al., J. Am.
    /// Chem. Soc. 77, 3433 (1955)); the vapour pressure must be given at T/Tc = 0.7.</summary>
    Definition,

    /// <summary>Edmister (1958): log10(Psat/Pc) taken linear in Tc/T between the given point and the
    /// critical point, read at T/Tc = 0.7: ω = (3/7)·θ/(1 − θ)·log10(Pc/Psat) − 1 with θ = T/Tc.</summary>
    Edmister,

    /// <summary>Lee &amp; Kesler, AIChE J. 21, 510 (1975): ln(Psat/Pc) = f0(Tr) + ω·f1(Tr).</summary>
    LeeKesler,

    /// <summary>Ambrose &amp; Walton, Pure Appl. Chem. 61, 1395 (1989): ln(Psat/Pc) = f0 + ω·f1 + ω²·f2.</summary>
    AmbroseWalton,
}
