namespace RotorDrive.Files.Json;

/// <summary>The kinds of JSON scalar.</summary>
internal enum JsonScalarKind
{
    String,
    Number,
    Boolean,
    Null,
}
