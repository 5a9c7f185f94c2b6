namespace RotorDrive.Core.Drive;

/// <summary>How a rotor's controller is throttled in steady operation.</summary>
public enum ThrottleKind
{
    /// <summary>Open-loop duty.</summary>
    Duty,

    /// <summary>Speed hold: the controller sets the duty that holds a commanded shaft speed, within its limits.</summary>
    HoldSpeed,
}
