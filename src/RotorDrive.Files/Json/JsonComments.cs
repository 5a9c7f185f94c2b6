using System.Text;
using System.Text.Json;

namespace RotorDrive.Files.Json;

/// <summary>Carries the comments of a JSON file (the rig file allows <c>//</c> and <c>/* */</c> comments) into a rewritten
/// version of it, so a load, edit and save round trip keeps the user's notes: a comment on its own line goes before the key
/// (or array element, or closing bracket) it preceded, a comment after a value on the same line stays at the end of that
/// key's line.</summary>
/// <remarks>Comments are anchored by the JSON path of what follows them ("$.stations[0].x_mm"), so they survive
/// re-indentation and reordering; a comment whose anchor is gone from the rewritten text (a deleted key or station) goes
/// to the end of the file rather than being lost.</remarks>
public static class JsonComments
{
    /// <summary>The rewritten text with the original's comments put back.</summary>
    /// <param name="original">The file as read (comments allowed); when it cannot be read as JSON, nothing is carried.</param>
    /// <param name="rewritten">The new text, written without comments.</param>
    /// <returns>The rewritten text with the comments, or <paramref name="rewritten"/> when the original has none.</returns>
    public static string Carry(string original, string rewritten)
    {
        ArgumentNullException.ThrowIfNull(original);
        ArgumentNullException.ThrowIfNull(rewritten);
        var before = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        var trailing = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        var after = new List<string>();
        if (!Collect(original, before, trailing, after))
        {
            return rewritten;
        }
        var anchors = Anchors(rewritten);
        string[] lines = rewritten.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');
        var insertBefore = new Dictionary<int, List<string>>();
        var appendTo = new Dictionary<int, List<string>>();
        foreach (var (path, comments) in before)
        {
            if (anchors.TryGetValue(path, out int line))
            {
                Add(insertBefore, line, comments);
            }
            else
            {
                after.AddRange(comments);
            }
        }
        foreach (var (path, comments) in trailing)
        {
            if (anchors.TryGetValue(path, out int line))
            {
                Add(appendTo, line, comments);
            }
            else
            {
                after.AddRange(comments);
            }
        }
        var sb = new StringBuilder();
        for (int i = 0; i < lines.Length; i++)
        {
            if (i == lines.Length - 1 && lines[i].Length == 0)
            {
                break;
            }
            string indent = lines[i][..(lines[i].Length - lines[i].TrimStart().Length)];
            foreach (string c in insertBefore.GetValueOrDefault(i) ?? [])
            {
                sb.Append(indent).Append(c).Append('\n');
            }
            sb.Append(lines[i]);
            foreach (string c in appendTo.GetValueOrDefault(i) ?? [])
            {
                sb.Append(' ').Append(c);
            }
            sb.Append('\n');
        }
        foreach (string c in after)
        {
            sb.Append(c).Append('\n');
        }
        string result = sb.ToString();
        return rewritten.EndsWith('\n') ? result : result.TrimEnd('\n');
    }

    private static void Add(Dictionary<int, List<string>> into, int line, List<string> comments)
    {
        if (!into.TryGetValue(line, out var list))
        {
            into[line] = list = [];
        }
        list.AddRange(comments);
    }

    // Reads the original: each comment is anchored to the next key/element/closing bracket (own line) or to the last
    // anchor when it follows a value on the same line. False when the text is not JSON.
    private static bool Collect(string text, Dictionary<string, List<string>> before, Dictionary<string, List<string>> trailing, List<string> after)
    {
        byte[] utf8 = Encoding.UTF8.GetBytes(text.Length > 0 && text[0] == '\uFEFF' ? text[1..] : text);
        var pending = new List<string>();
        string? lastAnchor = null;
        int lastTokenLine = -1;
        bool any = false;
        try
        {
            Walk(utf8, JsonCommentHandling.Allow, (path, start, line, isComment, end) =>
            {
                if (isComment)
                {
                    any = true;
                    string comment = Encoding.UTF8.GetString(utf8, start, end - start).TrimEnd();
                    if (line == lastTokenLine && lastAnchor is not null)
                    {
                        Add(trailing, lastAnchor, comment);
                    }
                    else
                    {
                        pending.Add(comment);
                    }
                    return;
                }
                lastTokenLine = line;
                if (path is not null)
                {
                    lastAnchor = path;
                    if (pending.Count > 0)
                    {
                        foreach (string c in pending)
                        {
                            Add(before, path, c);
                        }
                        pending.Clear();
                    }
                }
            });
        }
        catch (JsonException)
        {
            return false;
        }
        after.AddRange(pending);
        return any;
    }

    private static void Add(Dictionary<string, List<string>> into, string path, string comment)
    {
        if (!into.TryGetValue(path, out var list))
        {
            into[path] = list = [];
        }
        list.Add(comment);
    }

    // The line (0-based) where each anchor of the rewritten text starts.
    private static Dictionary<string, int> Anchors(string text)
    {
        var anchors = new Dictionary<string, int>(StringComparer.Ordinal);
        Walk(Encoding.UTF8.GetBytes(text), JsonCommentHandling.Skip, (path, _, line, _, _) =>
        {
            if (path is not null)
            {
                anchors.TryAdd(path, line);
            }
        });
        return anchors;
    }

    private delegate void TokenSeen(string? anchor, int start, int line, bool isComment, int end);

    // Walks the tokens with their JSON paths. An anchor is the root ("$"), a key ("$.gap.design_mm"), an array element
    // ("$.stations[0]") or a closing bracket ("$.stations]"); other tokens report a null anchor.
    private static void Walk(byte[] utf8, JsonCommentHandling comments, TokenSeen seen)
    {
        var lineStarts = new List<int> { 0 };
        for (int i = 0; i < utf8.Length; i++)
        {
            if (utf8[i] == (byte)'\n')
            {
                lineStarts.Add(i + 1);
            }
        }
        int LineOf(long offset)
        {
            int index = lineStarts.BinarySearch((int)offset);
            return index >= 0 ? index : ~index - 1;
        }
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions { CommentHandling = comments, AllowTrailingCommas = true, MaxDepth = 64 });
        var frames = new Stack<(bool Array, int Index, string Path)>();
        string? key = null;
        while (reader.Read())
        {
            int start = (int)reader.TokenStartIndex;
            int line = LineOf(start);
            if (reader.TokenType == JsonTokenType.Comment)
            {
                seen(null, start, line, true, (int)reader.BytesConsumed);
                continue;
            }
            if (reader.TokenType == JsonTokenType.PropertyName)
            {
                key = frames.Peek().Path + "." + reader.GetString();
                seen(key, start, line, false, 0);
                continue;
            }
            if (reader.TokenType is JsonTokenType.EndObject or JsonTokenType.EndArray)
            {
                var closed = frames.Pop();
                seen(closed.Path + (closed.Array ? "]" : "}"), start, line, false, 0);
                continue;
            }
            string path;
            string? anchor = null;
            if (frames.Count == 0)
            {
                path = "$";
                anchor = path;
            }
            else if (frames.Peek().Array)
            {
                var (_, index, parent) = frames.Pop();
                frames.Push((true, index + 1, parent));
                path = $"{parent}[{index}]";
                anchor = path;
            }
            else
            {
                path = key ?? frames.Peek().Path;
            }
            seen(anchor, start, line, false, 0);
            if (reader.TokenType is JsonTokenType.StartObject or JsonTokenType.StartArray)
            {
                frames.Push((reader.TokenType == JsonTokenType.StartArray, 0, path));
            }
        }
    }
}
