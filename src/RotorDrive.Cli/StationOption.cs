using System.CommandLine;
using System.Globalization;
using RotorDrive.Core.Craft;

namespace RotorDrive.Cli;

/// <summary>The <c>--station</c> option: a station counted from 1, as every output counts them, or its name from the rig
/// file (<c>stations[].name</c>, any case).</summary>
public static class StationOption
{
    /// <summary>A new <c>--station</c> option.</summary>
    /// <param name="what">What the station is used for ("Station whose rotor to use").</param>
    public static Option<string?> Create(string what)
    {
        var option = new Option<string?>("--station")
        {
            Description = $"{what}: its number, counted from 1 as 'check' lists them, or its name; default 1.",
            HelpName = "N|NAME",
        };
        option.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<string?>() is { } text && int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int n) && n < 1)
            {
                r.AddError($"--station counts from 1; got {n.ToString(CultureInfo.InvariantCulture)}.");
            }
        });
        return option;
    }

    /// <summary>The station's number (from 1) that <paramref name="text"/> names in the rig; null after printing why
    /// it names none (the caller exits with <see cref="ExitCodes.BadInput"/>).</summary>
    /// <param name="rig">The rig.</param>
    /// <param name="text">The option's value; null means station 1.</param>
    /// <param name="command">The command's name, for the message.</param>
    /// <param name="error">Where the message goes.</param>
    public static int? Find(Rig rig, string? text, string command, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(rig);
        ArgumentNullException.ThrowIfNull(error);
        int count = rig.Stations.Count;
        string value = (text ?? "1").Trim();
        if (int.TryParse(value, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int number))
        {
            if (number >= 1 && number <= count)
            {
                return number;
            }
            error.WriteLine($"rotordrive {command}: error: --station {value}: the rig has {count} station(s), numbered 1 to {count}.");
            return null;
        }
        int index = rig.Stations.ToList().FindIndex(s => string.Equals(s.Name, value, StringComparison.OrdinalIgnoreCase));
        if (index >= 0)
        {
            return index + 1;
        }
        var names = rig.Stations.Select((s, i) => s.Name is null ? null : s.Label(i)).OfType<string>().ToList();
        error.WriteLine($"rotordrive {command}: error: --station {value}: no station of the rig has that name"
            + (names.Count == 0 ? $"; its stations have no names, give a number from 1 to {count}." : $"; named: {string.Join(", ", names)}."));
        return null;
    }
}
