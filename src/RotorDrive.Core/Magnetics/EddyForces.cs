namespace RotorDrive.Core.Magnetics;

/// <summary>Eddy-current loads on a whole rotor: lift, drag torque and the power dissipated in the plate.</summary>
/// <param name="LiftN">Lift on the rotor, N (the same for either spin direction).</param>
/// <param name="TorqueNm">Drag torque on the rotor, N m, with the sign of the speed (it opposes the rotation).</param>
/// <param name="PowerW">Power dissipated in the plate, W (at least 0; equals torque times speed).</param>
public readonly record struct EddyForces(double LiftN, double TorqueNm, double PowerW);
