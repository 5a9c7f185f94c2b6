namespace RotorDrive.Core.Drive;

/// <summary>One rotor's motor and speed controller with their settings: the fixed part of a station's drive.</summary>
/// <remarks>The motor follows Drela's first-order model (M. Drela, "First-Order DC Electric Motor Model", MIT, 2007); the
/// controller is an averaged switch: motor voltage = d Vbus - I R_on, bus current = d I + idle current. Construct once
/// per station; the bus solver (<see cref="DriveBus"/>) reads it in its inner loop.</remarks>
public sealed record Drivetrain
{
    /// <summary>Creates a drivetrain and checks that the parts form a solvable circuit.</summary>
    /// <param name="motor">The motor.</param>
    /// <param name="controller">The speed controller.</param>
    /// <param name="options">Settings, or null for <see cref="DriveOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The motor or controller is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A rating or setting is not finite or outside its physical range
    /// (Kv, current limit and loop resistance must be positive; I0, R, R_on and idle current not negative; at least
    /// one pole pair).</exception>
    public Drivetrain(Motor motor, SpeedController controller, DriveOptions? options = null)
    {
        Motor = Preconditions.NotNull(motor, nameof(motor));
        Controller = Preconditions.NotNull(controller, nameof(controller));
        Options = options ?? DriveOptions.Default;
        Preconditions.Positive(motor.KvRadPerSPerV, "motor Kv");
        Preconditions.NonNegative(motor.ResistanceOhm, "motor resistance");
        Preconditions.NonNegative(motor.NoLoadCurrentA, "motor no-load current");
        Preconditions.AtLeast(motor.PolePairs, 1, "motor pole pairs");
        Preconditions.NonNegative(controller.OnResistanceOhm, "controller on-resistance");
        Preconditions.NonNegative(controller.IdleCurrentA, "controller idle current");
        Preconditions.Positive(controller.BurstCurrentA, "controller burst current");
        Preconditions.Positive(Options.CurrentLimitScale, nameof(DriveOptions.CurrentLimitScale));
        Preconditions.InRange(Options.MagnetFluxTempCoeffPerK, -0.01, 0.0, nameof(DriveOptions.MagnetFluxTempCoeffPerK));
        Preconditions.InRange(Options.MaxDuty, double.Epsilon, 1.0, nameof(DriveOptions.MaxDuty));
        Preconditions.Positive(motor.ResistanceOhm + controller.OnResistanceOhm, "motor resistance + controller on-resistance");
        CurrentLimitA = controller.BurstCurrentA * Options.CurrentLimitScale;
    }

    /// <summary>The motor.</summary>
    public Motor Motor { get; }

    /// <summary>The speed controller.</summary>
    public SpeedController Controller { get; }

    /// <summary>The settings.</summary>
    public DriveOptions Options { get; }

    /// <summary>Phase-current limit the controller enforces by lowering its duty, A: burst current x scale.</summary>
    public double CurrentLimitA { get; }

    /// <summary>Largest duty, in (0, 1].</summary>
    public double MaxDuty => Options.MaxDuty;

    /// <summary>Loop resistance at a winding temperature: motor R(T) + controller R_on, ohm.</summary>
    /// <param name="windingTempC">Winding temperature, C.</param>
    public double LoopResistanceAt(double windingTempC) => Motor.ResistanceAt(windingTempC) + Controller.OnResistanceOhm;

    /// <summary>Relative flux of the motor's magnets at a temperature (see <see cref="Motor.FluxFactorAt"/>).</summary>
    /// <param name="magnetTempC">Motor magnet temperature, C.</param>
    /// <exception cref="ArgumentOutOfRangeException">The temperature is not finite or the factor is not positive.</exception>
    public double FluxFactorAt(double magnetTempC) => Motor.FluxFactorAt(magnetTempC, Options.MagnetFluxTempCoeffPerK);

    /// <summary>Largest shaft speed the controller commutates with this motor, rad/s (max eRPM / pole pairs).</summary>
    public double MaxCommutatedSpeedRadPerS => Controller.MaxShaftSpeedRadPerS(Motor.PolePairs);

    /// <summary>No-load speed at a bus voltage and duty, rad/s: the speed where the back-EMF equals d Vbus.</summary>
    /// <param name="busVoltageV">Bus voltage, V.</param>
    /// <param name="duty">Duty, 0..1.</param>
    /// <param name="magnetTempC">Motor magnet temperature, C.</param>
    public double FreeSpeedRadPerS(double busVoltageV, double duty, double magnetTempC)
        => duty * busVoltageV * Motor.KvRadPerSPerV / FluxFactorAt(magnetTempC);

    /// <summary>The duty that drives a motor current at a shaft speed from a bus voltage: the motor needs I R(T) + E
    /// (E = flux omega / Kv, M. Drela, "First-Order DC Electric Motor Model", MIT, 2007) and the averaged switch gives
    /// d Vbus - I R_on, so d = (I (R(T) + R_on) + E) / Vbus. Not clamped: above the max duty the point cannot be driven.</summary>
    /// <param name="currentA">Motor current, A.</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    /// <param name="busVoltageV">Bus voltage, V (&gt; 0).</param>
    /// <param name="windingTempC">Winding temperature, C.</param>
    /// <param name="fluxFactor">Relative flux of the motor's magnets (<see cref="FluxFactorAt"/>).</param>
    public double DutyFor(double currentA, double speedRadPerS, double busVoltageV, double windingTempC, double fluxFactor)
        => (currentA * LoopResistanceAt(windingTempC) + fluxFactor * speedRadPerS / Motor.KvRadPerSPerV) / busVoltageV;

    /// <summary>Total mass of motor and controller, kg.</summary>
    public double MassKg => Motor.MassKg + Controller.MassKg;
}
