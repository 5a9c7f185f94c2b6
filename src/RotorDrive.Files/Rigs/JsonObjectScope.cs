using RotorDrive.Files.Json;

namespace RotorDrive.Files.Rigs;

/// <summary>Reads the known keys of one JSON object, reporting type errors, and then every key nobody asked for.</summary>
internal sealed class JsonObjectScope
{
    private readonly JsonObjectNode _node;
    private readonly string _path;
    private readonly string _file;
    private readonly List<InputProblem> _problems;
    private readonly List<string> _known = [];

    private JsonObjectScope(JsonObjectNode node, string path, string file, List<InputProblem> problems)
    {
        _node = node;
        _path = path;
        _file = file;
        _problems = problems;
    }

    /// <summary>A scope over a node that must be an object; null (after a type problem) when it is not.</summary>
    public static JsonObjectScope? Open(JsonNode? node, string path, string file, List<InputProblem> problems)
    {
        if (node is null)
        {
            return null;
        }
        if (node is JsonObjectNode obj)
        {
            return new JsonObjectScope(obj, path, file, problems);
        }
        problems.Add(new InputProblem(file, node.Line, node.Column, path, Messages.WrongType("an object", node.Describe())));
        return null;
    }

    public string PathOf(string key) => _path + "." + key;

    /// <summary>The value of a known key, or null when absent.</summary>
    public JsonNode? Take(string key)
    {
        _known.Add(key);
        return _node.Members.FirstOrDefault(m => m.Key == key)?.Value;
    }

    public string? String(string key)
    {
        var node = Take(key);
        if (node is null)
        {
            return null;
        }
        if (node is JsonScalarNode { Kind: JsonScalarKind.String } s)
        {
            return s.Text;
        }
        WrongType(node, key, "a string");
        return null;
    }

    public double? Number(string key)
    {
        var node = Take(key);
        if (node is null)
        {
            return null;
        }
        if (node is JsonScalarNode { Kind: JsonScalarKind.Number } n)
        {
            if (n.Number is { } value)
            {
                return value;
            }
            _problems.Add(new InputProblem(_file, n.Line, n.Column, PathOf(key), Messages.NotFinite(n.Text)));
            return null;
        }
        WrongType(node, key, "a number");
        return null;
    }

    public int? Integer(string key)
    {
        var node = Take(key);
        double? value = null;
        if (node is JsonScalarNode { Kind: JsonScalarKind.Number } n)
        {
            value = n.Number;
            if (value is null)
            {
                _problems.Add(new InputProblem(_file, n.Line, n.Column, PathOf(key), Messages.NotFinite(n.Text)));
                return null;
            }
            if (value != Math.Floor(value.Value) || Math.Abs(value.Value) > int.MaxValue)
            {
                _problems.Add(new InputProblem(_file, n.Line, n.Column, PathOf(key), Messages.JsonNotAnInteger(value.Value)));
                return null;
            }
            return (int)value.Value;
        }
        if (node is not null)
        {
            WrongType(node, key, "a whole number");
        }
        return null;
    }

    /// <summary>Reports every key that was not asked for, with a suggestion when one is close.</summary>
    public void ReportUnknownKeys()
    {
        foreach (var member in _node.Members)
        {
            if (!_known.Contains(member.Key))
            {
                string? suggestion = Suggestions.Closest(member.Key, _known);
                _problems.Add(new InputProblem(_file, member.KeyLine, member.KeyColumn, PathOf(member.Key),
                    Messages.UnknownKey(member.Key, suggestion)));
            }
        }
    }

    private void WrongType(JsonNode node, string key, string expected)
        => _problems.Add(new InputProblem(_file, node.Line, node.Column, PathOf(key), Messages.WrongType(expected, node.Describe())));
}
