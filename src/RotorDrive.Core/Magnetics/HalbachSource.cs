namespace RotorDrive.Core.Magnetics;

/// <summary>The fundamental of a Halbach array's field at its strong face and at an air gap below it.</summary>
/// <remarks>An M-segment-per-wavelength Halbach array of thickness h has, at its strong face, a fundamental of amplitude
/// Br (1 - e^(-k h)) sin(pi/M)/(pi/M) for wavenumber k; at a distance g from the face it is multiplied by e^(-k g)
/// (K. Halbach, "Design of permanent multipole magnets with oriented rare earth cobalt material", Nucl. Instrum.
/// Methods 169, 1980; used for Inductrack by R. F. Post and D. D. Ryutov, IEEE Trans. Appl. Supercond. 10, 2000).
/// For a ring of N segments the pattern has p = N/M pole pairs and at radius r the local wavenumber is k = p/r.
/// The normal and tangential components of one travelling harmonic have the same amplitude.</remarks>
public static class HalbachSource
{
    /// <summary>Fundamental factor of a segmented array, sin(pi/M)/(pi/M): 0.9003 for M = 4, tending to 1 as M grows.</summary>
    /// <param name="segmentsPerWavelength">Segments per wavelength M, at least 2.</param>
    /// <exception cref="ArgumentOutOfRangeException">M is below 2.</exception>
    public static double FundamentalFactor(int segmentsPerWavelength)
    {
        Preconditions.AtLeast(segmentsPerWavelength, 2, nameof(segmentsPerWavelength));
        double x = Math.PI / segmentsPerWavelength;
        return Math.Sin(x) / x;
    }

    /// <summary>Field amplitude of the fundamental at a distance below the array's strong face, T.</summary>
    /// <remarks>B = Br (1 - e^(-k h)) sin(pi/M)/(pi/M) e^(-k g) (Halbach 1980). With g the air gap this is the field the
    /// source alone would put on the plate's top surface, Bs in ../DESIGN.md §4.1.</remarks>
    /// <param name="remanenceT">Remanence Br of the magnets, T (at their temperature).</param>
    /// <param name="segmentsPerWavelength">Segments per wavelength M, at least 2.</param>
    /// <param name="magnetThicknessM">Magnet thickness h, m, greater than 0.</param>
    /// <param name="wavenumberPerM">Wavenumber k, 1/m, greater than 0.</param>
    /// <param name="distanceM">Distance g below the strong face, m, at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static double FieldT(double remanenceT, int segmentsPerWavelength, double magnetThicknessM, double wavenumberPerM, double distanceM)
    {
        Preconditions.NonNegative(remanenceT, nameof(remanenceT));
        Preconditions.Positive(magnetThicknessM, nameof(magnetThicknessM));
        Preconditions.Positive(wavenumberPerM, nameof(wavenumberPerM));
        Preconditions.NonNegative(distanceM, nameof(distanceM));
        double k = wavenumberPerM;
        // -expm1(-k h) = 1 - e^(-k h) without cancellation for thin magnets.
        return remanenceT * -AccurateMath.ExpM1(-k * magnetThicknessM) * FundamentalFactor(segmentsPerWavelength) * Math.Exp(-k * distanceM);
    }
}
