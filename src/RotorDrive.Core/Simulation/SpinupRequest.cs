namespace RotorDrive.Core.Simulation;

/// <summary>What to simulate: a throttle profile, for how long, from which pack state and craft state.</summary>
/// <param name="Profile">The throttle profile.</param>
/// <param name="DurationS">Simulated time, s, greater than 0.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1.</param>
/// <param name="StartHovering">False (spin-up): rotors at rest, craft on its gear at the landed gap. True (stop): rotors
/// at the common hover speed, craft at the design gap, airborne.</param>
public sealed record SpinupRequest(ThrottleProfile Profile, double DurationS, double SocFraction = 1.0, bool StartHovering = false);
