using MathNet.Numerics.RootFinding;

namespace RotorDrive.Core.Loads;

/// <summary>Finds the speed of maximum eddy drag torque of a rotor load at a gap and plate temperature.</summary>
/// <remarks>Method: scan the eddy torque at log-spaced speeds from a small fraction of the top speed to the top speed,
/// take the best sample and its neighbours as a bracket, and refine by finding the zero of the torque's slope in
/// ln(speed) with Brent's method (MathNet.Numerics RootFinding.Brent; R. P. Brent, Algorithms for Minimization without
/// Derivatives, 1973). The slope is a central difference in ln(speed). Works with any <see cref="IRotorLoad"/>: the
/// table, the direct model or a calibrated one.</remarks>
public static class DragPeakFinder
{
    private const double SlopeStep = 1e-4;

    /// <summary>Finds the drag peak between 0 and a top speed.</summary>
    /// <param name="load">The rotor load.</param>
    /// <param name="gapM">Air gap, m, at least 0.</param>
    /// <param name="plateTempC">Plate temperature, C.</param>
    /// <param name="magnetTempC">Magnet temperature, C.</param>
    /// <param name="maxSpeedRadPerS">Top of the searched speed range, rad/s, greater than 0.</param>
    /// <param name="options">Search settings, or null for <see cref="DragPeakOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The load is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An argument or option is out of range.</exception>
    public static DragPeak Find(IRotorLoad load, double gapM, double plateTempC, double magnetTempC, double maxSpeedRadPerS, DragPeakOptions? options = null)
    {
        Preconditions.NotNull(load, nameof(load));
        Preconditions.NonNegative(gapM, nameof(gapM));
        Preconditions.Finite(plateTempC, nameof(plateTempC));
        Preconditions.Finite(magnetTempC, nameof(magnetTempC));
        Preconditions.Positive(maxSpeedRadPerS, nameof(maxSpeedRadPerS));
        options ??= DragPeakOptions.Default;
        Preconditions.InRange(options.ScanPoints, 8, 10000, "scan points");
        Preconditions.InRange(options.LowestSpeedFraction, double.Epsilon, 0.5, "lowest speed fraction");
        Preconditions.InRange(options.RelativeTolerance, 1e-12, 1e-2, "relative tolerance");
        Preconditions.InRange(options.MaxIterations, 1, 1000, "max iterations");

        int evaluations = 0;
        double TorqueAt(double speed)
        {
            evaluations++;
            return load.Evaluate(speed, gapM, plateTempC, magnetTempC).EddyTorqueNm;
        }
        double Torque(double lnSpeed) => TorqueAt(Math.Exp(lnSpeed));

        double lnTop = Math.Log(maxSpeedRadPerS);
        double lnBottom = lnTop + Math.Log(options.LowestSpeedFraction);
        int n = options.ScanPoints;
        double step = (lnTop - lnBottom) / (n - 1);
        int best = 0;
        double bestTorque = double.NegativeInfinity;
        for (int i = 0; i < n; i++)
        {
            // The last scanned speed is the top speed itself, not exp(ln(top)), so a peak above the range reports it exactly.
            double t = i == n - 1 ? TorqueAt(maxSpeedRadPerS) : Torque(lnBottom + i * step);
            if (t > bestTorque)
            {
                bestTorque = t;
                best = i;
            }
        }

        if (!(bestTorque > 0))
        {
            return new DragPeak(maxSpeedRadPerS, 0.0, gapM, plateTempC, evaluations, DragPeakStatus.NoDrag);
        }
        if (best == n - 1)
        {
            return new DragPeak(maxSpeedRadPerS, bestTorque, gapM, plateTempC, evaluations, DragPeakStatus.AboveSearchRange);
        }

        // Bracket [best - 1, best + 1] in ln(speed); below the scan the torque falls towards 0 like the speed itself.
        double lo = lnBottom + Math.Max(best - 1, 0) * step - (best == 0 ? 10 * step : 0);
        double hi = lnBottom + (best + 1) * step;
        double Slope(double lnSpeed) => (Torque(lnSpeed + SlopeStep) - Torque(lnSpeed - SlopeStep)) / (2 * SlopeStep);
        if (Brent.TryFindRoot(Slope, lo, hi, options.RelativeTolerance, options.MaxIterations, out double lnPeak))
        {
            double peakTorque = Torque(lnPeak);
            if (peakTorque >= bestTorque * (1 - 1e-9))
            {
                return new DragPeak(Math.Exp(lnPeak), peakTorque, gapM, plateTempC, evaluations, DragPeakStatus.Converged);
            }
        }
        return new DragPeak(Math.Exp(lnBottom + best * step), bestTorque, gapM, plateTempC, evaluations, DragPeakStatus.ScanOnly);
    }
}
