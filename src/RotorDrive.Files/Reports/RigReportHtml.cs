using System.Globalization;
using System.Net;
using System.Text;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Safety;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Studies.Stress;
using RotorDrive.Files.Plots;

namespace RotorDrive.Files.Reports;

/// <summary>Writes a <see cref="RigReport"/> as one self-contained HTML page for a design review: no network
/// references, plots inline as SVG, print CSS with a page break between sections.</summary>
public static class RigReportHtml
{
    /// <summary>The ids of the sections, in the order they appear (the failed limits come first).</summary>
    public static IReadOnlyList<string> SectionIds { get; } =
        ["failed", "rig", "load-model", "hover", "yaw", "spinup", "endurance", "ranking", "stress", "cautions", "trace"];

    /// <summary>How many entries of the ranking the report lists.</summary>
    public const int RankRows = 5;

    private static readonly CultureInfo Ci = CultureInfo.InvariantCulture;

    private const string Style = """
        body { font-family: "DejaVu Sans", Arial, Helvetica, sans-serif; margin: 2em auto; max-width: 62em; color: #111; line-height: 1.4; }
        h1 { font-size: 1.6em; margin-bottom: 0.2em; } h2 { font-size: 1.25em; border-bottom: 1px solid #999; margin-top: 1.6em; }
        table { border-collapse: collapse; margin: 0.6em 0; font-size: 0.9em; } th, td { border: 1px solid #bbb; padding: 0.2em 0.5em; }
        th { background: #eee; text-align: left; } td.n { text-align: right; font-variant-numeric: tabular-nums; }
        .fail { color: #a00; font-weight: bold; } .pass { color: #060; font-weight: bold; }
        .failed li { color: #a00; } .note { color: #444; font-size: 0.9em; }
        figure { margin: 0.8em 0; } figure svg { width: 100%; height: auto; border: 1px solid #ddd; }
        code { font-size: 0.9em; word-break: break-all; }
        @page { size: auto; margin: 15mm; }
        @media print {
          body { margin: 0; max-width: none; font-size: 10pt; }
          section { break-before: page; page-break-before: always; }
          section#failed { break-before: auto; page-break-before: auto; }
          figure, table, tr { break-inside: avoid; page-break-inside: avoid; }
        }
        """;

    /// <summary>The whole page.</summary>
    /// <param name="report">The results and their origin.</param>
    public static string Compose(RigReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var rig = report.Model.Rig;
        var failed = FailedLimits(report);
        var h = new StringBuilder();
        h.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        h.Append("<title>").Append(E($"RotorDrive design review: {rig.Name}")).Append("</title>\n");
        h.Append("<style>\n").Append(Style).Append("</style>\n</head>\n<body>\n");
        h.Append("<header><h1>").Append(E($"Design review: {rig.Name}")).Append("</h1>\n");
        h.Append("<p class=\"note\">").Append(E($"Made by RotorDrive {report.ToolVersion} on {report.Date:yyyy-MM-dd}. ")).Append(
            failed.Count == 0 ? "<span class=\"pass\">Every limit checked holds.</span>" : $"<span class=\"fail\">{failed.Count} failed limit(s), listed first.</span>")
            .Append("</p></header>\n");

        Section(h, "failed", "Failed limits", s =>
        {
            if (failed.Count == 0)
            {
                s.Append("<p class=\"pass\">None: hover, yaw, spin-up, endurance");
                s.Append(report.Stress is null ? "" : " and the stress test").Append(" pass every limit the rig file sets.</p>\n");
                return;
            }
            s.Append("<ul class=\"failed\">\n");
            foreach (var f in failed)
            {
                s.Append("<li>").Append(E(f)).Append("</li>\n");
            }
            s.Append("</ul>\n");
        });
        Section(h, "rig", "The rig and its parts", s => RigSection(s, report));
        Section(h, "load-model", "Load model used", s => LoadModelSection(s, report));
        Section(h, "hover", "Trimmed hover at the design gap", s => HoverSection(s, report));
        Section(h, "yaw", "Yaw balance", s => YawSection(s, report));
        Section(h, "spinup", "Spin-up from rest", s => SpinupSection(s, report));
        Section(h, "endurance", "Endurance", s => EnduranceSection(s, report));
        Section(h, "ranking", "Top of the catalog ranking", s => RankSection(s, report));
        Section(h, "stress", "Tolerance stress test", s => StressSection(s, report));
        Section(h, "cautions", "Cautions", s => CautionSection(s, report));
        Section(h, "trace", "Where these numbers came from", s =>
        {
            s.Append("<p>").Append(E($"RotorDrive {report.ToolVersion}, {report.Date:yyyy-MM-dd}.")).Append("</p>\n");
            s.Append("<p>Command line: <code>").Append(E(report.CommandLine)).Append("</code></p>\n");
            s.Append("<table><tr><th>input file</th><th>SHA-256</th></tr>\n");
            foreach (var input in report.Inputs)
            {
                s.Append("<tr><td><code>").Append(E(input.Path)).Append("</code></td><td><code>")
                    .Append(E(input.Sha256 ?? "could not be read")).Append("</code></td></tr>\n");
            }
            s.Append("</table>\n");
        });
        h.Append("</body>\n</html>\n");
        return h.ToString();
    }

