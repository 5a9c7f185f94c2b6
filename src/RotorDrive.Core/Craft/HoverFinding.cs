namespace RotorDrive.Core.Craft;

/// <summary>A limit a hover state breaks, or why no hover state exists.</summary>
/// <param name="Limit">Stable snake_case key: a <see cref="Drive.DriveLimits.Key"/> value, or "stability",
/// "lift", "convergence", "bus_voltage", "stations".</param>
/// <param name="Station">The station, 0-based, or null for the rig as a whole.</param>
/// <param name="Message">One readable sentence.</param>
public sealed record HoverFinding(string Limit, int? Station, string Message);
