using RotorDrive.Core.Drive;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Craft;

/// <summary>One rotor station of a rig: where it sits, which way it spins, its rotor and its drivetrain.</summary>
/// <param name="XM">Position of the rotor axis from the rig origin, m (x forward).</param>
/// <param name="YM">Position of the rotor axis from the rig origin, m (y left).</param>
/// <param name="Spin">Spin direction seen from above.</param>
/// <param name="Rotor">The rotor design.</param>
/// <param name="Motor">The assigned motor, or null when none is assigned yet.</param>
/// <param name="Controller">The assigned speed controller, or null when none is assigned yet.</param>
public sealed record Station(
    double XM,
    double YM,
    SpinDirection Spin,
    RotorDesign Rotor,
    Motor? Motor,
    SpeedController? Controller)
{
    /// <summary>The name people call the station by ("front left"), or null when the rig gives none (rig file
    /// <c>stations[].name</c>).</summary>
    public string? Name { get; init; }

    /// <summary>The controller duty the user sets for this station (rig file <c>stations[].duty</c>), 0..1, or null: a
    /// guided sled with a duty on every station hovers where these duties lift its weight (<see cref="CommonDutyHover.SolveDuties"/>);
    /// a bench station runs at it (<see cref="BenchState"/>). A free craft's trim sets its own duties and never carries one.</summary>
    public double? Duty { get; init; }

    /// <summary>The station as every output names it: "station 3", or "station 3 (front left)" when it has a name.</summary>
    /// <param name="index">The station's index in the rig, 0-based; shown counted from 1.</param>
    public string Label(int index)
        => Name is { } name ? $"station {index + 1} ({name})" : $"station {index + 1}";
}
