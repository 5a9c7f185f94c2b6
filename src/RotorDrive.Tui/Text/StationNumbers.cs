using System.Globalization;

namespace RotorDrive.Tui.Text;

/// <summary>Core numbers stations from 0; the workbench from 1, as the station sketch and the station fields do.</summary>
public static class StationNumbers
{
    /// <summary>A station's number as the workbench shows it.</summary>
    /// <param name="index">The station index, 0-based.</param>
    public static string Of(int index) => (index + 1).ToString(CultureInfo.InvariantCulture);

    /// <summary>Rewrites the first "station N" in a message from Core (N the 0-based <paramref name="station"/>) to the
    /// workbench's number; the message is returned unchanged when it has no such words or no station.</summary>
    public static string Renumber(string message, int? station)
    {
        ArgumentNullException.ThrowIfNull(message);
        if (station is not { } i)
        {
            return message;
        }
        string core = "station " + i.ToString(CultureInfo.InvariantCulture);
        for (int at = message.IndexOf(core, StringComparison.Ordinal); at >= 0; at = message.IndexOf(core, at + 1, StringComparison.Ordinal))
        {
            int end = at + core.Length;
            if (end == message.Length || !char.IsAsciiDigit(message[end]))
            {
                return string.Concat(message.AsSpan(0, at), "station ", Of(i), message.AsSpan(end));
            }
        }
        return message;
    }
}
