using RotorDrive.Files.Json;

namespace RotorDrive.Files.Rigs;

/// <summary>Reads rig-file JSON (comments and trailing commas allowed) into a <see cref="RigDocument"/>, reporting
/// syntax errors, unknown keys and wrong value types with their JSON path, line and column.</summary>
/// <remarks>Values are not range-checked here; <see cref="RigResolver"/> does that, so an edited document gets the
/// same checks as a file.</remarks>
public static class RigDocumentReader
{
    /// <summary>Reads rig JSON text; never throws on bad input.</summary>
    /// <param name="text">The whole file.</param>
    /// <param name="file">The file name used in problems.</param>
    public static RigDocumentReadResult Read(string text, string file)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(file);
        var problems = new List<InputProblem>();
        var map = new RigSourceMap();
        var root = JsonTreeParser.Parse(text, file, problems);
        if (root is null)
        {
            return new RigDocumentReadResult(null, map, problems);
        }
        Index(root, "$", map);
        var top = JsonObjectScope.Open(root, "$", file, problems);
        if (top is null)
        {
            return new RigDocumentReadResult(null, map, problems);
        }

        var doc = new RigDocument();
        ReadSection(top, "", doc, file, problems);
        var ordered = problems.OrderBy(x => x.Line).ThenBy(x => x.Column).ToList();
        return new RigDocumentReadResult(doc, map, ordered);
    }

    // Reads the keys the schema lists for one section into its document object, then reports the keys it does not list.
    private static void ReadSection(JsonObjectScope scope, string section, object target, string file, List<InputProblem> problems)
    {
        foreach (var key in RigSchema.In(section))
        {
            switch (key.Kind)
            {
                case RigValueKind.Number:
                    key.Set(target, scope.Number(key.Key));
                    break;
                case RigValueKind.Integer:
                    key.Set(target, scope.Integer(key.Key));
                    break;
                case RigValueKind.Section:
                    if (JsonObjectScope.Open(scope.Take(key.Key), scope.PathOf(key.Key), file, problems) is { } inner)
                    {
                        object value = key.CreateSection();
                        ReadSection(inner, key.Name, value, file, problems);
                        key.Set(target, value);
                    }
                    break;
                case RigValueKind.SectionList:
                    key.Set(target, ReadList(scope.Take(key.Key), key, scope.PathOf(key.Key), file, problems));
                    break;
                case RigValueKind.Tolerances:
                    key.Set(target, ReadTolerances(scope.Take(key.Key), file, problems));
                    break;
                case RigValueKind.FileMap:
                    key.Set(target, ReadCalibrations(scope.Take(key.Key), file, problems));
                    break;
                default:
                    key.Set(target, scope.String(key.Key));
                    break;
            }
        }
        scope.ReportUnknownKeys();
    }

    private static System.Collections.IList? ReadList(JsonNode? node, RigKey key, string path, string file, List<InputProblem> problems)
    {
        if (node is null)
        {
            return null;
        }
        if (node is not JsonArrayNode array)
        {
            problems.Add(new InputProblem(file, node.Line, node.Column, path, Messages.WrongType("an array", node.Describe())));
            return null;
        }
        var list = (System.Collections.IList)key.CreateSection();
        for (int i = 0; i < array.Items.Count; i++)
        {
            object item = key.CreateItem();
            if (JsonObjectScope.Open(array.Items[i], $"{path}[{i}]", file, problems) is { } scope)
            {
                ReadSection(scope, RigSchema.ItemsOf(key), item, file, problems);
            }
            list.Add(item);
        }
        return list;
    }

    private static Dictionary<string, string>? ReadCalibrations(JsonNode? node, string file, List<InputProblem> problems)
    {
        if (node is null)
        {
            return null;
        }
        if (node is not JsonObjectNode calibrations)
        {
            problems.Add(new InputProblem(file, node.Line, node.Column, "$.calibrations",
                Messages.WrongType("an object {rotor id: calibration file}", node.Describe())));
            return null;
        }
        var result = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var member in calibrations.Members)
        {
            if (member.Value is JsonScalarNode { Kind: JsonScalarKind.String, Text: { } fileName })
            {
                result[member.Key] = fileName;
            }
            else
            {
                problems.Add(new InputProblem(file, member.Value.Line, member.Value.Column, "$.calibrations." + member.Key,
                    Messages.WrongType("a file name (string)", member.Value.Describe())));
            }
        }
        return result;
    }

    /// <summary>Reads a rig file from disk; a missing or unreadable file is a problem, not an exception.</summary>
    public static RigDocumentReadResult ReadFile(string path)
    {
        var problems = new List<InputProblem>();
        string? text = TextFiles.TryRead(path, problems);
        return text is null ? new RigDocumentReadResult(null, RigSourceMap.Empty, problems) : Read(text, path);
    }

    private static RigTolerancesSection? ReadTolerances(JsonNode? node, string file, List<InputProblem> problems)
    {
        if (node is not JsonObjectNode obj)
        {
            JsonObjectScope.Open(node, "$.tolerances", file, problems);
            return null;
        }
        var section = new RigTolerancesSection();
        foreach (var member in obj.Members)
        {
            string path = "$.tolerances." + member.Key;
            if (!RigToleranceKeys.Keys.Contains(member.Key))
            {
                problems.Add(new InputProblem(file, member.KeyLine, member.KeyColumn, path,
                    Messages.UnknownKey(member.Key, Suggestions.Closest(member.Key, RigToleranceKeys.Keys))));
                continue;
            }
            if (JsonObjectScope.Open(member.Value, path, file, problems) is not { } e)
            {
                continue;
            }
            section.Entries[member.Key] = new RigToleranceEntry
            {
                NormalSdPct = e.Number("normal_sd_pct"),
                NormalSd = e.Number("normal_sd"),
                UniformPct = Pair(e.Take("uniform_pct"), path + ".uniform_pct", file, problems),
                Uniform = Pair(e.Take("uniform"), path + ".uniform", file, problems),
            };
            e.ReportUnknownKeys();
        }
        return section;
    }

    // [low, high]: an array of exactly two finite numbers.
    private static double[]? Pair(JsonNode? node, string path, string file, List<InputProblem> problems)
    {
        if (node is null)
        {
            return null;
        }
        if (node is JsonArrayNode { Items.Count: 2 } array
            && array.Items[0] is JsonScalarNode { Kind: JsonScalarKind.Number, Number: { } low }
            && array.Items[1] is JsonScalarNode { Kind: JsonScalarKind.Number, Number: { } high })
        {
            return [low, high];
        }
        problems.Add(new InputProblem(file, node.Line, node.Column, path, Messages.WrongType("an array of two finite numbers [low, high]", node.Describe())));
        return null;
    }

    private static void Index(JsonNode node, string path, RigSourceMap map)
    {
        map.Add(path, node.Line, node.Column);
        switch (node)
        {
            case JsonObjectNode obj:
                foreach (var m in obj.Members)
                {
                    Index(m.Value, path + "." + m.Key, map);
                }
                break;
            case JsonArrayNode arr:
                for (int i = 0; i < arr.Items.Count; i++)
                {
                    Index(arr.Items[i], $"{path}[{i}]", map);
                }
                break;
        }
    }
}
