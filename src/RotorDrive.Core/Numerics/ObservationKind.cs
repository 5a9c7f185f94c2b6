namespace RotorDrive.Core.Numerics;

/// <summary>Why the integrator hands a point of the solution to an observer.</summary>
public enum ObservationKind
{
    /// <summary>The initial state, at the start time.</summary>
    Start,

    /// <summary>The end of an accepted step (when no output interval is set).</summary>
    Step,

    /// <summary>A point of the fixed output grid, interpolated with the continuous extension.</summary>
    Grid,

    /// <summary>The last point: end time, located event, or where the integration gave up (see the result's status).</summary>
    Stop,
}
