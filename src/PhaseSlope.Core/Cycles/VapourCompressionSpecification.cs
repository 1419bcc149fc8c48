using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Cycles;

/// <summary>A simple (single-stage, subcritical) vapour-compression cycle as an engineer states it.</summary>
/// <param name="EvaporatingTemperature">Saturation temperature in the evaporator, K.</param>
/// <param name="CondensingTemperature">Saturation temperature in the condenser, K (above the evaporating one).</param>
/// <param name="Superheat">Evaporator-outlet superheat above the evaporating temperature, K (0 for saturated vapour).</param>
/// <param name="Subcooling">Condenser-outlet subcooling below the condensing temperature, K (0 for saturated liquid).</param>
/// <param name="IsentropicEfficiency">Compressor isentropic efficiency (h2s − h1)/(h2 − h1), in (0, 1].</param>
public sealed record VapourCompressionSpecification(double EvaporatingTemperature, double CondensingTemperature, double Superheat, double Subcooling,
    double IsentropicEfficiency)
{
    /// <summary>Checks what can be checked without a fluid.</summary>
    /// <exception cref="InvalidInputException">A temperature not positive, the evaporating temperature
    /// not below the condensing one, a negative or non-finite superheat or subcooling, an
    /// efficiency outside (0, 1].</exception>
    public void Validate()
    {
        Preconditions.Positive(EvaporatingTemperature, "evaporating temperature");
        Preconditions.Positive(CondensingTemperature, "condensing temperature");
        if (!(EvaporatingTemperature < CondensingTemperature))
        {
            var (e, c) = Preconditions.Apart(EvaporatingTemperature, CondensingTemperature);
            throw new InvalidInputException("evaporating temperature", EvaporatingTemperature,
                $"the evaporating temperature {e} K must be below the condensing temperature {c} K");
        }

        foreach (var (value, field) in new[] { (Superheat, "superheat"), (Subcooling, "subcooling") })
        {
            if (!(value >= 0) || !double.IsFinite(value))
            {
                throw new InvalidInputException(field, value, $"the {field} must be a finite temperature difference of 0 K or more, got {Preconditions.Format(value)} K");
            }
        }

        if (!(IsentropicEfficiency > 0 && IsentropicEfficiency <= 1))
        {
            throw new InvalidInputException("efficiency", IsentropicEfficiency,
                $"the compressor's isentropic efficiency must be above 0 and at most 1, got {Preconditions.Format(IsentropicEfficiency)}");
        }
    }
}
