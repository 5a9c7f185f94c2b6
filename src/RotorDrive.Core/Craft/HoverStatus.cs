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

    /// <summary>Fewer than four stations: force, pitch, roll and yaw cannot all be balanced.</summary>
    TooFewStations,
}
