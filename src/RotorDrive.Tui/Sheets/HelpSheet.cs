using System.Collections.ObjectModel;
using System.Text;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core.Safety;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>Every key, the marks the sheets use, and the safety cautions.</summary>
public sealed class HelpSheet : Sheet
{
    private readonly ListView _lines;
    private readonly ObservableCollection<string> _items = [];
    private int _wrappedAt = -1;

    /// <summary>Creates the sheet.</summary>
    public HelpSheet(WorkbenchContext context)
        : base(context, "Help")
    {
        _lines = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
        _lines.SetSource(_items);
        Add(_lines);
        Fill(60);
    }

    /// <inheritdoc/>
    public override void Refresh() => Fill(Viewport.Width > 0 ? Viewport.Width : 60);

    /// <summary>The whole help text: keys, marks and cautions.</summary>
    public static string Compose()
    {
        var sb = new StringBuilder();
        sb.AppendLine("KEYS (mouse optional)");
        foreach (var (keys, does) in KeyMap.All)
        {
            sb.AppendLine($"  {keys,-17} {does}");
        }
        sb.AppendLine();
        sb.AppendLine("MARKS (never colour alone)");
        sb.AppendLine("  !      a value that is not valid, or a limit that fails (also FAIL)");
        sb.AppendLine("  *      on the status line: unsaved edits");
        sb.AppendLine("  1↻ 2↺  station 1 clockwise, station 2 counter-clockwise seen from above (F7 on the Stations sheet: 1cw 2ccw)");
        sb.AppendLine("  +      centre of gravity in the station sketch");
        sb.AppendLine("  P      on the Shortlist: in the Pareto set over runtime, mass and current margin");
        sb.AppendLine("  PARTIAL  on the Stress sheet: a run stopped early; its figures cover the samples finished");
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
        _items.Clear();
        foreach (string line in Wrap.Lines(Compose(), width - 1))
        {
            _items.Add(line);
        }
    }
}
