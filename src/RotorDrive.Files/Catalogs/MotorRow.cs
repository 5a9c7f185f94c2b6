using RotorDrive.Core;
using RotorDrive.Core.Drive;

namespace RotorDrive.Files.Catalogs;

/// <summary>One row of motors.csv, in the file's units.</summary>
public sealed record MotorRow(
    string Id,
    double KvRpmPerV,
    double ResistanceOhm,
    double NoLoadCurrentA,
    double NoLoadVoltageV,
    double MaxCurrentA,
    double MaxPowerW,
    int Poles,
    double MassG,
    double? ThermalResistanceKPerW,
    double? ThermalTimeConstantS,
    double? MaxWindingTempC)
{
    /// <summary>The motor in SI units (rpm/V to (rad/s)/V, g to kg).</summary>
    public Motor ToMotor() => new(
        Id,
        Units.RpmToRadPerS(KvRpmPerV),
        ResistanceOhm,
        NoLoadCurrentA,
        NoLoadVoltageV,
        MaxCurrentA,
        MaxPowerW,
        Poles,
        MassG / 1000.0,
        ThermalResistanceKPerW,
        ThermalTimeConstantS,
        MaxWindingTempC);
}
