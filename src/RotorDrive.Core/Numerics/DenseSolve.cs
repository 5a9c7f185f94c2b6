namespace RotorDrive.Core.Numerics;

/// <summary>In-place Gaussian elimination with partial pivoting for the small dense systems of the trim (G. H. Golub &amp;
/// C. F. Van Loan, Matrix Computations, 4th ed. 2013, algorithm 3.4.1). Written out because MathNet's LU allocates a
/// factorisation per call, and a catalog ranking solves millions of these 8 x 8 to 20 x 20 systems.</summary>
internal static class DenseSolve
{
    /// <summary>Solves A x = b for a row-major n x n matrix; A is overwritten by its factors, b by x.</summary>
    /// <returns>False when a pivot is zero or not finite (singular or broken system).</returns>
    public static bool Solve(Span<double> a, Span<double> b, int n)
    {
        for (int col = 0; col < n; col++)
        {
            int pivot = col;
            double best = Math.Abs(a[col * n + col]);
            for (int r = col + 1; r < n; r++)
            {
                double v = Math.Abs(a[r * n + col]);
                if (v > best)
                {
                    best = v;
                    pivot = r;
                }
            }
            if (!(best > 0) || !double.IsFinite(best))
            {
                return false;
            }
            if (pivot != col)
            {
                for (int c = 0; c < n; c++)
                {
                    (a[col * n + c], a[pivot * n + c]) = (a[pivot * n + c], a[col * n + c]);
                }
                (b[col], b[pivot]) = (b[pivot], b[col]);
            }
            double diagonal = a[col * n + col];
            for (int r = col + 1; r < n; r++)
            {
                double factor = a[r * n + col] / diagonal;
                if (factor == 0)
                {
                    continue;
                }
                var row = a.Slice(r * n, n);
                var top = a.Slice(col * n, n);
                for (int c = col + 1; c < n; c++)
                {
                    row[c] -= factor * top[c];
                }
                b[r] -= factor * b[col];
            }
        }
        for (int r = n - 1; r >= 0; r--)
        {
            double s = b[r];
            for (int c = r + 1; c < n; c++)
            {
                s -= a[r * n + c] * b[c];
            }
            b[r] = s / a[r * n + r];
        }
        return true;
    }
}
