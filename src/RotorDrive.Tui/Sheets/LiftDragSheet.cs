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
    internal LoadSweepResult? Result { get; private set; }

    /// <summary>The chart.</summary>
    internal ChartView Chart => Panel.Chart;

    /// <summary>The readout line.</summary>
    internal string Readout => Panel.Readout;

    /// <summary>The what-if gap field.</summary>
    internal TextField GapField => _gap;

    /// <inheritdoc/>
    protected override void ClearShown() => Result = null;

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
            (Compute(rig, design, gapM, plateTempC, token, progress), Compute(rig with { LoadModel = Other(rig.LoadModel) }, design, gapM, plateTempC, token, null)), result =>
        {
            Result = result.Item1;
            _comparison = result.Item2;
            Show();
        }, immediately);
    }

    /// <summary>The sweep the sheet shows, as Core computes it (the same table and sweep as <c>rotordrive load</c>).</summary>
    internal static LoadSweepResult Compute(Rig rig, Core.Magnetics.RotorDesign design, double gapM, double plateTempC,
        CancellationToken token, IProgress<double>? progress)
    {
        var rigRange = rig.LoadTableRangeFor(design);
        var range = rigRange with
        {
            MinGapM = Math.Min(rigRange.MinGapM, gapM),
            MaxGapM = Math.Max(rigRange.MaxGapM, gapM * 1.01),
            MinPlateTempC = Math.Min(rigRange.MinPlateTempC, plateTempC),
            MaxPlateTempC = Math.Max(rigRange.MaxPlateTempC, plateTempC),
        };
        progress?.Report(0.1);
        var table = RotorLoadTable.Build(design, rig.Plate, range, rig.LoadOptionsFor(design));
        token.ThrowIfCancellationRequested();
        progress?.Report(0.8);
        double[] speeds = SpeedGrid.ZeroTo(Units.RadPerSToRpm(design.MaxSpeedRadPerS), Points - 1).Select(Units.RpmToRadPerS).ToArray();
        var result = LoadSweep.Run(table, design.Id, true, gapM, plateTempC, rig.AmbientC, speeds, design.MaxSpeedRadPerS);
        progress?.Report(1.0);
        return result;
    }

    private LoadSweepResult? _comparison;

    // The load model the sheet draws for comparison: the other one of 3-D and 2-D.
    private static LoadModelKind Other(LoadModelKind kind)
        => kind == LoadModelKind.ThreeDimensional ? LoadModelKind.TwoDimensional : LoadModelKind.ThreeDimensional;

    private static string Label(LoadModelKind kind) => kind == LoadModelKind.ThreeDimensional ? "3-D" : "2-D";

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
        Panel.Readout = $"{r.RotorId} at {r.GapM * 1000:0.##} mm, plate {r.PlateTempC:0.#} C: drag peak X {peak.SpeedRpm:F0} rpm, {peak.TorqueNm:F2} N m\n"
            + $"lift {top.LiftN:F0} N at {top.SpeedRpm:F0} rpm; share of weight {share:F0} N "
            + (lifting is null ? "! not reached by rated speed" : $"from {lifting.SpeedRpm:F0} rpm");
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
                ? [new ChartLine($"{Label(Other(rig.LoadModel))} model {what}", 'o', c.Rows.Select(x => (x.SpeedRpm, value(x))).ToList())]
                : [];
    }
}
