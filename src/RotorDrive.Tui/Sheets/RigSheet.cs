using System.Drawing;
using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>The rig's own values: plate, air gaps, craft, packs and limits, each editable, with the whole rig's totals
/// from Core at the top.</summary>
public sealed class RigSheet : Sheet
{
    private readonly List<FieldBinding> _fields = [];
    private readonly Label _totals;
    private readonly Label _pack;
    private readonly Label _problems;
    private readonly int _contentRows;

    /// <summary>Creates the sheet.</summary>
    public RigSheet(WorkbenchContext context)
        : base(context, "Rig")
    {
        _totals = new Label { X = 0, Y = 0, Width = Dim.Fill(), Height = 1, Text = "" };
        _pack = new Label { X = 0, Y = 1, Width = Dim.Fill(), Height = 1, Text = "" };
        _problems = new Label { X = 0, Y = 2, Width = Dim.Fill(), Height = 1, Text = "" };
        Add(_totals, _pack, _problems);
        int y = 4;
        foreach (var (heading, specs) in RigFields.Groups)
        {
            Add(new Label { X = 0, Y = y++, Text = "── " + heading + " ──" });
            foreach (var spec in specs)
            {
                var binding = new FieldBinding(this, y++, spec, context, x: 1);
                binding.Field.HasFocusChanged += (_, e) =>
                {
                    if (e.NewValue)
                    {
                        ScrollIntoView(binding.Field.Frame.Y);
                    }
                    ShowProblemLine();
                };
                _fields.Add(binding);
            }
            y++;
        }
        _contentRows = y;
        SetContentSize(new Size(60, _contentRows));
        FrameChanged += (_, _) =>
        {
            int width = Math.Max(60, Frame.Width - 1);
            if (GetContentSize().Width != width)
            {
                SetContentSize(new Size(width, _contentRows));
            }
        };
        ViewportSettings |= ViewportSettingsFlags.HasVerticalScrollBar;
    }

    /// <inheritdoc/>
    public override string KeyHints => "F4 pick from catalog";

    /// <summary>The editable fields, for tests and the key handler.</summary>
    internal IReadOnlyList<FieldBinding> Fields => _fields;

    /// <inheritdoc/>
    public override void Refresh()
    {
        var session = Context.Session;
        foreach (var f in _fields)
        {
            f.Refresh();
        }
        if (session.Rig is { } rig)
        {
            var (cgx, cgy) = rig.CentreOfGravity();
            int cw = rig.Stations.Count(s => s.Spin == SpinDirection.Clockwise);
            _totals.Text = $"Mass {F(rig.TotalMassKg, 1)} kg, weight {F(rig.WeightN, 0)} N, CG x {F(cgx * 1000, 0)} y {F(cgy * 1000, 0)} mm, "
                + $"{cw} cw + {rig.Stations.Count - cw} ccw";
            _pack.Text = rig.Packs is { } b
                ? $"Bus: {b.Count} x {b.Pack.Id}, {b.CellsSeries}S, {F(b.CapacityAh, 1)} Ah, {F(b.OpenCircuitVoltageAt(1.0), 1)} V full, {F(b.MassKg, 1)} kg"
                : "Bus: no pack assigned";
        }
        else
        {
            _totals.Text = "Totals appear once every value is valid.";
            _pack.Text = "";
        }
        ShowProblemLine();
    }

    // The third line gives the focused field's whole message (the one beside the field may be cut at 80 columns).
    private void ShowProblemLine()
    {
        var session = Context.Session;
        int count = session.Problems.Count + session.UntypedFields.Count;
        if (_fields.FirstOrDefault(f => f.Field.HasFocus && f.CurrentMessage.Length > 0) is { } focused)
        {
            _problems.Text = $"! {focused.Spec.Label}: {focused.CurrentMessage}";
        }
        else
        {
            _problems.Text = count == 0 ? "All values valid." : $"! {count} problem(s): marked beside the fields; all listed on Stations";
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F4)
        {
            var focused = _fields.FirstOrDefault(f => f.Field.HasFocus);
            if (focused is not null)
            {
                Pick.Into(Context, focused);
                return true;
            }
        }
        return false;
    }

    private void ScrollIntoView(int row) => RowScroll.IntoView(this, row, _contentRows);

    private static string F(double v, int decimals) => v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
