namespace RotorDrive.Core.Studies.Stress;

/// <summary>Settings of a stress study run.</summary>
/// <param name="Samples">Number of samples, at least 1; default 2000.</param>
/// <param name="Seed">The study's seed; default 1. Sample k uses <see cref="SampleStreams.ForSample"/>(Seed, k).</param>
/// <param name="Threads">Largest number of worker threads, or null (default) for one per processor. The results do not
/// depend on it.</param>
/// <param name="DriversWhenStopped">True (default) to compute the drivers of a cancelled run before returning; false to
/// return its other figures at once with the drivers left pending (<see cref="StressResult.DriversPending"/>, completed
/// by <see cref="StressStudy.CompleteDrivers"/>): the workbench shows what a stopped run kept without waiting for its
/// drivers (issue 15 item 1: F8 within 0.5 s).</param>
public sealed record StressStudyOptions(int Samples = 2000, int Seed = 1, int? Threads = null, bool DriversWhenStopped = true)
{
    /// <summary>The defaults: 2000 samples, seed 1, every processor.</summary>
    public static StressStudyOptions Default { get; } = new();
}
