using System.CommandLine;
using System.Text.RegularExpressions;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Cli.Tests;

public partial class HelpAndOutputPathTests
{
    public static TheoryData<string> Commands()
    {
        var data = new TheoryData<string>();
        foreach (var command in CliApp.BuildRoot().Subcommands)
        {
            data.Add(command.Name);
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(Commands))]
    public async Task Help_ShowsEachDefaultOnce_AndNoDotNetNames(string command)
    {
        var (code, output, _) = await CliRunner.RunAsync(command, "--help");
        Assert.Equal(ExitCodes.Ok, code);
        foreach (string row in output.Split('\n').Where(l => l.TrimStart().StartsWith('-')))
        {
            Assert.True(DefaultWord().Matches(row).Count <= 1, $"default given twice: {row}");
            Assert.DoesNotMatch(PascalDefault(), row);
        }
        Assert.DoesNotContain("RotorDrive.", output);
        Assert.DoesNotContain("System.", output);
    }

    [Fact]
    public void NoOption_TakesAnEnumType_SoHelpNeverShowsAMemberName()
    {
        var options = All(CliApp.BuildRoot()).ToList();
        Assert.NotEmpty(options);
        Assert.All(options, o => Assert.False((Nullable.GetUnderlyingType(o.ValueType) ?? o.ValueType).IsEnum, o.Name));
    }

    [Fact]
    public async Task Rank_By_ListsItsWords_AndShowsItsDefaultAsAWord()
    {
        var (_, output, _) = await CliRunner.RunAsync("rank", "--help");
        Assert.Matches(@"--by <runtime\|mass\|margin\|score>.*\[default: runtime\]", output);
    }

    [Fact]
    public async Task Ui_ShowsItsRigArgumentAsOptional()
    {
        var (_, output, _) = await CliRunner.RunAsync("ui", "--help");
        Assert.Contains(" ui [<rig>] [options]", output);
        Assert.Contains("Optional: the rig file", output);
    }

    [Theory]
    [InlineData("spinup", "--csv")]
    [InlineData("rank", "--csv")]
    [InlineData("endurance", "--plate-map")]
    [InlineData("load", "--plot")]
    [InlineData("report", "-o")]
    [InlineData("schema", "-o")]
    public async Task AnOutputPathThatIsAFolder_IsRefusedBeforeAnyWork_SayingItIsAFolder(string command, string option)
    {
        string folder = Directory.CreateTempSubdirectory("rotordrive-out-").FullName;
        try
        {
            string[] args = command == "schema" ? ["schema", "rig", option, folder] : [command, RepoPaths.DemoRig, option, folder];
            var (code, output, error) = await CliRunner.RunAsync(args);
            Assert.Equal(ExitCodes.BadInput, code);
            Assert.Contains(folder, error);
            Assert.Contains(Messages.PathIsFolder(), error);
            Assert.DoesNotContain("ranking", error);
            Assert.Equal("", output);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private static IEnumerable<Option> All(Command command)
        => command.Options.Concat(command.Subcommands.SelectMany(All));

    [GeneratedRegex("default", RegexOptions.IgnoreCase)]
    private static partial Regex DefaultWord();

    [GeneratedRegex(@"\[default: [A-Z][a-z]+[A-Z]?")]
    private static partial Regex PascalDefault();
}
