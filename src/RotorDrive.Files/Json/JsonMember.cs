namespace RotorDrive.Files.Json;

/// <summary>One key of a JSON object with its value and the key's position.</summary>
internal sealed record JsonMember(string Key, int KeyLine, int KeyColumn, JsonNode Value);
