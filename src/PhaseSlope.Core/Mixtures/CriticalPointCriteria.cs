using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Critical points of a mixture of fixed composition by the criteria of Heidemann &amp;
/// Khalil, with the cubic form by numerical differentiation as Michelsen suggests.</summary>
/// <remarks>
/// <para>Criteria: R. A. Heidemann and A. M. Khalil, "The calculation of critical points",
/// AIChE J. 26, 769–779 (1980). At a critical point of the feed n (T and V the unknowns) the
/// Helmholtz energy's Hessian in the amounts at fixed T and V, Q_ij = ∂²(A/RT)/∂n_i∂n_j, has a null
/// vector Δn (the quadratic form Δnᵀ·Q·Δn vanishes with Q·Δn = 0), and the cubic form
/// C = Σ_ijk ∂³(A/RT)/∂n_i∂n_j∂n_k Δn_i Δn_j Δn_k vanishes too.</para>
/// <para>Q_ij = δ_ij/n_i + F_ij with the residual part F_ij = (∂²(A_r/RT)/∂n_i∂n_j)_{T,V} taken
/// from the model's closed-form derivatives at (T, P):
/// N·F_ij = N·(∂ln φ_i/∂n_j)_{T,P} − 1 − N·P_i P_j/(RT·P_V), with P_i = (∂P/∂n_i)_{T,V} =
/// −P_V·RT·[(∂ln φ_i/∂P)_T + 1/P] and P_V = (∂P/∂V)_{T,n}.</para>
/// <para>Solution, after M. L. Michelsen, "Calculation of critical points and phase boundaries
/// in the critical region", Fluid Phase Equilib. 16, 57–76 (1984): scale B_ij = √(n_i n_j)·Q_ij
/// (Σ n_i = 1 mol); at fixed V the temperature where B's smallest eigenvalue is zero is found
/// (scanning down from 2·max Tc_i, then Brent), Δn_i = √n_i·u_i from its unit eigenvector u, and
/// C = [Δnᵀ Q(n + εΔn) Δn − Δnᵀ Q(n − εΔn) Δn]/(2ε) at the same T and V. V is then varied until
/// C = 0: a scan of V/b from 1.6 to 12 (b = Σ n_i b_i) brackets each sign change, Brent refines it.
/// Every critical point of positive pressure in that range is returned.</para>
/// <para>Precision: both criteria are solved to 1e-12 in ln T and relative in V; the cubic form's
/// central difference (ε = 1e-4 mol, smaller for a trace component) has a truncation error of
/// order ε² relative and a rounding error of order 1e-10, which moves the critical temperature by
/// well under 1e-7 relative.</para>
/// </remarks>
public static class CriticalPointCriteria
{
    private const double R = Constants.GasConstant;

    /// <summary>Locates the critical points of a feed.</summary>
    /// <param name="model">The mixture model.</param>
    /// <param name="composition">Feed amounts in component order (normalized here); components with
    /// zero amount are left out of the criteria. With one component present, its pure critical point.</param>
    /// <returns>The critical points found, in order of increasing density (empty when none).</returns>
    /// <exception cref="InvalidInputException">The composition does not fit the model.</exception>
    public static IReadOnlyList<MixtureCriticalPoint> Locate(CubicMixtureModel model, IReadOnlyList<double> composition)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(composition);
        var z = Normalized(model, composition);
        int[] present = Enumerable.Range(0, z.Length).Where(i => z[i] > 0).ToArray();
        if (present.Length == 1)
        {
            var pure = model.Components[present[0]].CriticalPoint(Composition.Pure);
            return [new MixtureCriticalPoint(pure.Temperature, pure.Pressure, pure.Density, 0, 0)];
        }

        var context = new Context(model, z, present);
        double b = 0;
        for (int i = 0; i < z.Length; i++)
        {
            b += z[i] * model.Components[i].CovolumeB;
        }

