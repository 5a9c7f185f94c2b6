using System.Text.Json;
using System.Text.Json.Serialization;

namespace RotorDrive.Cli.Output;

/// <summary>Writes doubles as JSON numbers, and NaN or infinities as null (JSON has no such numbers; a consumer must
/// not mistake them for values).</summary>
public sealed class FiniteDoubleConverter : JsonConverter<double>
{
    /// <inheritdoc/>
    public override bool HandleNull => false;

    /// <inheritdoc/>
    public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        => reader.TokenType == JsonTokenType.Null ? double.NaN : reader.GetDouble();

    /// <inheritdoc/>
    public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options)
    {
        if (double.IsFinite(value))
        {
            writer.WriteNumberValue(value);
        }
        else
        {
            writer.WriteNullValue();
        }
    }
}
