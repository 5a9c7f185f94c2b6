using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Drive;

/// <summary>Everything that fixes one rotor's steady operation: its drivetrain, the packs feeding it, the rotor and its
/// load model, and the team's limits.</summary>
/// <param name="Drivetrain">Motor and controller with settings.</param>
/// <param name="Packs">The packs on the bus (for one rotor alone, its own sag).</param>
/// <param name="Rotor">The rotor design (max rated speed).</param>
/// <param name="Load">The rotor's load on its shaft.</param>
/// <param name="Limits">The team's limits (cell cutoff voltage, duty headroom).</param>
/// <param name="ReverseRequired">True when the station must turn its rotor both ways (e.g. reverse braking), which
/// needs a reversible controller; a fixed spin direction is set by the motor wiring.</param>
public sealed record StationDrive(
    Drivetrain Drivetrain,
    PackBank Packs,
    RotorDesign Rotor,
    IRotorLoad Load,
    StationLimits Limits,
    bool ReverseRequired = false);
