using RotorDrive.Core.Loads;

namespace RotorDrive.Benchmarks.Drive;

/// <summary>A cheap analytic stand-in for the table-backed rotor load: one thin-sheet strip (J. R. Reitz, J. Appl. Phys.
/// 41, 2067, 1970: drag F0 s/(1+s^2), lift F0 s^2/(1+s^2), s = omega/omegaC) plus a windage term k omega^2 and a
/// constant bearing drag. Used by the drive benchmarks to separate the finder's own cost from the load table's.</summary>
public sealed class AnalyticStripLoad(double forceScaleN, double radiusM, double characteristicSpeedRadPerS, double windageNmPerRadPerS2, double bearingNm) : IRotorLoad
{
    /// <inheritdoc />
    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        double s = speedRadPerS / characteristicSpeedRadPerS;
        double attenuation = Math.Exp(-2 * 40 * (gapM - 0.01));
        double drag = attenuation * forceScaleN * s / (1 + s * s);
        double lift = attenuation * forceScaleN * s * s / (1 + s * s);
        double eddy = drag * radiusM;
        return new LoadPoint(lift, eddy, windageNmPerRadPerS2 * speedRadPerS * speedRadPerS, speedRadPerS > 0 ? bearingNm : 0, eddy * speedRadPerS);
    }
}
