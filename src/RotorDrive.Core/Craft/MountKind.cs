namespace RotorDrive.Core.Craft;

/// <summary>How the rig is held: which analyses describe it.</summary>
public enum MountKind
{
    /// <summary>A free craft that trims its own force, pitch, roll and yaw (four or more stations).</summary>
    Free,

    /// <summary>A sled on rails: the rails carry pitch, roll and yaw; the rotors share the weight.</summary>
    Guided,

    /// <summary>Each rotor on a stand at a fixed gap: operating points per station, no hover.</summary>
    Bench,
}
