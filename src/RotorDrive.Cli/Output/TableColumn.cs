namespace RotorDrive.Cli.Output;

/// <summary>A column of a <see cref="TextTable"/>: its header (with unit) and alignment.</summary>
public sealed record TableColumn(string Header, Alignment Align = Alignment.Left);
