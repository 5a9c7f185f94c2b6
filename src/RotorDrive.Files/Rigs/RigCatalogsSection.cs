namespace RotorDrive.Files.Rigs;

/// <summary>"catalogs": paths of the six catalog files, relative to the rig file's folder.</summary>
public sealed class RigCatalogsSection
{
    /// <summary>"motors".</summary>
    public string? Motors { get; set; }

    /// <summary>"controllers".</summary>
    public string? Controllers { get; set; }

    /// <summary>"packs".</summary>
    public string? Packs { get; set; }

    /// <summary>"cell_curves".</summary>
    public string? CellCurves { get; set; }

    /// <summary>"rotors".</summary>
    public string? Rotors { get; set; }

    /// <summary>"plates".</summary>
    public string? Plates { get; set; }
}
