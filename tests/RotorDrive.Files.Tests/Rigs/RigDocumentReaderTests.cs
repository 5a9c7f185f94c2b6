using RotorDrive.Files.Rigs;
using Xunit;

namespace RotorDrive.Files.Tests.Rigs;

public class RigDocumentReaderTests
{
    private const string File = "rig.json";

    private static RigDocumentReadResult Read(string text) => RigDocumentReader.Read(text, File);

    [Fact]
    public void Read_AcceptsCommentsAndTrailingCommas()
    {
        var result = Read("// a rig\n{\n  \"name\": \"r\", /* inline */\n  \"gap\": { \"design_mm\": 10, \"landed_mm\": 6, },\n}\n");
        Assert.Empty(result.Problems);
        Assert.Equal("r", result.Document!.Name);
        Assert.Equal(6, result.Document.Gap!.LandedMm);
    }

    [Fact]
    public void Read_ReportsASyntaxErrorWithItsLineAndColumn()
    {
        var result = Read("{\n  \"name\": \"r\",\n  \"ambient_c\": 2x\n}\n");
        Assert.Null(result.Document);
        var problem = Assert.Single(result.Problems);
        Assert.Equal((File, 3, 17, "$.ambient_c"), (problem.File, problem.Line, problem.Column, problem.Field));
        Assert.StartsWith(Messages.JsonSyntax(""), problem.Message);
    }

    [Fact]
    public void Read_ReportsAMissingCommaAtTheNextKey_NamingTheValueBeforeIt()
    {
        var result = Read("{\n  \"name\": \"r\"\n  \"ambient_c\": 20\n}\n");
        var problem = Assert.Single(result.Problems);
        Assert.Equal((3, 3, "$.name"), (problem.Line, problem.Column, problem.Field));
    }

    [Fact]
    public void Read_ReportsAnEmptyFile()
        => Assert.Equal([new InputProblem(File, 1, 1, "$", Messages.JsonSyntax("the file is empty"))], Read("  // nothing\n").Problems);

    [Fact]
    public void Read_ReportsARootThatIsNotAnObject()
        => Assert.Equal([new InputProblem(File, 1, 1, "$", Messages.WrongType("an object", "an array"))], Read("[1, 2]").Problems);

    [Fact]
    public void Read_ReportsUnknownKeysWithTheirPathAndLine_SuggestingTheClosestKnownKey()
    {
        var result = Read("{\n  \"name\": \"r\",\n  \"craft\": {\n    \"payload_kgs\": 5,\n    \"colour\": \"red\"\n  },\n  \"extra\": 1\n}");
        Assert.Equal(
            [
                new InputProblem(File, 4, 5, "$.craft.payload_kgs", Messages.UnknownKey("payload_kgs", "payload_kg")),
                new InputProblem(File, 5, 5, "$.craft.colour", Messages.UnknownKey("colour", null)),
                new InputProblem(File, 7, 3, "$.extra", Messages.UnknownKey("extra", null)),
            ],
            result.Problems);
    }

    [Fact]
    public void Read_ReportsUnknownKeysInsideStations()
    {
        var result = Read("{\"stations\": [ {\"x_mm\": 1}, {\"rotr\": \"a\"} ]}");
        Assert.Equal([new InputProblem(File, 1, 30, "$.stations[1].rotr", Messages.UnknownKey("rotr", "rotor"))], result.Problems);
    }

    [Fact]
    public void Read_ReportsADuplicateKey()
        => Assert.Equal([new InputProblem(File, 1, 15, "$.name", Messages.DuplicateKey("name"))], Read("{\"name\": \"a\", \"name\": \"b\"}").Problems);

    [Theory]
    [InlineData("{\"ambient_c\": \"20\"}", 1, 15, "$.ambient_c", "a number", "a string")]
    [InlineData("{\"name\": 5}", 1, 10, "$.name", "a string", "a number")]
    [InlineData("{\"plate\": [1]}", 1, 11, "$.plate", "an object", "an array")]
    [InlineData("{\"stations\": {}}", 1, 14, "$.stations", "an array", "an object")]
    [InlineData("{\"stations\": [3]}", 1, 15, "$.stations[0]", "an object", "a number")]
    [InlineData("{\"pack\": {\"count\": true}}", 1, 20, "$.pack.count", "a whole number", "true")]
    [InlineData("{\"gap\": {\"design_mm\": null}}", 1, 23, "$.gap.design_mm", "a number", "null")]
    public void Read_ReportsValuesOfTheWrongType(string json, int line, int column, string path, string expected, string found)
        => Assert.Equal([new InputProblem(File, line, column, path, Messages.WrongType(expected, found))], Read(json).Problems);

    [Fact]
    public void Read_ReportsAFractionalCount()
        => Assert.Equal([new InputProblem(File, 1, 20, "$.pack.count", Messages.JsonNotAnInteger(2.5))], Read("{\"pack\": {\"count\": 2.5}}").Problems);

    [Fact]
    public void Read_ReportsANumberTooLargeToRepresent()
        => Assert.Equal([new InputProblem(File, 1, 15, "$.ambient_c", Messages.NotFinite("1e999"))], Read("{\"ambient_c\": 1e999}").Problems);

    [Fact]
    public void Read_CountsColumnsInCharactersNotBytes()
    {
        // "é" is two bytes in UTF-8 but one character on screen.
        var result = Read("{\"name\": \"é\", \"bad\": 1}");
        Assert.Equal([new InputProblem(File, 1, 15, "$.bad", Messages.UnknownKey("bad", null))], result.Problems);
    }

    [Fact]
    public void Locations_FindKeysAndFallBackToTheirParent()
    {
        var result = Read("{\n  \"craft\": {\n    \"payload_kg\": 5\n  }\n}");
        Assert.Equal((3, 19), result.Locations.Find("$.craft.payload_kg"));
        Assert.Equal((2, 12), result.Locations.Find("$.craft.empty_mass_kg"));
        Assert.Equal((0, 0), RigSourceMap.Empty.Find("$.craft"));
    }
}
