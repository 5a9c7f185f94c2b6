using System.Globalization;
using CsvHelper;

namespace RotorDrive.Files.Catalogs;

/// <summary>One catalog file type: its columns, how a row is read and checked, and how rows are written back.</summary>
/// <remarks>Files are RFC 4180 CSV with a header row, comma separated, invariant culture (dot decimal separator).
/// Headers match case-insensitively; extra columns are allowed only when named "note" or prefixed "x_", so a typo in a
/// header is reported rather than silently ignored. Reading never throws on bad input: every problem of the file is
/// returned, each with its line and column.</remarks>
/// <typeparam name="TRow">The row type, in the file's own units.</typeparam>
public abstract class CatalogFormat<TRow> where TRow : notnull
{
    private readonly Dictionary<string, CatalogColumn> _byName;

    /// <summary>Creates a format from its columns.</summary>
    private protected CatalogFormat(IReadOnlyList<CatalogColumn> columns)
    {
        Columns = columns;
        _byName = columns.ToDictionary(c => c.Name, StringComparer.OrdinalIgnoreCase);
    }

    /// <summary>The usual file name, e.g. "motors.csv".</summary>
    public abstract string FileName { get; }

    /// <summary>Every column the file type knows, required and optional, in writing order.</summary>
    public IReadOnlyList<CatalogColumn> Columns { get; }

    /// <summary>The column holding each row's unique id, or null when rows have none.</summary>
    private protected virtual string? IdColumn => "id";

    /// <summary>Reads a row's values; returns null (or leaves problems on the cursor) when the row is unusable.</summary>
    private protected abstract TRow? ReadRow(CsvRowCursor row);

    /// <summary>A row's values as text, in <see cref="Columns"/> order (null for an empty optional value).</summary>
    private protected abstract string?[] FormatRow(TRow row);

    /// <summary>The row's id (for duplicate detection), or null.</summary>
    private protected virtual string? IdOf(TRow row) => null;

    /// <summary>Checks rules spanning several rows; reports problems and returns the rows to keep.</summary>
    /// <param name="rows">The rows that passed the row checks, with their lines.</param>
    /// <param name="file">The file name for problems.</param>
    /// <param name="columnNumber">The 1-based column number of a named column in this file's header (0 when absent).</param>
    /// <param name="problems">Where to report.</param>
    /// <param name="rejectedIds">Ids of rows already left out; add the ids of rows this check leaves out.</param>
    private protected virtual List<(TRow Row, int Line)> CheckTable(List<(TRow Row, int Line)> rows, string file,
        Func<string, int> columnNumber, List<InputProblem> problems, HashSet<string> rejectedIds)
        => rows;

