namespace RotorDrive.Files.Rigs;

/// <summary>"pack": identical packs in parallel on the bus.</summary>
public sealed class RigPackSection
{
    /// <summary>"id": id in packs.csv.</summary>
    public string? Id { get; set; }

    /// <summary>"count": packs in parallel.</summary>
    public int? Count { get; set; }
}