        // Scan V/b (Σn = 1 mol, so V in m³/mol) for sign changes of the cubic form.
        const int steps = 40;
        double lowest = 1.6, highest = 12;
        var found = new List<MixtureCriticalPoint>();
        double? previousV = null, previousC = null;
        double[]? previousU = null;
        for (int k = 0; k <= steps; k++)
        {
            double v = b * lowest * Math.Pow(highest / lowest, (double)k / steps);
            var (c, u) = context.Cubic(v, previousU);
            if (double.IsNaN(c))
            {
                previousV = null;
                previousC = null;
                previousU = null;
                continue;
            }

            if (previousC is double pc && previousV is double pv && Math.Sign(pc) != Math.Sign(c))
            {
                var reference = previousU!;
                double Objective(double volume) => context.Cubic(volume, reference).Cubic;
                if (Brent.TryFindRoot(Objective, pv, v, 1e-12 * v, 200, out double root))
                {
                    double t = context.SpinodalTemperature(root);
                    var (lambda, _) = context.SmallestEigen(t, root);
                    double cubic = Objective(root);
                    var state = model.Residual(t, 1 / root, z);
                    if (state.Pressure > 0)
                    {
                        found.Add(new MixtureCriticalPoint(t, state.Pressure, 1 / root, lambda, cubic));
                    }
                }
            }

            previousV = v;
            previousC = c;
            previousU = u;
        }

