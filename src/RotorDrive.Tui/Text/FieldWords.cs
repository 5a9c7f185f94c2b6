using System.Text.RegularExpressions;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Tui.Session;

namespace RotorDrive.Tui.Text;

/// <summary>Code names turned into the words a sheet shows: a rig file key ("$.stations[0].x_mm" becomes "station 1,
/// x forward", "$.gap.design_mm" becomes "design gap") and a stress input ("gap_offset[3]" becomes "gap offset,
/// station 3", "pack_soc" becomes "pack state of charge").</summary>
public static partial class FieldWords
{
    /// <summary>The words for a rig file key: the label of the workbench field that edits it (with its station, counted
    /// from 1), or the key's own words without the unit suffix when no field edits it.</summary>
    /// <param name="jsonPath">The key as the readers name it ("$.stations[0].x_mm").</param>
    /// <returns>The words; the text unchanged when it is not a rig file key.</returns>
    public static string Of(string jsonPath)
    {
        ArgumentNullException.ThrowIfNull(jsonPath);
        if (!jsonPath.StartsWith("$", StringComparison.Ordinal))
        {
            return jsonPath;
        }
        if (StationKey().Match(jsonPath) is { Success: true } station)
        {
            int index = int.Parse(station.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture);
            string rest = station.Groups[2].Value;
            if (rest.Length == 0)
            {
                return $"station {index + 1}";
            }
            var spec = RigFields.Station(index).FirstOrDefault(s => s.JsonPath == jsonPath);
            return $"station {index + 1}, {spec?.Label ?? Plain(rest)}";
        }
        var field = RigFields.Groups.SelectMany(g => g.Fields).FirstOrDefault(s => s.JsonPath == jsonPath);
        return field?.Label ?? Plain(jsonPath.TrimStart('$', '.'));
    }

    /// <summary>The words for a stress input ("gap_offset[3]" becomes "gap offset, station 3"; stations are numbered
    /// from 1 in the key already).</summary>
    /// <param name="input">The input's key.</param>
    /// <returns>The words; the key's words when it is not a known quantity.</returns>
    public static string Input(string input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var m = IndexedInput().Match(input);
        string key = m.Success ? m.Groups[1].Value : input;
        var known = StressQuantities.All.Where(q => q.Key() == key).ToList();
        string words = known.Count == 1 ? known[0].Words() : key.Replace('_', ' ');
        return m.Success ? $"{words}, station {m.Groups[2].Value}" : words;
    }

    // "stations[0].rotor.id" -> "rotor id"; "limits.max_duty" -> "limits max duty"; unit suffixes are dropped.
    private static string Plain(string key)
        => UnitSuffix().Replace(key, "").Replace('.', ' ').Replace('_', ' ').Trim();

    [GeneratedRegex(@"^\$\.stations\[(\d+)\]\.?(.*)$")]
    private static partial Regex StationKey();

    [GeneratedRegex(@"^([a-z_]+)\[(\d+)\]$")]
    private static partial Regex IndexedInput();

    [GeneratedRegex(@"_(mm|kg|c|v|s|pct|nm|n|kg_m2|rpm|a|w)\b")]
    private static partial Regex UnitSuffix();
}
