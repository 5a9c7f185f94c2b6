using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class CsvGridTests
{
    [Fact]
    public void Parse_FollowsRfc4180Quoting()
    {
        // Quoting rules from RFC 4180 (Shafranovich, 2005), section 2: quoted fields hold commas, doubled quotes and line breaks.
        var grid = CsvGrid.Parse("id,note\r\na,\"x, y\"\r\nb,\"say \"\"hi\"\"\"\nc,\"two\nlines\"\n");
        Assert.Equal(["id", "note"], grid.Headers);
        Assert.Equal(3, grid.Rows.Count);
        Assert.Equal("x, y", grid.Rows[0][1]);
        Assert.Equal("say \"hi\"", grid.Rows[1][1]);
        Assert.Equal("two\nlines", grid.Rows[2][1]);
    }

    [Fact]
    public void Wrap_KeepsEveryWord_WithinTheWidth()
    {
        string text = "  F2  save the rig (the previous file is kept as RIG.json.bak) and more words to wrap around";
        var lines = Wrap.Lines(text, 30);
        Assert.All(lines, l => Assert.True(l.Length <= 30, l));
        Assert.Equal(text.Split(' ', StringSplitOptions.RemoveEmptyEntries), string.Join(' ', lines).Split(' ', StringSplitOptions.RemoveEmptyEntries));
    }
}
