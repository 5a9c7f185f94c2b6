namespace RotorDrive.Core.Studies;

/// <summary>How one quantity of a part varies around its nominal value: a normal or uniform deviation, in percent of
/// nominal or in the quantity's own unit, optionally kept positive.</summary>
/// <remarks>
/// <para>Every <see cref="Apply"/> consumes exactly one uniform draw from the stream, whatever the shape, and turns it
/// into a value by inverse transform sampling (L. Devroye, "Non-Uniform Random Variate Generation", Springer 1986,
/// II.2): changing one quantity's tolerance never shifts the draws of the quantities drawn after it, so studies
/// stay comparable. The normal quantile is MathNet's Normal.InvCDF; the uniform draw is kept inside (0, 1), which bounds
/// a normal draw to about 8.1 standard deviations.</para>
/// <para>Positive quantities (resistances, Kv, thicknesses, a gap): with <see cref="KeepsPositive"/> the deviation is
/// truncated so the value stays above zero. For a normal, the distribution is conditioned on a positive value
/// (the truncated normal: N. L. Johnson, S. Kotz and N. Balakrishnan, "Continuous Univariate Distributions", vol. 1,
/// 2nd ed., 1994, 10.1), sampled by inverse transform between Phi(-nominal / sigma) and 1; for a uniform, the part of
/// the interval at or below zero is cut off. Spreads large enough for the truncation to matter (sigma above a third of
/// nominal) are unusual for real parts; the truncated mean then exceeds nominal. In the rare case where rounding
/// puts a normal draw at or below zero, 1e-12 of nominal is returned instead.</para>
/// </remarks>
public sealed record Tolerance
{
    // Keep u in [2^-53, 1 - 2^-53] so the normal quantile stays finite.
    private const double SmallestUniform = 1.1102230246251565e-16;

    private Tolerance(ToleranceShape shape, ToleranceScale scale, double standardDeviation, double lower, double upper, bool keepsPositive)
    {
        Shape = shape;
        Scale = scale;
        StandardDeviation = standardDeviation;
        Lower = lower;
        Upper = upper;
        KeepsPositive = keepsPositive;
    }

    /// <summary>No spread: <see cref="Apply"/> returns the nominal value (still consuming one draw).</summary>
    public static Tolerance None { get; } = new(ToleranceShape.None, ToleranceScale.Absolute, 0, 0, 0, false);

    /// <summary>The distribution of the deviation.</summary>
    public ToleranceShape Shape { get; }

    /// <summary>Whether the spread is in percent of nominal or in the quantity's own unit.</summary>
    public ToleranceScale Scale { get; }

    /// <summary>Standard deviation of a normal deviation, in percent or the quantity's unit (0 for other shapes).</summary>
    public double StandardDeviation { get; }

    /// <summary>Lower bound of a uniform deviation, in percent or the quantity's unit (0 for other shapes).</summary>
    public double Lower { get; }

    /// <summary>Upper bound of a uniform deviation, in percent or the quantity's unit (0 for other shapes).</summary>
    public double Upper { get; }

    /// <summary>Whether drawn values are kept strictly positive (for physically positive quantities).</summary>
    public bool KeepsPositive { get; }

    /// <summary>A normal deviation with mean 0.</summary>
    /// <param name="standardDeviation">Standard deviation, &gt;= 0, in percent of nominal or in the quantity's unit.</param>
    /// <param name="scale">How <paramref name="standardDeviation"/> is expressed.</param>
    /// <param name="keepPositive">True for a physically positive quantity (truncates at zero).</param>
    /// <exception cref="ArgumentOutOfRangeException">The standard deviation is negative or not finite.</exception>
    public static Tolerance Normal(double standardDeviation, ToleranceScale scale, bool keepPositive)
        => new(ToleranceShape.Normal, scale, Preconditions.NonNegative(standardDeviation, nameof(standardDeviation)), 0, 0, keepPositive);

    /// <summary>A uniform deviation between two bounds (for example -5 and +5 percent, or -0.0015 and +0.0005 m).</summary>
    /// <param name="lower">Lower bound of the deviation, in percent of nominal or in the quantity's unit.</param>
    /// <param name="upper">Upper bound of the deviation, not below <paramref name="lower"/>.</param>
    /// <param name="scale">How the bounds are expressed.</param>
    /// <param name="keepPositive">True for a physically positive quantity (cuts off values at or below zero).</param>
    /// <exception cref="ArgumentOutOfRangeException">A bound is not finite or the bounds are out of order.</exception>
    public static Tolerance Uniform(double lower, double upper, ToleranceScale scale, bool keepPositive)
    {
        Preconditions.Finite(lower, nameof(lower));
        Preconditions.Finite(upper, nameof(upper));
        if (upper < lower)
        {
            throw new ArgumentOutOfRangeException(nameof(upper), upper, $"upper ({upper}) must not be below lower ({lower}).");
        }
        return new(ToleranceShape.Uniform, scale, 0, lower, upper, keepPositive);
    }

    /// <summary>Draws a value of the quantity: nominal plus a deviation from this tolerance, using one draw of
    /// <paramref name="random"/>.</summary>
    /// <param name="nominal">Nominal value, finite; &gt; 0 when <see cref="KeepsPositive"/>.</param>
    /// <param name="random">The sample's stream (<see cref="SampleStreams.ForSample"/>).</param>
    /// <returns>The drawn value, finite (and &gt; 0 when <see cref="KeepsPositive"/>).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="random"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The nominal is not finite, or not positive for a positive
    /// quantity, or a uniform tolerance lies wholly at or below zero for a positive quantity.</exception>
    public double Apply(double nominal, Random random)
    {
        Preconditions.NotNull(random, nameof(random));
        Preconditions.Finite(nominal, nameof(nominal));
        if (KeepsPositive)
        {
            Preconditions.Positive(nominal, nameof(nominal));
        }
        double u = OpenUniform(random);
        double unit = Scale == ToleranceScale.Percent ? Math.Abs(nominal) / 100.0 : 1.0;
        switch (Shape)
        {
            case ToleranceShape.Normal:
            {
                double sigma = StandardDeviation * unit;
                if (sigma == 0)
                {
                    return nominal;
                }
                double p = u;
                if (KeepsPositive)
                {
                    double below = MathNet.Numerics.Distributions.Normal.CDF(0, 1, -nominal / sigma);
                    p = Math.Clamp(below + u * (1 - below), SmallestUniform, 1 - SmallestUniform);
                }
                double value = nominal + sigma * MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, p);
                return KeepsPositive && value <= 0 ? nominal * 1e-12 : value;
            }
            case ToleranceShape.Uniform:
            {
                double low = nominal + Lower * unit;
                double high = nominal + Upper * unit;
                if (KeepsPositive)
                {
                    if (high <= 0)
                    {
                        throw new ArgumentOutOfRangeException(nameof(nominal), nominal,
                            $"a uniform tolerance of [{Lower}, {Upper}] ({Scale}) puts every value of this positive quantity at or below zero.");
                    }
                    low = Math.Max(low, 0);
                }
                return low + u * (high - low);
            }
            default:
                return nominal;
        }
    }

    // One draw in the open interval (0, 1): the stream's NextDouble in [0, 1) moved to the centre of its 2^-52 cell,
    // (k + 1/2) / 2^52 with k = 0..2^52-1, every value exact in double.
    private static double OpenUniform(Random random) => (Math.Floor(random.NextDouble() * 4503599627370496.0) + 0.5) / 4503599627370496.0;
}
