using RotorDrive.Core.Craft;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Drive;

/// <summary>Margins of a solved drive state to every rating of motor, controller, rotor and pack.</summary>
/// <remarks>Steady values are compared with continuous ratings; a value between the controller's continuous and burst
/// current is allowed only for the burst duration (the time bookkeeping belongs to the spin-up simulation), so at a
/// steady point it is reported as the continuous limit exceeded. Currents are compared by magnitude.</remarks>
public static class DriveMargins
{
    /// <summary>Margins of one station: motor current and power, controller continuous and burst current, eRPM, rotor speed.</summary>
    /// <param name="drivetrain">The station's drivetrain.</param>
    /// <param name="rotor">The station's rotor.</param>
    /// <param name="point">The solved drive state.</param>
    /// <returns>Six margins in the order listed.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static LimitMargin[] ForStation(Drivetrain drivetrain, RotorDesign rotor, in DrivePoint point)
    {
        Preconditions.NotNull(drivetrain, nameof(drivetrain));
        Preconditions.NotNull(rotor, nameof(rotor));
        var margins = new LimitMargin[StationCount];
        FillStation(margins, drivetrain, rotor, point);
        return margins;
    }

    internal const int StationCount = 6;

    internal const int PackCount = 3;

    internal static void FillStation(Span<LimitMargin> into, Drivetrain drivetrain, RotorDesign rotor, in DrivePoint point)
    {
        var motor = drivetrain.Motor;
        var controller = drivetrain.Controller;
        double current = Math.Abs(point.MotorCurrentA);
        into[0] = new(DriveLimit.MotorCurrent, current, motor.MaxCurrentA);
        into[1] = new(DriveLimit.MotorPower, Math.Abs(point.MotorInputPowerW), motor.MaxPowerW);
        into[2] = new(DriveLimit.ControllerContinuousCurrent, current, controller.ContinuousCurrentA);
        into[3] = new(DriveLimit.ControllerBurstCurrent, current, controller.BurstCurrentA);
        into[4] = new(DriveLimit.ControllerErpm, motor.ElectricalRpm(point.SpeedRadPerS), controller.MaxErpm);
        into[5] = new(DriveLimit.RotorMaxSpeed, point.SpeedRadPerS, rotor.MaxSpeedRadPerS);
    }

    internal static void FillPack(Span<LimitMargin> into, PackBank packs, double packCurrentA, double busVoltageV, double cellCutoffV)
    {
        into[0] = new(DriveLimit.PackContinuousCurrent, packCurrentA, packs.ContinuousCurrentA);
        into[1] = new(DriveLimit.PackBurstCurrent, packCurrentA, packs.BurstCurrentA);
        into[2] = new(DriveLimit.PackCutoffVoltage, busVoltageV, cellCutoffV * packs.CellsSeries, IsLowerBound: true);
    }

    /// <summary>Margins of the pack bank: continuous and burst discharge current, loaded voltage against cutoff.</summary>
    /// <param name="packs">The pack bank.</param>
    /// <param name="packCurrentA">Current the bank delivers, A.</param>
    /// <param name="busVoltageV">Loaded bank voltage, V.</param>
    /// <param name="cellCutoffV">Cutoff voltage per cell, V.</param>
    /// <returns>Three margins in the order listed.</returns>
    /// <exception cref="ArgumentNullException">The bank is null.</exception>
    public static LimitMargin[] ForPack(PackBank packs, double packCurrentA, double busVoltageV, double cellCutoffV)
    {
        Preconditions.NotNull(packs, nameof(packs));
        var margins = new LimitMargin[PackCount];
        FillPack(margins, packs, packCurrentA, busVoltageV, cellCutoffV);
        return margins;
    }
}
