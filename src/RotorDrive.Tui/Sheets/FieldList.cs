using System.Drawing;
using Terminal.Gui.ViewBase;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>A column of editable values under a heading that scrolls when it is taller than its frame, keeping the
/// focused field in view.</summary>
internal sealed class FieldList : View
{
    private readonly List<FieldBinding> _fields = [];
    private readonly int _rows;

    public FieldList(WorkbenchContext context, string heading, IReadOnlyList<FieldSpec> specs, int labelWidth, int fieldWidth, int unitWidth)
    {
        CanFocus = true;
        Add(new Terminal.Gui.Views.Label { X = 0, Y = 0, Text = "── " + heading + " ──" });
        int y = 1;
        foreach (var spec in specs)
        {
            var binding = new FieldBinding(this, y++, spec, context, x: 1, labelWidth: labelWidth, unitWidth: unitWidth, fieldWidth: fieldWidth);
            binding.Field.HasFocusChanged += (_, e) =>
            {
                if (e.NewValue)
                {
                    ScrollIntoView(binding.Field.Frame.Y);
                }
                FocusChanged?.Invoke(this, EventArgs.Empty);
            };
            _fields.Add(binding);
        }
        _rows = y;
        SetContentSize(new Size(60, _rows));
        FrameChanged += (_, _) =>
        {
            int width = Math.Max(60, Frame.Width - 1);
            if (GetContentSize().Width != width)
            {
                SetContentSize(new Size(width, _rows));
            }
        };
        ViewportSettings |= ViewportSettingsFlags.HasVerticalScrollBar;
    }

    /// <summary>Raised when a field gains or loses focus.</summary>
    public event EventHandler? FocusChanged;

    public IReadOnlyList<FieldBinding> Fields => _fields;

    /// <summary>The focused field, or null.</summary>
    public FieldBinding? FocusedField => _fields.FirstOrDefault(f => f.Field.HasFocus);

    public void Refresh()
    {
        foreach (var f in _fields)
        {
            f.Refresh();
        }
    }

    private void ScrollIntoView(int row) => RowScroll.IntoView(this, row, _rows);
}
