namespace RotorDrive.Files.Json;

/// <summary>A parsed JSON value with the 1-based line and column where it starts.</summary>
internal abstract record JsonNode(int Line, int Column)
{
    /// <summary>The value's kind in words, for type-error messages ("a string", "an object").</summary>
    public abstract string Describe();
}
