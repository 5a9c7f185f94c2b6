using RotorDrive.Tui.Services;

namespace RotorDrive.Tui.Tests.Support;

internal sealed class FixedClock(DateTimeOffset now) : IWorkbenchClock
{
    public DateTimeOffset Now { get; set; } = now;
}
