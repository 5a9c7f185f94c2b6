using System.Diagnostics;
using BenchmarkDotNet.Running;
using RotorDrive.Benchmarks.Studies;
using RotorDrive.Core.Studies.Ranking;

// Run with: dotnet run -c Release --project tests/RotorDrive.Benchmarks -- --filter '*'
// One timed run of the generated 4.8 million combination ranking (for /usr/bin/time -v peak memory):
//   dotnet run -c Release --project tests/RotorDrive.Benchmarks -- rank-generated [MOTORS CONTROLLERS PACKS]
if (args.Length > 0 && args[0] == "rank-generated")
{
    int motors = args.Length > 1 ? int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture) : 1000;
    int controllers = args.Length > 2 ? int.Parse(args[2], System.Globalization.CultureInfo.InvariantCulture) : 60;
    int packs = args.Length > 3 ? int.Parse(args[3], System.Globalization.CultureInfo.InvariantCulture) : 80;
    var (rig, catalog) = RankGeneratedBenchmarks.Make(motors, controllers, packs);
    var cpu = Process.GetCurrentProcess().TotalProcessorTime;
    var clock = Stopwatch.StartNew();
    var study = RankStudy.Create(rig, catalog, new RankOptions(MaxPackCount: 1));
    var result = study.Run();
    clock.Stop();
    var used = Process.GetCurrentProcess().TotalProcessorTime - cpu;
    Console.WriteLine($"{result.TotalCombinations:N0} combinations, {result.AcceptedCount:N0} accepted, Pareto {result.ParetoRanks.Count}, best {result.Top[0].Evaluation.Label}: wall {clock.Elapsed.TotalSeconds:0.00} s, cpu {used.TotalSeconds:0.00} s, cores {Environment.ProcessorCount}, peak working set {Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0:0} MiB");
    foreach (var count in result.RejectionCounts)
    {
        Console.WriteLine($"  {count.Count,10:N0} {count.Kind.Describe()}");
    }
    return;
}
// CPU and wall time of ranking the demo catalogs in-process (five runs after one warm-up):
//   dotnet run -c Release --project tests/RotorDrive.Benchmarks -- rank-demo
if (args.Length > 0 && args[0] == "rank-demo")
{
    var loaded = RotorDrive.Files.RigLoader.Load(RotorDrive.Benchmarks.BenchmarkPaths.DemoRig);
    for (int run = 0; run < 6; run++)
    {
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var clock = Stopwatch.StartNew();
        var result = RankStudy.Create(loaded.Rig!, loaded.Catalog!).Run();
        clock.Stop();
        var used = Process.GetCurrentProcess().TotalProcessorTime - cpu;
        Console.WriteLine($"run {run}: {result.TotalCombinations:N0} combinations, {result.AcceptedCount:N0} accepted: wall {clock.Elapsed.TotalSeconds:0.000} s, cpu {used.TotalSeconds:0.000} s");
    }
    return;
}
// Stopwatch figures for the pieces of a ranking (trim, bus solve, load evaluation):
//   dotnet run -c Release --project tests/RotorDrive.Benchmarks -- rank-parts
if (args.Length > 0 && args[0] == "rank-parts")
{
    RankParts.Run();
    return;
}
// CPU time per operating-point solve (the drive benchmark's table case), a cross-check of the BenchmarkDotNet figure
// that a busy machine disturbs less (the process's own CPU time, not wall time; seven runs after one warm-up):
//   dotnet run -c Release --project tests/RotorDrive.Benchmarks -- operate-cpu
if (args.Length > 0 && args[0] == "operate-cpu")
{
    var bench = new RotorDrive.Benchmarks.Drive.DriveBenchmarks();
    bench.Setup();
    const int Solves = 20_000;
    var perSolve = new List<double>();
    for (int run = 0; run < 8; run++)
    {
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        int equilibria = 0;
        for (int i = 0; i < Solves; i++)
        {
            equilibria += bench.OperatingPointAllEquilibriaTable();
        }
        double us = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalMilliseconds * 1000.0 / Solves;
        if (run > 0)
        {
            perSolve.Add(us);
        }
        Console.WriteLine($"run {run}{(run == 0 ? " (warm-up)" : "")}: {us:0.00} us CPU per solve ({equilibria / Solves} equilibria)");
    }
    perSolve.Sort();
    Console.WriteLine($"median {perSolve[perSolve.Count / 2]:0.00} us CPU per solve over {perSolve.Count} runs of {Solves:N0}");
    return;
}
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
