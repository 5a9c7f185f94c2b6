using MathNet.Numerics.LinearAlgebra;
using RotorDrive.Core.Craft;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Tests.Magnetics;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Numerics;

public class DenseSolveTests
{
    // Reference library: MathNet.Numerics' LU solve on the same systems. KKT-shaped: a symmetric block [H J^T; J 0] with a
    // zero lower-right block, which needs row pivoting (Golub & Van Loan, Matrix Computations, 2013, sec. 3.4).
    [Theory]
    [InlineData(4, 1)]
    [InlineData(6, 2)]
    [InlineData(12, 3)]
    public void Solve_MatchesMathNetLu_OnKktSystems(int stations, int seed)
    {
        var random = new Random(seed);
        int size = stations + 4;
        var a = new double[size * size];
        for (int i = 0; i < stations; i++)
        {
            a[i * size + i] = 1 + random.NextDouble();
            for (int k = 0; k < 4; k++)
            {
                double j = random.NextDouble() - 0.5;
                a[i * size + stations + k] = j;
                a[(stations + k) * size + i] = j;
            }
        }
        var b = Enumerable.Range(0, size).Select(_ => random.NextDouble() - 0.5).ToArray();
        var expected = Matrix<double>.Build.Dense(size, size, (r, c) => a[r * size + c]).LU().Solve(Vector<double>.Build.DenseOfArray(b));

        var x = (double[])b.Clone();
        Assert.True(DenseSolve.Solve(a, x, size));
        for (int i = 0; i < size; i++)
        {
            RelAssert.Close(expected[i], x[i], 1e-10, 1e-12, $"x[{i}]");
        }
    }

    [Fact]
    public void Solve_ReportsASingularSystem()
    {
        var a = new double[] { 1, 2, 2, 4 };
        Assert.False(DenseSolve.Solve(a, new double[] { 1, 1 }, 2));
    }
}