    /// <summary>Every failed limit of every analysis in the report, one sentence each, in section order.</summary>
    /// <param name="report">The report.</param>
    public static IReadOnlyList<string> FailedLimits(RigReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var list = new List<string>();
        if (!report.Hover.Pass)
        {
            list.Add($"Hover: {report.Hover.Hover.Status}.");
            list.AddRange(report.Hover.Findings.Select(f => $"Hover: {f.Message}"));
        }
        if (!report.Yaw.Pass)
        {
            list.Add(report.Yaw.Findings.Count > 0
                ? "Yaw: " + string.Join(" ", report.Yaw.Findings)
                : $"Yaw: residual or trim authority outside the tolerance of {N(report.Yaw.LimitNm, 3)} N m.");
        }
        list.AddRange(report.Spinup.Findings.Select(f => $"Spin-up: {f.Message}"));
        if (!report.Endurance.Passes)
        {
            list.Add($"Endurance: the hover ends by {report.Endurance.Run.FirstLimitText}, not by the pack, after {N(report.Endurance.Run.RuntimeS, 0)} s.");
        }
        if (report.Rank is { } rank && rank.Assigned is { Accepted: false } own)
        {
            list.Add("Ranking: the rig's own drivetrain is rejected: " + string.Join("; ", own.Rejections.Select(r => r.Message)));
        }
        if (report.Stress is { FailureRate: { } rate } stress && !stress.PassesAt(report.StressAcceptPct))
        {
            list.Add($"Stress test: {rate.Count} of {rate.Trials} samples fail a criterion; the 95 % interval reaches {N(rate.UpperFraction * 100, 2)} %, not below the accepted {N(report.StressAcceptPct, 2)} %.");
        }
        return list;
    }

    private static void Section(StringBuilder h, string id, string title, Action<StringBuilder> body)
    {
        h.Append("<section id=\"").Append(id).Append("\">\n<h2>").Append(E(title)).Append("</h2>\n");
        body(h);
        h.Append("</section>\n");
    }

