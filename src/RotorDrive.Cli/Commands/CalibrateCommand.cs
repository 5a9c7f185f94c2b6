using System.CommandLine;
using RotorDrive.Cli.Output;
using RotorDrive.Core;
using RotorDrive.Core.Studies.Calibration;
using RotorDrive.Files;
using RotorDrive.Files.Bench;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive calibrate RIG.json --rotor ID --bench FILE.csv [--out CAL.csv] [--force] [--json]</c>: fits the
/// rotor's load model to bench data (steady points or a spin-down; the header decides) and prints the factors with
/// their intervals, the residuals and the fit quality; <c>--out</c> writes the calibration file the rig's
/// "calibrations" key names.</summary>
/// <remarks>Exit 0 when the fit is accepted, 2 on bad input or when the fit is refused (the likely cause is printed).</remarks>
public static class CalibrateCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = CommonOptions.RigArgument();
        var json = CommonOptions.Json();
        var force = CommonOptions.Force();
        var rotor = new Option<string>("--rotor") { Description = "Rotor design id (rotors catalog) the bench data were measured on.", Required = true, HelpName = "ID" };
        var bench = new Option<string>("--bench")
        {
            Description = "Bench data CSV: steady points (speed_rpm, gap_mm, torque_nm[, lift_n, plate_temp_c]) or a spin-down (time_s, speed_rpm[, gap_mm]).",
            Required = true,
            HelpName = "FILE",
        };
        var output = new Option<string?>("--out") { Description = "Write the calibration file here (atomically; refuses to replace a file without --force).", HelpName = "CAL.csv" };
        var command = new Command("calibrate", "Fit the rotor's load model to bench data: conductivity and field factors, bearing terms, 95 % intervals.");
        command.Arguments.Add(rig);
        command.Options.Add(rotor);
        command.Options.Add(bench);
        command.Options.Add(output);
        command.Options.Add(force);
        command.Options.Add(json);
        command.SetAction(parse => Run(parse.GetValue(rig)!, parse.GetValue(rotor)!, parse.GetValue(bench)!, parse.GetValue(output), parse.GetValue(force),
            parse.GetValue(json), parse.InvocationConfiguration.Output, parse.InvocationConfiguration.Error));
        return command;
    }

    private static int Run(string rigPath, string rotorId, string benchPath, string? outPath, bool force, bool json, TextWriter output, TextWriter error)
    {
        if (CommonOptions.RefusesExistingCsv("calibrate", outPath, force, error))
        {
            return ExitCodes.BadInput;
        }
        var loaded = RigInput.LoadOrReport(rigPath, error);
        if (loaded is null)
        {
            return ExitCodes.BadInput;
        }
        var rig = loaded.Rig!;
        var design = loaded.Catalog!.Rotors.FirstOrDefault(r => string.Equals(r.Id, rotorId, StringComparison.Ordinal));
        if (design is null)
        {
            error.WriteLine($"rotordrive calibrate: error: --rotor {rotorId}: {Messages.UnknownId("rotor", rotorId, loaded.CatalogPaths!.Rotors)}");
            return ExitCodes.BadInput;
        }
        var data = BenchData.ReadFile(benchPath, rig.DesignGapM * 1000.0);
        if (!data.IsClean)
        {
            ProblemReport.Print(data.Problems, error);
            return ExitCodes.BadInput;
        }
        var request = new CalibrationRequest(design, rig.Plate, rig.PlateTemperatureC, rig.AmbientC, data.Points, data.Trace);
        var result = CalibrationStudy.Run(request);
        var report = ToReport(result, benchPath, data, rig.DesignGapM);
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, output);
        }
        if (!result.Accepted)
        {
            error.WriteLine($"{benchPath}: error: the fit is refused: {result.RefusalDetail}");
            return ExitCodes.BadInput;
        }
        if (outPath is not null)
        {
            var problem = AtomicFile.WriteAllText(outPath, CalibrationFile.Write(result, design, benchPath, data.Sha256), force);
            if (problem is not null)
            {
                error.WriteLine(problem.ToString());
                return ExitCodes.BadInput;
            }
            if (!json)
            {
                output.WriteLine($"wrote {outPath}; name it in the rig file: \"calibrations\": {{ \"{design.Id}\": \"{Path.GetFileName(outPath)}\" }}");
            }
        }
        return ExitCodes.Ok;
    }

    private static CalibrateReport ToReport(CalibrationResult r, string benchPath, BenchData data, double defaultGapM)
    {
        var estimates = r.Estimates.Select(e =>
        {
            double unit = e.Parameter == CalibrationParameter.BearingDamping ? CalibrationFile.RadPerSPerKrpm : 1.0;
            return new EstimateEntry(e.Key, e.Value * unit, e.Lower * unit, e.Upper * unit, e.StandardError * unit, e.Fitted, e.Undetermined, e.Why);
        }).ToList();
        double Unit(int k) => k == 3 ? CalibrationFile.RadPerSPerKrpm : 1.0;
        var covariance = Enumerable.Range(0, 4).Select(a => Enumerable.Range(0, 4).Select(b => r.Covariance[a][b] * Unit(a) * Unit(b)).ToArray()).ToArray();
        var q = r.Quality;
        var quality = new QualityEntry(q.Points, q.Parameters, q.DegreesOfFreedom, q.RmsTorqueNm, q.RmsLiftN, Units.RadPerSToRpm(q.RmsSpeedRadPerS),
            q.RSquared, q.RunsZ, q.Iterations, Units.RadPerSToRpm(q.InitialSpeedRadPerS), Units.RadPerSToRpm(q.DragPeakSpeedRadPerS));
        var residuals = r.Residuals.Select(x =>
        {
            bool speed = x.Series == "speed";
            double scale = speed ? 1.0 / Units.RadPerSPerRpm : 1.0;
            return new ResidualEntry(x.Index, speed ? "speed_rpm" : x.Series == "lift" ? "lift_n" : "torque_nm", Units.RadPerSToRpm(x.SpeedRadPerS), x.GapM * 1000,
                x.TimeS, x.Measured * scale, x.Model * scale, x.Residual * scale);
        }).ToList();
        return new CalibrateReport(r.RotorId, r.Kind == CalibrationKind.SpinDown ? "spin_down" : "steady_points", benchPath, data.Sha256,
            r.Kind == CalibrationKind.SpinDown ? defaultGapM * 1000 : double.NaN, r.Accepted,
            r.Refusal == CalibrationRefusal.None ? null : JsonNames.Of(r.Refusal), r.RefusalDetail, r.ConfidenceLevelFraction, estimates, covariance, quality, residuals);
    }

    private static void WriteText(CalibrateReport r, TextWriter o)
    {
        o.WriteLine($"Calibration of rotor {r.Rotor} from {r.DataFile} ({(r.Kind == "spin_down" ? "spin-down trace" : "steady bench points")})");
        var table = new TextTable(new TableColumn("quantity"), new TableColumn("value", Alignment.Right), new TableColumn($"{r.ConfidenceLevel * 100:G3} % interval", Alignment.Right),
            new TableColumn("std error", Alignment.Right), new TableColumn("note"));
        foreach (var e in r.Estimates)
        {
            string note = !e.Fitted ? "held at the rotor row's value (not fitted)" : e.Undetermined ? "UNDETERMINED: " + e.Why : "";
            table.AddRow(e.Key, G(e.Value), e.Fitted ? $"{G(e.Lower)} .. {G(e.Upper)}" : "-", e.Fitted ? G(e.StandardError) : "-", note);
        }
        table.Write(o);
        var q = r.Quality;
        o.WriteLine($"Fit: {q.Points} values, {q.Parameters} parameters, {q.DegreesOfFreedom} degrees of freedom, {q.Iterations} iterations; "
            + $"R^2 {Numbers.Format(q.RSquared, 5)}; runs test z {Numbers.Format(q.RunsZ, 2)} (strongly negative = systematic misfit)");
        if (r.Kind == "spin_down")
        {
            o.WriteLine($"  rms speed residual {Numbers.Format(q.RmsSpeedRpm, 2)} rpm; fitted start speed {Numbers.Format(q.InitialSpeedRpm, 1)} rpm; "
                + $"gap where the trace has none {Numbers.Format(r.DefaultGapMm, 2)} mm (the rig's design gap)");
        }
        else
        {
            o.WriteLine($"  rms torque residual {Numbers.Format(q.RmsTorqueNm, 5)} N m" + (double.IsFinite(q.RmsLiftN) ? $"; rms lift residual {Numbers.Format(q.RmsLiftN, 3)} N" : ""));
        }
        o.WriteLine($"  fitted drag peak at the data's median gap: {Numbers.Format(q.DragPeakSpeedRpm, 0)} rpm");
        var residuals = new TextTable(new TableColumn("#", Alignment.Right), new TableColumn("series"), r.Kind == "spin_down" ? new TableColumn("time_s", Alignment.Right) : new TableColumn("speed_rpm", Alignment.Right),
            new TableColumn("gap_mm", Alignment.Right), new TableColumn("measured", Alignment.Right), new TableColumn("model", Alignment.Right), new TableColumn("residual", Alignment.Right));
        foreach (var x in r.Residuals)
        {
            residuals.AddRow(x.Index.ToString(System.Globalization.CultureInfo.InvariantCulture), x.Series,
                r.Kind == "spin_down" ? Numbers.Format(x.TimeS, 3) : Numbers.Format(x.SpeedRpm, 0), Numbers.Format(x.GapMm, 2), G(x.Measured), G(x.Model), G(x.Residual));
        }
        o.WriteLine("Residuals (measured - model):");
        residuals.Write(o);
        o.WriteLine(r.Accepted
            ? "The fit is accepted. Bench calibration narrows the model to this rotor and plate; keep checking against the rig (common practice, no source)."
            : $"The fit is REFUSED ({r.Refusal}): {r.RefusalDetail}");
    }

    private static string G(double v) => double.IsFinite(v) ? v.ToString("G5", System.Globalization.CultureInfo.InvariantCulture) : "n/a";

    private sealed record CalibrateReport(string Rotor, string Kind, string DataFile, string DataSha256, double DefaultGapMm, bool Accepted, string? Refusal,
        string? RefusalDetail, double ConfidenceLevel, IReadOnlyList<EstimateEntry> Estimates, double[][] Covariance, QualityEntry Quality,
        IReadOnlyList<ResidualEntry> Residuals);

    private sealed record EstimateEntry(string Key, double Value, double Lower, double Upper, double StandardError, bool Fitted, bool Undetermined, string? Why);

    private sealed record QualityEntry(int Points, int Parameters, int DegreesOfFreedom, double RmsTorqueNm, double RmsLiftN, double RmsSpeedRpm, double RSquared,
        double RunsZ, int Iterations, double InitialSpeedRpm, double DragPeakSpeedRpm);

    private sealed record ResidualEntry(int Index, string Series, double SpeedRpm, double GapMm, double TimeS, double Measured, double Model, double Residual);
}
