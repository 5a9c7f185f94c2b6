namespace RotorDrive.Files.Rigs;

/// <summary>Where each JSON path of a rig file starts (1-based line and column), so later checks can point at it.</summary>
public sealed class RigSourceMap
{
    private readonly Dictionary<string, (int Line, int Column)> _positions = new(StringComparer.Ordinal);

    /// <summary>A map with no positions (for documents made in memory): every lookup gives line 0, column 0.</summary>
    public static RigSourceMap Empty { get; } = new();

    internal void Add(string path, int line, int column) => _positions.TryAdd(path, (line, column));

    /// <summary>The position of a JSON path; for a path not in the file, its nearest parent's; (0, 0) when none.</summary>
    public (int Line, int Column) Find(string path)
    {
        string current = path;
        while (true)
        {
            if (_positions.TryGetValue(current, out var position))
            {
                return position;
            }
            int cut = Math.Max(current.LastIndexOf('.'), current.LastIndexOf('['));
            if (cut <= 0)
            {
                return (0, 0);
            }
            current = current[..cut];
        }
    }
}
