namespace RotorDrive.Core.Loads;

/// <summary>Lists of shaft speeds for sweeps.</summary>
public static class SpeedGrid
{
    /// <summary>Most speeds a list may hold.</summary>
    public const int MaxPoints = 100_000;

    /// <summary>Speeds from a first to a last value in equal steps, both ends included (the last step may be shorter so the
    /// list ends exactly at the last value), in the units given.</summary>
    /// <param name="from">First speed, at least 0.</param>
    /// <param name="to">Last speed, at least the first.</param>
    /// <param name="step">Step, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range or the list would exceed <see cref="MaxPoints"/>.</exception>
    public static double[] Range(double from, double to, double step)
    {
        Preconditions.NonNegative(from, nameof(from));
        Preconditions.InRange(to, from, double.MaxValue, nameof(to));
        Preconditions.Positive(step, nameof(step));
        double intervals = (to - from) / step;
        if (intervals > MaxPoints - 1)
        {
            throw new ArgumentOutOfRangeException(nameof(step), step, $"{nameof(step)} {step} makes more than {MaxPoints} speeds from {from} to {to}.");
        }
        // A last interval shorter than 1e-9 of a step is rounding, not a real extra point.
        int whole = (int)Math.Floor(intervals + 1e-9);
        bool partial = intervals - whole > 1e-9;
        var speeds = new double[whole + 1 + (partial ? 1 : 0)];
        for (int i = 0; i <= whole; i++)
        {
            speeds[i] = Math.Min(from + i * step, to);
        }
        speeds[^1] = to;
        return speeds;
    }

    /// <summary>Speeds from 0 to a top speed in a number of equal steps (steps + 1 speeds).</summary>
    /// <param name="top">Top speed, greater than 0.</param>
    /// <param name="steps">Number of steps, 1..<see cref="MaxPoints"/> - 1 (the load command uses 25).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public static double[] ZeroTo(double top, int steps)
    {
        Preconditions.Positive(top, nameof(top));
        Preconditions.InRange(steps, 1, MaxPoints - 1, nameof(steps));
        var speeds = new double[steps + 1];
        for (int i = 0; i <= steps; i++)
        {
            speeds[i] = top * i / steps;
        }
        return speeds;
    }
}
