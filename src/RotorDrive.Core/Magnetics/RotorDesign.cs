namespace RotorDrive.Core.Magnetics;

/// <summary>A magnet rotor design (a Halbach array, or alternating poles on a steel disc), in SI units.</summary>
/// <remarks>Pole pairs p = Segments / SegmentsPerWavelength; at radius r the field pattern has wavenumber k = p / r
/// (K. Halbach, Nucl. Instrum. Methods 169, 1980). An alternating-pole rotor has two magnets per wavelength
/// (SegmentsPerWavelength = 2). Optional catalog columns are null when absent.</remarks>
/// <param name="Id">Catalog id.</param>
/// <param name="Segments">Number of magnet segments N around the ring.</param>
/// <param name="SegmentsPerWavelength">Segments per magnetic wavelength M (4 for a classic Halbach array).</param>
/// <param name="InnerRadiusM">Inner magnet radius, m.</param>
/// <param name="OuterRadiusM">Outer magnet radius, m.</param>
/// <param name="MagnetThicknessM">Magnet thickness h (axial), m.</param>
/// <param name="RemanenceT">Remanence Br at 20 C, T.</param>
/// <param name="RemanenceTempCoeffPerK">Relative temperature coefficient of Br, 1/K (NdFeB about -0.0012).</param>
/// <param name="MagnetDensityKgM3">Magnet density, kg/m^3, or null.</param>
/// <param name="RotorMassKg">Mass of the whole rotor, kg.</param>
/// <param name="InertiaKgM2">Moment of inertia about the spin axis, kg m^2.</param>
/// <param name="MaxSpeedRadPerS">Maximum rated speed, rad/s.</param>
/// <param name="BearingDragNm">Constant bearing drag torque, N m (0 when absent).</param>
/// <param name="BearingDampingNmPerRadPerS">Viscous bearing drag, N m per rad/s (0 when absent).</param>
/// <param name="RetainerThicknessM">Radial thickness of the outer magnet retaining ring, m, or null.</param>
/// <param name="RetainerAllowablePa">Allowable hoop stress of the retaining ring, Pa, or null.</param>
public sealed record RotorDesign(
    string Id,
    int Segments,
    int SegmentsPerWavelength,
    double InnerRadiusM,
    double OuterRadiusM,
    double MagnetThicknessM,
    double RemanenceT,
    double RemanenceTempCoeffPerK,
    double? MagnetDensityKgM3,
    double RotorMassKg,
    double InertiaKgM2,
    double MaxSpeedRadPerS,
    double BearingDragNm,
    double BearingDampingNmPerRadPerS,
    double? RetainerThicknessM,
    double? RetainerAllowablePa)
{
    /// <summary>How the magnets are arranged (default <see cref="RotorArray.Halbach"/>).</summary>
    public RotorArray Array { get; init; } = RotorArray.Halbach;

    /// <summary>Fraction of each pole pitch covered by magnet for an alternating-pole rotor, 0.3 to 1 (default 1; a Halbach
    /// array is always full).</summary>
    public double MagnetArcFraction { get; init; } = 1.0;

    /// <summary>Thickness of a steel back disc behind the magnets, m (0, the default, for none). The steel is treated as
    /// infinitely permeable and non-conducting, so only its presence matters, not its thickness.</summary>
    public double BackIronM { get; init; }

    /// <summary>Whether the magnets sit on a steel back disc.</summary>
    public bool HasBackIron => BackIronM > 0;

    /// <summary>Pole pairs p = N / M.</summary>
    public int PolePairs => Segments / SegmentsPerWavelength;

    /// <summary>Radial width of the magnet annulus, m.</summary>
    public double ActiveWidthM => OuterRadiusM - InnerRadiusM;

    /// <summary>Remanence at a magnet temperature: Br(T) = Br20 (1 + beta (T - 20)).</summary>
    public double RemanenceAt(double magnetTempC) => RemanenceT * (1 + RemanenceTempCoeffPerK * (magnetTempC - 20.0));
}
