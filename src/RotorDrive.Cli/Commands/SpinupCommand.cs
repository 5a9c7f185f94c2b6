using System.CommandLine;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Files;
using RotorDrive.Files.Plots;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive spinup RIG.json [--ramp-s T] [--mode duty|hold] [--soc-pct S] [--gap-mm G] [--duty D] [--csv FILE]
/// [--force] [--json]</c>: the spin-up from rest through the drag peak to the rig's steady state (a free craft's trimmed
/// hover, a guided sled's hover, a bench's stations at their duties on their stands), then the landing (stop) profile
/// with braking on and off.</summary>
/// <remarks>The simulation, findings and cautions are <see cref="SpinupStudy.Run"/> (shared with the terminal UI); this
/// command parses, prints and writes the CSV. Exit 1 when the study finds a failed limit (no lift-off within the rig's
/// lift-off time limit, a stalled rotor, a current above its burst allowance, the pack below its cutoff); a landing that
/// pushes the bus above the controllers' rated voltage draws a caution.</remarks>
public static class SpinupCommand
{
    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var ramp = new Option<double>("--ramp-s")
        {
            Description = "Throttle ramp time from 0 to the hover throttle, s (0 to 120).",
            HelpName = "T",
            DefaultValueFactory = _ => 2.0,
        };
        ramp.Validators.Add(r =>
        {
            double v = r.GetValueOrDefault<double>();
            if (!(v >= 0 && v <= 120))
            {
                r.AddError($"--ramp-s must lie in [0, 120] s; got {v.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        var mode = new Option<string>("--mode")
        {
            Description = "Controller mode: duty (open-loop PWM duty) or hold (speed hold at the hover speed).",
            HelpName = "duty|hold",
            DefaultValueFactory = _ => "duty",
        };
        mode.AcceptOnlyFromAmong("duty", "hold");
        var soc = new Option<double>("--soc-pct")
        {
            Description = "Pack state of charge at the start, % (0 to 100).",
            HelpName = "S",
            DefaultValueFactory = _ => 100.0,
        };
        soc.Validators.Add(r =>
        {
            double v = r.GetValueOrDefault<double>();
            if (!(v >= 0 && v <= 100))
            {
                r.AddError($"--soc-pct must lie in [0, 100]; got {v.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        var gap = RigKeyOption.Create("--gap-mm", RigSchema.GapDesignMm, "Bench rig only: the stands' air gap", "G");
        var duty = RigKeyOption.Create("--duty", RigSchema.StationDuty, "Bench rig only: every station's duty", "D");
        var csv = CommonOptions.Csv("the spin-up time traces");
        var force = CommonOptions.Force();
        var json = CommonOptions.Json();
        var plot = CommonOptions.Plot("speed, current, gap and bus voltage against time");
        var command = new Command("spinup", "Spin-up from the landing gear through the drag peak to hover, and the landing with braking on and off.");
        command.Arguments.Add(rig);
        command.Options.Add(ramp);
        command.Options.Add(mode);
        command.Options.Add(soc);
        command.Options.Add(gap);
        command.Options.Add(duty);
        command.Options.Add(csv);
        command.Options.Add(force);
        command.Options.Add(json);
        command.Options.Add(plot);
        command.SetAction(parse => Run(
            parse.GetValue(rig)!,
            parse.GetValue(ramp),
            parse.GetValue(mode) == "hold" ? ControllerMode.SpeedHold : ControllerMode.Duty,
            parse.GetValue(soc) / 100.0,
            parse.GetValue(gap),
            parse.GetValue(duty),
            parse.GetValue(csv),
            parse.GetValue(force),
            parse.GetValue(json),
            new PlotRequest(parse.GetValue(plot), CommonOptions.Today(clock)),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, double rampS, ControllerMode mode, double soc, double? gapMm, double? duty, string? csvPath, bool force, bool json, PlotRequest plot, TextWriter output, TextWriter error)
    {
        if (CommonOptions.RefusesExistingCsv("spinup", csvPath, force, error) || CommonOptions.RefusesPlot("spinup", plot.Path, force, error))
        {
            return ExitCodes.BadInput;
        }
        var model = CraftInput.ModelOrReport("spinup", rigPath, error, gapMm, duty);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        Rig rig = model.Rig;
        var sim = SimulationRig.FromModel(model);

        var study = SpinupStudy.Run(sim, new SpinupStudyRequest(mode, rampS, soc));
        var spin = study.Spinup;
        var report = ToReport(sim, study);

        if (csvPath is not null && spin.Trace is { } trace)
        {
            var problem = AtomicFile.WriteAllText(csvPath, TraceCsv.Format(trace), force);
            if (problem is not null)
            {
                ProblemReport.Print([problem], error);
                return ExitCodes.BadInput;
            }
        }
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, rig, output);
        }
        if (plot.Path is { } plotPath && !CommonOptions.WritePlot("spinup", SpinupPlot.Build(spin, rig.DesignGapM, rig.Name, plot.Today), plotPath, force, error))
        {
            return ExitCodes.BadInput;
        }
        return study.Passes ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static SpinupReport ToReport(SimulationRig sim, SpinupStudyResult study)
    {
        var rig = sim.Rig;
        var spin = study.Spinup;
        double controllerMaxV = study.ControllerMaxVoltageV;
        var stations = spin.Stations.Select(s => new StationEntry(
            s.Index + 1,
            rig.Stations[s.Index].Name,
            rig.Stations[s.Index].Spin == SpinDirection.Clockwise ? "cw" : "ccw",
            s.FinalSpeedRpm,
            s.Motor.PeakA,
            s.Motor.ContinuousA,
            s.Motor.TimeAboveContinuousS,
            s.Controller.ContinuousA,
            s.Controller.BurstA ?? 0,
            s.Controller.TimeAboveContinuousS,
            s.Controller.BurstAllowanceS ?? 0,
            s.CurrentLimitA,
            Units.RadPerSToRpm(s.DragPeakSpeedRadPerS),
            s.DragPeakTorqueNm,
            s.Stalled,
            s.PassingCurrentA,
            s.SuggestedCurrentLimitA,
            s.PeakWindingTempC,
            s.PeakPlateTempC)).ToList();
        var landingEntries = study.Landings.Select((l, i) => new LandingEntry(
            i == 0,
            l.PeakRegenCurrentA,
            l.MaxBusVoltageV,
            controllerMaxV,
            l.TouchdownTimeS,
            l.TouchdownSpeedMPerS,
            l.MaxFinalSpeedRpm)).ToList();
        return new SpinupReport(
            rig.Name,
            JsonNames.Of(rig.Mount),
            study.Request.Mode == ControllerMode.Duty ? "duty" : "hold",
            study.Request.RampS,
            study.SocFraction * 100,
            spin.EndTimeS,
            sim.HoverExists,
            sim.HoverSpeedsRadPerS.Select(Units.RadPerSToRpm).ToArray(),
            study.Request.Mode == ControllerMode.Duty ? study.TargetsSi : null,
            (sim.HoverExists ? sim.Hover.GapM : rig.DesignGapM) * 1000,
            sim.MassKg,
            spin.LiftoffTimeS,
            study.LiftoffLimitS,
            spin.HoverTimeS,
            spin.StalledStations.Select(i => i + 1).ToList(),
            spin.PeakMotorCurrentA,
            spin.Pack.PeakA,
            spin.Pack.ContinuousA,
            spin.Pack.BurstA ?? 0,
            spin.Pack.TimeAboveContinuousS,
            spin.MinBusVoltageV,
            spin.CutoffVoltageV,
            spin.PeakYawTorqueNm,
            rig.GearYawFrictionNm,
            spin.PeakYawRateRadPerS * 180 / Math.PI,
            spin.FinalYawAngleRad * 180 / Math.PI,
            stations,
            landingEntries,
            study.Passes,
            study.Findings.Select(f => f.Message).ToArray(),
            study.Cautions);
    }

    private static void WriteText(SpinupReport r, Rig rig, TextWriter o)
    {
        o.WriteLine($"Spin-up: {r.Rig}, {r.Mode} mode, ramp {Numbers.Format(r.RampS, 1)} s, pack at {Numbers.Format(r.SocPct, 0)} %, {Numbers.Format(r.MassKg, 1)} kg");
        string speeds = $"{string.Join(" / ", r.HoverSpeedsRpm.Select(v => Numbers.Format(v, 0)))} rpm (stations 1..{r.HoverSpeedsRpm.Count})";
        string duties = r.TargetDuties is { } d ? $", duties {string.Join(" / ", d.Select(v => Numbers.Format(v, 3)))}" : "";
        string gap = Numbers.Format(r.TargetGapMm, 1);
        o.WriteLine(r.Mount switch
        {
            "bench" => $"  target: each station at its duty on its stand, {speeds}{duties} at the stands' {gap} mm gap{(r.HoverExists ? "" : " (no steady state: full-throttle speeds)")}",
            "guided" => r.HoverExists
                ? $"  target: the guided hover, {speeds}{duties} at {gap} mm (the rails carry pitch, roll and yaw)"
                : $"  target: no guided hover exists; full-throttle speeds {speeds} (the rails carry pitch, roll and yaw)",
            _ => $"  hover target: {(r.HoverExists ? "trimmed speeds" : "no trim exists; full-throttle speeds")} {speeds} at the {gap} mm design gap",
        });
        if (r.Mount == "bench")
        {
            o.WriteLine($"  the stands hold the gap: no lift-off; steady speeds: {(r.TimeToHoverS is { } h ? Numbers.Format(h, 2) + " s" : "not reached")}");
        }
        else
        {
            o.WriteLine($"  lift-off: {(r.TimeToLiftoffS is { } lo ? Numbers.Format(lo, 2) + " s" : "never")} (limit {Numbers.Format(r.LiftoffLimitS, 1)} s); steady hover: {(r.TimeToHoverS is { } h ? Numbers.Format(h, 2) + " s" : "not reached")}");
        }
        o.WriteLine($"  pack: peak {Numbers.Format(r.PeakPackCurrentA, 0)} A (continuous {Numbers.Format(r.PackContinuousA, 0)} A for "
            + $"{Numbers.Format(r.PackTimeAboveContinuousS, 2)} s above, burst {Numbers.Format(r.PackBurstA, 0)} A); lowest voltage {Numbers.Format(r.MinPackVoltageV, 1)} V (cutoff {Numbers.Format(r.CutoffVoltageV, 1)} V)");
        o.WriteLine(r.Mount == "free"
            ? $"  yaw: peak reaction {Numbers.Format(r.PeakYawTorqueNm, 2)} N m (gear holds {Numbers.Format(r.GearYawFrictionNm, 1)} N m), peak rate {Numbers.Format(r.PeakYawRateDegPerS, 2)} deg/s, final angle {Numbers.Format(r.FinalYawAngleDeg, 2)} deg"
            : $"  yaw: peak reaction {Numbers.Format(r.PeakYawTorqueNm, 2)} N m, carried by the {(r.Mount == "bench" ? "stands" : "rails")} (the rig does not turn)");
        o.WriteLine();
        var table = new TextTable(
            new TableColumn("station", Alignment.Right), new TableColumn("spin", Alignment.Left), new TableColumn("speed_rpm", Alignment.Right),
            new TableColumn("peak_current_a", Alignment.Right), new TableColumn("limit_a", Alignment.Right),
            new TableColumn("above_cont_s", Alignment.Right), new TableColumn("burst_s", Alignment.Right),
            new TableColumn("drag_peak_rpm", Alignment.Right), new TableColumn("drag_peak_nm", Alignment.Right),
            new TableColumn("drag_peak_passing_a", Alignment.Right), new TableColumn("stalled", Alignment.Left));
        foreach (var s in r.Stations)
        {
            table.AddRow(StationText.Cell(s.Station, s.Name), s.Spin, Numbers.Format(s.FinalSpeedRpm, 0), Numbers.Format(s.PeakMotorCurrentA, 1),
                Numbers.Format(s.CurrentLimitA, 0), Numbers.Format(s.ControllerTimeAboveContinuousS, 2), Numbers.Format(s.ControllerBurstAllowanceS, 1),
                Numbers.Format(s.DragPeakSpeedRpm, 0), Numbers.Format(s.DragPeakTorqueNm, 2), Numbers.Format(s.PassingCurrentA, 0), s.Stalled ? "STALLED" : "no");
        }
        table.Write(o, 2);
        o.WriteLine();
        foreach (var l in r.Landing)
        {
            o.WriteLine($"  {(r.Mount == "bench" ? "stop" : "landing")}, braking {(l.Braking ? "on " : "off")}: regenerated current {Numbers.Format(l.PeakRegenCurrentA, 1)} A, bus up to {Numbers.Format(l.MaxBusVoltageV, 1)} V "
                + $"(controllers rated {Numbers.Format(l.ControllerMaxVoltageV, 1)} V), touch-down {(l.TouchdownS is { } td ? Numbers.Format(td, 2) + " s at " + Numbers.Format(l.TouchdownSpeedMPerS, 3) + " m/s" : "none")}");
        }
        o.WriteLine();
        if (r.Findings.Count == 0)
        {
            o.WriteLine(r.Mount == "bench"
                ? "Result: passes (no stalled rotor, currents within burst allowances, pack above cutoff)."
                : "Result: passes (lift-off in time, no stalled rotor, currents within burst allowances, pack above cutoff).");
        }
        else
        {
            o.WriteLine("Result: FAILS");
            foreach (var f in r.Findings)
            {
                o.WriteLine($"  - {f}");
            }
        }
        foreach (var c in r.Cautions)
        {
            o.WriteLine($"Caution: {c}.");
        }
        o.WriteLine("Caution: spinning magnet rotors crush fingers, upset pacemakers and can burst; lithium packs can burn. Estimates only: defer to manufacturers' ratings.");
    }

    private sealed record SpinupReport(
        string Rig,
        string Mount,
        string Mode,
        double RampS,
        double SocPct,
        double DurationS,
        bool HoverExists,
        IReadOnlyList<double> HoverSpeedsRpm,
        IReadOnlyList<double>? TargetDuties,
        double TargetGapMm,
        double MassKg,
        double? TimeToLiftoffS,
        double LiftoffLimitS,
        double? TimeToHoverS,
        IReadOnlyList<int> StalledStations,
        double PeakMotorCurrentA,
        double PeakPackCurrentA,
        double PackContinuousA,
        double PackBurstA,
        double PackTimeAboveContinuousS,
        double MinPackVoltageV,
        double CutoffVoltageV,
        double PeakYawTorqueNm,
        double GearYawFrictionNm,
        double PeakYawRateDegPerS,
        double FinalYawAngleDeg,
        IReadOnlyList<StationEntry> Stations,
        IReadOnlyList<LandingEntry> Landing,
        bool Pass,
        IReadOnlyList<string> Findings,
        IReadOnlyList<string> Cautions);

    private sealed record StationEntry(
        int Station,
        string? Name,
        string Spin,
        double FinalSpeedRpm,
        double PeakMotorCurrentA,
        double MotorContinuousA,
        double MotorTimeAboveContinuousS,
        double ControllerContinuousA,
        double ControllerBurstA,
        double ControllerTimeAboveContinuousS,
        double ControllerBurstAllowanceS,
        double CurrentLimitA,
        double DragPeakSpeedRpm,
        double DragPeakTorqueNm,
        bool Stalled,
        double PassingCurrentA,
        double SuggestedCurrentLimitA,
        double PeakWindingTempC,
        double PeakPlateTempC);

    private sealed record LandingEntry(
        bool Braking,
        double PeakRegenCurrentA,
        double MaxBusVoltageV,
        double ControllerMaxVoltageV,
        double? TouchdownS,
        double? TouchdownSpeedMPerS,
        double FinalMaxSpeedRpm);
}
