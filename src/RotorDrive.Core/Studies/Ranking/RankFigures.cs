namespace RotorDrive.Core.Studies.Ranking;

/// <summary>The figures of one combination hovering the rig at the design gap (pack full unless stated).</summary>
/// <param name="TotalMassKg">Craft mass with this drivetrain and packs, kg.</param>
/// <param name="StationSpeedsRadPerS">Trimmed shaft speed per station, rad/s.</param>
/// <param name="StationMotorCurrentsA">Motor current per station, A.</param>
/// <param name="StationDuties">Controller duty per station on a full pack, 0..1; empty when the pack cannot deliver the hover.</param>
/// <param name="BusVoltageV">Loaded pack voltage on a full pack, V.</param>
/// <param name="PackCurrentA">Pack current on a full pack, A.</param>
/// <param name="ElectricalPowerW">Power the packs deliver on a full charge, W.</param>
/// <param name="EddyPowerW">Power into the plate (all rotors), W.</param>
/// <param name="LiftSpecificPowerWPerN">Electrical power per newton of weight, W/N.</param>
/// <param name="RuntimeS">Hover time until the first limit (usable capacity, cutoff voltage, duty), s.</param>
/// <param name="RuntimeLimit">The limit that ends the hover, in words.</param>
/// <param name="PeakPackCurrentA">Largest pack current during the hover (at its end), A.</param>
/// <param name="CurrentMarginFraction">Worst relative margin of the motor, controller (continuous) and pack (continuous)
/// currents over the hover: 1 - value / rating, smallest of the three; null when the hover is not reached.</param>
/// <param name="DragPeakTorqueMarginFraction">Smallest ratio over stations of the current-limited motor torque to the load torque
/// at the landed-gap drag peak, minus 1 (negative: stuck below the peak); null when no rotor has a drag peak.</param>
public sealed record RankFigures(
    double TotalMassKg,
    IReadOnlyList<double> StationSpeedsRadPerS,
    IReadOnlyList<double> StationMotorCurrentsA,
    IReadOnlyList<double> StationDuties,
    double BusVoltageV,
    double PackCurrentA,
    double ElectricalPowerW,
    double EddyPowerW,
    double LiftSpecificPowerWPerN,
    double RuntimeS,
    string RuntimeLimit,
    double PeakPackCurrentA,
    double? CurrentMarginFraction,
    double? DragPeakTorqueMarginFraction)
{
    /// <summary>Fastest station's hover speed, rpm.</summary>
    public double MaxSpeedRpm => StationSpeedsRadPerS.Count == 0 ? 0 : Units.RadPerSToRpm(StationSpeedsRadPerS.Max());

    /// <summary>Largest motor current of any station, A.</summary>
    public double MaxMotorCurrentA => StationMotorCurrentsA.Count == 0 ? 0 : StationMotorCurrentsA.Max();

    /// <summary>Largest duty of any station, 0..1.</summary>
    public double MaxDuty => StationDuties.Count == 0 ? 0 : StationDuties.Max();
}
