using RotorDrive.Cli.Output;
using Xunit;

namespace RotorDrive.Cli.Tests.Output;

public class TextTableTests
{
    [Fact]
    public void Write_PadsColumnsAndAlignsNumbersRight()
    {
        var table = new TextTable(new TableColumn("motor"), new TableColumn("current_a", Alignment.Right), new TableColumn("note"));
        table.AddRow("or600-kv100", Numbers.Format(31.26, 1), "ok");
        table.AddRow("m", Numbers.Format(double.NaN, 1), "");
        Assert.Equal(
            "motor        current_a  note\n" +
            "-----------  ---------  ----\n" +
            "or600-kv100       31.3  ok\n" +
            "m                  n/a  \n",
            table.ToString().ReplaceLineEndings("\n"));
    }

    [Fact]
    public void AddRow_RejectsTheWrongNumberOfCells()
    {
        var table = new TextTable(new TableColumn("a"), new TableColumn("b"));
        Assert.Throws<ArgumentException>(() => table.AddRow("only one"));
    }
}
