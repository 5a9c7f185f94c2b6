using RotorDrive.Core;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of rotors.csv, in the file's units.</summary>
public sealed record RotorRow(
    string Id,
    int Segments,
    int SegmentsPerWavelength,
    double InnerRadiusMm,
    double OuterRadiusMm,
    double MagnetThicknessMm,
    double RemanenceT,
    double RemanenceTempCoeffPctPerK,
    double? MagnetDensityKgM3,
    double RotorMassG,
    double InertiaKgM2,
    double MaxRpm,
    double? BearingDragNm,
    double? BearingDampingNmPerKrpm,
    double? RetainerThicknessMm,
    double? RetainerAllowableMpa)
{
    /// <summary>Converts a viscous drag coefficient in N m per 1000 rpm to N m per rad/s.</summary>
    public static double DampingToSi(double nmPerKrpm) => nmPerKrpm / (1000.0 * Units.RadPerSPerRpm);

    /// <summary>The rotor design in SI units (mm to m, %/K to 1/K, g to kg, rpm to rad/s, N m/krpm to N m s/rad,
    /// MPa to Pa); absent bearing terms become 0.</summary>
    public RotorDesign ToRotor() => new(
        Id,
        Segments,
        SegmentsPerWavelength,
        InnerRadiusMm / 1000.0,
        OuterRadiusMm / 1000.0,
        MagnetThicknessMm / 1000.0,
        RemanenceT,
        RemanenceTempCoeffPctPerK / 100.0,
        MagnetDensityKgM3,
        RotorMassG / 1000.0,
        InertiaKgM2,
        Units.RpmToRadPerS(MaxRpm),
        BearingDragNm ?? 0.0,
        DampingToSi(BearingDampingNmPerKrpm ?? 0.0),
        RetainerThicknessMm / 1000.0,
        RetainerAllowableMpa * 1e6)
    {
        Array = string.Equals(Array, "alternating", StringComparison.OrdinalIgnoreCase) ? RotorArray.Alternating : RotorArray.Halbach,
        MagnetArcFraction = MagnetArcFraction ?? 1.0,
        BackIronM = (BackIronMm ?? 0.0) / 1000.0,
    };

    /// <summary>"array": "halbach" (default when absent) or "alternating".</summary>
    public string? Array { get; init; }

    /// <summary>"magnet_arc_fraction": fraction of each pole pitch covered by magnet (alternating poles), or null for 1.</summary>
    public double? MagnetArcFraction { get; init; }

    /// <summary>"back_iron_mm": steel back disc behind the magnets, mm, or null for none.</summary>
    public double? BackIronMm { get; init; }
}
