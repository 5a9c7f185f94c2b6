namespace RotorDrive.Core.Drive;

/// <summary>How a bus solve ended.</summary>
public enum BusStatus
{
    /// <summary>A bus voltage satisfying every controller and the pack was found, above half the open-circuit voltage.</summary>
    Solved,

    /// <summary>A solution exists but the pack is past its maximum-power point (bus below half its open-circuit voltage):
    /// more current gives less power, the bus has collapsed (maximum power transfer theorem).</summary>
    Collapsed,

    /// <summary>No positive bus voltage satisfies the equations (the load exceeds what the pack can ever supply).</summary>
    NoSolution,
}
