using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Studies;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One station's torque-speed picture from Core: the motor's available torque at several duties over the rotor's
/// load curve, every equilibrium marked stable (O) or unstable (x), and the limits each equilibrium breaks.</summary>
public sealed class RunningPointsSheet : ChartSheet
{
    /// <summary>The duties drawn, as fractions.</summary>
    public static IReadOnlyList<double> Duties { get; } = [0.25, 0.5, 0.75, 0.95];

    private static readonly char[] CurveGlyphs = ['1', '2', '3', '4'];

    private readonly TextField _station;
    private readonly TextField _gap;
    private readonly TextField _soc;

    /// <summary>Creates the sheet.</summary>
    public RunningPointsSheet(WorkbenchContext context)
        : base(context, "Running points", readoutLines: 4, "running points need")
    {
        _station = Panel.AddInput("station", 4, "1");
        _gap = Panel.AddInput("gap mm", 7);
        _soc = Panel.AddInput("charge %", 5, "100");
    }

    /// <summary>The last map shown, for tests.</summary>
    internal TorqueSpeedMap? Map { get; private set; }

    /// <summary>The chart.</summary>
    internal ChartView Chart => Panel.Chart;

    /// <summary>The readout text.</summary>
    internal string Readout => Panel.Readout;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <summary>The running points the sheet shows, as Core's operating-point study computes them for the <c>operate</c>
    /// command (same drivetrain, load table and conditions), with the torque lines at <see cref="Duties"/>; or why there
    /// are none.</summary>
    internal static OperateStudyResult? Compute(Rig rig, int station, double gapM, double socFraction, out string? why)
    {
        var s = rig.Stations[station];
        why = s.Motor is null || s.Controller is null ? $"station {station + 1} has no motor or controller assigned"
            : rig.Packs is null ? "the rig has no pack assigned" : null;
        return why is null ? OperateStudy.Run(rig, new OperateStudyRequest(station, GapM: gapM, SocFraction: socFraction, MapDuties: Duties)) : null;
    }

    /// <inheritdoc/>
    protected override void ClearShown() => Map = null;

    /// <inheritdoc/>
    protected override void OnRigChanged(Rig rig)
    {
        Panel.SetQuietly(_gap, FieldSpec.Format(Math.Round(rig.DesignGapM * 1000, 6)));
    }

    /// <inheritdoc/>
    protected override void Recompute(bool immediately)
    {
        if (Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        int? index = ChartPanel.ReadStation(_station, rig.Stations.Count, problems);
        double? gapMm = ChartPanel.ReadNumber(_gap, "gap", "mm", 0, 200, minExclusive: true, problems);
        double? socPct = ChartPanel.ReadNumber(_soc, "charge", "%", 0, 100, minExclusive: false, problems);
        Panel.ShowProblems(problems);
        if (problems.Count > 0)
        {
            return;
        }
        int station = index!.Value;
        double gapM = gapMm!.Value / 1000.0;
        double soc = socPct!.Value / 100.0;
        Context.Work.Request("running points", (token, progress) =>
        {
            token.ThrowIfCancellationRequested();
            var study = Compute(rig, station, gapM, soc, out string? why);
            progress.Report(1.0);
            return (Map: study?.Map, Why: why);
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
            Panel.Readout = "! " + (why ?? "nothing to show");
            Panel.Show(null);
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
        Panel.Show(new ChartData("speed, rpm", "torque, N m", lines));
        Panel.Readout = string.Join("\n", map.Curves.Select(Describe));
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
