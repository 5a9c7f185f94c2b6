namespace RotorDrive.Core.Loads;

/// <summary>Evaluates a rotor load over a list of speeds at one gap and temperature (the rows of the load command).</summary>
public static class LoadSweep
{
    /// <summary>Runs the sweep and finds the drag peak up to a top speed.</summary>
    /// <param name="load">The rotor load (normally the table).</param>
    /// <param name="rotorId">The rotor's id, carried into the result.</param>
    /// <param name="endEffectCorrection">Whether the load was built with the finite-width correction (carried into the result).</param>
    /// <param name="gapM">Air gap, m, at least 0.</param>
    /// <param name="plateTempC">Plate temperature, C.</param>
    /// <param name="magnetTempC">Magnet temperature, C.</param>
    /// <param name="speedsRadPerS">Speeds, rad/s (signed values allowed).</param>
    /// <param name="peakSearchTopRadPerS">Top of the drag-peak search, rad/s, greater than 0 (normally the rotor's rated speed).</param>
    /// <param name="peakOptions">Drag-peak search settings, or null for the defaults.</param>
    /// <exception cref="ArgumentNullException">The load, id or speeds are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public static LoadSweepResult Run(
        IRotorLoad load,
        string rotorId,
        bool endEffectCorrection,
        double gapM,
        double plateTempC,
        double magnetTempC,
        IReadOnlyList<double> speedsRadPerS,
        double peakSearchTopRadPerS,
        DragPeakOptions? peakOptions = null)
    {
        Preconditions.NotNull(load, nameof(load));
        Preconditions.NotNull(rotorId, nameof(rotorId));
        Preconditions.NotNull(speedsRadPerS, nameof(speedsRadPerS));
        Preconditions.NonNegative(gapM, nameof(gapM));
        var rows = new LoadSweepRow[speedsRadPerS.Count];
        for (int i = 0; i < rows.Length; i++)
        {
            double speed = Preconditions.Finite(speedsRadPerS[i], "speed");
            LoadPoint p = load.Evaluate(speed, gapM, plateTempC, magnetTempC);
            rows[i] = new LoadSweepRow(speed, p.LiftN, p.EddyTorqueNm, p.WindageTorqueNm, p.BearingTorqueNm, p.TotalTorqueNm, p.EddyPowerW);
        }
        DragPeak peak = DragPeakFinder.Find(load, gapM, plateTempC, magnetTempC, peakSearchTopRadPerS, peakOptions);
        return new LoadSweepResult(rotorId, gapM, plateTempC, magnetTempC, endEffectCorrection, rows, peak);
    }
}
