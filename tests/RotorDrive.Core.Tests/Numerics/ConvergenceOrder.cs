using MathNet.Numerics;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Numerics;

/// <summary>The observed order of convergence, measured once for every integrator and interpolation test.</summary>
/// <remarks>If the error behaves as C h^p, log(error) is a straight line of slope p in log(h): the observed order is the
/// least-squares slope over a sequence of step sizes (the standard numerical check of a method's order, e.g. Hairer,
/// Norsett &amp; Wanner, "Solving ODEs I", 1993, II.10 figures of error against work).</remarks>
internal static class ConvergenceOrder
{
    /// <summary>Least-squares slope of log(error) against log(step).</summary>
    public static double Observed(IReadOnlyList<double> steps, Func<double, double> errorForStep)
    {
        var logH = steps.Select(h => Math.Log(h)).ToArray();
        var logE = steps.Select(h =>
        {
            double e = errorForStep(h);
            if (!(e > 0))
            {
                throw new InvalidOperationException($"error {e} at step {h} is not positive: choose larger steps.");
            }
            return Math.Log(e);
        }).ToArray();
        return Fit.Line(logH, logE).Item2;
    }

    /// <summary>Asserts that the observed order lies within +-<paramref name="slack"/> of <paramref name="expected"/>.</summary>
    public static void Assert(double expected, IReadOnlyList<double> steps, Func<double, double> errorForStep, double slack = 0.25)
    {
        double observed = Observed(steps, errorForStep);
        RelAssert.InRange(observed, expected - slack, expected + slack, $"observed order (expected {expected})");
    }
}
