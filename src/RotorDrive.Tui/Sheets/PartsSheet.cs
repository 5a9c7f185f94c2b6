using System.Collections.ObjectModel;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Files.Catalogs;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>The catalogs as tables, read-only: pick a catalog, filter rows by any text, sort by the selected column;
/// the CSV file's path is shown so the user knows where to edit.</summary>
public sealed class PartsSheet : Sheet
{
    private readonly ListView _kinds;
    private readonly TextField _filter;
    private readonly Label _file;
    private readonly Label _info;
    private readonly TableView _table;
    private readonly Dictionary<PartKind, (string Path, CatalogGrid Grid, int Problems)> _cache = [];
    private int _kind;
    private int _sortColumn = -1;
    private bool _descending;
    private int _loadedRevision = -1;

    /// <summary>Creates the sheet.</summary>
    public PartsSheet(WorkbenchContext context)
        : base(context, "Parts")
    {
        _kinds = new ListView { X = 0, Y = 0, Width = 13, Height = 6 };
        _kinds.SetSource(new ObservableCollection<string>(CatalogView.Kinds.Select(k => k.Name)));
        _kinds.ValueChanged += (_, _) =>
        {
            if (_kinds.Value is { } i && i >= 0 && i != _kind)
            {
                _kind = i;
                _sortColumn = -1;
                _descending = false;
                ShowTable();
            }
        };
        Add(new Label { X = 14, Y = 0, Text = "Filter:" });
        _filter = new TextField { X = 22, Y = 0, Width = Dim.Fill(), Text = "" };
        _filter.TextChanged += (_, _) => ShowTable();
        _file = new Label { X = 14, Y = 1, Width = Dim.Fill(), Height = 3, Text = "" };
        _info = new Label { X = 14, Y = 4, Width = Dim.Fill(), Height = 2, Text = "" };
        _table = new TableView { X = 0, Y = 6, Width = Dim.Fill(), Height = Dim.Fill() };
        _table.Style.ShowHorizontalBottomLine = false;
        Add(_kinds, _filter, _file, _info, _table);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 sort by column";

    /// <summary>The table as shown.</summary>
    internal TableView Table => _table;

    /// <summary>The filter box.</summary>
    internal TextField Filter => _filter;

    /// <summary>Shows one catalog (index into <see cref="CatalogView.Kinds"/>).</summary>
    internal void ShowKind(int index)
    {
        _kind = index;
        _kinds.SetSelection(index, false);
        _sortColumn = -1;
        _descending = false;
        ShowTable();
    }

    /// <summary>Sorts by a column; the same column again reverses the order.</summary>
    internal void SortBy(int column)
    {
        _descending = column == _sortColumn && !_descending;
        _sortColumn = column;
        ShowTable();
    }

    /// <inheritdoc/>
    public override void Refresh()
    {
        if (_loadedRevision != Context.Session.Revision)
        {
            _cache.Clear();
            _loadedRevision = Context.Session.Revision;
        }
        ShowTable();
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F7)
        {
            SortBy(_table.Value?.SelectedCell.X ?? 0);
            return true;
        }
        return false;
    }

    private void ShowTable()
    {
        var (name, kind) = CatalogView.Kinds[_kind];
        if (Context.Session.Catalogs is not { } catalogs)
        {
            _file.Text = "The rig's catalogs could not be located; see the Stations sheet's problem list.";
            _info.Text = "";
            _table.Table = new TextTableSource([], []);
            return;
        }
        string path = catalogs.Paths.For(kind);
        if (!_cache.TryGetValue(kind, out var entry) || entry.Path != path)
        {
            string? text = Context.Files.TryReadAllText(path, out string? failure);
            entry = text is null
                ? (path, new CatalogGrid([], []), 0)
                : (path, CatalogView.Read(kind, text, path, out int problems), problems);
            if (text is null)
            {
                _info.Text = $"! cannot read it: {failure}";
            }
            _cache[kind] = entry;
        }
        _file.Text = $"File: {Context.Files.FullPath(path)}\nRead-only here: edit the CSV file, then re-open the rig (F3).";
        var rows = CatalogView.FilterAndSort(entry.Grid, _filter.Text, _sortColumn, _descending);
        string sort = _sortColumn >= 0 && _sortColumn < entry.Grid.Headers.Count
            ? $"sorted by {entry.Grid.Headers[_sortColumn]} {(_descending ? "descending" : "ascending")}"
            : "file order";
        _info.Text = $"{name}: {rows.Count} of {entry.Grid.Rows.Count} valid rows, {sort}"
            + (entry.Problems > 0 ? $"\n! {entry.Problems} row problem(s) in the file; those rows are left out" : "");
        _table.Table = new TextTableSource(entry.Grid.Headers, rows);
    }
}
