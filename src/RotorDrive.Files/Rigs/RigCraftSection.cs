namespace RotorDrive.Files.Rigs;

/// <summary>"craft": structure and payload, without the drivetrain.</summary>
public sealed class RigCraftSection
{
    /// <summary>"empty_mass_kg".</summary>
    public double? EmptyMassKg { get; set; }

    /// <summary>"payload_kg".</summary>
    public double? PayloadKg { get; set; }

    /// <summary>"cg_x_mm": centre of gravity of structure and payload, x (forward), mm.</summary>
    public double? CgXMm { get; set; }

    /// <summary>"cg_y_mm": centre of gravity of structure and payload, y (left), mm.</summary>
    public double? CgYMm { get; set; }

    /// <summary>"yaw_inertia_kg_m2".</summary>
    public double? YawInertiaKgM2 { get; set; }

    /// <summary>"heave_damping_ratio" (optional).</summary>
    public double? HeaveDampingRatio { get; set; }
}
