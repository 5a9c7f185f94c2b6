namespace RotorDrive.Core.Craft;

/// <summary>How a whole-craft hover solve ended.</summary>
public enum HoverStatus
{
    /// <summary>Balanced, every equilibrium stable, every limit holds.</summary>
    Hovering,

    /// <summary>Balanced, but a limit fails or an equilibrium is unstable (see the findings).</summary>
    LimitExceeded,

    /// <summary>No balance found (the rotors cannot lift the weight within the searched speeds, or the solve did not
    /// converge); see the findings.</summary>
    NoBalance,

    /// <summary>The speeds balance the craft, but the drivetrain cannot make the torques they need (a duty above the
    /// controller's maximum, a current above its limit, or more than the pack can supply): no such state exists, and the
    /// result holds none (the findings say what falls short and what full duty gives instead).</summary>
    BeyondDrivetrain,

    /// <summary>Fewer than four stations: force, pitch, roll and yaw cannot all be balanced.</summary>
    TooFewStations,
}
