using System.Text.RegularExpressions;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

/// <summary>Spreadsheets in locales with a decimal comma export CSV with semicolons between fields (and a comma in
/// numbers); such a file, and a decimal comma in the rig file, get one message that says what happened and how to fix it.</summary>
public partial class LocaleExportTests
{
    private static string DemoMotors => File.ReadAllText(Path.Combine(RepoPaths.Catalogs, "motors.csv"));

    // The export a spreadsheet makes in such a locale: ';' between fields, ',' as decimal separator.
    private static string AsLocaleExport(string csv, char separator)
        => DecimalDot().Replace(csv.Replace(',', separator), "$1,$2");

    [Theory]
    [InlineData(';', "semicolons")]
    [InlineData('\t', "tabs")]
    public void ACatalogWithAnotherSeparator_GetsOneMessage_ThatSaysSoAndHowToExport(char separator, string words)
    {
        var result = CatalogFormats.Motors.Read(AsLocaleExport(DemoMotors, separator), "motors.csv");
        var problem = Assert.Single(result.Problems);
        Assert.Equal(new InputProblem("motors.csv", 1, 0, "", Messages.CsvWrongSeparator(words)), problem);
        Assert.Contains("commas", problem.Message);
        Assert.Empty(result.Rows);
    }

    [Fact]
    public void ARigWhoseMotorCatalogIsASemicolonExport_HasThatOneProblem_AndNoUnknownMotorIds()
    {
        using var temp = new TempRig();
        File.WriteAllText(temp.PathOf("motors.csv"), AsLocaleExport(DemoMotors, ';'));
        var loaded = RigLoader.Load(temp.DemoRig);
        var problem = Assert.Single(loaded.Problems);
        Assert.Equal(Messages.CsvWrongSeparator("semicolons"), problem.Message);
    }

    [Theory]
    [InlineData("{ \"gap\": { \"design_mm\": 10,5, \"landed_mm\": 6 } }", "10,5", 1, 25)]
    [InlineData("{\n  \"plate\": { \"thickness_mm\": 12,75 }\n}", "12,75", 2, 30)]
    [InlineData("{ \"ambient_c\": -3,5 , \"name\": \"r\" }", "-3,5", 1, 16)]
    public void ADecimalCommaInTheRigFile_IsNamed(string json, string number, int line, int column)
    {
        var problem = Assert.Single(RigDocumentReader.Read(json, "rig.json").Problems);
        Assert.Equal((line, column, Messages.JsonDecimalComma(number)), (problem.Line, problem.Column, problem.Message));
        Assert.Contains(number.Replace(',', '.'), problem.Message);
    }

    [Fact]
    public void AMissingQuoteAfterAComma_IsStillASyntaxError()
    {
        var problem = Assert.Single(RigDocumentReader.Read("{ \"a_c\": 1, b: 2 }", "rig.json").Problems);
        Assert.StartsWith(Messages.JsonSyntax(""), problem.Message);
    }

    [GeneratedRegex(@"(\d)\.(\d)")]
    private static partial Regex DecimalDot();
}
