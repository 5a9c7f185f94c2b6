using System.Numerics;

namespace RotorDrive.Core.Magnetics;

/// <summary>Reflection coefficient of a conducting plate between two air half-spaces for one travelling field harmonic.</summary>
/// <remarks>
/// <para>2-D layer solution (../DESIGN.md §4.2): a field harmonic of wavenumber k travelling at electrical angular speed
/// we over a non-magnetic plate of thickness d and conductivity sigma. With gamma = sqrt(k^2 + i mu0 sigma we),
/// Re gamma &gt; 0, rho = e^(-2 gamma d) (gamma - k)/(gamma + k), Z = (gamma/k)(1 - rho)/(1 + rho) and
/// R = (1 - Z)/(1 + Z) (J. R. Reitz, "Forces on moving magnets due to eddy currents", J. Appl. Phys. 41, 2067, 1970;
/// equivalent layer solutions in J. Bird and T. A. Lipo, IEEE Trans. Magn. 43(8), 2007, and N. Paudel and J. Bird,
/// IEEE Trans. Magn. 48(1), 2012). R is the ratio of the reflected to the source harmonic at the plate's top surface.</para>
/// <para>The code evaluates the same R in the algebraically equal form R = -i eps (1 - E) w^2 / (w^4 + E eps^2) with
/// u = gamma/k = sqrt(1 + i eps), w = 1 + u, E = e^(-2 k d u) and eps = mu0 sigma we / k^2 (the plate's magnetic
/// Reynolds number at this wavenumber). It has no cancellation as eps tends to 0 (R tends to 0 continuously, like
/// -i eps), and only e^(-2 gamma d) appears, so a very thick or very conductive plate underflows to the half-space
/// answer instead of overflowing. Negative we (reversed motion) gives the complex conjugate.</para>
/// </remarks>
public static class PlateResponse
{
    /// <summary>Reflection coefficient R of the plate for one harmonic (dimensionless, |R| &lt;= 1).</summary>
    /// <param name="wavenumberPerM">Wavenumber k of the harmonic, 1/m, greater than 0.</param>
    /// <param name="thicknessM">Plate thickness d, m, greater than 0.</param>
    /// <param name="conductivitySPerM">Plate conductivity sigma, S/m, at least 0.</param>
    /// <param name="electricalSpeedRadPerS">Electrical angular speed we = k v of the harmonic relative to the plate, rad/s (signed).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static Complex Reflection(double wavenumberPerM, double thicknessM, double conductivitySPerM, double electricalSpeedRadPerS)
    {
        Preconditions.Positive(wavenumberPerM, nameof(wavenumberPerM));
        Preconditions.Positive(thicknessM, nameof(thicknessM));
        Preconditions.NonNegative(conductivitySPerM, nameof(conductivitySPerM));
        Preconditions.Finite(electricalSpeedRadPerS, nameof(electricalSpeedRadPerS));
        double k = wavenumberPerM;
        double eps = Units.Mu0 * conductivitySPerM * electricalSpeedRadPerS / (k * k);
        return Reflection(eps, k * thicknessM);
    }

    /// <summary>Reflection coefficient R from the dimensionless groups eps = mu0 sigma we / k^2 and k d.</summary>
    /// <param name="magneticReynolds">eps = mu0 sigma we / k^2 (signed; the sign is the direction of travel).</param>
    /// <param name="thicknessTimesWavenumber">k d, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static Complex Reflection(double magneticReynolds, double thicknessTimesWavenumber)
    {
        Preconditions.Finite(magneticReynolds, nameof(magneticReynolds));
        Preconditions.Positive(thicknessTimesWavenumber, nameof(thicknessTimesWavenumber));
        return ReflectionCore(magneticReynolds, thicknessTimesWavenumber, out _, computeSlope: false);
    }

    /// <summary>Reflection coefficient R of a plate laid on steel, from eps = mu0 sigma we / k^2 and k d.</summary>
    /// <remarks>The steel is infinitely permeable and non-conducting, so the tangential field vanishes at the plate's bottom
    /// face: in the plate B_z = C cosh(gamma (z + d)), hence Z = (gamma/k) tanh(gamma d) and R = (1 - Z)/(1 + Z) (the layer
    /// problem of ../DESIGN.md §4.2 with H_t = 0 at z = -d; the same boundary condition as the back iron of the layer models
    /// in N. Paudel and J. Bird, IEEE Trans. Magn. 48(1), 2012). Written with E = e^(-2 gamma d) and u = gamma/k as
    /// R = ((1 + E) - u (1 - E)) / ((1 + E) + u (1 - E)). At standstill (u = 1) R = e^(-2 k d) &gt; 0: the steel's image
    /// pulls the source down (negative lift); at high speed R tends to -1 as for a plate in air.</remarks>
    /// <param name="magneticReynolds">eps = mu0 sigma we / k^2 (signed).</param>
    /// <param name="thicknessTimesWavenumber">k d, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static Complex SteelBackedReflection(double magneticReynolds, double thicknessTimesWavenumber)
    {
        Preconditions.Finite(magneticReynolds, nameof(magneticReynolds));
        Preconditions.Positive(thicknessTimesWavenumber, nameof(thicknessTimesWavenumber));
        return SteelBackedCore(magneticReynolds, thicknessTimesWavenumber, out _, computeSlope: false);
    }