        found.Reverse(); // the scan ran from small to large V: report in increasing density
        return found;
    }

    /// <summary>A composition checked against the model (one finite, non-negative fraction per
    /// component, not all zero) and divided by its sum: shared by the envelope tracer.</summary>
    internal static double[] Normalized(CubicMixtureModel model, IReadOnlyList<double> composition)
    {
        if (composition.Count != model.ComponentCount)
        {
            throw new InvalidInputException("composition", composition.Count, $"this mixture has {model.ComponentCount} components; got {composition.Count} fractions");
        }

        double total = 0;
        foreach (double v in composition)
        {
            if (!(v >= 0) || !double.IsFinite(v))
            {
                throw new InvalidInputException("composition", v, $"fraction {Preconditions.Format(v)} is not a finite non-negative number");
            }

            total += v;
        }

        if (!(total > 0))
        {
            throw new InvalidInputException("composition", total, "the fractions of a mixture must not all be zero");
        }

        return composition.Select(v => v / total).ToArray();
    }

    /// <summary>The feed, its present components and scratch space.</summary>
    private sealed class Context
    {
        private readonly CubicMixtureModel _model;
        private readonly double[] _z;
        private readonly int[] _present;
        private readonly double[] _lnPhi;
        private readonly double[] _dP;
        private readonly double[] _dN;
        private readonly double _highT;
        private readonly double _lowT;
        private readonly double _epsilon;

        public Context(CubicMixtureModel model, double[] z, int[] present)
        {
            _model = model;
            _z = z;
            _present = present;
            int n = z.Length;
            _lnPhi = new double[n];
            _dP = new double[n];
            _dN = new double[n * n];
            _highT = 2 * present.Max(i => model.Components[i].CriticalTemperature);
            _lowT = 0.3 * present.Min(i => model.Components[i].CriticalTemperature);
            _epsilon = Math.Min(1e-4, 0.5 * present.Min(i => Math.Sqrt(z[i])));
        }

        /// <summary>Q over the present components at (T, V, n), row-major m×m.</summary>
        public double[] Hessian(double temperature, double volume, double[] amounts)
        {
            double total = amounts.Sum();
            double density = total / volume;
            _model.LnFugacityCoefficients(temperature, density, amounts, _lnPhi, default, _dP, _dN);
            var state = _model.Residual(temperature, density, amounts);
            double pressure = state.Pressure;
            double rt = R * temperature;
            double pV = -density * density / total * state.PressureDRho;   // (∂P/∂V)_{T,n}
            int n = amounts.Length, m = _present.Length;
            var q = new double[m * m];
            for (int a = 0; a < m; a++)
            {
                int i = _present[a];
                double pi = -pV * rt * (_dP[i] + 1 / pressure);
                for (int c = 0; c < m; c++)
                {
                    int j = _present[c];
                    double pj = -pV * rt * (_dP[j] + 1 / pressure);
                    double f = (_dN[i * n + j] - 1) / total - pi * pj / (rt * pV);
                    q[a * m + c] = f + (a == c ? 1 / amounts[i] : 0);
                }
            }

            return q;
        }

        /// <summary>Smallest eigenvalue of B = diag(√n)·Q·diag(√n) and its unit eigenvector.</summary>
        public (double Value, double[] Vector) SmallestEigen(double temperature, double volume)
        {
            var q = Hessian(temperature, volume, _z);
            int m = _present.Length;
            var scaled = Matrix<double>.Build.Dense(m, m, (a, c) => Math.Sqrt(_z[_present[a]] * _z[_present[c]]) * q[a * m + c]);
            var evd = scaled.Evd(Symmetricity.Symmetric);
            var values = evd.EigenValues;
            int best = 0;
            for (int k = 1; k < m; k++)
            {
                if (values[k].Real < values[best].Real)
                {
                    best = k;
                }
            }

            return (values[best].Real, evd.EigenVectors.Column(best).ToArray());
        }

        /// <summary>The highest temperature at volume V where the smallest eigenvalue is zero
        /// (the limit of material stability reached from high temperature); NaN when none.</summary>
        public double SpinodalTemperature(double volume)
        {
            double Lambda(double lnT)
            {
                try
                {
                    return SmallestEigen(Math.Exp(lnT), volume).Value;
                }
                catch (InvalidInputException)
                {
                    return double.NaN;
                }
            }

            double upper = Math.Log(_highT), upperValue = Lambda(upper);
            if (!(upperValue > 0))
            {
                return double.NaN;
            }

            for (double lower = upper - 0.03; lower > Math.Log(_lowT); lower -= 0.03)
            {
                double value = Lambda(lower);
                if (double.IsNaN(value))
                {
                    return double.NaN;
                }

                if (value <= 0)
                {
                    return Brent.TryFindRoot(Lambda, lower, upper, 1e-13, 200, out double root) ? Math.Exp(root) : double.NaN;
                }

                upper = lower;
            }

            return double.NaN;
        }

        /// <summary>The cubic form at volume V on the spinodal temperature, with the eigenvector
        /// oriented along <paramref name="reference"/> (or its largest entry positive).</summary>
        public (double Cubic, double[] Vector) Cubic(double volume, double[]? reference)
        {
            double t = SpinodalTemperature(volume);
            if (double.IsNaN(t))
            {
                return (double.NaN, []);
            }

            var (_, u) = SmallestEigen(t, volume);
            double sign;
            if (reference is null)
            {
                int largest = 0;
                for (int k = 1; k < u.Length; k++)
                {
                    if (Math.Abs(u[k]) > Math.Abs(u[largest]))
                    {
                        largest = k;
                    }
                }

                sign = u[largest] >= 0 ? 1 : -1;
            }
            else
            {
                double dot = 0;
                for (int k = 0; k < u.Length; k++)
                {
                    dot += u[k] * reference[k];
                }

                sign = dot >= 0 ? 1 : -1;
            }

            int m = _present.Length;
            var dn = new double[m];
            for (int a = 0; a < m; a++)
            {
                u[a] *= sign;
                dn[a] = Math.Sqrt(_z[_present[a]]) * u[a];
            }

            double Quadratic(double shift)
            {
                var amounts = (double[])_z.Clone();
                for (int a = 0; a < m; a++)
                {
                    amounts[_present[a]] += shift * dn[a];
                }

                var q = Hessian(t, volume, amounts);
                double sum = 0;
                for (int a = 0; a < m; a++)
                {
                    for (int c = 0; c < m; c++)
                    {
                        sum += dn[a] * q[a * m + c] * dn[c];
                    }
                }

                return sum;
            }

            double cubic = (Quadratic(_epsilon) - Quadratic(-_epsilon)) / (2 * _epsilon);
            return (cubic, u);
        }
    }
}
