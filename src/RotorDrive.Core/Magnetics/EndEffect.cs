namespace RotorDrive.Core.Magnetics;

/// <summary>Russell-Norsworthy end-effect factor: how much a finite active width lowers the eddy currents of a 2-D model.</summary>
/// <remarks>
/// <para>Source: R. L. Russell and K. H. Norsworthy, "Eddy currents and wall losses in screened-rotor induction motors",
/// Proc. IEE 105A, 1958. For a conducting sheet of active (field) width 2a that overhangs the field by c on each side,
/// under a travelling field of pole pitch tau (wavenumber k = pi/tau), the eddy currents must close through the
/// overhang, and the sheet behaves like an infinitely wide one whose resistivity is raised by 1/K, with
/// K = 1 - tanh(k a) / [k a (1 + tanh(k a) tanh(k c))], so that sigma_eff = K sigma. This is the form in which the
/// factor is quoted for linear induction machines (H. Bolton, Proc. IEE 116, 1969; E. R. Laithwaite's texts on
/// induction machines for special purposes; both cited from memory, not consulted here); with no overhang (c = 0) it
/// is Russell and Norsworthy's widely quoted 1 - tanh(k a)/(k a).</para>
/// <para>What was and was not verified: the 1958 paper itself could not be consulted here. The formula was re-derived
/// independently for a thin sheet at low speed (resistance-limited currents; electric potential f(z) cos(kx) with
/// f = A sinh(k z) under the field and f = D cosh(k(a + c - |z|)) in the overhang, potential and normal current
/// continuous at |z| = a, no current through the sheet's edge): the loss relative to an infinitely wide sheet is
/// exactly K above. A finite-difference solution of the same sheet problem in the tests agrees with it. Not verified,
/// and not claimed by the source: using K as a conductivity factor at all speeds (where the plate's own field matters)
/// and for plates that are not thin; this is the customary approximation, and bench calibration corrects it.</para>
/// <para>For a rotor over a plate the "transverse" direction is radial: 2a = r_o - r_i and the plate is assumed wide
/// (c infinite, tanh(k c) = 1). The plate under the rotor's hub (overhang r_i inwards) is also treated as infinite;
/// with k r_i = p r_i / r this is exact to within tanh(k r_i) for any practical rotor.</para>
/// </remarks>
public static class EndEffect
{
    /// <summary>Russell-Norsworthy conductivity factor K in (0, 1) for one wavenumber, active half-width and overhang.</summary>
    /// <param name="wavenumberPerM">Wavenumber k = pi / pole pitch, 1/m, greater than 0.</param>
    /// <param name="halfWidthM">Half the active width, a, m, greater than 0.</param>
    /// <param name="overhangM">Overhang c of the plate beyond the active width on each side, m, at least 0;
    /// positive infinity for a wide plate (the default).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN or out of range.</exception>
    public static double RussellNorsworthyFactor(double wavenumberPerM, double halfWidthM, double overhangM = double.PositiveInfinity)
    {
        Preconditions.Positive(wavenumberPerM, nameof(wavenumberPerM));
        Preconditions.Positive(halfWidthM, nameof(halfWidthM));
        if (double.IsNaN(overhangM) || overhangM < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(overhangM), overhangM, $"{nameof(overhangM)} must be at least 0 (or positive infinity); got {overhangM}.");
        }
        double x = wavenumberPerM * halfWidthM;
        double t = Math.Tanh(x);
        double overhangTanh = double.IsPositiveInfinity(overhangM) ? 1.0 : Math.Tanh(wavenumberPerM * overhangM);
        return 1.0 - t / (x * (1.0 + t * overhangTanh));
    }
}
