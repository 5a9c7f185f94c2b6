namespace RotorDrive.Core.Safety;

/// <summary>The pull of a steel-backed plate on stopped magnet rotors: the figures behind the steel-under-plate caution.</summary>
/// <remarks>At standstill the steel's image pulls the magnets towards the plate (negative lift; see
/// <see cref="Magnetics.PlateResponse.SteelBackedReflection"/>); the plate screens it as the rotors speed up.</remarks>
/// <param name="PullDownN">Downward pull at standstill, N (positive; the negative of the summed lift).</param>
/// <param name="GapM">The gap at which it was evaluated, m (the landed gap for a rig, the asked gap for one rotor).</param>
/// <param name="WeightN">The craft's weight, N, or null when the figure is for one rotor rather than a rig.</param>
public sealed record SteelAttraction(double PullDownN, double GapM, double? WeightN);
