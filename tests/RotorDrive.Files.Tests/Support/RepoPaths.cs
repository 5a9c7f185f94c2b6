namespace RotorDrive.Files.Tests.Support;

/// <summary>Finds the repository's folders from the test binaries' location.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Catalogs => Path.Combine(Root, "catalogs");

    public static string DemoRig => Path.Combine(Catalogs, "demo-rig.json");

    public static string TestRig => Path.Combine(Catalogs, "test-rig.json");

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
        {
            dir = dir.Parent;
        }
        return dir?.FullName ?? throw new InvalidOperationException("RotorDrive.sln not found above " + AppContext.BaseDirectory);
    }
}
