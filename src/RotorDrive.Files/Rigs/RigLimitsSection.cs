namespace RotorDrive.Files.Rigs;

/// <summary>"limits": the limits the team sets.</summary>
public sealed class RigLimitsSection
{
    /// <summary>"yaw_torque_nm": largest residual yaw torque with equal throttles, N m.</summary>
    public double? YawTorqueNm { get; set; }

    /// <summary>"plate_temp_c": largest plate temperature, C.</summary>
    public double? PlateTempC { get; set; }

    /// <summary>"cell_cutoff_v": loaded cell voltage at which the pack counts as empty, V (optional).</summary>
    public double? CellCutoffV { get; set; }

    /// <summary>"usable_capacity_pct": share of the pack capacity the team allows itself, % (optional).</summary>
    public double? UsableCapacityPct { get; set; }

    /// <summary>"max_duty": largest controller duty a trim may use, 0..1 (optional).</summary>
    public double? MaxDuty { get; set; }

    /// <summary>"liftoff_time_s": longest acceptable time from start to lift-off, s (optional).</summary>
    public double? LiftoffTimeS { get; set; }
}
