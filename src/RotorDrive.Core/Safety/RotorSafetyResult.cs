namespace RotorDrive.Core.Safety;

/// <summary>Burst check of one rotor at one speed: rim speed, retaining-ring hoop stress, allowable and margin.</summary>
/// <param name="RotorId">The rotor design's catalog id.</param>
/// <param name="SpeedRadPerS">The speed assessed, rad/s.</param>
/// <param name="RatedSpeedRadPerS">The rotor's maximum rated speed, rad/s.</param>
/// <param name="RimSpeedMPerS">Peripheral speed of the outermost part (ring outer surface, or magnet outer radius when
/// no ring thickness is known), m/s.</param>
/// <param name="MagnetMassKg">Mass of the magnet annulus, kg.</param>
/// <param name="Assessment">Whether stress and margin could be assessed.</param>
/// <param name="HoopStressPa">Total hoop stress in the ring, Pa, or null when not assessed.</param>
/// <param name="RingOwnStressPa">Part of the stress from the ring's own rotation, Pa, or null.</param>
/// <param name="MagnetLoadStressPa">Part of the stress from carrying the magnets' centrifugal load, Pa, or null.</param>
/// <param name="AllowablePa">The ring's allowable hoop stress from the rotor row, Pa, or null.</param>
/// <param name="MarginFraction">allowable / stress - 1 (0 at the allowable, negative beyond), or null when not assessed.</param>
/// <param name="SpeedAtAllowableRadPerS">Speed at which the stress reaches the allowable (stress grows as speed
/// squared), rad/s, or null when not assessed.</param>
public sealed record RotorSafetyResult(
    string RotorId,
    double SpeedRadPerS,
    double RatedSpeedRadPerS,
    double RimSpeedMPerS,
    double MagnetMassKg,
    RetainerAssessment Assessment,
    double? HoopStressPa,
    double? RingOwnStressPa,
    double? MagnetLoadStressPa,
    double? AllowablePa,
    double? MarginFraction,
    double? SpeedAtAllowableRadPerS)
{
    /// <summary>Whether the assessed speed is above the rotor's maximum rated speed.</summary>
    public bool AboveRatedSpeed => SpeedRadPerS > RatedSpeedRadPerS;

    /// <summary>The burst verdict every interface shows: false when the speed is above the rotor's rated speed or the ring
    /// is over its allowable (margin below 0), true when the margin was assessed and is 0 or more, null when it could not
    /// be assessed (see <see cref="Assessment"/>).</summary>
    public bool? Passes => AboveRatedSpeed || MarginFraction is < 0 ? false : MarginFraction is null ? null : true;
}
