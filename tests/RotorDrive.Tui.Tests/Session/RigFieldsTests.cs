using RotorDrive.Files.Rigs;
using RotorDrive.Tui.Session;
using Xunit;

namespace RotorDrive.Tui.Tests.Session;

public class RigFieldsTests
{
    [Fact]
    public void EveryRigSheetField_IsASchemaKey_WithItsLabelUnitAndDefault()
    {
        var fields = RigFields.Groups.SelectMany(g => g.Fields).Concat(RigFields.Station(2)).ToList();
        Assert.NotEmpty(fields);
        foreach (var field in fields)
        {
            var key = RigSchema.All.Single(k => k.JsonPath(2) == field.JsonPath);
            Assert.Equal(key.Label, field.Label);
            Assert.Equal(key.Unit == "1" ? "" : key.Unit, field.Unit);
            Assert.Equal(key.Required ? null : key.DefaultText(), field.DefaultText);
        }
    }

    [Fact]
    public void AStationField_StoresIntoItsStation_AndAMissingStationIsLeftAlone()
    {
        var doc = new RigDocument { Stations = [new RigStationSection(), new RigStationSection()] };
        var x = RigFields.Station(1).Single(f => f.JsonPath == "$.stations[1].x_mm");
        Assert.Null(x.Store(doc, "125.5"));
        Assert.Equal(125.5, doc.Stations[1].XMm);
        Assert.Null(doc.Stations[0].XMm);
        Assert.Equal("125.5", x.Show(doc));
        var gone = RigFields.Station(5).Single(f => f.JsonPath == "$.stations[5].x_mm");
        Assert.Null(gone.Store(doc, "1"));
        Assert.Equal(2, doc.Stations.Count);
    }

    [Fact]
    public void ASectionField_MakesItsSection_WhenTheDocumentHasNone()
    {
        var doc = new RigDocument();
        var cutoff = RigFields.Groups.SelectMany(g => g.Fields).Single(f => f.JsonPath == RigSchema.LimitCellCutoffV.JsonPath());
        Assert.Null(cutoff.Store(doc, "3.1"));
        Assert.Equal(3.1, doc.Limits!.CellCutoffV);
        Assert.Equal("3.3", cutoff.DefaultText);
    }
}
