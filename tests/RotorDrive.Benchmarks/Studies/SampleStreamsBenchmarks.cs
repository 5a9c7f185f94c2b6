using BenchmarkDotNet.Attributes;
using RotorDrive.Core.Studies;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Cost of one Monte Carlo sample's randomness: creating its stream and drawing twenty toleranced quantities.</summary>
/// <remarks>Run: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*SampleStreams*'</remarks>
[MemoryDiagnoser]
public class SampleStreamsBenchmarks
{
    private readonly Tolerance _normal = Tolerance.Normal(5, ToleranceScale.Percent, keepPositive: true);
    private readonly Tolerance _uniform = Tolerance.Uniform(-1.5e-3, 0.5e-3, ToleranceScale.Absolute, keepPositive: true);
    private int _index;

    [Benchmark]
    public Random CreateStream() => SampleStreams.ForSample(1, _index++ & 0xFFFF);

    [Benchmark]
    public double CreateStreamAndDrawTwenty()
    {
        var random = SampleStreams.ForSample(1, _index++ & 0xFFFF);
        double sum = 0;
        for (int i = 0; i < 10; i++)
        {
            sum += _normal.Apply(100.0, random);
            sum += _uniform.Apply(0.01, random);
        }
        return sum;
    }
}
