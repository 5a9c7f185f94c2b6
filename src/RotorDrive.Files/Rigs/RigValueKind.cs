namespace RotorDrive.Files.Rigs;

/// <summary>What a rig-file key holds.</summary>
public enum RigValueKind
{
    /// <summary>Free text (the rig's name, the schema reference).</summary>
    Text,

    /// <summary>A catalog file path, relative to the rig file.</summary>
    FilePath,

    /// <summary>An id in one of the catalogs.</summary>
    CatalogId,

    /// <summary>One word of a fixed list ("cw"/"ccw").</summary>
    Choice,

    /// <summary>A finite number in the key's unit.</summary>
    Number,

    /// <summary>A whole number.</summary>
    Integer,

    /// <summary>An object whose keys are listed in the schema under this key.</summary>
    Section,

    /// <summary>An array of objects whose keys are listed in the schema under this key with "[]".</summary>
    SectionList,

    /// <summary>"tolerances": one entry per key of <see cref="RigToleranceKeys"/>.</summary>
    Tolerances,

    /// <summary>"calibrations": {rotor id: file}.</summary>
    FileMap,
}
