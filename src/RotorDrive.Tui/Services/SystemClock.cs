namespace RotorDrive.Tui.Services;

/// <summary>The machine's clock.</summary>
public sealed class SystemClock : IWorkbenchClock
{
    /// <inheritdoc/>
    public DateTimeOffset Now => DateTimeOffset.Now;
}
