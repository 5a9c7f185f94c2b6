using System.Collections.ObjectModel;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

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
        dialog.Add(new Label { X = 1, Y = 1, Width = Dim.Fill(1), Height = Dim.Auto(), Text = message });
        foreach (var answer in answers)
        {
            dialog.AddButton(new Button { Text = answer });
        }
        _app.Run(dialog);
        return dialog.Result is { } r && r >= 0 && r < answers.Count ? r : null;
    }

    /// <inheritdoc/>
    public string? AskPath(string title, string initialPath)
    {
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(90) };
        dialog.Add(new Label { X = 1, Y = 1, Text = "File (relative to the current folder or absolute):" });
        var field = new TextField { X = 1, Y = 2, Width = Dim.Fill(1), Text = initialPath };
        dialog.Add(field);
        dialog.AddButton(new Button { Text = "OK", IsDefault = true });
        dialog.AddButton(new Button { Text = "Cancel" });
        field.SetFocus();
        _app.Run(dialog);
        return dialog.Result == 0 && field.Text.Trim().Length > 0 ? field.Text.Trim() : null;
    }

    /// <inheritdoc/>
    public string? Choose(string title, IReadOnlyList<string> items, string? current)
    {
        using var dialog = new Dialog { Title = title, Width = Dim.Percent(60), Height = Dim.Percent(80) };
        var list = new ListView { X = 1, Y = 1, Width = Dim.Fill(1), Height = Dim.Fill(1) };
        list.SetSource(new ObservableCollection<string>(items));
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
        dialog.AddButton(new Button { Text = "Use", IsDefault = true });
        dialog.AddButton(new Button { Text = "Cancel" });
        list.SetFocus();
        _app.Run(dialog);
        if (chosen is null && dialog.Result == 0 && list.Value is { } sel && sel >= 0 && sel < items.Count)
        {
            chosen = items[sel];
        }
        return chosen;
    }
}
