namespace RotorDrive.Files;

/// <summary>Reads whole text files, turning every I/O failure into an <see cref="InputProblem"/>.</summary>
public static class TextFiles
{
    /// <summary>Reads a UTF-8 text file; returns null and adds a problem when it cannot be read.</summary>
    /// <param name="path">The path to read.</param>
    /// <param name="problems">Where a failure is reported.</param>
    public static string? TryRead(string path, List<InputProblem> problems)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(problems);
        try
        {
            if (Directory.Exists(path))
            {
                problems.Add(new InputProblem(path, 0, 0, "", Messages.FileUnreadable("it is a folder, not a file")));
                return null;
            }
            return File.ReadAllText(path);
        }
        catch (Exception e) when (e is FileNotFoundException or DirectoryNotFoundException)
        {
            problems.Add(new InputProblem(path, 0, 0, "", Messages.FileNotFound()));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            problems.Add(new InputProblem(path, 0, 0, "", Messages.FileUnreadable(e.Message)));
        }
        return null;
    }
}
