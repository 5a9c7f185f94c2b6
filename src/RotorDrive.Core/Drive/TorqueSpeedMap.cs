namespace RotorDrive.Core.Drive;

/// <summary>Chart-ready torque-speed data for one rotor: the load curve and, for a set of duties, the motor's available
/// torque curve (after current limiting, with this rotor's pack sag) and the equilibria where they meet.</summary>
/// <param name="SpeedsRadPerS">Speeds of every sample, rad/s, from 0, evenly spaced.</param>
/// <param name="LoadTorqueNm">Total load torque at each speed, N m.</param>
/// <param name="EddyTorqueNm">Eddy-current part of the load torque at each speed, N m.</param>
/// <param name="LiftN">Lift at each speed, N.</param>
/// <param name="Curves">One motor curve per duty, in the order given.</param>
public sealed record TorqueSpeedMap(
    IReadOnlyList<double> SpeedsRadPerS,
    IReadOnlyList<double> LoadTorqueNm,
    IReadOnlyList<double> EddyTorqueNm,
    IReadOnlyList<double> LiftN,
    IReadOnlyList<MotorTorqueCurve> Curves)
{
    /// <summary>Samples the load and the motor's torque at each duty over speed.</summary>
    /// <param name="drive">The station's drive.</param>
    /// <param name="conditions">Gap, temperatures, state of charge, braking.</param>
    /// <param name="duties">Duties to draw, each 0..1.</param>
    /// <param name="points">Samples over speed, at least 2. Default 101.</param>
    /// <param name="topSpeedRadPerS">Highest speed drawn, rad/s; null for the full-duty free speed on the pack at this
    /// state of charge (+5 %), capped at 1.5 x the rotor's rated speed.</param>
    /// <param name="options">Settings for the equilibrium search, or null for the defaults.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A duty, the point count or the top speed is out of range.</exception>
    public static TorqueSpeedMap Compute(
        StationDrive drive,
        OperatingConditions conditions,
        IReadOnlyList<double> duties,
        int points = 101,
        double? topSpeedRadPerS = null,
        OperatingPointOptions? options = null)
    {
        Preconditions.NotNull(drive, nameof(drive));
        Preconditions.NotNull(conditions, nameof(conditions));
        Preconditions.NotNull(duties, nameof(duties));
        Preconditions.AtLeast(points, 2, nameof(points));
        var source = BusSource.FromPack(drive.Packs, conditions.SocFraction);
        var drivetrain = drive.Drivetrain;
        double top = topSpeedRadPerS is { } given
            ? Preconditions.Positive(given, nameof(topSpeedRadPerS))
            : Math.Min(
                1.05 * drivetrain.FreeSpeedRadPerS(source.OpenCircuitVoltageV, drivetrain.MaxDuty, conditions.MotorMagnetTempC),
                1.5 * drive.Rotor.MaxSpeedRadPerS);

        var speeds = new double[points];
        var load = new double[points];
        var eddy = new double[points];
        var lift = new double[points];
        for (int i = 0; i < points; i++)
        {
            speeds[i] = top * i / (points - 1);
            var lp = drive.Load.Evaluate(speeds[i], conditions.GapM, conditions.PlateTempC, conditions.RotorMagnetTempC);
            load[i] = lp.TotalTorqueNm;
            eddy[i] = lp.EddyTorqueNm;
            lift[i] = lp.LiftN;
        }

        var curves = new MotorTorqueCurve[duties.Count];
        for (int k = 0; k < duties.Count; k++)
        {
            var command = DriveCommand.Duty(duties[k]);
            var torque = new double[points];
            var current = new double[points];
            var voltage = new double[points];
            var regimes = new DriveRegime[points];
            for (int i = 0; i < points; i++)
            {
                var input = new DriveInput(drivetrain, command, speeds[i], conditions.WindingTempC, conditions.MotorMagnetTempC, conditions.Braking);
                DriveBus.Solve(source, in input, out var p);
                torque[i] = p.TorqueNm;
                current[i] = p.MotorCurrentA;
                voltage[i] = p.BusVoltageV;
                regimes[i] = p.Regime;
            }
            var equilibria = OperatingPointFinder.Find(drive, ThrottleCommand.Duty(duties[k]), conditions, options).Equilibria;
            curves[k] = new MotorTorqueCurve(duties[k], torque, current, voltage, regimes, equilibria);
        }
        return new TorqueSpeedMap(speeds, load, eddy, lift, curves);
    }
}
