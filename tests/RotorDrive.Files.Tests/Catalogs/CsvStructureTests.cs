using RotorDrive.Files.Catalogs;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

/// <summary>The structural rules every catalog file obeys: header, columns, quoting, field counts, ids.</summary>
public class CsvStructureTests
{
    private const string File = "plates.csv";
    private const string Header = "id,conductivity_ms_per_m,temp_coeff_per_k,density_kg_m3,specific_heat_j_per_kg_k";
    private const string Good = "cu,58,0.00393,8890,385";

    private static CatalogReadResult<PlateRow> Read(params string[] lines) => CatalogFormats.Plates.Read(string.Join("\n", lines) + "\n", File);

    [Theory]
    [InlineData("")]
    [InlineData("\n\n")]
    [InlineData("\uFEFF")]
    public void Read_ReportsAnEmptyFile(string text)
    {
        var result = CatalogFormats.Plates.Read(text, File);
        Assert.Equal([new InputProblem(File, 1, 0, "", Messages.EmptyCsv())], result.Problems);
    }

    [Fact]
    public void Read_AcceptsHeadersInAnyCaseAndOrder_AndAByteOrderMark()
    {
        var result = CatalogFormats.Plates.Read("\uFEFFDensity_KG_m3,ID,specific_heat_j_per_kg_k,temp_coeff_per_k,conductivity_ms_per_m\n8890,cu,385,0.00393,58\n", File);
        Assert.Empty(result.Problems);
        Assert.Equal(new PlateRow("cu", 58, 0.00393, 8890, 385), Assert.Single(result.Rows));
    }

    [Fact]
    public void Read_ReportsAMissingRequiredColumn_OnTheHeaderLine()
    {
        var result = Read("id,conductivity_ms_per_m,temp_coeff_per_k,density_kg_m3", "cu,58,0.00393,8890");
        Assert.Equal([new InputProblem(File, 1, 0, "specific_heat_j_per_kg_k", Messages.MissingColumn("specific_heat_j_per_kg_k"))], result.Problems);
        Assert.Empty(result.Rows);
    }

    [Fact]
    public void Read_ReportsAnUnknownColumn_WithoutASuggestionWhenNothingIsClose()
    {
        var result = Read(Header + ",supplier", Good + ",acme");
        Assert.Equal([new InputProblem(File, 1, 6, "supplier", Messages.UnknownColumn("supplier", null))], result.Problems);
    }

    [Fact]
    public void Read_ReportsAHeaderTypo_WithTheColumnItProbablyMeant()
    {
        var result = Read(Header.Replace("density_kg_m3", "densty_kg_m3"), Good);
        Assert.Equal(
            [
                new InputProblem(File, 1, 0, "density_kg_m3", Messages.MissingColumn("density_kg_m3")),
                new InputProblem(File, 1, 4, "densty_kg_m3", Messages.UnknownColumn("densty_kg_m3", "density_kg_m3")),
            ],
            result.Problems);
    }

    [Theory]
    [InlineData("note")]
    [InlineData("NOTE")]
    [InlineData("x_supplier")]
    [InlineData("X_Price_EUR")]
    public void Read_AllowsColumnsTheUserMarksAsTheirOwn(string column)
    {
        var result = Read(Header + "," + column, Good + ",anything at all");
        Assert.Empty(result.Problems);
        Assert.Single(result.Rows);
    }

    [Fact]
    public void Read_ReportsAColumnGivenTwice()
    {
        var result = Read(Header + ",ID", Good + ",cu");
        Assert.Equal([new InputProblem(File, 1, 6, "id", Messages.DuplicateColumn("id"))], result.Problems);
    }

    [Theory]
    [InlineData("cu,58,0.00393,8890", 4)]
    [InlineData("cu,58,0.00393,8890,385,7", 6)]
    public void Read_ReportsARowWithTheWrongNumberOfFields(string row, int fields)
    {
        var result = Read(Header, row, "al,35,0.004,2700,900");
        Assert.Equal([new InputProblem(File, 2, 0, "", Messages.FieldCount(5, fields))], result.Problems);
        Assert.Equal("al", Assert.Single(result.Rows).Id);
        Assert.Contains("cu", result.RejectedIds);
    }

