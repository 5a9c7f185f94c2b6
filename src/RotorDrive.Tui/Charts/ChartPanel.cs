using System.Collections.ObjectModel;
using System.Globalization;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Charts;

/// <summary>The layout every chart sheet shares: a row of labelled what-if inputs with their problems in words beside
/// them, a readout of a few lines, and a chart below that fills the rest; a chart may have several pages, and after
/// them a page of figures in text (scrollable), cycled with <see cref="NextPage"/>.</summary>
/// <remarks>Sheets add their inputs with <see cref="AddInput"/>, listen to <see cref="InputsChanged"/> (not raised while
/// a sheet sets a field itself with <see cref="SetQuietly"/>), read the inputs with <see cref="ReadNumber"/> and
/// <see cref="ReadStation"/>, and show results with <see cref="Readout"/> and <see cref="ShowPages"/>.</remarks>
public sealed class ChartPanel : View
{
    private readonly List<TextField> _inputs = [];
    private readonly Label _problems;
    private readonly Label _readout;
    private readonly ChartView _chart;
    private readonly ListView _details;
    private readonly ObservableCollection<string> _detailLines = [];
    private IReadOnlyList<ChartData> _pages = [];
    private string? _detailText;
    private int _wrappedAt = -1;
    private int _page;
    private int _nextX;
    private bool _quiet;

