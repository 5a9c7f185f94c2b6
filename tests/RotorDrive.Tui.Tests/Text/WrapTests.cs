using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class WrapTests
{
    [Fact]
    public void Wrap_KeepsEveryWord_WithinTheWidth()
    {
        string text = "  F2  save the rig (the previous file is kept as RIG.json.bak) and more words to wrap around";
        var lines = Wrap.Lines(text, 30);
        Assert.All(lines, l => Assert.True(l.Length <= 30, l));
        Assert.Equal(text.Split(' ', StringSplitOptions.RemoveEmptyEntries), string.Join(' ', lines).Split(' ', StringSplitOptions.RemoveEmptyEntries));
    }
}
