using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Tests.Drive;

/// <summary>A constant load torque at every speed above rest (Drela's worked motor example loads the shaft this way).</summary>
internal sealed class ConstantTorqueLoad(double torqueNm) : IRotorLoad
{
    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
        => new(0, 0, 0, torqueNm, 0);
}

/// <summary>One radius strip of a rotor over a thin conducting sheet: drag force F0 s/(1+s^2) and lift F0 s^2/(1+s^2)
/// with s = omega/omegaC (J. R. Reitz, "Forces on moving magnets due to eddy currents", J. Appl. Phys. 41, 2067, 1970).
/// The drag torque F0 r s/(1+s^2) peaks at s = 1 with F0 r / 2. Temperatures and gap are ignored.</summary>
internal sealed class ThinSheetStripLoad(double forceScaleN, double radiusM, double characteristicSpeedRadPerS, double bearingTorqueNm = 0) : IRotorLoad
{
    public double PeakTorqueNm => 0.5 * forceScaleN * radiusM;

    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        double s = speedRadPerS / characteristicSpeedRadPerS;
        double drag = forceScaleN * s / (1 + s * s);
        double lift = forceScaleN * s * s / (1 + s * s);
        double eddy = drag * radiusM;
        double bearing = speedRadPerS > 0 ? bearingTorqueNm : 0;
        return new LoadPoint(lift, eddy, 0, bearing, eddy * speedRadPerS);
    }

    public override string ToString()
        => FormattableString.Invariant($"strip F0={forceScaleN:R} r={radiusM:R} wc={characteristicSpeedRadPerS:R} bearing={bearingTorqueNm:R}");
}
