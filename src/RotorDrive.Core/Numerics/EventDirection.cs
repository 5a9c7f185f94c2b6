namespace RotorDrive.Core.Numerics;

/// <summary>Which sign change of an event function counts as an event.</summary>
public enum EventDirection
{
    /// <summary>Either a rise through zero (from negative to zero or positive) or a fall (from positive to zero or negative).</summary>
    Either,

    /// <summary>Only a rise: the value was negative and is now zero or positive.</summary>
    Rising,

    /// <summary>Only a fall: the value was positive and is now zero or negative.</summary>
    Falling,
}
