using System.Diagnostics;
using RotorDrive.Core;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Where a ranking's time goes, piece by piece on the demo rig: warm-started trims a few grams apart (as the
/// sweep visits them), cold trims, the six-station bus solve of the static spin-up check, and single load evaluations.
/// Stopwatch figures per call, after a warm-up; run with <c>rank-parts</c>.</summary>
public static class RankParts
{
    public static void Run()
    {
        var loaded = RigLoader.Load(BenchmarkPaths.DemoRig);
        var model = RigModel.Build(loaded.Rig!);
        int n = model.Stations.Count;
        var ws = new HoverTrimWorkspace(n);
        var speeds = new double[n];
        var options = HoverOptions.Default;
        double gap = model.DesignGapM;
        for (int pass = 0; pass < 2; pass++)
        {
            int count = 20000;
            var clock = Stopwatch.StartNew();
            int iterations = 0;
            HoverTrim.SolveSpeeds(model.Stations, gap, model.WeightN, model.CgXM, model.CgYM, 0, speeds, false, options, ws, out _);
            for (int k = 0; k < count; k++)
            {
                double weight = model.WeightN + 0.002 * (k % 1000) * Units.StandardGravity;
                HoverTrim.SolveSpeeds(model.Stations, gap, weight, model.CgXM, model.CgYM, 0, speeds, true, options, ws, out int it);
                iterations += it;
            }
            Report(pass, "warm trim, 2 g apart", clock, count, $"{(double)iterations / count:0.00} iterations");

            clock.Restart();
            iterations = 0;
            for (int k = 0; k < count / 10; k++)
            {
                double weight = model.WeightN + 0.002 * k * Units.StandardGravity;
                HoverTrim.SolveSpeeds(model.Stations, gap, weight, model.CgXM, model.CgYM, 0, speeds, false, options, ws, out int it);
                iterations += it;
            }
            Report(pass, "cold trim", clock, count / 10, $"{(double)iterations / (count / 10):0.00} iterations");

            var inputs = new DriveInput[n];
            var points = new DrivePoint[n];
            var train = model.Stations[0].Drivetrain;
            for (int i = 0; i < n; i++)
            {
                inputs[i] = new DriveInput(train, DriveCommand.Duty(0.95), 300 + i, 22, 22, false);
            }
            clock.Restart();
            for (int k = 0; k < count; k++)
            {
                DriveBus.Solve(model.Source, inputs, points);
            }
            Report(pass, "bus solve, 6 duty commands", clock, count, "");

            clock.Restart();
            double sum = 0;
            for (int k = 0; k < count * 10; k++)
            {
                sum += model.Stations[k % n].LoadAt(300 + (k % 97), gap).LiftN;
            }
            Report(pass, "one load evaluation", clock, count * 10, sum > 0 ? "" : "?");
        }
    }

    private static void Report(int pass, string what, Stopwatch clock, int count, string note)
    {
        if (pass > 0)
        {
            Console.WriteLine($"{what,-30} {clock.Elapsed.TotalMilliseconds * 1000 / count,8:0.000} us/call {note}");
        }
    }
}
