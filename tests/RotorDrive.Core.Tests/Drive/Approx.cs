using Xunit.Sdk;

namespace RotorDrive.Core.Tests.Drive;

/// <summary>The one relative-tolerance assertion the drive tests use.</summary>
internal static class Approx
{
    /// <summary>Fails unless |actual - expected| &lt;= relTol x max(|expected|, floor).</summary>
    public static void Equal(double expected, double actual, double relTol, double floor = 0, string? what = null)
    {
        double scale = Math.Max(Math.Abs(expected), floor);
        if (!double.IsFinite(actual) || Math.Abs(actual - expected) > relTol * scale)
        {
            throw new XunitException($"{what ?? "value"}: expected {expected:R} within {relTol:G3} relative, got {actual:R} (rel. error {Math.Abs(actual - expected) / scale:G3}).");
        }
    }
}
