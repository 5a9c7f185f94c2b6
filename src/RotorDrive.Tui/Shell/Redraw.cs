using Terminal.Gui.ViewBase;

namespace RotorDrive.Tui.Shell;

/// <summary>Sets a view's text, visibility or width only when the new value differs. Assigning a width, even an equal
/// one, lays the window out again and redraws every view in it; the progress lines are set four times a second during a
/// long run, and that redraw took the UI thread's time from the keys (issue 15 item 1; <c>RedrawTests</c> counts the
/// views a progress tick draws). Visibility and text go through here too, so a line that did not change costs nothing.</summary>
internal static class Redraw
{
    /// <summary>Sets the text unless it is already that.</summary>
    public static void Text(View view, string text)
    {
        if (!string.Equals(view.Text, text, StringComparison.Ordinal))
        {
            view.Text = text;
        }
    }

    /// <summary>Shows or hides the view unless it already is.</summary>
    public static void Visible(View view, bool visible)
    {
        if (view.Visible != visible)
        {
            view.Visible = visible;
        }
    }

    /// <summary>Sets the width unless it is already an equal one.</summary>
    public static void Width(View view, Dim width)
    {
        if (!Equals(view.Width, width))
        {
            view.Width = width;
        }
    }
}
