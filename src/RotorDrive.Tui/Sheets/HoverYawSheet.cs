using System.Collections.ObjectModel;
using System.Globalization;
using System.Text;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Studies;
using RotorDrive.Tui.Session;
using RotorDrive.Tui.Shell;
using RotorDrive.Tui.Text;
using static RotorDrive.Tui.Text.Figures;

namespace RotorDrive.Tui.Sheets;

/// <summary>The whole craft in hover: the trim per station (speed, duty, motor and controller current) with its margin to
/// every limit, the craft's totals (pack current and voltage, power, watts per newton, heave stiffness and frequency,
/// payload capacity), the yaw balance, the retaining-ring check and the safety cautions. Limits that fail carry the
/// text mark <see cref="Text.Figures.Over"/>. Computed off the UI thread after every rig edit, with the same Core calls as the
/// <c>hover</c> and <c>yaw</c> commands.</summary>
public sealed class HoverYawSheet : Sheet
{
    private readonly Label _verdict;
    private readonly ListView _lines;
    private readonly ObservableCollection<string> _items = [];
    private int _seenRevision = -1;
    private int _wrappedAt = -1;

    /// <summary>Creates the sheet.</summary>
    public HoverYawSheet(WorkbenchContext context)
        : base(context, "Hover & yaw")
    {
        _verdict = new Label { X = 0, Y = 0, Width = Dim.Fill(), Height = 2, Text = "" };
        _lines = new ListView { X = 0, Y = 2, Width = Dim.Fill(), Height = Dim.Fill() };
        _lines.SetSource(_items);
        _lines.FrameChanged += (_, _) => Fill();
        Add(_verdict, _lines);
    }

    /// <summary>The last figures shown, for tests.</summary>
    internal HoverYawFigures? Shown { get; private set; }

    /// <summary>The verdict at the top.</summary>
    internal string Verdict => _verdict.Text;

    /// <summary>Every line of the sheet's list (before wrapping to the sheet's width).</summary>
    internal string SheetText { get; private set; } = "";

    /// <inheritdoc/>
    public override void Refresh()
    {
        var rig = Context.Session.Rig;
        if (rig is null)
        {
            Show(null, "! The rig has problems (see Stations); the hover needs a valid rig.");
            return;
        }
        if (_seenRevision != Context.Session.Revision)
        {
            _seenRevision = Context.Session.Revision;
            Recompute(rig, immediately: Arriving);
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F5 && Context.Session.Rig is { } rig)
        {
            Recompute(rig, immediately: true);
            return true;
        }
        return false;
    }

    /// <summary>The figures the sheet shows, as Core computes them for the <c>hover</c> and <c>yaw</c> commands.</summary>
    internal static HoverYawFigures Compute(Rig rig, RigModelCache models, CancellationToken token, IProgress<double>? progress)
    {
        if (MountNote.For("hover", rig) is { } note)
        {
            // A bench has no hover: say so rather than trim a craft that does not exist (the hover command refuses it too).
            return new HoverYawFigures(null, [], note);
        }
        var missing = RigModel.MissingParts(rig);
        if (missing.Count > 0)
        {
            return new HoverYawFigures(null, missing);
        }
        var model = models.For(rig);
        progress?.Report(0.15);
        token.ThrowIfCancellationRequested();
        return new HoverYawFigures(HoverStudy.Run(model, HoverStudyRequest.Complete, token, progress), []);
    }

    private void Recompute(Rig rig, bool immediately = false)
        => Context.Work.Request("hover & yaw", (token, progress) => Compute(rig, Context.Models, token, progress), figures => Show(figures, null), immediately,
            () => Show(null, "Stopped before it finished: the figures are not current. F5 computes the hover again."));

    private void Show(HoverYawFigures? figures, string? problem)
    {
        Shown = figures;
        if (figures is null)
        {
            _verdict.Text = problem ?? "";
            SheetText = "";
        }
        else if (figures.NotForMount is { } note)
        {
            _verdict.Text = note;
            SheetText = CautionText.Compose(Cautions.All);
        }
        else if (figures.Missing.Count > 0)
        {
            _verdict.Text = "! The hover needs a motor and controller on every station and a pack:";
            SheetText = string.Join("\n", figures.Missing.Select(m => "  " + m)) + "\n\n" + CautionText.Compose(Cautions.All);
        }
        else
        {
            _verdict.Text = DescribeVerdict(figures);
            SheetText = Compose(figures);
        }
        _wrappedAt = -1;
        Fill();
    }

