using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Studies;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>One rotor's load versus speed from Core's load table: shaft torque (eddy, windage, bearing) with the drag
/// peak marked, or lift with each station's share of the weight; gap and plate temperature are the sheet's own
/// what-if values (the rig is not changed).</summary>
public sealed class LiftDragSheet : ChartSheet
{
    /// <summary>Speeds per curve.</summary>
    public const int Points = 61;

    private readonly TextField _station;
    private readonly TextField _gap;
    private readonly TextField _plateTemp;

    /// <summary>Creates the sheet.</summary>
    public LiftDragSheet(WorkbenchContext context)
        : base(context, "Lift & drag", readoutLines: 2, "the load needs")
    {
        _station = Panel.AddInput("station", 4, "1");
        _gap = Panel.AddInput("gap mm", 7);
        _plateTemp = Panel.AddInput("plate C", 7);
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 lift/torque";

    /// <summary>The last result shown, for tests.</summary>
    internal LoadStudyResult? Study { get; private set; }

    /// <summary>The sweep shown, for tests.</summary>
    internal LoadSweepResult? Result => Study?.Sweep;

    /// <summary>The chart.</summary>
    internal ChartView Chart => Panel.Chart;

    /// <summary>The readout line.</summary>
    internal string Readout => Panel.Readout;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <inheritdoc/>
    protected override void ClearShown() => Study = null;

    /// <inheritdoc/>
    protected override void OnRigChanged(Rig rig)
    {
        Panel.SetQuietly(_gap, FieldSpec.Format(Math.Round(rig.DesignGapM * 1000, 6)));
        Panel.SetQuietly(_plateTemp, FieldSpec.Format(rig.PlateTemperatureC));
    }

    /// <inheritdoc/>
    protected override void Recompute(bool immediately)
    {
        if (Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        int? station = ChartPanel.ReadStation(_station, rig.Stations.Count, problems);
        double? gapMm = ChartPanel.ReadNumber(_gap, "gap", "mm", 0, 200, minExclusive: true, problems);
        double? plateC = ChartPanel.ReadNumber(_plateTemp, "plate temperature", "C", -40, 400, minExclusive: false, problems);
        Panel.ShowProblems(problems);
        if (problems.Count > 0)
        {
            return;
        }
        double gapM = gapMm!.Value / 1000.0;
        double plateTempC = plateC!.Value;
        var design = rig.Stations[station!.Value].Rotor;
        Context.Work.Request("load curve", (token, progress) =>
            (Compute(rig, design, gapM, plateTempC, null, token, progress), Compute(rig, design, gapM, plateTempC, Other(rig.LoadModel), token, null)), result =>
        {
            Study = result.Item1;
            _comparison = result.Item2;
            Show();
        }, immediately);
    }

    /// <summary>The load the sheet shows, as Core's rotor-load study computes it for <c>rotordrive load</c> (same table and
    /// sweep), in <see cref="Points"/> speeds from rest to the rated speed; <paramref name="model"/> null for the rig's.</summary>
    internal static LoadStudyResult Compute(Rig rig, Core.Magnetics.RotorDesign design, double gapM, double plateTempC, LoadModelKind? model,
        CancellationToken token, IProgress<double>? progress)
        => LoadStudy.Run(rig, new LoadStudyRequest(design, gapM, plateTempC, Steps: Points - 1, Model: model), token, progress);

    private LoadStudyResult? _comparison;

    // The load model the sheet draws for comparison: the other one of 3-D and 2-D.
    private static LoadModelKind Other(LoadModelKind kind)
        => kind == LoadModelKind.ThreeDimensional ? LoadModelKind.TwoDimensional : LoadModelKind.ThreeDimensional;

    private static string Label(LoadModelKind kind) => kind == LoadModelKind.ThreeDimensional ? "3-D" : "2-D";

    private void Show()
    {
        if (Study is not { } study || Context.Session.Rig is not { } rig)
        {
            return;
        }
        var r = study.Sweep;
        double share = study.WeightShareN;
        var peak = r.DragPeak;
        var top = r.Rows[^1];
        Panel.Readout = $"{r.RotorId} at {r.GapM * 1000:0.##} mm, plate {r.PlateTempC:0.#} C: drag peak X {peak.SpeedRpm:F0} rpm, {peak.TorqueNm:F2} N m\n"
            + $"lift {top.LiftN:F0} N at {top.SpeedRpm:F0} rpm; share of weight {share:F0} N "
            + (study.ShareReachedAtRpm is not { } lifting ? "! not reached by rated speed" : $"from {lifting:F0} rpm");
        var rpm = r.Rows.Select(x => x.SpeedRpm).ToList();
        var torqueLines = new List<ChartLine>
        {
            new("eddy", '.', r.Rows.Select(x => (x.SpeedRpm, x.EddyTorqueNm)).ToList()),
            new("total torque", '*', r.Rows.Select(x => (x.SpeedRpm, x.TotalTorqueNm)).ToList()),
            new("drag peak", 'X', [(peak.SpeedRpm, peak.TorqueNm)], Joined: false),
        };
        var liftLines = new List<ChartLine>
        {
            new("lift", '*', r.Rows.Select(x => (x.SpeedRpm, x.LiftN)).ToList()),
            ChartLine.Level("weight share per station", '-', rpm[0], rpm[^1], share),
        };
        // Measured bench points at the shown gap (within a quarter millimetre) over the calibrated curves.
        if (rig.Calibrations.TryGetValue(r.RotorId, out var calibration))
        {
            var measured = calibration.BenchPoints.Where(p => Math.Abs(p.GapM - r.GapM) <= 0.25e-3).ToList();
            if (measured.Count > 0)
            {
                torqueLines.Add(new ChartLine("measured", 'o', measured.Select(p => (Units.RadPerSToRpm(p.SpeedRadPerS), p.TorqueNm)).ToList(), Joined: false));
                var lifts = measured.Where(p => p.LiftN is not null).Select(p => (Units.RadPerSToRpm(p.SpeedRadPerS), p.LiftN!.Value)).ToList();
                if (lifts.Count > 0)
                {
                    liftLines.Add(new ChartLine("measured", 'o', lifts, Joined: false));
                }
            }
            // The note joins the first readout line, so the sheet's layout is the same with or without a calibration.
            int firstLineEnd = Panel.Readout.IndexOf('\n', StringComparison.Ordinal);
            Panel.Readout = Panel.Readout[..firstLineEnd]
                + $"; calibrated {calibration.Source} (cond. x{calibration.Factors.ConductivityFactor:F3}, field x{calibration.Factors.FieldFactor:F3}, {measured.Count} bench pts here)"
                + Panel.Readout[firstLineEnd..];
        }
        Panel.ShowPages(
        [
            new ChartData("speed, rpm", "torque, N m", [.. torqueLines, .. Compare(c => c.EddyTorqueNm, "eddy")]),
            new ChartData("speed, rpm", "lift, N", [.. liftLines, .. Compare(c => c.LiftN, "lift")]),
        ]);

        // The other model's curve, so both can be seen on one chart (load_model decides which one the analyses use).
        ChartLine[] Compare(Func<LoadSweepRow, double> value, string what)
            => _comparison is { } c
                ? [new ChartLine($"{Label(Other(rig.LoadModel))} model {what}", 'o', c.Sweep.Rows.Select(x => (x.SpeedRpm, value(x))).ToList())]
                : [];
    }
}
