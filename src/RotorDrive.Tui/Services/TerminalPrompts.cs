using System.Collections.ObjectModel;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using RotorDrive.Tui.Text;

namespace RotorDrive.Tui.Services;

/// <summary>Questions as modal dialogs in the terminal.</summary>
public sealed class TerminalPrompts : IWorkbenchPrompts
{
    private readonly IApplication _app;

    /// <summary>Creates the prompts for an application.</summary>
    public TerminalPrompts(IApplication app)
    {
        _app = app ?? throw new ArgumentNullException(nameof(app));
    }

    /// <inheritdoc/>
    public int? Ask(string title, string message, IReadOnlyList<string> answers)
    {
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(80) };
        var text = new Label { X = 1, Y = 1, Width = Dim.Fill(1), Height = Dim.Auto(), Text = message };
        // Messages name files: underscores in them are not hotkey marks.
        LiteralText.Apply(text);
        dialog.Add(text);
        // The first answer is the safe one (Cancel): added last, it is the dialog's default and sits at the right.
        // The answer is taken from the button actually pressed; closing the dialog any other way answers nothing.
        int? chosen = null;
        Button? safe = null;
        for (int i = answers.Count - 1; i >= 0; i--)
        {
            int index = i;
            var button = new Button { Text = answers[i], IsDefault = i == 0 };
            if (i == 0)
            {
                safe = button;
            }
            button.Accepting += (_, e) =>
            {
                chosen = index;
                dialog.RequestStop();
                e.Handled = true;
            };
            dialog.AddButton(button);
        }
        FocusWhenShown(dialog, safe);
        _app.Run(dialog);
        return chosen;
    }

    /// <inheritdoc/>
    public string? AskPath(string title, string initialPath)
    {
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(90) };
        dialog.Add(new Label { X = 1, Y = 1, Text = "File (relative to the current folder or absolute):" });
        var field = new TextField { X = 1, Y = 2, Width = Dim.Fill(1), Text = initialPath };
        dialog.Add(field);
        bool ok = false;
        var cancel = new Button { Text = "Cancel" };
        cancel.Accepting += (_, e) =>
        {
            dialog.RequestStop();
            e.Handled = true;
        };
        var accept = new Button { Text = "OK", IsDefault = true };
        accept.Accepting += (_, e) =>
        {
            ok = true;
            dialog.RequestStop();
            e.Handled = true;
        };
        field.Accepting += (_, e) =>
        {
            ok = true;
            dialog.RequestStop();
            e.Handled = true;
        };
        dialog.AddButton(cancel);
        dialog.AddButton(accept);
        field.SetFocus();
        _app.Run(dialog);
        return ok && field.Text.Trim().Length > 0 ? field.Text.Trim() : null;
    }

    /// <inheritdoc/>
    public string? Choose(string title, IReadOnlyList<string> items, string? current, IReadOnlyList<string>? details = null)
    {
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(details is null ? 60 : 90), Height = Dim.Percent(80) };
        var list = new ListView { X = 1, Y = 1, Width = Dim.Fill(1), Height = Dim.Fill(1) };
        int idWidth = items.Count == 0 ? 0 : items.Max(i => i.Length);
        list.SetSource(new ObservableCollection<string>(details is null
            ? items
            : items.Select((item, k) => k < details.Count && details[k].Length > 0 ? item.PadRight(idWidth) + "  " + details[k] : item)));
        int index = current is null ? -1 : items.ToList().FindIndex(i => string.Equals(i, current, StringComparison.OrdinalIgnoreCase));
        if (index >= 0)
        {
            list.SetSelection(index, false);
        }
        string? chosen = null;
        list.Accepting += (_, e) =>
        {
            if (list.Value is { } i && i >= 0 && i < items.Count)
            {
                chosen = items[i];
            }
            dialog.RequestStop();
            e.Handled = true;
        };
        dialog.Add(list);
        var cancel = new Button { Text = "Cancel" };
        cancel.Accepting += (_, e) =>
        {
            dialog.RequestStop();
            e.Handled = true;
        };
        var use = new Button { Text = "Use", IsDefault = true };
        use.Accepting += (_, e) =>
        {
            if (list.Value is { } i && i >= 0 && i < items.Count)
            {
                chosen = items[i];
            }
            dialog.RequestStop();
            e.Handled = true;
        };
        dialog.AddButton(cancel);
        dialog.AddButton(use);
        list.SetFocus();
        _app.Run(dialog);
        return chosen;
    }

    // A dialog focuses its first button when it starts; move the focus to the safe one once it is up.
    private static void FocusWhenShown(Dialog dialog, View? view)
    {
        if (view is null)
        {
            return;
        }
        void OnRunning(object? sender, EventArgs e)
        {
            if (dialog.IsRunning)
            {
                dialog.IsRunningChanged -= OnRunning;
                view.SetFocus();
            }
        }
        dialog.IsRunningChanged += OnRunning;
    }
}
