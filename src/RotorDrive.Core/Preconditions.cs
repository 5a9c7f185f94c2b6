namespace RotorDrive.Core;

/// <summary>Argument checks used where values enter Core; they reject NaN, infinities and out-of-range values.</summary>
/// <remarks>Modelled on the small precondition helpers of well-kept libraries (NodaTime's Utility/Preconditions).
/// Exceptions here signal programming errors: user input is validated earlier, in RotorDrive.Files.</remarks>
public static class Preconditions
{
    /// <summary>Checks that a value is finite and strictly positive.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN, infinite, zero or negative.</exception>
    public static double Positive(double value, string name)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(name, value, $"{name} must be a finite number greater than 0; got {value}.");
        }
        return value;
    }

    /// <summary>Checks that a value is finite and zero or positive.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN, infinite or negative.</exception>
    public static double NonNegative(double value, string name)
    {
        if (!double.IsFinite(value) || value < 0)
        {
            throw new ArgumentOutOfRangeException(name, value, $"{name} must be a finite number of at least 0; got {value}.");
        }
        return value;
    }

    /// <summary>Checks that a value is finite.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN or infinite.</exception>
    public static double Finite(double value, string name)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(name, value, $"{name} must be a finite number; got {value}.");
        }
        return value;
    }

    /// <summary>Checks that a value is finite and within [min, max].</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN, infinite or outside the range.</exception>
    public static double InRange(double value, double min, double max, string name)
    {
        if (!double.IsFinite(value) || value < min || value > max)
        {
            throw new ArgumentOutOfRangeException(name, value, $"{name} must lie in [{min}, {max}]; got {value}.");
        }
        return value;
    }

    /// <summary>Checks that an integer is at least a given minimum.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is below the minimum.</exception>
    public static int AtLeast(int value, int min, string name)
    {
        if (value < min)
        {
            throw new ArgumentOutOfRangeException(name, value, $"{name} must be at least {min}; got {value}.");
        }
        return value;
    }

    /// <summary>Checks that a reference is not null.</summary>
    /// <exception cref="ArgumentNullException">The value is null.</exception>
    public static T NotNull<T>(T? value, string name) where T : class
        => value ?? throw new ArgumentNullException(name);
}