    /// <summary>Reads catalog text; never throws on bad input.</summary>
    /// <param name="text">The whole file's text.</param>
    /// <param name="file">The file name used in problems.</param>
    public CatalogReadResult<TRow> Read(string text, string file)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(file);
        var problems = new List<InputProblem>();
        var rejected = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        var kept = new List<(TRow Row, int Line)>();
        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }

        var malformed = new Dictionary<long, string>();
        var columnIndex = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var options = CsvReaderOptions.Default with
        {
            TrackLineNumbers = true,
            Separator = ',',
            OnMalformedRecord = r => malformed.TryAdd(r.LineNumber, ReasonText(r.Reason)),
        };

        try
        {
            using var reader = CsvReader.FromText(text, options);
            reader.ReadHeader();
            var headers = reader.Headers;
            int headerLine = (int)reader.LineNumber;
            if (UnreadableHeader(headers, file, headerLine) is { } unreadable)
            {
                problems.Add(unreadable);
                return Result(kept, problems, rejected, columnIndex);
            }
            if (malformed.TryGetValue(headerLine, out string? headerReason))
            {
                problems.Add(new InputProblem(file, headerLine, 0, "", Messages.MalformedRow(headerReason)));
            }
            columnIndex = ReadHeader(headers, file, headerLine, problems);
            ReadRecords(reader, headers.Count, file, columnIndex, malformed, problems, rejected, kept);
        }
        catch (CsvFormatException e)
        {
            // Only a record too large to buffer throws with these options; report it where it starts.
            problems.Add(new InputProblem(file, (int)Math.Max(0, e.LineNumber), 0, "", Messages.MalformedRow(e.Message)));
        }

        kept = CheckTable(kept, file, name => columnIndex.TryGetValue(name, out int i) ? i + 1 : 0, problems, rejected);
        return Result(kept, problems, rejected, columnIndex);
    }

    // A header that cannot start a catalog: empty, or one long column from a semicolon or tab export (one message that
    // says so, not one per column); null when the header can be read column by column.
    private static InputProblem? UnreadableHeader(IReadOnlyList<string> headers, string file, int headerLine)
    {
        if (headers.Count == 0 || headers.All(h => h.Trim().Length == 0))
        {
            return new InputProblem(file, 1, 0, "", Messages.EmptyCsv());
        }
        if (headers.Count == 1 && (headers[0].Contains(';', StringComparison.Ordinal) || headers[0].Contains('\t', StringComparison.Ordinal)))
        {
            string separator = headers[0].Contains(';', StringComparison.Ordinal) ? "semicolons" : "tabs";
            return new InputProblem(file, headerLine, 0, "", Messages.CsvWrongSeparator(separator));
        }
        return null;
    }

    // The data rows after the header: a malformed row, a row with the wrong number of fields or a row with a problem is
    // reported and its id rejected; a repeated id is reported; every other row is kept with its line.
    private void ReadRecords(CsvReader reader, int headerCount, string file, Dictionary<string, int> columnIndex, Dictionary<long, string> malformed,
        List<InputProblem> problems, HashSet<string> rejected, List<(TRow Row, int Line)> kept)
    {
        var seenIds = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        while (reader.Read())
        {
            int line = (int)reader.LineNumber;
            var fields = new string[reader.FieldCount];
            for (int i = 0; i < fields.Length; i++)
            {
                fields[i] = reader.GetString(i);
            }
            if (malformed.TryGetValue(line, out string? reason))
            {
                problems.Add(new InputProblem(file, line, 0, "", Messages.MalformedRow(reason)));
                RejectRawId(fields, columnIndex, rejected);
                continue;
            }
            if (fields.Length != headerCount)
            {
                problems.Add(new InputProblem(file, line, 0, "", Messages.FieldCount(headerCount, fields.Length)));
                RejectRawId(fields, columnIndex, rejected);
                continue;
            }
            var cursor = new CsvRowCursor(file, line, fields, columnIndex, _byName, problems);
            var row = ReadRow(cursor);
            if (row is null || cursor.HasProblems)
            {
                RejectRawId(fields, columnIndex, rejected);
                continue;
            }
            if (IdOf(row) is { } id)
            {
                if (seenIds.TryGetValue(id, out int firstLine))
                {
                    cursor.Report(IdColumn!, Messages.DuplicateId(id, firstLine));
                    continue;
                }
                seenIds[id] = line;
            }
            kept.Add((row, line));
        }
    }

    /// <summary>Writes rows as catalog text with a header row (invariant culture, round-trip number formatting).</summary>
    public string Write(IEnumerable<TRow> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        using (var writer = CsvWriter.Create(text, CsvWriterOptions.Default with { NewLine = "\n", Separator = ',' }, leaveOpen: true))
        {
            writer.WriteHeader(Columns.Select(c => c.Name).ToArray());
            foreach (var row in Cells(rows))
            {
                writer.WriteRecord(row);
            }
            writer.Flush();
        }
        return text.ToString();
    }

    /// <summary>Rows as the text cells <see cref="Write"/> puts in the file, in <see cref="Columns"/> order (null for an
    /// empty optional value): the catalog in its own columns and units, for display.</summary>
    public IEnumerable<string?[]> Cells(IEnumerable<TRow> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        return rows.Select(FormatRow);
    }

    /// <summary>Formats a number so it reads back to the same double.</summary>
    private protected static string F(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Formats an optional number (null stays empty).</summary>
    private protected static string? F(double? value) => value is { } v ? F(v) : null;

    /// <summary>Formats a whole number.</summary>
    private protected static string F(int value) => value.ToString(CultureInfo.InvariantCulture);

    private Dictionary<string, int> ReadHeader(IReadOnlyList<string> headers, string file, int headerLine, List<InputProblem> problems)
    {
        var columnIndex = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (int i = 0; i < headers.Count; i++)
        {
            string name = headers[i].Trim();
            if (_byName.TryGetValue(name, out var column))
            {
                if (!columnIndex.TryAdd(column.Name, i))
                {
                    problems.Add(new InputProblem(file, headerLine, i + 1, column.Name, Messages.DuplicateColumn(column.Name)));
                }
            }
            else if (!IsUserColumn(name))
            {
                string? suggestion = Suggestions.Closest(name, Columns.Select(c => c.Name).Where(n => !columnIndex.ContainsKey(n)));
                problems.Add(new InputProblem(file, headerLine, i + 1, name, Messages.UnknownColumn(name, suggestion)));
            }
        }
        foreach (var column in Columns.Where(c => c.Required && !columnIndex.ContainsKey(c.Name)))
        {
            problems.Add(new InputProblem(file, headerLine, 0, column.Name, Messages.MissingColumn(column.Name)));
        }
        return columnIndex;
    }

    /// <summary>True for columns a user may add freely: "note" or any name starting with "x_".</summary>
    public static bool IsUserColumn(string name)
        => string.Equals(name, "note", StringComparison.OrdinalIgnoreCase) || name.StartsWith("x_", StringComparison.OrdinalIgnoreCase);

    private void RejectRawId(string[] fields, Dictionary<string, int> columnIndex, HashSet<string> rejected)
    {
        if (IdColumn is { } idColumn && columnIndex.TryGetValue(idColumn, out int i) && i < fields.Length && fields[i].Trim().Length > 0)
        {
            rejected.Add(fields[i].Trim());
        }
    }

    private static string ReasonText(CsvMalformedReason reason) => reason switch
    {
        CsvMalformedReason.StrayQuote => "a quote inside an unquoted field",
        CsvMalformedReason.TextAfterClosingQuote => "text after a closing quote",
        CsvMalformedReason.UnterminatedQuote => "a quote that is never closed",
        CsvMalformedReason.LineBreakInQuotes => "a line break inside quotes",
        CsvMalformedReason.FieldCountMismatch => "wrong number of fields",
        CsvMalformedReason.TrailingEscape => "an escape character at the end",
        _ => reason.ToString(),
    };

    private static CatalogReadResult<TRow> Result(List<(TRow Row, int Line)> kept, List<InputProblem> problems, HashSet<string> rejected,
        Dictionary<string, int> columnIndex)
        => new(
            kept.Select(k => k.Row).ToList(),
            kept.Select(k => k.Line).ToList(),
            problems.OrderBy(p => p.Line).ThenBy(p => p.Column).ToList(),
            rejected,
            columnIndex.ToDictionary(c => c.Key, c => c.Value + 1, StringComparer.OrdinalIgnoreCase));
}
