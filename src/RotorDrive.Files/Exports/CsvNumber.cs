using System.Globalization;

namespace RotorDrive.Files.Exports;

/// <summary>The one number format of every CSV export: invariant culture, at most 15 significant digits (the digits a
/// double carries reliably, so a sum like 50.400000000000006 is written 50.4), magnitudes below 1e-12 written as 0
/// (solver residue such as 1.24345E-14 is not a value), and an empty cell for a value that is absent or not finite.</summary>
/// <remarks>JSON output keeps round-trip precision; CSV is read by people and spreadsheets. 15 significant digits:
/// IEEE 754-2019, clause 5.12.2 (a decimal string of 15 digits survives binary64 and back unchanged).</remarks>
public static class CsvNumber
{
    /// <summary>Magnitudes below this are written as 0.</summary>
    public const double ZeroBelow = 1e-12;

    /// <summary>The cell text of a number.</summary>
    /// <param name="value">The value, or null for an empty cell.</param>
    public static string Format(double? value)
    {
        if (value is not { } v || !double.IsFinite(v))
        {
            return "";
        }
        return Math.Abs(v) < ZeroBelow ? "0" : v.ToString("G15", CultureInfo.InvariantCulture);
    }
}
