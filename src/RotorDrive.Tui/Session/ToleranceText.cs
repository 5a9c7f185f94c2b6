using System.Globalization;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Tui.Session;

/// <summary>A tolerance entry as one line of text, and back: "normal 2%", "normal 0.7", "uniform -16% 0%",
/// "uniform -0.3 0.3", or blank for no spread. Each form is one of the rig file's four spreads (normal_sd_pct,
/// normal_sd, uniform_pct, uniform); the resolver checks the values' ranges and gives its own messages.</summary>
public static class ToleranceText
{
    /// <summary>The forms, for hints.</summary>
    public const string Forms = "normal S[%] or uniform L[%] H[%]; blank: no spread";

    /// <summary>The entry as text ("" when absent). An entry with several spreads (a broken file) shows its first.</summary>
    public static string Format(RigToleranceEntry? entry)
    {
        if (entry is null)
        {
            return "";
        }
        if (entry.NormalSdPct is { } sdPct)
        {
            return $"normal {FieldSpec.Format(sdPct)}%";
        }
        if (entry.NormalSd is { } sd)
        {
            return $"normal {FieldSpec.Format(sd)}";
        }
        if (entry.UniformPct is { Length: 2 } pct)
        {
            return $"uniform {FieldSpec.Format(pct[0])}% {FieldSpec.Format(pct[1])}%";
        }
        if (entry.Uniform is { Length: 2 } bounds)
        {
            return $"uniform {FieldSpec.Format(bounds[0])} {FieldSpec.Format(bounds[1])}";
        }
        return "";
    }

    /// <summary>Reads typed text as an entry: true with the entry (null for blank, meaning no spread), or false with
    /// why the text is not a spread.</summary>
    public static bool TryParse(string text, out RigToleranceEntry? entry, out string? why)
    {
        ArgumentNullException.ThrowIfNull(text);
        entry = null;
        why = null;
        string t = text.Trim();
        if (t.Length == 0)
        {
            return true;
        }
        bool percent = t.Contains('%', StringComparison.Ordinal);
        var words = t.Replace("%", " ", StringComparison.Ordinal).Split(' ', StringSplitOptions.RemoveEmptyEntries);
        string kind = words[0].ToLowerInvariant();
        if (kind is not ("normal" or "uniform"))
        {
            why = $"'{t}' is not a spread; write {Forms} (e.g. normal 2%, uniform -0.3 0.3)";
            return false;
        }
        var numbers = new List<double>();
        foreach (string word in words.Skip(1))
        {
            if (!double.TryParse(word, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
            {
                why = $"'{word}' is not a number (use a dot for decimals, e.g. 2.5)";
                return false;
            }
            numbers.Add(v);
        }
        if (kind == "normal")
        {
            if (numbers.Count != 1)
            {
                why = "normal takes one standard deviation, e.g. normal 2% or normal 0.7";
                return false;
            }
            entry = percent ? RigToleranceEntry.NormalPercent(numbers[0]) : RigToleranceEntry.NormalAbsolute(numbers[0]);
            return true;
        }
        if (numbers.Count != 2)
        {
            why = "uniform takes a low and a high bound, e.g. uniform -5% 5% or uniform -0.3 0.3";
            return false;
        }
        entry = percent ? RigToleranceEntry.UniformPercent(numbers[0], numbers[1]) : RigToleranceEntry.UniformAbsolute(numbers[0], numbers[1]);
        return true;
    }
}
