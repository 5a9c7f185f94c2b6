using Terminal.Gui.ViewBase;

namespace RotorDrive.Tui.Shell;

/// <summary>Sets a view's text, visibility or width only when the new value differs: assigning any of them, even the same
/// value, marks the view for layout, and a layout redraws the whole window. The progress lines change several times a
/// second during a long run; with these only the lines whose text changed are drawn again (issue 15 item 1).</summary>
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
