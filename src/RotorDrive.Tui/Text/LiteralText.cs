using System.Text;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace RotorDrive.Tui.Text;

/// <summary>Makes views show their text literally: an underscore in a path, file name or column name
/// (<c>cell_curves.csv</c>, <c>/tmp/tui_save</c>) is not taken as a hotkey mark and dropped.</summary>
public static class LiteralText
{
    // Terminal.Gui's documented way to turn hotkey marks off: a specifier that never occurs in text.
    private static readonly Rune NoSpecifier = (Rune)0xFFFF;

    /// <summary>Turns hotkey marks off in a view, every view inside it, and every view added to any of them later.</summary>
    /// <param name="view">The root view.</param>
    public static void Apply(View view)
    {
        ArgumentNullException.ThrowIfNull(view);
        if (view.HotKeySpecifier != NoSpecifier)
        {
            string text = view.Text, title = view.Title;
            view.HotKeySpecifier = NoSpecifier;
            // Re-set so the text is formatted again without the mark (labels only: a field's text is the user's).
            view.Title = title;
            if (view is Label)
            {
                view.Text = text;
            }
            view.SubViewAdded += (_, e) =>
            {
                if (e.SubView is { } added)
                {
                    Apply(added);
                }
            };
        }
        foreach (var sub in view.SubViews.ToList())
        {
            Apply(sub);
        }
    }
}
