using RotorDrive.Files.Json;
using RotorDrive.Files.Rigs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Json;

public class JsonCommentsTests
{
    // Comments in JSON are the JSON5 / JSONC convention (json5.org; System.Text.Json's JsonCommentHandling.Allow reads
    // them as tokens): the rig file accepts them, so a save must not drop them.
    [Fact]
    public void TheDemoRigsComments_SurviveAReadWriteRoundTrip_AndTheDocumentReadsTheSame()
    {
        string original = File.ReadAllText(RepoPaths.DemoRig);
        var read = RigDocumentReader.Read(original, "demo-rig.json");
        string rewritten = RigDocumentWriter.Write(read.Document!);
        Assert.DoesNotContain("//", rewritten);

        string carried = JsonComments.Carry(original, rewritten);
        var comments = original.Split('\n').Select(l => l.Trim()).Where(l => l.StartsWith("//", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(comments);
        var kept = carried.Split('\n').Select(l => l.Trim()).ToList();
        Assert.All(comments, c => Assert.Contains(c, kept));
        // The header comment stays at the top, and the comment above the tolerances stays above that key.
        Assert.StartsWith(comments[0], carried);
        int tolerances = kept.FindIndex(l => l.StartsWith("\"tolerances\"", StringComparison.Ordinal));
        Assert.StartsWith("//", kept[tolerances - 1]);
        Assert.Equal(RigDocumentWriter.Write(read.Document!), RigDocumentWriter.Write(RigDocumentReader.Read(carried, "demo-rig.json").Document!));
    }

    [Fact]
    public void ACommentAfterAValue_StaysOnItsKeysLine_AndOneWhoseKeyIsGone_MovesToTheEnd()
    {
        const string original = "{\n  // the floor\n  \"a\": 1, // metres\n  \"b\": [\n    /* first */\n    2\n  ],\n  \"gone\": 3 // old\n}\n";
        const string rewritten = "{\n    \"b\": [\n        2\n    ],\n    \"a\": 1\n}\n";
        string carried = JsonComments.Carry(original, rewritten);
        Assert.Equal("{\n    \"b\": [\n        /* first */\n        2\n    ],\n    // the floor\n    \"a\": 1 // metres\n}\n// old\n", carried);
        Assert.Equal(rewritten, JsonComments.Carry("{\"a\": 1}", rewritten));
        Assert.Equal(rewritten, JsonComments.Carry("not json", rewritten));
    }
}
