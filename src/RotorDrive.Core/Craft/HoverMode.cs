namespace RotorDrive.Core.Craft;

/// <summary>Which hover question a <see cref="HoverResult"/> answers.</summary>
public enum HoverMode
{
    /// <summary>Per-station duties trimmed for force, pitch, roll and yaw balance at a fixed gap.</summary>
    Trimmed,

    /// <summary>One common duty for all stations; the gap follows from lift = weight (pitch, roll and yaw left
    /// unbalanced and reported).</summary>
    CommonDuty,

    /// <summary>A guided sled: one common duty at a fixed gap, found from total lift = weight; the rails carry pitch, roll
    /// and yaw (reported in <see cref="RailLoads"/>, not judged).</summary>
    Guided,

    /// <summary>A guided sled at the duties set on its stations: the gap follows from total lift = weight; the rails carry
    /// pitch, roll and yaw (reported in <see cref="RailLoads"/>, not judged).</summary>
    GuidedSetDuties,

    /// <summary>A bench of stands: each station at its duty at a fixed gap; no weight to carry (the residuals are not
    /// judged).</summary>
    Bench,
}
