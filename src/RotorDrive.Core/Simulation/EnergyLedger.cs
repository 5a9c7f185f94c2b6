namespace RotorDrive.Core.Simulation;

/// <summary>Where the pack's energy went during a run, J: the conservation check of the transient model.</summary>
/// <remarks>Pack chemical energy out (integral of Voc I) = pack internal loss (I^2 R) + copper (I^2 R(T)) + controller
/// (I^2 R_on + V I_idle) + motor no-load (I0 E) + eddy (plate heat) + windage and bearing + change of rotor kinetic
/// energy. Each term is integrated alongside the state.</remarks>
/// <param name="PackChemicalJ">Integral of open-circuit voltage x pack current, J.</param>
/// <param name="PackInternalJ">Pack internal resistance loss, J.</param>
/// <param name="CopperJ">Winding copper loss, J.</param>
/// <param name="ControllerJ">Controller conduction and idle loss, J.</param>
/// <param name="NoLoadJ">Motor no-load (iron and friction) loss, J.</param>
/// <param name="EddyJ">Eddy-current loss into the plate, J.</param>
/// <param name="WindageBearingJ">Windage and bearing loss, J.</param>
/// <param name="KineticChangeJ">Change of rotor kinetic energy sum(J omega^2 / 2), J.</param>
public sealed record EnergyLedger(
    double PackChemicalJ,
    double PackInternalJ,
    double CopperJ,
    double ControllerJ,
    double NoLoadJ,
    double EddyJ,
    double WindageBearingJ,
    double KineticChangeJ)
{
    /// <summary>Chemical energy out minus everything accounted for, J (zero up to integration error).</summary>
    public double ResidualJ => PackChemicalJ - (PackInternalJ + CopperJ + ControllerJ + NoLoadJ + EddyJ + WindageBearingJ + KineticChangeJ);
}
