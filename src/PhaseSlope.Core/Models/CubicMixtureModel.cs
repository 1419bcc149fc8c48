using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Models;

/// <summary>Which density root a mixture's fugacities are taken on at given (T, P).</summary>
public enum MixtureRoot
{
    /// <summary>The root of lower Gibbs energy (the only one where there is one).</summary>
    Stable,

    /// <summary>The densest root (the only one where there is one).</summary>
    Liquid,

    /// <summary>The least dense root (the only one where there is one).</summary>
    Vapour,
}

/// <summary>A cubic equation of state for a mixture: the van der Waals one-fluid mixing rules
/// a = ΣΣ x_i x_j √(a_i a_j)(1 − k_ij), b = Σ x_i b_i, and a Péneloux volume translation per
/// component, c = Σ x_i c_i (Péneloux, Rauzy &amp; Fréze, Fluid Phase Equilib. 8, 7 (1982)), with
/// the fugacity coefficients and their composition, temperature and pressure derivatives in
/// closed form.</summary>
/// <remarks>
/// <para>At fixed composition the mixture is the translated cubic of its mixed a(T), b and c, so
/// <see cref="Residual"/> and <see cref="DensityRoots"/> are the pure fluid's formulas
/// (<see cref="CubicModel.Helmholtz"/>, the closed-form roots) with those constants; a
/// one-component mixture is the pure model to rounding.</para>
/// <para>Fugacities follow the reduced residual Helmholtz energy of the whole amount n = Σ n_i in
/// volume V (Michelsen &amp; Mollerup, Thermodynamic Models: Fundamentals and Computational
/// Aspects, 2nd ed. (2007), ch. 3, for the untranslated form):
/// F = A_r/(RT) = −n·ln(V̂ − B) + n·ln V − D(T)/(RT)·h(V̂, B), with B = Σ n_i b_i, C = Σ n_i c_i,
/// V̂ = V + C, D = ΣΣ n_i n_j a_ij(T) and h = ln[(V̂ + δ1B)/(V̂ + δ2B)]/(B(δ1 − δ2)) (= 1/(V̂ + δB)
/// when δ1 = δ2 = δ). Then ln φ_i = (∂F/∂n_i)_{T,V} − ln Z,
/// (∂ln φ_i/∂n_j)_{T,P} = F_ij + 1/n + (∂P/∂n_i)(∂P/∂n_j)/(RT·(∂P/∂V)),
/// (∂ln φ_i/∂T)_{P,n} = F_iT + 1/T − v̄_i·(∂P/∂T)_V/(RT) and (∂ln φ_i/∂P)_{T,n} = v̄_i/(RT) − 1/P,
/// with the partial molar volume v̄_i = −(∂P/∂n_i)_V/(∂P/∂V)_n.</para>
/// </remarks>
public sealed class CubicMixtureModel : IResidualModel
{
    private const double R = Constants.GasConstant;
    private readonly CubicModel[] _components;
    private readonly double[] _kij;  // row-major n×n, symmetric, zero diagonal
    private readonly double _delta1;
    private readonly double _delta2;

