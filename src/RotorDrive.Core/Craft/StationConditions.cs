namespace RotorDrive.Core.Craft;

/// <summary>The local conditions of one rotor station that studies vary: its gap offset and its temperatures.</summary>
/// <param name="GapOffsetM">Added to the rig's gap at this station, m (a floor step, a tilted rotor); 0 nominally.</param>
/// <param name="PlateTempC">Plate temperature under this rotor, C.</param>
/// <param name="RotorMagnetTempC">Rotor magnet temperature, C (scales the Halbach remanence).</param>
/// <param name="WindingTempC">Motor winding temperature, C (copper resistance, IEC 60028 coefficient).</param>
/// <param name="MotorMagnetTempC">Motor magnet temperature, C (scales the motor's flux).</param>
/// <remarks>Immutable; build a changed copy with <c>with</c>.</remarks>
public sealed record StationConditions(
    double GapOffsetM,
    double PlateTempC,
    double RotorMagnetTempC,
    double WindingTempC,
    double MotorMagnetTempC)
{
    /// <summary>The nominal conditions of a rig: no gap offset, the plate at the rig's plate temperature, magnets and
    /// windings at ambient.</summary>
    /// <param name="rig">The rig.</param>
    public static StationConditions Nominal(Rig rig)
    {
        Preconditions.NotNull(rig, nameof(rig));
        return new StationConditions(0, rig.PlateTemperatureC, rig.AmbientC, rig.AmbientC, rig.AmbientC);
    }
}
