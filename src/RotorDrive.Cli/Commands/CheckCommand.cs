using System.CommandLine;
using RotorDrive.Cli.Output;
using RotorDrive.Core.Craft;
using RotorDrive.Files;

namespace RotorDrive.Cli.Commands;

/// <summary><c>rotordrive check RIG.json [--json]</c>: reads the rig and its catalogs, reports every problem, and
/// summarises what it found (catalog counts, total mass, stations, spin balance).</summary>
public static class CheckCommand
{
    /// <summary>Builds the subcommand.</summary>
    public static Command Create()
    {
        var rig = CommonOptions.RigArgument();
        var json = CommonOptions.Json();
        var command = new Command("check", "Read a rig file and its catalogs, check every value, and summarise the rig.");
        command.Arguments.Add(rig);
        command.Options.Add(json);
        command.SetAction(parse => Run(
            parse.GetValue(rig)!,
            parse.GetValue(json),
            parse.InvocationConfiguration.Output,
            parse.InvocationConfiguration.Error));
        return command;
    }

    /// <summary>Runs the check; returns <see cref="ExitCodes.Ok"/> when clean, <see cref="ExitCodes.BadInput"/> otherwise.</summary>
    public static int Run(string rigPath, bool json, TextWriter output, TextWriter error)
    {
        var result = RigLoader.Load(rigPath);
        var report = BuildReport(result);
        if (json)
        {
            JsonOutput.Write(output, report);
        }
        else
        {
            WriteText(report, output);
        }
        ProblemReport.Print(result.Problems, error);
        return result.IsClean ? ExitCodes.Ok : ExitCodes.BadInput;
    }

    private static CheckReport BuildReport(RigLoadResult result)
    {
        var catalogs = new List<CatalogCount>();
        if (result.Catalog is { } c && result.CatalogPaths is { } p)
        {
            catalogs.Add(new CatalogCount("motors", p.Motors, c.Motors.Count));
            catalogs.Add(new CatalogCount("controllers", p.Controllers, c.Controllers.Count));
            catalogs.Add(new CatalogCount("packs", p.Packs, c.Packs.Count));
            catalogs.Add(new CatalogCount("cell_curves", p.CellCurves, c.CellCurves.Count));
            catalogs.Add(new CatalogCount("rotors", p.Rotors, c.Rotors.Count));
            catalogs.Add(new CatalogCount("plates", p.Plates, c.Plates.Count));
        }
        RigSummary? summary = result.Rig is { } rig ? Summarise(rig) : null;
        var problems = result.Problems.Select(x => new ProblemEntry(x.File, x.Line, x.Column, x.Field, x.Message)).ToList();
        return new CheckReport(result.RigPath, result.IsClean, catalogs, summary, problems);
    }

    private static RigSummary Summarise(Rig rig)
    {
        var stations = rig.Stations.Select((s, i) => new StationEntry(
            i + 1, s.Name, s.XM * 1000.0, s.YM * 1000.0, s.Spin == SpinDirection.Clockwise ? "cw" : "ccw",
            s.Rotor.Id, s.Motor?.Id, s.Controller?.Id)).ToList();
        int cw = rig.Stations.Count(s => s.Spin == SpinDirection.Clockwise);
        int ccw = rig.Stations.Count - cw;
        var (cgx, cgy) = rig.CentreOfGravity();
        return new RigSummary(
            rig.Name,
            rig.Plate.Material.Id,
            rig.Plate.ThicknessM * 1000.0,
            rig.DesignGapM * 1000.0,
            rig.LandedGapM * 1000.0,
            rig.TotalMassKg,
            rig.Body.EmptyMassKg,
            rig.Body.PayloadKg,
            rig.RotorsMassKg,
            rig.MotorsMassKg,
            rig.ControllersMassKg,
            rig.Packs?.MassKg ?? 0,
            cgx * 1000.0,
            cgy * 1000.0,
            rig.Stations.Count,
            cw,
            ccw,
            cw == ccw,
            rig.Stations.Count(s => s.Motor is null || s.Controller is null),
            rig.Packs is { } b ? new PackEntry(b.Pack.Id, b.Count, b.CellsSeries, b.CapacityAh) : null,
            stations);
    }

