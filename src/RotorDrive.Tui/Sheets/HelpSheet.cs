using System.Collections.ObjectModel;
using System.Text;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Studies.Ranking;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>Every key, the marks the sheets use, and the safety cautions.</summary>
public sealed class HelpSheet : Sheet
{
    private readonly ListView _lines;
    private readonly Label _position;
    private ObservableCollection<string> _items = [];
    private int _wrappedAt = -1;
    private IReadOnlyList<(string Key, string Name)> _sheetList = [];

    /// <summary>Creates the sheet.</summary>
    public HelpSheet(WorkbenchContext context)
        : base(context, "Help")
    {
        _lines = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(1) };
        _lines.SetSource(_items);
        _position = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Height = 1, Text = "" };
        Add(_lines, _position);
        // The text re-wraps when the terminal is resized, and the line under it says where the view is.
        _lines.FrameChanged += (_, _) =>
        {
            if (_lines.Viewport.Width > 0)
            {
                Fill(_lines.Viewport.Width);
            }
            ShowPosition();
        };
        _lines.ViewportChanged += (_, _) => ShowPosition();
        Fill(60);
    }

    /// <inheritdoc/>
    public override void Refresh() => Fill(_lines.Viewport.Width > 0 ? _lines.Viewport.Width : 60);

    /// <summary>The wrapped lines as listed.</summary>
    internal IReadOnlyList<string> Lines => _items;

    /// <summary>The scroll position line ("lines 1-20 of 96, PageDown for more").</summary>
    internal string PositionText => _position.Text;

    /// <summary>Sets the sheets listed with their keys (the window calls this once it has assigned the keys).</summary>
    public void ListSheets(IReadOnlyList<(string Key, string Name)> sheets)
    {
        _sheetList = sheets ?? [];
        _wrappedAt = -1;
        Fill(_lines.Viewport.Width > 0 ? _lines.Viewport.Width : 60);
    }

    /// <summary>The whole help text: keys, marks and cautions, without the list of sheets.</summary>
    public static string Compose() => Compose([]);

    /// <summary>The whole help text: the sheets with their keys, every other key, the marks and the cautions.</summary>
    public static string Compose(IReadOnlyList<(string Key, string Name)> sheets)
    {
        ArgumentNullException.ThrowIfNull(sheets);
        var sb = new StringBuilder();
        if (sheets.Count > 0)
        {
            sb.AppendLine("SHEETS (press the key when not typing in a field, or Alt+key anywhere)");
            foreach (var (key, name) in sheets)
            {
                sb.AppendLine($"  {(key.Length == 0 ? "-" : key),-17} {name}{(key == "?" ? " (also F1)" : key.Length == 0 ? " (Ctrl+PageDown/Up or the list)" : "")}");
            }
            sb.AppendLine();
        }
        sb.AppendLine("KEYS (mouse optional)");
        foreach (var (keys, does) in KeyMap.All)
        {
            sb.AppendLine($"  {keys,-17} {does}");
        }
        sb.AppendLine();
        sb.AppendLine("MARKS (never colour alone)");
        sb.AppendLine("  !      a value that is not valid, or a limit that fails (also FAIL)");
        sb.AppendLine("  !!     on the result sheets: a limit that is exceeded (its margin is below 0)");
        sb.AppendLine("  *      on the status line: unsaved edits");
        sb.AppendLine("  1↻ 2↺  station 1 clockwise, station 2 counter-clockwise seen from above (F7 on the Stations sheet: 1cw 2ccw)");
        sb.AppendLine("  +      centre of gravity in the station sketch");
        sb.AppendLine("  P      on the Shortlist: in the Pareto set over runtime, mass and current margin");
        sb.AppendLine("  PARTIAL  on the Stress sheet: a run stopped early; its figures cover the samples finished");
        sb.AppendLine();
        sb.AppendLine("WORDS ON THE SHEETS");
        sb.AppendLine("  margin %  how far a figure stays inside its limit, as a share of the limit: (limit - value) / limit for an");
        sb.AppendLine("            upper limit such as a current, (value - limit) / limit for a lower one; 0 % is at the limit,");
        sb.AppendLine("            below 0 % the limit is broken (marked !!). A retaining ring's margin is allowable stress / stress - 1.");
        sb.AppendLine("  score     on the Shortlist: each of runtime, mass (lower is better) and current margin is scaled to 0..1");
        var w = RankWeights.Default;
        sb.AppendLine(FormattableString.Invariant($"            over the combinations that pass (0 the worst, 1 the best), then weighted {w.Runtime} / {w.Mass} / {w.Margin} and"));
        sb.AppendLine("            divided by the sum of the weights, so 1 would be best at all three.");
        sb.AppendLine("  burst check  Core's retaining-ring check of a rotor: passes, FAILS (over its allowable stress or above its");
        sb.AppendLine("            rated speed) or not assessed (the rotor row lacks the retainer's thickness or allowable stress).");
        sb.AppendLine();
        sb.AppendLine("CAUTIONS");
        foreach (var caution in Cautions.All)
        {
            sb.AppendLine($"  {caution.Title}: {caution.Text}");
        }
        return sb.ToString();
    }

    private void Fill(int width)
    {
        if (width == _wrappedAt)
        {
            return;
        }
        _wrappedAt = width;
        _items = new ObservableCollection<string>(Wrap.Lines(Compose(_sheetList), width - 1));
        _lines.SetSource(_items);
        ShowPosition();
    }

    private void ShowPosition()
    {
        int shown = Math.Max(1, _lines.Viewport.Height);
        int first = Math.Clamp(_lines.Viewport.Y, 0, Math.Max(0, _items.Count - 1));
        int last = Math.Min(_items.Count, first + shown);
        string more = last < _items.Count ? ", PageDown for more" : first > 0 ? ", PageUp to go back" : "";
        _position.Text = $"lines {first + 1}-{last} of {_items.Count}{more}";
    }
}
