namespace RotorDrive.Core.Studies;

/// <summary>How a tolerance's spread is expressed.</summary>
public enum ToleranceScale
{
    /// <summary>In percent of the nominal value (5 means 5 % of nominal).</summary>
    Percent,

    /// <summary>In the quantity's own SI unit (an absolute deviation, for example 0.0015 m of gap).</summary>
    Absolute,
}
