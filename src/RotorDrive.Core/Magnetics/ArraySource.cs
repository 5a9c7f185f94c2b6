namespace RotorDrive.Core.Magnetics;

/// <summary>Harmonics of a rotor's magnetisation and the normal field each puts on the plate, in two or three dimensions.</summary>
/// <remarks>
/// <para>Halbach array with M segments per wavelength: the piecewise-constant magnetisation direction has harmonics
/// n = 1 + jM (j any integer) with amplitude a_n = sin(n pi/M)/(n pi/M) (K. Halbach, Nucl. Instrum. Methods 169, 1980;
/// the same series for linear arrays in R. F. Post and D. D. Ryutov, IEEE Trans. Appl. Supercond. 10, 2000).
/// Alternating poles with arc fraction alpha: the axial magnetisation is a square wave with gaps, harmonics n odd with
/// amplitude (4/(n pi)) sin(n pi alpha / 2) (Fourier series of the pulse train; e.g. Z. Q. Zhu and D. Howe, IEEE Trans.
/// Magn. 29(1), 1993, for surface magnets).</para>
/// <para>Field: for one Fourier component e^(i(q x + k_y y)) of a magnetised layer of thickness h, with k = sqrt(q^2 +
/// k_y^2), the normal field a distance g below its face is (Br/2) e^(-k g) (1 - e^(-k h)) (q At + k Az)/k (magnetic
/// scalar potential of the layer's Fourier component; the two-dimensional case k = q gives the Halbach formula
/// Br a_n (1 - e^(-k h)) e^(-k g) on the strong side and 0 on the weak side). A steel back disc directly behind the
/// magnets, infinitely permeable, is replaced by the magnets' mirror image (method of images: magnetic charges image
/// with the opposite sign, so the axial magnetisation continues and the tangential one reverses) in a second layer of
/// thickness h: it adds (Br/2) e^(-k(g+h)) (1 - e^(-k h)) (k Az - q At)/k. For alternating poles this doubles the
/// thickness, (1 - e^(-2 k h)); for a Halbach array it adds nothing in two dimensions (its weak face has no field to
/// image).</para>
/// </remarks>
public static class ArraySource
{
    /// <summary>The first harmonics of a rotor's magnetisation, in order of increasing |n|.</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="count">How many harmonics, 1..64 (1 keeps only the fundamental).</param>
    /// <exception cref="ArgumentNullException">The rotor is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The count or the rotor's arc fraction is out of range.</exception>
    public static SourceHarmonic[] Harmonics(RotorDesign rotor, int count)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.InRange(count, 1, 64, nameof(count));
        var result = new SourceHarmonic[count];
        // A "Halbach" array of two segments per wavelength is alternating poles: its orders n and -n share one wavenumber and
        // must be added as amplitudes, which the pulse-train series does.
        if (rotor.Array == RotorArray.Alternating || rotor.SegmentsPerWavelength == 2)
        {
            double arc = rotor.Array == RotorArray.Alternating ? rotor.MagnetArcFraction : 1.0;
            Preconditions.InRange(arc, 0.3, 1.0, "rotor magnet arc fraction");
            for (int i = 0; i < count; i++)
            {
                int n = 2 * i + 1;
                // Pulse-train Fourier coefficient (4/(n pi)) sin(n pi alpha/2).
                result[i] = new SourceHarmonic(n, 4.0 / (n * Math.PI) * Math.Sin(n * Math.PI * arc / 2.0), 0.0);
            }
            return result;
        }
        int m = rotor.SegmentsPerWavelength;
        Preconditions.AtLeast(m, 2, "rotor segments per wavelength");
        // Orders 1 + jM in order of |n|: j = 0, -1, 1, -2, 2, ... (for M >= 3, |1 - jM| < |1 + jM| for j > 0).
        for (int i = 0; i < count; i++)
        {
            int j = (i + 1) / 2 * (i % 2 == 1 ? -1 : 1);
            int n = 1 + j * m;
            double x = n * Math.PI / m;
            double a = Math.Sin(x) / x;
            result[i] = new SourceHarmonic(n, a, a);
        }
        return result;
    }

    /// <summary>Normal field amplitude per unit remanence at the magnets' face (gap 0) of one Fourier component.</summary>
    /// <param name="harmonic">The magnetisation harmonic.</param>
    /// <param name="circumferentialWavenumberPerM">|q| = |n| p / r, 1/m, greater than 0.</param>
    /// <param name="wavenumberPerM">k = sqrt(q^2 + k_y^2), 1/m, at least |q|.</param>
    /// <param name="magnetThicknessM">Magnet thickness h, m, greater than 0.</param>
    /// <param name="backIron">Whether a steel back disc sits directly behind the magnets.</param>
    /// <returns>|B_z| / Br at the magnet face; multiply by e^(-k g) for a gap g.</returns>
    public static double FaceField(SourceHarmonic harmonic, double circumferentialWavenumberPerM, double wavenumberPerM, double magnetThicknessM, bool backIron)
    {
        double k = wavenumberPerM;
        double qs = Math.Sign(harmonic.Order) * circumferentialWavenumberPerM / k;
        // 1 - e^(-k h) without cancellation for thin magnets.
        double layer = -AccurateMath.ExpM1(-k * magnetThicknessM);
        double field = (harmonic.AxialAmplitude + harmonic.TangentialAmplitude * qs) * layer;
        if (backIron)
        {
            // Image layer behind the magnets: axial magnetisation kept, tangential reversed (method of images).
            field += (harmonic.AxialAmplitude - harmonic.TangentialAmplitude * qs) * Math.Exp(-k * magnetThicknessM) * layer;
        }
        return 0.5 * Math.Abs(field);
    }
}
