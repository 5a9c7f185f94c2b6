using Terminal.Gui.ViewBase;

namespace RotorDrive.Tui.Sheets;

/// <summary>Keeps a row of a scrolling column of fields on screen, with one row of context above and below where there
/// is room (the rig sheet and the stress sheet's tolerance list).</summary>
internal static class RowScroll
{
    /// <summary>Scrolls the view's viewport so that a content row is visible.</summary>
    /// <param name="view">The scrolling view.</param>
    /// <param name="row">The content row to show, 0-based.</param>
    /// <param name="contentRows">Rows of content in the view.</param>
    public static void IntoView(View view, int row, int contentRows)
    {
        int height = view.Viewport.Height;
        if (height <= 0)
        {
            return;
        }
        int top = view.Viewport.Y;
        if (row < top + 1)
        {
            top = Math.Max(0, row - 1);
        }
        else if (row >= top + height - 1)
        {
            top = Math.Min(Math.Max(0, contentRows - height), row - height + 2);
        }
        if (top != view.Viewport.Y)
        {
            view.Viewport = view.Viewport with { Y = top };
        }
    }
}
