using System.Text;
using System.Text.Json;

namespace RotorDrive.Files.Rigs;

/// <summary>Writes a <see cref="RigDocument"/> as indented JSON with the rig file's keys; absent values are left out.</summary>
public static class RigDocumentWriter
{
    /// <summary>The document as JSON text (UTF-8 content, "\n" line ends, 2-space indent).</summary>
    public static string Write(RigDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            WriteSection(w, "", document);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>Saves the document atomically; refuses to replace an existing file unless <paramref name="overwrite"/>.</summary>
    /// <returns>Null on success, otherwise the problem.</returns>
    public static InputProblem? Save(RigDocument document, string path, bool overwrite)
        => AtomicFile.WriteAllText(path, Write(document), overwrite);

    // Writes the keys the schema lists for one section, in the schema's order, leaving absent ones out.
    private static void WriteSection(Utf8JsonWriter w, string section, object source)
    {
        foreach (var key in RigSchema.In(section))
        {
            object? value = key.Get(source);
            if (value is null)
            {
                continue;
            }
            switch (key.Kind)
            {
                case RigValueKind.Number:
                    Num(w, key.Key, (double?)value);
                    break;
                case RigValueKind.Integer:
                    w.WriteNumber(key.Key, (int)value);
                    break;
                case RigValueKind.Section:
                    w.WriteStartObject(key.Key);
                    WriteSection(w, key.Name, value);
                    w.WriteEndObject();
                    break;
                case RigValueKind.SectionList:
                    w.WriteStartArray(key.Key);
                    foreach (object item in (System.Collections.IList)value)
                    {
                        w.WriteStartObject();
                        WriteSection(w, RigSchema.ItemsOf(key), item);
                        w.WriteEndObject();
                    }
                    w.WriteEndArray();
                    break;
                case RigValueKind.Tolerances:
                    Tolerances(w, key.Key, (RigTolerancesSection)value);
                    break;
                case RigValueKind.FileMap:
                    if (value is Dictionary<string, string> { Count: > 0 } map)
                    {
                        w.WriteStartObject(key.Key);
                        foreach (var (name, fileName) in map)
                        {
                            w.WriteString(name, fileName);
                        }
                        w.WriteEndObject();
                    }
                    break;
                default:
                    w.WriteString(key.Key, (string)value);
                    break;
            }
        }
    }

    private static void Tolerances(Utf8JsonWriter w, string name, RigTolerancesSection t)
    {
        w.WriteStartObject(name);
        var order = RigToleranceKeys.Keys.Concat(t.Entries.Keys.Where(k => !RigToleranceKeys.Keys.Contains(k)).Order(StringComparer.Ordinal));
        foreach (string key in order)
        {
            if (!t.Entries.TryGetValue(key, out var e))
            {
                continue;
            }
            w.WriteStartObject(key);
            Num(w, "normal_sd_pct", e.NormalSdPct);
            Num(w, "normal_sd", e.NormalSd);
            Pair(w, "uniform_pct", e.UniformPct);
            Pair(w, "uniform", e.Uniform);
            w.WriteEndObject();
        }
        w.WriteEndObject();
    }

    // A pair with a non-finite value is left out, like a non-finite number (the resolver then reports the entry).
    private static void Pair(Utf8JsonWriter w, string key, double[]? values)
    {
        if (values is { Length: > 0 } && values.All(double.IsFinite))
        {
            w.WriteStartArray(key);
            foreach (double v in values)
            {
                w.WriteNumberValue(v);
            }
            w.WriteEndArray();
        }
    }

    // Non-finite numbers cannot be written as JSON; an edited document holding one leaves the key out, and the
    // resolver then reports it as missing rather than the file silently holding a wrong number.
    private static void Num(Utf8JsonWriter w, string key, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumber(key, v);
        }
    }
}
