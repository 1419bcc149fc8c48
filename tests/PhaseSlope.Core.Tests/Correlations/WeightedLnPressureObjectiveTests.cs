using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;
using PhaseSlope.Core.Correlations;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>The streamed objective must give MathNet's minimiser exactly what MathNet's own
/// weighted objective gives it (that is why the fits did not change by a bit when it replaced it).</summary>
public class WeightedLnPressureObjectiveTests
{
    [Theory]
    [InlineData("antoine")]
    [InlineData("wagner-6")]
    public void ValueGradientHessian_EqualMathNetsWeightedObjective_BitForBit(string id)
    {
        VapourPressureForm form = id == "antoine" ? new AntoineForm() : WagnerForm.SixTerm(WaterTc, WaterPc);
        // Noisy water data with per-point uncertainties from 0.05 % to 0.5 %: unequal weights.
        var random = new Random(4);
        var data = Points(WaterLnPressure, Temperatures(280, 640, 57), 2e-3, random);
        double[] t = [.. data.Select(d => d.Temperature)];
        double[] lnP = [.. data.Select(d => Math.Log(d.Pressure))];
        double[] w = [.. data.Select(_ => 1 / Math.Pow(5e-4 + 4.5e-3 * random.NextDouble(), 2))];
        double[] start = form.StartingValues(t, lnP, w);

        var streamed = new WeightedLnPressureObjective(form, t, lnP, w);
        var reference = ObjectiveFunction.NonlinearModel(
            (theta, x) => Vector<double>.Build.Dense(x.Count, i => form.LnPressure(x[i], [.. theta])),
            (theta, x) =>
            {
                var jac = Matrix<double>.Build.Dense(x.Count, theta.Count);
                var g = new double[theta.Count];
                for (int i = 0; i < x.Count; i++)
                {
                    form.LnPressureGradient(x[i], [.. theta], g);
                    for (int j = 0; j < g.Length; j++)
                    {
                        jac[i, j] = g[j];
                    }
                }

                return jac;
            },
            Vector<double>.Build.DenseOfArray(t), Vector<double>.Build.DenseOfArray(lnP), Vector<double>.Build.DenseOfArray(w));

        // At the start and at two points off it (one step each way of 1 % in every parameter).
        foreach (double factor in new[] { 1.0, 1.01, 0.99 })
        {
            var point = Vector<double>.Build.DenseOfEnumerable(start.Select(v => v * factor));
            streamed.EvaluateAt(point);
            reference.EvaluateAt(point.Clone());
            Assert.Equal(reference.Value, streamed.Value);
            Assert.Equal(reference.Gradient.ToArray(), streamed.Gradient.ToArray());
            Assert.Equal(reference.Hessian.ToArray(), streamed.Hessian.ToArray());
        }

        Assert.Equal(data.Length - form.ParameterCount, streamed.DegreeOfFreedom);
    }
}