    private static void RigSection(StringBuilder s, RigReport report)
    {
        var model = report.Model;
        var rig = model.Rig;
        s.Append("<table>\n");
        Row(s, "plate", $"{rig.Plate.Material.Id}, {N(rig.Plate.ThicknessM * 1000, 1)} mm, at {N(rig.PlateTemperatureC, 0)} C (ambient {N(rig.AmbientC, 0)} C)");
        Row(s, "air gap", $"design {N(rig.DesignGapM * 1000, 1)} mm, landed {N(rig.LandedGapM * 1000, 1)} mm");
        Row(s, "mass", $"{N(model.MassKg, 2)} kg (payload {N(model.PayloadKg, 2)} kg), weight {N(model.WeightN, 1)} N");
        Row(s, "centre of gravity", $"x {N(model.CgXM * 1000, 0)} mm, y {N(model.CgYM * 1000, 0)} mm");
        Row(s, "packs", $"{model.Packs.Count} x {model.Packs.Pack.Id} ({model.Packs.CellsSeries} cells in series, {N(model.Packs.CapacityAh, 2)} Ah in all, {N(model.Packs.MassKg, 2)} kg)");
        Row(s, "limits", $"plate {N(rig.Limits.PlateTempC, 0)} C, max duty {N(rig.Limits.MaxDuty, 2)}, cell cutoff {N(rig.Limits.CellCutoffV, 2)} V");
        s.Append("</table>\n<table><tr><th>station</th><th>x, mm</th><th>y, mm</th><th>spin</th><th>rotor</th><th>motor</th><th>controller</th></tr>\n");
        for (int i = 0; i < rig.Stations.Count; i++)
        {
            var st = rig.Stations[i];
            s.Append("<tr><td class=\"n\">").Append(i + 1).Append("</td><td class=\"n\">").Append(N(st.XM * 1000, 0)).Append("</td><td class=\"n\">")
                .Append(N(st.YM * 1000, 0)).Append("</td><td>").Append(E(st.Spin.ToString())).Append("</td><td>").Append(E(st.Rotor.Id))
                .Append("</td><td>").Append(E(st.Motor?.Id ?? "none")).Append("</td><td>").Append(E(st.Controller?.Id ?? "none")).Append("</td></tr>\n");
        }
        s.Append("</table>\n");
    }

    private static void LoadModelSection(StringBuilder s, RigReport report)
    {
        var load = report.Model.Options.Load;
        string model = load.Model == LoadModelKind.ThreeDimensional
            ? "3-D ring model: the field of the magnet array's first " + load.Harmonics + " harmonics (Halbach arrays: K. Halbach, 1980) as cylindrical harmonics over a plate "
              + "much wider than the rotor, each the layer problem of the plate (J. R. Reitz, 1970) in the Hankel-transform solution of C. V. Dodd and "
              + "W. E. Deeds (1968); the pitch's growth with radius, the fringing at the magnets' edges and the closure of the eddy currents come out of "
              + "the solution (checked against the axial eddy-current brake of T. Lubin and A. Rezzoug, 2015: peak torque -2 %, its speed -4 %)"
            : "2-D layer model of the plate per radius strip (J. R. Reitz, 1970), the fundamental of the Halbach array (K. Halbach, 1980), "
              + $"integrated over the magnet annulus with {load.RadialPoints}-point Gauss-Legendre quadrature; "
              + (load.EndEffectCorrection ? "with the Russell-Norsworthy finite-width correction (1958)" : "without the finite-width correction")
              + " (the first-generation model, chosen by the rig's load_model)";
        s.Append("<p>").Append(E(model + "; windage of a free disc (Schlichting) and bearing drag from the rotor rows; values from the precomputed load tables every analysis uses."))
            .Append("</p>\n");
        var calibrations = report.Model.Rig.Calibrations;
        string calibration = calibrations.Count == 0
            ? "Calibration: none. This rig's load model is not fitted to bench data, so treat the figures as estimates until a calibration is applied (README, honest limits)."
            : "Calibration: " + string.Join("; ", calibrations.Values.OrderBy(c => c.RotorId, StringComparer.Ordinal).Select(c =>
                $"rotor {c.RotorId} from {c.Source} (conductivity factor {N(c.Factors.ConductivityFactor, 3)}, field factor {N(c.Factors.FieldFactor, 3)})")) + ".";
        s.Append("<p>").Append(E(calibration)).Append("</p>\n");
    }

