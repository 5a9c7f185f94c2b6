namespace RotorDrive.Core.Drive;

/// <summary>One station's drive at one instant, as the bus solver needs it: parts, command, speed, temperatures, braking.</summary>
/// <remarks>Speed is the rotor's speed in its own spin direction (not negative); the spin sign matters only for yaw.</remarks>
/// <param name="Drivetrain">Motor and controller.</param>
/// <param name="Command">Duty or motor-current command.</param>
/// <param name="SpeedRadPerS">Shaft speed, rad/s, at least 0.</param>
/// <param name="WindingTempC">Winding temperature, C.</param>
/// <param name="MagnetTempC">Motor magnet temperature, C.</param>
/// <param name="Braking">True when the controller may drive current backwards (active braking, regeneration);
/// false when it only freewheels, so the motor current cannot go negative while the back-EMF is below the bus.</param>
public readonly record struct DriveInput(
    Drivetrain Drivetrain,
    DriveCommand Command,
    double SpeedRadPerS,
    double WindingTempC,
    double MagnetTempC,
    bool Braking);
