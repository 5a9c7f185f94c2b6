namespace RotorDrive.Core.Safety;

/// <summary>How strongly a caution is to be shown.</summary>
public enum CautionLevel
{
    /// <summary>Standing advice, shown with every report where the hazard exists.</summary>
    Notice,

    /// <summary>The results put this hazard in play: show it first and emphasised, with its reason.</summary>
    Warning,
}