    private static void HoverSection(StringBuilder s, RigReport report)
    {
        var hover = report.Hover.Hover;
        s.Append("<p>").Append(Verdict(report.Hover.Pass)).Append(E($" Status {hover.Status}; gap {N(hover.GapM * 1000, 2)} mm; mass {N(hover.MassKg, 2)} kg.")).Append("</p>\n");
        if (hover.Stations.Count == 0)
        {
            return;
        }
        s.Append("<table><tr><th>station</th><th>spin</th><th>duty</th><th>speed, rpm</th><th>lift, N</th><th>torque, N m</th><th>motor, A</th><th>bus, A</th><th>into plate, W</th><th>W per N</th><th>stable</th><th>least margin</th></tr>\n");
        foreach (var st in hover.Stations)
        {
            var least = st.Margins.Count > 0 ? st.Margins.MinBy(m => m.MarginFraction) : (LimitMargin?)null;
            s.Append("<tr><td class=\"n\">").Append(st.Index + 1).Append("</td><td>").Append(E(st.Spin.ToString())).Append("</td>");
            Cells(s, N(st.Duty, 3), N(st.SpeedRpm, 0), N(st.LiftN, 1), N(st.ShaftTorqueNm, 2), N(st.MotorCurrentA, 1), N(st.BusCurrentA, 1), N(st.EddyPowerW, 0), N(st.LiftSpecificPowerWPerN, 2));
            s.Append("<td>").Append(st.Stable ? "yes" : "<span class=\"fail\">NO</span>").Append("</td><td>")
                .Append(least is { } m ? E($"{m.Limit.Describe()} {N(m.MarginFraction * 100, 0)} %") : "").Append("</td></tr>\n");
        }
        s.Append("</table>\n<p>").Append(E($"Pack {N(hover.BusVoltageV, 2)} V, {N(hover.PackCurrentA, 1)} A, {N(hover.ElectricalPowerW, 0)} W; into the plate {N(hover.PlatePowerW, 0)} W; "
            + $"lift-specific power {N(hover.LiftSpecificPowerWPerN, 2)} W/N; heave natural frequency {N(hover.HeaveFrequencyHz, 2)} Hz (undamped)."))
            .Append("</p>\n");
    }

    private static void YawSection(StringBuilder s, RigReport report)
    {
        var y = report.Yaw;
        s.Append("<p>").Append(Verdict(y.Pass)).Append("</p>\n<table>\n");
        Row(s, "equal duty", y.EqualDuty is { } d ? N(d, 3) : "none (no equal-duty hover)");
        Row(s, "residual yaw torque at equal duty", y.ResidualTorqueNm is { } r ? $"{N(r, 3)} N m" : "n/a");
        Row(s, "differential duty that cancels it", y.TrimDeltaDuty is { } t ? N(t, 4) : "n/a");
        Row(s, "yaw authority", $"{N(y.AuthorityNm, 3)} N m against a tolerance of {N(y.LimitNm, 3)} N m" + (y.AuthorityLimitedBy is { } by ? $" (limited by {by})" : ""));
        s.Append("</table>\n");
        foreach (var f in y.Findings)
        {
            s.Append("<p class=\"note\">").Append(E(f)).Append("</p>\n");
        }
    }

    private static void SpinupSection(StringBuilder s, RigReport report)
    {
        var study = report.Spinup;
        var spin = study.Spinup;
        s.Append("<p>").Append(Verdict(study.Passes)).Append(E(spin.LiftoffTimeS is { } l
            ? $" Lift-off after {N(l, 2)} s" + (spin.HoverTimeS is { } hv ? $", at the design gap after {N(hv, 2)} s." : ", the design gap is not reached.")
            : " No lift-off.")).Append("</p>\n");
        s.Append("<table><tr><th>station</th><th>peak motor current, A</th><th>controller limit, A</th><th>drag peak, N m at rpm</th><th>stalled</th></tr>\n");
        foreach (var st in spin.Stations)
        {
            s.Append("<tr><td class=\"n\">").Append(st.Index + 1).Append("</td>");
            Cells(s, N(st.Motor.PeakA, 1), N(st.CurrentLimitA, 1), $"{N(st.DragPeakTorqueNm, 2)} at {N(Units.RadPerSToRpm(st.DragPeakSpeedRadPerS), 0)}");
            s.Append("<td>").Append(st.Stalled ? "<span class=\"fail\">YES</span>" : "no").Append("</td></tr>\n");
        }
        s.Append("</table>\n");
        Figure(s, SpinupPlot.Build(spin, report.Model.DesignGapM, report.Model.Rig.Name, report.Date), "Spin-up: speed, current, gap and pack voltage against time.");
    }

