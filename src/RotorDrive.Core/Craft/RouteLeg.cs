namespace RotorDrive.Core.Craft;

/// <summary>One leg of a craft's route over the plate.</summary>
/// <param name="Kind">Move or dwell.</param>
/// <param name="XM">Target x of the craft origin for a move, m (rig coordinates; the craft starts at 0, 0).</param>
/// <param name="YM">Target y of the craft origin for a move, m.</param>
/// <param name="SpeedMPerS">Speed of a move, m/s (&gt; 0); 0 for a dwell.</param>
/// <param name="DurationS">Duration of a dwell, s (&gt; 0); 0 for a move (its duration follows from distance and speed).</param>
public sealed record RouteLeg(RouteLegKind Kind, double XM, double YM, double SpeedMPerS, double DurationS)
{
    /// <summary>A straight move to a point at a speed.</summary>
    /// <param name="xM">Target x, m.</param>
    /// <param name="yM">Target y, m.</param>
    /// <param name="speedMPerS">Speed, m/s, &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or the speed is not positive.</exception>
    public static RouteLeg Move(double xM, double yM, double speedMPerS)
        => new(RouteLegKind.Move, Preconditions.Finite(xM, nameof(xM)), Preconditions.Finite(yM, nameof(yM)), Preconditions.Positive(speedMPerS, nameof(speedMPerS)), 0);

    /// <summary>A hover in place.</summary>
    /// <param name="durationS">Duration, s, &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">The duration is not positive.</exception>
    public static RouteLeg Dwell(double durationS) => new(RouteLegKind.Dwell, 0, 0, 0, Preconditions.Positive(durationS, nameof(durationS)));
}
