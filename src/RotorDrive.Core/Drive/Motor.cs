namespace RotorDrive.Core.Drive;

/// <summary>A brushless DC motor described by the first-order model's constants, in SI units.</summary>
/// <remarks>M. Drela, "First-Order DC Electric Motor Model", MIT, 2007: I = (V - omega/Kv) / R, Q = (I - I0) / Kq with
/// Kq = Kv in SI. Resistance is phase-to-phase at 20 C.</remarks>
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
}
