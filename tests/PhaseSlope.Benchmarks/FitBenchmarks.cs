using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Benchmarks;

/// <summary>Vapour-pressure fitting at 1 000, 10 000 and 100 000 points: the two Wagner forms
/// (linear in their parameters, one direct solve) and Antoine (Levenberg–Marquardt after a
/// 101-step scan of its linearised start). Time and allocated bytes should grow in proportion to
/// the points; docs/performance.md has the results.</summary>
/// <remarks>The data are generated, not measured: see <see cref="GeneratedSaturationData"/>.</remarks>
[MemoryDiagnoser]
public class FitBenchmarks
{
    private const double CriticalTemperature = GeneratedSaturationData.CriticalTemperature;
    private const double CriticalPressure = GeneratedSaturationData.CriticalPressure;
    private VapourPressurePoint[] _data = [];

    /// <summary>Number of data points.</summary>
    [Params(1_000, 10_000, 100_000)]
    public int Points { get; set; }

    /// <summary>Generates the data.</summary>
    [GlobalSetup]
    public void Setup() => _data = GeneratedSaturationData.Points(Points);

    /// <summary>Wagner 3-6 form (four parameters), solved directly.</summary>
    [Benchmark(Baseline = true)]
    public VapourPressureFit WagnerThreeSix() => VapourPressureFitter.Fit(WagnerForm.ThreeSix(CriticalTemperature, CriticalPressure), _data);

    /// <summary>Six-term Wagner form (the IAPWS one), solved directly.</summary>
    [Benchmark]
    public VapourPressureFit WagnerSixTerm() => VapourPressureFitter.Fit(WagnerForm.SixTerm(CriticalTemperature, CriticalPressure), _data);

    /// <summary>Antoine, nonlinear: the scan for its start, then Levenberg–Marquardt.</summary>
    [Benchmark]
    public VapourPressureFit Antoine() => VapourPressureFitter.Fit(new AntoineForm(), _data);
}
