using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Files.Catalogs;
using RotorDrive.Files.Tests.Support;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

/// <summary>Laws of the catalog formats: a written catalog reads back equal; damaged text never crashes a reader.</summary>
public class CatalogPropertyTests
{
    private const int FuzzCases = 10_000;

    private static void RoundTrips<T>(CatalogFormat<T> format, Gen<List<T>> rows) where T : notnull
    {
        var property = Prop.ForAll(rows.ToArbitrary(), list =>
        {
            var result = format.Read(format.Write(list), format.FileName);
            return result.Problems.Count == 0 && result.Rows.SequenceEqual(list);
        });
        Check.One(Config.QuickThrowOnFailure.WithMaxTest(300), property);
    }

    [Fact]
    public void Motors_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.Motors, CatalogGenerators.Motors);

    [Fact]
    public void Controllers_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.Controllers, CatalogGenerators.Controllers);

    [Fact]
    public void Packs_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.Packs, CatalogGenerators.Packs);

    [Fact]
    public void CellCurves_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.CellCurves, CatalogGenerators.CellCurves);

    [Fact]
    public void Rotors_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.Rotors, CatalogGenerators.Rotors);

    [Fact]
    public void Plates_WrittenThenRead_AreEqual() => RoundTrips(CatalogFormats.Plates, CatalogGenerators.Plates);

    private static void NeverCrashes<T>(CatalogFormat<T> format) where T : notnull
    {
        // The first dozen lines of the demo file: mutations of a short file reach the same code paths faster.
        string valid = string.Join("\n", File.ReadLines(Path.Combine(RepoPaths.Catalogs, format.FileName)).Take(12)) + "\n";
        int cases = 0;
        var property = Prop.ForAll(CatalogGenerators.Damaged(valid).ToArbitrary(), text =>
        {
            cases++;
            var result = format.Read(text, format.FileName);
            // CR, LF and CRLF each end a line, as in the CSV reader and in editors.
            int lines = System.Text.RegularExpressions.Regex.Split(text, "\r\n|\r|\n").Length;
            Assert.Equal(result.Rows.Count, result.Lines.Count);
            foreach (var p in result.Problems)
            {
                Assert.True(p.File == format.FileName && p.Line >= 0 && p.Line <= lines && p.Column >= 0 && p.Message.Length > 0, $"bad problem {p} (text has {lines} lines)");
            }
            Assert.True(result.Rows.Count <= lines, $"{result.Rows.Count} rows from {lines} lines");
            return true;
        });
        Check.One(Config.QuickThrowOnFailure.WithMaxTest(FuzzCases).WithQuietOnSuccess(true), property);
        Assert.True(cases >= FuzzCases, $"only {cases} cases ran");
    }

    [Fact]
    public void Motors_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.Motors);

    [Fact]
    public void Controllers_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.Controllers);

    [Fact]
    public void Packs_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.Packs);

    [Fact]
    public void CellCurves_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.CellCurves);

    [Fact]
    public void Rotors_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.Rotors);

    [Fact]
    public void Plates_DamagedText_NeverCrashesTheReader() => NeverCrashes(CatalogFormats.Plates);
}
