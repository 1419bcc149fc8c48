using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>The bookkeeping both Newton iterations share: the current pair of evaluated
    /// phases, the best iterate so far (smallest pending correction) with its rounding estimate,
    /// the stopping rules, the halving of steps that would leave a stable branch, and the
    /// classification and build of the result.</summary>
    private sealed class NewtonTrack
    {
        private readonly CoexistenceSolver _solver;
        private readonly Work _work;
        private HelmholtzDerivatives _bestLiquid;
        private HelmholtzDerivatives _bestVapour;
        private double _bestNoise;
        private int _bestIteration;
        private double _previousStep = double.PositiveInfinity;

        public NewtonTrack(CoexistenceSolver solver, Work work, double temperature, double liquidDensity, double vapourDensity)
        {
            _solver = solver;
            _work = work;
            Liquid = solver.Evaluate(work, temperature, liquidDensity);
            Vapour = solver.Evaluate(work, temperature, vapourDensity);
            (_bestLiquid, _bestVapour) = (Liquid, Vapour);
        }

        /// <summary>The phases at the current iterate (both at the same temperature).</summary>
        public HelmholtzDerivatives Liquid { get; private set; }

        /// <inheritdoc cref="Liquid"/>
        public HelmholtzDerivatives Vapour { get; private set; }

        public int Iteration { get; set; }

        public double BestStep { get; private set; } = double.PositiveInfinity;

        /// <summary>Records the pending correction of the current iterate and says whether to stop:
        /// converged (below <see cref="StepTolerance"/>, or after at least one step at the rounding
        /// estimate <paramref name="noise"/>), or no longer shrinking (quadratic convergence
        /// shrinks a small correction by orders of magnitude; once it does not, the equations are
        /// at their rounding floor).</summary>
        public bool Done(double step, double noise)
        {
            if (step < BestStep)
            {
                (_bestLiquid, _bestVapour, BestStep, _bestNoise, _bestIteration) = (Liquid, Vapour, step, noise, Iteration);
            }

            bool stop = step <= StepTolerance
                        || (Iteration > 1 && step <= noise)
                        || (_previousStep < 1e-7 && step > 0.5 * _previousStep)
                        || Iteration - _bestIteration > 3;
            _previousStep = step;
            return stop;
        }

        /// <summary>Takes the step (ΔT, Δln ρL, Δln ρV) scaled by λ, halving λ until both phases
        /// are mechanically stable, ρV &lt; ρL &lt; the density bound, and T stays in
        /// (<paramref name="lowestTemperature"/>, Tc). False when no such step exists.</summary>
        public bool Move(double temperatureStep, double liquidStep, double vapourStep, double lambda, double lowestTemperature)
        {
            double t = Liquid.Temperature;
            for (int halving = 0; halving < 40; halving++, lambda *= 0.5)
            {
                double nextT = t + lambda * temperatureStep;
                double nextL = Liquid.Density * Math.Exp(lambda * liquidStep);
                double nextV = Vapour.Density * Math.Exp(lambda * vapourStep);
                if (!(nextT > lowestTemperature && nextT < _solver.CriticalTemperature && nextL < _solver._densityBound && nextV < nextL))
                {
                    continue;
                }

                var trialL = _solver.Evaluate(_work, nextT, nextL);
                var trialV = _solver.Evaluate(_work, nextT, nextV);
                if (trialL.PressureDRho > 0 && trialV.PressureDRho > 0)
                {
                    (Liquid, Vapour) = (trialL, trialV);
                    return true;
                }
            }

            return false;
        }

        /// <summary>The best iterate as a point at <paramref name="pressure"/> (null: at the
        /// vapour's own pressure, which unlike a dense liquid's is computed without cancellation),
        /// or null when its uncertainty is not acceptable or it fails the acceptance checks.</summary>
        /// <remarks>Below the step tolerance the pending correction is the error; at the rounding
        /// floor the rounding estimate bounds it too (a correction can be small by chance there).</remarks>
        public CoexistencePoint? Finish(double? pressure, CoexistenceMethod method, CoexistenceStart start, ref string? failure)
        {
            double uncertainty = BestStep <= StepTolerance ? BestStep : Math.Max(BestStep, _bestNoise / 8);
            if (!_solver.Classify(uncertainty, _bestLiquid.Temperature, out var stop))
            {
                return null;
            }

            var point = _solver.Build(_bestLiquid, _bestVapour, pressure ?? _bestVapour.Pressure, method, Iteration, stop, _work, start, uncertainty);
            if (!_solver.Acceptable(point))
            {
                failure = $"residual {Preconditions.Format(point.Report.FugacityResidual)} after {Iteration} iterations";
                return null;
            }

            return point;
        }
    }
}