    /// <summary>Builds the mixture of pure-component models of one cubic form.</summary>
    /// <param name="components">One model per component, all of the same cubic form (δ1, δ2).</param>
    /// <param name="interaction">The binary interaction parameters k_ij (row-major n×n, symmetric;
    /// the diagonal must be zero), or null for none.</param>
    /// <exception cref="InvalidInputException">No component, mixed cubic forms, or k_ij not
    /// symmetric, with a non-zero diagonal, or not finite.</exception>
    public CubicMixtureModel(IReadOnlyList<CubicModel> components, double[]? interaction = null)
    {
        ArgumentNullException.ThrowIfNull(components);
        if (components.Count == 0)
        {
            throw new InvalidInputException("components", 0, "a mixture needs at least one component");
        }

        var form = components[0].Form;
        if (components.Any(c => c.Form.Delta1 != form.Delta1 || c.Form.Delta2 != form.Delta2))
        {
            throw new InvalidInputException("components", components.Count, "every component of a mixture must use the same cubic form");
        }

        int n = components.Count;
        _components = [.. components];
        _kij = interaction is null ? new double[n * n] : [.. interaction];
        if (_kij.Length != n * n)
        {
            throw new InvalidInputException("kij", _kij.Length, $"{n} components need {n * n} interaction parameters, got {_kij.Length}");
        }

        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                double k = _kij[i * n + j];
                if (!double.IsFinite(k) || k != _kij[j * n + i] || (i == j && k != 0))
                {
                    throw new InvalidInputException("kij", k, $"interaction parameter k[{i},{j}] = {Preconditions.Format(k)}: k_ij must be finite and symmetric with k_ii = 0");
                }
            }
        }

        _delta1 = form.Delta1;
        _delta2 = form.Delta2;
        var first = components[0];
        Identity = new ModelIdentity(first.Identity.Equation, first.Identity.Title, $"each component's own alpha; van der Waals one-fluid mixing with kij", 0);
    }

    /// <inheritdoc />
    public ModelIdentity Identity { get; }

    /// <inheritdoc />
    public int ComponentCount => _components.Length;

    /// <summary>The pure-component models, in component order.</summary>
    public IReadOnlyList<CubicModel> Components => _components;

    /// <summary>k_ij between components i and j.</summary>
    public double Interaction(int i, int j) => _kij[i * _components.Length + j];

    /// <summary>The mixed constants at a composition: Σx_i b_i, Σx_i c_i and a(T) = ΣΣ x_i x_j a_ij
    /// with its first two temperature derivatives.</summary>
    private (double B, double C, double A, double AT, double ATT) Mixed(double temperature, ReadOnlySpan<double> amounts, Span<double> ai = default, Span<double> aiT = default)
    {
        int n = _components.Length;
        RequireAmounts(amounts);
        double total = 0;
        foreach (double x in amounts)
        {
            total += x;
        }

        Span<double> a = stackalloc double[n];
        Span<double> la1 = stackalloc double[n];   // a_i'/a_i
        Span<double> la2 = stackalloc double[n];   // a_i''/a_i − (a_i'/a_i)²
        double b = 0, c = 0;
        for (int i = 0; i < n; i++)
        {
            var model = _components[i];
            var alpha = model.Alpha.Evaluate(temperature);
            a[i] = model.AttractionA * alpha.Value;
            la1[i] = alpha.FirstDerivative / alpha.Value;
            la2[i] = alpha.SecondDerivative / alpha.Value - la1[i] * la1[i];
            double x = amounts[i] / total;
            b += x * model.CovolumeB;
            c += x * model.VolumeShift;
        }

        double am = 0, amT = 0, amTT = 0;
        for (int i = 0; i < n; i++)
        {
            double xi = amounts[i] / total;
            double sum = 0, sumT = 0;
            for (int j = 0; j < n; j++)
            {
                double xj = amounts[j] / total;
                // a_ij = (1 − k_ij)√(a_i a_j); with s = √(a_i a_j): s'/s = (l_i + l_j)/2 and
                // s''/s = ((l_i + l_j)/2)² + (m_i + m_j)/2 (l = a'/a, m = a''/a − l²).
                double s = (1 - _kij[i * n + j]) * Math.Sqrt(a[i] * a[j]);
                double l = 0.5 * (la1[i] + la1[j]);
                double sT = s * l;
                double sTT = s * (l * l + 0.5 * (la2[i] + la2[j]));
                am += xi * xj * s;
                amT += xi * xj * sT;
                amTT += xi * xj * sTT;
                sum += xj * s;
                sumT += xj * sT;
            }

            if (!ai.IsEmpty)
            {
                ai[i] = sum;    // Σ_j x_j a_ij
                aiT[i] = sumT;  // its T-derivative
            }
        }

        return (b, c, am, amT, amTT);
    }

    /// <inheritdoc />
    public HelmholtzDerivatives Residual(double temperature, double density, ReadOnlySpan<double> amounts)
    {
        var (b, c, a, aT, aTT) = Mixed(temperature, amounts);
        double shift = c / b;
        return CubicModel.Helmholtz(temperature, density, b, b - c, _delta1 + shift, _delta2 + shift, a / b, aT / b, aTT / b);
    }

    /// <inheritdoc />
    public double DensityBound(ReadOnlySpan<double> amounts)
    {
        var (b, c, _, _, _) = Mixed(_components[0].CriticalTemperature, amounts);
        return 1 / (b - c);
    }

    /// <inheritdoc />
    /// <remarks>The critical point of a mixture is not a property of the cubic at fixed
    /// composition (its mechanical critical point is not where liquid and vapour of that
    /// composition become one); for one component present it is that component's. With more, it is
    /// located by the criteria of Heidemann &amp; Khalil (1980),
    /// <see cref="Mixtures.CriticalPointCriteria.Locate"/>; where that finds several (a liquid–liquid
    /// critical point besides the liquid–vapour one), the least dense is returned.</remarks>
    /// <exception cref="InvalidInputException">More than one component is present and no critical
    /// point is found (none of positive pressure at volumes from 1.6 to 12 times the covolume).</exception>
    public ModelCriticalPoint CriticalPoint(ReadOnlySpan<double> amounts)
    {
        RequireAmounts(amounts);
        var found = Mixtures.CriticalPointCriteria.Locate(this, amounts.ToArray());
        if (found.Count == 0)
        {
            throw new InvalidInputException("composition", amounts.Length,
                "no mixture critical point found by the Heidemann-Khalil criteria for this composition");
        }

        var point = found[0];
        return new ModelCriticalPoint(point.Temperature, point.Pressure, point.Density);
    }

    /// <inheritdoc />
    public int DensityRoots(double temperature, double pressure, ReadOnlySpan<double> amounts, Span<double> roots)
    {
        var (b, c, a, _, _) = Mixed(temperature, amounts);
        double shift = c / b;
        return CubicRoots.Find(temperature, pressure, b, b - c, _delta1 + shift, _delta2 + shift, a, roots);
    }

    /// <inheritdoc />
    public void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients)
        => Fugacities(temperature, density, amounts, lnFugacityCoefficients, default, default, default);

    /// <summary>ln φ_i at given density (T, ρ, n) and optionally the same derivatives as
    /// <see cref="LnFugacityCoefficientsAtPressure"/> gives, taken at the pressure of that density:
    /// <paramref name="dT"/> (∂ln φ_i/∂T)_{P,n}, <paramref name="dP"/> (∂ln φ_i/∂P)_{T,n} and
    /// <paramref name="dN"/> n·(∂ln φ_i/∂n_j)_{T,P}. An empty span skips a derivative. Used where the
    /// density is the variable (the critical-point criteria at fixed T and V).</summary>
    public void LnFugacityCoefficients(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnFugacityCoefficients,
        Span<double> dT, Span<double> dP = default, Span<double> dN = default)
        => Fugacities(temperature, density, amounts, lnFugacityCoefficients, dT, dP, dN);

    /// <summary>ln φ_i on the chosen density root at (T, P), and optionally their derivatives:
    /// <paramref name="dT"/> (∂ln φ_i/∂T)_{P,n}, <paramref name="dP"/> (∂ln φ_i/∂P)_{T,n} and
    /// <paramref name="dN"/> n·(∂ln φ_i/∂n_j)_{T,P} (row-major n×n, symmetric; scaled by the total
    /// amount so it does not depend on the amounts' scale). An empty span skips a derivative.</summary>
    /// <returns>The molar density of the root used, mol/m³.</returns>
    /// <exception cref="InvalidInputException">No mechanically stable root at (T, P).</exception>
    public double LnFugacityCoefficientsAtPressure(double temperature, double pressure, ReadOnlySpan<double> amounts, MixtureRoot root,
        Span<double> lnFugacityCoefficients, Span<double> dT = default, Span<double> dP = default, Span<double> dN = default)
    {
        Span<double> roots = stackalloc double[2];
        int count = DensityRoots(temperature, pressure, amounts, roots);
        if (count == 0)
        {
            throw new InvalidInputException("pressure", pressure,
                $"no mechanically stable density root of the mixture at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa");
        }

        double density = roots[0];
        if (count == 2)
        {
            density = root switch
            {
                MixtureRoot.Liquid => roots[1],
                MixtureRoot.Vapour => roots[0],
                _ => StableRoot(temperature, pressure, amounts, roots),
            };
        }

        Fugacities(temperature, density, amounts, lnFugacityCoefficients, dT, dP, dN);
        return density;
    }

    /// <summary>Of two roots, the one of lower residual Gibbs energy g_r/RT = Σ x_i ln φ_i.</summary>
    private double StableRoot(double temperature, double pressure, ReadOnlySpan<double> amounts, ReadOnlySpan<double> roots)
    {
        Span<double> lnPhi = stackalloc double[_components.Length];
        return ResidualGibbs(temperature, roots[1], amounts, lnPhi) < ResidualGibbs(temperature, roots[0], amounts, lnPhi) ? roots[1] : roots[0];
    }

    /// <summary>g_r/RT = Σ x_i ln φ_i at (T, ρ, n).</summary>
    private double ResidualGibbs(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnPhi)
    {
        Fugacities(temperature, density, amounts, lnPhi, default, default, default);
        double total = 0, g = 0;
        for (int i = 0; i < amounts.Length; i++)
        {
            total += amounts[i];
            g += amounts[i] * lnPhi[i];
        }

        return g / total;
    }

    /// <summary>The closed-form fugacities and derivatives at (T, ρ, n); see the remarks.</summary>
    private void Fugacities(double temperature, double density, ReadOnlySpan<double> amounts, Span<double> lnPhi, Span<double> dT, Span<double> dP, Span<double> dN)
    {
        int nc = _components.Length;
        Span<double> ai = stackalloc double[nc];
        Span<double> aiT = stackalloc double[nc];
        var (bm, cm, am, amT, _) = Mixed(temperature, amounts, ai, aiT);
        double n = 0;
        foreach (double x in amounts)
        {
            n += x;
        }

        double rt = R * temperature;
        double v = n / density;            // V
        double bb = n * bm;                // B
        double vh = v + n * cm;            // V̂ = V + C
        double d = n * n * am;             // D
        double dTot = n * n * amT;         // D_T
        double u = _delta1 + _delta2, w = _delta1 * _delta2;
        double q = vh * vh + u * bb * vh + w * bb * bb;
        double qV = 2 * vh + u * bb;
        double qB = u * vh + 2 * w * bb;
        double h = _delta1 == _delta2 ? 1 / (vh + _delta1 * bb) : Math.Log((vh + _delta1 * bb) / (vh + _delta2 * bb)) / (bb * (_delta1 - _delta2));
        double hV = -1 / q;
        double hB = -(h + vh * hV) / bb;
        double hVV = qV / (q * q);
        double hVB = qB / (q * q);
        double hBB = -(2 * hB + vh * hVB) / bb;
        double free = vh - bb;             // V̂ − B

        double fVV = n / (free * free) - n / (v * v) - d / rt * hVV;
        double fV = -n / free + n / v - d / rt * hV;
        double fVT = -(dTot / rt - d / (rt * temperature)) * hV;
        double pressure = n * rt / v - rt * fV;
        double pV = -n * rt / (v * v) - rt * fVV;           // (∂P/∂V)_{T,n}
        double pT = pressure / temperature - rt * fVT;      // (∂P/∂T)_{V,n}
        double z = pressure * v / (n * rt);
        double lnZ = Math.Log(z);

        Span<double> fi = stackalloc double[nc];
        Span<double> pi = stackalloc double[nc];            // (∂P/∂n_i)_{T,V}
        for (int i = 0; i < nc; i++)
        {
            var model = _components[i];
            double bi = model.CovolumeB, ci = model.VolumeShift;
            double di = 2 * n * ai[i];                      // D_i = 2 Σ_j n_j a_ij
            double e = ci - bi;
            double inner = hV * ci + hB * bi;
            fi[i] = -Math.Log(free) - n * e / free + Math.Log(v) - (di * h + d * inner) / rt;
            double fiV = -1 / free + n * e / (free * free) + 1 / v - (di * hV + d * (hVV * ci + hVB * bi)) / rt;
            pi[i] = rt / v - rt * fiV;
            lnPhi[i] = fi[i] - lnZ;
            if (!dT.IsEmpty)
            {
                double diT = 2 * n * aiT[i];
                double fiT = -(diT * h + dTot * inner) / rt + (di * h + d * inner) / (rt * temperature);
                double vbar = -pi[i] / pV;
                dT[i] = fiT + 1 / temperature - vbar * pT / rt;
            }

            if (!dP.IsEmpty)
            {
                dP[i] = -pi[i] / pV / rt - 1 / pressure;
            }
        }

        if (dN.IsEmpty)
        {
            return;
        }

        Span<double> pure = stackalloc double[nc];  // a_i(T)
        for (int i = 0; i < nc; i++)
        {
            pure[i] = _components[i].AttractionA * _components[i].Alpha.Evaluate(temperature).Value;
        }

        for (int i = 0; i < nc; i++)
        {
            var mi = _components[i];
            double bi = mi.CovolumeB, ci = mi.VolumeShift, ei = ci - bi, di = 2 * n * ai[i];
            for (int j = 0; j <= i; j++)
            {
                var mj = _components[j];
                double bj = mj.CovolumeB, cj = mj.VolumeShift, ej = cj - bj, dj = 2 * n * ai[j];
                double aij = (1 - _kij[i * nc + j]) * Math.Sqrt(pure[i] * pure[j]);
                double fij = -ej / free - ei / free + n * ei * ej / (free * free)
                    - (2 * aij * h + di * (hV * cj + hB * bj) + dj * (hV * ci + hB * bi)
                       + d * (ci * cj * hVV + (ci * bj + cj * bi) * hVB + bi * bj * hBB)) / rt;
                double value = n * (fij + 1 / n + pi[i] * pi[j] / (rt * pV));
                dN[i * nc + j] = value;
                dN[j * nc + i] = value;
            }
        }
    }

    private void RequireAmounts(ReadOnlySpan<double> amounts)
    {
        if (amounts.Length != _components.Length)
        {
            throw new InvalidInputException("composition", amounts.Length,
                $"this mixture has {_components.Length} components; got a composition of {amounts.Length} amounts");
        }

        double total = 0;
        foreach (double x in amounts)
        {
            if (!(x >= 0) || !double.IsFinite(x))
            {
                throw new InvalidInputException("composition", x, $"amount {Preconditions.Format(x)} is not a finite non-negative number");
            }

            total += x;
        }

        if (!(total > 0))
        {
            throw new InvalidInputException("composition", total, "the amounts of a mixture must not all be zero");
        }
    }
}
