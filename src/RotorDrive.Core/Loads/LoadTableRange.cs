using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Loads;

/// <summary>What a precomputed rotor load table covers: speeds, gaps and plate temperatures, and its grid sizes.</summary>
/// <remarks>
/// <para>The table is laid over (sigma omega, gap). Its sigma omega axis runs from the largest product the range can ask
/// for, x_max = max(sigma(MinPlateTempC), sigma(MaxPlateTempC)) times MaxSpeedRadPerS, down to x_max 10^(-SpeedDecades),
/// with points equally spaced in ln(sigma omega) (dense near zero speed, where lift grows as omega^2 and torque as
/// omega). Below that the exact low-speed laws (lift proportional to omega^2, torque to omega) carry the last node to
/// zero. Gap points are equally spaced over [MinGapM, MaxGapM]. Defaults: 96 speed points over 6 decades and 48 gap
/// points. Against direct quadrature they give about 2e-5 of the value on a typical rotor (24 segments, radii 70-120 mm)
/// and at most a fifth of the 0.1 % target over the wide family of random rotors, plates and ranges the tests draw
/// (many-pole rotors of small radius at large gaps are the hardest: e^(-2 k g) changes fastest between gap nodes).</para>
/// <para>Queries outside the range (larger sigma omega, gaps outside) are answered by the direct model, so they are
/// right but slower.</para>
/// </remarks>
/// <param name="MaxSpeedRadPerS">Largest shaft speed, rad/s, greater than 0.</param>
/// <param name="MinGapM">Smallest air gap, m, at least 0.</param>
/// <param name="MaxGapM">Largest air gap, m, greater than MinGapM.</param>
/// <param name="MinPlateTempC">Lowest plate temperature, C.</param>
/// <param name="MaxPlateTempC">Highest plate temperature, C, at least MinPlateTempC.</param>
/// <param name="SpeedPoints">Points along ln(sigma omega), 8..4096 (default 96).</param>
/// <param name="GapPoints">Points along the gap, 4..4096 (default 48).</param>
/// <param name="SpeedDecades">Decades of sigma omega covered below the largest, 2..12 (default 6).</param>
public sealed record LoadTableRange(
    double MaxSpeedRadPerS,
    double MinGapM,
    double MaxGapM,
    double MinPlateTempC,
    double MaxPlateTempC,
    int SpeedPoints = 96,
    int GapPoints = 48,
    double SpeedDecades = 6)
{
    /// <summary>Lowest plate temperature the default range for a rig covers, C.</summary>
    public const double DefaultColdPlateC = -20.0;

    /// <summary>This range widened to cover what an analysis will visit: speeds up to <paramref name="topSpeedRadPerS"/>,
    /// gaps from half to one and a half times <paramref name="gapM"/>, and <paramref name="plateTempC"/>. The one rule
    /// every study uses to size a table beyond the rig's own range (a what-if gap, a hot plate, a fast drivetrain).</summary>
    /// <param name="topSpeedRadPerS">Highest speed the analysis evaluates, rad/s, or null to keep the range's.</param>
    /// <param name="gapM">Gap the analysis evaluates at, m, or null to keep the range's gaps.</param>
    /// <param name="plateTempC">Plate temperature the analysis evaluates at, C, or null to keep the range's.</param>
    public LoadTableRange Covering(double? topSpeedRadPerS = null, double? gapM = null, double? plateTempC = null) => this with
    {
        MaxSpeedRadPerS = topSpeedRadPerS is { } v ? Math.Max(MaxSpeedRadPerS, v) : MaxSpeedRadPerS,
        MinGapM = gapM is { } g ? Math.Min(MinGapM, 0.5 * g) : MinGapM,
        MaxGapM = gapM is { } h ? Math.Max(MaxGapM, 1.5 * h) : MaxGapM,
        MinPlateTempC = plateTempC is { } t ? Math.Min(MinPlateTempC, t) : MinPlateTempC,
        MaxPlateTempC = plateTempC is { } u ? Math.Max(MaxPlateTempC, u) : MaxPlateTempC,
    };

    /// <summary>Checks every member and throws on the first one out of range.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A member is NaN, infinite or out of range.</exception>
    public void Validate()
    {
        Preconditions.Positive(MaxSpeedRadPerS, nameof(MaxSpeedRadPerS));
        Preconditions.NonNegative(MinGapM, nameof(MinGapM));
        Preconditions.Finite(MaxGapM, nameof(MaxGapM));
        if (!(MaxGapM > MinGapM))
        {
            throw new ArgumentOutOfRangeException(nameof(MaxGapM), MaxGapM, $"{nameof(MaxGapM)} must exceed {nameof(MinGapM)} = {MinGapM}; got {MaxGapM}.");
        }
        Preconditions.Finite(MinPlateTempC, nameof(MinPlateTempC));
        Preconditions.InRange(MaxPlateTempC, MinPlateTempC, double.MaxValue, nameof(MaxPlateTempC));
        Preconditions.InRange(SpeedPoints, 8, 4096, nameof(SpeedPoints));
        Preconditions.InRange(GapPoints, 4, 4096, nameof(GapPoints));
        Preconditions.InRange(SpeedDecades, 2, 12, nameof(SpeedDecades));
    }
}
