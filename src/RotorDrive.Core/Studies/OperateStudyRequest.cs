using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Studies;

/// <summary>What an operating-point study runs: one station's rotor on its drivetrain (or alternative parts) at one
/// throttle, gap and state of charge, or the duty swept from rest to the rig's max duty.</summary>
/// <param name="Station">Station index, 0-based.</param>
/// <param name="Motor">A motor instead of the station's, or null for the station's.</param>
/// <param name="Controller">A controller instead of the station's, or null for the station's.</param>
/// <param name="Packs">A pack bank instead of the rig's, or null for the rig's.</param>
/// <param name="Throttle">The throttle, or null for the station's set duty (<c>stations[].duty</c>, a guided or bench rig)
/// or else the rig's max duty (<c>limits.max_duty</c>).</param>
/// <param name="GapM">Air gap, m (&gt; 0), or null for the rig's design gap.</param>
/// <param name="SocFraction">Pack state of charge, 0..1; default 1.</param>
/// <param name="SweepSteps">When set (&gt;= 2): the point reached from rest at this many duties evenly spaced from 0 to the
/// rig's max duty, instead of one throttle.</param>
/// <param name="MapDuties">Duties whose motor torque lines and equilibria the result carries as a torque-speed map, or
/// null for none.</param>
public sealed record OperateStudyRequest(
    int Station = 0,
    Motor? Motor = null,
    SpeedController? Controller = null,
    PackBank? Packs = null,
    ThrottleCommand? Throttle = null,
    double? GapM = null,
    double SocFraction = 1.0,
    int? SweepSteps = null,
    IReadOnlyList<double>? MapDuties = null);
