namespace RotorDrive.Core.Safety;

/// <summary>Whether the retaining ring's stress and margin could be assessed from the rotor's catalog row.</summary>
public enum RetainerAssessment
{
    /// <summary>Stress and margin computed.</summary>
    Assessed,

    /// <summary>Not assessed: the rotor row gives no retainer thickness, so neither stress nor margin is known.</summary>
    NoRetainerThickness,

    /// <summary>Stress computed, margin not assessed: the rotor row gives no allowable stress.</summary>
    NoAllowableStress,
}