    private void Fill()
    {
        int width = _lines.Viewport.Width > 0 ? _lines.Viewport.Width : 60;
        if (width == _wrappedAt)
        {
            return;
        }
        _wrappedAt = width;
        int top = _lines.Viewport.Y;
        _items.Clear();
        foreach (string line in Wrap.Lines(SheetText, width - 1))
        {
            _items.Add(line);
        }
        if (top > 0 && top < _items.Count)
        {
            // Keep the reader's place when the figures are recomputed.
            _lines.Viewport = _lines.Viewport with { Y = top };
        }
    }

    /// <summary>The two-line verdict: whether the craft hovers within every limit, and the yaw result.</summary>
    internal static string DescribeVerdict(HoverYawFigures f)
    {
        var review = f.Review!;
        string hover = review.Pass
            ? $"Hovers within every limit at {F(review.Hover.GapM * 1000, 2)} mm."
            : review.Hover.Balanced
                ? $"{Over} over: {review.Findings.Count} {(review.Findings.Count == 1 ? "limit fails" : "limits fail")} at {F(review.Hover.GapM * 1000, 2)} mm (marked {Over} below)."
                : $"{Over} No hover: {review.Findings.FirstOrDefault()?.Limit.Replace('_', ' ') ?? "no balance"} (see below).";
        string yawText = f.Yaw is not { } yaw
            ? review.Hover.Mode == HoverMode.GuidedSetDuties
                ? "Guided rig: the stations' set duties carry the weight at the gap found; the rails carry pitch, roll and yaw (see RAILS below)."
                : "Guided rig: one common duty carries the weight; the rails carry pitch, roll and yaw (see RAILS below)."
            : yaw.Pass ? "Yaw balanced; the trim covers the tolerance both ways." : $"{Over} Yaw fails (see YAW below).";
        return hover + "\n" + yawText;
    }

    /// <summary>The sheet's text: craft, stations, margins, failing limits, yaw, retaining ring and cautions.</summary>
    internal static string Compose(HoverYawFigures f)
    {
        var review = f.Review!;
        var h = review.Hover;
        var sb = new StringBuilder();
        ComposeCraft(sb, f);
        if (h.Balanced)
        {
            sb.AppendLine();
            ComposeStations(sb, h, review.Findings);
            sb.AppendLine();
            ComposeMargins(sb, h);
        }
        if (review.Findings.Count > 0)
        {
            sb.AppendLine();
            sb.AppendLine("LIMITS THAT FAIL");
            foreach (var finding in review.Findings)
            {
                sb.AppendLine($"  {Over} {finding.Message}");
            }
        }
        sb.AppendLine();
        if (f.Yaw is { } yaw)
        {
            ComposeYaw(sb, yaw);
        }
        else
        {
            sb.AppendLine(review.Hover.Mode == HoverMode.GuidedSetDuties
                ? "RAILS (guided rig: every station at its set duty; the rails carry pitch, roll and yaw, reported, not judged)"
                : "RAILS (guided rig: every station at one common duty; the rails carry pitch, roll and yaw, reported, not judged)");
            sb.AppendLine(f.Study!.Rails is { } rails
                ? $"  pitch moment {F(rails.PitchMomentNm, 3)} N m, roll moment {F(rails.RollMomentNm, 3)} N m, yaw torque {F(rails.YawTorqueNm, 3)} N m"
                : "  no hover state, so no rail loads");
        }
        sb.AppendLine();
        ComposeRetainingRing(sb, review.Safety);
        sb.AppendLine();
        sb.Append(CautionText.Compose(review.Safety.Cautions));
        return sb.ToString();
    }

