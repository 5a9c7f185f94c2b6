namespace RotorDrive.Files.Rigs;

/// <summary>One element of "route": a straight move of the craft origin to x_mm, y_mm at speed_m_per_s, or a dwell of
/// dwell_s seconds.</summary>
public sealed class RigRouteLegSection
{
    /// <summary>"x_mm": target x of a move, mm.</summary>
    public double? XMm { get; set; }

    /// <summary>"y_mm": target y of a move, mm.</summary>
    public double? YMm { get; set; }

    /// <summary>"speed_m_per_s": speed of a move, m/s.</summary>
    public double? SpeedMPerS { get; set; }

    /// <summary>"dwell_s": duration of a dwell, s.</summary>
    public double? DwellS { get; set; }
}
