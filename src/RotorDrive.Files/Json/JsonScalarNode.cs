namespace RotorDrive.Files.Json;

/// <summary>A JSON string, number, boolean or null.</summary>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Kind">Which scalar it is.</param>
/// <param name="Text">The string value, or the number's raw text.</param>
/// <param name="Number">The number, or null when it is not a finite double (or not a number at all).</param>
/// <param name="Boolean">The boolean value, when a boolean.</param>
internal sealed record JsonScalarNode(int Line, int Column, JsonScalarKind Kind, string Text, double? Number, bool Boolean)
    : JsonNode(Line, Column)
{
    public override string Describe() => Kind switch
    {
        JsonScalarKind.String => "a string",
        JsonScalarKind.Number => "a number",
        JsonScalarKind.Boolean => Boolean ? "true" : "false",
        _ => "null",
    };
}
