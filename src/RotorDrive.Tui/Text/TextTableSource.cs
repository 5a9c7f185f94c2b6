using Terminal.Gui.Views;

namespace RotorDrive.Tui.Text;

/// <summary>A table of text cells for <see cref="TableView"/>.</summary>
public sealed class TextTableSource : ITableSource
{
    private readonly IReadOnlyList<IReadOnlyList<string>> _rows;

    /// <summary>Creates the source.</summary>
    public TextTableSource(IReadOnlyList<string> headers, IReadOnlyList<IReadOnlyList<string>> rows)
    {
        ColumnNames = headers.ToArray();
        _rows = rows;
    }

    /// <inheritdoc/>
    public object this[int row, int col] => col < _rows[row].Count ? _rows[row][col] : "";

    /// <inheritdoc/>
    public string[] ColumnNames { get; }

    /// <inheritdoc/>
    public int Columns => ColumnNames.Length;

    /// <inheritdoc/>
    public int Rows => _rows.Count;

    /// <summary>The cells of a row.</summary>
    public IReadOnlyList<string> Row(int row) => _rows[row];
}
