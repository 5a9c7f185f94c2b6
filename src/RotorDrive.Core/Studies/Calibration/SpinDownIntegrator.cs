namespace RotorDrive.Core.Studies.Calibration;

/// <summary>Integrates a coasting rotor's speed, J d(omega)/dt = -T(omega, t), from a starting speed through a list of
/// sample times with the classical fourth-order Runge-Kutta method and a fixed number of sub-steps per interval.</summary>
/// <remarks>Classical RK4 (Butcher, Numerical Methods for Ordinary Differential Equations, 2016, §32): global error of
/// order h^4. The sub-step counts are fixed before a fit, so the computed trajectory is a smooth function of the
/// parameters and the fit's finite-difference Jacobian is clean. A drag torque that does not vanish at rest (Coulomb
/// friction) brings the rotor to rest in finite time: the speed is clamped at 0 and stays there.</remarks>
internal static class SpinDownIntegrator
{
    /// <summary>The speed at each sample time, rad/s.</summary>
    /// <param name="inertiaKgM2">Moment of inertia J, kg m^2.</param>
    /// <param name="torque">Drag torque T(omega, fraction of the interval, interval index), N m, for omega &gt; 0.</param>
    /// <param name="startSpeedRadPerS">Speed at the first sample time, rad/s.</param>
    /// <param name="timesS">Sample times, increasing.</param>
    /// <param name="subSteps">Sub-steps in each interval (index i is the interval from sample i to i + 1).</param>
    /// <param name="speeds">Where to write the speeds (same length as the times).</param>
    public static void Integrate(double inertiaKgM2, Func<double, double, int, double> torque, double startSpeedRadPerS,
        IReadOnlyList<double> timesS, IReadOnlyList<int> subSteps, Span<double> speeds)
    {
        double w = Math.Max(0.0, startSpeedRadPerS);
        speeds[0] = w;
        double invJ = 1.0 / inertiaKgM2;
        for (int i = 0; i + 1 < timesS.Count; i++)
        {
            int m = subSteps[i];
            double h = (timesS[i + 1] - timesS[i]) / m;
            double fractionStep = 1.0 / m;
            for (int s = 0; s < m && w > 0; s++)
            {
                double u = s * fractionStep;
                double k1 = Rate(torque, w, u, i, invJ);
                double k2 = Rate(torque, w + 0.5 * h * k1, u + 0.5 * fractionStep, i, invJ);
                double k3 = Rate(torque, w + 0.5 * h * k2, u + 0.5 * fractionStep, i, invJ);
                double k4 = Rate(torque, w + h * k3, u + fractionStep, i, invJ);
                w = Math.Max(0.0, w + h / 6.0 * (k1 + 2 * k2 + 2 * k3 + k4));
            }
            speeds[i + 1] = w;
        }
    }

    // dw/dt = -T(w)/J; a stage speed at or below 0 has no drag (the rotor is at rest).
    private static double Rate(Func<double, double, int, double> torque, double speed, double fraction, int interval, double invJ)
        => speed > 0 ? -torque(speed, fraction, interval) * invJ : 0.0;
}
