using RotorDrive.Tui.Sheets;

namespace RotorDrive.Tui.Shell;

/// <summary>The sheets of the workbench, in list order. Only sheets whose analysis exists are listed.</summary>
public static class SheetSet
{
    /// <summary>Creates every sheet for a context.</summary>
    public static IReadOnlyList<Sheet> Create(WorkbenchContext context) =>
    [
        new RigSheet(context),
        new StationsSheet(context),
        new LiftDragSheet(context),
        new RunningPointsSheet(context),
        new HoverYawSheet(context),
        new SpinupSheet(context),
        new EnduranceSheet(context),
        new ShortlistSheet(context),
        new StressSheet(context),
        new PartsSheet(context),
        new HelpSheet(context),
    ];
}
