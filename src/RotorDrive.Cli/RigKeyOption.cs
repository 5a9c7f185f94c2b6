using System.CommandLine;
using RotorDrive.Files.Rigs;

namespace RotorDrive.Cli;

/// <summary>Command-line options that stand in for a rig key for one run (<c>--gap-mm</c> for <c>gap.design_mm</c>,
/// <c>--payload-kg</c>, <c>--plate-temp-c</c>): their range and unit come from the rig file's schema, so a value the
/// rig file refuses is refused on the command line with the same rule.</summary>
public static class RigKeyOption
{
    /// <summary>A new option mirroring <paramref name="key"/>.</summary>
    /// <param name="name">The option's name ("--gap-mm").</param>
    /// <param name="key">The rig key it stands in for.</param>
    /// <param name="what">What the value is, for the help ("Air gap between magnet face and plate").</param>
    /// <param name="helpName">The value's placeholder in the help ("G").</param>
    public static Option<double?> Create(string name, RigKey key, string what, string helpName)
    {
        ArgumentNullException.ThrowIfNull(key);
        var option = new Option<double?>(name)
        {
            Description = $"{what}, {key.Unit}, {key.RangeText()}; default the rig's {key.Name}.",
            HelpName = helpName,
        };
        option.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<double?>() is { } value && key.Rule?.Check(value) is { } message)
            {
                r.AddError($"{name} {message} (the range of the rig's {key.Name}).");
            }
        });
        return option;
    }
}
