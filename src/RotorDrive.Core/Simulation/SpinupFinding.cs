namespace RotorDrive.Core.Simulation;

/// <summary>One failed limit of a spin-up study.</summary>
/// <param name="Key">Stable snake_case key: "hover", "liftoff", "liftoff_time", "stall", "controller_current",
/// "pack_current", "pack_cutoff" or "bus_collapse".</param>
/// <param name="Station">The station, 0-based, or null for the rig as a whole.</param>
/// <param name="Message">One readable sentence (no final full stop).</param>
public sealed record SpinupFinding(string Key, int? Station, string Message);
