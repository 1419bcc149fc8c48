namespace PhaseSlope.Core.Models;

/// <summary>Temperature dependence α(T) of the attraction parameter a·α(T) of a cubic model.</summary>
/// <remarks>An implementation is one small class: α and its first two derivatives in T are all
/// the property engine needs.</remarks>
public interface IAlphaFunction
{
    /// <summary>Short description with the published source, for reports.</summary>
    string Description { get; }

    /// <summary>α, dα/dT and d²α/dT² at temperature <paramref name="temperature"/> in K.</summary>
    AlphaValue Evaluate(double temperature);

    /// <summary>d³α/dT³ at <paramref name="temperature"/> in K, 1/K³: the temperature sensitivity of
    /// α″ that the exact uncertainty of cv and cp needs (∂α″/∂Tc = −(2α″ + T·α‴)/Tc for an α of T/Tc).</summary>
    double ThirdDerivative(double temperature);
}
