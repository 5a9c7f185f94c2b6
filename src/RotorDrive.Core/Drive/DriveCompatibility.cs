using System.Globalization;

namespace RotorDrive.Core.Drive;

/// <summary>Checks that a motor, controller, pack and rotor can work together at all, before any operating point.</summary>
/// <remarks>Mismatches are findings, never exceptions: the ranking and the CLI report them with the parts' ids.</remarks>
public static class DriveCompatibility
{
    /// <summary>Every compatibility finding for one station's drive, errors first.</summary>
    /// <param name="drive">The station's drive.</param>
    /// <returns>The findings; empty when the parts fit.</returns>
    /// <exception cref="ArgumentNullException">The drive is null.</exception>
    public static IReadOnlyList<DriveFinding> Check(StationDrive drive)
    {
        Preconditions.NotNull(drive, nameof(drive));
        var findings = new List<DriveFinding>();
        var motor = drive.Drivetrain.Motor;
        var controller = drive.Drivetrain.Controller;
        var ci = CultureInfo.InvariantCulture;
        int cells = drive.Packs.CellsSeries;
        if (!controller.AcceptsCells(cells))
        {
            findings.Add(new DriveFinding(
                DriveFindingKind.CellsOutOfControllerRange,
                FindingSeverity.Error,
                () => string.Format(ci, "pack {0} has {1} cells in series; controller {2} is rated for {3} to {4}",
                    drive.Packs.Pack.Id, cells, controller.Id, controller.MinCells, controller.MaxCells)));
        }
        if (drive.ReverseRequired && !controller.Reversible)
        {
            findings.Add(new DriveFinding(
                DriveFindingKind.ControllerNotReversible,
                FindingSeverity.Error,
                () => string.Format(ci, "the station must turn its rotor both ways; controller {0} is not reversible", controller.Id)));
        }
        double rotorMax = drive.Rotor.MaxSpeedRadPerS;
        double commutated = drive.Drivetrain.MaxCommutatedSpeedRadPerS;
        if (commutated < rotorMax)
        {
            findings.Add(new DriveFinding(
                DriveFindingKind.ErpmBelowRotorMaxSpeed,
                FindingSeverity.Warning,
                () => string.Format(ci, "controller {0} commutates at most {1:0} erpm, i.e. {2:0} rpm with the {3}-pole motor {4}, below rotor {5}'s rated {6:0} rpm",
                    controller.Id, controller.MaxErpm, Units.RadPerSToRpm(commutated), motor.Poles, motor.Id, drive.Rotor.Id, Units.RadPerSToRpm(rotorMax))));
        }
        double fullVoltage = drive.Packs.OpenCircuitVoltageAt(1.0);
        double freeSpeed = drive.Drivetrain.FreeSpeedRadPerS(fullVoltage, drive.Drivetrain.MaxDuty, 20.0);
        if (freeSpeed > rotorMax)
        {
            findings.Add(new DriveFinding(
                DriveFindingKind.FreeSpeedAboveRotorMax,
                FindingSeverity.Warning,
                () => string.Format(ci, "with no load (rotor lifted off the plate) motor {0} at full duty on a full pack ({1:0.0} V) would reach {2:0} rpm, above rotor {3}'s rated {4:0} rpm; limit duty or rpm",
                    motor.Id, fullVoltage, Units.RadPerSToRpm(freeSpeed), drive.Rotor.Id, Units.RadPerSToRpm(rotorMax))));
        }
        if (findings.Count == 0)
        {
            return [];
        }
        return findings.Count == 1 ? findings : findings.OrderByDescending(f => f.Severity).ToList();
    }
}
