using RotorDrive.Core.Loads;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Craft;

/// <summary>Settings for building a <see cref="RigModel"/>.</summary>
/// <remarks>Defaults: full pack (state of charge 1), the load model's defaults (end correction on), the table range of
/// <see cref="Rig.LoadTableRangeFor"/>, the default rotor-safety densities.</remarks>
public sealed record RigModelOptions
{
    /// <summary>The defaults.</summary>
    public static RigModelOptions Default { get; } = new();

    /// <summary>Pack state of charge, 0..1 (default 1).</summary>
    public double SocFraction { get; init; } = 1.0;

    /// <summary>Load model settings (end correction, radial points, air).</summary>
    public LoadModelOptions Load { get; init; } = LoadModelOptions.Default;

    /// <summary>Retainer and magnet densities for the rotor safety checks.</summary>
    public RotorSafetyOptions Safety { get; init; } = RotorSafetyOptions.Default;
}
