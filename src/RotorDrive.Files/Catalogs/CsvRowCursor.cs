using System.Globalization;

namespace RotorDrive.Files.Catalogs;

/// <summary>Reads typed values from one CSV record, reporting every bad field as a problem with its line and column.</summary>
internal sealed class CsvRowCursor
{
    private readonly string _file;
    private readonly IReadOnlyDictionary<string, int> _columnIndex;
    private readonly IReadOnlyDictionary<string, CatalogColumn> _columns;
    private readonly string[] _fields;
    private readonly List<InputProblem> _problems;

    public CsvRowCursor(string file, int line, string[] fields, IReadOnlyDictionary<string, int> columnIndex,
        IReadOnlyDictionary<string, CatalogColumn> columns, List<InputProblem> problems)
    {
        _file = file;
        Line = line;
        _fields = fields;
        _columnIndex = columnIndex;
        _columns = columns;
        _problems = problems;
    }

    /// <summary>The 1-based line where the record starts.</summary>
    public int Line { get; }

    /// <summary>True once any problem was reported for this row.</summary>
    public bool HasProblems { get; private set; }

    /// <summary>1-based column number of a named column, or 0 when the header lacks it.</summary>
    public int ColumnNumber(string column) => _columnIndex.TryGetValue(column, out int i) ? i + 1 : 0;

    /// <summary>Reports a problem on a column of this row.</summary>
    public void Report(string column, string message)
    {
        HasProblems = true;
        _problems.Add(new InputProblem(_file, Line, ColumnNumber(column), column, message));
    }

    private string? Raw(string column)
    {
        if (!_columnIndex.TryGetValue(column, out int i))
        {
            return null;
        }
        return i < _fields.Length ? _fields[i].Trim() : "";
    }

    private bool Present(string column, out string text)
    {
        string? raw = Raw(column);
        text = raw ?? "";
        if (raw is null)
        {
            // A missing required column is reported once, at the header; the row is unusable but not re-reported.
            if (_columns[column].Required)
            {
                HasProblems = true;
            }
            return false;
        }
        if (raw.Length == 0)
        {
            if (_columns[column].Required)
            {
                Report(column, Messages.ValueRequired());
            }
            return false;
        }
        return true;
    }

    /// <summary>A text value, or null when absent or empty (reported when required).</summary>
    public string? Text(string column) => Present(column, out string text) ? text : null;

    /// <summary>A finite real value within the column's rule, or null (reported when bad or required and empty).</summary>
    public double? Real(string column)
    {
        if (!Present(column, out string text))
        {
            return null;
        }
        if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
        {
            Report(column, Messages.NotANumber(text));
            return null;
        }
        if (!double.IsFinite(value))
        {
            Report(column, Messages.NotFinite(text));
            return null;
        }
        if (_columns[column].Rule.Check(value) is { } message)
        {
            Report(column, message);
            return null;
        }
        return value;
    }

    /// <summary>A whole value within the column's rule, or null (reported when bad or required and empty).</summary>
    public int? Integer(string column)
    {
        if (!Present(column, out string text))
        {
            return null;
        }
        if (!int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int value))
        {
            Report(column, Messages.NotAnInteger(text));
            return null;
        }
        if (_columns[column].Rule.Check(value) is { } message)
        {
            Report(column, message);
            return null;
        }
        return value;
    }

    /// <summary>A boolean value, or null (reported when bad or required and empty).</summary>
    public bool? Boolean(string column)
    {
        if (!Present(column, out string text))
        {
            return null;
        }
        switch (text.ToLowerInvariant())
        {
            case "true" or "yes" or "1":
                return true;
            case "false" or "no" or "0":
                return false;
            default:
                Report(column, Messages.NotABoolean(text));
                return null;
        }
    }
}
