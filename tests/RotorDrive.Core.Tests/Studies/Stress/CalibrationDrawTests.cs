using RotorDrive.Core.Loads;
using RotorDrive.Core.Studies;
using RotorDrive.Core.Studies.Stress;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Stress;

public class CalibrationDrawTests
{
    // x = mu + L z with L L^T = Sigma has covariance Sigma (Gentle, Random Number Generation and Monte Carlo Methods,
    // 2003, §5.3.1): over 20 000 seeded draws the sample means, standard deviations and correlation match within a few
    // standard errors (sd of a sample correlation about (1 - rho^2)/sqrt(n) = 0.003 here).
    [Fact]
    public void Draws_HaveTheFittedMeanSpreadAndCorrelation()
    {
        double s0 = 0.02, s1 = 0.01, rho = -0.8;
        var covariance = new[]
        {
            new[] { s0 * s0, rho * s0 * s1, 0, 0 },
            new[] { rho * s0 * s1, s1 * s1, 0, 0 },
            new double[4],
            new double[4],
        };
        var calibration = new RotorCalibration("r", new LoadCalibration(0.9, 0.95, null, null), covariance, "cal.csv");
        const int n = 20_000;
        var x = new double[n];
        var y = new double[n];
        for (int k = 0; k < n; k++)
        {
            var d = CalibrationDraw.Draw(calibration, new bool[4], SampleStreams.ForSample(3, k));
            x[k] = d.ConductivityFactor;
            y[k] = d.FieldFactor;
            Assert.Null(d.BearingDragNm);
        }
        Assert.Equal(0.9, x.Average(), 0.001);
        Assert.Equal(0.95, y.Average(), 0.0005);
        Assert.Equal(s0, MathNet.Numerics.Statistics.Statistics.StandardDeviation(x), 0.0005);
        Assert.Equal(s1, MathNet.Numerics.Statistics.Statistics.StandardDeviation(y), 0.00025);
        Assert.Equal(rho, MathNet.Numerics.Statistics.Correlation.Pearson(x, y), 0.015);
    }

    [Fact]
    public void AHeldFactor_StaysAtItsFittedValue()
    {
        var covariance = new[] { new[] { 1e-4, 0, 0, 0 }, new[] { 0, 1e-4, 0, 0 }, new double[4], new double[4] };
        var calibration = new RotorCalibration("r", new LoadCalibration(0.9, 0.95, null, null), covariance, "cal.csv");
        var d = CalibrationDraw.Draw(calibration, [true, false, false, false], SampleStreams.ForSample(1, 0));
        Assert.Equal(0.9, d.ConductivityFactor);
        Assert.NotEqual(0.95, d.FieldFactor);
    }
}
