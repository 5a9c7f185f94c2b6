namespace RotorDrive.Core.Studies.Stress;

/// <summary>The drawn part values of one station in one stress sample, in SI units.</summary>
/// <param name="KvRadPerSPerV">Motor speed constant, (rad/s)/V.</param>
/// <param name="ResistanceOhm">Motor winding resistance at 20 C, ohm.</param>
/// <param name="NoLoadCurrentA">Motor no-load current, A.</param>
/// <param name="CurrentLimitA">Phase-current limit the controller enforces, A.</param>
/// <param name="RemanenceT">Remanence of the rotor's levitation magnets at 20 C, T.</param>
/// <param name="GapOffsetM">Offset of this station's gap from the craft's gap, m (positive: higher).</param>
public sealed record StationParts(
    double KvRadPerSPerV,
    double ResistanceOhm,
    double NoLoadCurrentA,
    double CurrentLimitA,
    double RemanenceT,
    double GapOffsetM)
{
    /// <summary>The value of a per-station quantity.</summary>
    /// <param name="quantity">A per-station quantity.</param>
    /// <exception cref="ArgumentOutOfRangeException">The quantity is rig-wide.</exception>
    public double Value(StressQuantity quantity) => quantity switch
    {
        StressQuantity.MotorKv => KvRadPerSPerV,
        StressQuantity.MotorResistance => ResistanceOhm,
        StressQuantity.MotorNoLoadCurrent => NoLoadCurrentA,
        StressQuantity.ControllerCurrentLimit => CurrentLimitA,
        StressQuantity.MagnetRemanence => RemanenceT,
        StressQuantity.GapOffset => GapOffsetM,
        _ => throw new ArgumentOutOfRangeException(nameof(quantity), quantity, "Not a per-station quantity."),
    };
}
