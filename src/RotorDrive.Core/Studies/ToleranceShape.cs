namespace RotorDrive.Core.Studies;

/// <summary>The distribution of a part's deviation from its nominal value.</summary>
public enum ToleranceShape
{
    /// <summary>No spread: the nominal value.</summary>
    None,

    /// <summary>Normal (Gaussian) deviation with mean 0 and a standard deviation.</summary>
    Normal,

    /// <summary>Uniform deviation between a lower and an upper bound.</summary>
    Uniform,
}
