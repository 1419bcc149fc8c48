namespace PhaseSlope.Core.Models;

/// <summary>The alpha functions a model can use.</summary>
public enum AlphaForm
{
    /// <summary>The model's own published alpha function (Soave form with its κ(ω) correlation,
    /// Tr^(−1/2) for Redlich–Kwong, 1 for van der Waals).</summary>
    Default,

    /// <summary>Twu, Bluck, Cunningham &amp; Coon (1991): α = Tr^(N(M−1))·exp[L(1 − Tr^(NM))].</summary>
    Twu,

    /// <summary>Soave (1972) form α = [1 + m(1 − √Tr)]² with the fluid's own fitted slope m (for
    /// example from <c>phaseslope tune</c>) in place of the model's κ(ω) correlation.</summary>
    Soave,

    /// <summary>Mathias &amp; Copeman (1983): α = [1 + c1(1 − √Tr) + c2(1 − √Tr)² + c3(1 − √Tr)³]² below Tc.</summary>
    MathiasCopeman,
}
