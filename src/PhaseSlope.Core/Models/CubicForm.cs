using MathNet.Numerics.RootFinding;

namespace PhaseSlope.Core.Models;

/// <summary>The shape of a two-parameter cubic equation of state,
/// P = RT/(v − b) − a·α(T)/((v + δ1·b)(v + δ2·b)), fixed by δ1 and δ2, with the
/// dimensionless constants Ωa = a·Pc/(R·Tc)², Ωb = b·Pc/(R·Tc) and the critical
/// compressibility Zc that follow from the critical conditions.</summary>
/// <remarks>
/// Ωa, Ωb and Zc are not typed-in rounded constants: they are solved from the requirement that
/// the cubic in Z, Z³ + [(u − 1)B − 1]Z² + [A + (w − u)B² − uB]Z − [AB + wB²(1 + B)] = 0 with
/// u = δ1 + δ2 and w = δ1·δ2, has a triple root at the critical point. Matching coefficients
/// with (Z − Zc)³ gives Zc = [1 − (u − 1)B]/3, A = 3Zc² + uB − (w − u)B², and one equation in
/// B alone, AB + wB²(1 + B) − Zc³ = 0, solved here to machine precision. So every model
/// reproduces its input Tc and Pc to rounding error.
/// </remarks>
public sealed class CubicForm
{
    private CubicForm(string name, double delta1, double delta2)
    {
        Name = name;
        Delta1 = delta1;
        Delta2 = delta2;
        double u = delta1 + delta2;
        double w = delta1 * delta2;
        double Residual(double b)
        {
            double zc = (1 - (u - 1) * b) / 3;
            double a = 3 * zc * zc + u * b - (w - u) * b * b;
            return a * b + w * b * b * (1 + b) - zc * zc * zc;
        }

        // The residual is −Zc³ < 0 at B = 0 and positive by B = 0.3 for every form used here.
        OmegaB = Brent.FindRoot(Residual, 1e-6, 0.3, 1e-17, 200);
        CriticalCompressibility = (1 - (u - 1) * OmegaB) / 3;
        OmegaA = 3 * CriticalCompressibility * CriticalCompressibility + u * OmegaB - (w - u) * OmegaB * OmegaB;
    }

    /// <summary>van der Waals (1873): δ1 = δ2 = 0; Zc = 3/8.</summary>
    public static CubicForm VanDerWaals { get; } = new("van der Waals", 0, 0);

    /// <summary>Redlich–Kwong (1949), also the form of Soave–Redlich–Kwong: δ1 = 1, δ2 = 0; Zc = 1/3.</summary>
    public static CubicForm RedlichKwong { get; } = new("Redlich-Kwong", 1, 0);

    /// <summary>Peng–Robinson (1976): δ1 = 1 + √2, δ2 = 1 − √2; Zc = 0.30740…</summary>
    public static CubicForm PengRobinson { get; } = new("Peng-Robinson", 1 + Math.Sqrt(2), 1 - Math.Sqrt(2));

    /// <summary>Name of the form.</summary>
    public string Name { get; }

    /// <summary>δ1 of the attractive denominator.</summary>
    public double Delta1 { get; }

    /// <summary>δ2 of the attractive denominator.</summary>
    public double Delta2 { get; }

    /// <summary>Ωa = a(Tc)·Pc/(R·Tc)².</summary>
    public double OmegaA { get; }

    /// <summary>Ωb = b·Pc/(R·Tc).</summary>
    public double OmegaB { get; }

    /// <summary>Critical compressibility factor Zc = Pc·vc/(R·Tc) of the form.</summary>
    public double CriticalCompressibility { get; }
}
