namespace RotorDrive.Cli;

/// <summary>A command's <c>--plot</c> request: the file (null for none) and the date stamped on it.</summary>
/// <param name="Path">The plot file, or null when no plot was asked for.</param>
/// <param name="Today">The date for the plot's corner stamp.</param>
public sealed record PlotRequest(string? Path, DateOnly Today);
