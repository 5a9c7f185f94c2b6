using System.CommandLine;
using RotorDrive.Cli.Output;

namespace RotorDrive.Cli;

/// <summary>An option that takes one word of an enum, spelled as the JSON spells it (<c>runtime</c>, <c>common_duty</c>):
/// its help lists the words and shows the default as a word, never a .NET type or member name.</summary>
public static class WordOption
{
    /// <summary>A new option over the values of <typeparamref name="TEnum"/>.</summary>
    /// <param name="name">The option's name ("--by").</param>
    /// <param name="description">What it chooses; the help adds the words and the default.</param>
    /// <param name="defaultValue">The value when the option is not given.</param>
    public static Option<string> Create<TEnum>(string name, string description, TEnum defaultValue) where TEnum : struct, Enum
    {
        var words = Enum.GetValues<TEnum>().Select(v => JsonNames.Of(v)).ToArray();
        var option = new Option<string>(name)
        {
            Description = description,
            HelpName = string.Join('|', words),
            DefaultValueFactory = _ => JsonNames.Of(defaultValue),
        };
        option.AcceptOnlyFromAmong(words);
        return option;
    }

    /// <summary>The enum value of a word the option accepted.</summary>
    /// <param name="word">The word.</param>
    public static TEnum Parse<TEnum>(string word) where TEnum : struct, Enum
        => Enum.GetValues<TEnum>().First(v => JsonNames.Of(v) == word);
}
