namespace RotorDrive.Core.Safety;

/// <summary>When a caution is raised from notice to warning; every value is checked when set.</summary>
public sealed record CautionThresholds
{
    /// <summary>The default thresholds.</summary>
    public static CautionThresholds Default { get; } = new();

    /// <summary>Surface temperature above which the hot-surface caution becomes a warning, C; default 45. Contact
    /// burn thresholds for metal surfaces touched for minutes to hours lie near 43-48 C (ISO 13732-1:2006, values from
    /// memory); 45 is a round figure inside that band. Range [30, 100].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double HotSurfaceC
    {
        get;
        init => field = Preconditions.InRange(value, 30, 100, nameof(HotSurfaceC));
    } = 45;

    /// <summary>Retainer stress margin below which the burst caution becomes a warning; default 0.5 (stress above two
    /// thirds of the allowable; a factor of 1.5 on rotating parts is common practice, no source). Range [0, 10].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double BurstMargin
    {
        get;
        init => field = Preconditions.InRange(value, 0, 10, nameof(BurstMargin));
    } = 0.5;
}