    private static void WriteText(CheckReport report, TextWriter o)
    {
        o.WriteLine($"Rig file: {report.RigFile}");
        if (report.Catalogs.Count > 0)
        {
            o.WriteLine();
            o.WriteLine(report.Ok ? "Catalogs:" : "Catalogs (valid rows):");
            var table = new TextTable(new TableColumn("catalog"), new TableColumn("rows", Alignment.Right), new TableColumn("file"));
            foreach (var c in report.Catalogs)
            {
                table.AddRow(c.Name, c.Count.ToString(System.Globalization.CultureInfo.InvariantCulture), c.File);
            }
            table.Write(o, 2);
        }
        if (report.Rig is { } r)
        {
            o.WriteLine();
            o.WriteLine($"Rig: {r.Name}");
            o.WriteLine($"  plate            {r.PlateMaterial}, {Numbers.Format(r.PlateThicknessMm, 1)} mm");
            o.WriteLine($"  air gap          design {Numbers.Format(r.DesignGapMm, 1)} mm, landed {Numbers.Format(r.LandedGapMm, 1)} mm");
            o.WriteLine($"  total mass       {Numbers.Format(r.TotalMassKg, 1)} kg (structure {Numbers.Format(r.StructureMassKg, 1)}, payload {Numbers.Format(r.PayloadMassKg, 1)}, "
                + $"rotors {Numbers.Format(r.RotorsMassKg, 1)}, motors {Numbers.Format(r.MotorsMassKg, 1)}, controllers {Numbers.Format(r.ControllersMassKg, 1)}, "
                + $"packs {Numbers.Format(r.PacksMassKg, 1)})");
            o.WriteLine($"  centre of mass   x {Numbers.Format(r.CgXMm, 1)} mm, y {Numbers.Format(r.CgYMm, 1)} mm");
            o.WriteLine($"  spin balance     {r.CwCount} cw, {r.CcwCount} ccw" + (r.SpinBalanced ? " (balanced)" : " (unbalanced: reaction torques will not cancel with equal throttles)"));
            o.WriteLine(r.Pack is { } pk
                ? $"  packs            {pk.Count} x {pk.Id} in parallel ({pk.CellsSeries}S, {Numbers.Format(pk.CapacityAh, 1)} Ah)"
                : "  packs            none assigned");
            if (r.StationsWithoutDrivetrain > 0)
            {
                o.WriteLine($"  {r.StationsWithoutDrivetrain} station(s) have no motor or controller assigned yet.");
            }
            o.WriteLine();
            o.WriteLine($"Stations ({r.StationCount}):");
            var table = new TextTable(
                new TableColumn("#", Alignment.Right), new TableColumn("x_mm", Alignment.Right), new TableColumn("y_mm", Alignment.Right),
                new TableColumn("spin"), new TableColumn("rotor"), new TableColumn("motor"), new TableColumn("controller"));
            foreach (var s in r.Stations)
            {
                table.AddRow(StationText.Cell(s.Station, s.Name), Numbers.Format(s.XMm, 0), Numbers.Format(s.YMm, 0),
                    s.Spin, s.Rotor, s.Motor ?? "-", s.Controller ?? "-");
            }
            table.Write(o, 2);
            o.WriteLine();
            o.WriteLine("Caution: strong magnets (fingers, pacemakers), spinning rotors and lithium packs; see the README's Safety section.");
        }
        o.WriteLine();
        o.WriteLine(report.Ok ? "No problems found." : $"{report.Problems.Count} problem(s) found; they are listed on stderr.");
    }

    private sealed record CheckReport(string RigFile, bool Ok, IReadOnlyList<CatalogCount> Catalogs, RigSummary? Rig, IReadOnlyList<ProblemEntry> Problems);

    private sealed record CatalogCount(string Name, string File, int Count);

    private sealed record ProblemEntry(string File, int Line, int Column, string Field, string Message);

    private sealed record PackEntry(string Id, int Count, int CellsSeries, double CapacityAh);

    private sealed record StationEntry(int Station, string? Name, double XMm, double YMm, string Spin, string Rotor, string? Motor, string? Controller);

    private sealed record RigSummary(
        string Name,
        string PlateMaterial,
        double PlateThicknessMm,
        double DesignGapMm,
        double LandedGapMm,
        double TotalMassKg,
        double StructureMassKg,
        double PayloadMassKg,
        double RotorsMassKg,
        double MotorsMassKg,
        double ControllersMassKg,
        double PacksMassKg,
        double CgXMm,
        double CgYMm,
        int StationCount,
        int CwCount,
        int CcwCount,
        bool SpinBalanced,
        int StationsWithoutDrivetrain,
        PackEntry? Pack,
        IReadOnlyList<StationEntry> Stations);
}
