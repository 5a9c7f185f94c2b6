namespace RotorDrive.Tui.Text;

/// <summary>Word wrapping for text shown in lists.</summary>
public static class Wrap
{
    /// <summary>Splits text into lines of at most <paramref name="width"/> characters, breaking at spaces and keeping
    /// each line's leading indent on its continuation lines.</summary>
    public static IReadOnlyList<string> Lines(string text, int width)
    {
        ArgumentNullException.ThrowIfNull(text);
        width = Math.Max(10, width);
        var lines = new List<string>();
        foreach (string raw in text.Replace("\r", "").Split('\n'))
        {
            int indent = raw.Length - raw.TrimStart(' ').Length;
            // "  KEY     description": continuation lines hang under the description.
            int gap = raw.IndexOf("  ", indent, StringComparison.Ordinal);
            int hang = gap > indent ? gap + raw[gap..].TakeWhile(c => c == ' ').Count() : indent + 2;
            string pad = new(' ', Math.Min(hang, width / 2));
            string rest = raw;
            bool first = true;
            while (rest.Length > width)
            {
                int cut = rest.LastIndexOf(' ', width);
                if (cut <= (first ? indent : pad.Length))
                {
                    cut = width;
                }
                lines.Add(rest[..cut].TrimEnd());
                rest = pad + rest[cut..].TrimStart();
                first = false;
            }
            lines.Add(rest);
        }
        return lines;
    }
}
