using System.Globalization;

namespace PhaseSlope.Core.Fluids;

/// <summary>Which two phases a published solid line separates.</summary>
public enum SolidLineKind
{
    /// <summary>Solid and liquid: the melting (fusion) pressure.</summary>
    Melting,

    /// <summary>Solid and vapour: the sublimation pressure.</summary>
    Sublimation,
}

/// <summary>The algebraic form of a published solid line, with θ = T/T_r and π = P/P_r reduced
/// by the equation's own reference point (usually the triple point).</summary>
/// <remarks>
/// <list type="table">
/// <item><term>Melting, <see cref="Powers"/></term><description>π = 1 + Σ a_i (θ^b_i − 1): the
/// Simon–Glatzel equation (one term) and the IAPWS (2011) melting equation of ice Ih.</description></item>
/// <item><term>Melting, <see cref="Excess"/></term><description>π = 1 + Σ a_i (θ − 1)^b_i: the
/// melting equations published with several reference equations of state (carbon dioxide,
/// Span and Wagner 1996).</description></item>
/// <item><term>Sublimation, <see cref="Powers"/></term><description>ln π = θ⁻¹ Σ a_i θ^b_i: the
/// IAPWS (2011) sublimation equation of ice Ih.</description></item>
/// <item><term>Sublimation, <see cref="Excess"/></term><description>ln π = θ⁻¹ Σ a_i (1 − θ)^b_i:
/// the Wagner-type sublimation equations (carbon dioxide, Span and Wagner 1996).</description></item>
/// </list>
/// </remarks>
public enum SolidLineForm
{
    /// <summary>Sums of powers of θ.</summary>
    Powers,

    /// <summary>Sums of powers of the distance from the reference point, θ − 1 or 1 − θ.</summary>
    Excess,
}

/// <summary>A fluid's published melting or sublimation equation, valid over a stated range.</summary>
/// <param name="Kind">Melting or sublimation.</param>
/// <param name="Form">The algebraic form (see <see cref="SolidLineForm"/>).</param>
/// <param name="ReducingTemperature">T_r in K.</param>
/// <param name="ReducingPressure">P_r in Pa.</param>
/// <param name="Coefficients">a_i.</param>
/// <param name="Exponents">b_i.</param>
/// <param name="LowestTemperature">Lower end of the stated range, K.</param>
/// <param name="HighestTemperature">Upper end of the stated range, K.</param>
/// <param name="Source">The published source.</param>
public sealed record SolidLineEquation(
    SolidLineKind Kind,
    SolidLineForm Form,
    double ReducingTemperature,
    double ReducingPressure,
    IReadOnlyList<double> Coefficients,
    IReadOnlyList<double> Exponents,
    double LowestTemperature,
    double HighestTemperature,
    string Source)
{
    /// <summary>Whether T lies in the stated range (ends included, with a relative allowance of
    /// 1e-12 for temperatures converted from other units).</summary>
    public bool Covers(double temperature)
        => temperature >= LowestTemperature * (1 - 1e-12) && temperature <= HighestTemperature * (1 + 1e-12);

    /// <summary>The pressure in Pa at T in K (the caller keeps T in <see cref="Covers"/>).</summary>
    public double Pressure(double temperature) => Evaluate(temperature).Pressure;

    /// <summary>dP/dT in Pa/K at T in K.</summary>
    public double Slope(double temperature) => Evaluate(temperature).Slope;

    /// <summary>The pressure and its slope dP/dT at T (analytic derivatives of the stated form).</summary>
    public (double Pressure, double Slope) Evaluate(double temperature)
    {
        double theta = temperature / ReducingTemperature;
        // An excess form's base (θ − 1 or 1 − θ) is zero at the reference point; a temperature that
        // rounding puts 1e-12 beyond it (Covers allows that much) is taken as the point itself.
        double excess = Kind == SolidLineKind.Melting ? theta - 1 : 1 - theta;
        if (excess < 0 && excess > -1e-12)
        {
            excess = 0;
        }

        double sum = 0, derivative = 0; // the form's sum and its derivative in θ
        for (int i = 0; i < Coefficients.Count; i++)
        {
            double a = Coefficients[i], b = Exponents[i];
            switch (Kind, Form)
            {
                case (SolidLineKind.Melting, SolidLineForm.Powers):
                    sum += a * (Math.Pow(theta, b) - 1);
                    derivative += a * b * Math.Pow(theta, b - 1);
                    break;
                case (SolidLineKind.Melting, SolidLineForm.Excess):
                    sum += a * Math.Pow(excess, b);
                    derivative += b == 1 ? a : a * b * Math.Pow(excess, b - 1);
                    break;
                case (SolidLineKind.Sublimation, SolidLineForm.Powers):
                    // θ⁻¹ Σ a θ^b = Σ a θ^(b−1).
                    sum += a * Math.Pow(theta, b - 1);
                    derivative += a * (b - 1) * Math.Pow(theta, b - 2);
                    break;
                default:
                    // θ⁻¹ Σ a (1 − θ)^b.
                    sum += a * Math.Pow(excess, b) / theta;
                    derivative += -a * Math.Pow(excess, b) / (theta * theta) - (b == 1 ? a : a * b * Math.Pow(excess, b - 1)) / theta;
                    break;
            }
        }

        if (Kind == SolidLineKind.Melting)
        {
            return (ReducingPressure * (1 + sum), ReducingPressure * derivative / ReducingTemperature);
        }

        double pressure = ReducingPressure * Math.Exp(sum);
        return (pressure, pressure * derivative / ReducingTemperature);
    }

    /// <summary>A one-line description for output, e.g. "melting, P/Pr = 1 + Σ a(θ^b − 1), 251.165–273.16 K".</summary>
    public string Description => string.Create(CultureInfo.InvariantCulture, $"{FormText}, {LowestTemperature:G6}-{HighestTemperature:G6} K");

    private string FormText => (Kind, Form) switch
    {
        (SolidLineKind.Melting, SolidLineForm.Powers) => "P/Pr = 1 + sum a_i((T/Tr)^b_i - 1)",
        (SolidLineKind.Melting, SolidLineForm.Excess) => "P/Pr = 1 + sum a_i(T/Tr - 1)^b_i",
        (SolidLineKind.Sublimation, SolidLineForm.Powers) => "ln(P/Pr) = (Tr/T) sum a_i (T/Tr)^b_i",
        _ => "ln(P/Pr) = (Tr/T) sum a_i (1 - T/Tr)^b_i",
    };
}
