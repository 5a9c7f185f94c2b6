using System.Text;
using Terminal.Gui.Input;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;
using static RotorDrive.Tui.Text.Figures;

namespace RotorDrive.Tui.Sheets;

/// <summary>The spin-up study of the rig (Core's <see cref="SpinupStudy"/>, as the <c>spinup</c> command runs it): the
/// spin-up from rest on the landing gear through the drag peak to the trimmed hover and the two landings, with time
/// traces of every station's speed and current, the pack voltage and the gap; lift-off and hover times, peak currents
/// against their ratings, stalled stations with the current limit that would pass their drag peak, and the landing
/// regeneration caution. Ramp time, controller mode and starting charge are the sheet's own what-if values.</summary>
public sealed class SpinupSheet : ChartSheet
{
    private readonly TextField _ramp;
    private readonly TextField _mode;
    private readonly TextField _soc;

    /// <summary>Creates the sheet.</summary>
    public SpinupSheet(WorkbenchContext context)
        : base(context, "Spin-up", readoutLines: 4, "the spin-up needs")
    {
        _ramp = Panel.AddInput("ramp s", 5, "2");
        _mode = Panel.AddInput("mode", 5, "duty");
        _soc = Panel.AddInput("charge %", 5, "100");
    }

    /// <inheritdoc/>
    public override string KeyHints => "F7 next chart";

    /// <summary>The last figures shown, for tests.</summary>
    internal SpinupFigures? Shown { get; private set; }

    /// <summary>The ramp-time field.</summary>
    internal TextField RampField => _ramp;

    /// <summary>The controller-mode field.</summary>
    internal TextField ModeField => _mode;

    /// <summary>Reads the controller mode typed in the mode field: "duty" (or "d") or "hold" (or "h").</summary>
    internal static ControllerMode? ReadMode(string text, List<string> problems)
    {
        switch (text.Trim().ToLowerInvariant())
        {
            case "duty" or "d":
                return ControllerMode.Duty;
            case "hold" or "h":
                return ControllerMode.SpeedHold;
            default:
                problems.Add("mode must be duty or hold");
                return null;
        }
    }

    /// <summary>The study the sheet shows, run as the <c>spinup</c> command runs it.</summary>
    internal static SpinupFigures Compute(Rig rig, RigModelCache models, SpinupStudyRequest request, CancellationToken token, IProgress<double>? progress)
    {
        if (MountNote.For("spinup", rig) is { } note)
        {
            return new SpinupFigures(null, null, [], note);
        }
        var missing = RigModel.MissingParts(rig);
        if (missing.Count > 0)
        {
            return new SpinupFigures(null, null, missing);
        }
        var sim = SimulationRig.FromModel(models.For(rig));
        progress?.Report(0.25);
        token.ThrowIfCancellationRequested();
        var study = SpinupStudy.Run(sim, request);
        progress?.Report(1.0);
        return new SpinupFigures(sim, study, []);
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
        double? ramp = ChartPanel.ReadNumber(_ramp, "ramp", "s", 0, 120, minExclusive: false, problems);
        var mode = ReadMode(_mode.Text, problems);
        double? soc = ChartPanel.ReadNumber(_soc, "charge", "%", 0, 100, minExclusive: false, problems);
        Panel.ShowProblems(problems);
        if (problems.Count > 0)
        {
            return;
        }
        var request = new SpinupStudyRequest(mode!.Value, ramp!.Value, soc!.Value / 100.0);
        Panel.Readout = "Running the spin-up and the landings ... (F8 stops)";
        Context.Work.Request("spin-up", (token, progress) => Compute(rig, Context.Models, request, token, progress), Show, immediately, Stopped);
    }

    private void Stopped()
    {
        Shown = null;
        Panel.Readout = "Stopped before it finished: the figures are not current. F5 runs the spin-up again.";
        Panel.ShowPages(null);
    }

    private void Show(SpinupFigures figures)
    {
        Shown = figures;
        if (figures.Study is not { } study || figures.Rig is not { } sim)
        {
            Panel.Readout = figures.NotForMount ?? "! The spin-up needs a motor and controller on every station and a pack:\n" + string.Join("\n", figures.Missing);
            Panel.ShowPages(null);
            return;
        }
        Panel.Readout = DescribeReadout(sim, study);
        Panel.ShowPages(Charts(sim, study), Compose(sim, study));
    }

