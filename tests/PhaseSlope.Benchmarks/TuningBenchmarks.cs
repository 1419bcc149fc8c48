using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tuning;

namespace PhaseSlope.Benchmarks;

/// <summary>Tuning the Peng–Robinson model to 50 vapour pressures of water (generated from the
/// IAPWS equation, <see cref="GeneratedSaturationData"/>): three Mathias–Copeman parameters, three
/// Twu parameters, Soave's one, and the acentric factor from one point. The target for the
/// three Mathias–Copeman parameters is 50 ms in process; docs/performance.md gives the results as
/// multiples of one model evaluation (<see cref="SolverBenchmarks.ModelEvaluation"/>).</summary>
[MemoryDiagnoser]
public class TuningBenchmarks
{
    private Fluid _water = null!;
    private Core.Correlations.VapourPressurePoint[] _data = [];
    private static readonly DateOnly Day = new(2026, 12, 2);

    /// <summary>Reads the fluid and generates the data.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _water = FluidCatalog.Embedded.Find("water");
        _data = GeneratedSaturationData.Points(50);
    }

    /// <summary>Mathias–Copeman c1, c2, c3 to 50 points.</summary>
    [Benchmark(Baseline = true)]
    public double MathiasCopeman50() => Tune(AlphaForm.MathiasCopeman, _data);

    /// <summary>Twu L, M, N to 50 points.</summary>
    [Benchmark]
    public double Twu50() => Tune(AlphaForm.Twu, _data);

    /// <summary>Soave m to 50 points.</summary>
    [Benchmark]
    public double Soave50() => Tune(AlphaForm.Soave, _data);

    /// <summary>The acentric factor from the one point nearest 0.7 Tc.</summary>
    [Benchmark]
    public double AcentricFactorOnePoint() => Tune(AlphaForm.Default, [_data[21]]);

    private double Tune(AlphaForm form, Core.Correlations.VapourPressurePoint[] data)
        => AlphaTuner.Tune(new TuningRequest { BaseFluid = _water, Form = form, VapourPressures = data, Date = Day }).AadAfterPercent;
}
