using System.Text;
using System.Text.Json;

namespace RotorDrive.Cli.Output;

/// <summary>The one spelling of a word-valued field in <c>--json</c> documents and CSV exports: snake_case, as the keys
/// are (<c>LimitExceeded</c> and "limit exceeded" both become <c>limit_exceeded</c>).</summary>
public static class JsonNames
{
    /// <summary>An enum value in snake_case (the same spelling the serializer gives enum-typed members).</summary>
    /// <param name="value">The value.</param>
    public static string Of(Enum value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return JsonNamingPolicy.SnakeCaseLower.ConvertName(value.ToString());
    }

    /// <summary>A PascalCase name or words ("usable capacity", "pack-cutoff") in snake_case.</summary>
    /// <param name="text">The name or words.</param>
    public static string Of(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var words = new StringBuilder(text.Length);
        foreach (char c in text.Trim())
        {
            words.Append(c is ' ' or '-' or '/' ? '_' : c);
        }
        return JsonNamingPolicy.SnakeCaseLower.ConvertName(words.ToString());
    }
}
