namespace RotorDrive.Tui.Services;

/// <summary>Questions the workbench asks the user (modal dialogs in the terminal; scripted answers in tests).</summary>
public interface IWorkbenchPrompts
{
    /// <summary>Asks a question with a few answers.</summary>
    /// <param name="title">Short title.</param>
    /// <param name="message">The question in words.</param>
    /// <param name="answers">The answers offered, first is the default.</param>
    /// <returns>The index of the chosen answer, or null when the user closed the question without answering.</returns>
    int? Ask(string title, string message, IReadOnlyList<string> answers);

    /// <summary>Asks for a file path.</summary>
    /// <param name="title">Short title ("Open rig", "Save rig as").</param>
    /// <param name="initialPath">The path shown first.</param>
    /// <returns>The path typed, or null when cancelled.</returns>
    string? AskPath(string title, string initialPath);

    /// <summary>Asks the user to pick one of a list.</summary>
    /// <param name="title">Short title.</param>
    /// <param name="items">The choices.</param>
    /// <param name="current">The current value (selected first when in the list).</param>
    /// <param name="details">A one-line summary beside each item (same order), or null for none.</param>
    /// <returns>The chosen item, or null when cancelled.</returns>
    string? Choose(string title, IReadOnlyList<string> items, string? current, IReadOnlyList<string>? details = null);
}
