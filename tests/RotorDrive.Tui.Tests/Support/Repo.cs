namespace RotorDrive.Tui.Tests.Support;

/// <summary>Where the repository's demo catalogs are.</summary>
internal static class Repo
{
    public static string Root { get; } = FindRoot();

    public static string CatalogsFolder => Path.Combine(Root, "catalogs");

    public static string DemoRig => Path.Combine(CatalogsFolder, "demo-rig.json");

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "RotorDrive.sln")))
            {
                return dir.FullName;
            }
        }
        throw new InvalidOperationException("RotorDrive.sln not found above " + AppContext.BaseDirectory);
    }
}