    [Fact]
    public void Read_ReportsBrokenQuoting_AndReadsTheOtherRows()
    {
        var result = Read(Header, "\"cu\"x,58,0.00393,8890,385", "al,35,0.004,2700,900");
        Assert.Equal([new InputProblem(File, 2, 0, "", Messages.MalformedRow("text after a closing quote"))], result.Problems);
        Assert.Equal("al", Assert.Single(result.Rows).Id);
    }

    [Fact]
    public void Read_AcceptsQuotedFields()
    {
        var result = Read(Header + ",note", "\"cu\",\"58\",0.00393,8890,385,\"soft, annealed; \"\"C110\"\"\"");
        Assert.Empty(result.Problems);
        Assert.Equal("cu", Assert.Single(result.Rows).Id);
    }

    [Fact]
    public void Read_ReportsADuplicateId_NamingTheFirstLine_AndKeepsTheFirstRow()
    {
        var result = Read(Header, Good, "al,35,0.004,2700,900", "CU,59,0.00393,8890,385");
        Assert.Equal([new InputProblem(File, 4, 1, "id", Messages.DuplicateId("CU", 2))], result.Problems);
        Assert.Equal(58, result.Rows.Single(r => r.Id == "cu").ConductivityMsPerM);
        Assert.Equal([2, 3], result.Lines);
    }

    [Fact]
    public void Read_ReportsAnEmptyRequiredValue()
    {
        var result = Read(Header, "cu,58,,8890,385");
        Assert.Equal([new InputProblem(File, 2, 3, "temp_coeff_per_k", Messages.ValueRequired())], result.Problems);
    }

    [Theory]
    [InlineData("fifty", "fifty")]
    [InlineData("58,0", "58,0")]
    [InlineData("5 8", "5 8")]
    [InlineData("0x3A", "0x3A")]
    public void Read_ReportsTextThatIsNotANumber(string cell, string reported)
    {
        var result = Read(Header, $"cu,\"{cell}\",0.00393,8890,385");
        Assert.Equal([new InputProblem(File, 2, 2, "conductivity_ms_per_m", Messages.NotANumber(reported))], result.Problems);
    }

    [Theory]
    [InlineData("NaN")]
    [InlineData("Infinity")]
    [InlineData("-Infinity")]
    [InlineData("1e999")]
    public void Read_ReportsNaNAndInfinities(string cell)
    {
        var result = Read(Header, $"cu,58,0.00393,{cell},385");
        Assert.Equal([new InputProblem(File, 2, 4, "density_kg_m3", Messages.NotFinite(cell))], result.Problems);
    }

    [Fact]
    public void Read_ReportsEveryProblemOfTheFileInOneRun()
    {
        var result = Read(Header, "cu,x,0.00393,-1,385", "al,35,0.004,2700,", "ag,63,5,10490,235");
        Assert.Equal(
            [
                new InputProblem(File, 2, 2, "conductivity_ms_per_m", Messages.NotANumber("x")),
                new InputProblem(File, 2, 4, "density_kg_m3", Messages.MustBePositive(-1)),
                new InputProblem(File, 3, 5, "specific_heat_j_per_kg_k", Messages.ValueRequired()),
                new InputProblem(File, 4, 3, "temp_coeff_per_k", Messages.MustBeBetween(-0.01, 0.01, 5)),
            ],
            result.Problems);
        Assert.Empty(result.Rows);
        Assert.Equal(new HashSet<string> { "cu", "al", "ag" }, result.RejectedIds.ToHashSet());
    }

    [Fact]
    public void Read_GivesTheStartLineOfARecordThatSpansLines()
    {
        var result = Read(Header + ",note", "cu,58,0.00393,8890,385,\"two\nlines\"", "al,35,0.004,-2700,900,");
        Assert.Equal([new InputProblem(File, 4, 4, "density_kg_m3", Messages.MustBePositive(-2700))], result.Problems);
    }

    [Fact]
    public void Read_CountsBlankLinesInLineNumbers()
    {
        var result = Read(Header, "", Good, "", "al,35,0.004,2700,-900");
        Assert.Equal([new InputProblem(File, 5, 5, "specific_heat_j_per_kg_k", Messages.MustBePositive(-900))], result.Problems);
    }
}
