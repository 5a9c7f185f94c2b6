using System.Globalization;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One station's torque-speed picture from Core: the motor's available torque at several duties over the rotor's
/// load curve, every equilibrium marked stable (O) or unstable (x), and the limits each equilibrium breaks.</summary>
public sealed class RunningPointsSheet : Sheet
{
    /// <summary>The duties drawn, as fractions.</summary>
    public static IReadOnlyList<double> Duties { get; } = [0.25, 0.5, 0.75, 0.95];

    private static readonly char[] CurveGlyphs = ['1', '2', '3', '4'];

    private readonly TextField _station;
    private readonly TextField _gap;
    private readonly TextField _soc;
    private readonly Label _inputs;
    private readonly Label _readout;
    private readonly ChartView _chart;
    private int _seenRevision = -1;
    private bool _quiet;

    /// <summary>Creates the sheet.</summary>
    public RunningPointsSheet(WorkbenchContext context)
        : base(context, "Running points")
    {
        Add(new Label { X = 0, Y = 0, Text = "station" });
        _station = new TextField { X = 8, Y = 0, Width = 4, Text = "1" };
        Add(new Label { X = 13, Y = 0, Text = "gap mm" });
        _gap = new TextField { X = 20, Y = 0, Width = 7, Text = "" };
        Add(new Label { X = 28, Y = 0, Text = "charge %" });
        _soc = new TextField { X = 37, Y = 0, Width = 5, Text = "100" };
        _inputs = new Label { X = 43, Y = 0, Width = Dim.Fill(), Height = 1, Text = "" };
        _readout = new Label { X = 0, Y = 1, Width = Dim.Fill(), Height = 4, Text = "" };
        _chart = new ChartView { X = 0, Y = 5, Width = Dim.Fill(), Height = Dim.Fill() };
        foreach (var f in new[] { _station, _gap, _soc })
        {
            f.TextChanged += (_, _) => Recompute();
        }
        Add(_station, _gap, _soc, _inputs, _readout, _chart);
    }

    /// <summary>The last map shown, for tests.</summary>
    internal TorqueSpeedMap? Map { get; private set; }

    /// <summary>The chart.</summary>
    internal ChartView Chart => _chart;

    /// <summary>The readout text.</summary>
    internal string Readout => _readout.Text;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <inheritdoc/>
    public override void Refresh()
    {
        var rig = Context.Session.Rig;
        if (rig is null)
        {
            _readout.Text = "! The rig has problems (see Stations); running points need a valid rig.";
            _chart.Show(null);
            Map = null;
            return;
        }
        if (_seenRevision != Context.Session.Revision)
        {
            _seenRevision = Context.Session.Revision;
            _quiet = true;
            _gap.Text = FieldSpec.Format(Math.Round(rig.DesignGapM * 1000, 6));
            _quiet = false;
            Recompute();
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F5)
        {
            Recompute(immediately: true);
            return true;
        }
        return false;
    }

    /// <summary>The station's drive as Core models it (load table over the rig's range), or why there is none.</summary>
    internal static StationDrive? DriveFor(Rig rig, int station, out string? why)
    {
        var s = rig.Stations[station];
        why = s.Motor is null || s.Controller is null ? $"station {station + 1} has no motor or controller assigned"
            : rig.Packs is null ? "the rig has no pack assigned" : null;
        if (why is not null)
        {
            return null;
        }
        var table = RotorLoadTable.Build(s.Rotor, rig.Plate, LoadTableRange.ForRig(rig, s.Rotor));
        return new StationDrive(new Drivetrain(s.Motor!, s.Controller!), rig.Packs!, s.Rotor, table, rig.Limits);
    }

