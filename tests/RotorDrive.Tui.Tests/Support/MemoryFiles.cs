using RotorDrive.Tui.Services;

namespace RotorDrive.Tui.Tests.Support;

/// <summary>An in-memory file system: tests see exactly what the workbench read, wrote and copied.</summary>
internal sealed class MemoryFiles : IWorkbenchFiles
{
    private readonly Dictionary<string, string> _files = new(StringComparer.Ordinal);

    public List<string> Writes { get; } = [];

    public List<(string From, string To)> Copies { get; } = [];

    public string? FailWritesWith { get; set; }

    public static MemoryFiles WithDemoCatalogs()
    {
        var files = new MemoryFiles();
        foreach (string path in Directory.GetFiles(Repo.CatalogsFolder))
        {
            files._files[files.FullPath(Path.Combine("/lab", Path.GetFileName(path)))] = File.ReadAllText(path);
        }
        return files;
    }

    public string this[string path]
    {
        get => _files[FullPath(path)];
        set => _files[FullPath(path)] = value;
    }

    public bool Exists(string path) => _files.ContainsKey(FullPath(path));

    public string? TryReadAllText(string path, out string? failure)
    {
        failure = _files.TryGetValue(FullPath(path), out string? text) ? null : "file not found";
        return text;
    }

    public string? WriteAllTextAtomic(string path, string text)
    {
        if (FailWritesWith is { } failure)
        {
            return failure;
        }
        Writes.Add(FullPath(path));
        _files[FullPath(path)] = text;
        return null;
    }

    public string? Copy(string from, string to)
    {
        if (!_files.TryGetValue(FullPath(from), out string? text))
        {
            return "file not found";
        }
        Copies.Add((FullPath(from), FullPath(to)));
        _files[FullPath(to)] = text;
        return null;
    }

    public string FullPath(string path) => Path.GetFullPath(path, "/lab");
}
