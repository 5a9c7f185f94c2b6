namespace RotorDrive.Files.Tests.Support;

/// <summary>A temporary copy of the demo catalogs and rigs that a test may edit; deleted on dispose.</summary>
internal sealed class TempRig : IDisposable
{
    public TempRig()
    {
        Folder = Directory.CreateTempSubdirectory("rotordrive-rig-").FullName;
        foreach (var file in Directory.GetFiles(RepoPaths.Catalogs))
        {
            File.Copy(file, Path.Combine(Folder, Path.GetFileName(file)));
        }
    }

    public string Folder { get; }

    public string DemoRig => Path.Combine(Folder, "demo-rig.json");

    public string PathOf(string name) => Path.Combine(Folder, name);

    /// <summary>Replaces the first occurrence of a text in a file (which must contain it).</summary>
    public void Edit(string name, string from, string to)
    {
        string path = PathOf(name);
        string text = File.ReadAllText(path);
        int at = text.IndexOf(from, StringComparison.Ordinal);
        if (at < 0)
        {
            throw new InvalidOperationException($"'{from}' not found in {name}");
        }
        File.WriteAllText(path, text[..at] + to + text[(at + from.Length)..]);
    }

    /// <summary>The 1-based line of the first line containing a text.</summary>
    public int LineOf(string name, string text)
        => Array.FindIndex(File.ReadAllLines(PathOf(name)), l => l.Contains(text, StringComparison.Ordinal)) + 1;

    public void Dispose() => Directory.Delete(Folder, recursive: true);
}
