using RotorDrive.Tui.Text;
using Xunit;

namespace RotorDrive.Tui.Tests.Text;

public class NaturalOrderTests
{
    [Fact]
    public void Ids_SortByTheValueOfTheirNumbers_NotCharacterByCharacter()
    {
        // The example: kv60 before kv100 (ordinal order puts "kv100" first).
        string[] ids = ["kv100", "KV60", "kv60-b", "esc-200a", "esc-40a", "kv9", "kv060x"];
        Assert.Equal(["esc-40a", "esc-200a", "kv9", "KV60", "kv60-b", "kv060x", "kv100"], ids.OrderBy(s => s, NaturalOrder.Instance).ToArray());
    }
}
