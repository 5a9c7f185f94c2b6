using System.Numerics;

namespace RotorDrive.Core.Magnetics;

/// <summary>Eddy-current pressures under a straight magnet band of finite width over a wide plate: the three-dimensional
/// solution as a Fourier series across the band.</summary>
/// <remarks>
/// <para>Method: the band (width w, magnetisation harmonic of wavenumber q along its length) is repeated across its width
/// with an artificial period T, and the field is a double Fourier series in (q, k_y = 2 pi m / T), as in the
/// three-dimensional analytical models of axial eddy-current couplings and brakes (T. Lubin and A. Rezzoug, "3-D analytical
/// model for axial-flux eddy-current couplings and brakes under steady-state conditions", IEEE Trans. Magn. 51(10), 2015,
/// who also use an artificial radial period). For a plate much wider than the band each component is the one-dimensional
/// layer problem of ../DESIGN.md §4.2 with k^2 = q^2 + k_y^2 and gamma^2 = k^2 + i mu0 sigma q v (J. R. Reitz, J. Appl.
/// Phys. 41, 2067, 1970, solved the moving-magnet problem the same way by a two-dimensional Fourier transform), so the
/// fringing of the source at the band's edges and the closure of the eddy currents beyond them come out of the solution.
/// Forces are sums over components (Parseval): per unit area of the band the mean lift is
/// (w/T) sum_m sinc^2(pi m w/T) (B_m^2/mu0) (-Re R_m) and the mean drag (w/T) sum_m sinc^2(pi m w/T) (B_m^2/mu0) (q/k_m)
/// (-Im R_m), where the factor q/k is the share of the Maxwell stress T_xz of a component whose wave vector is oblique.</para>
/// <para>The period is T = w + 10/q by default: neighbouring copies couple through fields that decay as e^(-q y), and the
/// series is the trapezoidal rule of the Fourier integral over k_y whose aliasing error is of order e^(-q (T - w)) = e^(-10).
/// The series is cut when the remaining terms, bounded by the sinc^2 envelope and e^(-2 k g) at the reference gap, fall
/// below the tolerance times the two-dimensional value.</para>
/// <para>A steel back disc behind the magnets re-reflects the plate's reaction field: the field that reaches the plate is
/// the source divided by 1 - R e^(-2 k (g + h)) (multiple reflections between plate and steel, ../DESIGN.md §4.7).</para>
/// </remarks>
public static class FiniteWidthBand
{
    /// <summary>Default artificial period across the band, w + 10/q, m.</summary>
    /// <param name="wavenumberPerM">q, 1/m, greater than 0.</param>
    /// <param name="widthM">Band width w, m, greater than 0.</param>
    public static double DefaultPeriodM(double wavenumberPerM, double widthM) => widthM + 10.0 / wavenumberPerM;

