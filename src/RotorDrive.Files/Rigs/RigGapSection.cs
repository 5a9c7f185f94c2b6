namespace RotorDrive.Files.Rigs;

/// <summary>"gap": air gaps between magnet face and plate.</summary>
public sealed class RigGapSection
{
    /// <summary>"design_mm": hover gap, mm.</summary>
    public double? DesignMm { get; set; }

    /// <summary>"landed_mm": gap resting on the landing gear, mm.</summary>
    public double? LandedMm { get; set; }
}
