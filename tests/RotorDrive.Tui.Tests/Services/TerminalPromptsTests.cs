using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using Terminal.Gui.Views;
using RotorDrive.Tui.Services;
using Xunit;

namespace RotorDrive.Tui.Tests.Services;

public sealed class TerminalPromptsTests : IDisposable
{
    private readonly IApplication _app;
    private readonly Window _window = new();
    private readonly SessionToken? _token;

    public TerminalPromptsTests()
    {
        Environment.SetEnvironmentVariable("DisableRealDriverIO", "1");
        _app = Application.Create(new VirtualTimeProvider());
        _app.Init(DriverRegistry.Names.ANSI);
        _app.Driver!.SetScreenSize(80, 24);
        _token = _app.Begin(_window);
    }

    public void Dispose()
    {
        if (_token is not null)
        {
            _app.End(_token);
        }
        _window.Dispose();
        _app.Dispose();
    }

    /// <summary>Presses keys once the dialog is up (the dialog runs its own loop).</summary>
    private void PressWhenShown(params Key[] keys)
    {
        int iteration = 0;
        void OnIteration(object? sender, EventArgs e)
        {
            if (++iteration == 2)
            {
                _app.Iteration -= OnIteration;
                foreach (var key in keys)
                {
                    _app.InjectKey(key);
                }
            }
        }
        _app.Iteration += OnIteration;
    }

    [Fact]
    public void Ask_Enter_ChoosesTheFirstSafeAnswer()
    {
        var prompts = new TerminalPrompts(_app);
        PressWhenShown(Key.Enter);
        int? answer = prompts.Ask("Quit", "Unsaved edits. Save them first?", ["Cancel", "Save", "Discard"]);
        Assert.Equal(0, answer);
    }

    [Fact]
    public void Ask_Esc_AnswersNothing()
    {
        var prompts = new TerminalPrompts(_app);
        PressWhenShown(Key.Esc);
        Assert.Null(prompts.Ask("Quit", "Unsaved edits. Save them first?", ["Cancel", "Save", "Discard"]));
    }

    [Fact]
    public void AskPath_Enter_AcceptsTheTypedPath()
    {
        var prompts = new TerminalPrompts(_app);
        PressWhenShown(Key.End, Key.Backspace, Key.Backspace, Key.Backspace, Key.Backspace, Key.Backspace, new Key('x'), Key.Enter);
        Assert.Equal("/lab/rigx", prompts.AskPath("Open rig", "/lab/rig.json"));
    }

    [Fact]
    public void AskPath_Esc_Cancels()
    {
        var prompts = new TerminalPrompts(_app);
        PressWhenShown(Key.Esc);
        Assert.Null(prompts.AskPath("Open rig", "/lab/rig.json"));
    }

    [Fact]
    public void Choose_CursorAndEnter_PickTheItem()
    {
        var prompts = new TerminalPrompts(_app);
        PressWhenShown(Key.CursorDown, Key.Enter);
        Assert.Equal("c", prompts.Choose("Pick motor", ["a", "b", "c"], "b"));
    }
}
