namespace RotorDrive.Files;

/// <summary>One thing wrong with a user's input file, located precisely enough to fix it.</summary>
/// <param name="File">The file's path as the user gave it (or as resolved relative to the rig file).</param>
/// <param name="Line">1-based line, or 0 when not applicable (e.g. the whole file is missing).</param>
/// <param name="Column">1-based column (CSV field number, or character in the line for JSON), or 0 when not applicable.</param>
/// <param name="Field">The column name (CSV) or JSON path (rig file) the problem concerns; empty when none.</param>
/// <param name="Message">What is wrong, from <see cref="Messages"/>.</param>
public sealed record InputProblem(string File, int Line, int Column, string Field, string Message)
{
    /// <summary>The problem as one line: "FILE:LINE:COL: FIELD: MESSAGE" (the field part is left out when empty).</summary>
    public override string ToString()
        => Field.Length == 0 ? $"{File}:{Line}:{Column}: {Message}" : $"{File}:{Line}:{Column}: {Field}: {Message}";
}
