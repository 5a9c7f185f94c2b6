namespace RotorDrive.Files.Json;

/// <summary>A JSON object: members in file order (duplicates were reported and dropped while parsing).</summary>
internal sealed record JsonObjectNode(int Line, int Column, IReadOnlyList<JsonMember> Members) : JsonNode(Line, Column)
{
    public override string Describe() => "an object";
}
