using System.Reflection;
using Terminal.Gui.App;

namespace RotorDrive.Tui.Work;

/// <summary>How quickly the workbench's main loop sees a key (issue 15 item 1: a key answers within 100 ms).</summary>
/// <remarks>Two waits sit in front of every key before any of our code runs:
/// <list type="bullet">
/// <item>The main loop runs at most <see cref="Application.MaximumIterationsPerSecond"/> times a second (Terminal.Gui's
/// default is 25, so a key waits up to 40 ms for the next pass). The workbench asks for <see cref="IterationsPerSecond"/>.</item>
/// <item>A terminal sends Alt+key as Esc followed by the key, and Terminal.Gui 2.5 holds an Esc followed by a letter or
/// digit until its Esc wait (50 ms) has passed before it decides the pair is Alt+key, checked once per loop pass: the
/// workbench's sheet keys (Alt+1..Alt+0) waited 50-90 ms before the program saw them. The workbench shortens that wait
/// to <see cref="EscapeWait"/>. A terminal writes a whole key sequence at once, so the shorter wait still joins Esc
/// and what follows; a lone Esc is simply seen sooner. Terminal multiplexers use waits of this order (tmux 3.5's
/// default escape-time is 10 ms; from memory).</item>
/// </list>
/// Terminal.Gui 2.5 has no setting for the Esc wait; it is a private field of its input processor, set here by name.
/// <see cref="ShortenEscapeWait"/> reports whether it took, and a test pins that it does on the version the build uses, so an
/// upgrade that renames the field fails the test instead of silently bringing the longer wait back.</remarks>
public static class KeyTiming
{
    /// <summary>Main-loop passes a second the workbench asks for (one every 10 ms).</summary>
    public const ushort IterationsPerSecond = 100;

    /// <summary>How long an Esc is held to see whether a key follows it.</summary>
    public static TimeSpan EscapeWait { get; } = TimeSpan.FromMilliseconds(20);

    /// <summary>Sets the loop rate for the process (call before the application is created).</summary>
    public static void SetLoopRate() => Application.MaximumIterationsPerSecond = IterationsPerSecond;

    /// <summary>Shortens the Esc wait of the application's input processor.</summary>
    /// <param name="app">An initialised application.</param>
    /// <returns>True when the wait was set; false when this Terminal.Gui version keeps it elsewhere.</returns>
    public static bool ShortenEscapeWait(IApplication app)
    {
        if (EscapeWaitField(app) is not var (processor, field))
        {
            return false;
        }
        field.SetValue(processor, EscapeWait);
        return true;
    }

    /// <summary>The Esc wait of the application's input processor, or null when this Terminal.Gui version keeps it
    /// elsewhere.</summary>
    /// <param name="app">An initialised application.</param>
    internal static TimeSpan? EscapeWaitOf(IApplication app)
        => EscapeWaitField(app) is var (processor, field) ? (TimeSpan)field.GetValue(processor)! : null;

    private static (object Processor, FieldInfo Field)? EscapeWaitField(IApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (app.Driver?.GetInputProcessor() is not { } processor)
        {
            return null;
        }
        for (var type = processor.GetType(); type is not null; type = type.BaseType)
        {
            if (type.GetField("_escTimeout", BindingFlags.Instance | BindingFlags.NonPublic) is { } field && field.FieldType == typeof(TimeSpan))
            {
                return (processor, field);
            }
        }
        return null;
    }
}
