using Xunit.Sdk;

namespace RotorDrive.Core.Tests.Support;

/// <summary>The one relative-tolerance assertion of the Core tests.</summary>
internal static class RelAssert
{
    /// <summary>Asserts |actual - expected| &lt;= tolerance * |expected| (or &lt;= tolerance when expected is 0).</summary>
    public static void Close(double expected, double actual, double relativeTolerance, string? what = null)
        => Check(expected, actual, relativeTolerance, expected == 0 ? relativeTolerance : 0, what);

    /// <summary>Asserts |actual - expected| &lt;= max(relative * |expected|, absoluteFloor): relative where the value is large,
    /// absolute where it is near zero.</summary>
    public static void Close(double expected, double actual, double relativeTolerance, double absoluteFloor, string? what = null)
        => Check(expected, actual, relativeTolerance, absoluteFloor, what);

    /// <summary>True when |actual - expected| &lt;= max(relative * |expected|, absoluteFloor) (for FsCheck properties).</summary>
    public static bool IsClose(double expected, double actual, double relativeTolerance, double absoluteFloor = 0)
        => Math.Abs(actual - expected) <= Math.Max(relativeTolerance * Math.Abs(expected), absoluteFloor);

    /// <summary>Asserts low &lt;= actual &lt;= high.</summary>
    public static void InRange(double actual, double low, double high, string? what = null)
    {
        if (!(actual >= low && actual <= high))
        {
            throw new XunitException($"{what ?? "value"}: expected a value in [{low:G6}, {high:G6}], got {actual:R}.");
        }
    }

    private static void Check(double expected, double actual, double relativeTolerance, double absoluteFloor, string? what)
    {
        double allowed = Math.Max(relativeTolerance * Math.Abs(expected), absoluteFloor);
        double diff = Math.Abs(actual - expected);
        if (!(diff <= allowed))
        {
            double relative = expected == 0 ? double.PositiveInfinity : diff / Math.Abs(expected);
            throw new XunitException(
                $"{what ?? "value"}: expected {expected:R} within {relativeTolerance:G3} relative (floor {absoluteFloor:G3}), got {actual:R} " +
                $"(difference {diff:G3}, relative {relative:G3}).");
        }
    }
}
