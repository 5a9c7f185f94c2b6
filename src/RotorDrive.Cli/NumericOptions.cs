using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;

namespace RotorDrive.Cli;

/// <summary>One parser for every numeric option of every command: the invariant culture with a dot as decimal separator
/// (a comma is refused with the hint the file readers give, never read as a thousands separator), and a one-line
/// message, exit 2, for a value that is not a number.</summary>
public static class NumericOptions
{
    /// <summary>Gives every numeric option under <paramref name="command"/> (recursively) the invariant parser, and lets its
    /// range checks run only on a value that parsed.</summary>
    /// <param name="command">The root command.</param>
    public static void Apply(Command command)
    {
        foreach (var option in command.Options)
        {
            switch (option)
            {
                case Option<double> real:
                    real.CustomParser = r => Real(r) ?? 0.0;
                    Guard(real);
                    break;
                case Option<double?> optionalReal:
                    optionalReal.CustomParser = Real;
                    Guard(optionalReal);
                    break;
                case Option<int> integer:
                    integer.CustomParser = r => Integer(r) ?? 0;
                    Guard(integer);
                    break;
                case Option<int?> optionalInteger:
                    optionalInteger.CustomParser = Integer;
                    Guard(optionalInteger);
                    break;
            }
        }
        foreach (var sub in command.Subcommands)
        {
            Apply(sub);
        }
    }

    /// <summary>Reads a real number the way the rig and catalog readers do: invariant culture, dot as decimal separator,
    /// no thousands separators; null with a reason otherwise.</summary>
    /// <param name="text">The text.</param>
    /// <param name="value">The number when it parses.</param>
    /// <param name="reason">Why it does not, or null.</param>
    public static bool TryReal(string text, out double value, out string? reason)
    {
        reason = null;
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value))
        {
            return true;
        }
        reason = Files.Messages.NotANumber(text);
        return false;
    }

    private static double? Real(ArgumentResult result)
    {
        if (result.Tokens.Count == 0)
        {
            return null;
        }
        string text = result.Tokens[0].Value;
        if (TryReal(text, out double value, out string? reason))
        {
            return value;
        }
        result.AddError($"{Name(result)}: {reason}.");
        return null;
    }

    private static int? Integer(ArgumentResult result)
    {
        if (result.Tokens.Count == 0)
        {
            return null;
        }
        string text = result.Tokens[0].Value;
        if (int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int value))
        {
            return value;
        }
        result.AddError($"{Name(result)}: '{text}' is not a whole number (digits only, no separators, e.g. 2000).");
        return null;
    }

    private static string Name(ArgumentResult result) => result.Parent is OptionResult o ? o.Option.Name : result.Argument.Name;

    // A range check reads the value; after a parse error there is none to read, and the parse error already says why.
    private static void Guard(Option option)
    {
        var checks = option.Validators.ToList();
        option.Validators.Clear();
        foreach (var check in checks)
        {
            option.Validators.Add(r =>
            {
                if (r.Tokens.Count > 0 && !Parses(option, r.Tokens[0].Value))
                {
                    return;
                }
                check(r);
            });
        }
    }

    private static bool Parses(Option option, string text) => option is Option<int> or Option<int?>
        ? int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out _)
        : TryReal(text, out _, out _);
}
