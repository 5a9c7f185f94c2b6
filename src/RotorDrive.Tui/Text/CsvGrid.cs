using System.Text;

namespace RotorDrive.Tui.Text;

/// <summary>A CSV text split into header and rows of cells (RFC 4180 quoting), for showing catalog rows as a table.</summary>
/// <param name="Headers">The header cells.</param>
/// <param name="Rows">The data rows.</param>
public sealed record CsvGrid(IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows)
{
    /// <summary>Splits CSV text (comma separated; quoted fields may hold commas, doubled quotes and line breaks).</summary>
    public static CsvGrid Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var records = new List<IReadOnlyList<string>>();
        var record = new List<string>();
        var cell = new StringBuilder();
        bool quoted = false;
        for (int i = 0; i < text.Length; i++)
        {
            char ch = text[i];
            if (quoted)
            {
                if (ch == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    cell.Append('"');
                    i++;
                }
                else if (ch == '"')
                {
                    quoted = false;
                }
                else
                {
                    cell.Append(ch);
                }
                continue;
            }
            switch (ch)
            {
                case '"':
                    quoted = true;
                    break;
                case ',':
                    record.Add(cell.ToString());
                    cell.Clear();
                    break;
                case '\r':
                    break;
                case '\n':
                    record.Add(cell.ToString());
                    cell.Clear();
                    records.Add(record);
                    record = [];
                    break;
                default:
                    cell.Append(ch);
                    break;
            }
        }
        if (cell.Length > 0 || record.Count > 0)
        {
            record.Add(cell.ToString());
            records.Add(record);
        }
        records.RemoveAll(r => r.Count == 1 && r[0].Length == 0);
        if (records.Count == 0)
        {
            return new CsvGrid([], []);
        }
        return new CsvGrid(records[0], records.Skip(1).ToList());
    }
}
