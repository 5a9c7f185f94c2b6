using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Benchmarks.Simulation;

/// <summary>Throughput of the Dormand-Prince integrator on a 10-state system (five coupled Duffing oscillators),
/// integrated over 20 s. Steps and evaluations per operation are printed in the global setup, so steps per second =
/// steps / mean time.</summary>
/// <remarks>Run: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*DormandPrince45*'</remarks>
[MemoryDiagnoser]
public class DormandPrince45Benchmarks
{
    private const int Dimension = 10;
    private const double EndS = 20.0;
    private readonly double[] _state = new double[Dimension];
    private DormandPrince45 _loose = null!;
    private DormandPrince45 _tight = null!;
    private DormandPrince45 _fixed = null!;

    [GlobalSetup]
    public void Setup()
    {
        _loose = new DormandPrince45(Dimension, new DormandPrince45Options { RelativeTolerance = 1e-6, AbsoluteTolerance = 1e-9 });
        _tight = new DormandPrince45(Dimension, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 });
        _fixed = new DormandPrince45(Dimension, DormandPrince45Options.FixedStep(1e-3));
        foreach (var (name, solver) in new[] { ("rtol 1e-6", _loose), ("rtol 1e-10", _tight), ("fixed 1e-3", _fixed) })
        {
            var r = Run(solver);
            Console.WriteLine($"// {name}: {r.StepsAccepted} accepted, {r.StepsRejected} rejected, {r.Evaluations} evaluations per operation");
        }
    }

    [Benchmark(Baseline = true)]
    public OdeResult AdaptiveRtol1em6() => Run(_loose);

    [Benchmark]
    public OdeResult AdaptiveRtol1em10() => Run(_tight);

    [Benchmark]
    public OdeResult FixedStep1em3() => Run(_fixed);

    private OdeResult Run(DormandPrince45 solver)
    {
        for (int i = 0; i < Dimension / 2; i++)
        {
            _state[2 * i] = 0.1 * (i + 1);
            _state[2 * i + 1] = 0;
        }
        return solver.Integrate(new DuffingChain(), 0, _state, EndS);
    }

    /// <summary>Five unit masses on a line, each with a hardening spring to ground (x + 0.5 x^3), coupled to its
    /// neighbours by unit springs and lightly damped: 10 states (position, velocity).</summary>
    private readonly struct DuffingChain : IOdeSystem
    {
        public void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives)
        {
            int masses = state.Length / 2;
            for (int i = 0; i < masses; i++)
            {
                double x = state[2 * i], v = state[2 * i + 1];
                double left = i > 0 ? state[2 * (i - 1)] : 0;
                double right = i < masses - 1 ? state[2 * (i + 1)] : 0;
                derivatives[2 * i] = v;
                derivatives[2 * i + 1] = -x - 0.5 * x * x * x + (left - x) + (right - x) - 0.02 * v;
            }
        }
    }
}
