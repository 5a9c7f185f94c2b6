using Terminal.Gui.ViewBase;

namespace RotorDrive.Tui.Sheets;

/// <summary>Text drawn on a row by the view that holds it, not by a view of its own (see <see cref="FieldBinding"/>):
/// changing it asks that view to draw again. Shown literally: no hotkey marks, so underscores stay.</summary>
internal sealed class RowText(View owner, string text)
{
    private string _text = text;
    private bool _isError;

    /// <summary>The text (cut to its column's width when drawn).</summary>
    public string Text
    {
        get => _text;
        set => Set(ref _text, value);
    }

    /// <summary>True to draw in the error colours (beside the "!" mark the text carries).</summary>
    public bool IsError
    {
        get => _isError;
        set => Set(ref _isError, value);
    }

    private void Set<T>(ref T field, T value)
    {
        if (!EqualityComparer<T>.Default.Equals(field, value))
        {
            field = value;
            owner.SetNeedsDraw();
        }
    }
}
