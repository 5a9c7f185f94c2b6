using Terminal.Gui.ViewBase;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>A page of the workbench shown to the right of the sheet list.</summary>
public abstract class Sheet : View
{
    /// <summary>Creates the sheet filling its frame.</summary>
    protected Sheet(WorkbenchContext context, string name)
    {
        Context = context;
        SheetName = name;
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
    }

    /// <summary>The name in the sheet list.</summary>
    public string SheetName { get; }

    /// <summary>Keys this sheet adds, for the key-hint line ("" when none).</summary>
    public virtual string KeyHints => "";

    /// <summary>The shared context.</summary>
    protected WorkbenchContext Context { get; }

    /// <summary>What quitting would lose, in words ("the stress run's 50000 samples"), or null when the sheet holds no result
    /// of a long run and none is running.</summary>
    public virtual string? LongRunResults => null;

    /// <summary>Called (on the UI thread) when the sheet is shown and whenever the rig changes while it is shown.</summary>
    public abstract void Refresh();

    /// <summary>Shows the sheet's current state on arrival: <see cref="Refresh"/> with <see cref="Arriving"/> true.</summary>
    public void Arrive()
    {
        Arriving = true;
        try
        {
            Refresh();
        }
        finally
        {
            Arriving = false;
        }
    }

    /// <summary>True while <see cref="Refresh"/> runs because the sheet is being shown, false when it answers an edit. A
    /// sheet that recomputes on a rig it has not seen starts at once on arrival: the debounce delay is for bursts of
    /// edits, and a visit is not one (it made a first visit during a long run wait a third of a second for nothing).</summary>
    protected bool Arriving { get; private set; }

    /// <summary>Handles a sheet-specific key; true when handled.</summary>
    public virtual bool HandleKey(Terminal.Gui.Input.Key key) => false;
}
