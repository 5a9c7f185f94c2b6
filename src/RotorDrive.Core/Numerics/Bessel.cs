namespace RotorDrive.Core.Numerics;

/// <summary>Bessel functions of the first kind J0 and J1 of a real argument, by the polynomial approximations of
/// Abramowitz &amp; Stegun.</summary>
/// <remarks>M. Abramowitz &amp; I. A. Stegun, "Handbook of Mathematical Functions", 1964, 9.4.1 and 9.4.3 (J0), 9.4.4 and
/// 9.4.6 (J1): absolute error below about 1e-7 for every x. Used where millions of values are needed (the Hankel
/// transforms of the plate heat sources); MathNet's general-order <c>SpecialFunctions.BesselJ</c> checks them in the
/// tests.</remarks>
internal static class Bessel
{
    /// <summary>J0(x).</summary>
    /// <param name="x">Argument (any real; J0 is even).</param>
    public static double J0(double x)
    {
        double ax = Math.Abs(x);
        if (ax <= 3.0)
        {
            double y = (x / 3.0) * (x / 3.0);
            // A&S 9.4.1.
            return 1.0 + y * (-2.2499997 + y * (1.2656208 + y * (-0.3163866 + y * (0.0444479 + y * (-0.0039444 + y * 0.0002100)))));
        }
        double z = 3.0 / ax;
        // A&S 9.4.3.
        double f = 0.79788456 + z * (-0.00000077 + z * (-0.00552740 + z * (-0.00009512 + z * (0.00137237 + z * (-0.00072805 + z * 0.00014476)))));
        double theta = ax - 0.78539816 + z * (-0.04166397 + z * (-0.00003954 + z * (0.00262573 + z * (-0.00054125 + z * (-0.00029333 + z * 0.00013558)))));
        return f * Math.Cos(theta) / Math.Sqrt(ax);
    }

    /// <summary>J1(x).</summary>
    /// <param name="x">Argument (any real; J1 is odd).</param>
    public static double J1(double x)
    {
        double ax = Math.Abs(x);
        double result;
        if (ax <= 3.0)
        {
            double y = (x / 3.0) * (x / 3.0);
            // A&S 9.4.4: J1(x) / x.
            result = ax * (0.5 + y * (-0.56249985 + y * (0.21093573 + y * (-0.03954289 + y * (0.00443319 + y * (-0.00031761 + y * 0.00001109))))));
        }
        else
        {
            double z = 3.0 / ax;
            // A&S 9.4.6.
            double f = 0.79788456 + z * (0.00000156 + z * (0.01659667 + z * (0.00017105 + z * (-0.00249511 + z * (0.00113653 + z * -0.00020033)))));
            double theta = ax - 2.35619449 + z * (0.12499612 + z * (0.00005650 + z * (-0.00637879 + z * (0.00074348 + z * (0.00079824 + z * -0.00029166)))));
            result = f * Math.Cos(theta) / Math.Sqrt(ax);
        }
        return x < 0 ? -result : result;
    }

    /// <summary>The integrals F_m(x) = int_0^x t J_m(t) dt and G_m(x) = int_0^x J_m(t) dt for every integer order 0..maxOrder,
    /// from one downward recurrence.</summary>
    /// <remarks>
    /// <para>J_k(x) for all k by Miller's algorithm: the recurrence J_(k-1) = (2k/x) J_k - J_(k+1) run downwards from an order
    /// well above x and maxOrder, normalised by J_0 + 2 (J_2 + J_4 + ...) = 1 (M. Abramowitz &amp; I. A. Stegun, "Handbook of
    /// Mathematical Functions", 1964, 9.12 and 9.1.46; W. H. Press et al., "Numerical Recipes", 3rd ed., 2007, 6.5).</para>
    /// <para>G_m = 2 (J_(m+1) + J_(m+3) + ...) (A&amp;S 11.1.2), summed in the same pass. F_0 = x J_1 (A&amp;S 11.3.20 with
    /// d/dx (x J_1) = x J_0), F_1 = G_0 - x J_0 (x J_1 = -x J_0', integrated by parts), and from J_(m-2) + J_m = (2 (m-1)/x)
    /// J_(m-1) (A&amp;S 9.1.27), F_m = 2 (m-1) G_(m-1) - F_(m-2). The F recurrence only adds, so its rounding error grows
    /// linearly with the order, not geometrically.</para>
    /// </remarks>
    /// <param name="x">Argument, at least 0.</param>
    /// <param name="integralTJ">F_0..F_maxOrder (length at least maxOrder + 1).</param>
    /// <param name="integralJ">G_0..G_maxOrder (length at least maxOrder + 1).</param>
    public static void OrderIntegrals(double x, Span<double> integralTJ, Span<double> integralJ)
    {
        int maxOrder = integralTJ.Length - 1;
        if (x == 0)
        {
            integralTJ.Clear();
            integralJ.Clear();
            return;
        }
        // Start well above the turning point: J_k(x) falls like e^(-c (k - x)^(3/2) / x^(1/2)) beyond k = x.
        double top = Math.Max(x, maxOrder + 1) + 12.0 * Math.Cbrt(Math.Max(x, 1.0)) + 30.0;
        int start = 2 * (int)(top / 2) + 2;
        double twoOverX = 2.0 / x;
        // tails[k] = J_k + J_(k+2) + ... (unnormalised) for k = 1..maxOrder + 1, needed for G_(k-1).
        Span<double> tails = maxOrder + 2 <= 256 ? stackalloc double[maxOrder + 2] : new double[maxOrder + 2];
        double above = 0.0, current = 1e-300, norm = 0.0, j0 = 0, j1 = 0;
        Span<double> parityTails = [0.0, 0.0];
        for (int k = start; ; k--)
        {
            // current = J_k (unnormalised), above = J_(k+1); the running tail of k's parity gains J_k.
            parityTails[k & 1] += current;
            norm += (k & 1) == 1 ? 0.0 : k > 0 ? 2.0 * current : current;
            if (k <= maxOrder + 1)
            {
                tails[k] = parityTails[k & 1];
            }
            if (k <= 1)
            {
                (j0, j1) = k == 1 ? (j0, current) : (current, j1);
                if (k == 0)
                {
                    break;
                }
            }
            double below = k * twoOverX * current - above;
            above = current;
            current = below;
            if (Math.Abs(current) > 1e250)
            {
                // Rescale everything accumulated so far (the ratios are what the recurrence keeps).
                const double s = 1e-250;
                current *= s;
                above *= s;
                parityTails[0] *= s;
                parityTails[1] *= s;
                norm *= s;
                j1 *= s;
                for (int i = k; i <= maxOrder + 1; i++)
                {
                    tails[i] *= s;
                }
            }
        }
        double scale = 1.0 / norm;
        for (int m = 0; m <= maxOrder; m++)
        {
            integralJ[m] = 2.0 * tails[m + 1] * scale;
        }
        j0 *= scale;
        j1 *= scale;
        integralTJ[0] = x * j1;
        if (maxOrder >= 1)
        {
            integralTJ[1] = integralJ[0] - x * j0;
        }
        for (int m = 2; m <= maxOrder; m++)
        {
            integralTJ[m] = 2.0 * (m - 1) * integralJ[m - 1] - integralTJ[m - 2];
        }
    }
}
