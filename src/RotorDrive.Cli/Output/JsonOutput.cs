using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace RotorDrive.Cli.Output;

/// <summary>Writes the <c>--json</c> documents: snake_case keys (units in the names, e.g. <c>lift_n</c>), invariant
/// number formatting, indented, and non-finite numbers as null so NaN never reaches output.</summary>
/// <remarks>Serialise records whose property names carry their unit (<c>TotalMassKg</c> becomes <c>total_mass_kg</c>).
/// Enums are written as snake_case strings.</remarks>
public static class JsonOutput
{
    /// <summary>The serializer options every command uses.</summary>
    public static JsonSerializerOptions Options { get; } = CreateOptions();

    /// <summary>Serialises a value and writes it, followed by a newline.</summary>
    public static void Write<T>(TextWriter output, T value)
    {
        ArgumentNullException.ThrowIfNull(output);
        output.WriteLine(JsonSerializer.Serialize(value, Options));
    }

    /// <summary>Serialises a value to a string (same options).</summary>
    public static string Serialize<T>(T value) => JsonSerializer.Serialize(value, Options);

    private static JsonSerializerOptions CreateOptions()
    {
        var options = new JsonSerializerOptions
        {
            PropertyNamingPolicy = JsonNamingPolicy.SnakeCaseLower,
            DictionaryKeyPolicy = JsonNamingPolicy.SnakeCaseLower,
            WriteIndented = true,
            NumberHandling = JsonNumberHandling.Strict,
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        };
        options.Converters.Add(new FiniteDoubleConverter());
        options.Converters.Add(new FiniteSingleConverter());
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.SnakeCaseLower));
        options.MakeReadOnly(populateMissingResolver: true);
        return options;
    }
}
