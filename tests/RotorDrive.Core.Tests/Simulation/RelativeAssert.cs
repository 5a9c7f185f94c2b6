using Xunit.Sdk;

namespace RotorDrive.Core.Tests.Simulation;

/// <summary>The one helper through which tests compare numbers with a relative tolerance.</summary>
internal static class RelativeAssert
{
    /// <summary>Passes when |actual - expected| &lt;= relativeTolerance x |expected| (or &lt;= absoluteFloor, for
    /// expected values at or near zero).</summary>
    public static void Equal(double expected, double actual, double relativeTolerance, double absoluteFloor = 0, string? what = null)
    {
        double allowed = Math.Max(relativeTolerance * Math.Abs(expected), absoluteFloor);
        double diff = Math.Abs(actual - expected);
        if (!(diff <= allowed))
        {
            string label = what is null ? string.Empty : what + ": ";
            throw new XunitException(
                $"{label}expected {expected:R} within {relativeTolerance:G3} relative (floor {absoluteFloor:G3}), got {actual:R} " +
                $"(difference {diff:G3}, relative {(expected == 0 ? double.PositiveInfinity : diff / Math.Abs(expected)):G3}).");
        }
    }

    /// <summary>Passes when low &lt;= actual &lt;= high.</summary>
    public static void InRange(double actual, double low, double high, string? what = null)
    {
        if (!(actual >= low && actual <= high))
        {
            string label = what is null ? string.Empty : what + ": ";
            throw new XunitException($"{label}expected a value in [{low:G6}, {high:G6}], got {actual:R}.");
        }
    }
}
