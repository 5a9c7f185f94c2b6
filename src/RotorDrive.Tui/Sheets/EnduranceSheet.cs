using System.Text;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;
using static RotorDrive.Tui.Text.Figures;

namespace RotorDrive.Tui.Sheets;

/// <summary>How long the rig hovers (Core's <see cref="EnduranceSimulator"/>, as the <c>endurance</c> command runs it):
/// the runtime, the limit that ends it in words, time traces of the state of charge, the pack voltage and every
/// station's winding and plate temperature (mean under its annulus), and beside them the plate's field at the end as a
/// colour heat map with the rotors and the route. The starting charge is the sheet's own what-if value.</summary>
public sealed class EnduranceSheet : ChartSheet
{
    /// <summary>Runs at least this long are charted in minutes, shorter ones in seconds.</summary>
    public const double MinutesFromS = 120;

    private readonly TextField _soc;
    private readonly PlateHeatMapView _heat;
    private bool? _wide;

    /// <summary>Creates the sheet.</summary>
    public EnduranceSheet(WorkbenchContext context)
        : base(context, "Endurance", readoutLines: 4, "the endurance run needs")
    {
        _soc = Panel.AddInput("charge %", 5, "100");
        Panel.Width = Dim.Percent(62);
        _heat = new PlateHeatMapView { X = Pos.Right(Panel), Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
        Add(_heat);
        // Beside the charts only where both fit: on a narrow terminal the charts and the readout take the whole width
        // (the figures page still names the hot spot).
        FrameChanged += (_, _) => FitHeatMap();
    }

    /// <summary>Narrower than this, the sheet leaves the heat map out.</summary>
    public const int HeatMapFromColumns = 90;

    private void FitHeatMap()
    {
        bool wide = Frame.Width >= HeatMapFromColumns;
        if (wide == _wide)
        {
            return;
        }
        _wide = wide;
        _heat.Visible = wide;
        Panel.Width = wide ? Dim.Percent(62) : Dim.Fill();
    }

    /// <summary>The plate heat map beside the charts.</summary>
    internal PlateHeatMapView HeatMap => _heat;

    /// <inheritdoc/>
    public override string KeyHints => "F7 next chart";

    /// <summary>The last figures shown, for tests.</summary>
    internal EnduranceFigures? Shown { get; private set; }

    /// <summary>The starting-charge field.</summary>
    internal TextField ChargeField => _soc;

    /// <summary>The run the sheet shows, as the <c>endurance</c> command runs it.</summary>
    internal static EnduranceFigures Compute(Rig rig, RigModelCache models, double socFraction, CancellationToken token, IProgress<double>? progress)
    {
        if (MountNote.For("endurance", rig) is { } note)
        {
            return new EnduranceFigures(null, null, [], note);
        }
        var missing = RigModel.MissingParts(rig);
        if (missing.Count > 0)
        {
            return new EnduranceFigures(null, null, missing);
        }
        var sim = SimulationRig.FromModel(models.For(rig));
        token.ThrowIfCancellationRequested();
        return new EnduranceFigures(sim, EnduranceStudy.Run(sim, new EnduranceStudyRequest(socFraction), token, progress), []);
    }

    /// <inheritdoc/>
    protected override void ClearShown() => Shown = null;

    /// <inheritdoc/>
    protected override void Recompute(bool immediately)
    {
        if (Context.Session.Rig is not { } rig)
        {
            return;
        }
        var problems = new List<string>();
        double? soc = ChartPanel.ReadNumber(_soc, "charge", "%", 0, 100, minExclusive: true, problems);
        Panel.ShowProblems(problems);
        if (problems.Count > 0)
        {
            return;
        }
        double fraction = soc!.Value / 100.0;
        Panel.Readout = "Running the hover until its first limit ... (F8 stops)";
        Context.Work.Request("endurance", (token, progress) => Compute(rig, Context.Models, fraction, token, progress), Show, immediately, Stopped);
    }

    private void Stopped()
    {
        Shown = null;
        _heat.Show(null, [], []);
        Panel.Readout = "Stopped before it finished: the figures are not current. F5 runs the endurance run again.";
        Panel.ShowPages(null);
    }

    private void Show(EnduranceFigures figures)
    {
        Shown = figures;
        if (figures.Study is not { } study || figures.Rig is not { } sim)
        {
            Panel.Readout = figures.NotForMount ?? "! The endurance run needs a motor and controller on every station and a pack:\n" + string.Join("\n", figures.Missing);
            Panel.ShowPages(null);
            _heat.Show(null, [], []);
            return;
        }
        var (rotors, route) = PlateMarks(sim.Rig, study.Run);
        _heat.Show(study.Run.PlateMap, rotors, route);
        Panel.Readout = DescribeReadout(study);
        Panel.ShowPages(Charts(study), Compose(sim, study));
    }

    /// <summary>Where the rotors are on the plate at the end of the run (axis, inner and outer magnet radius) and the
    /// corners of the route (the start and every move's target), m.</summary>
    internal static ((double XM, double YM, double InnerM, double OuterM)[] Rotors, (double XM, double YM)[] Route) PlateMarks(Rig rig, EnduranceResult r)
    {
        var (cx, cy) = r.CraftPositionTraceM is { Count: > 0 } p ? p[^1] : (0.0, 0.0);
        var rotors = rig.Stations.Select(s => (cx + s.XM, cy + s.YM, s.Rotor.InnerRadiusM, s.Rotor.OuterRadiusM)).ToArray();
        var route = rig.Route is { } path
            ? path.Legs.Where(l => l.Kind == RouteLegKind.Move).Select(l => (l.XM, l.YM)).Prepend((0.0, 0.0)).ToArray()
            : [];
        return (rotors, route);
    }

    /// <summary>The runtime in the unit the charts use: "37 s" or "12.4 min".</summary>
    internal static string Runtime(double seconds)
        => seconds >= MinutesFromS ? $"{F(seconds / 60, 1)} min" : $"{F(seconds, 0)} s ({F(seconds / 60, 1)} min)";

    /// <summary>The lines above the chart: runtime and verdict, the limit that ended the run, the hottest parts.</summary>
    internal static string DescribeReadout(EnduranceStudyResult study)
    {
        var r = study.Run;
        string verdict = study.Passes ? "the pack ends it" : $"{Over} not the pack";
        return $"runtime {Runtime(r.RuntimeS)}; {verdict}\n"
            + $"ended by {r.FirstLimitText}\n"
            + $"{study.HottestWindingText}, plate {F(r.PeakPlateTempC, 1)} C (limit {F(study.PlateLimitC, 0)} C)";
    }

    /// <summary>The chart pages: state of charge, pack voltage, winding and plate temperatures against time.</summary>
    internal static IReadOnlyList<ChartData> Charts(EnduranceStudyResult study)
    {
        var r = study.Run;
        if (r.Trace is not { } t || t.TimeS.Count == 0)
        {
            return [];
        }
        bool minutes = r.RuntimeS >= MinutesFromS;
        string axis = minutes ? "time, min" : "time, s";
        var time = minutes ? t.TimeS.Select(x => x / 60).ToList() : t.TimeS.ToList();
        double t0 = time[0], t1 = time[^1];
        var windings = ChartLine.PerStation("stations", time, t.WindingTempC).ToList();
        if (study.MaxWindingTempC is { } maxWinding)
        {
            windings.Add(ChartLine.Level("winding limit", '=', t0, t1, maxWinding));
        }
        var plates = ChartLine.PerStation("stations", time, t.PlateTempC).ToList();
        plates.Add(ChartLine.Level("plate limit", '=', t0, t1, study.PlateLimitC));
        return
        [
            new ChartData(axis, "state of charge, %", [ChartLine.Trace("charge", '*', time, t.SocFraction, s => s * 100)], YFromZero: false),
            new ChartData(axis, "pack voltage, V",
            [
                ChartLine.Trace("pack", '*', time, t.BusVoltageV),
                ChartLine.Level("cutoff", '-', t0, t1, study.PackCutoffV),
            ], YFromZero: false),
            new ChartData(axis, "winding temperature, C", windings, YFromZero: false),
            new ChartData(axis, "plate temperature, C", plates, YFromZero: false),
        ];
    }

    /// <summary>The figures page: start and end of the hover, the limit, the hottest parts and the cautions.</summary>
    internal static string Compose(SimulationRig sim, EnduranceStudyResult study)
    {
        var r = study.Run;
        var sb = new StringBuilder();
        sb.AppendLine($"ENDURANCE  {SteadyState.Words(sim.Rig)} at {F((sim.Hover.Balanced ? sim.Hover.GapM : sim.Rig.DesignGapM) * 1000, 1)} mm, {F(sim.MassKg, 1)} kg");
        sb.AppendLine($"  runtime {Runtime(r.RuntimeS)}, {r.Steps} steps");
        sb.AppendLine($"  {(study.Passes ? "" : Over + " ")}ended by {r.FirstLimitText}");
        sb.AppendLine(study.Passes
            ? "  RESULT passes: the pack ends the hover (no thermal, current or trim limit first)"
            : $"  RESULT {Over} fails: a limit other than the pack ends the hover");
        sb.AppendLine();
        sb.AppendLine($"AT THE START  pack current {F(r.StartPackCurrentA, 1)} A");
        foreach (var s in r.StartHover.Stations)
        {
            sb.AppendLine($"  station {StationNumbers.Of(s.Index)}: {F(s.SpeedRpm, 0)} rpm, duty {F(s.Duty, 3)}, motor {F(s.MotorCurrentA, 1)} A");
        }
        sb.AppendLine($"AT THE END  charge {F(r.FinalSocFraction * 100, 1)} %, bus {F(r.FinalBusVoltageV, 1)} V, pack current {F(r.FinalPackCurrentA, 1)} A");
        sb.AppendLine($"  {study.HottestWindingText}, hottest point of the plate {F(r.PeakPlateTempC, 1)} C (limit {F(study.PlateLimitC, 0)} C)");
        if (r.PlateHotspot is { } hot)
        {
            sb.AppendLine($"  plate hot spot at the end: x {F(hot.XM * 1000, 0)} mm, y {F(hot.YM * 1000, 0)} mm, {F(hot.TemperatureC, 1)} C");
        }
        sb.AppendLine();
        sb.Append(CautionText.Compose(study.Cautions));
        return sb.ToString();
    }

    /// <summary>What the sheet computed: the prepared rig and the run, or the parts missing before either can be.</summary>
    internal sealed record EnduranceFigures(SimulationRig? Rig, EnduranceStudyResult? Study, IReadOnlyList<string> Missing, string? NotForMount = null)
    {
        /// <summary>The run.</summary>
        public EnduranceResult? Result => Study?.Run;
    }
}
