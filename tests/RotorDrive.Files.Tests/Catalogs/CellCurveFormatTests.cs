using RotorDrive.Files.Catalogs;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

public class CellCurveFormatTests
{
    private const string File = "cell_curves.csv";

    private static CatalogReadResult<CellCurvePoint> Read(params string[] rows)
        => CatalogFormats.CellCurves.Read("chemistry,soc_pct,ocv_v\n" + string.Join("\n", rows) + "\n", File);

    [Fact]
    public void Read_GroupsPointsIntoOneCurvePerChemistry_WithSocAsAFraction()
    {
        var result = Read("lipo,0,3.3", "lipo,50,3.8", "lipo,100,4.2", "lifepo4,0,2.5", "lifepo4,100,3.45");
        Assert.Empty(result.Problems);
        var curves = CellCurveFormat.ToCurves(result.Rows);
        Assert.Equal(["lipo", "lifepo4"], curves.Select(c => c.Chemistry));
        Assert.Equal([0.0, 0.5, 1.0], curves[0].SocFraction);
        // Linear interpolation between (0.5, 3.8) and (1.0, 4.2) at 0.75 is 4.0.
        Assert.Equal(4.0, curves[0].OcvAt(0.75), 12);
    }

    [Fact]
    public void Read_RejectsASocOutsideZeroToHundred()
    {
        var result = Read("lipo,0,3.3", "lipo,120,4.2");
        Assert.Contains(new InputProblem(File, 3, 2, "soc_pct", Messages.MustBeBetween(0, 100, 120)), result.Problems);
    }

    [Fact]
    public void Read_RejectsAStateOfChargeThatDoesNotIncrease()
    {
        var result = Read("lipo,0,3.3", "lipo,60,3.9", "lipo,60,3.95", "lipo,100,4.2");
        Assert.Equal([new InputProblem(File, 4, 2, "soc_pct", Messages.SocNotIncreasing("lipo", 60, 60))], result.Problems);
        Assert.Empty(result.Rows);
        Assert.Contains("lipo", result.RejectedIds);
    }

    [Fact]
    public void Read_RejectsAVoltageThatFallsAsChargeRises()
    {
        var result = Read("liion,0,3.0", "liion,50,3.8", "liion,60,3.7", "liion,100,4.2");
        Assert.Equal([new InputProblem(File, 4, 3, "ocv_v", Messages.OcvDecreasing("liion", 3.8, 3.7))], result.Problems);
    }

    [Fact]
    public void Read_AcceptsAFlatStretchOfVoltage()
    {
        // LiFePO4 cells are nearly flat over most of their range; equal voltages are allowed.
        var result = Read("lifepo4,0,2.5", "lifepo4,40,3.28", "lifepo4,50,3.28", "lifepo4,100,3.45");
        Assert.Empty(result.Problems);
    }

    [Fact]
    public void Read_RejectsACurveWithOnePoint()
    {
        var result = Read("lipo,0,3.3", "lipo,100,4.2", "nimh,50,1.2");
        Assert.Equal([new InputProblem(File, 4, 1, "chemistry", Messages.CurveTooShort("nimh", 1))], result.Problems);
        Assert.Equal(2, result.Rows.Count);
    }

    [Fact]
    public void Read_RejectsAChemistrySplitIntoTwoBlocks()
    {
        var result = Read("lipo,0,3.3", "liion,0,3.0", "liion,100,4.2", "lipo,100,4.2");
        Assert.Equal([new InputProblem(File, 5, 1, "chemistry", Messages.CurveNotContiguous("lipo"))], result.Problems);
    }

    [Fact]
    public void Read_DropsAWholeCurveWhenOneOfItsRowsIsBad_WithoutReportingItTwice()
    {
        var result = Read("lipo,0,3.3", "lipo,50,x", "lipo,100,4.2");
        Assert.Equal([new InputProblem(File, 3, 3, "ocv_v", Messages.NotANumber("x"))], result.Problems);
        Assert.Empty(result.Rows);
    }
}