    /// <summary>Creates the panel, filling its parent.</summary>
    /// <param name="readoutLines">Rows kept for the readout between the inputs and the chart.</param>
    public ChartPanel(int readoutLines)
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        _problems = new Label { X = 0, Y = 0, Width = Dim.Fill(), Height = 1, Text = "" };
        _readout = new Label { X = 0, Y = 1, Width = Dim.Fill(), Height = readoutLines, Text = "" };
        _chart = new ChartView { X = 0, Y = 1 + readoutLines, Width = Dim.Fill(), Height = Dim.Fill() };
        _details = new ListView { X = 0, Y = 1 + readoutLines, Width = Dim.Fill(), Height = Dim.Fill(), Visible = false };
        _details.SetSource(_detailLines);
        _details.FrameChanged += (_, _) => WrapDetails();
        Add(_problems, _readout, _chart, _details);
    }

    /// <summary>Raised when the user changes an input.</summary>
    public event EventHandler? InputsChanged;

    /// <summary>The chart.</summary>
    public ChartView Chart => _chart;

    /// <summary>The readout cursor's exact values on the chart ("" when the cursor is not in use).</summary>
    public string CursorReadout => _chart.CursorReadout;

    /// <summary>The readout text (a few lines above the chart).</summary>
    public string Readout
    {
        get => _readout.Text;
        set => _readout.Text = value;
    }

    /// <summary>The input problems shown beside the inputs ("" when none).</summary>
    public string Problems => _problems.Text;

    /// <summary>The chart pages on show.</summary>
    public IReadOnlyList<ChartData> Pages => _pages;

    /// <summary>The page on show, 0-based (the figures page comes after the charts).</summary>
    public int PageIndex => _page;

    /// <summary>Whether the figures page is on show.</summary>
    public bool ShowingDetails => _detailText is not null && _page == _pages.Count;

    /// <summary>The figures page's text ("" when there is none).</summary>
    public string Details => _detailText ?? "";

    private int PageCount => _pages.Count + (_detailText is null ? 0 : 1);

    /// <summary>Adds a labelled input to the row, after the ones already there.</summary>
    /// <param name="label">The label, with unit ("gap mm").</param>
    /// <param name="width">The field's width in columns.</param>
    /// <param name="text">The initial text.</param>
    public TextField AddInput(string label, int width, string text = "")
    {
        ArgumentNullException.ThrowIfNull(label);
        Add(new Label { X = _nextX, Y = 0, Text = label });
        var field = new TextField { X = _nextX + label.Length + 1, Y = 0, Width = width, Text = text };
        _nextX += label.Length + 1 + width + 1;
        field.TextChanged += (_, _) =>
        {
            if (!_quiet)
            {
                InputsChanged?.Invoke(this, EventArgs.Empty);
            }
        };
        _inputs.Add(field);
        Add(field);
        _problems.X = _nextX;
        return field;
    }

    /// <summary>Sets a field's text without raising <see cref="InputsChanged"/> (a sheet resetting its what-if values).</summary>
    public void SetQuietly(TextField field, string text)
    {
        ArgumentNullException.ThrowIfNull(field);
        _quiet = true;
        try
        {
            field.Text = text;
        }
        finally
        {
            _quiet = false;
        }
    }

    /// <summary>Shows the input problems in words beside the inputs, marked '!'; none clears the mark.</summary>
    public void ShowProblems(IReadOnlyCollection<string> problems)
    {
        ArgumentNullException.ThrowIfNull(problems);
        _problems.Text = problems.Count == 0 ? "" : "! " + string.Join("; ", problems);
    }

    /// <summary>Shows chart pages, keeping the page on show when it still exists; null or empty clears the chart.</summary>
    /// <param name="pages">The charts.</param>
    /// <param name="details">Text for a figures page after the charts, or null for none.</param>
    public void ShowPages(IReadOnlyList<ChartData>? pages, string? details = null)
    {
        _pages = pages ?? [];
        _detailText = details;
        _wrappedAt = -1;
        if (_page >= PageCount)
        {
            _page = 0;
        }
        ShowPage();
    }

    /// <summary>Shows one chart (a single page).</summary>
    public void Show(ChartData? data) => ShowPages(data is null ? null : [data]);

    /// <summary>Turns to the next page (after the last, the first).</summary>
    public void NextPage()
    {
        if (PageCount > 0)
        {
            _page = (_page + 1) % PageCount;
        }
        ShowPage();
    }

    /// <summary>Reads a number typed in a field; on a problem adds it in words to <paramref name="problems"/>.</summary>
    /// <param name="field">The field.</param>
    /// <param name="what">The quantity in words ("gap").</param>
    /// <param name="unit">The unit shown in the message.</param>
    /// <param name="min">Smallest allowed value.</param>
    /// <param name="max">Largest allowed value.</param>
    /// <param name="minExclusive">True when <paramref name="min"/> itself is not allowed.</param>
    /// <param name="problems">Where a problem goes.</param>
    /// <returns>The value, or null when the text is empty, not a number or out of range.</returns>
    public static double? ReadNumber(TextField field, string what, string unit, double min, double max, bool minExclusive, List<string> problems)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(problems);
        bool parsed = FieldSpec.TryParseNumber(field.Text, out double? value, out string? why);
        if (parsed && value is { } v && (minExclusive ? v > min : v >= min) && v <= max)
        {
            return v;
        }
        string range = $"{(minExclusive ? "(" : "[")}{F(min)}, {F(max)}]";
        problems.Add(why is null ? $"{what} must lie in {range} {unit}".TrimEnd() : $"{what}: {why}");
        return null;
    }

    /// <summary>Reads a 1-based station number typed in a field; on a problem adds it in words.</summary>
    /// <returns>The station index, 0-based, or null.</returns>
    public static int? ReadStation(TextField field, int stationCount, List<string> problems)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(problems);
        if (int.TryParse(field.Text.Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out int s) && s >= 1 && s <= stationCount)
        {
            return s - 1;
        }
        problems.Add($"station must be 1..{stationCount}");
        return null;
    }

    private void ShowPage()
    {
        bool details = ShowingDetails;
        _details.Visible = details;
        _chart.Visible = !details;
        if (details)
        {
            WrapDetails();
            return;
        }
        if (_pages.Count == 0)
        {
            _chart.Show(null);
            return;
        }
        string caption = PageCount > 1 ? $"[{_page + 1}/{PageCount}]" : "";
        _chart.Show(_pages[_page], caption);
    }

    private void WrapDetails()
    {
        int width = _details.Viewport.Width > 0 ? _details.Viewport.Width : 60;
        if (width == _wrappedAt || _detailText is null)
        {
            return;
        }
        _wrappedAt = width;
        _detailLines.Clear();
        _detailLines.Add($"[{PageCount}/{PageCount}] FIGURES (cursor keys scroll)");
        foreach (string line in Wrap.Lines(_detailText, width - 1))
        {
            _detailLines.Add(line);
        }
    }

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
