namespace RotorDrive.Cli.Output;

/// <summary>Horizontal alignment of a table column; numbers read best right-aligned.</summary>
public enum Alignment
{
    /// <summary>Pad on the right.</summary>
    Left,

    /// <summary>Pad on the left.</summary>
    Right,
}
