using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Tests.Numerics;

/// <summary>Keeps a copy of every observed point.</summary>
internal sealed class GridRecorder : IOdeObserver
{
    public List<(double Time, double[] State, ObservationKind Kind)> Points { get; } = [];

    public void Observe(double timeS, ReadOnlySpan<double> state, ObservationKind kind) => Points.Add((timeS, state.ToArray(), kind));
}
