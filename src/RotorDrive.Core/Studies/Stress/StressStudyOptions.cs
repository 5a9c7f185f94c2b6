namespace RotorDrive.Core.Studies.Stress;

/// <summary>Settings of a stress study run.</summary>
/// <param name="Samples">Number of samples, at least 1; default 2000.</param>
/// <param name="Seed">The study's seed; default 1. Sample k uses <see cref="SampleStreams.ForSample"/>(Seed, k).</param>
/// <param name="Threads">Largest number of worker threads, or null (default) for one per processor. The results do not
/// depend on it.</param>
public sealed record StressStudyOptions(int Samples = 2000, int Seed = 1, int? Threads = null)
{
    /// <summary>The defaults: 2000 samples, seed 1, every processor.</summary>
    public static StressStudyOptions Default { get; } = new();
}
