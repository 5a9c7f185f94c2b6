using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Loads;

/// <summary>Builds rotor loads: the precomputed table analyses use, or the direct physics model.</summary>
public static class RotorLoadTable
{
    /// <summary>Builds the table of a rotor's load over a plate for a range of speeds, gaps and plate temperatures.</summary>
    /// <remarks>Cost: about (speed points x radial points) complex plate responses plus (speed x gap x radial) multiply-adds;
    /// well under a millisecond for the default 96 x 48 grid and 24 radial points. See <see cref="TabulatedRotorLoad"/>.</remarks>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="plate">The plate.</param>
    /// <param name="range">What the table covers.</param>
    /// <param name="options">Model settings, or null for <see cref="LoadModelOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">An argument other than the options is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A rotor, plate, range or option value is out of range.</exception>
    public static TabulatedRotorLoad Build(RotorDesign rotor, Plate plate, LoadTableRange range, LoadModelOptions? options = null)
    {
        Preconditions.NotNull(range, nameof(range));
        range.Validate();
        return new TabulatedRotorLoad(new PhysicsRotorLoad(rotor, plate, options), range);
    }

    /// <summary>Builds the table from an existing direct model (sharing its settings).</summary>
    /// <param name="direct">The direct model.</param>
    /// <param name="range">What the table covers.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A range value is out of range.</exception>
    public static TabulatedRotorLoad Build(PhysicsRotorLoad direct, LoadTableRange range)
    {
        Preconditions.NotNull(direct, nameof(direct));
        Preconditions.NotNull(range, nameof(range));
        range.Validate();
        return new TabulatedRotorLoad(direct, range);
    }
}
