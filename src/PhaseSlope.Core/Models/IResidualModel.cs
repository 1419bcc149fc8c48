namespace PhaseSlope.Core.Models;

/// <summary>A thermodynamic model as the solvers, the property layer and the derivative engine
/// see it: the molar residual Helmholtz energy a_r(T, ρ, n) and its derivatives, the highest
/// density it admits, its critical point, and its density roots at a given (T, P).</summary>
/// <remarks>
/// <para>Composition is part of every signature: <c>amounts</c> are the amounts of substance
/// n_i (mol, any positive scale; only the mole fractions n_i/Σn matter to molar quantities). A
/// pure fluid is the one-component case, <see cref="Composition.Pure"/>. Molar quantities are
/// per mole of the whole mixture; the density argument is the total molar density Σn/V.</para>
/// <para>Everything else (pressure, fugacity, caloric properties, heat capacities, sound speed,
/// every (∂X/∂Y)_Z, coexistence) is derived from <see cref="Residual"/> and
/// <see cref="LnFugacityCoefficients"/> by code that never looks at the model's formula. A new
/// model, cubic or not, is one class implementing this interface; the cubic family is
/// <see cref="CubicModel"/>. <see cref="DensityRoots"/> has a default implementation (Newton on
/// P(ρ) from the ideal-gas and the close-packed ends) that a model with a closed form overrides.</para>
/// </remarks>
public interface IResidualModel
{
    /// <summary>What the model is: equation, alpha function, volume shift. Every result names it.</summary>
    ModelIdentity Identity { get; }

    /// <summary>Number of components the model describes (1 for a pure fluid).</summary>
    int ComponentCount { get; }

    /// <summary>The molar residual Helmholtz energy and its T and ρ derivatives at
    /// (<paramref name="temperature"/> K, <paramref name="density"/> mol/m³, <paramref name="amounts"/>).</summary>
    /// <remarks>Valid for T &gt; 0 and 0 &lt; ρ &lt; <see cref="DensityBound"/>. This is the
    /// "model evaluation" that the solvers count and that benchmarks use as their unit of cost.</remarks>
    HelmholtzDerivatives Residual(double temperature, double density, ReadOnlySpan<double> amounts);

    /// <summary>ln φ_i of every component at (T, ρ, n), written into <paramref name="lnFugacityCoefficients"/>
    /// (length <see cref="ComponentCount"/>); the composition derivative of n·a_r.</summary>
    void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients);

    /// <summary>The highest molar density the model admits at this composition (exclusive), mol/m³.</summary>
    double DensityBound(ReadOnlySpan<double> amounts);

    /// <summary>The model's critical point at this composition. For a pure fluid it is part of
    /// the model's definition (a cubic reproduces its input Tc and Pc exactly).</summary>
    ModelCriticalPoint CriticalPoint(ReadOnlySpan<double> amounts);

    /// <summary>The mechanically stable density roots of P(T, ρ, n) = <paramref name="pressure"/>,
    /// written into <paramref name="roots"/> (length at least 2) in increasing density; returns
    /// how many there are (0, 1 or 2).</summary>
    /// <remarks>Two roots below the critical temperature where the isotherm has a loop and the
    /// pressure lies between its spinodal pressures (the lower is the vapour, the upper the
    /// liquid); one otherwise. Overridden by models with a closed form (the cubic); the default
    /// (<see cref="DefaultDensityRoots"/>) costs a few <see cref="Residual"/> evaluations per root.</remarks>
    int DensityRoots(double temperature, double pressure, ReadOnlySpan<double> amounts, Span<double> roots)
        => DefaultDensityRoots.Find(this, temperature, pressure, amounts, roots);
}
