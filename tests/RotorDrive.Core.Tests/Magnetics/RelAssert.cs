using Xunit.Sdk;

namespace RotorDrive.Core.Tests.Magnetics;

/// <summary>The one relative-tolerance assertion the load and magnetics tests use.</summary>
internal static class RelAssert
{
    /// <summary>Asserts |actual - expected| &lt;= tolerance * |expected| (or &lt;= tolerance when expected is 0).</summary>
    public static void Close(double expected, double actual, double relativeTolerance, string? what = null)
    {
        double allowed = expected == 0 ? relativeTolerance : relativeTolerance * Math.Abs(expected);
        if (!(Math.Abs(actual - expected) <= allowed))
        {
            throw new XunitException($"{what ?? "value"}: expected {expected:R} within {relativeTolerance:G3} relative, got {actual:R} (relative error {RelativeError(expected, actual):G3}).");
        }
    }

    /// <summary>Asserts |actual - expected| &lt;= max(relative * |expected|, absoluteFloor): relative where the value is large,
    /// absolute where it is near zero.</summary>
    public static void CloseOrSmall(double expected, double actual, double relativeTolerance, double absoluteFloor, string? what = null)
    {
        double allowed = Math.Max(relativeTolerance * Math.Abs(expected), absoluteFloor);
        if (!(Math.Abs(actual - expected) <= allowed))
        {
            throw new XunitException($"{what ?? "value"}: expected {expected:R} within {relativeTolerance:G3} relative or {absoluteFloor:G3} absolute, got {actual:R}.");
        }
    }

    /// <summary>True when |actual - expected| &lt;= max(relative * |expected|, absoluteFloor) (for FsCheck properties).</summary>
    public static bool IsClose(double expected, double actual, double relativeTolerance, double absoluteFloor = 0)
        => Math.Abs(actual - expected) <= Math.Max(relativeTolerance * Math.Abs(expected), absoluteFloor);

    private static double RelativeError(double expected, double actual)
        => expected == 0 ? Math.Abs(actual) : Math.Abs(actual - expected) / Math.Abs(expected);
}
