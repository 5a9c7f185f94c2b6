namespace RotorDrive.Files.Catalogs;

/// <summary>The six catalog files a rig names.</summary>
public enum PartKind
{
    /// <summary>motors.csv.</summary>
    Motor,

    /// <summary>controllers.csv.</summary>
    Controller,

    /// <summary>packs.csv.</summary>
    Pack,

    /// <summary>cell_curves.csv.</summary>
    CellCurve,

    /// <summary>rotors.csv.</summary>
    Rotor,

    /// <summary>plates.csv.</summary>
    Plate,
}
