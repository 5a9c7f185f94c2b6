namespace RotorDrive.Tui.Tests.Support;

/// <summary>The demo catalogs cut down to a few motors, controllers and packs (the demo rig's own among them), so a
/// ranking in a test sweeps 72 combinations instead of thirty thousand.</summary>
internal static class SmallCatalogs
{
    public static IReadOnlyList<string> Motors { get; } = ["or150-kv300", "or1050-kv75", "or1050-kv90", "or1200-kv70-hp"];

    public static IReadOnlyList<string> Controllers { get; } = ["sc45-6s", "sc70-12s", "sc120-12s"];

    public static IReadOnlyList<string> Packs { get; } = ["lp6s-5ah", "lp12s-20ah", "li12s6p-24ah"];

    public static MemoryFiles Files()
    {
        var files = MemoryFiles.WithDemoCatalogs();
        Keep(files, "/lab/motors.csv", Motors);
        Keep(files, "/lab/controllers.csv", Controllers);
        Keep(files, "/lab/packs.csv", Packs);
        return files;
    }

    private static void Keep(MemoryFiles files, string path, IReadOnlyList<string> ids)
    {
        var lines = files[path].Replace("\r", "").Split('\n');
        var kept = lines.Take(1).Concat(lines.Skip(1).Where(l => ids.Contains(l.Split(',')[0]))).ToList();
        if (kept.Count != ids.Count + 1)
        {
            throw new InvalidOperationException($"{path}: expected the ids {string.Join(", ", ids)}");
        }
        files[path] = string.Join("\n", kept) + "\n";
    }
}
