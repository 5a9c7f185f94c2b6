using System.CommandLine;
using System.Globalization;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Simulation;
using RotorDrive.Files;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive endurance RIG.json [--csv FILE] [--force] [--json]</c>: how long the rig hovers from a full pack
/// before the first limit (pack cutoff or usable capacity, trim, winding temperature, currents, plate temperature).</summary>
/// <remarks>Exit 1 when a limit other than the pack's usable capacity or cutoff ends the run (running out of charge is the
/// expected end of a hover; overheating or overcurrent is a finding), or when no hover exists at the start.</remarks>
public static class EnduranceCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = CommonOptions.RigArgument();
        var csv = CommonOptions.Csv("the endurance time traces");
        var force = CommonOptions.Force();
        var json = CommonOptions.Json();
        var command = new Command("endurance", "Hover time from a full pack until the first limit, with traces of charge, voltage, currents and temperatures.");
        command.Arguments.Add(rig);
        command.Options.Add(csv);
        command.Options.Add(force);
        command.Options.Add(json);
        command.SetAction(parse => Run(
            parse.GetValue(rig)!,
            parse.GetValue(csv),
            parse.GetValue(force),
            parse.GetValue(json),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, string? csvPath, bool force, bool json, TextWriter output, TextWriter error)
    {
        if (CommonOptions.RefusesExistingCsv("endurance", csvPath, force, error))
        {
            return ExitCodes.BadInput;
        }
        var model = CraftInput.ModelOrReport("endurance", rigPath, error);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        Rig rig = model.Rig;
        var sim = SimulationRig.FromModel(model);
        var result = EnduranceSimulator.Run(sim);
        if (csvPath is not null && result.Trace is { } trace)
        {
            var problem = AtomicFile.WriteAllText(csvPath, TraceCsv.Format(trace), force);
            if (problem is not null)
            {
                ProblemReport.Print([problem], error);
                return ExitCodes.BadInput;
            }
        }
        bool pass = result.Passes();
        var report = new EnduranceReport(
            rig.Name,
            result.RuntimeS,
            result.RuntimeS / 60.0,
            result.FirstLimit,
            result.FirstLimitText,
            result.LimitStation + 1,
            result.StartHover.Stations.Select(h => h.SpeedRpm).ToArray(),
            result.StartPackCurrentA,
            result.FinalSocFraction * 100,
            result.FinalBusVoltageV,
            result.FinalPackCurrentA,
            result.PeakWindingTempC,
            result.PeakPlateTempC,
            rig.Limits.PlateTempC,
            sim.PlateSpreadingFactor,
            PlatePatch(sim.PlateSpreadingFactor),
            result.Steps,
            pass);
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            output.WriteLine($"Endurance: {report.Rig}, trimmed hover at the {Numbers.Format(rig.DesignGapM * 1000, 1)} mm design gap from a full pack");
            output.WriteLine($"  runtime: {Numbers.Format(report.RuntimeS, 0)} s ({Numbers.Format(report.RuntimeMin, 1)} min)");
            output.WriteLine($"  ended by: {report.FirstLimit}");
            output.WriteLine(report.StartSpeedsRpm.Count == 0
                ? "  at the start: no trimmed hover exists"
                : $"  at the start: {string.Join(" / ", report.StartSpeedsRpm.Select(r => Numbers.Format(r, 0)))} rpm (stations 1..{report.StartSpeedsRpm.Count}), pack current {Numbers.Format(report.StartPackCurrentA, 1)} A");
            output.WriteLine($"  at the end: state of charge {Numbers.Format(report.FinalSocPct, 1)} %, bus {Numbers.Format(report.FinalBusVoltageV, 1)} V, pack current {Numbers.Format(report.FinalPackCurrentA, 1)} A");
            output.WriteLine($"  hottest winding {Numbers.Format(report.PeakWindingTempC, 1)} C, hottest plate patch {Numbers.Format(report.PeakPlateTempC, 1)} C (limit {Numbers.Format(report.PlateLimitC, 0)} C)");
            output.WriteLine($"  plate patch: {report.PlatePatch}");
            output.WriteLine();
            output.WriteLine(pass ? "Result: the pack ends the hover (no thermal or current limit first)." : "Result: FAILS: a limit other than the pack ends the hover.");
            output.WriteLine("Caution: plates and windings get hot enough to burn; lithium packs can burn when over-discharged. Estimates only: defer to manufacturers' ratings.");
        }
        return pass ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private sealed record EnduranceReport(
        string Rig,
        double RuntimeS,
        double RuntimeMin,
        string FirstLimit,
        EnduranceLimit FirstLimitKind,
        int? LimitStation,
        IReadOnlyList<double> StartSpeedsRpm,
        double StartPackCurrentA,
        double FinalSocPct,
        double FinalBusVoltageV,
        double FinalPackCurrentA,
        double PeakWindingTempC,
        double PeakPlateTempC,
        double PlateLimitC,
        double PlateSpreadingFactor,
        string PlatePatch,
        int Steps,
        bool Pass)
    {
        public EnduranceReport(string rig, double runtimeS, double runtimeMin, EnduranceLimit kind, string text, int? station, IReadOnlyList<double> rpm, double current,
            double soc, double voltage, double finalCurrent, double winding, double plate, double plateLimit, double spreading, string patch, int steps, bool pass)
            : this(rig, runtimeS, runtimeMin, text, kind, station, rpm, current, soc, voltage, finalCurrent, winding, plate, plateLimit, spreading, patch, steps, pass)
        {
        }
    }

    // The plate-patch assumption in words (the lumped plate node of PlatePatchThermalNode.UnderRotor).
    private static string PlatePatch(double spreading) => spreading <= 1
        ? "eddy heat kept in the plate under each magnet annulus (spreading factor 1, the hottest assumption; set plate.spreading_factor in the rig file for a wider patch)"
        : $"eddy heat spread over {Numbers.Format(spreading, 2)} x the magnet annulus area (plate.spreading_factor)";
}
