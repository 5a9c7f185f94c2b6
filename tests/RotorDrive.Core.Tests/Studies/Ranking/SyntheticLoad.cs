using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Tests.Studies.Ranking;

/// <summary>A rotor load of closed form for hand-checkable ranking tests: the thin-sheet eddy-current forces of
/// J. R. Reitz, J. Appl. Phys. 41, 2067 (1970): lift = L_max s^2 / (1 + s^2), drag torque = 2 Q_peak s / (1 + s^2),
/// s = omega / omega_c, both scaled by e^(-2 k (g - g_ref)) for the gap (field decaying as e^(-k g)). No windage or
/// bearing drag, no temperature dependence.</summary>
internal sealed class SyntheticLoad(double liftMaxN, double torquePeakNm, double cornerRadPerS, double wavenumberPerM, double referenceGapM) : IRotorLoad
{
    public double LiftMaxN => liftMaxN;

    public double TorquePeakNm => torquePeakNm;

    public double CornerRadPerS => cornerRadPerS;

    public double GapFactor(double gapM) => Math.Exp(-2 * wavenumberPerM * (gapM - referenceGapM));

    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        double s = speedRadPerS / cornerRadPerS;
        double f = GapFactor(gapM);
        double lift = f * liftMaxN * s * s / (1 + s * s);
        double torque = f * 2 * torquePeakNm * s / (1 + s * s);
        return new LoadPoint(lift, torque, 0, 0, torque * speedRadPerS);
    }
}
