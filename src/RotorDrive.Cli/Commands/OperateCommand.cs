using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Studies;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Plots;
using RotorDrive.Files;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive operate RIG.json [--station N] [--motor ID --controller ID --pack ID] [--duty D | --hold-rpm R]
/// [--gap-mm G] [--soc-pct S] [--sweep] [--json]</c>: every equilibrium of one rotor on its drivetrain, with stability and
/// the margin to each limit; with <c>--sweep</c> the point reached from rest over duty 0..1.</summary>
public static class OperateCommand
{
    private const int SweepSteps = 21;
    private static readonly CultureInfo Ci = CultureInfo.InvariantCulture;

    /// <summary>Builds the subcommand.</summary>
    /// <param name="clock">The clock for the date on plots; the system clock when null.</param>
    public static Command Create(TimeProvider? clock = null)
    {
        var rig = CommonOptions.RigArgument();
        var json = CommonOptions.Json();
        var station = StationOption.Create("The station");
        var motor = new Option<string?>("--motor") { Description = "Motor id from the motors catalog, instead of the station's.", HelpName = "ID" };
        var controller = new Option<string?>("--controller") { Description = "Controller id from the controllers catalog, instead of the station's.", HelpName = "ID" };
        var pack = new Option<string?>("--pack") { Description = "Pack id from the packs catalog, instead of the rig's (same pack count).", HelpName = "ID" };
        var duty = new Option<double?>("--duty") { Description = "Open-loop duty, 0 to 1. Default: the station's duty (stations[].duty) or else the rig's limits.max_duty (the highest duty it allows), unless --hold-rpm is given.", HelpName = "D" };
        var hold = new Option<double?>("--hold-rpm") { Description = "Speed to hold, rpm (> 0): the controller sets the duty within its limits.", HelpName = "R" };
        var gap = RigKeyOption.Create("--gap-mm", RigSchema.GapDesignMm, "Air gap", "G");
        var soc = new Option<double>("--soc-pct")
        {
            Description = "Pack state of charge, % (0 to 100).",
            HelpName = "S",
            DefaultValueFactory = _ => 100,
        };
        var plot = CommonOptions.Plot("the motor torque lines over the load curve with every equilibrium");
        var force = CommonOptions.Force();
        var sweep = new Option<bool>("--sweep") { Description = "Table of the point reached from rest at 21 duties from 0 to the rig's limits.max_duty." };

        duty.Validators.Add(r => Check(r, r.GetValueOrDefault<double?>() is not { } d || (d >= 0 && d <= 1), $"--duty must lie in [0, 1]; got {Show(r.GetValueOrDefault<double?>())}."));
        hold.Validators.Add(r => Check(r, r.GetValueOrDefault<double?>() is not { } h || (double.IsFinite(h) && h > 0), $"--hold-rpm must be a number greater than 0; got {Show(r.GetValueOrDefault<double?>())}."));
        soc.Validators.Add(r => Check(r, r.GetValueOrDefault<double>() is >= 0 and <= 100, $"--soc-pct must lie in [0, 100] %; got {Show(r.GetValueOrDefault<double>())}."));

        var command = new Command("operate", "Find every steady operating point of one rotor on its motor, controller and pack, with stability and limit margins.");
        command.Arguments.Add(rig);
        foreach (var option in new Option[] { station, motor, controller, pack, duty, hold, gap, soc, sweep, json, plot, force })
        {
            command.Options.Add(option);
        }
        command.Validators.Add(r =>
        {
            bool hasDuty = r.GetResult(duty) is { Implicit: false };
            bool hasHold = r.GetResult(hold) is { Implicit: false };
            if (hasDuty && hasHold)
            {
                r.AddError("--duty and --hold-rpm cannot be used together: give one throttle");
            }
            if (hasHold && r.GetValue(sweep))
            {
                r.AddError("--sweep runs over duty; it cannot be combined with --hold-rpm");
            }
        });
        command.SetAction(parse => Run(
            new OperateRequest(
                parse.GetValue(rig)!,
                parse.GetValue(station),
                parse.GetValue(motor),
                parse.GetValue(controller),
                parse.GetValue(pack),
                parse.GetValue(duty),
                parse.GetValue(hold),
                parse.GetValue(gap),
                parse.GetValue(soc),
                parse.GetValue(sweep),
                parse.GetValue(json),
                parse.GetValue(plot),
                parse.GetValue(force),
                CommonOptions.Today(clock)),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>What the user asked for.</summary>
    public sealed record OperateRequest(
        string RigPath,
        string? Station,
        string? MotorId,
        string? ControllerId,
        string? PackId,
        double? Duty,
        double? HoldRpm,
        double? GapMm,
        double SocPct,
        bool Sweep,
        bool Json,
        string? PlotPath = null,
        bool Force = false,
        DateOnly Today = default);

    /// <summary>Runs the analysis; returns 0 when every limit holds, 1 when one fails, 2 on bad input.</summary>
    public static int Run(OperateRequest request, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(request);
        if (CommonOptions.RefusesPlot("operate", request.PlotPath, request.Force, error))
        {
            return ExitCodes.BadInput;
        }
        var loaded = RigInput.LoadOrReport(request.RigPath, error);
        if (loaded is null)
        {
            return ExitCodes.BadInput;
        }
        var rig = loaded.Rig!;
        if (!TryResolve(request, rig, loaded.Catalog!, error, out var setup))
        {
            return ExitCodes.BadInput;
        }
        var study = OperateStudy.Run(rig, new OperateStudyRequest(
            setup.Number - 1,
            setup.Motor,
            setup.Controller,
            setup.Packs,
            request.Sweep ? null : request.HoldRpm is { } rpm ? ThrottleCommand.HoldRpm(rpm) : request.Duty is { } d ? ThrottleCommand.Duty(d) : null,
            request.GapMm is { } gapMm ? gapMm / 1000.0 : null,
            request.SocPct / 100.0,
            request.Sweep ? SweepSteps : null));
        Write(request, Report(request, study), output);
        if (request.PlotPath is { } plotPath && !WritePlot(request, rig, study, plotPath, error))
        {
            return ExitCodes.BadInput;
        }
        return study.Passes ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static bool WritePlot(OperateRequest request, Rig rig, OperateStudyResult study, string plotPath, TextWriter error)
    {
        var throttle = study.Point.Throttle;
        string what;
        IReadOnlyList<OperatingPoint> marked;
        double[] duties;
        if (study.Sweep is not null)
        {
            duties = PlotDuties;
            marked = [];
            what = $"{study.Station.Label(study.Request.Station)}, duty swept";
        }
        else
        {
            // The torque line at the duty asked for; holding a speed, at each duty the controller settled on.
            duties = throttle.Kind == ThrottleKind.Duty
                ? [throttle.Value]
                : study.Point.Equilibria.Select(e => e.Duty).Where(d => d > 0).Distinct().DefaultIfEmpty(study.Drive.Drivetrain.MaxDuty).ToArray();
            marked = study.Point.Equilibria;
            what = throttle.Kind == ThrottleKind.Duty
                ? $"{study.Station.Label(study.Request.Station)} at duty {throttle.Value.ToString("0.###", Ci)}"
                : $"{study.Station.Label(study.Request.Station)} holding {Units.RadPerSToRpm(throttle.Value).ToString("0", Ci)} rpm";
        }
        var map = study.MapAt(duties);
        if (study.Sweep is not null)
        {
            marked = map.Curves.SelectMany(c => c.Equilibria).ToList();
        }
        return CommonOptions.WritePlot("operate", OperatePlot.Build(map, marked, what, rig.Name, request.Today), plotPath, request.Force, error);
    }

    // Torque lines drawn for --sweep: a few duties across the range, not all twenty.
    private static readonly double[] PlotDuties = [0.25, 0.5, 0.75, 1.0];

    private static string Show(double? value) => value is { } v ? v.ToString(Ci) : "nothing";

    private static void Check(OptionResult result, bool ok, string message)
    {
        if (!ok)
        {
            result.AddError(message);
        }
    }

    private sealed record Setup(int Number, Station Station, Motor? Motor, SpeedController? Controller, PackBank? Packs);

    private static bool TryResolve(OperateRequest request, Rig rig, PartsCatalog catalog, TextWriter error, out Setup setup)
    {
        setup = null!;
        if (StationOption.Find(rig, request.Station, "operate", error) is not { } number)
        {
            return false;
        }
        var station = rig.Stations[number - 1];
        var motor = request.MotorId is { } mid ? Find(catalog.Motors, m => m.Id, mid) : station.Motor;
        var controller = request.ControllerId is { } cid ? Find(catalog.Controllers, c => c.Id, cid) : station.Controller;
        bool ok = true;
        if (motor is null)
        {
            error.WriteLine(request.MotorId is null
                ? $"rotordrive: error: {station.Label(number - 1)} has no motor assigned; name one with --motor ID"
                : $"rotordrive: error: --motor {request.MotorId}: no such id in the motors catalog");
            ok = false;
        }
        if (controller is null)
        {
            error.WriteLine(request.ControllerId is null
                ? $"rotordrive: error: {station.Label(number - 1)} has no controller assigned; name one with --controller ID"
                : $"rotordrive: error: --controller {request.ControllerId}: no such id in the controllers catalog");
            ok = false;
        }
        PackBank? packs = rig.Packs;
        if (request.PackId is { } pid)
        {
            var pack = Find(catalog.Packs, p => p.Id, pid);
            var curve = pack is null ? null : catalog.CurveFor(pack.Chemistry);
            if (pack is null)
            {
                error.WriteLine($"rotordrive: error: --pack {pid}: no such id in the packs catalog");
                ok = false;
            }
            else if (curve is null)
            {
                error.WriteLine($"rotordrive: error: --pack {pid}: the cell curves catalog has no curve for chemistry '{pack.Chemistry}'");
                ok = false;
            }
            else
            {
                packs = new PackBank(pack, rig.Packs?.Count ?? 1, curve);
            }
        }
        else if (packs is null)
        {
            error.WriteLine("rotordrive: error: the rig has no pack assigned; name one with --pack ID");
            ok = false;
        }
        if (!ok)
        {
            return false;
        }
        setup = new Setup(number, station, request.MotorId is null ? null : motor, request.ControllerId is null ? null : controller, request.PackId is null ? null : packs);
        return true;
    }

    private static T? Find<T>(IReadOnlyList<T> items, Func<T, string> id, string wanted) where T : class
        => items.FirstOrDefault(x => string.Equals(id(x), wanted, StringComparison.OrdinalIgnoreCase));

    private static OperateReport Report(OperateRequest request, OperateStudyResult study)
    {
        var result = study.Point;
        var sweep = study.Sweep;
        var reached = result.ReachedFromRest;
        var drivetrain = study.Drive.Drivetrain;
        var packs = study.Drive.Packs;
        return new OperateReport(
            request.RigPath,
            study.Request.Station + 1,
            study.Station.Name,
            study.Station.Spin == SpinDirection.Clockwise ? "cw" : "ccw",
            study.Station.Rotor.Id,
            drivetrain.Motor.Id,
            drivetrain.Controller.Id,
            packs.Pack.Id,
            packs.Count,
            packs.CellsSeries,
            study.GapM * 1000.0,
            request.SocPct,
            result.OpenCircuitVoltageV,
            drivetrain.CurrentLimitA,
            sweep is null ? new ThrottleEntry(result.Throttle.Kind == ThrottleKind.Duty ? "duty" : "hold", result.Throttle.Kind == ThrottleKind.Duty ? result.Throttle.Value : null, result.Throttle.Kind == ThrottleKind.HoldSpeed ? request.HoldRpm : null) : null,
            result.HoldMet,
            result.HoldStoppedBy is { } by ? LimitWords(by) : null,
            result.Findings.Select(f => new FindingEntry(JsonNames.Of(f.Kind), f.Severity == FindingSeverity.Error ? "error" : "warning", f.Message)).ToList(),
            sweep is null ? result.Equilibria.Select((e, i) => Entry(i + 1, e)).ToList() : [],
            reached is null || sweep is not null ? null : result.Equilibria.ToList().IndexOf(reached) + 1,
            sweep?.Select(r => new SweepEntry(r.Throttle.Value, r.Equilibria.Count, r.ReachedFromRest is { } p ? Entry(r.Equilibria.ToList().IndexOf(p) + 1, p) : null)).ToList(),
            study.Passes,
            study.FailedCriteria,
            study.LimitingConstraint);
    }

    private static EquilibriumEntry Entry(int index, OperatingPoint e) => new(
        index,
        JsonNames.Of(e.Kind),
        e.SpeedRpm,
        e.Stable,
        e.StabilitySlopeNmPerRadPerS,
        JsonNames.Of(e.Drive.Regime),
        e.Duty,
        e.MotorCurrentA,
        e.MotorVoltageV,
        e.BusCurrentA,
        e.BusVoltageV,
        e.PackCurrentA,
        e.Drive.TorqueNm,
        e.ShaftPowerW,
        e.ElectricalPowerW,
        e.Efficiency,
        e.LiftN,
        e.EddyPowerW,
        e.Margins.Select(m => new LimitEntry(m.Limit.Key(), m.ValueSi, m.AllowedSi, m.Limit.Unit(), m.MarginFraction, m.Exceeded)).ToList());

    private static string LimitWords(DriveRegime regime) => regime switch
    {
        DriveRegime.CurrentLimit => "controller current limit",
        DriveRegime.MaxDuty => "max duty (pack voltage)",
        _ => JsonNames.Of(regime).Replace('_', ' '),
    };

    private static void Write(OperateRequest request, OperateReport report, TextWriter o)
    {
        if (request.Json)
        {
            JsonOutput.Write(o, report);
            return;
        }
        o.WriteLine($"Rig file: {report.RigFile}");
        o.WriteLine($"Station {report.Station}{(report.StationName is { } name ? $" ({name})" : "")} ({report.Spin}), rotor {report.Rotor}: motor {report.Motor}, controller {report.Controller} "
            + $"(current limit {Numbers.Format(report.CurrentLimitA, 1)} A), packs {report.PackCount} x {report.Pack} ({report.CellsSeries}S)");
        o.WriteLine($"Gap {Numbers.Format(report.GapMm, 1)} mm, state of charge {Numbers.Format(report.SocPct, 0)} %, "
            + $"open-circuit {Numbers.Format(report.OpenCircuitVoltageV, 2)} V; windings and magnets at ambient, braking off");
        if (report.Findings.Count > 0)
        {
            o.WriteLine();
            o.WriteLine("Compatibility:");
            foreach (var f in report.Findings)
            {
                o.WriteLine($"  {f.Severity}: {f.Message}");
            }
        }
        o.WriteLine();
        if (report.Sweep is { } rows)
        {
            WriteSweep(rows, o);
        }
        else
        {
            WriteEquilibria(report, o);
        }
        o.WriteLine();
        o.WriteLine("Caution: strong magnets (fingers, pacemakers), rotor burst at speed, lithium packs; the tool estimates, follow your parts' ratings.");
    }

    private static void WriteEquilibria(OperateReport report, TextWriter o)
    {
        var t = report.Throttle!;
        string throttle = t.Mode == "duty"
            ? $"duty {Numbers.Format(t.Duty!.Value, 3)}"
            : $"hold {Numbers.Format(t.HoldRpm!.Value, 0)} rpm: " + (report.HoldMet == true ? "held" : $"NOT held ({report.HoldStoppedBy} stops it)");
        o.WriteLine($"Throttle: {throttle}");
        o.WriteLine();
        if (report.Equilibria.Count == 0)
        {
            o.WriteLine("No equilibrium: the motor's torque exceeds the load's at every speed searched.");
            return;
        }
        o.WriteLine($"Equilibria ({report.Equilibria.Count}):");
        var table = new TextTable(
            new TableColumn("#", Alignment.Right), new TableColumn("speed_rpm", Alignment.Right), new TableColumn("stable"),
            new TableColumn("duty", Alignment.Right), new TableColumn("motor_a", Alignment.Right), new TableColumn("bus_a", Alignment.Right),
            new TableColumn("bus_v", Alignment.Right), new TableColumn("shaft_w", Alignment.Right), new TableColumn("electric_w", Alignment.Right),
            new TableColumn("eff", Alignment.Right), new TableColumn("lift_n", Alignment.Right), new TableColumn("eddy_w", Alignment.Right),
            new TableColumn("controller"));
        foreach (var e in report.Equilibria)
        {
            table.AddRow(
                e.Index.ToString(Ci), Numbers.Format(e.SpeedRpm, 0), e.Kind == "crossing" ? (e.Stable ? "yes" : "no") : $"yes ({e.Kind.Replace('_', ' ')})",
                Numbers.Format(e.Duty, 3), Numbers.Format(e.MotorCurrentA, 1), Numbers.Format(e.BusCurrentA, 1), Numbers.Format(e.BusVoltageV, 2),
                Numbers.Format(e.ShaftPowerW, 0), Numbers.Format(e.ElectricalPowerW, 0), Numbers.Format(e.Efficiency, 3),
                Numbers.Format(e.LiftN, 1), Numbers.Format(e.EddyPowerW, 0), e.Regime.Replace('_', ' '));
        }
        table.Write(o, 2);
        o.WriteLine();
        foreach (var e in report.Equilibria)
        {
            var exceeded = e.Limits.Where(l => l.Exceeded).ToList();
            o.WriteLine(exceeded.Count == 0
                ? $"  #{e.Index}: within every limit (smallest margin {Smallest(e)})"
                : $"  #{e.Index}: exceeds " + string.Join("; ", exceeded.Select(Describe)));
        }
        if (report.ReachedFromRest is { } reached)
        {
            o.WriteLine();
            var stable = report.Equilibria.Where(e => e.Stable).ToList();
            if (report.Equilibria[reached - 1].Kind == "at_rest")
            {
                o.WriteLine($"Started from rest the rotor does not turn (#{reached}): at this throttle the motor's torque does not exceed the load's just above rest.");
                return;
            }
            o.WriteLine(stable.Count > 1 && stable[0].Index == reached
                ? $"Started from rest the rotor settles at #{reached} ({Numbers.Format(report.Equilibria[reached - 1].SpeedRpm, 0)} rpm); the faster stable point(s) are reached only from above the unstable one (more current limit or a push through the drag peak)."
                : $"Started from rest the rotor settles at #{reached} ({Numbers.Format(report.Equilibria[reached - 1].SpeedRpm, 0)} rpm).");
        }
    }

    private static string Smallest(EquilibriumEntry e)
    {
        var m = e.Limits.MinBy(l => l.Margin)!;
        return $"{Numbers.Format(100 * m.Margin, 0)} % on {m.Limit.Replace('_', ' ')}";
    }

    private static string Describe(LimitEntry l)
    {
        string value = l.Unit switch
        {
            "1" => $"{Numbers.Format(l.Value, 2)} {(l.Exceeded ? ">" : "<=")} {Numbers.Format(l.Allowed, 2)}",
            "erpm" => $"{Numbers.Format(l.Value, 0)} erpm > {Numbers.Format(l.Allowed, 0)} erpm",
            "rad/s" => $"{Numbers.Format(Units.RadPerSToRpm(l.Value), 0)} rpm > {Numbers.Format(Units.RadPerSToRpm(l.Allowed), 0)} rpm",
            "V" => $"{Numbers.Format(l.Value, 2)} V < {Numbers.Format(l.Allowed, 2)} V",
            _ => $"{Numbers.Format(l.Value, 1)} {l.Unit} > {Numbers.Format(l.Allowed, 1)} {l.Unit}",
        };
        string note = l.Limit == "controller_continuous_current" ? " (allowed only for the burst time)" : "";
        return $"{l.Limit.Replace('_', ' ')} {value}{note}";
    }

    private static void WriteSweep(IReadOnlyList<SweepEntry> rows, TextWriter o)
    {
        o.WriteLine("Point reached from rest over duty:");
        var table = new TextTable(
            new TableColumn("duty", Alignment.Right), new TableColumn("speed_rpm", Alignment.Right), new TableColumn("motor_a", Alignment.Right),
            new TableColumn("bus_a", Alignment.Right), new TableColumn("electric_w", Alignment.Right), new TableColumn("eff", Alignment.Right),
            new TableColumn("lift_n", Alignment.Right), new TableColumn("equilibria", Alignment.Right), new TableColumn("exceeded limits"));
        foreach (var r in rows)
        {
            if (r.ReachedFromRest is { } p)
            {
                var exceeded = p.Limits.Where(l => l.Exceeded).Select(l => l.Limit.Replace('_', ' ')).ToList();
                table.AddRow(Numbers.Format(r.Duty, 2), Numbers.Format(p.SpeedRpm, 0), Numbers.Format(p.MotorCurrentA, 1), Numbers.Format(p.BusCurrentA, 1),
                    Numbers.Format(p.ElectricalPowerW, 0), Numbers.Format(p.Efficiency, 3), Numbers.Format(p.LiftN, 1), r.EquilibriaCount.ToString(Ci),
                    exceeded.Count == 0 ? "-" : string.Join(", ", exceeded));
            }
            else
            {
                table.AddRow(Numbers.Format(r.Duty, 2), "-", "-", "-", "-", "-", "-", r.EquilibriaCount.ToString(Ci), "no stable point");
            }
        }
        table.Write(o, 2);
    }

    private sealed record OperateReport(
        string RigFile,
        int Station,
        string? StationName,
        string Spin,
        string Rotor,
        string Motor,
        string Controller,
        string Pack,
        int PackCount,
        int CellsSeries,
        double GapMm,
        double SocPct,
        double OpenCircuitVoltageV,
        double CurrentLimitA,
        ThrottleEntry? Throttle,
        bool? HoldMet,
        string? HoldStoppedBy,
        IReadOnlyList<FindingEntry> Findings,
        IReadOnlyList<EquilibriumEntry> Equilibria,
        int? ReachedFromRest,
        IReadOnlyList<SweepEntry>? Sweep,
        bool LimitsHold,
        IReadOnlyList<string> FailedCriteria,
        string? LimitingConstraint);

    private sealed record ThrottleEntry(string Mode, double? Duty, double? HoldRpm);

    private sealed record FindingEntry(string Kind, string Severity, string Message);

    private sealed record SweepEntry(double Duty, int EquilibriaCount, EquilibriumEntry? ReachedFromRest);

    private sealed record EquilibriumEntry(
        int Index,
        string Kind,
        double SpeedRpm,
        bool Stable,
        double? StabilitySlopeNmPerRadPerS,
        string Regime,
        double Duty,
        double MotorCurrentA,
        double MotorVoltageV,
        double BusCurrentA,
        double BusVoltageV,
        double PackCurrentA,
        double TorqueNm,
        double ShaftPowerW,
        double ElectricalPowerW,
        double Efficiency,
        double LiftN,
        double EddyPowerW,
        IReadOnlyList<LimitEntry> Limits);

    private sealed record LimitEntry(string Limit, double Value, double Allowed, string Unit, double Margin, bool Exceeded);
}