    // The CRAFT section: mass, weight and gap; at a balanced hover the pack, power and heave figures; the payload
    // capacity when it was asked for.
    private static void ComposeCraft(StringBuilder sb, HoverYawFigures f)
    {
        var model = f.Model!;
        var h = f.Review!.Hover;
        sb.AppendLine($"CRAFT  {F(h.MassKg, 1)} kg (payload {F(model.PayloadKg, 1)} kg), {F(h.WeightN, 1)} N, gap {F(h.GapM * 1000, 2)} mm");
        if (h.Balanced)
        {
            sb.AppendLine($"  pack {F(h.PackCurrentA, 1)} A at {F(h.BusVoltageV, 2)} V: {F(h.ElectricalPowerW, 0)} W electrical, {F(h.LiftSpecificPowerWPerN, 2)} W/N");
            sb.AppendLine($"  into the plate {F(h.PlatePowerW, 0)} W; heave stiffness {F(h.HeaveStiffnessNPerM / 1000, 1)} N/mm, natural frequency {F(h.HeaveFrequencyHz, 2)} Hz");
        }
        if (f.Study!.Request.PayloadCapacity)
        {
            sb.AppendLine(f.PayloadCapacityKg is { } cap
                ? $"  {(f.Study.CarriesPayload == true ? "" : Over + " ")}max payload within every limit {F(cap, 1)} kg (carries {F(model.PayloadKg, 1)})"
                : $"  {Over} max payload: even the empty craft does not hover within every limit");
        }
    }

    // The STATIONS table of a balanced hover: spin, speed, duty, currents, W/N and each station's state.
    private static void ComposeStations(StringBuilder sb, HoverResult h, IReadOnlyList<HoverFinding> findings)
    {
        static string Row(string n, string spin, string rpm, string duty, string motor, string controller, string wpn, string state)
            => $"{n,3}  {spin,-4}{rpm,6}  {duty,6}  {motor,5}  {controller,7}  {wpn,5}  {state}";
        sb.AppendLine("STATIONS");
        sb.AppendLine(Row("", "", "speed", "duty", "motor", "ctrl in", "W/N", "state"));
        sb.AppendLine(Row("#", "spin", "rpm", "", "A", "A", "", ""));
        foreach (var s in h.Stations)
        {
            sb.AppendLine(Row((s.Index + 1).ToString(CultureInfo.InvariantCulture), s.Spin == SpinDirection.Clockwise ? "cw" : "ccw", F(s.SpeedRpm, 0),
                F(s.Duty, 3), F(s.MotorCurrentA, 1), F(s.BusCurrentA, 1), F(s.LiftSpecificPowerWPerN, 2), StationState(s, findings)));
        }
    }

