using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Simulation;

/// <summary>One-node lumped thermal model of a motor winding: heat capacity C and thermal resistance Rth to ambient.</summary>
/// <remarks>
/// <para>C dT/dt = P - (T - T_ambient) / Rth with C = tau / Rth, where tau is the winding's thermal time constant and
/// Rth its winding-to-ambient thermal resistance, both catalog values (the lumped capacitance method: F. P. Incropera
/// et al., "Fundamentals of Heat and Mass Transfer", section 5.2). One node ignores the gradient between winding hot spot and mean winding
/// temperature and the stator/case path; catalog constants usually already lump those.</para>
/// <para>Heat input follows M. Drela's first-order motor model ("First-Order DC Electric Motor Model", MIT, 2007):
/// copper loss I^2 R(T) plus no-load loss I0 x back-EMF, with back-EMF = omega / Kv and R(T) from
/// <see cref="Motor.ResistanceAt"/>. The no-load loss stands for iron and friction losses and is taken as heat in the
/// winding node, a conservative lumping.</para>
/// </remarks>
public sealed record WindingThermalNode
{
    /// <summary>Creates a node from its thermal resistance and time constant.</summary>
    /// <param name="thermalResistanceKPerW">Winding-to-ambient thermal resistance Rth, K/W, &gt; 0.</param>
    /// <param name="timeConstantS">Thermal time constant tau, s, &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public WindingThermalNode(double thermalResistanceKPerW, double timeConstantS)
    {
        ThermalResistanceKPerW = Preconditions.Positive(thermalResistanceKPerW, nameof(thermalResistanceKPerW));
        TimeConstantS = Preconditions.Positive(timeConstantS, nameof(timeConstantS));
    }

    /// <summary>Winding-to-ambient thermal resistance Rth, K/W.</summary>
    public double ThermalResistanceKPerW { get; }

    /// <summary>Thermal time constant tau, s.</summary>
    public double TimeConstantS { get; }

    /// <summary>Lumped heat capacity C = tau / Rth, J/K.</summary>
    public double HeatCapacityJPerK => TimeConstantS / ThermalResistanceKPerW;

    /// <summary>The node for a motor, or null when its catalog row lacks the thermal resistance or time constant
    /// (then winding temperature is "not assessed").</summary>
    /// <param name="motor">The motor.</param>
    /// <exception cref="ArgumentNullException"><paramref name="motor"/> is null.</exception>
    public static WindingThermalNode? FromMotor(Motor motor)
    {
        Preconditions.NotNull(motor, nameof(motor));
        return motor is { ThermalResistanceKPerW: { } rth, ThermalTimeConstantS: { } tau }
            ? new WindingThermalNode(rth, tau)
            : null;
    }

    /// <summary>Heat generated in the motor, W: copper loss I^2 R(T) + no-load loss I0 x back-EMF, the back-EMF being
    /// flux |omega| / Kv (Drela 2007), as the drive model books it for the spin-up (DrivePoint.CopperLossW + NoLoadLossW);
    /// the endurance run heats its windings with this.</summary>
    /// <param name="motor">The motor.</param>
    /// <param name="currentA">Motor current, A (either sign; regeneration heats too).</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    /// <param name="windingTempC">Winding temperature, C, for R(T) = R20 (1 + 0.00393 (T - 20)).</param>
    /// <param name="fluxFactor">The motor magnets' flux relative to their rating at the magnet temperature
    /// (<see cref="Drive.Drivetrain.FluxFactorAt"/>), which scales the back-EMF; default 1.</param>
    /// <exception cref="ArgumentNullException"><paramref name="motor"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite.</exception>
    public static double HeatW(Motor motor, double currentA, double speedRadPerS, double windingTempC, double fluxFactor = 1.0)
    {
        Preconditions.NotNull(motor, nameof(motor));
        Preconditions.Finite(currentA, nameof(currentA));
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.Finite(windingTempC, nameof(windingTempC));
        double copper = currentA * currentA * motor.ResistanceAt(windingTempC);
        double noLoad = motor.NoLoadCurrentA * fluxFactor * Math.Abs(speedRadPerS) / motor.KvRadPerSPerV;
        return copper + noLoad;
    }

    /// <summary>Rate of change of the winding temperature, K/s: (P - (T - T_ambient) / Rth) / C.</summary>
    /// <param name="heatW">Heat input P, W.</param>
    /// <param name="windingTempC">Winding temperature T, C.</param>
    /// <param name="ambientC">Ambient temperature, C.</param>
    public double RateKPerS(double heatW, double windingTempC, double ambientC)
        => (heatW - (windingTempC - ambientC) / ThermalResistanceKPerW) / HeatCapacityJPerK;

    /// <summary>Steady-state winding temperature under a constant heat input, C: T_ambient + P Rth.</summary>
    /// <param name="heatW">Heat input P, W.</param>
    /// <param name="ambientC">Ambient temperature, C.</param>
    public double SteadyStateC(double heatW, double ambientC) => ambientC + heatW * ThermalResistanceKPerW;

    /// <summary>Winding temperature after a time under a constant heat input (closed form of the one-node model), C.</summary>
    /// <param name="startC">Temperature at the start, C.</param>
    /// <param name="heatW">Constant heat input P, W.</param>
    /// <param name="ambientC">Ambient temperature, C.</param>
    /// <param name="elapsedS">Elapsed time, s, &gt;= 0.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="elapsedS"/> is negative or not finite.</exception>
    public double TemperatureAfterC(double startC, double heatW, double ambientC, double elapsedS)
        => FirstOrderLag.Approach(startC, SteadyStateC(heatW, ambientC), TimeConstantS, Preconditions.NonNegative(elapsedS, nameof(elapsedS)));
}
