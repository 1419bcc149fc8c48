using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Traces the phase envelope (bubble and dew lines in P–T) of a mixture of fixed
/// composition through its critical point, in the manner of Michelsen (1980).</summary>
/// <remarks>
/// <para>Method: M. L. Michelsen, "Calculation of phase envelopes and critical points for
/// multicomponent mixtures", Fluid Phase Equilib. 4, 1–10 (1980). The unknowns are
/// X = (ln K_1 … ln K_n, ln T, ln P); with the feed z as one phase (x = z) and the incipient
/// phase y_i = K_i z_i, the n + 2 equations are
/// F_i = ln K_i + ln φ_i(T, P, y) − ln φ_i(T, P, z) = 0, F_{n+1} = Σ (y_i − z_i) = 0 and a
/// specification F_{n+2} = X_s − S = 0 on one variable. Newton uses the exact Jacobian:
/// ∂F_i/∂ln K_j = δ_ij + y_j·(∂ln φ_i/∂n_j)(y), ∂F_i/∂ln T = T·[(∂ln φ_i/∂T)(y) − (∂ln φ_i/∂T)(z)],
/// ∂F_i/∂ln P = P·[(∂ln φ_i/∂P)(y) − (∂ln φ_i/∂P)(z)], ∂F_{n+1}/∂ln K_j = y_j, from
/// <see cref="CubicMixtureModel.LnFugacityCoefficientsAtPressure"/>.</para>
/// <para>Step control: after each point the sensitivities dX/dS (J·dX/dS = e_{n+2}) pick the
/// next specified variable, the one that changes most; the next point starts from the linear
/// extrapolation X + (dX/dS)·ΔS, with ΔS limited so that no variable changes by more than
/// <see cref="EnvelopeOptions.MaximumStep"/>, grown after quick convergence and halved after a
/// failure. The trace starts at <see cref="EnvelopeOptions.StartPressure"/> on the bubble side
/// from Wilson's K-values (G. M. Wilson, "A modified Redlich–Kwong equation of state…", AIChE
/// 65th National Meeting, Cleveland (1969)), K_i = (Pc_i/P)·exp[5.373(1 + ω_i)(1 − Tc_i/T)],
/// with each component's acentric factor taken from its own model, ω = −1 − log10(Psat(0.7 Tc)/Pc).</para>
/// <para>At the critical point all ln K pass through zero together and the feed turns from a
/// saturated liquid into a saturated vapour: the tracer lands on |ln K| =
/// <see cref="EnvelopeOptions.CriticalStep"/> and steps over to the mirror value, swaps the root
/// labels of the two phases, and interpolates the critical point between the two points (cubic
/// Hermite in ln K with the sensitivities as slopes). The cricondenbar and cricondentherm are
/// solved for where d ln P/d ln T = 0 (resp. d ln T/d ln P = 0) along the curve, by Brent's method
/// on the sensitivity of converged points between the two points that bracket the sign change.</para>
/// </remarks>
public sealed class EnvelopeTracer
{
    /// <summary>Largest |ln K| below which each phase takes its stable root instead of its label.</summary>
    private const double LabelledSpread = 0.5;

    /// <summary>Residual of the envelope equations at rounding level (see <see cref="Run"/>'s Newton).</summary>
    private const double RoundingResidual = 1e-13;

    private readonly CubicMixtureModel _model;
    private readonly double[] _criticalTemperature;
    private readonly double[] _criticalPressure;
    private readonly double[] _acentric;

    /// <summary>Prepares a tracer for a mixture model (computes each component's Wilson constants).</summary>
    /// <param name="model">A mixture model of at least two components.</param>
    /// <param name="options">Settings; <see cref="EnvelopeOptions.Default"/> when null.</param>
    /// <exception cref="InvalidInputException">Fewer than two components, or invalid options.</exception>
    public EnvelopeTracer(CubicMixtureModel model, EnvelopeOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.ComponentCount < 2)
        {
            throw new InvalidInputException("components", model.ComponentCount, "a phase envelope needs a mixture model of at least two components; a pure fluid has a saturation curve");
        }

