using Terminal.Gui.Input;
using RotorDrive.Core.Craft;
using RotorDrive.Tui.Charts;
using RotorDrive.Tui.Shell;

namespace RotorDrive.Tui.Sheets;

/// <summary>A sheet drawn on one <see cref="ChartPanel"/> whose figures follow the rig: it recomputes (off the UI thread,
/// in the derived sheet) when the rig changes or one of its what-if inputs does, F5 recomputes at once, F6 writes the
/// chart pages to an SVG or PNG file, F7 turns the chart pages, and an invalid rig clears the charts with a line saying so.</summary>
public abstract class ChartSheet : Sheet
{
    private readonly string _needsValidRig;
    private int _seenRevision = -1;

    /// <summary>Creates the sheet with its panel (the derived constructor adds the what-if inputs).</summary>
    /// <param name="context">The workbench context.</param>
    /// <param name="name">The sheet's name.</param>
    /// <param name="readoutLines">Lines of readout text above the chart.</param>
    /// <param name="needsValidRig">What the sheet computes, in words, for the line shown when the rig is invalid
    /// ("the load needs", "running points need").</param>
    protected ChartSheet(WorkbenchContext context, string name, int readoutLines, string needsValidRig)
        : base(context, name)
    {
        _needsValidRig = needsValidRig;
        Panel = new ChartPanel(readoutLines);
        Panel.InputsChanged += (_, _) => Recompute(immediately: false);
        Add(Panel);
    }

    /// <summary>The chart panel.</summary>
    internal ChartPanel Panel { get; }

    /// <inheritdoc/>
    public override void Refresh()
    {
        var rig = Context.Session.Rig;
        if (rig is null)
        {
            Panel.Readout = $"! The rig has problems (see Stations); {_needsValidRig} a valid rig.";
            Panel.ShowPages(null);
            ClearShown();
            return;
        }
        if (_seenRevision != Context.Session.Revision)
        {
            _seenRevision = Context.Session.Revision;
            OnRigChanged(rig);
            Recompute(immediately: Arriving);
        }
    }

    /// <inheritdoc/>
    public override bool HandleKey(Key key)
    {
        if (key == Key.F7)
        {
            Panel.NextPage();
            return true;
        }
        if (key == Key.F5)
        {
            Recompute(immediately: true);
            return true;
        }
        if (key == Key.F6)
        {
            ChartFile.Export(Context, Panel.Pages, SheetName);
            return true;
        }
        return false;
    }

    /// <summary>Forgets the figures shown (the rig became invalid).</summary>
    protected abstract void ClearShown();

    /// <summary>Called once per rig revision before recomputing, e.g. to reset what-if inputs to the rig's own values.</summary>
    /// <param name="rig">The rig.</param>
    protected virtual void OnRigChanged(Rig rig)
    {
    }

    /// <summary>Recomputes the sheet's figures from the rig and its inputs.</summary>
    /// <param name="immediately">True to start without the debounce delay.</param>
    protected abstract void Recompute(bool immediately);
}
