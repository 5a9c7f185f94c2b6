using System.CommandLine;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Safety;
using RotorDrive.Files.Rigs;
using RotorDrive.Core.Studies;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive hover RIG.json [--gap-mm G | --common-duty D] [--payload-kg P] [--json]</c>: the trimmed hover
/// of the whole rig (or the gap reached at one common duty), margins to every limit, rotor safety and cautions.</summary>
/// <remarks>Exit 0 when the craft hovers within every limit, 1 when a limit fails or no balance exists (the failing
/// limit is named and, for a trim, the largest payload that does hover), 2 on bad input.</remarks>
public static class HoverCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = CommonOptions.RigArgument();
        var gap = RigKeyOption.Create("--gap-mm", RigSchema.GapDesignMm, "Trim at this air gap", "G");
        var duty = new Option<double?>("--common-duty")
        {
            Description = "Give every station this duty (0..1, no trim) and find the gap where the craft hovers.",
            HelpName = "D",
        };
        duty.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<double?>() is { } d && !(d > 0 && d <= 1))
            {
                r.AddError($"--common-duty must lie in (0, 1]; got {d.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        var payload = RigKeyOption.Create("--payload-kg", RigSchema.CraftPayloadKg, "Payload", "P");
        var json = CommonOptions.Json();
        var command = new Command("hover", "Trimmed hover of the whole rig: duties, speeds, lift, currents, margins, heave, rotor safety.");
        command.Arguments.Add(rig);
        command.Options.Add(gap);
        command.Options.Add(duty);
        command.Options.Add(payload);
        command.Options.Add(json);
        command.Validators.Add(r =>
        {
            if (r.GetResult(gap) is { Implicit: false } && r.GetResult(duty) is { Implicit: false })
            {
                r.AddError("--gap-mm and --common-duty cannot be used together: a common duty sets the gap.");
            }
        });
        command.SetAction(parse => Run(
            parse.GetValue(rig)!, parse.GetValue(gap), parse.GetValue(duty), parse.GetValue(payload), parse.GetValue(json),
            parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, double? gapMm, double? commonDuty, double? payloadKg, bool json, TextWriter output, TextWriter error)
    {
        var model = CraftInput.ModelOrReport("hover", rigPath, error);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        var study = HoverStudy.Run(model, new HoverStudyRequest(gapMm / 1000, commonDuty, payloadKg));
        var report = ToReport(study);
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, output);
        }
        return study.HoverPasses ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static HoverReport ToReport(HoverStudyResult study)
    {
        var model = study.Model;
        var review = study.Review;
        var h = review.Hover;
        var safety = review.Safety;
        var stations = h.Stations.Select(s => new StationEntry(
            s.Index + 1, model.Rig.Stations[s.Index].Name, s.Spin == SpinDirection.Clockwise ? "cw" : "ccw", s.Duty, s.SpeedRpm, s.LiftN, s.ShaftTorqueNm, s.ReactionTorqueNm,
            s.MotorCurrentA, s.BusCurrentA, s.EddyPowerW, s.ElectricalPowerW, s.LiftSpecificPowerWPerN, JsonNames.Of(s.Regime), s.Stable,
            s.Margins.Select(Margin).ToList())).ToList();
        var hoverRotors = safety.AtHover;
        var worst = safety.WorstAtHover;
        var worstMax = safety.WorstAtMaxRpm;
        var safetyEntry = new SafetyEntry(
            safety.MaxHoverRimSpeedMPerS,
            worst?.HoopStressPa / 1e6, worst?.RingOwnStressPa / 1e6, worst?.MagnetLoadStressPa / 1e6, worst?.AllowablePa / 1e6, worst?.MarginFraction,
            new MaxRpmEntry(
                worstMax is null ? double.NaN : Units.RadPerSToRpm(worstMax.SpeedRadPerS),
                safety.MaxRatedRimSpeedMPerS ?? double.NaN,
                worstMax?.HoopStressPa / 1e6, worstMax?.RingOwnStressPa / 1e6, worstMax?.MarginFraction),
            hoverRotors.Select(r => JsonNames.Of(r.Assessment)).Distinct().ToList(),
            safety.MagnetNote,
            BurstChecks(safety));
        var limits = review.Findings.Select(f => new LimitEntry(f.Limit, f.Station + 1, f.Message)).ToList();
        bool pass = review.Pass;
        return new HoverReport(
            model.Rig.Name, ModeKey(h.Mode), JsonNames.Of(h.Status), pass,
            h.GapM * 1000, h.MassKg, model.PayloadKg, h.WeightN, h.BusVoltageV, h.PackCurrentA, h.ElectricalPowerW, h.PlatePowerW,
            h.Balanced ? h.LiftSpecificPowerWPerN : double.NaN, h.HeaveStiffnessNPerM / 1000, h.Balanced ? h.HeaveFrequencyHz : double.NaN,
            new ResidualEntry(h.ForceResidualRatio, h.PitchResidualRatio, h.RollResidualRatio), h.YawTorqueNm,
            stations, h.PackMargins.Select(Margin).ToList(), limits, review.MaxPayloadKg, safetyEntry,
            safety.Cautions.Select(c => new CautionEntry(JsonNames.Of(c.Topic), JsonNames.Of(c.Level), c.Title, c.Text, c.Reason)).ToList(),
            h.Iterations, study.FailedCriteria, study.LimitingConstraint,
            study.Rails is { } rails ? new RailEntry(rails.PitchMomentNm, rails.RollMomentNm, rails.YawTorqueNm) : null);
    }

    private static string ModeKey(HoverMode mode) => mode switch
    {
        HoverMode.Trimmed => "trimmed",
        HoverMode.CommonDuty => "common_duty",
        HoverMode.GuidedSetDuties => "guided_set_duties",
        _ => "guided",
    };

    // The burst checks in Core's one wording (the workbench's Hover & yaw sheet prints the same lines): the rotor closest
    // to failing at hover, then each rotor design at its rated speed.
    private static IReadOnlyList<string> BurstChecks(HoverSafetyReport safety)
    {
        var lines = new List<string>();
        if (safety.WorstAtHover is { } worst)
        {
            lines.Add(RotorSafetyText.Line(worst, "hover"));
        }
        lines.AddRange(safety.AtMaxRpm.Select(r => RotorSafetyText.Line(r, "rated")));
        return lines;
    }

    private static MarginEntry Margin(LimitMargin m)
        => new(m.Limit.Key(), m.ValueSi, m.AllowedSi, m.Limit.Unit(), m.MarginFraction, m.Exceeded);

    private static void WriteText(HoverReport r, TextWriter o)
    {
        string title = r.Mode switch
        {
            "trimmed" => "Trimmed hover",
            "guided" => "Guided hover at one common duty (the rails carry pitch, roll and yaw)",
            "guided_set_duties" => "Guided hover at the stations' set duties, gap found (the rails carry pitch, roll and yaw)",
            _ => "Hover at one common duty",
        };
        o.WriteLine($"{title}: {r.Rig}");
        o.WriteLine($"  mass {Numbers.Format(r.MassKg, 1)} kg (payload {Numbers.Format(r.PayloadKg, 1)} kg), weight {Numbers.Format(r.WeightN, 1)} N, gap {Numbers.Format(r.GapMm, 2)} mm");
        if (r.Stations.Count == 0)
        {
            o.WriteLine($"  No hover state exists here ({r.Status}); the findings below say what was found.");
        }
        else
        {
            o.WriteLine();
            var table = new TextTable(
                new TableColumn("station", Alignment.Right), new TableColumn("spin", Alignment.Left), new TableColumn("duty", Alignment.Right),
                new TableColumn("speed_rpm", Alignment.Right), new TableColumn("lift_n", Alignment.Right), new TableColumn("torque_nm", Alignment.Right),
                new TableColumn("motor_a", Alignment.Right), new TableColumn("bus_a", Alignment.Right), new TableColumn("eddy_w", Alignment.Right),
                new TableColumn("w_per_n", Alignment.Right), new TableColumn("stable", Alignment.Left), new TableColumn("least_margin", Alignment.Left));
            foreach (var s in r.Stations)
            {
                var least = s.Margins.OrderBy(m => m.Margin).First();
                table.AddRow(StationText.Cell(s.Station, s.Name), s.Spin, Numbers.Format(s.Duty, 3), Numbers.Format(s.SpeedRpm, 0),
                    Numbers.Format(s.LiftN, 1), Numbers.Format(s.ShaftTorqueNm, 2), Numbers.Format(s.MotorCurrentA, 1), Numbers.Format(s.BusCurrentA, 1),
                    Numbers.Format(s.EddyPowerW, 0), Numbers.Format(s.LiftSpecificPowerWPerN, 2), s.Stable ? "yes" : "NO",
                    $"{least.Limit} {Numbers.Format(least.Margin * 100, 0)} %");
            }
            table.Write(o, 2);
            o.WriteLine();
            o.WriteLine($"  pack {Numbers.Format(r.PackVoltageV, 2)} V, {Numbers.Format(r.PackCurrentA, 1)} A, {Numbers.Format(r.ElectricalPowerW, 0)} W; into the plate {Numbers.Format(r.PlatePowerW, 0)} W");
            o.WriteLine($"  lift-specific power {Numbers.Format(r.LiftSpecificPowerWPerN, 2)} W/N; heave stiffness {Numbers.Format(r.HeaveStiffnessNPerMm, 1)} N/mm, natural frequency {Numbers.Format(r.HeaveFrequencyHz, 2)} Hz (undamped)");
            o.WriteLine($"  residuals: force {r.Residuals.Force:0.0e+0}, pitch {r.Residuals.Pitch:0.0e+0}, roll {r.Residuals.Roll:0.0e+0} (relative); net yaw {Numbers.Format(r.YawTorqueNm, 3)} N m");
            if (r.Rails is { } rails)
            {
                o.WriteLine($"  the rails carry: pitch moment {Numbers.Format(rails.PitchMomentNm, 3)} N m, roll moment {Numbers.Format(rails.RollMomentNm, 3)} N m, yaw torque {Numbers.Format(rails.YawTorqueNm, 3)} N m (reported, not judged)");
            }
            foreach (var m in r.PackMargins)
            {
                o.WriteLine($"  {m.Limit.Replace('_', ' ')}: {Numbers.Format(m.Value, 2)} of {Numbers.Format(m.Allowed, 2)} {m.Unit} (margin {Numbers.Format(m.Margin * 100, 0)} %)");
            }
        }
        o.WriteLine();
        o.WriteLine("Rotor safety (retaining ring):");
        foreach (string line in r.Safety.Checks)
        {
            o.WriteLine("  " + line);
        }
        o.WriteLine("  " + r.Safety.Note);
        o.WriteLine();
        if (r.Limits.Count == 0)
        {
            o.WriteLine("Result: PASS, every limit holds.");
        }
        else
        {
            o.WriteLine("Result: FAIL");
            foreach (var l in r.Limits)
            {
                o.WriteLine($"  [{l.Limit}] {l.Message}");
            }
            if (r.Mode == "trimmed")
            {
                o.WriteLine(r.MaxPayloadKg is { } mp
                    ? $"  Largest payload that hovers within every limit: {Numbers.Format(mp, 2)} kg."
                    : "  Even without payload the craft does not hover within every limit.");
            }
        }
        o.WriteLine();
        foreach (var c in r.Cautions)
        {
            o.WriteLine($"{(c.Level == nameof(CautionLevel.Warning) ? "WARNING" : "Caution")}: {c.Title}. {c.Text}{(c.Reason is null ? "" : " (" + c.Reason + ")")}");
        }
    }

    private sealed record HoverReport(
        string Rig, string Mode, string Status, bool Pass, double GapMm, double MassKg, double PayloadKg, double WeightN,
        double PackVoltageV, double PackCurrentA, double ElectricalPowerW, double PlatePowerW, double LiftSpecificPowerWPerN,
        double HeaveStiffnessNPerMm, double HeaveFrequencyHz, ResidualEntry Residuals, double YawTorqueNm,
        IReadOnlyList<StationEntry> Stations, IReadOnlyList<MarginEntry> PackMargins, IReadOnlyList<LimitEntry> Limits,
        double? MaxPayloadKg, SafetyEntry Safety, IReadOnlyList<CautionEntry> Cautions, int Iterations,
        IReadOnlyList<string> FailedCriteria, string? LimitingConstraint, RailEntry? Rails);

    private sealed record RailEntry(double PitchMomentNm, double RollMomentNm, double YawTorqueNm);

    private sealed record ResidualEntry(double Force, double Pitch, double Roll);

    private sealed record StationEntry(
        int Station, string? Name, string Spin, double Duty, double SpeedRpm, double LiftN, double ShaftTorqueNm, double ReactionTorqueNm,
        double MotorCurrentA, double BusCurrentA, double EddyPowerW, double ElectricalPowerW, double LiftSpecificPowerWPerN,
        string Regime, bool Stable, IReadOnlyList<MarginEntry> Margins);

    private sealed record MarginEntry(string Limit, double Value, double Allowed, string Unit, double Margin, bool Exceeded);

    private sealed record LimitEntry(string Limit, int? Station, string Message);

    private sealed record SafetyEntry(
        double? RimSpeedMPerS, double? RetainerStressMpa, double? RingOwnStressMpa, double? MagnetLoadStressMpa, double? AllowableMpa,
        double? RetainerMargin, MaxRpmEntry AtMaxRpm, IReadOnlyList<string> Assessment, string Note, IReadOnlyList<string> Checks);

    private sealed record MaxRpmEntry(double SpeedRpm, double RimSpeedMPerS, double? RetainerStressMpa, double? RingOwnStressMpa, double? RetainerMargin);

    private sealed record CautionEntry(string Topic, string Level, string Title, string Text, string? Reason);
}