        Options = options ?? EnvelopeOptions.Default;
        Options.Validate();
        _model = model;
        int n = model.ComponentCount;
        _criticalTemperature = new double[n];
        _criticalPressure = new double[n];
        _acentric = new double[n];
        for (int i = 0; i < n; i++)
        {
            var component = model.Components[i];
            _criticalTemperature[i] = component.CriticalTemperature;
            _criticalPressure[i] = component.CriticalPressure;
            // The component's own acentric factor (Pitzer's definition on its own vapour pressure).
            var solver = new CoexistenceSolver(component, 0.5 * component.CriticalTemperature);
            double psat = solver.AtTemperature(0.7 * component.CriticalTemperature).Pressure;
            _acentric[i] = -1 - Math.Log10(psat / component.CriticalPressure);
        }
    }

    /// <summary>The settings in use.</summary>
    public EnvelopeOptions Options { get; }

    /// <summary>The mixture model.</summary>
    public CubicMixtureModel Model => _model;

    /// <summary>Traces the envelope of a feed.</summary>
    /// <param name="composition">Feed amounts in component order (normalized here); zeros allowed.</param>
    /// <returns>The points of both branches and the located critical point, cricondenbar and cricondentherm.</returns>
    /// <exception cref="InvalidInputException">The composition does not fit the model.</exception>
    /// <exception cref="ConvergenceException">The first (bubble) point at the start pressure does not converge.</exception>
    public PhaseEnvelope Trace(IReadOnlyList<double> composition)
    {
        ArgumentNullException.ThrowIfNull(composition);
        var run = new Run(this, composition);
        return run.Execute();
    }

    /// <summary>One trace: its workspace and its points.</summary>
    private sealed class Run
    {
        private readonly EnvelopeTracer _owner;
        private readonly EnvelopeOptions _options;
        private readonly int _n;
        private readonly int _size;
        private readonly double[] _z;
        private readonly double[] _y;
        private readonly double[] _lnPhiX;
        private readonly double[] _lnPhiY;
        private readonly double[] _dTX;
        private readonly double[] _dTY;
        private readonly double[] _dPX;
        private readonly double[] _dPY;
        private readonly double[] _dNY;
        private readonly Matrix<double> _jacobian;
        private readonly Vector<double> _residual;
        private int _evaluations;
        private bool _labelled = true;

        public Run(EnvelopeTracer owner, IReadOnlyList<double> composition)
        {
            _owner = owner;
            _options = owner.Options;
            _n = owner._model.ComponentCount;
            _size = _n + 2;
            _z = CriticalPointCriteria.Normalized(owner._model, composition);
            _y = new double[_n];
            _lnPhiX = new double[_n];
            _lnPhiY = new double[_n];
            _dTX = new double[_n];
            _dTY = new double[_n];
            _dPX = new double[_n];
            _dPY = new double[_n];
            _dNY = new double[_n * _n];
            _jacobian = Matrix<double>.Build.Dense(_size, _size);
            _residual = Vector<double>.Build.Dense(_size);
        }

        private int LnT => _n;

        private int LnP => _n + 1;

        public PhaseEnvelope Execute()
        {
            var points = new List<Node>();
            var x = Start();
            if (!Newton(x, LnP, x[LnP], swapped: false, out int iterations))
            {
                throw new ConvergenceException($"the bubble point at {Preconditions.Format(_options.StartPressure)} Pa did not converge from Wilson's K-values", iterations, double.NaN);
            }

            // The reference ln K (largest at the start) tells the side: it changes sign only at the critical point.
            int reference = 0;
            for (int i = 1; i < _n; i++)
            {
                if (Math.Abs(x[i]) > Math.Abs(x[reference]))
                {
                    reference = i;
                }
            }

            if (!(Math.Abs(x[reference]) > 10 * _options.CriticalStep))
            {
                throw new ConvergenceException($"the bubble point at {Preconditions.Format(_options.StartPressure)} Pa converged to nearly equal phases (largest |ln K| {Preconditions.Format(Math.Abs(x[reference]))}); lower the start pressure", iterations, Math.Abs(x[reference]));
            }

            _labelled = _z.Count(v => v > 0) == 1;
            double[] tangent = Sensitivity(LnP);
            double[] direction = Oriented(tangent, tangent[LnP] > 0 ? 1 : -1); // up in pressure
            points.Add(new Node(x, direction, false, iterations));
            double step = _options.InitialStep;
            bool swapped = false;
            int criticalAt = -1;
            var stop = EnvelopeStop.PointLimit;
            while (points.Count < _options.MaximumPoints)
            {
                var last = points[^1];
                // Specify the most sensitive variable; near the critical point, the fastest ln K.
                int spec = ArgMaxAbs(last.Direction, 0, _size);
                bool nearCritical = Math.Abs(last.X[reference]) < 5 * _options.CriticalStep;
                if (nearCritical)
                {
                    spec = ArgMaxAbs(last.Direction, 0, _n);
                }

                double rate = last.Direction[spec];                // dX_spec along the travel direction
                double largest = MaxAbs(last.Direction, 0, _size);
                double delta = step * Math.Abs(rate) / largest;    // no variable moves more than step
                delta = rate > 0 ? delta : -delta;
                double target = last.X[spec] + delta;
                if (spec < _n && !swapped)
                {
                    double now = last.X[spec];
                    double critical = _options.CriticalStep;
                    bool towardZero = now * delta < 0;
                    if (towardZero && Math.Abs(now) > 1.5 * critical && (Math.Abs(target) < critical || target * now <= 0))
                    {
                        target = Math.Sign(now) * critical;        // land just before the critical point
                    }
                    else if (towardZero && Math.Abs(now) <= 1.5 * critical)
                    {
                        target = -now;                             // step over it to the mirror value
                    }
                }

                double factor = (target - last.X[spec]) / rate;
                var guess = new double[_size];
                for (int k = 0; k < _size; k++)
                {
                    guess[k] = last.X[k] + last.Direction[k] * factor;
                }

                bool side = guess[reference] * points[0].X[reference] < 0;
                var start = (double[])guess.Clone();
                if (!Newton(guess, spec, target, side, out iterations) && !RetryLabelled(start, guess, spec, target, side, out iterations))
                {
                    step *= 0.5;
                    if (step < _options.MinimumStep)
                    {
                        stop = EnvelopeStop.StepTooSmall;
                        break;
                    }

                    continue;
                }

                if ((guess[reference] * points[0].X[reference] < 0) != side)
                {
                    // Newton crossed the critical point on its own: redo with the other labels.
                    side = !side;
                    if (!Newton(guess, spec, target, side, out iterations))
                    {
                        step *= 0.5;
                        if (step < _options.MinimumStep)
                        {
                            stop = EnvelopeStop.StepTooSmall;
                            break;
                        }

                        continue;
                    }
                }

                tangent = Sensitivity(spec);
                double dot = 0;
                for (int k = 0; k < _size; k++)
                {
                    dot += tangent[k] * last.Direction[k];
                }

                direction = Oriented(tangent, dot >= 0 ? 1 : -1);
                if (side && !swapped)
                {
                    swapped = true;
                    criticalAt = points.Count;
                }

                points.Add(new Node(guess, direction, side, iterations));
                step = iterations <= 3 ? Math.Min(1.5 * step, _options.MaximumStep) : iterations >= 6 ? 0.6 * step : step;
                double pressure = Math.Exp(guess[LnP]);
                if (swapped && pressure < _options.EndPressure && direction[LnP] < 0)
                {
                    stop = EnvelopeStop.EndPressure;
                    break;
                }
            }

            EnvelopeLandmark? criticalPoint = null;
            if (criticalAt > 0)
            {
                criticalPoint = Critical(points[criticalAt - 1], points[criticalAt], reference);
            }

            var envelopePoints = points.Select(ToPoint).ToList();
            return new PhaseEnvelope
            {
                Composition = _z,
                Points = envelopePoints,
                CriticalPoint = criticalPoint,
                Cricondenbar = Extremum(points, LnP, LnT, reference),
                Cricondentherm = Extremum(points, LnT, LnP, reference),
                StopReason = stop,
                Evaluations = _evaluations,
            };
        }

        private EnvelopePoint ToPoint(Node node)
        {
            var y = new double[_n];
            double sum = 0;
            for (int i = 0; i < _n; i++)
            {
                y[i] = _z[i] * Math.Exp(node.X[i]);
                sum += y[i];
            }

            for (int i = 0; i < _n; i++)
            {
                y[i] /= sum;
            }

            return new EnvelopePoint(Math.Exp(node.X[LnT]), Math.Exp(node.X[LnP]), node.Swapped ? EnvelopeBranch.Dew : EnvelopeBranch.Bubble, y, node.Iterations);
        }

        /// <summary>Wilson's bubble temperature at the start pressure: Σ z_i K_i(T) = 1, Newton in 1/T.</summary>
        private double[] Start()
        {
            double p = _options.StartPressure;
            double u = 1 / (0.7 * _z.Select((v, i) => v * _owner._criticalTemperature[i]).Sum());
            var x = new double[_size];
            for (int iteration = 0; iteration < 100; iteration++)
            {
                double sum = 0, derivative = 0;
                for (int i = 0; i < _n; i++)
                {
                    double slope = 5.373 * (1 + _owner._acentric[i]) * _owner._criticalTemperature[i];
                    double k = _owner._criticalPressure[i] / p * Math.Exp(5.373 * (1 + _owner._acentric[i]) - slope * u);
                    sum += _z[i] * k;
                    derivative -= _z[i] * k * slope;
                }

                double change = -Math.Log(sum) / (derivative / sum);   // Newton on ln Σ z K, linear-ish in 1/T
                change = Math.Clamp(change, -0.5 * u, 0.5 * u);       // a damped move, not a result
                u += change;
                if (Math.Abs(change) < 1e-12 * u)
                {
                    break;
                }
            }

            for (int i = 0; i < _n; i++)
            {
                x[i] = Math.Log(_owner._criticalPressure[i] / p) + 5.373 * (1 + _owner._acentric[i]) * (1 - _owner._criticalTemperature[i] * u);
            }

            x[LnT] = -Math.Log(u);
            x[LnP] = Math.Log(p);
            return x;
        }

        /// <summary>Residual and Jacobian at X (see the class remarks).</summary>
        private bool Evaluate(double[] x, int spec, double target, bool swapped)
        {
            double t = Math.Exp(x[LnT]), p = Math.Exp(x[LnP]);
            double sumY = 0;
            for (int i = 0; i < _n; i++)
            {
                _y[i] = _z[i] * Math.Exp(x[i]);
                sumY += _y[i];
            }

            if (!double.IsFinite(t) || !double.IsFinite(p) || !double.IsFinite(sumY) || !(sumY > 0))
            {
                return false;
            }

            // On a stable envelope each phase is on its own root of lower Gibbs energy (were the
            // other root lower, the feed would have a negative tangent-plane distance there), so
            // both phases take their stable roots. Labels (feed liquid on the bubble side) are used
            // for the first point, where Newton starts from Wilson's guess, and for a feed with one
            // component present, whose incipient phase has the feed's composition; near the
            // critical point (every |ln K| below 0.5) the stable roots are used in either case.
            double spread = 0;
            for (int i = 0; i < _n; i++)
            {
                spread = Math.Max(spread, Math.Abs(x[i]));
            }

            bool labelled = _labelled && spread > LabelledSpread;
            var feedRoot = !labelled ? MixtureRoot.Stable : swapped ? MixtureRoot.Vapour : MixtureRoot.Liquid;
            var incipientRoot = !labelled ? MixtureRoot.Stable : swapped ? MixtureRoot.Liquid : MixtureRoot.Vapour;
            try
            {
                _owner._model.LnFugacityCoefficientsAtPressure(t, p, _z, feedRoot, _lnPhiX, _dTX, _dPX);
                _owner._model.LnFugacityCoefficientsAtPressure(t, p, _y, incipientRoot, _lnPhiY, _dTY, _dPY, _dNY);
                _evaluations += 2;
            }
            catch (InvalidInputException)
            {
                return false; // no density root there: not a point of the envelope
            }

            _jacobian.Clear();
            for (int i = 0; i < _n; i++)
            {
                _residual[i] = x[i] + _lnPhiY[i] - _lnPhiX[i];
                for (int j = 0; j < _n; j++)
                {
                    _jacobian[i, j] = (i == j ? 1 : 0) + _dNY[i * _n + j] * _y[j] / sumY;
                }

                _jacobian[i, LnT] = t * (_dTY[i] - _dTX[i]);
                _jacobian[i, LnP] = p * (_dPY[i] - _dPX[i]);
                _jacobian[_n, i] = _y[i];
            }

            _residual[_n] = sumY - 1;
            _residual[_n + 1] = x[spec] - target;
            _jacobian[_n + 1, spec] = 1;
            for (int k = 0; k < _size; k++)
            {
                if (!double.IsFinite(_residual[k]))
                {
                    return false;
                }
            }

            return true;
        }

        /// <summary>After a failure on stable roots, the same Newton from the same start on labelled
        /// roots (feed liquid on the bubble side): far below a component's triple point, for
        /// example, the stable-root choice can flip between iterations where the labels do not.</summary>
        private bool RetryLabelled(double[] start, double[] x, int spec, double target, bool swapped, out int iterations)
        {
            iterations = 0;
            if (_labelled)
            {
                return false;
            }

            Array.Copy(start, x, start.Length);
            _labelled = true;
            try
            {
                return Newton(x, spec, target, swapped, out iterations);
            }
            finally
            {
                _labelled = false;
            }
        }

        /// <summary>Newton on the envelope equations with X_spec = target; X is updated in place.</summary>
        private bool Newton(double[] x, int spec, double target, bool swapped, out int iterations)
        {
            x[spec] = target;
            for (iterations = 1; iterations <= _options.MaximumIterations; iterations++)
            {
                if (!Evaluate(x, spec, target, swapped))
                {
                    return false;
                }

                // Near the critical point the Jacobian is ill-conditioned and rounding keeps the
                // correction above the tolerance although the equations hold to rounding: accept
                // a residual at rounding level (1e-13 on ln K, ln φ of order 1–10) with a small correction.
                double residualNorm = _residual.AbsoluteMaximum();
                var correction = _jacobian.LU().Solve(-_residual);
                double largest = 0;
                for (int k = 0; k < _size; k++)
                {
                    largest = Math.Max(largest, Math.Abs(correction[k]));
                }

                if (!double.IsFinite(largest))
                {
                    return false;
                }

                if (residualNorm < RoundingResidual && largest < Math.Sqrt(_options.Tolerance))
                {
                    return true;
                }

                // Damp wild first moves (ln T or ln P by more than 0.2, ln K by more than 2).
                double scale = 1;
                scale = Math.Min(scale, 0.2 / Math.Max(Math.Abs(correction[LnT]), 1e-300));
                scale = Math.Min(scale, 0.2 / Math.Max(Math.Abs(correction[LnP]), 1e-300));
                scale = Math.Min(scale, 2 / Math.Max(largest, 1e-300));
                for (int k = 0; k < _size; k++)
                {
                    x[k] += scale * correction[k];
                }

                if (scale == 1 && largest < _options.Tolerance)
                {
                    return true;
                }
            }

            return false;
        }

        /// <summary>dX/dS for the specification variable at the last evaluated point (J·dX/dS = e_{n+2}).</summary>
        private double[] Sensitivity(int spec)
        {
            for (int k = 0; k < _size; k++)
            {
                _jacobian[_n + 1, k] = k == spec ? 1 : 0;
            }

            var rhs = Vector<double>.Build.Dense(_size);
            rhs[_n + 1] = 1;
            return _jacobian.LU().Solve(rhs).ToArray();
        }

        private static double[] Oriented(double[] tangent, int sign) => tangent.Select(v => sign * v).ToArray();

        private static int ArgMaxAbs(double[] v, int from, int to)
        {
            int best = from;
            for (int k = from + 1; k < to; k++)
            {
                if (Math.Abs(v[k]) > Math.Abs(v[best]))
                {
                    best = k;
                }
            }

            return best;
        }

        private static double MaxAbs(double[] v, int from, int to) => Math.Abs(v[ArgMaxAbs(v, from, to)]);

        /// <summary>The critical point between the last bubble and first dew point: cubic Hermite
        /// interpolation of ln T and ln P in u = ln K_ref to u = 0, with dX/du = direction/direction_ref.</summary>
        private EnvelopeLandmark Critical(Node before, Node after, int reference)
        {
            double s = (0 - before.X[reference]) / (after.X[reference] - before.X[reference]);
            return new EnvelopeLandmark(Math.Exp(Hermite(before, after, LnT, reference, s)), Math.Exp(Hermite(before, after, LnP, reference, s)), EnvelopeBranch.Bubble);
        }

        /// <summary>Cubic Hermite interpolation of X_k between two points at the fraction s of the
        /// way in the parameter X_param, with the slopes dX_k/dX_param from their directions.</summary>
        private static double Hermite(Node a, Node b, int k, int param, double s)
        {
            var (p0, m0, p1, m1) = HermiteData(a, b, k, param);
            double s2 = s * s, s3 = s2 * s;
            return (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * m0 + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * m1;
        }

        private static (double P0, double M0, double P1, double M1) HermiteData(Node a, Node b, int k, int param)
        {
            double h = b.X[param] - a.X[param];
            return (a.X[k], a.Direction[k] / a.Direction[param] * h, b.X[k], b.Direction[k] / b.Direction[param] * h);
        }

        /// <summary>The maximum of X_of on the Hermite cubic between two points (parameter X_param):
        /// the root in [0, 1] of its quadratic derivative with the larger value.</summary>
        private EnvelopeLandmark? HermiteMaximum(Node a, Node b, int of, int param, int reference, double startSign)
        {
            var (p0, m0, p1, m1) = HermiteData(a, b, of, param);
            double qa = 6 * p0 + 3 * m0 - 6 * p1 + 3 * m1, qb = -6 * p0 - 4 * m0 + 6 * p1 - 2 * m1, qc = m0;
            var candidates = new List<double>();
            if (Math.Abs(qa) < 1e-300)
            {
                candidates.Add(-qc / qb);
            }
            else
            {
                double d = qb * qb - 4 * qa * qc;
                if (d >= 0)
                {
                    double r = Math.Sqrt(d);
                    candidates.Add((-qb + r) / (2 * qa));
                    candidates.Add((-qb - r) / (2 * qa));
                }
            }

            var inside = candidates.Where(c => c >= 0 && c <= 1).ToList();
            if (inside.Count == 0)
            {
                return null;
            }

            double best = inside.MaxBy(c => Hermite(a, b, of, param, c));
            double u = Hermite(a, b, reference, param, best);
            var branch = u * startSign < 0 ? EnvelopeBranch.Dew : EnvelopeBranch.Bubble;
            return new EnvelopeLandmark(Math.Exp(Hermite(a, b, LnT, param, best)), Math.Exp(Hermite(a, b, LnP, param, best)), branch);
        }

        /// <summary>The maximum of variable <paramref name="of"/> along the curve: between the two
        /// points where its rate changes sign (the bracket with the higher value), Brent on
        /// g(S) = dX_of/dX_along at converged points specified in <paramref name="along"/>.</summary>
        private EnvelopeLandmark? Extremum(List<Node> points, int of, int along, int reference)
        {
            int best = -1;
            for (int k = 0; k + 1 < points.Count; k++)
            {
                if (points[k].Direction[of] > 0 && points[k + 1].Direction[of] <= 0
                    && (best < 0 || points[k].X[of] > points[best].X[of]))
                {
                    best = k;
                }
            }

            if (best < 0)
            {
                return null;
            }

            var a = points[best];
            var b = points[best + 1];
            bool side = a.Swapped;
            if (a.Swapped != b.Swapped)
            {
                // The maximum lies between the two points that straddle the critical point, where a
                // point at given T or P is not unique: interpolate in ln K as for the critical point.
                return HermiteMaximum(a, b, of, reference, reference, points[0].X[reference]);
            }

            var x = new double[_size];
            double Rate(double s)
            {
                double w = (s - a.X[along]) / (b.X[along] - a.X[along]);
                for (int k = 0; k < _size; k++)
                {
                    x[k] = a.X[k] + w * (b.X[k] - a.X[k]);
                }

                if (!Newton(x, along, s, side, out int iterations))
                {
                    throw new ConvergenceException("an envelope point near the extremum did not converge", iterations, double.NaN);
                }

                var t = Sensitivity(along);
                return t[of];
            }

            double lo = a.X[along], hi = b.X[along];
            try
            {
                if (Brent.TryFindRoot(Rate, Math.Min(lo, hi), Math.Max(lo, hi), 1e-12, 100, out double root))
                {
                    Rate(root); // leaves x at the converged extremum
                    return new EnvelopeLandmark(Math.Exp(x[LnT]), Math.Exp(x[LnP]), side ? EnvelopeBranch.Dew : EnvelopeBranch.Bubble);
                }
            }
            catch (ConvergenceException)
            {
                // Newton failed inside the bracket: interpolate instead (below).
            }

            return HermiteMaximum(a, b, of, along, reference, points[0].X[reference]);
        }
    }

    /// <summary>A converged point with its oriented tangent.</summary>
    private sealed record Node(double[] X, double[] Direction, bool Swapped, int Iterations);
}
