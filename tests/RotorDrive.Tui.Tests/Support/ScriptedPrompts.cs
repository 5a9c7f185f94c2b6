using RotorDrive.Tui.Services;

namespace RotorDrive.Tui.Tests.Support;

/// <summary>Answers the workbench's questions from a script and records what was asked.</summary>
internal sealed class ScriptedPrompts : IWorkbenchPrompts
{
    public Queue<object?> Answers { get; } = new();

    public List<string> Asked { get; } = [];

    public int? Ask(string title, string message, IReadOnlyList<string> answers)
    {
        Asked.Add($"{title}: {message} [{string.Join("/", answers)}]");
        var next = Answers.Count > 0 ? Answers.Dequeue() : null;
        return next switch
        {
            string s => answers.ToList().IndexOf(s) is var i and >= 0 ? i : throw new InvalidOperationException($"no answer '{s}' in [{string.Join("/", answers)}]"),
            null => null,
            _ => throw new InvalidOperationException("expected an answer text"),
        };
    }

    public string? AskPath(string title, string initialPath)
    {
        Asked.Add($"{title}: path");
        return Answers.Count > 0 ? (string?)Answers.Dequeue() : null;
    }

    /// <summary>The one-line summaries the last list offered, or null.</summary>
    public IReadOnlyList<string>? LastDetails { get; private set; }

    public string? Choose(string title, IReadOnlyList<string> items, string? current, IReadOnlyList<string>? details = null)
    {
        Asked.Add($"{title}: choose from {items.Count}");
        LastDetails = details;
        return Answers.Count > 0 ? (string?)Answers.Dequeue() : null;
    }
}
