namespace RotorDrive.Files.Reports;

/// <summary>One input file of a report and its SHA-256, so a reader can tell whether a result came from these files.</summary>
/// <param name="Path">The file as it was named (relative to the working folder or absolute).</param>
/// <param name="Sha256">The lower-case hex SHA-256 of its bytes, or null when it could not be read.</param>
public sealed record ReportInput(string Path, string? Sha256)
{
    /// <summary>Hashes a file's bytes; a file that cannot be read gets a null hash (the report says so).</summary>
    /// <param name="path">The file.</param>
    public static ReportInput Of(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        try
        {
            using var stream = File.OpenRead(path);
            return new ReportInput(path, Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(stream)));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return new ReportInput(path, null);
        }
    }
}
