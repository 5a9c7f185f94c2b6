using System.Numerics;
using MathNet.Numerics;
using MathNet.Numerics.IntegralTransforms;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Tests.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Numerics;

public sealed class FftTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(8)]
    [InlineData(64)]
    [InlineData(256)]
    public void Forward_MatchesMathNetsTransform(int n)
    {
        // Reference: MathNet.Numerics Fourier.Forward with NumericalRecipes-style options has the e^(-i...) exponent
        // and no scaling: the same definition as ours.
        var random = new Random(7);
        var data = Enumerable.Range(0, n).Select(_ => new Complex(random.NextDouble() - 0.5, random.NextDouble() - 0.5)).ToArray();
        var expected = data.ToArray();
        Fourier.Forward(expected, FourierOptions.NoScaling);
        var actual = data.ToArray();
        new Fft(n).Transform(actual, inverse: false);
        for (int i = 0; i < n; i++)
        {
            RelAssert.Close(0, (actual[i] - expected[i]).Magnitude, 0, 1e-12 * n, $"mode {i}");
        }
    }

    [Fact]
    public void Inverse2D_UndoesForward2D_AndMatchesTheDirectSum()
    {
        // MathNet's managed provider does not offer the 2-D transform; the reference is the defining double sum
        // X_(p,q) = sum_(r,c) x_(r,c) e^(-2 pi i (p r + q c) / n).
        int n = 8;
        var random = new Random(3);
        var data = Enumerable.Range(0, n * n).Select(_ => new Complex(random.NextDouble(), random.NextDouble())).ToArray();
        var expected = new Complex[n * n];
        for (int p = 0; p < n; p++)
        {
            for (int q = 0; q < n; q++)
            {
                for (int r = 0; r < n; r++)
                {
                    for (int c = 0; c < n; c++)
                    {
                        expected[p * n + q] += data[r * n + c] * Complex.FromPolarCoordinates(1, -2 * Math.PI * (p * r + q * c) / n);
                    }
                }
            }
        }
        var fft = new Fft(n);
        var column = new Complex[n];
        var actual = data.ToArray();
        fft.Transform2D(actual, inverse: false, column);
        for (int i = 0; i < n * n; i++)
        {
            RelAssert.Close(0, (actual[i] - expected[i]).Magnitude, 0, 1e-11, $"2-D mode {i}");
        }
        fft.Transform2D(actual, inverse: true, column);
        for (int i = 0; i < n * n; i++)
        {
            RelAssert.Close(0, (actual[i] / (n * n) - data[i]).Magnitude, 0, 1e-13, $"round trip {i}");
        }
    }

    [Fact]
    public void Length_MustBeAPowerOfTwo()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Fft(12));
        Assert.Throws<ArgumentOutOfRangeException>(() => new Fft(0));
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.5)]
    [InlineData(2.9)]
    [InlineData(3.1)]
    [InlineData(7.3)]
    [InlineData(25.0)]
    [InlineData(140.0)]
    [InlineData(-4.2)]
    public void BesselJ0AndJ1_MatchMathNet(double x)
    {
        // Abramowitz & Stegun 9.4.1-9.4.6 claim an absolute error below about 1e-7; MathNet's general-order BesselJ
        // (Amos' algorithm) is the reference.
        RelAssert.Close(SpecialFunctions.BesselJ(0, x), Bessel.J0(x), 0, 2e-7, "J0");
        RelAssert.Close(SpecialFunctions.BesselJ(1, x), Bessel.J1(x), 0, 2e-7, "J1");
    }
}
