namespace RotorDrive.Core.Simulation;

/// <summary>What to simulate: a throttle profile, for how long, from which pack state and craft state.</summary>
/// <param name="Profile">The throttle profile.</param>
/// <param name="DurationS">Simulated time, s, greater than 0.</param>
/// <param name="SocFraction">Pack state of charge at the start, 0..1, or null (default) for the rig model's
/// (<see cref="SimulationRig.SocFraction"/>).</param>
/// <param name="StartHovering">False (spin-up): rotors at rest, craft on its gear at the landed gap. True (stop): rotors
/// at their trimmed hover speeds (<see cref="SimulationRig.HoverSpeedsRadPerS"/>), craft at the design gap, airborne.</param>
public sealed record SpinupRequest(ThrottleProfile Profile, double DurationS, double? SocFraction = null, bool StartHovering = false);
