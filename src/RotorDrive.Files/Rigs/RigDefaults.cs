namespace RotorDrive.Files.Rigs;

/// <summary>Values used when a rig file leaves an optional key out. All are common practice, no source.</summary>
public static class RigDefaults
{
    /// <summary>plate.convection_w_per_m2k: a still-air natural-convection estimate, W/(m^2 K).</summary>
    public const double ConvectionWPerM2K = 12.0;

    /// <summary>plate.spreading_factor: 1, the eddy heat kept in the plate under the magnet annulus (the hottest
    /// assumption).</summary>
    public const double PlateSpreadingFactor = 1.0;

    /// <summary>plate.emissivity: 0, no radiation from the plate (bare rolled aluminium and copper radiate little, about
    /// 0.04 to 0.1: F. P. Incropera et al., "Fundamentals of Heat and Mass Transfer", Table A.11, from memory; set about 0.8
    /// for a painted or anodised plate).</summary>
    public const double PlateEmissivity = 0.0;

    /// <summary>craft.heave_damping_ratio.</summary>
    public const double HeaveDampingRatio = 0.2;

    /// <summary>gear_yaw_friction_nm, N m.</summary>
    public const double GearYawFrictionNm = 5.0;

    /// <summary>limits.cell_cutoff_v, V (lithium-ion family).</summary>
    public const double CellCutoffV = 3.3;

    /// <summary>limits.usable_capacity_pct, %.</summary>
    public const double UsableCapacityPct = 80.0;

    /// <summary>limits.max_duty, 0..1.</summary>
    public const double MaxDuty = 0.95;

    /// <summary>limits.liftoff_time_s, s.</summary>
    public const double LiftoffTimeS = 6.0;
}
