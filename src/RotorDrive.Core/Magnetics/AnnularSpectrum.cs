using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Magnetics;

/// <summary>The field of an annular magnet array as cylindrical harmonics J_m(kappa r) e^(i m theta) e^(-kappa z): the
/// modes of the ring model (../DESIGN.md §4.7).</summary>
/// <remarks>
/// <para>Method: over a plate much wider than the rotor, every cylindrical harmonic J_m(kappa r) e^(i m theta) is an
/// eigenfunction of the plate's in-plane Laplacian with eigenvalue -kappa^2, so it meets the plate exactly as a Cartesian
/// harmonic of wavenumber kappa does: the layer problem of ../DESIGN.md §4.2 with k = kappa and electrical speed m omega
/// (eps = mu0 sigma m omega / kappa^2). This is the Hankel-transform solution of eddy currents in a conducting layer under
/// an axisymmetric source (C. V. Dodd and W. E. Deeds, "Analytical solutions to eddy-current probe-coil problems",
/// J. Appl. Phys. 39(6), 2829, 1968) with the angular order m of a rotating multipole source. It needs no strips and no
/// artificial period: the pole pitch's growth with radius, the fringing at the magnets' inner and outer edges and the
/// closure of every eddy-current loop across the whole width and beyond it come out of the transform, and the loops keep
/// one time constant across the radius.</para>
/// <para>Source: harmonic n (order m = |n| p) of the array has axial magnetisation Az cos(m theta) and circumferential
/// At sin(m theta) over r_i &lt; r &lt; r_o and 0 &lt; z &lt; h. Its magnetic charges are Az on the faces and -(m/r) At
/// in the volume, whose Hankel transforms of order m are S_A(kappa) = int r J_m(kappa r) dr = [F_m(kappa r)] / kappa^2 and
/// S_T(kappa) = m int J_m(kappa r) dr = m [G_m(kappa r)] / kappa over [r_i, r_o] (<see cref="Bessel.OrderIntegrals"/>).
/// The normal field at the magnet face is then Br cos(m theta) int b(kappa) J_m(kappa r) kappa dkappa with
/// b = (1/2)(1 - e^(-kappa h)) (Az S_A + sgn(n) At S_T / kappa), the charge-sheet potential of each component as in
/// <see cref="ArraySource"/> (steel behind the magnets adds the image layer's term). By Parseval's theorem for the Hankel
/// transform (int f^2 r dr = int F^2 kappa dkappa) and the orthogonality of the harmonics, the lift is
/// (2 pi Br^2/mu0) int b^2 (-Re R) e^(-2 kappa g) kappa dkappa and the torque the same with (m/kappa)(-Im R): each
/// component's torque-to-lift ratio m/kappa is the Cartesian r q/k with q = m/r.</para>
/// <para>Quadrature: b^2 kappa oscillates in kappa with period down to pi/r_o, while the plate response and e^(-2 kappa g)
/// vary on the scale of kappa and 1/(2 g). The spectrum is sampled by the midpoint rule with several points per period,
/// up to where e^(-2 kappa g_ref) falls below the tolerance, and the samples are gathered into groups a fixed fraction of
/// kappa wide, each replaced by a two-point Gauss rule for its own weights (nodes and weights that integrate 1, kappa,
/// kappa^2 and kappa^3 times the group's sampled weights exactly), so the smooth factors are integrated to fourth order in
/// the group width.</para>
/// </remarks>
internal static class AnnularSpectrum
{
    /// <summary>One mode: wavenumber, order, and its lift weight (N: the 2 pi Br^2/mu0 b^2 kappa dkappa of its group).</summary>
    internal readonly record struct RingMode(double Wavenumber, int Order, double LiftWeight);

