namespace RotorDrive.Files.Catalogs;

/// <summary>What was read from one catalog file: the valid rows and every problem found.</summary>
/// <typeparam name="TRow">The row type, in the file's own units.</typeparam>
/// <param name="Rows">Rows that passed every check, in file order.</param>
/// <param name="Lines">The 1-based line of each row in <paramref name="Rows"/>.</param>
/// <param name="Problems">Every problem in the file (empty when the file is clean).</param>
/// <param name="RejectedIds">Ids of rows left out because of a problem (so references to them are not reported twice).</param>
/// <param name="ColumnNumbers">The 1-based position of each known column in the file's header.</param>
public sealed record CatalogReadResult<TRow>(
    IReadOnlyList<TRow> Rows,
    IReadOnlyList<int> Lines,
    IReadOnlyList<InputProblem> Problems,
    IReadOnlySet<string> RejectedIds,
    IReadOnlyDictionary<string, int> ColumnNumbers)
{
    /// <summary>The 1-based column number of a known column, or 0 when the header lacks it.</summary>
    public int ColumnNumber(string column) => ColumnNumbers.TryGetValue(column, out int n) ? n : 0;

    /// <summary>True when the file had no problems.</summary>
    public bool IsClean => Problems.Count == 0;
}
