namespace RotorDrive.Core.Safety;

/// <summary>Material assumptions of the rotor burst check; every value is checked when set.</summary>
public sealed record RotorSafetyOptions
{
    /// <summary>The default assumptions.</summary>
    public static RotorSafetyOptions Default { get; } = new();

    /// <summary>Density of the retaining ring, kg/m^3; default 7850 (carbon steel, from memory of handbook values).
    /// Conservative for a composite sleeve (carbon fibre about 1600): a heavier ring only raises its own stress, which is
    /// small beside the magnet load. Range [500, 20000].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double RetainerDensityKgM3
    {
        get;
        init => field = Preconditions.InRange(value, 500, 20000, nameof(RetainerDensityKgM3));
    } = 7850;

    /// <summary>Magnet density used when the rotor row gives none, kg/m^3; default 7500 (sintered NdFeB, 7.4-7.6 g/cm^3
    /// in manufacturers' datasheets, from memory). Range [1000, 20000].</summary>
    /// <exception cref="ArgumentOutOfRangeException">Outside the range.</exception>
    public double DefaultMagnetDensityKgM3
    {
        get;
        init => field = Preconditions.InRange(value, 1000, 20000, nameof(DefaultMagnetDensityKgM3));
    } = 7500;
}
