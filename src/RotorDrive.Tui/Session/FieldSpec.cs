using System.Globalization;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Tui.Session;

/// <summary>One editable rig value: its label, unit, JSON path in the rig file, how to show it and how to store typed
/// text back into the document.</summary>
/// <param name="Label">Label shown beside the field.</param>
/// <param name="Unit">Unit shown after the field ("" when none).</param>
/// <param name="JsonPath">The rig file key ("$.gap.design_mm"), which the resolver's problems name.</param>
/// <param name="Show">The document's value as text ("" when absent).</param>
/// <param name="Store">Stores typed text; returns null when stored, otherwise why the text is not a value.</param>
/// <param name="Choices">For a catalog id: the ids to pick from; null for plain values.</param>
public sealed record FieldSpec(
    string Label,
    string Unit,
    string JsonPath,
    Func<RigDocument, string> Show,
    Func<RigDocument, string, string?> Store,
    Func<PartsCatalog, IReadOnlyList<string>>? Choices = null)
{
    /// <summary>The value the resolver uses when the key is left out (RigDefaults), shown beside a blank field; null for
    /// a required key or one without a single default.</summary>
    public double? Default { get; init; }

    /// <summary>A number field; empty text stores "absent" (optional keys fall back to their documented default).</summary>
    public static FieldSpec Number(string label, string unit, string jsonPath, Func<RigDocument, double?> get, Action<RigDocument, double?> set)
        => new(label, unit, jsonPath,
            d => Format(get(d)),
            (d, text) =>
            {
                if (!TryParseNumber(text, out double? value, out string? why))
                {
                    return why;
                }
                set(d, value);
                return null;
            });

    /// <summary>A whole-number field.</summary>
    public static FieldSpec Whole(string label, string unit, string jsonPath, Func<RigDocument, int?> get, Action<RigDocument, int?> set)
        => new(label, unit, jsonPath,
            d => get(d)?.ToString(CultureInfo.InvariantCulture) ?? "",
            (d, text) =>
            {
                string t = text.Trim();
                if (t.Length == 0)
                {
                    set(d, null);
                    return null;
                }
                if (!int.TryParse(t, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n))
                {
                    return $"'{t}' is not a whole number";
                }
                set(d, n);
                return null;
            });

    /// <summary>A catalog id field with the ids to pick from.</summary>
    public static FieldSpec Id(string label, string jsonPath, Func<RigDocument, string?> get, Action<RigDocument, string?> set,
        Func<PartsCatalog, IReadOnlyList<string>> choices)
        => new(label, "", jsonPath,
            d => get(d) ?? "",
            (d, text) =>
            {
                string t = text.Trim();
                set(d, t.Length == 0 ? null : t);
                return null;
            },
            choices);

    /// <summary>Formats a number the way the rig file holds it (invariant culture, shortest round-trip form).</summary>
    public static string Format(double? value)
        => value is { } v ? v.ToString("R", CultureInfo.InvariantCulture) : "";

    /// <summary>Reads typed text as a number: dot decimal separator, finite; empty text is "absent".</summary>
    public static bool TryParseNumber(string text, out double? value, out string? why)
    {
        string t = text.Trim();
        value = null;
        why = null;
        if (t.Length == 0)
        {
            return true;
        }
        if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double v))
        {
            why = $"'{t}' is not a number (use a dot for decimals, e.g. 12.5)";
            return false;
        }
        if (!double.IsFinite(v))
        {
            why = $"'{t}' is not a finite number";
            return false;
        }
        value = v;
        return true;
    }
}
