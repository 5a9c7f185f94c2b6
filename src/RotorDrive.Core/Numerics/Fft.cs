using System.Numerics;

namespace RotorDrive.Core.Numerics;

/// <summary>In-place radix-2 fast Fourier transform of complex data, one- and two-dimensional, for lengths that are powers
/// of two.</summary>
/// <remarks>Iterative Cooley-Tukey decimation in time with bit-reversed input order (J. W. Cooley &amp; J. W. Tukey, "An
/// algorithm for the machine calculation of complex Fourier series", Math. Comp. 19, 1965; layout as in W. H. Press et
/// al., "Numerical Recipes", 3rd ed., 2007, section 12.2). Forward: X_m = sum_n x_n e^(-2 pi i m n / N); inverse: the
/// same with e^(+...), unscaled. Written by hand because the plate heat solver transforms the same grid hundreds of times
/// per run and MathNet.Numerics allocates per call; tested against MathNet's 1-D transform. An instance holds the
/// twiddle factors for one length; it is immutable and thread-safe.</remarks>
internal sealed class Fft
{
    private readonly double[] _twiddleRe;
    private readonly double[] _twiddleIm;
    private readonly int[] _reversed;

    /// <summary>Prepares the transform of one length.</summary>
    /// <param name="length">Transform length, a power of two from 1 to 2^24.</param>
    /// <exception cref="ArgumentOutOfRangeException">The length is not a power of two in range.</exception>
    public Fft(int length)
    {
        if (length < 1 || length > (1 << 24) || (length & (length - 1)) != 0)
        {
            throw new ArgumentOutOfRangeException(nameof(length), length, $"the transform length must be a power of two from 1 to 2^24; got {length}.");
        }
        Length = length;
        _twiddleRe = new double[Math.Max(1, length / 2)];
        _twiddleIm = new double[Math.Max(1, length / 2)];
        for (int k = 0; k < length / 2; k++)
        {
            double a = -2.0 * Math.PI * k / length;
            _twiddleRe[k] = Math.Cos(a);
            _twiddleIm[k] = Math.Sin(a);
        }
        _reversed = new int[length];
        int bits = 0;
        while ((1 << bits) < length)
        {
            bits++;
        }
        for (int i = 0; i < length; i++)
        {
            int r = 0;
            for (int b = 0; b < bits; b++)
            {
                r |= ((i >> b) & 1) << (bits - 1 - b);
            }
            _reversed[i] = r;
        }
    }

    /// <summary>The transform length.</summary>
    public int Length { get; }

    /// <summary>Transforms a span of <see cref="Length"/> values in place.</summary>
    /// <param name="data">The values.</param>
    /// <param name="inverse">False for e^(-i...) (forward), true for e^(+i...) (inverse, unscaled).</param>
    /// <exception cref="ArgumentException">The span length differs from <see cref="Length"/>.</exception>
    public void Transform(Span<Complex> data, bool inverse)
    {
        int n = Length;
        if (data.Length != n)
        {
            throw new ArgumentException($"expected {n} values; got {data.Length}.", nameof(data));
        }
        for (int i = 0; i < n; i++)
        {
            int j = _reversed[i];
            if (j > i)
            {
                (data[i], data[j]) = (data[j], data[i]);
            }
        }
        // Butterflies on the interleaved (re, im) doubles: the same arithmetic as Complex, without its operator calls.
        var v = System.Runtime.InteropServices.MemoryMarshal.Cast<Complex, double>(data);
        double sign = inverse ? -1.0 : 1.0;
        for (int size = 2; size <= n; size <<= 1)
        {
            int half = size >> 1;
            int stride = n / size;
            for (int k = 0; k < half; k++)
            {
                double wr = _twiddleRe[k * stride], wi = sign * _twiddleIm[k * stride];
                for (int start = k; start < n; start += size)
                {
                    int a = 2 * start, b = 2 * (start + half);
                    double br = wr * v[b] - wi * v[b + 1];
                    double bi = wr * v[b + 1] + wi * v[b];
                    double ar = v[a], ai = v[a + 1];
                    v[a] = ar + br;
                    v[a + 1] = ai + bi;
                    v[b] = ar - br;
                    v[b + 1] = ai - bi;
                }
            }
        }
    }

    /// <summary>Transforms a square grid of <see cref="Length"/> x <see cref="Length"/> values stored row by row, in place:
    /// every row, then every column.</summary>
    /// <param name="grid">The values, index = row x Length + column.</param>
    /// <param name="inverse">False for forward, true for the unscaled inverse.</param>
    /// <param name="column">A work buffer of at least <see cref="Length"/> values.</param>
    /// <exception cref="ArgumentException">A size does not match.</exception>
    public void Transform2D(Complex[] grid, bool inverse, Complex[] column)
    {
        int n = Length;
        if (grid.Length != n * n || column.Length < n)
        {
            throw new ArgumentException($"expected a grid of {n} x {n} values and a buffer of {n}.", nameof(grid));
        }
        for (int row = 0; row < n; row++)
        {
            Transform(grid.AsSpan(row * n, n), inverse);
        }
        var buffer = column.AsSpan(0, n);
        for (int c = 0; c < n; c++)
        {
            for (int row = 0; row < n; row++)
            {
                buffer[row] = grid[row * n + c];
            }
            Transform(buffer, inverse);
            for (int row = 0; row < n; row++)
            {
                grid[row * n + c] = buffer[row];
            }
        }
    }
}
