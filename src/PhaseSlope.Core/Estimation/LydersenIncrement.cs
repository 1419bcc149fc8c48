namespace PhaseSlope.Core.Estimation;

/// <summary>One group's increments in Lydersen's method.</summary>
/// <param name="T">ΔT, dimensionless (in Tc = Tb/(0.567 + ΣΔT − (ΣΔT)²)).</param>
/// <param name="P">ΔP (in Pc [atm] = M/(0.34 + ΣΔP)², M in g/mol).</param>
/// <param name="V">ΔV, cm³/mol (in Vc = 40 + ΣΔV).</param>
public readonly record struct LydersenIncrement(double T, double P, double V);