    /// <summary>The modes of a rotor's first harmonics over a plate much wider than the rotor.</summary>
    /// <param name="rotor">The rotor (radii, thickness, pole pairs, remanence, steel back disc).</param>
    /// <param name="harmonics">The array's harmonics.</param>
    /// <param name="referenceGapM">Gap at which the truncation tolerance holds, m.</param>
    /// <param name="tolerance">Relative truncation tolerance.</param>
    /// <param name="groupFraction">Width of a group relative to its wavenumber (0 keeps every sample as a mode).</param>
    /// <param name="pointsPerPeriod">Midpoint samples per period pi/r_o of the spectrum's fastest oscillation.</param>
    public static List<RingMode> Modes(RotorDesign rotor, SourceHarmonic[] harmonics, double referenceGapM, double tolerance,
        double groupFraction = 0.25, int pointsPerPeriod = 8)
    {
        double ri = rotor.InnerRadiusM, ro = rotor.OuterRadiusM, h = rotor.MagnetThicknessM;
        int p = rotor.PolePairs;
        bool iron = rotor.HasBackIron;
        // Weights per unit remanence squared while grouping (so the truncation is relative for any Br, even 0).
        double scale = 2.0 * Math.PI / Units.Mu0;
        double step = Math.PI / (pointsPerPeriod * ro);
        // Beyond kappa_max = ln(1/tol) / (2 g_ref) every component is below tol e^0 of its own value at kappa = 0 scale.
        double kappaMax = Math.Log(1.0 / tolerance) / (2.0 * referenceGapM);
        int samples = Math.Max(16, (int)Math.Ceiling(kappaMax / step));
        int maxOrder = 0;
        foreach (SourceHarmonic hm in harmonics)
        {
            maxOrder = Math.Max(maxOrder, Math.Abs(hm.Order) * p);
        }

        // F_m and G_m at kappa r_o and kappa r_i for every sample, all orders at once.
        var outerF = new double[maxOrder + 1];
        var outerG = new double[maxOrder + 1];
        var innerF = new double[maxOrder + 1];
        var innerG = new double[maxOrder + 1];
        var weights = new double[harmonics.Length][];
        for (int i = 0; i < harmonics.Length; i++)
        {
            weights[i] = new double[samples];
        }
        for (int s = 0; s < samples; s++)
        {
            double kappa = (s + 0.5) * step;
            Bessel.OrderIntegrals(kappa * ro, outerF, outerG);
            Bessel.OrderIntegrals(kappa * ri, innerF, innerG);
            double layer = -AccurateMath.ExpM1(-kappa * h);
            double image = iron ? Math.Exp(-kappa * h) : 0.0;
            for (int i = 0; i < harmonics.Length; i++)
            {
                SourceHarmonic hm = harmonics[i];
                int m = Math.Abs(hm.Order) * p;
                double sa = (outerF[m] - innerF[m]) / (kappa * kappa);
                double st = m * (outerG[m] - innerG[m]) / kappa;
                double axial = hm.AxialAmplitude * sa;
                double tangential = Math.Sign(hm.Order) * hm.TangentialAmplitude * st / kappa;
                double b = 0.5 * layer * ((axial + tangential) + image * (axial - tangential));
                weights[i][s] = scale * b * b * kappa * step;
            }
        }

        var modes = new List<RingMode>();
        for (int i = 0; i < harmonics.Length; i++)
        {
            int m = Math.Abs(harmonics[i].Order) * p;
            AddGroups(modes, m, weights[i], step, groupFraction, referenceGapM, tolerance);
        }
        double br2 = rotor.RemanenceT * rotor.RemanenceT;
        for (int j = 0; j < modes.Count; j++)
        {
            modes[j] = modes[j] with { LiftWeight = br2 * modes[j].LiftWeight };
        }
        return modes;
    }

    // Gathers the samples of one harmonic into groups and adds each group's two-point Gauss rule; groups whose weight at the
    // reference gap is below 1e-3 of the tolerance times the harmonic's total are left out.
    private static void AddGroups(List<RingMode> modes, int order, double[] weights, double step, double fraction, double referenceGap, double tolerance)
    {
        double total = 0;
        for (int s = 0; s < weights.Length; s++)
        {
            total += weights[s] * Math.Exp(-2.0 * (s + 0.5) * step * referenceGap);
        }
        double floor = 1e-3 * tolerance * total;
        int first = 0;
        while (first < weights.Length)
        {
            double start = (first + 0.5) * step;
            int last = first;
            while (last + 1 < weights.Length && (last + 1.5) * step - start < fraction * start)
            {
                last++;
            }
            // Moments of the group's weights about its start, in units of the step (well conditioned).
            double m0 = 0, m1 = 0, m2 = 0, m3 = 0;
            for (int s = first; s <= last; s++)
            {
                double w = weights[s], t = s - first;
                m0 += w;
                m1 += w * t;
                m2 += w * t * t;
                m3 += w * t * t * t;
            }
            double atGap = m0 * Math.Exp(-2.0 * start * referenceGap);
            if (m0 > 0 && atGap >= floor)
            {
                foreach ((double t, double w) in TwoPointGauss(m0, m1, m2, m3))
                {
                    modes.Add(new RingMode(start + t * step, order, w));
                }
            }
            first = last + 1;
        }
    }

    // The Gauss rule for a positive discrete measure with moments m0..m3: nodes are the roots of the degree-2 orthogonal
    // polynomial t^2 + a t + b with m2 + a m1 + b m0 = 0 and m3 + a m2 + b m1 = 0, weights from m0 and m1 (G. H. Golub and
    // J. H. Welsch, Math. Comp. 23, 1969, for the theory). A group of one sample, or a degenerate one, is a one-point rule.
    private static IEnumerable<(double Node, double Weight)> TwoPointGauss(double m0, double m1, double m2, double m3)
    {
        double mean = m1 / m0;
        double variance = m2 / m0 - mean * mean;
        if (!(variance > 1e-12 * (1 + mean * mean)))
        {
            yield return (mean, m0);
            yield break;
        }
        double det = m0 * m2 - m1 * m1;
        double a = (m1 * m2 - m0 * m3) / det;
        double b = (m1 * m3 - m2 * m2) / det;
        double disc = Math.Sqrt(Math.Max(a * a / 4 - b, 0));
        double t1 = -a / 2 - disc, t2 = -a / 2 + disc;
        double w2 = (m1 - t1 * m0) / (t2 - t1);
        yield return (t1, m0 - w2);
        yield return (t2, w2);
    }
}