    private void Recompute(bool immediately = false)
    {
        if (_quiet || Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        int station = 0;
        if (!int.TryParse(_station.Text.Trim(), NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) || n < 1 || n > rig.Stations.Count)
        {
            problems.Add($"station must be 1..{rig.Stations.Count}");
        }
        else
        {
            station = n - 1;
        }
        if (!FieldSpec.TryParseNumber(_gap.Text, out double? gapMm, out string? whyGap) || gapMm is not { } g || g <= 0 || g > 200)
        {
            problems.Add(whyGap ?? "gap must lie in (0, 200] mm");
        }
        if (!FieldSpec.TryParseNumber(_soc.Text, out double? socPct, out string? whySoc) || socPct is not { } c || c < 0 || c > 100)
        {
            problems.Add(whySoc ?? "charge must lie in 0..100 %");
        }
        if (problems.Count > 0)
        {
            _inputs.Text = "! " + string.Join("; ", problems);
            return;
        }
        _inputs.Text = "";
        double gapM = gapMm!.Value / 1000.0;
        double soc = socPct!.Value / 100.0;
        Context.Work.Request("running points", (token, progress) =>
        {
            var drive = DriveFor(rig, station, out string? why);
            if (drive is null)
            {
                return (Map: (TorqueSpeedMap?)null, Why: why);
            }
            token.ThrowIfCancellationRequested();
            progress.Report(0.3);
            var conditions = OperatingConditions.Uniform(gapM, rig.AmbientC, soc) with { PlateTempC = rig.PlateTemperatureC };
            var map = TorqueSpeedMap.Compute(drive, conditions, Duties);
            progress.Report(1.0);
            return (Map: (TorqueSpeedMap?)map, Why: (string?)null);
        }, result =>
        {
            Map = result.Map;
            Show(result.Why);
        }, immediately);
    }

    private void Show(string? why)
    {
        if (Map is not { } map)
        {
            _readout.Text = "! " + (why ?? "nothing to show");
            _chart.Show(null);
            return;
        }
        var rpm = map.SpeedsRadPerS.Select(Units.RadPerSToRpm).ToList();
        var lines = new List<ChartLine>
        {
            new("load", '*', rpm.Zip(map.LoadTorqueNm, (x, y) => (x, y)).ToList()),
        };
        for (int k = 0; k < map.Curves.Count; k++)
        {
            var curve = map.Curves[k];
            lines.Add(new ChartLine($"{curve.Duty * 100:F0}%", CurveGlyphs[k % CurveGlyphs.Length],
                rpm.Zip(curve.TorqueNm, (x, y) => (x, y)).ToList()));
        }
        var all = map.Curves.SelectMany(c => c.Equilibria).Where(e => e.Kind == EquilibriumKind.Crossing).ToList();
        lines.Add(new ChartLine("stable", 'O', all.Where(e => e.Stable).Select(e => (e.SpeedRpm, e.Load.TotalTorqueNm)).ToList(), Joined: false));
        lines.Add(new ChartLine("unstable", 'x', all.Where(e => !e.Stable).Select(e => (e.SpeedRpm, e.Load.TotalTorqueNm)).ToList(), Joined: false));
        _chart.Show(new ChartData("speed, rpm", "torque, N m", lines));
        _readout.Text = string.Join("\n", map.Curves.Select(Describe));
    }

    /// <summary>One duty's equilibria in words: speed, stable/unstable, and FAIL with the limits broken.</summary>
    internal static string Describe(MotorTorqueCurve curve)
    {
        var points = curve.Equilibria.Where(e => e.Kind == EquilibriumKind.Crossing).ToList();
        if (points.Count == 0)
        {
            return $"duty {curve.Duty:P0}: no running point (stays at rest)";
        }
        return $"duty {curve.Duty:P0}: " + string.Join(", ", points.Select(e =>
        {
            string fail = e.ExceededLimits.Any() ? " FAIL " + string.Join("/", e.ExceededLimits.Select(m => m.Limit.Describe())) : "";
            return $"{e.SpeedRpm:F0} rpm {(e.Stable ? "stable O" : "unstable x")}{fail}";
        }));
    }
}
