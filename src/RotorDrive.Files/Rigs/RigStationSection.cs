namespace RotorDrive.Files.Rigs;

/// <summary>One element of "stations": a rotor's position, spin and parts.</summary>
public sealed class RigStationSection
{
    /// <summary>"name": what people call the station ("front left"), shown beside its number (optional).</summary>
    public string? Name { get; set; }

    /// <summary>"x_mm": rotor axis, forward, mm.</summary>
    public double? XMm { get; set; }

    /// <summary>"y_mm": rotor axis, left, mm.</summary>
    public double? YMm { get; set; }

    /// <summary>"spin": "cw" or "ccw" seen from above.</summary>
    public string? Spin { get; set; }

    /// <summary>"rotor": id in rotors.csv.</summary>
    public string? Rotor { get; set; }

    /// <summary>"motor": id in motors.csv (optional).</summary>
    public string? Motor { get; set; }

    /// <summary>"controller": id in controllers.csv (optional).</summary>
    public string? Controller { get; set; }

    /// <summary>"duty": the controller duty the user sets for a guided or bench rig, 0..limits.max_duty (optional).</summary>
    public double? Duty { get; set; }
}
