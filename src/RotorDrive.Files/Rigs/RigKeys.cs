namespace RotorDrive.Files.Rigs;

/// <summary>The keys of the rig file, in the order the writer uses.</summary>
public static class RigKeys
{
    /// <summary>Top-level keys.</summary>
    public static IReadOnlyList<string> Top { get; } =
        ["name", "catalogs", "plate", "craft", "gap", "ambient_c", "gear_yaw_friction_nm", "load_model", "stations", "pack", "limits", "tolerances", "route", "calibrations"];

    /// <summary>Keys of "catalogs".</summary>
    public static IReadOnlyList<string> Catalogs { get; } = ["motors", "controllers", "packs", "cell_curves", "rotors", "plates"];

    /// <summary>Keys of "plate".</summary>
    public static IReadOnlyList<string> Plate { get; } = ["material", "thickness_mm", "temperature_c", "convection_w_per_m2k", "spreading_factor",
        "convection_top_w_per_m2k", "convection_bottom_w_per_m2k", "emissivity", "back_iron_mm"];

    /// <summary>Keys of each element of "route".</summary>
    public static IReadOnlyList<string> RouteLeg { get; } = ["x_mm", "y_mm", "speed_m_per_s", "dwell_s"];

    /// <summary>Keys of "craft".</summary>
    public static IReadOnlyList<string> Craft { get; } =
        ["empty_mass_kg", "payload_kg", "cg_x_mm", "cg_y_mm", "yaw_inertia_kg_m2", "heave_damping_ratio"];

    /// <summary>Keys of "gap".</summary>
    public static IReadOnlyList<string> Gap { get; } = ["design_mm", "landed_mm"];

    /// <summary>Keys of each element of "stations".</summary>
    public static IReadOnlyList<string> Station { get; } = ["x_mm", "y_mm", "spin", "rotor", "motor", "controller"];

    /// <summary>Keys of "pack".</summary>
    public static IReadOnlyList<string> Pack { get; } = ["id", "count"];

    /// <summary>Keys of "limits".</summary>
    public static IReadOnlyList<string> Limits { get; } =
        ["yaw_torque_nm", "plate_temp_c", "cell_cutoff_v", "usable_capacity_pct", "max_duty", "liftoff_time_s"];
}
