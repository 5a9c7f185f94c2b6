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
}
