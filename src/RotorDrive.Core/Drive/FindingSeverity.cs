namespace RotorDrive.Core.Drive;

/// <summary>How serious a compatibility finding is.</summary>
public enum FindingSeverity
{
    /// <summary>The combination works but is held back or at risk in part of its range.</summary>
    Warning,

    /// <summary>The combination must not be used as it stands.</summary>
    Error,
}
