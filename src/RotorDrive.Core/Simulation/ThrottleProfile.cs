namespace RotorDrive.Core.Simulation;

/// <summary>A throttle that moves linearly from a start value to a target per station over a ramp time, optionally
/// slowed by a slew-rate limit as controllers apply it, then holds the target.</summary>
/// <remarks>Values are duties (0..1) in <see cref="ControllerMode.Duty"/> and shaft speeds (rad/s, in the rotor's own
/// spin direction, not negative) in <see cref="ControllerMode.SpeedHold"/>. A station's effective ramp time is
/// max(<see cref="RampS"/>, |to - from| / <see cref="SlewPerS"/>).</remarks>
/// <param name="Mode">Duty or speed hold.</param>
/// <param name="From">Value per station at time 0.</param>
/// <param name="To">Target value per station.</param>
/// <param name="RampS">Ramp time, s, at least 0 (0 = a step).</param>
/// <param name="SlewPerS">Largest rate of change of the value (duty/s or rad/s per s), or null for none.</param>
/// <param name="Braking">True when the controllers may drive current backwards (active braking, regeneration).</param>
public sealed record ThrottleProfile(
    ControllerMode Mode,
    IReadOnlyList<double> From,
    IReadOnlyList<double> To,
    double RampS,
    double? SlewPerS = null,
    bool Braking = false)
{
    /// <summary>A spin-up from rest: every station from 0 to its target over a ramp.</summary>
    /// <param name="mode">Duty or speed hold.</param>
    /// <param name="targets">Target per station (duty or rad/s).</param>
    /// <param name="rampS">Ramp time, s, at least 0.</param>
    /// <param name="slewPerS">Optional slew-rate limit.</param>
    /// <param name="braking">Braking allowed.</param>
    /// <exception cref="ArgumentNullException"><paramref name="targets"/> is null.</exception>
    public static ThrottleProfile SpinUp(ControllerMode mode, IReadOnlyList<double> targets, double rampS, double? slewPerS = null, bool braking = false)
    {
        Preconditions.NotNull(targets, nameof(targets));
        return new ThrottleProfile(mode, new double[targets.Count], targets.ToArray(), rampS, slewPerS, braking);
    }

    /// <summary>A stop (landing): every station from its running value to 0 over a ramp.</summary>
    /// <param name="mode">Duty or speed hold.</param>
    /// <param name="running">Value per station at the start (duty or rad/s).</param>
    /// <param name="rampS">Ramp time, s, at least 0.</param>
    /// <param name="braking">True lets the controllers brake and regenerate; false lets the rotors freewheel.</param>
    /// <exception cref="ArgumentNullException"><paramref name="running"/> is null.</exception>
    public static ThrottleProfile Stop(ControllerMode mode, IReadOnlyList<double> running, double rampS, bool braking)
    {
        Preconditions.NotNull(running, nameof(running));
        return new ThrottleProfile(mode, running.ToArray(), new double[running.Count], rampS, null, braking);
    }

    /// <summary>Checks the profile against a station count.</summary>
    /// <param name="stations">Number of stations.</param>
    /// <exception cref="ArgumentException">A list has the wrong length.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public void Validate(int stations)
    {
        Preconditions.NotNull(From, nameof(From));
        Preconditions.NotNull(To, nameof(To));
        if (From.Count != stations || To.Count != stations)
        {
            throw new ArgumentException($"the throttle profile needs one value per station ({stations}); got {From.Count} start and {To.Count} target values.");
        }
        Preconditions.NonNegative(RampS, nameof(RampS));
        if (SlewPerS is { } slew)
        {
            Preconditions.Positive(slew, nameof(SlewPerS));
        }
        double high = Mode == ControllerMode.Duty ? 1.0 : double.MaxValue;
        for (int j = 0; j < stations; j++)
        {
            Preconditions.InRange(From[j], 0, high, $"throttle start value of station {j}");
            Preconditions.InRange(To[j], 0, high, $"throttle target of station {j}");
        }
    }

    /// <summary>Effective ramp time of a station, s: max(ramp, |to - from| / slew).</summary>
    /// <param name="station">Station index.</param>
    public double RampTimeS(int station)
    {
        double change = Math.Abs(To[station] - From[station]);
        return SlewPerS is { } slew ? Math.Max(RampS, change / slew) : RampS;
    }

    /// <summary>The throttle value of a station at a time (duty or rad/s).</summary>
    /// <param name="station">Station index.</param>
    /// <param name="timeS">Time since the start, s.</param>
    public double ValueAt(int station, double timeS)
    {
        double ramp = RampTimeS(station);
        if (timeS >= ramp)
        {
            return To[station];
        }
        return timeS <= 0 ? From[station] : From[station] + (To[station] - From[station]) * (timeS / ramp);
    }

    /// <summary>The rate of change of a station's throttle value at a time (duty/s or rad/s per s).</summary>
    /// <param name="station">Station index.</param>
    /// <param name="timeS">Time since the start, s.</param>
    public double RateAt(int station, double timeS)
    {
        double ramp = RampTimeS(station);
        return timeS < 0 || timeS >= ramp || ramp == 0 ? 0.0 : (To[station] - From[station]) / ramp;
    }
}
