namespace RotorDrive.Files;

/// <summary>Writes whole files atomically: to a temporary file in the same folder, then moved into place, so a
/// reader never sees half a file and a failed write never damages the old one.</summary>
public static class AtomicFile
{
    /// <summary>Writes text (UTF-8, no byte order mark) to a path.</summary>
    /// <param name="path">Destination file.</param>
    /// <param name="text">The whole content.</param>
    /// <param name="overwrite">False refuses to replace an existing file (the user's file is never overwritten unless asked).</param>
    /// <returns>Null on success; otherwise a problem naming the file and the reason (nothing was changed).</returns>
    public static InputProblem? WriteAllText(string path, string text, bool overwrite)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Write(path, temp => File.WriteAllText(temp, text, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false)), overwrite);
    }

    /// <summary>Writes bytes (an image) to a path.</summary>
    /// <param name="path">Destination file.</param>
    /// <param name="bytes">The whole content.</param>
    /// <param name="overwrite">False refuses to replace an existing file.</param>
    /// <returns>Null on success; otherwise a problem naming the file and the reason (nothing was changed).</returns>
    public static InputProblem? WriteAllBytes(string path, byte[] bytes, bool overwrite)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        return Write(path, temp => File.WriteAllBytes(temp, bytes), overwrite);
    }

    private static InputProblem? Write(string path, Action<string> writeTemp, bool overwrite)
    {
        ArgumentNullException.ThrowIfNull(path);
        string? temp = null;
        try
        {
            if (Directory.Exists(path))
            {
                return new InputProblem(path, 0, 0, "", Messages.PathIsFolder());
            }
            if (!overwrite && File.Exists(path))
            {
                return new InputProblem(path, 0, 0, "", Messages.FileExists());
            }
            string full = Path.GetFullPath(path);
            string folder = Path.GetDirectoryName(full) ?? ".";
            if (!Directory.Exists(folder))
            {
                return new InputProblem(path, 0, 0, "", Messages.FileNotWritten("the folder does not exist"));
            }
            temp = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
            writeTemp(temp);
            if (overwrite)
            {
                File.Move(temp, full, overwrite: true);
            }
            else
            {
                // Without overwrite, a file created meanwhile makes the move fail instead of being replaced.
                File.Move(temp, full, overwrite: false);
            }
            temp = null;
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return new InputProblem(path, 0, 0, "",
                !overwrite && File.Exists(path) ? Messages.FileExists() : Messages.FileNotWritten(e.Message));
        }
        finally
        {
            if (temp is not null)
            {
                try
                {
                    File.Delete(temp);
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException)
                {
                    // Best effort: a stray temporary file is harmless and named so it is recognisable.
                }
            }
        }
    }
}