    /// <summary>R and its logarithmic slope eps dR/deps (for table derivatives); arguments are not checked.</summary>
    internal static Complex ReflectionWithSlope(double eps, double kd, out Complex slope)
        => ReflectionCore(eps, kd, out slope, computeSlope: true);

    /// <summary>R and its logarithmic slope for a free or a steel-backed plate; arguments are not checked.</summary>
    internal static Complex ReflectionWithSlope(double eps, double kd, bool steelBacked, out Complex slope)
        => steelBacked ? SteelBackedCore(eps, kd, out slope, computeSlope: true) : ReflectionCore(eps, kd, out slope, computeSlope: true);

    /// <summary>R without argument checks, for the quadrature kernels.</summary>
    internal static Complex ReflectionUnchecked(double eps, double kd) => ReflectionCore(eps, kd, out _, computeSlope: false);

    /// <summary>R of a free or a steel-backed plate without argument checks.</summary>
    internal static Complex ReflectionUnchecked(double eps, double kd, bool steelBacked)
        => steelBacked ? SteelBackedCore(eps, kd, out _, computeSlope: false) : ReflectionCore(eps, kd, out _, computeSlope: false);

    private static Complex SteelBackedCore(double eps, double kd, out Complex slope, bool computeSlope)
    {
        double modulus = double.Hypot(1.0, eps);
        double ur = Math.Sqrt(0.5 * (modulus + 1.0));
        var u = new Complex(ur, eps / (2.0 * ur));
        Complex oneMinusE = -ExpM1(-2.0 * kd * u);
        Complex e = 1.0 - oneMinusE;
        Complex numerator = 1.0 + e - u * oneMinusE;
        Complex denominator = 1.0 + e + u * oneMinusE;
        Complex r = numerator / denominator;
        if (!computeSlope)
        {
            slope = Complex.Zero;
            return r;
        }
        // dR/du from dE/du = -2 k d E, then eps dR/deps = eps (dR/du) i/(2u).
        Complex de = -2.0 * kd * e;
        Complex dNumerator = de * (1.0 + u) - oneMinusE;
        Complex dDenominator = de * (1.0 - u) + oneMinusE;
        Complex dr = (dNumerator - r * dDenominator) / denominator;
        slope = eps * dr * new Complex(0, 0.5) / u;
        return r;
    }

    private static Complex ReflectionCore(double eps, double kd, out Complex slope, bool computeSlope)
    {
        if (eps == 0)
        {
            slope = Complex.Zero;
            return Complex.Zero;
        }

        // u = sqrt(1 + i eps) on the principal branch (Re u > 0), written so that small eps loses nothing.
        double modulus = double.Hypot(1.0, eps);
        double ur = Math.Sqrt(0.5 * (modulus + 1.0));
        var u = new Complex(ur, eps / (2.0 * ur));
        Complex w = 1.0 + u;
        Complex w2 = w * w;

        // E = e^(-2 k d u) has |E| <= 1; 1 - E comes from a complex expm1 so that thin plates keep their precision.
        Complex oneMinusE = -ExpM1(-2.0 * kd * u);
        Complex e = 1.0 - oneMinusE;
        double eps2 = eps * eps;
        Complex numerator = new Complex(0, -eps) * oneMinusE * w2;
        Complex denominator = w2 * w2 + e * eps2;
        Complex r = numerator / denominator;

        if (!computeSlope)
        {
            slope = Complex.Zero;
            return r;
        }

        // d/deps of N = -i eps (1 - E) w^2 and D = w^4 + E eps^2, with du/deps = i/(2u) and dE = -2 k d E du.
        Complex du = new Complex(0, 0.5) / u;
        Complex de = -2.0 * kd * e * du;
        Complex dNumerator = new Complex(0, -1) * oneMinusE * w2 + new Complex(0, eps) * de * w2 + new Complex(0, -2.0 * eps) * oneMinusE * w * du;
        Complex dDenominator = 4.0 * w2 * w * du + de * eps2 + 2.0 * eps * e;
        slope = eps * (dNumerator - r * dDenominator) / denominator;
        return r;
    }

    // e^z - 1 for Re z <= 0 without cancellation when |z| is small: e^a cos b - 1 = expm1(a) cos b - 2 sin^2(b/2).
    private static Complex ExpM1(Complex z)
    {
        double a = z.Real;
        double b = z.Imaginary;
        double em1 = AccurateMath.ExpM1(a);
        (double sh, double ch) = Math.SinCos(0.5 * b);
        double cosB = 1.0 - 2.0 * sh * sh;
        double sinB = 2.0 * sh * ch;
        return new Complex(em1 * cosB - 2.0 * sh * sh, (1.0 + em1) * sinB);
    }
}
