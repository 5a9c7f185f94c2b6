using MathNet.Numerics.Distributions;

namespace RotorDrive.Core.Numerics;

/// <summary>Wilson's score confidence interval for a binomial proportion.</summary>
/// <remarks>E. B. Wilson, "Probable inference, the law of succession, and statistical inference", J. Am. Stat. Assoc.
/// 22, 209-212, 1927: the interval holds every p with (p_hat - p)^2 &lt;= z^2 p (1 - p) / n, i.e.
/// (p_hat + z^2/(2n) +- z sqrt(p_hat (1 - p_hat)/n + z^2/(4 n^2))) / (1 + z^2/n), z the two-sided normal quantile.
/// Recommended over the simple Wald interval for its coverage near 0 and 1 and because it never leaves [0, 1]
/// (R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
/// Statistics in Medicine 17, 857-872, 1998, method 3, without continuity correction).</remarks>
public static class WilsonInterval
{
    /// <summary>The Wilson score interval for <paramref name="count"/> outcomes in <paramref name="trials"/> samples.</summary>
    /// <param name="count">Number of samples with the outcome, 0 to <paramref name="trials"/>.</param>
    /// <param name="trials">Number of samples, at least 1.</param>
    /// <param name="confidenceLevel">Two-sided confidence level in (0, 1); default 0.95 (z = 1.959964).</param>
    /// <returns>The estimate and its limits, clamped to [0, 1] against rounding.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static ProportionInterval Compute(int count, int trials, double confidenceLevel = 0.95)
    {
        Preconditions.AtLeast(trials, 1, nameof(trials));
        if (count < 0 || count > trials)
        {
            throw new ArgumentOutOfRangeException(nameof(count), count, $"count must lie in [0, {trials}]; got {count}.");
        }
        if (!(confidenceLevel > 0 && confidenceLevel < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(confidenceLevel), confidenceLevel, $"confidenceLevel must lie in (0, 1); got {confidenceLevel}.");
        }

        double z = Normal.InvCDF(0, 1, 1 - (1 - confidenceLevel) / 2);
        double n = trials;
        double p = count / n;
        double z2 = z * z;
        double denominator = 1 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denominator;
        double half = z / denominator * Math.Sqrt(p * (1 - p) / n + z2 / (4 * n * n));
        double lower = count == 0 ? 0 : Math.Max(0, centre - half);
        double upper = count == trials ? 1 : Math.Min(1, centre + half);
        return new ProportionInterval(count, trials, p, lower, upper, confidenceLevel);
    }
}