    /// <summary>The four lines above the chart: lift-off and hover times, peak currents, the verdict, the landing.</summary>
    internal static string DescribeReadout(SimulationRig sim, SpinupStudyResult study)
    {
        var spin = study.Spinup;
        double limitS = study.LiftoffLimitS;
        bool bench = sim.Rig.Mount == MountKind.Bench;
        string liftoff = bench ? "on its stands (no lift-off)"
            : spin.LiftoffTimeS is { } lo
                ? (study.LiftoffFails ? Over + " " : "") + $"lift-off {F(lo, 2)} s (limit {F(limitS, 1)} s)"
                : $"{Over} never lifts off";
        string steady = bench ? "steady speeds" : "steady hover";
        string hover = spin.HoverTimeS is { } h ? $", {steady} {F(h, 2)} s" : $", {steady} not reached";
        var worst = study.WorstStation;
        string currents = $"peak motor {F(worst.Motor.PeakA, 1)} A (limit {F(worst.CurrentLimitA, 0)} A); pack {(spin.Pack.Exceeded ? Over : "")}{F(spin.Pack.PeakA, 0)} A, low {(spin.BelowCutoff ? Over : "")}{F(spin.MinBusVoltageV, 1)} V";
        string verdict = study.Passes
            ? bench ? "passes: no stall, currents in allowance" : "passes: lift-off in time, no stall, currents in allowance"
            : $"{Over} fails ({study.Findings.Count}, F7 figures): " + study.Findings[0].Message;
        string landing = study.Cautions.Count > 0
            ? $"caution: landing regen lifts bus to {F(study.Landings.Max(l => l.MaxBusVoltageV), 1)} V (rated {F(study.ControllerMaxVoltageV, 1)} V)"
            : $"landing: bus stays within the controllers' {F(study.ControllerMaxVoltageV, 1)} V";
        return liftoff + hover + "\n" + currents + "\n" + verdict + "\n" + landing;
    }

    /// <summary>The chart pages: speeds, motor currents, pack voltage and gap against time.</summary>
    internal static IReadOnlyList<ChartData> Charts(SimulationRig sim, SpinupStudyResult study)
    {
        var spin = study.Spinup;
        if (spin.Trace is not { } t)
        {
            return [];
        }
        double t0 = t.TimeS[0], t1 = t.TimeS[^1];
        var speeds = ChartLine.PerStation("stations", t.TimeS, t.SpeedRadPerS, Units.RadPerSToRpm).ToList();
        var currents = ChartLine.PerStation("stations", t.TimeS, t.MotorCurrentA).ToList();
        currents.Add(ChartLine.Level("current limit", '=', t0, t1, spin.Stations.Min(s => s.CurrentLimitA)));
        return
        [
            new ChartData("time, s", "speed, rpm", speeds),
            new ChartData("time, s", "motor current, A", currents),
            new ChartData("time, s", "pack voltage, V",
            [
                ChartLine.Trace("pack", '*', t.TimeS, t.BusVoltageV),
                ChartLine.Level("cutoff", '-', t0, t1, spin.CutoffVoltageV),
            ], YFromZero: false),
            new ChartData("time, s", "gap, mm",
            [
                ChartLine.Trace("gap", '*', t.TimeS, t.GapM, g => g * 1000),
                ChartLine.Level("design gap", '-', t0, t1, sim.Rig.DesignGapM * 1000),
            ], YFromZero: false),
        ];
    }

