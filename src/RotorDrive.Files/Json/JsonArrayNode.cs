namespace RotorDrive.Files.Json;

/// <summary>A JSON array.</summary>
internal sealed record JsonArrayNode(int Line, int Column, IReadOnlyList<JsonNode> Items) : JsonNode(Line, Column)
{
    public override string Describe() => "an array";
}
