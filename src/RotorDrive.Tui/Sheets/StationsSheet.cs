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
    private const int RowsBelowSketch = 14;
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
        _safety = new Label { X = 0, Y = Pos.Bottom(_sketch) + 8, Width = Dim.Fill(), Height = 3, Text = "" };
        Add(_safety);
        _problems = new ListView { X = 0, Y = Pos.Bottom(_sketch) + 11, Width = Dim.Fill(), Height = Dim.Fill() };
        _problems.SetSource(_problemItems);
        Add(_detail, _problems);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F4 pick  F7 arrows/letters";

    /// <summary>The station fields (spin, x, y, rotor, motor, controller of the selected station).</summary>
    internal IReadOnlyList<FieldBinding> Fields => _fields;

    /// <summary>The sketch as drawn.</summary>
    internal string SketchText => _sketch.Text;

    /// <summary>The selected station's burst check as shown (wrapped to the sheet's width).</summary>
    internal string SafetyText => _safety.Text;

    /// <summary>The heading of the selected station ("Station 2 of 6").</summary>
    internal string Heading => _sketchStations.Count == 0 ? "No stations" : $"Station {_selected + 1} of {_sketchStations.Count}";

    /// <summary>The line under the sketch: the heading and the legend.</summary>
    internal string LegendText => _legend.Text;

    /// <summary>The problem list as shown.</summary>
    internal IReadOnlyList<string> ProblemLines => _problemItems;

    /// <summary>Selects a station by index (0-based).</summary>
    internal void SelectStation(int index)
    {
        _selected = index;
        _stations.SetSelection(index, false);
        Retarget();
        DrawSketch();
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

        RefreshStationList(sketch, docStations);
        DrawSketch();
        foreach (var f in _fields)
        {
            f.Field.Enabled = docStations.Count > 0;
            f.Refresh();
        }
        RefreshProblems();
        if (_fields.FirstOrDefault(f => f.Field.HasFocus) is { } focused)
        {
            ShowDetail(focused);
        }
        _safety.Text = rig is not null && _selected < rig.Stations.Count
            && session.BurstChecks.FirstOrDefault(b => b.RotorId == rig.Stations[_selected].Rotor.Id) is { } check
            ? string.Join("\n", Wrap.Lines(RotorSafetyText.Line(check, "rated"), Math.Max(20, _safety.Frame.Width > 0 ? _safety.Frame.Width : 60)))
            : "";
    }

    // The list of stations (mark and rotor id), changed in place when its length stays, and the selection kept in range.
    private void RefreshStationList(List<SketchStation> sketch, IReadOnlyList<RotorDrive.Files.Rigs.RigStationSection> docStations)
    {
        var items = sketch.Select(s =>
        {
            string rotor = docStations[s.Index].Rotor ?? "?";
            return $"{StationSketch.Mark(s, _letters),-5}{rotor}";
        }).ToList();
        if (!items.SequenceEqual(_stationItems))
        {
            // Same count: the rows change in place (F7 re-spells the marks), so the list keeps the selected station.
            if (items.Count == _stationItems.Count)
            {
                for (int i = 0; i < items.Count; i++)
                {
                    _stationItems[i] = items[i];
                }
            }
            else
            {
                _stationItems.Clear();
                foreach (var item in items)
                {
                    _stationItems.Add(item);
                }
            }
        }
        if (_selected >= docStations.Count)
        {
            _selected = Math.Max(0, docStations.Count - 1);
        }
        if (docStations.Count > 0 && _stations.Value != _selected)
        {
            _stations.SetSelection(_selected, false);
        }
    }

    private void RefreshProblems()
    {
        var session = Context.Session;
        // One list of what is wrong: typed text, input problems and Core's failed burst checks, so "no problems" never
        // sits beside a failed check.
        var problems = session.UntypedFields.Select(u => $"! {FieldWords.Of(u.Key)}: {u.Value}")
            .Concat(session.Problems.Select(p => "! " + (p.Field.Length == 0 ? p.ToString() : $"{p.File}:{p.Line}:{p.Column}: {FieldWords.Of(p.Field)}: {p.Message}")))
            .Concat(session.FailedBurstChecks.Select(b => RotorSafetyText.Line(b, "rated")))
            .DefaultIfEmpty("No problems in the rig or its catalogs.")
            .ToList();
        _problemItems.Clear();
        foreach (var p in problems)
        {
            _problemItems.Add(p);
        }
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
        int rows = _sketch.Frame.Height > 0 ? Math.Max(5, _sketch.Frame.Height) : MinSketchRows;
        string text = string.Join("\n", StationSketch.Render(_sketchStations, _cg.X, _cg.Y, width, rows, _letters, _selected));
        if (_sketch.Text != text)
        {
            _sketch.Text = text;
        }
        _legend.Text = Heading + "  " + StationSketch.Legend(_letters);
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
