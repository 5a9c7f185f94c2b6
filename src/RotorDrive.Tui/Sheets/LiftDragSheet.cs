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

    private readonly ChartPanel _panel;
    private readonly TextField _station;
    private readonly TextField _gap;
    private readonly TextField _plateTemp;
    private int _seenRevision = -1;

    /// <summary>Creates the sheet.</summary>
    public LiftDragSheet(WorkbenchContext context)
        : base(context, "Lift & drag")
    {
        _panel = new ChartPanel(readoutLines: 2);
        _station = _panel.AddInput("station", 4, "1");
        _gap = _panel.AddInput("gap mm", 7);
        _plateTemp = _panel.AddInput("plate C", 7);
        _panel.InputsChanged += (_, _) => Recompute();
        Add(_panel);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 lift/torque";

    /// <summary>The last result shown, for tests.</summary>
    internal LoadSweepResult? Result { get; private set; }

    /// <summary>The chart.</summary>
    internal ChartView Chart => _panel.Chart;

    /// <summary>The readout line.</summary>
    internal string Readout => _panel.Readout;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <inheritdoc/>
    public override void Refresh()
    {
        var rig = Context.Session.Rig;
        if (rig is null)
        {
            _panel.Readout = "! The rig has problems (see Stations); the load needs a valid rig.";
            _panel.Show(null);
            Result = null;
            return;
        }
        if (_seenRevision != Context.Session.Revision)
        {
            // A changed rig resets the what-if values to the rig's own.
            _seenRevision = Context.Session.Revision;
            _panel.SetQuietly(_gap, FieldSpec.Format(Math.Round(rig.DesignGapM * 1000, 6)));
            _panel.SetQuietly(_plateTemp, FieldSpec.Format(rig.PlateTemperatureC));
            Recompute();
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F7)
        {
            _panel.NextPage();
            return true;
        }
        if (key == Key.F5)
        {
            Recompute(immediately: true);
            return true;
        }
        return false;
    }

    private void Recompute(bool immediately = false)
    {
        if (Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        int? station = ChartPanel.ReadStation(_station, rig.Stations.Count, problems);
        double? gapMm = ChartPanel.ReadNumber(_gap, "gap", "mm", 0, 200, minExclusive: true, problems);
        double? plateC = ChartPanel.ReadNumber(_plateTemp, "plate temperature", "C", -40, 400, minExclusive: false, problems);
        _panel.ShowProblems(problems);
        if (problems.Count > 0)
        {
            return;
        }
        double gapM = gapMm!.Value / 1000.0;
        double plateTempC = plateC!.Value;
        var design = rig.Stations[station!.Value].Rotor;
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
        _panel.Readout = $"{r.RotorId} at {r.GapM * 1000:0.##} mm, plate {r.PlateTempC:0.#} C: drag peak X {peak.SpeedRpm:F0} rpm, {peak.TorqueNm:F2} N m\n"
            + $"lift {top.LiftN:F0} N at {top.SpeedRpm:F0} rpm; share of weight {share:F0} N "
            + (lifting is null ? "! not reached by rated speed" : $"from {lifting.SpeedRpm:F0} rpm");
        var rpm = r.Rows.Select(x => x.SpeedRpm).ToList();
        _panel.ShowPages(
        [
            new ChartData("speed, rpm", "torque, N m",
            [
                new ChartLine("eddy", '.', r.Rows.Select(x => (x.SpeedRpm, x.EddyTorqueNm)).ToList()),
                new ChartLine("total torque", '*', r.Rows.Select(x => (x.SpeedRpm, x.TotalTorqueNm)).ToList()),
                new ChartLine("drag peak", 'X', [(peak.SpeedRpm, peak.TorqueNm)], Joined: false),
            ]),
            new ChartData("speed, rpm", "lift, N",
            [
                new ChartLine("lift", '*', r.Rows.Select(x => (x.SpeedRpm, x.LiftN)).ToList()),
                ChartLine.Level("weight share per station", '-', rpm[0], rpm[^1], share),
            ]),
        ]);
    }
}
