using RotorDrive.Files;

namespace RotorDrive.Tui.Services;

/// <summary>The real file system, through RotorDrive.Files' atomic writer.</summary>
public sealed class DiskFiles : IWorkbenchFiles
{
    /// <inheritdoc/>
    public bool Exists(string path) => File.Exists(path);

    /// <inheritdoc/>
    public string? TryReadAllText(string path, out string? failure)
    {
        var problems = new List<InputProblem>();
        string? text = TextFiles.TryRead(path, problems);
        failure = problems.Count > 0 ? problems[0].Message : null;
        return text;
    }

    /// <inheritdoc/>
    public string? WriteAllTextAtomic(string path, string text)
        => AtomicFile.WriteAllText(path, text, overwrite: true)?.Message;

    /// <inheritdoc/>
    public string? Copy(string from, string to)
    {
        try
        {
            File.Copy(from, to, overwrite: true);
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return e.Message;
        }
    }

    /// <inheritdoc/>
    public string FullPath(string path) => Path.GetFullPath(path);
}
