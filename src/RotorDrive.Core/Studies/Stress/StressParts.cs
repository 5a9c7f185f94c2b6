namespace RotorDrive.Core.Studies.Stress;

/// <summary>Every drawn value of one stress sample, in SI units: per-station parts and the rig-wide quantities.</summary>
/// <param name="SampleIndex">The sample's index (its random stream is <see cref="SampleStreams.ForSample"/>(seed, index)).</param>
/// <param name="Stations">Per-station parts, in the rig's station order.</param>
/// <param name="PlateThicknessM">Plate thickness, m.</param>
/// <param name="PlateConductivitySPerM">Plate conductivity at 20 C, S/m.</param>
/// <param name="AmbientC">Ambient temperature (magnets and windings start at it), C.</param>
/// <param name="PlateTempC">Plate temperature, C.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1.</param>
/// <param name="PackResistanceOhm">Internal resistance of the pack bank, ohm.</param>
/// <param name="PayloadKg">Payload, kg.</param>
/// <param name="CgOffsetXM">Offset of the structure-and-payload centre of gravity along x, m.</param>
/// <param name="CgOffsetYM">Offset of the structure-and-payload centre of gravity along y, m.</param>
public sealed record StressParts(
    int SampleIndex,
    IReadOnlyList<StationParts> Stations,
    double PlateThicknessM,
    double PlateConductivitySPerM,
    double AmbientC,
    double PlateTempC,
    double SocFraction,
    double PackResistanceOhm,
    double PayloadKg,
    double CgOffsetXM,
    double CgOffsetYM)
{
    /// <summary>Drawn bench calibrations by rotor design id (empty when the rig has none, see <c>Rig.Calibrations</c>).</summary>
    /// <remarks>A rig without calibrations shares one empty instance, so parts of such rigs keep value equality.</remarks>
    public IReadOnlyDictionary<string, Loads.LoadCalibration> Calibrations { get; init; } = NoCalibrations;

    /// <summary>The shared empty set of drawn calibrations.</summary>
    public static IReadOnlyDictionary<string, Loads.LoadCalibration> NoCalibrations { get; } = new Dictionary<string, Loads.LoadCalibration>();

    /// <summary>The value of a quantity: for a per-station one at <paramref name="station"/>, otherwise the rig's.</summary>
    /// <param name="quantity">The quantity.</param>
    /// <param name="station">Station index for per-station quantities (ignored otherwise).</param>
    public double Value(StressQuantity quantity, int station = 0) => quantity switch
    {
        StressQuantity.PlateThickness => PlateThicknessM,
        StressQuantity.PlateConductivity => PlateConductivitySPerM,
        StressQuantity.AmbientTemperature => AmbientC,
        StressQuantity.PlateTemperature => PlateTempC,
        StressQuantity.PackStateOfCharge => SocFraction,
        StressQuantity.PackResistance => PackResistanceOhm,
        StressQuantity.Payload => PayloadKg,
        StressQuantity.CgOffsetX => CgOffsetXM,
        StressQuantity.CgOffsetY => CgOffsetYM,
        _ => Stations[station].Value(quantity),
    };
}
