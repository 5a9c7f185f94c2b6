namespace RotorDrive.Files.Rigs;

/// <summary>A rig file read as a document: the document (null when the file is not a JSON object), where each key
/// is, and every syntax, unknown-key and type problem.</summary>
public sealed record RigDocumentReadResult(RigDocument? Document, RigSourceMap Locations, IReadOnlyList<InputProblem> Problems);
