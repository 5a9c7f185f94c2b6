namespace RotorDrive.Core.Simulation;

/// <summary>Closed-form response of a first-order lag dT/dt = (T_target - T) / tau to a constant input.</summary>
/// <remarks>Lumped-capacitance solution T(t) = T_target + (T_0 - T_target) e^(-t / tau) (F. P. Incropera et al.,
/// "Fundamentals of Heat and Mass Transfer", section 5.1-5.3, lumped capacitance method).</remarks>
internal static class FirstOrderLag
{
    /// <summary>Temperature after <paramref name="elapsedS"/> seconds, starting at <paramref name="startC"/> and
    /// approaching <paramref name="targetC"/> with time constant <paramref name="timeConstantS"/>.</summary>
    public static double Approach(double startC, double targetC, double timeConstantS, double elapsedS)
        => targetC + (startC - targetC) * Math.Exp(-elapsedS / timeConstantS);
}
