namespace RotorDrive.Tui.Services;

/// <summary>The file operations the workbench needs, behind an interface so tests can drive them without a disk.</summary>
public interface IWorkbenchFiles
{
    /// <summary>True when a file exists at the path.</summary>
    bool Exists(string path);

    /// <summary>Reads a whole text file; on failure returns null and a reason in words.</summary>
    string? TryReadAllText(string path, out string? failure);

    /// <summary>Writes a whole text file atomically (temporary file in the same folder, then moved into place).</summary>
    /// <returns>Null on success; otherwise the reason in words (the old file is untouched).</returns>
    string? WriteAllTextAtomic(string path, string text);

    /// <summary>Copies a file, replacing the destination (used for the backup made before a save).</summary>
    /// <returns>Null on success; otherwise the reason in words.</returns>
    string? Copy(string from, string to);

    /// <summary>The absolute form of a path.</summary>
    string FullPath(string path);
}
