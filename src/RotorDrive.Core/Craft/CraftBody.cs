namespace RotorDrive.Core.Craft;

/// <summary>The craft's structure and payload, without rotors, motors, controllers and packs.</summary>
/// <param name="EmptyMassKg">Structure mass without drivetrain, rotors and payload, kg.</param>
/// <param name="PayloadKg">Payload mass, kg.</param>
/// <param name="CgXM">Centre of gravity of structure and payload, x, m.</param>
/// <param name="CgYM">Centre of gravity of structure and payload, y, m.</param>
/// <param name="YawInertiaKgM2">Yaw moment of inertia of the whole craft, kg m^2.</param>
/// <param name="HeaveDampingRatio">Heave damping ratio from added dampers (eddy levitation itself is barely damped).</param>
public sealed record CraftBody(
    double EmptyMassKg,
    double PayloadKg,
    double CgXM,
    double CgYM,
    double YawInertiaKgM2,
    double HeaveDampingRatio);
