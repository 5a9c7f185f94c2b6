namespace RotorDrive.Core.Magnetics;

/// <summary>Elementary functions the runtime computes with cancellation (its double.ExpM1 is Exp(x) - 1).</summary>
internal static class AccurateMath
{
    /// <summary>e^x - 1 to a few ulps for every x, including |x| much smaller than 1.</summary>
    /// <remarks>W. Kahan's method for |x| &lt;= 0.5: u = e^x, then (u - 1) x / ln u cancels the rounding error of u (N. J. Higham,
    /// Accuracy and Stability of Numerical Algorithms, 2nd ed., 2002, section 1.14.1); a short Taylor series below 1e-5;
    /// plain e^x - 1 above 0.5, where there is no cancellation to speak of.</remarks>
    public static double ExpM1(double x)
    {
        double ax = Math.Abs(x);
        if (ax < 1e-5)
        {
            return x * (1.0 + x * (0.5 + x * (1.0 / 6.0)));
        }
        double u = Math.Exp(x);
        if (ax > 0.5)
        {
            // |e^x - 1| > 0.39 here, so the subtraction loses at most a couple of bits and the correction is not needed.
            return u - 1.0;
        }
        if (u == 1.0)
        {
            return x;
        }
        double um1 = u - 1.0;
        if (um1 == -1.0 || double.IsPositiveInfinity(u))
        {
            return um1;
        }
        return um1 * x / Math.Log(u);
    }
}
