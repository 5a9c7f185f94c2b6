using System.Collections.ObjectModel;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Sheets;

/// <summary>The station layout: a top-view sketch (number, spin, rotor rim, centre of gravity), each station's
/// position, spin, rotor, motor and controller, and the list of every problem in the rig and its catalogs.</summary>
public sealed class StationsSheet : Sheet
{
    private const int MinSketchRows = 8;
    private const int RowsBelowSketch = 12;
    private readonly Label _sketch;
    private readonly Label _legend;
    private readonly ListView _stations;
    private readonly ObservableCollection<string> _stationItems = [];
    private readonly List<FieldBinding> _fields = [];
    private readonly Label _detail;
    private readonly Label _safety;
    private readonly ListView _problems;
    private readonly ObservableCollection<string> _problemItems = [];
    private int _selected;
    private bool _letters = Environment.GetEnvironmentVariable("ROTORDRIVE_ASCII") == "1";
    private List<SketchStation> _sketchStations = [];
    private (double? X, double? Y) _cg;

    /// <summary>Creates the sheet.</summary>
    public StationsSheet(WorkbenchContext context)
        : base(context, "Stations")
    {
        _sketch = new Label { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(RowsBelowSketch), Text = "" };
        _sketch.FrameChanged += (_, _) => DrawSketch();
        _legend = new Label { X = 0, Y = Pos.Bottom(_sketch), Width = Dim.Fill(), Text = "" };
        _stations = new ListView { X = 0, Y = Pos.Bottom(_sketch) + 1, Width = 14, Height = 6 };
        _stations.SetSource(_stationItems);
        _stations.ValueChanged += (_, _) =>
        {
            if (_stations.Value is { } i && i >= 0 && i != _selected)
            {
                _selected = i;
                Retarget();
                Refresh();
            }
        };
        Add(_sketch, _legend, _stations);
        for (int i = 0; i < 6; i++)
        {
            var spec = RigFields.Station(0)[i];
            var binding = new FieldBinding(this, Pos.Bottom(_sketch) + 1 + i, spec, context, x: 15, labelWidth: 10, unitWidth: 2);
            binding.Field.HasFocusChanged += (_, e) =>
            {
                if (e.NewValue)
                {
                    ShowDetail(binding);
                }
            };
            _fields.Add(binding);
        }
        _detail = new Label { X = 0, Y = Pos.Bottom(_sketch) + 7, Width = Dim.Fill(), Height = 1, Text = "" };
        _safety = new Label { X = 0, Y = Pos.Bottom(_sketch) + 8, Width = Dim.Fill(), Height = 1, Text = "" };
        Add(_safety);
        _problems = new ListView { X = 0, Y = Pos.Bottom(_sketch) + 9, Width = Dim.Fill(), Height = Dim.Fill() };
        _problems.SetSource(_problemItems);
        Add(_detail, _problems);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F4 pick  F7 arrows/letters";

    /// <summary>The station fields (spin, x, y, rotor, motor, controller of the selected station).</summary>
    internal IReadOnlyList<FieldBinding> Fields => _fields;

    /// <summary>The sketch as drawn.</summary>
    internal string SketchText => _sketch.Text;

    /// <summary>Selects a station by index (0-based).</summary>
    internal void SelectStation(int index)
    {
        _selected = index;
        _stations.SetSelection(index, false);
        Retarget();
    }

    /// <inheritdoc/>
    public override void Refresh()
    {
        var session = Context.Session;
        var docStations = session.Document?.Stations ?? [];
        var rig = session.Rig;
        var sketch = new List<SketchStation>();
        for (int i = 0; i < docStations.Count; i++)
        {
            var s = docStations[i];
            bool? cw = s.Spin?.Trim().ToLowerInvariant() switch { "cw" => true, "ccw" => false, _ => null };
            double? radius = rig is not null && i < rig.Stations.Count ? rig.Stations[i].Rotor.OuterRadiusM * 1000 : null;
            if (radius is null && s.Rotor is { } rotorId && session.Catalog?.Rotors.FirstOrDefault(r => r.Id == rotorId) is { } design)
            {
                radius = design.OuterRadiusM * 1000;
            }
            sketch.Add(new SketchStation(i, s.XMm ?? 0, s.YMm ?? 0, cw, radius));
        }
        double? cgx = null, cgy = null;
        if (rig is not null)
        {
            var (x, y) = rig.CentreOfGravity();
            (cgx, cgy) = (x * 1000, y * 1000);
        }
        else if (session.Document?.Craft is { } craft)
        {
            (cgx, cgy) = (craft.CgXMm, craft.CgYMm);
        }
        _sketchStations = sketch;
        _cg = (cgx, cgy);
        DrawSketch();

        var items = sketch.Select(s =>
        {
            string rotor = docStations[s.Index].Rotor ?? "?";
            return $"{StationSketch.Mark(s, _letters),-5}{rotor}";
        }).ToList();
        if (!items.SequenceEqual(_stationItems))
        {
            _stationItems.Clear();
            foreach (var item in items)
            {
                _stationItems.Add(item);
            }
        }
        if (_selected >= docStations.Count)
        {
            _selected = Math.Max(0, docStations.Count - 1);
        }
        foreach (var f in _fields)
        {
            f.Field.Enabled = docStations.Count > 0;
            f.Refresh();
        }
        var problems = session.UntypedFields.Select(u => $"! {u.Key}: {u.Value}")
            .Concat(session.Problems.Select(p => "! " + p.ToString()))
            .DefaultIfEmpty("No problems in the rig or its catalogs.")
            .ToList();
        _problemItems.Clear();
        foreach (var p in problems)
        {
            _problemItems.Add(p);
        }
        if (_fields.FirstOrDefault(f => f.Field.HasFocus) is { } focused)
        {
            ShowDetail(focused);
        }
        _safety.Text = rig is not null && _selected < rig.Stations.Count ? SafetyLine(rig.Stations[_selected].Rotor) : "";
    }

    /// <summary>The rotor's burst check at its rated speed, from Core's <see cref="RotorSafety"/>, marked in text.</summary>
    internal static string SafetyLine(RotorDesign rotor)
    {
        var r = RotorSafety.AtRatedSpeed(rotor);
        string at = $"burst check {rotor.Id} at {Units.RadPerSToRpm(r.SpeedRadPerS):F0} rpm";
        string rim = $"rim {r.RimSpeedMPerS:F0} m/s";
        return r.Assessment switch
        {
            RetainerAssessment.Assessed => (r.MarginFraction!.Value < 0 ? "FAIL " : "ok ") + $"{at}: ring {r.HoopStressPa!.Value / 1e6:F0}/{r.AllowablePa!.Value / 1e6:F0} MPa, "
                + $"margin {r.MarginFraction.Value:P0}, {rim}",
            RetainerAssessment.NoAllowableStress => $"! {at}: ring {r.HoopStressPa!.Value / 1e6:F0} MPa, no allowable in the rotor row, {rim}",
            _ => $"! {at}: ring not assessed (no retainer thickness in the rotor row), {rim}",
        };
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F4 && _fields.FirstOrDefault(f => f.Field.HasFocus) is { } focused)
        {
            Pick.Into(Context, focused);
            return true;
        }
        if (key == Key.F7)
        {
            _letters = !_letters;
            Refresh();
            return true;
        }
        return false;
    }

    private void DrawSketch()
    {
        int width = Math.Max(20, _sketch.Frame.Width > 0 ? _sketch.Frame.Width : 58);
        int rows = Math.Max(MinSketchRows, _sketch.Frame.Height);
        string text = string.Join("\n", StationSketch.Render(_sketchStations, _cg.X, _cg.Y, width, rows, _letters));
        if (_sketch.Text != text)
        {
            _sketch.Text = text;
        }
        _legend.Text = StationSketch.Legend(_letters);
    }

    private void Retarget()
    {
        if (Context.Session.Document?.Stations is not { Count: > 0 } stations || _selected >= stations.Count)
        {
            return;
        }
        var specs = RigFields.Station(_selected);
        for (int i = 0; i < _fields.Count; i++)
        {
            _fields[i].Retarget(specs[i]);
        }
    }

    private void ShowDetail(FieldBinding binding)
        => _detail.Text = binding.CurrentMessage.Length > 0
            ? $"Station {_selected + 1} {binding.Spec.Label}: {binding.CurrentMessage}"
            : $"Station {_selected + 1} {binding.Spec.Label}" + (binding.Spec.Choices is null ? "" : " (F4 picks from the catalog)");
}
