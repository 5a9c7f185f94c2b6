namespace RotorDrive.Core.Craft;

/// <summary>Numerical settings of the whole-craft solves (<see cref="HoverTrim"/>, <see cref="CommonDutyHover"/>,
/// <see cref="YawBalance"/>).</summary>
/// <remarks>Defaults: scaled residual tolerance 1e-11, 60 Newton iterations, speeds searched up to 2 x each rotor's
/// rated speed, 48 scan samples for a rotor's top equilibrium, payload bisection to 0.01 kg.</remarks>
public sealed record HoverOptions
{
    /// <summary>The defaults.</summary>
    public static HoverOptions Default { get; } = new();

    /// <summary>Largest scaled residual accepted: force / weight, moments / (weight x largest arm), yaw / sum |shaft
    /// torque|.</summary>
    public double Tolerance { get; init; } = 1e-11;

    /// <summary>Newton iterations allowed.</summary>
    public int MaxIterations { get; init; } = 60;

    /// <summary>Speeds are searched up to this multiple of each rotor's rated speed (beyond it the rotor_max_speed limit
    /// fails anyway).</summary>
    public double SpeedSearchFactor { get; init; } = 2.0;

    /// <summary>Samples from free speed down to rest when looking for a rotor's highest equilibrium at a duty.</summary>
    public int ScanPoints { get; init; } = 48;

    /// <summary>Bisection stops when the payload bracket is narrower than this, kg.</summary>
    public double PayloadToleranceKg { get; init; } = 0.01;

    internal void Validate()
    {
        Preconditions.InRange(Tolerance, 1e-15, 1e-4, nameof(Tolerance));
        Preconditions.AtLeast(MaxIterations, 1, nameof(MaxIterations));
        Preconditions.InRange(SpeedSearchFactor, 1, 10, nameof(SpeedSearchFactor));
        Preconditions.AtLeast(ScanPoints, 4, nameof(ScanPoints));
        Preconditions.Positive(PayloadToleranceKg, nameof(PayloadToleranceKg));
    }
}
