using System.Globalization;
using RotorDrive.Core.Drive;

namespace RotorDrive.Tui.Text;

/// <summary>Numbers and limit marks as the sheets print them: invariant culture, fixed decimals, "n/a" for a value that
/// is not finite, and the text mark for a limit that is exceeded (so no sheet relies on colour alone).</summary>
public static class Figures
{
    /// <summary>The mark in front of anything over its limit.</summary>
    public const string Over = "!!";

    /// <summary>The legend for <see cref="Over"/>.</summary>
    public const string OverLegend = "!! over = the limit is exceeded (margin below 0)";

    /// <summary>The number with fixed decimals, or "n/a" when it is NaN or infinite.</summary>
    public static string F(double value, int decimals)
        => double.IsFinite(value) ? value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "n/a";

    /// <summary>An optional number; "-" when absent.</summary>
    public static string F(double? value, int decimals) => value is { } v ? F(v, decimals) : "-";

    /// <summary>A relative margin as a whole percentage ("37 %").</summary>
    public static string Percent(double fraction) => F(fraction * 100, 0) + " %";

    /// <summary>A margin as a short cell: the percentage, marked <see cref="Over"/> when the limit is exceeded.</summary>
    public static string MarginCell(LimitMargin margin)
        => (margin.Exceeded ? Over : "") + F(margin.MarginFraction * 100, 0);
}
