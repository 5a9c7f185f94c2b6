namespace RotorDrive.Benchmarks;

/// <summary>Finds the repository's demo files from the benchmark binaries' location.</summary>
public static class BenchmarkPaths
{
    /// <summary>catalogs/demo-rig.json of this repository.</summary>
    public static string DemoRig
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
            {
                dir = dir.Parent;
            }
            return Path.Combine(dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found"), "catalogs", "demo-rig.json");
        }
    }
}
