namespace RotorDrive.Tui.Services;

/// <summary>The wall clock, behind an interface so tests control the times the workbench shows.</summary>
public interface IWorkbenchClock
{
    /// <summary>The current local time.</summary>
    DateTimeOffset Now { get; }
}
