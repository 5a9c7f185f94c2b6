using System.Text;
using RotorDrive.Core.Safety;

namespace RotorDrive.Tui.Text;

/// <summary>The cautions as the result sheets print them: a heading, then each caution with its level in words
/// (WARNING when the results put its hazard in play), its advice and the reason it was raised.</summary>
public static class CautionText
{
    /// <summary>The cautions section.</summary>
    /// <param name="cautions">Core's cautions, warnings first.</param>
    /// <param name="notes">Result-specific cautions in words, listed first (e.g. the landing regeneration), or null.</param>
    public static string Compose(IReadOnlyList<Caution> cautions, IEnumerable<string>? notes = null)
    {
        ArgumentNullException.ThrowIfNull(cautions);
        var sb = new StringBuilder();
        sb.AppendLine("CAUTIONS");
        foreach (string note in notes ?? [])
        {
            sb.AppendLine($"  caution {note}.");
        }
        foreach (var c in cautions)
        {
            string level = c.Level == CautionLevel.Warning ? "WARNING" : "caution";
            sb.AppendLine($"  {level} {c.Title}: {c.Text}{(c.Reason is null ? "" : " (" + c.Reason + ")")}");
        }
        return sb.ToString();
    }
}
