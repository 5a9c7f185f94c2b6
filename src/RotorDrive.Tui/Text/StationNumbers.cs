using System.Globalization;

namespace RotorDrive.Tui.Text;

/// <summary>Stations are numbered from 1 everywhere (Core's messages included); Core indexes them from 0.</summary>
public static class StationNumbers
{
    /// <summary>A station's number as the workbench shows it.</summary>
    /// <param name="index">The station index, 0-based.</param>
    public static string Of(int index) => (index + 1).ToString(CultureInfo.InvariantCulture);
}
