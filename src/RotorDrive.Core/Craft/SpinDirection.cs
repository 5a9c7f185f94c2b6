namespace RotorDrive.Core.Craft;

/// <summary>Spin direction of a rotor seen from above.</summary>
public enum SpinDirection
{
    /// <summary>Clockwise seen from above: the rotor's angular velocity points down (-z).</summary>
    Clockwise,

    /// <summary>Counter-clockwise seen from above: the rotor's angular velocity points up (+z).</summary>
    CounterClockwise,
}

/// <summary>Helpers for <see cref="SpinDirection"/>.</summary>
public static class SpinDirectionExtensions
{
    /// <summary>Sign of the rotor's angular velocity about +z (up): +1 for counter-clockwise, -1 for clockwise.</summary>
    /// <remarks>The reaction torque of a rotor on the frame is minus its shaft torque times this sign.</remarks>
    public static int Sign(this SpinDirection spin) => spin == SpinDirection.CounterClockwise ? 1 : -1;

    /// <summary>The opposite direction.</summary>
    public static SpinDirection Reversed(this SpinDirection spin)
        => spin == SpinDirection.CounterClockwise ? SpinDirection.Clockwise : SpinDirection.CounterClockwise;
}
