namespace RotorDrive.Core.Thermal;

/// <summary>A rotor's heat source on the plate: rings of given radii around a centre, each carrying a fixed fraction of
/// the rotor's eddy power, uniform in angle, and the magnet annulus the rotor's plate temperature is averaged over.</summary>
/// <param name="XM">Centre x in the craft frame, m.</param>
/// <param name="YM">Centre y in the craft frame, m.</param>
/// <param name="InnerRadiusM">Inner radius of the magnet annulus, m.</param>
/// <param name="OuterRadiusM">Outer radius of the magnet annulus, m.</param>
/// <param name="RingRadiiM">Ring radii, m (the load model's radial strips).</param>
/// <param name="RingFractions">Fraction of the power in each ring, summing to 1.</param>
internal sealed record AnnularSource(double XM, double YM, double InnerRadiusM, double OuterRadiusM, double[] RingRadiiM, double[] RingFractions)
{
    /// <summary>A source spread evenly per unit area over the annulus (rings at Gauss-Legendre radii weighted by area).</summary>
    public static AnnularSource Uniform(double xM, double yM, double innerRadiusM, double outerRadiusM, int rings = 24)
    {
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(innerRadiusM, outerRadiusM, rings);
        var radii = new double[rings];
        var fractions = new double[rings];
        double area = Math.PI * (outerRadiusM * outerRadiusM - innerRadiusM * innerRadiusM);
        for (int i = 0; i < rings; i++)
        {
            radii[i] = rule.GetAbscissa(i);
            fractions[i] = rule.GetWeight(i) * 2 * Math.PI * radii[i] / area;
        }
        return new AnnularSource(xM, yM, innerRadiusM, outerRadiusM, radii, fractions);
    }
}
