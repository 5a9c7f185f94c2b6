using System.Text;
using System.Text.Json;

namespace RotorDrive.Files.Json;

/// <summary>Parses JSON (comments and trailing commas allowed) into nodes that remember their line and column, so
/// problems found later can point at the exact place in the file.</summary>
/// <remarks>System.Text.Json's DOM does not keep positions, so the tree is built from <see cref="Utf8JsonReader"/>
/// tokens; columns count characters (not bytes) from 1.</remarks>
internal sealed class JsonTreeParser
{
    private readonly byte[] _utf8;
    private readonly List<int> _lineStarts = [0];
    private readonly string _file;
    private readonly List<InputProblem> _problems;

    // The path of the value read last: where a syntax error (such as a missing comma) was found.
    private string _lastPath = "$";

    private JsonTreeParser(string text, string file, List<InputProblem> problems)
    {
        _utf8 = Encoding.UTF8.GetBytes(text);
        for (int i = 0; i < _utf8.Length; i++)
        {
            if (_utf8[i] == (byte)'\n')
            {
                _lineStarts.Add(i + 1);
            }
        }
        _file = file;
        _problems = problems;
    }

    /// <summary>Parses the text; returns null after reporting a syntax problem.</summary>
    public static JsonNode? Parse(string text, string file, List<InputProblem> problems)
    {
        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }
        return new JsonTreeParser(text, file, problems).Run();
    }

    private JsonNode? Run()
    {
        var options = new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true, MaxDepth = 64 };
        if (IsBlank())
        {
            _problems.Add(new InputProblem(_file, 1, 1, "$", Messages.JsonSyntax("the file is empty")));
            return null;
        }
        var reader = new Utf8JsonReader(_utf8, options);
        try
        {
            reader.Read();
            var root = ReadValue(ref reader, "$");
            if (reader.Read())
            {
                var (line, column) = Position(reader.TokenStartIndex);
                _problems.Add(new InputProblem(_file, line, column, "$", Messages.JsonSyntax("text after the end of the document")));
                return null;
            }
            return root;
        }
        catch (JsonException e)
        {
            int line = (int)(e.LineNumber ?? 0) + 1;
            int byteInLine = (int)(e.BytePositionInLine ?? 0);
            if (DecimalCommaAt(line, byteInLine) is { } comma)
            {
                // Placed at the number itself, which is what needs fixing.
                _problems.Add(new InputProblem(_file, line, CharacterColumn(line, comma.StartInLine), _lastPath, Messages.JsonDecimalComma(comma.Number)));
                return null;
            }
            _problems.Add(new InputProblem(_file, line, CharacterColumn(line, byteInLine), _lastPath, Messages.JsonSyntax(Detail(e.Message))));
            return null;
        }
    }

    // A number written with a decimal comma ("12,5") reads as 12 and then a stray 5 where a key should start: when the
    // error sits on a digit after "digits," the number is named, as the rest of the file reads fine.
    private (string Number, int StartInLine)? DecimalCommaAt(int line, int byteInLine)
    {
        if (line < 1 || line > _lineStarts.Count)
        {
            return null;
        }
        int at = _lineStarts[line - 1] + byteInLine;
        if (at >= _utf8.Length || !char.IsAsciiDigit((char)_utf8[at]))
        {
            return null;
        }
        int comma = at - 1;
        while (comma >= 0 && _utf8[comma] == (byte)' ')
        {
            comma--;
        }
        if (comma < 1 || _utf8[comma] != (byte)',' || !char.IsAsciiDigit((char)_utf8[comma - 1]))
        {
            return null;
        }
        int start = comma - 1;
        while (start > 0 && (char.IsAsciiDigit((char)_utf8[start - 1]) || _utf8[start - 1] is (byte)'-' or (byte)'.'))
        {
            start--;
        }
        int end = at;
        while (end < _utf8.Length && char.IsAsciiDigit((char)_utf8[end]))
        {
            end++;
        }
        return (Encoding.UTF8.GetString(_utf8, start, comma - start) + "," + Encoding.UTF8.GetString(_utf8, at, end - at), start - _lineStarts[line - 1]);
    }

    // True when the text holds nothing but whitespace and comments.
    private bool IsBlank()
    {
        int i = 0;
        while (i < _utf8.Length)
        {
            byte b = _utf8[i];
            if (b is (byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n')
            {
                i++;
            }
            else if (b == (byte)'/' && i + 1 < _utf8.Length && _utf8[i + 1] == (byte)'/')
            {
                while (i < _utf8.Length && _utf8[i] != (byte)'\n')
                {
                    i++;
                }
            }
            else if (b == (byte)'/' && i + 1 < _utf8.Length && _utf8[i + 1] == (byte)'*')
            {
                int end = _utf8.AsSpan(i + 2).IndexOf("*/"u8);
                if (end < 0)
                {
                    return false;
                }
                i += end + 4;
            }
            else
            {
                return false;
            }
        }
        return true;
    }

    private JsonNode ReadValue(ref Utf8JsonReader reader, string path)
    {
        _lastPath = path;
        var (line, column) = Position(reader.TokenStartIndex);
        switch (reader.TokenType)
        {
            case JsonTokenType.StartObject:
            {
                var members = new List<JsonMember>();
                var seen = new HashSet<string>(StringComparer.Ordinal);
                while (reader.Read() && reader.TokenType != JsonTokenType.EndObject)
                {
                    string key = reader.GetString() ?? "";
                    var (keyLine, keyColumn) = Position(reader.TokenStartIndex);
                    string childPath = path + "." + key;
                    _lastPath = childPath;
                    reader.Read();
                    var value = ReadValue(ref reader, childPath);
                    if (!seen.Add(key))
                    {
                        _problems.Add(new InputProblem(_file, keyLine, keyColumn, childPath, Messages.DuplicateKey(key)));
                        continue;
                    }
                    members.Add(new JsonMember(key, keyLine, keyColumn, value));
                }
                return new JsonObjectNode(line, column, members);
            }
            case JsonTokenType.StartArray:
            {
                var items = new List<JsonNode>();
                while (reader.Read() && reader.TokenType != JsonTokenType.EndArray)
                {
                    items.Add(ReadValue(ref reader, $"{path}[{items.Count}]"));
                }
                return new JsonArrayNode(line, column, items);
            }
            case JsonTokenType.String:
                return new JsonScalarNode(line, column, JsonScalarKind.String, reader.GetString() ?? "", null, false);
            case JsonTokenType.Number:
            {
                string raw = Encoding.UTF8.GetString(reader.ValueSpan);
                double? number = reader.TryGetDouble(out double d) && double.IsFinite(d) ? d : null;
                return new JsonScalarNode(line, column, JsonScalarKind.Number, raw, number, false);
            }
            case JsonTokenType.True:
                return new JsonScalarNode(line, column, JsonScalarKind.Boolean, "true", null, true);
            case JsonTokenType.False:
                return new JsonScalarNode(line, column, JsonScalarKind.Boolean, "false", null, false);
            default:
                return new JsonScalarNode(line, column, JsonScalarKind.Null, "null", null, false);
        }
    }

    private (int Line, int Column) Position(long byteOffset)
    {
        int offset = (int)Math.Min(byteOffset, _utf8.Length);
        int index = _lineStarts.BinarySearch(offset);
        int lineIndex = index >= 0 ? index : ~index - 1;
        int start = _lineStarts[lineIndex];
        return (lineIndex + 1, Encoding.UTF8.GetCharCount(_utf8, start, offset - start) + 1);
    }

    private int CharacterColumn(int line, int bytePosition)
    {
        if (line - 1 >= _lineStarts.Count)
        {
            return bytePosition + 1;
        }
        int start = _lineStarts[line - 1];
        int count = Math.Clamp(bytePosition, 0, _utf8.Length - start);
        return Encoding.UTF8.GetCharCount(_utf8, start, count) + 1;
    }

    // System.Text.Json appends "LineNumber: n | BytePositionInLine: m." (0-based); the problem carries the position.
    private static string Detail(string message)
    {
        int cut = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
        string detail = (cut >= 0 ? message[..cut] : message).Trim();
        if (detail.StartsWith("Path:", StringComparison.Ordinal) || detail.Length == 0)
        {
            return "unexpected text";
        }
        return detail.TrimEnd('.');
    }
}
