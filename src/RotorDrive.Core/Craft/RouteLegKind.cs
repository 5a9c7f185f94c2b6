namespace RotorDrive.Core.Craft;

/// <summary>What a leg of a craft's route does.</summary>
public enum RouteLegKind
{
    /// <summary>A straight move to a point at a constant speed.</summary>
    Move,

    /// <summary>A hover in place for a time.</summary>
    Dwell,
}
