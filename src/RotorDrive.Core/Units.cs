namespace RotorDrive.Core;

/// <summary>Unit conversions used at the boundary between catalog units and SI.</summary>
public static class Units
{
    /// <summary>Radians per second in one revolution per minute (2 pi / 60).</summary>
    public const double RadPerSPerRpm = 2 * Math.PI / 60.0;

    /// <summary>Standard gravity, m/s^2 (CGPM 1901, ISO 80000-3).</summary>
    public const double StandardGravity = 9.80665;

    /// <summary>Vacuum permeability, H/m (CODATA 2018: 1.25663706212e-6).</summary>
    public const double Mu0 = 1.25663706212e-6;

    /// <summary>Converts rpm to rad/s.</summary>
    public static double RpmToRadPerS(double rpm) => rpm * RadPerSPerRpm;

    /// <summary>Converts rad/s to rpm.</summary>
    public static double RadPerSToRpm(double radPerS) => radPerS / RadPerSPerRpm;
}