    // The MARGINS TO LIMITS table: one row per drive limit, one column per station, then the pack's margins.
    private static void ComposeMargins(StringBuilder sb, HoverResult h)
    {
        sb.AppendLine("MARGINS TO LIMITS, %");
        sb.AppendLine("  " + OverLegend);
        sb.Append("  limit          ");
        foreach (var s in h.Stations)
        {
            sb.Append($"{"#" + (s.Index + 1),6}");
        }
        sb.AppendLine();
        var limits = h.Stations[0].Margins.Select(m => m.Limit).ToList();
        foreach (var limit in limits)
        {
            sb.Append($"  {ShortName(limit),-15}");
            foreach (var s in h.Stations)
            {
                var m = s.Margins.FirstOrDefault(x => x.Limit == limit);
                sb.Append($"{MarginCell(m),6}");
            }
            sb.AppendLine();
        }
        sb.AppendLine("  pack: " + string.Join(", ", h.PackMargins.Select(m => $"{ShortName(m.Limit)} {(m.Exceeded ? Over : "")}{F(m.MarginFraction * 100, 0)}")));
    }

    // The RETAINING RING section: rim speed and the worst check at hover, each rotor at its rated speed, the magnet note.
    private static void ComposeRetainingRing(StringBuilder sb, HoverSafetyReport safety)
    {
        sb.AppendLine("RETAINING RING (burst checks)");
        if (safety.MaxHoverRimSpeedMPerS is { } rim)
        {
            sb.AppendLine($"  rim speed {F(rim, 1)} m/s at hover");
            sb.AppendLine("  " + RotorSafetyText.Line(safety.WorstAtHover!, "hover"));
        }
        else
        {
            sb.AppendLine("  no hover speed, so no check at hover");
        }
        foreach (var rated in safety.AtMaxRpm)
        {
            sb.AppendLine("  " + RotorSafetyText.Line(rated, "rated"));
        }
        sb.AppendLine("  " + safety.MagnetNote);
    }

    // The YAW section of a free craft: equal-duty residual, trim, authority, sensitivity and the yaw findings.
    private static void ComposeYaw(StringBuilder sb, YawResult yaw)
    {
        sb.AppendLine("YAW   (torque positive counter-clockwise seen from above)");
        sb.AppendLine(yaw.EqualDuty is { } d
            ? $"  equal duty {F(d, 4)} leaves {F(yaw.ResidualTorqueNm, 3)} N m ({F(yaw.YawAccelerationRadPerS2, 3)} rad/s^2); tolerance {F(yaw.LimitNm, 2)} N m"
                + (yaw.ResidualWithinTolerance ? "" : $" {Over} over")
            : $"  {Over} no equal duty carries the weight");
        if (yaw.TrimDeltaDuty is { } delta)
        {
            sb.AppendLine($"  trim: cw minus ccw duty {F(delta, 4)} (cw {F(yaw.ClockwiseDuty, 4)}, ccw {F(yaw.CounterClockwiseDuty, 4)})");
        }
        sb.AppendLine($"  authority {F(yaw.AuthorityNm, 2)} N m (ccw {F(yaw.AuthorityPositiveNm, 2)}, cw {F(yaw.AuthorityNegativeNm, 2)}), margin {Percent(yaw.AuthorityMarginFraction)}"
            + (yaw.AuthorityLimitedBy is { } by ? $", bounded by {by.Replace('_', ' ')}" : "")
            + (yaw.AuthorityCoversTolerance ? "" : $" {Over} below the tolerance"));
        if (yaw.Sensitivity is { } sens)
        {
            sb.AppendLine($"  mismatch, station {sens.StationA + 1} against {sens.StationB + 1}: 1 % Kv {F(sens.KvMismatchNm, 3)} N m, 1 mm gap {F(sens.GapDifferenceNm, 3)} N m, 10 K plate {F(sens.PlateTempDifferenceNm, 3)} N m");
        }
        foreach (string note in yaw.Findings)
        {
            sb.AppendLine($"  {Over} {note}");
        }
    }

    /// <summary>A station's state in the table: "ok" only when Core's review finds nothing at the station, else marked with
    /// what is wrong ("!! unstable, 2 over").</summary>
    internal static string StationState(HoverStation s, IReadOnlyList<HoverFinding> findings)
    {
        // Core's findings for this station are the verdict; the exceeded margins are how many there are.
        int over = Math.Max(s.Margins.Count(m => m.Exceeded), findings.Count(f => f.Station == s.Index));
        var wrong = new List<string>();
        if (!s.Stable)
        {
            wrong.Add("unstable");
        }
        if (over > 0)
        {
            wrong.Add($"{over} over");
        }
        return wrong.Count == 0 ? "ok" : Over + " " + string.Join(", ", wrong);
    }

    private static string ShortName(DriveLimit limit) => limit switch
    {
        DriveLimit.MotorCurrent => "motor current",
        DriveLimit.MotorPower => "motor power",
        DriveLimit.ControllerContinuousCurrent => "ctrl continuous",
        DriveLimit.ControllerBurstCurrent => "ctrl burst",
        DriveLimit.ControllerErpm => "ctrl erpm",
        DriveLimit.RotorMaxSpeed => "rotor speed",
        DriveLimit.DutyHeadroom => "duty headroom",
        DriveLimit.PackContinuousCurrent => "continuous",
        DriveLimit.PackBurstCurrent => "burst",
        DriveLimit.PackCutoffVoltage => "cutoff",
        _ => limit.Describe(),
    };

    /// <summary>What the sheet computed: the model, the reviewed trim, the payload capacity and the yaw balance; or the
    /// parts missing before any of it can be computed.</summary>
    internal sealed record HoverYawFigures(HoverStudyResult? Study, IReadOnlyList<string> Missing, string? NotForMount = null)
    {
        /// <summary>The rig model analysed.</summary>
        public RigModel? Model => Study?.Model;

        /// <summary>The reviewed trim.</summary>
        public HoverReview? Review => Study?.Review;

        /// <summary>The payload capacity, kg.</summary>
        public double? PayloadCapacityKg => Study?.PayloadCapacityKg;

        /// <summary>The yaw balance.</summary>
        public YawResult? Yaw => Study?.Yaw;
    }
}
