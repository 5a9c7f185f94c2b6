namespace RotorDrive.Core.Drive;

/// <summary>A brushless DC motor described by the first-order model's constants, in SI units.</summary>
/// <remarks>M. Drela, "First-Order DC Electric Motor Model", MIT, 2007: I = (V - omega/Kv) / R, Q = (I - I0) / Kq with
/// Kq = Kv in SI. Resistance is phase-to-phase at 20 C. The first-order model holds the no-load current I0 constant at
/// every speed (Drela's second-order model lets it grow with speed); <see cref="NoLoadVoltageV"/> is kept for reference
/// only. Temperature enters twice: the winding resistance rises with the copper's coefficient (IEC 60028) and the
/// magnets' flux falls with their remanence coefficient, which lowers both the torque per amp and the back-EMF per rad/s
/// by the same <see cref="FluxFactorAt"/> (the two constants are one flux linkage in a permanent-magnet machine).</remarks>
/// <param name="Id">Catalog id.</param>
/// <param name="KvRadPerSPerV">Speed constant Kv, (rad/s)/V.</param>
/// <param name="ResistanceOhm">Winding resistance at 20 C, ohm (phase to phase).</param>
/// <param name="NoLoadCurrentA">No-load current I0, A.</param>
/// <param name="NoLoadVoltageV">Voltage at which I0 was measured, V.</param>
/// <param name="MaxCurrentA">Maximum continuous current, A.</param>
/// <param name="MaxPowerW">Maximum electrical input power, W.</param>
/// <param name="Poles">Number of magnet poles of the motor (not pole pairs).</param>
/// <param name="MassKg">Motor mass, kg.</param>
/// <param name="ThermalResistanceKPerW">Winding-to-ambient thermal resistance, K/W, or null.</param>
/// <param name="ThermalTimeConstantS">Winding thermal time constant, s, or null.</param>
/// <param name="MaxWindingTempC">Maximum winding temperature, C, or null.</param>
public sealed record Motor(
    string Id,
    double KvRadPerSPerV,
    double ResistanceOhm,
    double NoLoadCurrentA,
    double NoLoadVoltageV,
    double MaxCurrentA,
    double MaxPowerW,
    int Poles,
    double MassKg,
    double? ThermalResistanceKPerW,
    double? ThermalTimeConstantS,
    double? MaxWindingTempC)
{
    /// <summary>Kv in the catalog unit, rpm/V.</summary>
    public double KvRpmPerV => Units.RadPerSToRpm(KvRadPerSPerV);

    /// <summary>Torque constant Kt = 1 / Kv(SI), N m/A; equals 60 / (2 pi Kv[rpm/V]).</summary>
    public double TorqueConstantNmPerA => 1.0 / KvRadPerSPerV;

    /// <summary>Motor pole pairs (electrical rpm = mechanical rpm x pole pairs).</summary>
    public int PolePairs => Poles / 2;

    /// <summary>Winding resistance at a temperature: R(T) = R20 (1 + 0.00393 (T - 20)) (copper, IEC 60028).</summary>
    public double ResistanceAt(double windingTempC) => ResistanceOhm * (1 + CopperTempCoeffPerK * (windingTempC - 20.0));

    /// <summary>Temperature coefficient of annealed copper's resistance at 20 C, 1/K (IEC 60028).</summary>
    public const double CopperTempCoeffPerK = 0.00393;

    /// <summary>Typical reversible temperature coefficient of sintered NdFeB remanence, 1/K (-0.12 %/K).</summary>
    /// <remarks>Magnet makers list -0.09 to -0.12 %/K for sintered NdFeB and measure -0.119 %/K for an N48SH grade between
    /// 20 and 150 C (Advanced Magnets, "What are temperature coefficients alpha and beta of permanent magnets", vendor
    /// technical note). The motor's flux is assumed to follow its magnets' remanence (air-gap dominated circuit).</remarks>
    public const double NdFeBFluxTempCoeffPerK = -0.0012;

    /// <summary>Relative flux of the motor's magnets at a temperature: 1 + beta (T - 20), dimensionless.</summary>
    /// <remarks>Linear reversible remanence model, valid below the magnet's knee (no irreversible loss). Multiplies the torque
    /// constant and the back-EMF constant alike: Kt(T) = Kt20 (1 + beta (T - 20)).</remarks>
    /// <param name="magnetTempC">Magnet temperature, C.</param>
    /// <param name="fluxTempCoeffPerK">Relative temperature coefficient of the flux, 1/K (e.g. <see cref="NdFeBFluxTempCoeffPerK"/>).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is not finite, or the factor would not be positive.</exception>
    public static double FluxFactorAt(double magnetTempC, double fluxTempCoeffPerK)
    {
        double factor = 1 + Preconditions.Finite(fluxTempCoeffPerK, nameof(fluxTempCoeffPerK)) * (Preconditions.Finite(magnetTempC, nameof(magnetTempC)) - 20.0);
        return Preconditions.Positive(factor, "flux factor 1 + beta (T - 20)");
    }

    /// <summary>Back-EMF at a shaft speed: E = phi omega / Kv, V (Drela 2007, with the flux factor phi).</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    /// <param name="fluxFactor">Relative flux from <see cref="FluxFactorAt"/> (1 at 20 C).</param>
    public double BackEmfV(double speedRadPerS, double fluxFactor) => fluxFactor * speedRadPerS / KvRadPerSPerV;

    /// <summary>Current drawn at a terminal voltage and speed: I = (V - E) / R(T), A (Drela 2007).</summary>
    /// <param name="motorVoltageV">Averaged terminal voltage, V.</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    /// <param name="windingTempC">Winding temperature, C.</param>
    /// <param name="fluxFactor">Relative flux from <see cref="FluxFactorAt"/>.</param>
    public double CurrentA(double motorVoltageV, double speedRadPerS, double windingTempC, double fluxFactor)
        => (motorVoltageV - BackEmfV(speedRadPerS, fluxFactor)) / ResistanceAt(windingTempC);

    /// <summary>Shaft torque at a current: Q = phi (I - I0) / Kv, N m (Drela 2007); negative below the no-load current.</summary>
    /// <param name="currentA">Motor current, A.</param>
    /// <param name="fluxFactor">Relative flux from <see cref="FluxFactorAt"/>.</param>
    public double TorqueNm(double currentA, double fluxFactor) => fluxFactor * (currentA - NoLoadCurrentA) / KvRadPerSPerV;

    /// <summary>Current needed for a shaft torque: I = Kv Q / phi + I0, A (Drela 2007, inverted).</summary>
    /// <param name="torqueNm">Shaft torque, N m.</param>
    /// <param name="fluxFactor">Relative flux from <see cref="FluxFactorAt"/>.</param>
    public double CurrentForTorqueA(double torqueNm, double fluxFactor) => torqueNm * KvRadPerSPerV / fluxFactor + NoLoadCurrentA;

    /// <summary>Electrical rpm at a shaft speed: mechanical rpm x pole pairs.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    public double ElectricalRpm(double speedRadPerS) => Units.RadPerSToRpm(speedRadPerS) * PolePairs;
}
