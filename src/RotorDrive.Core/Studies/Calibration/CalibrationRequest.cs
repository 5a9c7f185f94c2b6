using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Studies.Calibration;

/// <summary>What to calibrate: a rotor over a plate, and either steady bench points or a spin-down trace.</summary>
/// <param name="Rotor">The rotor design as in the catalog (its inertia is used for a spin-down).</param>
/// <param name="Plate">The plate of the bench.</param>
/// <param name="PlateTempC">Plate temperature for points without their own, C.</param>
/// <param name="MagnetTempC">Magnet temperature, C.</param>
/// <param name="Points">Steady points, or null for a spin-down.</param>
/// <param name="Trace">Spin-down samples in time order, or null for steady points.</param>
public sealed record CalibrationRequest(
    RotorDesign Rotor,
    Plate Plate,
    double PlateTempC,
    double MagnetTempC,
    IReadOnlyList<BenchPoint>? Points,
    IReadOnlyList<SpinDownSample>? Trace)
{
    /// <summary>Load model settings (end correction, radial points, air); any calibration in them is ignored: the fit
    /// starts from the uncorrected model.</summary>
    public LoadModelOptions Load { get; init; } = LoadModelOptions.Default;

    /// <summary>Fit settings.</summary>
    public CalibrationOptions Options { get; init; } = CalibrationOptions.Default;

    /// <summary>The kind of data.</summary>
    public CalibrationKind Kind => Trace is not null ? CalibrationKind.SpinDown : CalibrationKind.SteadyPoints;
}