    private static void EnduranceSection(StringBuilder s, RigReport report)
    {
        var r = report.Endurance.Run;
        var rig = report.Model.Rig;
        s.Append("<p>").Append(Verdict(report.Endurance.Passes)).Append(E($" Runtime {N(r.RuntimeS, 0)} s ({N(r.RuntimeS / 60, 1)} min), ended by {r.FirstLimitText}; "
            + $"hottest winding {N(r.PeakWindingTempC, 1)} C, hottest plate patch {N(r.PeakPlateTempC, 1)} C (limit {N(report.Endurance.PlateLimitC, 0)} C)."))
            .Append("</p>\n");
        Figure(s, EndurancePlot.Build(r, rig.Limits, report.Simulation.Packs.CellsSeries, report.Endurance.MaxWindingTempC, rig.Name, report.Date),
            "Endurance: charge, pack voltage and temperatures against time.");
    }

    private static void RankSection(StringBuilder s, RigReport report)
    {
        if (report.Rank is not { } rank)
        {
            s.Append("<p>").Append(E(report.RankNote ?? "No ranking.")).Append("</p>\n");
            return;
        }
        s.Append("<p>").Append(E($"{rank.TotalCombinations.ToString("N0", CultureInfo.InvariantCulture)} combinations of motor, controller and pack count evaluated, {rank.AcceptedCount.ToString("N0", CultureInfo.InvariantCulture)} accepted; ranked by {rank.Objective.ToString().ToLowerInvariant()}. The runtime is the pack's alone (the quick estimate); the endurance section gives the hover time with the plate's heating."))
            .Append("</p>\n");
        s.Append("<table><tr><th>rank</th><th>Pareto</th><th>drivetrain</th><th>mass, kg</th><th>pack runtime, min</th><th>hover speed, rpm</th><th>motor current, A</th></tr>\n");
        foreach (var entry in rank.Top.Take(RankRows))
        {
            var f = entry.Evaluation.Figures;
            s.Append("<tr><td class=\"n\">").Append(entry.Rank).Append("</td><td>").Append(entry.InParetoSet ? "P" : "").Append("</td><td>")
                .Append(E(entry.Evaluation.Label)).Append("</td>");
            Cells(s, f is null ? "n/a" : N(f.TotalMassKg, 2), f is null ? "n/a" : N(f.RuntimeS / 60, 1), f is null ? "n/a" : N(f.MaxSpeedRpm, 0), f is null ? "n/a" : N(f.MaxMotorCurrentA, 1));
            s.Append("</tr>\n");
        }
        s.Append("</table>\n");
        if (rank.Assigned is { } own)
        {
            s.Append("<p>").Append(E($"The rig's own drivetrain ({own.Label}): " + (rank.AssignedRank is { } r ? $"rank {r.ToString("N0", CultureInfo.InvariantCulture)} of {rank.AcceptedCount.ToString("N0", CultureInfo.InvariantCulture)}." : "rejected: " + string.Join("; ", own.Rejections.Select(x => x.Message)))))
                .Append("</p>\n");
        }
        if (report.RankEvaluate is { } evaluate)
        {
            Figure(s, RankPlot.Build(rank, evaluate, report.Model.Rig.Name, report.Date), "Ranking: pack runtime against mass, the Pareto set and the rig's own choice.");
        }
    }

