using System.CommandLine;
using RotorDrive.Cli.Output;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive yaw RIG.json [--json]</c>: residual yaw torque with equal duties, the differential duty that
/// cancels it, the trim's yaw authority against limits.yaw_torque_nm, and the yaw caused by small pair mismatches.</summary>
/// <remarks>Exit 0 when the residual is within the tolerance and the authority covers it both ways, 1 otherwise, 2 on bad
/// input.</remarks>
public static class YawCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = CommonOptions.RigArgument();
        var json = CommonOptions.Json();
        var command = new Command("yaw", "Yaw balance at the design gap: residual torque at equal duty, the differential duty that cancels it, yaw authority.");
        command.Arguments.Add(rig);
        command.Options.Add(json);
        command.SetAction(parse => Run(parse.GetValue(rig)!, parse.GetValue(json), parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, bool json, TextWriter output, TextWriter error)
    {
        var model = CraftInput.ModelOrReport("yaw", rigPath, error);
        if (model is null)
        {
            return ExitCodes.BadInput;
        }
        var y = HoverStudy.Run(model, new HoverStudyRequest(Yaw: true)).Yaw!;
        var report = new YawReport(
            model.Rig.Name,
            model.DesignGapM * 1000,
            new YawEntry(y.EqualDuty, y.ResidualTorqueNm, y.YawAccelerationRadPerS2, y.TrimDeltaDuty, y.ClockwiseDuty, y.CounterClockwiseDuty,
                y.AuthorityNm, y.AuthorityPositiveNm, y.AuthorityNegativeNm, y.AuthorityMarginFraction, y.AuthorityLimitedBy, y.LimitNm, y.Pass),
            y.Sensitivity is { } s ? new SensitivityEntry(s.StationA + 1, s.StationB + 1, s.KvMismatchNm, s.GapDifferenceNm, s.PlateTempDifferenceNm) : null,
            y.Findings);
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, model.YawInertiaKgM2, output);
        }
        return y.Pass ? ExitCodes.Ok : ExitCodes.LimitFindings;
    }

    private static void WriteText(YawReport r, double inertia, TextWriter o)
    {
        var y = r.Yaw;
        o.WriteLine($"Yaw balance: {r.Rig} at the design gap {Numbers.Format(r.GapMm, 2)} mm");
        o.WriteLine($"  equal duty carrying the weight: {Numbers.Format(y.EqualDuty, 4)}");
        o.WriteLine($"  residual yaw torque at that duty: {Numbers.Format(y.ResidualTorqueNm, 3)} N m (positive = counter-clockwise seen from above); "
            + $"yaw acceleration {Numbers.Format(y.AccelerationRadPerS2, 3)} rad/s^2 with {Numbers.Format(inertia, 2)} kg m^2");
        o.WriteLine($"  differential duty that cancels it (cw minus ccw): {Numbers.Format(y.TrimDutyDelta, 4)} (cw {Numbers.Format(y.CwDuty, 4)}, ccw {Numbers.Format(y.CcwDuty, 4)})");
        o.WriteLine($"  yaw authority of the trim within every limit: {Numbers.Format(y.AuthorityNm, 2)} N m "
            + $"(ccw {Numbers.Format(y.AuthorityPositiveNm, 2)}, cw {Numbers.Format(y.AuthorityNegativeNm, 2)}); tolerance {Numbers.Format(y.LimitNm, 2)} N m, margin {Numbers.Format(y.AuthorityMargin * 100, 0)} %"
            + (y.AuthorityLimitedBy is { } l ? $"; bounded by {l}" : ""));
        if (r.Sensitivity is { } s)
        {
            o.WriteLine($"  sensitivity (station {s.StationA} against its partner {s.StationB}): 1 % Kv {Numbers.Format(s.Kv1PctNm, 3)} N m, "
                + $"1 mm gap {Numbers.Format(s.Gap1MmNm, 3)} N m, 10 K plate {Numbers.Format(s.Plate10KNm, 3)} N m");
        }
        foreach (var f in r.Findings)
        {
            o.WriteLine($"  note: {f}");
        }
        o.WriteLine();
        o.WriteLine(y.Pass ? "Result: PASS" : "Result: FAIL (residual above the tolerance, or the trim cannot command the tolerance both ways)");
    }

    private sealed record YawReport(string Rig, double GapMm, YawEntry Yaw, SensitivityEntry? Sensitivity, IReadOnlyList<string> Findings);

    private sealed record YawEntry(
        double? EqualDuty, double? ResidualTorqueNm, double? AccelerationRadPerS2, double? TrimDutyDelta, double? CwDuty, double? CcwDuty,
        double AuthorityNm, double AuthorityPositiveNm, double AuthorityNegativeNm, double AuthorityMargin, string? AuthorityLimitedBy, double LimitNm, bool Pass);

    private sealed record SensitivityEntry(int StationA, int StationB, double Kv1PctNm, double Gap1MmNm, double Plate10KNm);
}
