namespace RotorDrive.Files.Rigs;

/// <summary>"plate": the conducting plate.</summary>
public sealed class RigPlateSection
{
    /// <summary>"material": id in plates.csv.</summary>
    public string? Material { get; set; }

    /// <summary>"thickness_mm": plate thickness, mm.</summary>
    public double? ThicknessMm { get; set; }

    /// <summary>"temperature_c": plate temperature at the start, C.</summary>
    public double? TemperatureC { get; set; }

    /// <summary>"convection_w_per_m2k": plate-to-air heat transfer coefficient, W/(m^2 K) (optional).</summary>
    public double? ConvectionWPerM2K { get; set; }

    /// <summary>"spreading_factor": plate patch area that takes a rotor's eddy heat / the magnet annulus area, at least 1
    /// (optional; default 1, the heat kept under the annulus: the hottest assumption).</summary>
    public double? SpreadingFactor { get; set; }

    /// <summary>"convection_top_w_per_m2k": heat transfer coefficient of the top face, W/(m^2 K) (optional; default
    /// convection_w_per_m2k).</summary>
    public double? ConvectionTopWPerM2K { get; set; }

    /// <summary>"convection_bottom_w_per_m2k": heat transfer coefficient of the bottom face, W/(m^2 K) (optional; default
    /// convection_w_per_m2k).</summary>
    public double? ConvectionBottomWPerM2K { get; set; }

    /// <summary>"emissivity": emissivity of the top face for radiation, 0..1 (optional; default 0, no radiation).</summary>
    public double? Emissivity { get; set; }

    /// <summary>"back_iron_mm": thickness of a steel layer directly under the plate, mm (optional; default 0, none).</summary>
    public double? BackIronMm { get; set; }
}
