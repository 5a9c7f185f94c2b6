using System.Text.Json;
using System.Text.Json.Serialization;

namespace RotorDrive.Cli.Output;

/// <summary>Writes floats as JSON numbers, and NaN or infinities as null.</summary>
public sealed class FiniteSingleConverter : JsonConverter<float>
{
    /// <inheritdoc/>
    public override float Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        => reader.TokenType == JsonTokenType.Null ? float.NaN : reader.GetSingle();

    /// <inheritdoc/>
    public override void Write(Utf8JsonWriter writer, float value, JsonSerializerOptions options)
    {
        if (float.IsFinite(value))
        {
            writer.WriteNumberValue(value);
        }
        else
        {
            writer.WriteNullValue();
        }
    }
}