    /// <summary>The figures page: the run, every station's currents against its ratings and its drag peak, the landings,
    /// the findings and the cautions.</summary>
    internal static string Compose(SimulationRig sim, SpinupStudyResult study)
    {
        var spin = study.Spinup;
        var rig = sim.Rig;
        var request = study.Request;
        var sb = new StringBuilder();
        sb.AppendLine($"SPIN-UP  {(request.Mode == ControllerMode.Duty ? "duty" : "speed hold")} mode, ramp {F(request.RampS, 1)} s, pack at {F(study.SocFraction * 100, 0)} %, {F(sim.MassKg, 1)} kg");
        sb.AppendLine(sim.HoverExists
            ? $"  target: {SteadyState.Words(rig)} at {F(sim.HoverSpeedsRadPerS.Min(Units.RadPerSToRpm), 0)}..{F(sim.HoverSpeedsRadPerS.Max(Units.RadPerSToRpm), 0)} rpm, {F(sim.Hover.GapM * 1000, 1)} mm gap"
            : $"  {Over} no {SteadyState.Words(rig)} to aim for");
        sb.AppendLine(rig.Mount == MountKind.Bench
            ? $"  the stands hold the gap: no lift-off; steady speeds {(spin.HoverTimeS is { } hb ? F(hb, 2) + " s" : "not reached")}"
            : $"  lift-off {(spin.LiftoffTimeS is { } lo ? F(lo, 2) + " s" : Over + " never")} (limit {F(study.LiftoffLimitS, 1)} s); steady hover {(spin.HoverTimeS is { } h ? F(h, 2) + " s" : "not reached")}");
        sb.AppendLine($"  pack: peak {(spin.Pack.Exceeded ? Over : "")}{F(spin.Pack.PeakA, 0)} A (continuous {F(spin.Pack.ContinuousA, 0)} A, {F(spin.Pack.TimeAboveContinuousS, 2)} s above; burst {F(spin.Pack.BurstA, 0)} A)");
        sb.AppendLine($"  lowest pack voltage {(spin.BelowCutoff ? Over : "")}{F(spin.MinBusVoltageV, 1)} V (cutoff {F(spin.CutoffVoltageV, 1)} V)");
        sb.AppendLine($"  yaw: peak reaction {F(spin.PeakYawTorqueNm, 2)} N m (gear holds {F(rig.GearYawFrictionNm, 1)} N m), peak rate {F(spin.PeakYawRateRadPerS * 180 / Math.PI, 2)} deg/s");
        sb.AppendLine();
        static string Row(string n, string end, string peak, string limit, string above, string allowance, string passing, string state)
            => $"{n,3} {end,6} {peak,7} {limit,6} {above,6} {allowance,6} {passing,8}  {state}";
        sb.AppendLine("STATIONS  motor current against the controller's limit");
        sb.AppendLine(Row("", "end", "peak", "limit", "above", "burst", "drag pk", ""));
        sb.AppendLine(Row("#", "rpm", "A", "A", "cont s", "allow s", "pass A", ""));
        foreach (var s in spin.Stations)
        {
            string state = s.Stalled ? $"{Over} STALLED" : s.Controller.Exceeded ? $"{Over} over allowance" : "ok";
            sb.AppendLine(Row(StationNumbers.Of(s.Index), F(s.FinalSpeedRpm, 0), F(s.Motor.PeakA, 1), F(s.CurrentLimitA, 0),
                F(s.Controller.TimeAboveContinuousS, 2), F(s.Controller.BurstAllowanceS, 1), F(s.PassingCurrentA, 0), state));
        }
        foreach (var s in spin.Stations.Where(s => s.Stalled))
        {
            sb.AppendLine($"  {Over} station {StationNumbers.Of(s.Index)} stalls below its drag peak: its controller limits the current to {F(s.CurrentLimitA, 0)} A, "
                + $"{F(s.PassingCurrentA, 0)} A just balances the peak; a current limit of {F(s.SuggestedCurrentLimitA, 0)} A would pass it");
        }
        var peaks = spin.Stations.GroupBy(s => (Rpm: F(Units.RadPerSToRpm(s.DragPeakSpeedRadPerS), 0), Nm: F(s.DragPeakTorqueNm, 2)));
        sb.AppendLine("  drag peak at the landed gap: " + string.Join("; ", peaks.Select(g =>
            $"{g.Key.Rpm} rpm, {g.Key.Nm} N m (station{(g.Count() > 1 ? "s" : "")} {string.Join(", ", g.Select(s => StationNumbers.Of(s.Index)))})")));
        sb.AppendLine();
        sb.AppendLine($"LANDING from the hover, throttle cut {(request.StopRampS > 0 ? $"over {F(request.StopRampS, 1)} s" : "at once")}; controllers rated {F(study.ControllerMaxVoltageV, 1)} V");
        foreach (var (l, name) in new[] { (study.LandingBraking, "braking on "), (study.LandingCoasting, "braking off") })
        {
            sb.AppendLine($"  {name}: regenerated {F(l.PeakRegenCurrentA, 1)} A, bus up to {F(l.MaxBusVoltageV, 1)} V{(study.RegenAboveRating(l) ? $" {Over} above the rating" : "")}, "
                + (l.TouchdownTimeS is { } td ? $"touch-down at {F(td, 2)} s" : "no touch-down in the run"));
        }
        sb.AppendLine();
        if (study.Passes)
        {
            sb.AppendLine("RESULT  passes: lift-off in time, no stalled rotor, currents within their burst allowances, pack above its cutoff.");
        }
        else
        {
            sb.AppendLine("RESULT  fails:");
            foreach (var f in study.Findings)
            {
                sb.AppendLine($"  {Over} {f.Message}");
            }
        }
        sb.AppendLine();
        // The burst check at rated speed, worded and judged as on Stations and Hover & yaw (the study's checks).
        sb.AppendLine("RETAINING RING (burst checks)");
        foreach (var check in study.RatedBurstChecks)
        {
            sb.AppendLine("  " + RotorSafetyText.Line(check, "rated"));
        }
        sb.AppendLine();
        sb.Append(CautionText.Compose(study.SafetyCautions, study.Cautions));
        return sb.ToString();
    }

    /// <summary>What the sheet computed: the prepared rig and the study, or the parts missing before either can be.</summary>
    internal sealed record SpinupFigures(SimulationRig? Rig, SpinupStudyResult? Study, IReadOnlyList<string> Missing, string? NotForMount = null);
}
