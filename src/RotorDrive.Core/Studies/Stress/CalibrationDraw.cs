using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Draws a rotor's calibration factors from the fit's normal approximation: mean the fitted values, covariance
/// the fit's, correlated through its Cholesky factor.</summary>
/// <remarks>x = mu + L z with L L^T = Sigma and z standard normal (the standard construction of a multivariate normal
/// sample; e.g. J. E. Gentle, Random Number Generation and Monte Carlo Methods, 2003, §5.3.1). Only the fitted
/// quantities (non-zero diagonal) take part; a quantity the rig's tolerances already spread is held at its fitted value,
/// which leaves the others with their exact marginal distribution. Factors are kept above 1 % of their fitted value and
/// bearing terms at or above 0, so a far tail never gives a state that cannot exist.</remarks>
internal static class CalibrationDraw
{
    /// <summary>One draw of a rotor's calibration.</summary>
    /// <param name="calibration">The fitted calibration with its covariance.</param>
    /// <param name="held">Per quantity (conductivity factor, field factor, bearing drag, bearing damping): true to hold it.</param>
    /// <param name="random">The sample's stream.</param>
    public static LoadCalibration Draw(RotorCalibration calibration, bool[] held, Random random)
    {
        var f = calibration.Factors;
        var mean = new[] { f.ConductivityFactor, f.FieldFactor, f.BearingDragNm ?? 0, f.BearingDampingNmPerRadPerS ?? 0 };
        var active = Enumerable.Range(0, 4).Where(k => calibration.Covariance[k][k] > 0).ToArray();
        var z = active.Select(_ => Normal.Sample(random, 0, 1)).ToArray();
        var x = (double[])mean.Clone();
        if (active.Length > 0)
        {
            var sigma = Matrix<double>.Build.Dense(active.Length, active.Length, (a, b) => calibration.Covariance[active[a]][active[b]]);
            Matrix<double> l;
            try
            {
                l = sigma.Cholesky().Factor;
            }
            catch (ArgumentException)
            {
                // Not positive definite (a quantity the data could not separate): fall back to the standard deviations alone.
                l = Matrix<double>.Build.DenseOfDiagonalArray(active.Select(k => Math.Sqrt(calibration.Covariance[k][k])).ToArray());
            }
            for (int a = 0; a < active.Length; a++)
            {
                double sum = 0;
                for (int b = 0; b <= a; b++)
                {
                    sum += l[a, b] * z[b];
                }
                x[active[a]] += sum;
            }
        }
        for (int k = 0; k < 4; k++)
        {
            if (held[k])
            {
                x[k] = mean[k];
            }
        }
        return new LoadCalibration(
            Math.Max(0.01 * mean[0], x[0]),
            Math.Max(0.01 * mean[1], x[1]),
            f.BearingDragNm is null ? null : Math.Max(0, x[2]),
            f.BearingDampingNmPerRadPerS is null ? null : Math.Max(0, x[3]));
    }
}
