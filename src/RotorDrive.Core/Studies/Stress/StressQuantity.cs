namespace RotorDrive.Core.Studies.Stress;

/// <summary>A quantity the tolerance stress test varies. Per-station quantities are drawn independently for every
/// station (that is what unbalances yaw); the others once per sample for the whole rig.</summary>
/// <remarks>The order of the members is the order in which a sample draws them (per station first, station by station,
/// then the rig-wide ones); it is part of what makes a sample reproducible from (seed, index), so new members go at the
/// end.</remarks>
public enum StressQuantity
{
    /// <summary>Motor speed constant Kv, (rad/s)/V; per station.</summary>
    MotorKv,

    /// <summary>Motor winding resistance at 20 C, ohm; per station.</summary>
    MotorResistance,

    /// <summary>Motor no-load current, A; per station.</summary>
    MotorNoLoadCurrent,

    /// <summary>The phase-current limit the controller actually enforces, A (nominal: its burst rating); per station.</summary>
    ControllerCurrentLimit,

    /// <summary>Remanence of the rotor's levitation magnets at 20 C, T; per station.</summary>
    MagnetRemanence,

    /// <summary>Offset of the station's air gap from the craft's gap, m (nominal 0; positive sits higher); per station.</summary>
    GapOffset,

    /// <summary>Plate thickness, m; rig-wide.</summary>
    PlateThickness,

    /// <summary>Plate conductivity at 20 C, S/m; rig-wide.</summary>
    PlateConductivity,

    /// <summary>Ambient temperature (also the starting magnet and winding temperature), C; rig-wide.</summary>
    AmbientTemperature,

    /// <summary>Plate temperature, C; rig-wide.</summary>
    PlateTemperature,

    /// <summary>Pack state of charge at the start, fraction 0..1 (nominal 1, a charged pack); rig-wide.</summary>
    PackStateOfCharge,

    /// <summary>Internal resistance of the pack bank, ohm; rig-wide.</summary>
    PackResistance,

    /// <summary>Payload mass, kg; rig-wide.</summary>
    Payload,

    /// <summary>Offset of the structure-and-payload centre of gravity along x, m (nominal 0); rig-wide.</summary>
    CgOffsetX,

    /// <summary>Offset of the structure-and-payload centre of gravity along y, m (nominal 0); rig-wide.</summary>
    CgOffsetY,
}
