using System.Text;

namespace RotorDrive.Cli.Output;

/// <summary>A plain-text table for terminal output: a header row, a rule, then rows; columns padded to fit.</summary>
/// <example><code>
/// var table = new TextTable(new TableColumn("motor"), new TableColumn("current_a", Alignment.Right));
/// table.AddRow("m-4020", Numbers.Format(31.25, 1));
/// table.Write(output);
/// </code></example>
public sealed class TextTable
{
    private readonly IReadOnlyList<TableColumn> _columns;
    private readonly List<string[]> _rows = [];

    /// <summary>Creates a table with the given columns.</summary>
    public TextTable(params TableColumn[] columns)
    {
        ArgumentNullException.ThrowIfNull(columns);
        if (columns.Length == 0)
        {
            throw new ArgumentException("A table needs at least one column.", nameof(columns));
        }
        _columns = columns;
    }

    /// <summary>Number of rows added.</summary>
    public int RowCount => _rows.Count;

    /// <summary>Adds a row; it must have one cell per column.</summary>
    /// <exception cref="ArgumentException">The cell count differs from the column count.</exception>
    public void AddRow(params string[] cells)
    {
        ArgumentNullException.ThrowIfNull(cells);
        if (cells.Length != _columns.Count)
        {
            throw new ArgumentException($"Expected {_columns.Count} cells, got {cells.Length}.", nameof(cells));
        }
        _rows.Add(cells);
    }

    /// <summary>Writes the table (header, rule, rows), each line indented by <paramref name="indent"/> spaces.</summary>
    public void Write(TextWriter output, int indent = 0)
    {
        ArgumentNullException.ThrowIfNull(output);
        var widths = _columns.Select((c, i) => Math.Max(c.Header.Length, _rows.Count == 0 ? 0 : _rows.Max(r => r[i].Length))).ToArray();
        string pad = new(' ', indent);
        output.WriteLine(pad + Line(_columns.Select(c => c.Header).ToArray(), widths));
        output.WriteLine(pad + string.Join("  ", widths.Select(w => new string('-', w))));
        foreach (var row in _rows)
        {
            output.WriteLine(pad + Line(row, widths));
        }
    }

    /// <summary>The table as text.</summary>
    public override string ToString()
    {
        using var writer = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        Write(writer);
        return writer.ToString();
    }

    private string Line(string[] cells, int[] widths)
    {
        var sb = new StringBuilder();
        for (int i = 0; i < cells.Length; i++)
        {
            if (i > 0)
            {
                sb.Append("  ");
            }
            bool last = i == cells.Length - 1;
            sb.Append(_columns[i].Align == Alignment.Right
                ? cells[i].PadLeft(widths[i])
                : last ? cells[i] : cells[i].PadRight(widths[i]));
        }
        return sb.ToString();
    }
}
