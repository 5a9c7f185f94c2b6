using System.Globalization;

namespace RotorDrive.Cli.Output;

/// <summary>A station in a table cell: its number from 1, and its name from the rig when it has one ("3 (front left)").</summary>
public static class StationText
{
    /// <summary>The cell text.</summary>
    /// <param name="number">The station's number, counted from 1.</param>
    /// <param name="name">The station's name, or null.</param>
    public static string Cell(int number, string? name)
        => name is null ? number.ToString(CultureInfo.InvariantCulture) : $"{number.ToString(CultureInfo.InvariantCulture)} ({name})";
}