    private static void StressSection(StringBuilder s, RigReport report)
    {
        if (report.Stress is not { } stress)
        {
            s.Append("<p class=\"note\">Not run for this report (add <code>--stress N</code> to draw N samples of the part tolerances).</p>\n");
            return;
        }
        var rate = stress.FailureRate;
        bool pass = stress.PassesAt(report.StressAcceptPct);
        s.Append("<p>").Append(Verdict(pass)).Append(E($" {stress.Samples} samples (seed {stress.Seed})" + (stress.Partial ? ", stopped early" : "")
            + (rate is { } fr ? $": {fr.Count} fail at least one criterion, {N(fr.EstimateFraction * 100, 2)} % (95 % interval {N(fr.LowerFraction * 100, 2)} to {N(fr.UpperFraction * 100, 2)} %); accepted below {N(report.StressAcceptPct, 2)} %." : ".")))
            .Append("</p>\n<table><tr><th>criterion</th><th>failed samples</th><th>rate, %</th></tr>\n");
        foreach (var c in stress.Criteria)
        {
            s.Append("<tr><td>").Append(E($"{c.Key}: {c.Description}")).Append("</td>");
            Cells(s, c.Rate.Count.ToString(Ci), N(c.Rate.EstimateFraction * 100, 2));
            s.Append("</tr>\n");
        }
        s.Append("</table>\n");
        Figure(s, StressPlot.Build(stress, report.Model.Rig.Name, report.Date), "Stress test: the samples' margin per criterion; left of the limit line fails.");
    }

    private static void CautionSection(StringBuilder s, RigReport report)
    {
        // The burst caution weighs the same checks as the hover review (at hover and at rated speed), so the report warns
        // where the hover command and the workbench warn.
        var safety = report.Hover.Safety;
        var cautions = Cautions.For(new CautionFindings(true, [.. safety.AtHover, .. safety.AtMaxRpm], report.Endurance.Run.PeakPlateTempC, report.Endurance.Run.PeakWindingTempC,
            PlateAttraction.AtStandstill(report.Model)));
        foreach (var c in cautions)
        {
            s.Append("<p><strong>").Append(E(c.Title)).Append(c.Level == CautionLevel.Warning ? " (warning)" : "").Append(".</strong> ").Append(E(c.Text));
            if (c.Reason is { } reason)
            {
                s.Append(" <em>").Append(E(reason)).Append("</em>");
            }
            s.Append("</p>\n");
        }
        s.Append("<p>").Append(E(report.Hover.Safety.MagnetNote)).Append("</p>\n");
    }

    private static void Figure(StringBuilder s, PlotFigure? figure, string caption)
    {
        if (figure is null)
        {
            s.Append("<p class=\"note\">No trace to draw.</p>\n");
            return;
        }
        string svg = PlotWriter.Svg(figure);
        int start = svg.IndexOf("<svg", StringComparison.Ordinal);
        int height = PlotWriter.HeightOf(figure);
        // Inline in HTML: drop the XML prolog and the namespace declarations (HTML puts <svg> in its namespace), and let the figure scale to the page through its view box.
        svg = svg[start..]
            .Replace(" xmlns=\"http://www.w3.org/2000/svg\"", "", StringComparison.Ordinal)
            .Replace(" xmlns:xlink=\"http://www.w3.org/1999/xlink\"", "", StringComparison.Ordinal);
        svg = svg.Replace($"width=\"{PlotWriter.WidthPx}\" height=\"{height}\"", $"viewBox=\"0 0 {PlotWriter.WidthPx} {height}\" role=\"img\"", StringComparison.Ordinal);
        s.Append("<figure>\n").Append(svg).Append("\n<figcaption class=\"note\">").Append(E(caption)).Append("</figcaption>\n</figure>\n");
    }

    private static void Row(StringBuilder s, string name, string value)
        => s.Append("<tr><th>").Append(E(name)).Append("</th><td>").Append(E(value)).Append("</td></tr>\n");

    private static void Cells(StringBuilder s, params string[] values)
    {
        foreach (var v in values)
        {
            s.Append("<td class=\"n\">").Append(E(v)).Append("</td>");
        }
    }

    private static string Verdict(bool pass) => pass ? "<span class=\"pass\">PASS</span>" : "<span class=\"fail\">FAIL</span>";

    private static string N(double value, int decimals) => double.IsFinite(value) ? value.ToString("F" + decimals.ToString(Ci), Ci) : "n/a";

    private static string E(string text) => WebUtility.HtmlEncode(text);
}
