using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using RotorDrive.Core.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Magnetics;

public class EndEffectTests
{
    // Russell and Norsworthy, Proc. IEE 105A (1958), no overhang: K = 1 - tanh(k a)/(k a).
    // Values: tanh(0.5) = 0.46211715726, tanh(1) = 0.76159415596, tanh(2) = 0.96402758008, tanh(5) = 0.99990920426.
    [Theory]
    [InlineData(0.5, 1 - 0.46211715726000974 / 0.5)]
    [InlineData(1.0, 1 - 0.76159415595576489)]
    [InlineData(2.0, 1 - 0.96402758007581690 / 2.0)]
    [InlineData(5.0, 1 - 0.99990920426259511 / 5.0)]
    public void Factor_WithoutOverhang_IsRussellNorsworthyOneMinusTanhOverX(double ka, double expected)
        => RelAssert.Close(expected, EndEffect.RussellNorsworthyFactor(ka / 0.025, 0.025, 0.0), 1e-12);

    // The overhang form quoted for linear induction machines, with a wide plate: tanh(k c) -> 1.
    [Theory]
    [InlineData(63.0, 0.025)]
    [InlineData(20.0, 0.010)]
    public void Factor_ForAWidePlate_IsTheInfiniteOverhangLimit(double k, double a)
    {
        double x = k * a;
        double expected = 1 - Math.Tanh(x) / (x * (1 + Math.Tanh(x)));
        RelAssert.Close(expected, EndEffect.RussellNorsworthyFactor(k, a), 1e-14, "default (wide plate)");
        RelAssert.Close(expected, EndEffect.RussellNorsworthyFactor(k, a, 1e3 / k), 1e-14, "overhang of 1000/k");
    }

    // Independent check of the closed form: a finite-volume solution of the low-speed thin-sheet problem that underlies
    // Russell and Norsworthy's factor (currents driven by the motional field v x B under the active width, closing through
    // the overhang, no current through the sheet's edge), with the loss summed as the integral of |J|^2 / sigma and divided
    // by the loss of an infinitely wide sheet. Second-order accurate; 4000 cells give about 1e-6.
    [Theory]
    [InlineData(63.0, 0.025, 0.0)]
    [InlineData(63.0, 0.025, 0.01)]
    [InlineData(63.0, 0.025, 0.2)]
    [InlineData(200.0, 0.005, 0.004)]
    public void Factor_MatchesFiniteVolumeSolutionOfTheSheetProblem(double k, double a, double c)
        => RelAssert.Close(SheetLossRatio(k, a, c, 4000), EndEffect.RussellNorsworthyFactor(k, a, c), 2e-5);

    // A wider active strip has relatively less return path: the factor lies in (0, 1) and grows with the width.
    [Property(MaxTest = 200)]
    public Property Factor_LiesBetweenZeroAndOne_AndGrowsWithWidth()
    {
        var x = Gen.Choose(1, 2000).Select(i => i / 200.0);
        return Prop.ForAll(x.ToArbitrary(), xa =>
        {
            double f = EndEffect.RussellNorsworthyFactor(xa, 1.0);
            double wider = EndEffect.RussellNorsworthyFactor(xa * 1.01, 1.0);
            return f > 0 && f < 1 && wider > f;
        });
    }

    // Unknowns f_i: amplitude of the electric potential phi = f(z) cos(k x) at cell centres on 0 < z < a + c (f is odd in
    // z). Current across the sheet J_z = -f' + e (e = 1 under the field, 0 in the overhang), along it J_x = k f sin(k x);
    // div J = 0 gives J_z(right face) - J_z(left face) + k^2 w_i f_i = 0 for a cell of width w_i, with f(0) = 0 and J_z = 0
    // at the sheet's edge. Cells are uniform on [0, a] and on [a, a + c] so that z = a, where e jumps, is a face.
    private static double SheetLossRatio(double k, double a, double c, int cells)
    {
        int overhangCells = c > 0 ? Math.Max(1, (int)Math.Round(cells * c / (a + c))) : 0;
        int fieldCells = cells - overhangCells;
        var width = new double[cells];
        var emf = new double[cells];
        for (int i = 0; i < cells; i++)
        {
            bool inField = i < fieldCells;
            width[i] = inField ? a / fieldCells : c / overhangCells;
            emf[i] = inField ? 1.0 : 0.0;
        }

        // Across the face between cells i and i+1, J is constant: J d = f_i - f_{i+1} + e_i w_i/2 + e_{i+1} w_{i+1}/2,
        // with d the distance between the centres.
        var lower = new double[cells];
        var diag = new double[cells];
        var upper = new double[cells];
        var rhs = new double[cells];
        var faceEmf = new double[cells];
        var faceDistance = new double[cells];
        for (int i = 0; i < cells; i++)
        {
            diag[i] += k * k * width[i];
            if (i + 1 < cells)
            {
                double d = 0.5 * (width[i] + width[i + 1]);
                double e = (emf[i] * width[i] + emf[i + 1] * width[i + 1]) / (2 * d);
                faceDistance[i] = d;
                faceEmf[i] = e;
                diag[i] += 1 / d;
                upper[i] = -1 / d;
                rhs[i] -= e;
                diag[i + 1] += 1 / d;
                lower[i + 1] = -1 / d;
                rhs[i + 1] += e;
            }
        }
        // Face at z = 0 (f odd, so f(0) = 0): J = -2 f_0 / w_0 + e_0, entering cell 0.
        diag[0] += 2 / width[0];
        rhs[0] += emf[0];

        // Thomas algorithm.
        for (int i = 1; i < cells; i++)
        {
            double m = lower[i] / diag[i - 1];
            diag[i] -= m * upper[i - 1];
            rhs[i] -= m * rhs[i - 1];
        }
        var f = new double[cells];
        f[cells - 1] = rhs[cells - 1] / diag[cells - 1];
        for (int i = cells - 2; i >= 0; i--)
        {
            f[i] = (rhs[i] - upper[i] * f[i + 1]) / diag[i];
        }

        // Loss: J_z^2 integrated cell by cell (J_z is linear in z within a cell, between its face values) plus (k f)^2
        // (midpoint); the infinitely wide sheet gives a.
        var faces = new double[cells + 1];
        faces[0] = -2 * f[0] / width[0] + emf[0];
        for (int i = 0; i + 1 < cells; i++)
        {
            faces[i + 1] = (f[i] - f[i + 1]) / faceDistance[i] + faceEmf[i];
        }
        faces[cells] = 0.0;
        double loss = 0;
        for (int i = 0; i < cells; i++)
        {
            double jl = faces[i], jr = faces[i + 1];
            loss += width[i] * ((jl * jl + jl * jr + jr * jr) / 3 + k * k * f[i] * f[i]);
        }
        return loss / a;
    }
}
