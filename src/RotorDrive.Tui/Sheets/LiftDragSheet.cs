using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One rotor's load versus speed from Core's load table: shaft torque (eddy, windage, bearing) with the drag
/// peak marked, or lift with each station's share of the weight; gap and plate temperature are the sheet's own
/// what-if values (the rig is not changed).</summary>
public sealed class LiftDragSheet : Sheet
{
    /// <summary>Speeds per curve.</summary>
    public const int Points = 61;

    private readonly TextField _station;
    private readonly TextField _gap;
    private readonly TextField _plateTemp;
    private readonly Label _inputs;
    private readonly Label _readout;
    private readonly ChartView _chart;
    private bool _showLift;
    private int _seenRevision = -1;

    /// <summary>Creates the sheet.</summary>
    public LiftDragSheet(WorkbenchContext context)
        : base(context, "Lift & drag")
    {
        Add(new Label { X = 0, Y = 0, Text = "station" });
        _station = new TextField { X = 8, Y = 0, Width = 4, Text = "1" };
        Add(new Label { X = 13, Y = 0, Text = "gap mm" });
        _gap = new TextField { X = 20, Y = 0, Width = 7, Text = "" };
        Add(new Label { X = 28, Y = 0, Text = "plate C" });
        _plateTemp = new TextField { X = 36, Y = 0, Width = 7, Text = "" };
        _inputs = new Label { X = 44, Y = 0, Width = Dim.Fill(), Height = 1, Text = "" };
        _readout = new Label { X = 0, Y = 1, Width = Dim.Fill(), Height = 2, Text = "" };
        _chart = new ChartView { X = 0, Y = 3, Width = Dim.Fill(), Height = Dim.Fill() };
        foreach (var f in new[] { _station, _gap, _plateTemp })
        {
            f.TextChanged += (_, _) => Recompute();
        }
        Add(_station, _gap, _plateTemp, _inputs, _readout, _chart);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 lift/torque";

    /// <summary>The last result shown, for tests.</summary>
    internal LoadSweepResult? Result { get; private set; }

    /// <summary>The chart.</summary>
    internal ChartView Chart => _chart;

    /// <summary>The readout line.</summary>
    internal string Readout => _readout.Text;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <inheritdoc/>
    public override void Refresh()
    {
        var rig = Context.Session.Rig;
        if (rig is null)
        {
            _readout.Text = "! The rig has problems (see Stations); the load needs a valid rig.";
            _chart.Show(null);
            Result = null;
            return;
        }
        if (_seenRevision != Context.Session.Revision)
        {
            // A changed rig resets the what-if values to the rig's own.
            _seenRevision = Context.Session.Revision;
            SetQuietly(_gap, FieldSpec.Format(Math.Round(rig.DesignGapM * 1000, 6)));
            SetQuietly(_plateTemp, FieldSpec.Format(rig.PlateTemperatureC));
            Recompute();
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F7)
        {
            _showLift = !_showLift;
            Show();
            return true;
        }
        if (key == Key.F5)
        {
            Recompute(immediately: true);
            return true;
        }
        return false;
    }

    private bool _quiet;

    private void SetQuietly(TextField field, string text)
    {
        _quiet = true;
        field.Text = text;
        _quiet = false;
    }

    private void Recompute(bool immediately = false)
    {
        if (_quiet || Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        int station = 0;
        if (!int.TryParse(_station.Text.Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out int s) || s < 1 || s > rig.Stations.Count)
        {
            problems.Add($"station must be 1..{rig.Stations.Count}");
        }
        else
        {
            station = s - 1;
        }
        if (!FieldSpec.TryParseNumber(_gap.Text, out double? gapMm, out string? whyGap) || gapMm is not { } g || g <= 0 || g > 200)
        {
            problems.Add(whyGap ?? "gap must lie in (0, 200] mm");
        }
        if (!FieldSpec.TryParseNumber(_plateTemp.Text, out double? plateC, out string? whyT) || plateC is not { } t || t < -40 || t > 400)
        {
            problems.Add(whyT ?? "plate temperature must lie in [-40, 400] C");
        }
        if (problems.Count > 0)
        {
            _inputs.Text = "! " + string.Join("; ", problems);
            return;
        }
        _inputs.Text = "";
        double gapM = gapMm!.Value / 1000.0;
        double plateTempC = plateC!.Value;
        var design = rig.Stations[station].Rotor;
        Context.Work.Request("load curve", (token, progress) => Compute(rig, design, gapM, plateTempC, token, progress), result =>
        {
            Result = result;
            Show();
        }, immediately);
    }

    /// <summary>The sweep the sheet shows, as Core computes it (the same table and sweep as <c>rotordrive load</c>).</summary>
    internal static LoadSweepResult Compute(Rig rig, Core.Magnetics.RotorDesign design, double gapM, double plateTempC,
        CancellationToken token, IProgress<double>? progress)
    {
        var rigRange = LoadTableRange.ForRig(rig, design);
        var range = rigRange with
        {
            MinGapM = Math.Min(rigRange.MinGapM, gapM),
            MaxGapM = Math.Max(rigRange.MaxGapM, gapM * 1.01),
            MinPlateTempC = Math.Min(rigRange.MinPlateTempC, plateTempC),
            MaxPlateTempC = Math.Max(rigRange.MaxPlateTempC, plateTempC),
        };
        progress?.Report(0.1);
        var table = RotorLoadTable.Build(design, rig.Plate, range);
        token.ThrowIfCancellationRequested();
        progress?.Report(0.8);
        double[] speeds = SpeedGrid.ZeroTo(Units.RadPerSToRpm(design.MaxSpeedRadPerS), Points - 1).Select(Units.RpmToRadPerS).ToArray();
        var result = LoadSweep.Run(table, design.Id, true, gapM, plateTempC, rig.AmbientC, speeds, design.MaxSpeedRadPerS);
        progress?.Report(1.0);
        return result;
    }

    private void Show()
    {
        if (Result is not { } r || Context.Session.Rig is not { } rig)
        {
            return;
        }
        double share = rig.TotalMassKg * Units.StandardGravity / rig.Stations.Count;
        var peak = r.DragPeak;
        var top = r.Rows[^1];
        var lifting = r.Rows.FirstOrDefault(row => row.LiftN >= share);
        _readout.Text = $"{r.RotorId} at {r.GapM * 1000:0.##} mm, plate {r.PlateTempC:0.#} C: drag peak X {peak.SpeedRpm:F0} rpm, {peak.TorqueNm:F2} N m\n"
            + $"lift {top.LiftN:F0} N at {top.SpeedRpm:F0} rpm; share of weight {share:F0} N "
            + (lifting is null ? "! not reached by rated speed" : $"from {lifting.SpeedRpm:F0} rpm");
        var rpm = r.Rows.Select(x => x.SpeedRpm).ToList();
        ChartData data = _showLift
            ? new ChartData("speed, rpm", "lift, N",
            [
                new ChartLine("lift", '*', r.Rows.Select(x => (x.SpeedRpm, x.LiftN)).ToList()),
                new ChartLine("weight share per station", '-', [(rpm[0], share), (rpm[^1], share)]),
            ])
            : new ChartData("speed, rpm", "torque, N m",
            [
                new ChartLine("eddy", '.', r.Rows.Select(x => (x.SpeedRpm, x.EddyTorqueNm)).ToList()),
                new ChartLine("total torque", '*', r.Rows.Select(x => (x.SpeedRpm, x.TotalTorqueNm)).ToList()),
                new ChartLine("drag peak", 'X', [(peak.SpeedRpm, peak.TorqueNm)], Joined: false),
            ]);
        _chart.Show(data);
    }
}
