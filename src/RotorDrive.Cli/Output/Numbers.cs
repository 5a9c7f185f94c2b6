using System.Globalization;

namespace RotorDrive.Cli.Output;

/// <summary>Formats numbers for text output: invariant culture, fixed decimals, "n/a" for non-finite values.</summary>
public static class Numbers
{
    /// <summary>The number with <paramref name="decimals"/> decimals, or "n/a" when NaN or infinite.</summary>
    public static string Format(double value, int decimals)
        => double.IsFinite(value) ? value.ToString("F" + decimals, CultureInfo.InvariantCulture) : "n/a";

    /// <summary>An optional number, "-" when absent.</summary>
    public static string Format(double? value, int decimals) => value is { } v ? Format(v, decimals) : "-";
}
