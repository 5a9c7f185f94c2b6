using RotorDrive.Core.Loads;
using RotorDrive.Core;
using RotorDrive.Core.Studies.Calibration;

namespace RotorDrive.Files.Bench;

/// <summary>What was read from a bench data file: steady points or a spin-down trace (in SI), and every problem.</summary>
/// <param name="Kind">Which shape the header names, or null when it names neither.</param>
/// <param name="Points">Steady points, or null.</param>
/// <param name="Trace">Spin-down samples, or null.</param>
/// <param name="Problems">Every problem in the file.</param>
/// <param name="Sha256">SHA-256 of the file's text (UTF-8), lower-case hex.</param>
public sealed record BenchData(
    CalibrationKind? Kind,
    IReadOnlyList<BenchPoint>? Points,
    IReadOnlyList<SpinDownSample>? Trace,
    IReadOnlyList<InputProblem> Problems,
    string Sha256)
{
    /// <summary>True when the file had no problem.</summary>
    public bool IsClean => Problems.Count == 0 && Kind is not null;

    /// <summary>Reads bench text; the header decides the shape (time_s: a spin-down; torque_nm: steady points).</summary>
    /// <param name="text">The whole file.</param>
    /// <param name="file">The file name for problems.</param>
    /// <param name="defaultGapMm">Gap of spin-down samples without a gap_mm value, mm.</param>
    public static BenchData Read(string text, string file, double defaultGapMm)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(file);
        string hash = Hashes.Sha256(text);
        string header = text.TrimStart('\uFEFF').Split('\n', 2)[0];
        var names = header.Split(',').Select(h => h.Trim().Trim('"').ToLowerInvariant()).ToHashSet();
        if (names.Contains("time_s"))
        {
            var read = new SpinDownFormat().Read(text, file);
            var problems = read.Problems.ToList();
            if (problems.Count == 0 && read.Rows.Count < 3)
            {
                problems.Add(new InputProblem(file, 0, 0, "", Messages.TooFewBenchRows(read.Rows.Count, 3)));
            }
            var trace = read.Rows.Select(r => new SpinDownSample(r.TimeS, Units.RpmToRadPerS(r.SpeedRpm), (r.GapMm ?? defaultGapMm) / 1000.0)).ToList();
            return new BenchData(CalibrationKind.SpinDown, null, trace, problems, hash);
        }
        if (names.Contains("torque_nm"))
        {
            var read = new SteadyBenchFormat().Read(text, file);
            var problems = read.Problems.ToList();
            if (problems.Count == 0 && read.Rows.Count < 3)
            {
                problems.Add(new InputProblem(file, 0, 0, "", Messages.TooFewBenchRows(read.Rows.Count, 3)));
            }
            var points = read.Rows.Select(r => new BenchPoint(Units.RpmToRadPerS(r.SpeedRpm), r.GapMm / 1000.0, r.TorqueNm, r.LiftN, r.PlateTempC)).ToList();
            return new BenchData(CalibrationKind.SteadyPoints, points, null, problems, hash);
        }
        return new BenchData(null, null, null, [new InputProblem(file, 1, 0, "", Messages.BenchHeaderUnknown())], hash);
    }

    /// <summary>Reads a bench file from disk; a missing or unreadable file is a problem, not an exception.</summary>
    /// <param name="path">The file.</param>
    /// <param name="defaultGapMm">Gap of spin-down samples without a gap_mm value, mm.</param>
    public static BenchData ReadFile(string path, double defaultGapMm)
    {
        var problems = new List<InputProblem>();
        string? text = TextFiles.TryRead(path, problems);
        return text is null ? new BenchData(null, null, null, problems, "") : Read(text, path, defaultGapMm);
    }
}