    /// <summary>Mean lift and drag pressure over the band per unit remanence squared (Br = 1 T), Pa.</summary>
    /// <param name="harmonic">The magnetisation harmonic.</param>
    /// <param name="wavenumberPerM">q = |n| times the fundamental wavenumber, 1/m, greater than 0.</param>
    /// <param name="widthM">Band width w, m, greater than 0.</param>
    /// <param name="magnetThicknessM">Magnet thickness h, m, greater than 0.</param>
    /// <param name="rotorBackIron">Steel directly behind the magnets.</param>
    /// <param name="gapM">Air gap g, m, at least 0.</param>
    /// <param name="plate">Plate thickness (conductivity is passed separately), and whether it lies on steel.</param>
    /// <param name="conductivitySPerM">Plate conductivity, S/m, at least 0.</param>
    /// <param name="speedMPerS">Speed of the band relative to the plate, m/s (signed).</param>
    /// <param name="periodM">Artificial period T &gt; w, m, or null for <see cref="DefaultPeriodM"/>.</param>
    /// <param name="tolerance">Relative truncation tolerance of the series (default 1e-9).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static EddyPressure MeanPressure(SourceHarmonic harmonic, double wavenumberPerM, double widthM, double magnetThicknessM, bool rotorBackIron,
        double gapM, Plate plate, double conductivitySPerM, double speedMPerS, double? periodM = null, double tolerance = 1e-9)
    {
        Preconditions.Positive(wavenumberPerM, nameof(wavenumberPerM));
        Preconditions.Positive(widthM, nameof(widthM));
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.Positive(plate.ThicknessM, "plate thickness");
        double period = periodM ?? DefaultPeriodM(wavenumberPerM, widthM);
        if (!(period > widthM) || !double.IsFinite(period))
        {
            throw new ArgumentOutOfRangeException(nameof(periodM), periodM, $"the period must exceed the band width {widthM} m; got {period} m.");
        }
        double lift = 0, drag = 0;
        // Truncation relative to the largest a component of this harmonic can be at this gap (its weak-side orders vanish
        // in two dimensions, so not relative to the two-dimensional value).
        double bound = 0.5 * (Math.Abs(harmonic.AxialAmplitude) + Math.Abs(harmonic.TangentialAmplitude))
            * -AccurateMath.ExpM1(-wavenumberPerM * magnetThicknessM) * (rotorBackIron ? 2.0 : 1.0);
        double floor = tolerance * bound * bound * Math.Exp(-2.0 * wavenumberPerM * gapM);
        foreach ((double ky, double weight) in Terms(harmonic, wavenumberPerM, widthM, period, magnetThicknessM, rotorBackIron, gapM, floor))
        {
            EddyPressure c = ComponentPressure(harmonic, wavenumberPerM, ky, magnetThicknessM, rotorBackIron, gapM, plate, conductivitySPerM, speedMPerS);
            lift += weight * c.LiftPa;
            drag += weight * c.DragPa;
        }
        return new EddyPressure(lift, drag);
    }

    /// <summary>Lift and drag pressure of one Fourier component (q, k_y) whose magnetisation has unit spectral weight, per
    /// Br = 1 T, Pa: (B^2/mu0) (-Re R) and (B^2/mu0) (q/k) (-Im R), with B the component's normal field at the plate.</summary>
    /// <param name="harmonic">The magnetisation harmonic.</param>
    /// <param name="wavenumberPerM">q, 1/m, greater than 0.</param>
    /// <param name="crossWavenumberPerM">k_y, 1/m.</param>
    /// <param name="magnetThicknessM">Magnet thickness h, m, greater than 0.</param>
    /// <param name="rotorBackIron">Steel directly behind the magnets.</param>
    /// <param name="gapM">Air gap g, m, at least 0.</param>
    /// <param name="plate">Plate thickness and steel backing.</param>
    /// <param name="conductivitySPerM">Plate conductivity, S/m, at least 0.</param>
    /// <param name="speedMPerS">Speed of the source relative to the plate, m/s (signed).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public static EddyPressure ComponentPressure(SourceHarmonic harmonic, double wavenumberPerM, double crossWavenumberPerM, double magnetThicknessM,
        bool rotorBackIron, double gapM, Plate plate, double conductivitySPerM, double speedMPerS)
    {
        Preconditions.Positive(wavenumberPerM, nameof(wavenumberPerM));
        Preconditions.Finite(crossWavenumberPerM, nameof(crossWavenumberPerM));
        Preconditions.Positive(magnetThicknessM, nameof(magnetThicknessM));
        Preconditions.NonNegative(gapM, nameof(gapM));
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.NonNegative(conductivitySPerM, nameof(conductivitySPerM));
        Preconditions.Finite(speedMPerS, nameof(speedMPerS));
        double q = wavenumberPerM;
        double k = double.Hypot(q, crossWavenumberPerM);
        double face = ArraySource.FaceField(harmonic, q, k, magnetThicknessM, rotorBackIron);
        // Layer problem with k^2 = q^2 + k_y^2 and electrical speed q v (Reitz 1970).
        double eps = Units.Mu0 * conductivitySPerM * q * speedMPerS / (k * k);
        Complex r = PlateResponse.ReflectionUnchecked(eps, k * plate.ThicknessM, plate.HasBackIron);
        double e = Math.Exp(-2.0 * k * gapM);
        double f = e;
        if (rotorBackIron)
        {
            // Multiple reflections between the plate and the rotor's steel: amplitude 1/(1 - R e^(-2 k (g + h))).
            Complex d = 1.0 - r * (e * Math.Exp(-2.0 * k * magnetThicknessM));
            f = e / (d.Real * d.Real + d.Imaginary * d.Imaginary);
        }
        double pressure = face * face / Units.Mu0 * f;
        return new EddyPressure(-pressure * r.Real, -pressure * (q / k) * r.Imaginary);
    }

    /// <summary>The series' cross wavenumbers and weights (w/T) sinc^2(pi m w/T), the two signs of m folded together, until
    /// the bound on the remaining terms' B^2 at the reference gap falls below an absolute floor (T^2).</summary>
    /// <remarks>With a lumping fraction f &gt; 0, terms beyond k_y = lumpFrom (twice the fundamental's wavenumber) are gathered into groups about f k_y wide, each
    /// given the group's summed weight at its weight-centred k_y (the component pressure varies there on the scale of k
    /// or 1/(2 g), much slower than sinc^2 oscillates, so this is a midpoint rule with exact weights; its error is second
    /// order in the group width). f = 0 gives the plain series.</remarks>
    internal static IEnumerable<(double CrossWavenumber, double Weight)> Terms(SourceHarmonic harmonic, double q, double width, double period,
        double magnetThickness, bool backIron, double referenceGap, double floor, double lumping = 0, double lumpFrom = 0)
    {
        double ratio = width / period;
        double largestFace = 0.5 * (Math.Abs(harmonic.AxialAmplitude) + Math.Abs(harmonic.TangentialAmplitude));
        yield return (0.0, ratio);
        double groupWeight = 0, groupMoment = 0, groupStart = 0;
        for (int m = 1; m < 1_000_000; m++)
        {
            double ky = 2.0 * Math.PI * m / period;
            double k = double.Hypot(q, ky);
            double x = Math.PI * m * ratio;
            double sinc = Math.Sin(x) / x;
            double weight = 2.0 * ratio * sinc * sinc;
            // Tail bound: envelope 2 ratio / x^2 times the largest field, times about m terms of a 1/m^2 tail.
            double layer = -AccurateMath.ExpM1(-k * magnetThickness) * (backIron ? 2.0 : 1.0);
            double envelope = 2.0 * ratio / (x * x) * largestFace * largestFace * layer * layer * Math.Exp(-2.0 * k * referenceGap) * (m + 1);
            bool last = envelope < floor;
            if (lumping <= 0 || ky <= lumpFrom)
            {
                if (last)
                {
                    yield break;
                }
                yield return (ky, weight);
                continue;
            }
            if (groupWeight == 0)
            {
                groupStart = ky;
            }
            groupWeight += weight;
            groupMoment += weight * ky;
            if (last || ky - groupStart >= lumping * groupStart)
            {
                if (groupWeight > 0)
                {
                    yield return (groupMoment / groupWeight, groupWeight);
                }
                groupWeight = 0;
                groupMoment = 0;
                if (last)
                {
                    yield break;
                }
            }
        }
    }
}
