namespace RotorDrive.Core.Drive;

/// <summary>How an equilibrium arises.</summary>
public enum EquilibriumKind
{
    /// <summary>Motor torque crosses load torque at this speed.</summary>
    Crossing,

    /// <summary>The motor's starting torque does not overcome the load's starting torque: the rotor stays at rest.</summary>
    AtRest,

    /// <summary>A speed-holding controller holds the commanded speed (its regulation makes the point stable).</summary>
    Held,
}
