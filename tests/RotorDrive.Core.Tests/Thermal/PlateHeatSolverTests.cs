using MathNet.Numerics;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Simulation;
using RotorDrive.Core.Tests.Support;
using RotorDrive.Core.Thermal;
using Xunit;

namespace RotorDrive.Core.Tests.Thermal;

public sealed class PlateHeatSolverTests
{
    // An invented aluminium-like sheet: d = 12 mm, k = 200 W/(m K), rho c = 2700 x 900 J/(m^3 K).
    private static PlateSheet Sheet(double loss) => new(0.012, 200, 2700, 900, loss);

    private static AnnularSource Ring(double radiusM, double xM = 0, double yM = 0)
        => new(xM, yM, Math.Max(0, radiusM - 0.01), radiusM + 0.01, [radiusM], [1.0]);

    [Fact]
    public void RingSource_WithoutLoss_CentreFollowsTheContinuousLineSource()
    {
        // H. S. Carslaw & J. C. Jaeger, "Conduction of Heat in Solids", 2nd ed., 1959, section 10.4 (continuous line
        // source; section from memory): a point source of q W in a plate of thickness d gives T = q / (4 pi k d)
        // E1(r^2 / (4 alpha t)); every point of a ring of radius a lies at r = a from its centre.
        var sheet = Sheet(0);
        var solver = new PlateHeatSolver(sheet, [Ring(0.1)], -1, -1, 2, 256, 20);
        solver.Advance([500.0], 120, 0, 0);
        double expected = 20 + 500 / (4 * Math.PI * 200 * 0.012) * SpecialFunctions.ExponentialIntegral(0.01 / (4 * sheet.DiffusivityM2PerS * 120), 1);
        RelAssert.Close(expected - 20, solver.PointC(0, 0) - 20, 0.01, what: "centre rise, K");
    }

    [Fact]
    public void RingSource_WithLoss_ReachesTheK0SteadyState()
    {
        // Carslaw & Jaeger 1959 (plate losing heat from its faces, steady point source; chapter 10, from memory):
        // T = q / (2 pi k d) K0(r / l), l = sqrt(k d / H). Averaged over a ring of radius a (Graf's addition theorem:
        // G. N. Watson, "A Treatise on the Theory of Bessel Functions", 1944, 11.41): at the centre K0(a / l), outside
        // (r > a) I0(a / l) K0(r / l). One exact step of 10^6 s reaches the steady state.
        var sheet = Sheet(20);
        double l = sheet.LossLengthM, a = 0.1;
        var solver = new PlateHeatSolver(sheet, [Ring(a)], -2, -2, 4, 256, 20);
        solver.Advance([500.0], 1e6, 0, 0);
        double scale = 500 / (2 * Math.PI * 200 * 0.012);
        RelAssert.Close(scale * SpecialFunctions.BesselK0(a / l), solver.PointC(0, 0) - 20, 0.005, what: "centre");
        RelAssert.Close(scale * SpecialFunctions.BesselI0(a / l) * SpecialFunctions.BesselK0(0.3 / l), solver.PointC(0.3, 0) - 20, 0.005, what: "r = 0.3 m");
    }

    [Theory]
    [InlineData(1)]
    [InlineData(40)]
    public void MovingSource_MatchesRosenthalsThinPlateSolution(int steps)
    {
        // D. Rosenthal, "The theory of moving sources of heat and its application to metal treatments", Trans. ASME 68,
        // 1946: a line source of q W moving at v through a thin plate losing heat from its faces, quasi-steady:
        // T = q / (2 pi k d) e^(-b xi) K0(m r), b = v / (2 alpha), m = sqrt(b^2 + H / (k d)), xi ahead of the source.
        // Our source is a ring of radius a (a point is not resolvable on a grid); averaging Rosenthal's kernel over the
        // ring by Graf's addition theorem (Watson 1944, 11.41) gives, for r > a,
        // T = q / (2 pi k d) e^(-b xi) sum_n eps_n I_n(m a) I_n(b a) K_n(m r) cos(n theta), eps_0 = 1, eps_n = 2,
        // theta measured from the direction of travel, sign (-1)^n for the e^(+b a cos) factor behind.
        // Sheet with alpha = 1e-4 m^2/s, H / (k d) = 400 /m^2; v = 2 mm/s. The craft-frame update is exact for a
        // constant velocity, so one step or forty give the same field.
        var sheet = new PlateSheet(0.01, 100, 1000, 1000, 400);
        double a = 0.02;
        var solver = new PlateHeatSolver(sheet, [Ring(a)], -1, -1, 2, 256, 0);
        double v = 0.002;
        for (int i = 0; i < steps; i++)
        {
            solver.Advance([100.0], 2000.0 / steps, v, 0);
        }
        double cx = solver.CraftXM, cy = solver.CraftYM;
        double b = v / (2 * sheet.DiffusivityM2PerS), m = Math.Sqrt(b * b + 400);
        double Rosenthal(double xi, double eta)
        {
            double r = Math.Sqrt(xi * xi + eta * eta), theta = Math.Atan2(eta, xi), sum = 0;
            for (int n = 0; n < 12; n++)
            {
                // The ring point at angle phi sits at xi' = a cos phi: e^(+b a cos phi) = sum_n eps_n I_n(b a) cos(n phi).
                sum += (n == 0 ? 1 : 2) * SpecialFunctions.BesselI(n, m * a) * SpecialFunctions.BesselI(n, b * a) * SpecialFunctions.BesselK(n, m * r) * Math.Cos(n * theta);
            }
            return 100 / (2 * Math.PI * 100 * 0.01) * Math.Exp(-b * xi) * sum;
        }
        RelAssert.Close(Rosenthal(-0.1, 0), solver.PointC(cx - 0.1, cy), 0.01, what: "behind");
        RelAssert.Close(Rosenthal(0, 0.1), solver.PointC(cx, cy + 0.1), 0.01, what: "aside");
        RelAssert.Close(Rosenthal(0.1, 0), solver.PointC(cx + 0.1, cy), 0.02, what: "ahead");
        RelAssert.Close(Rosenthal(-0.2, 0.05), solver.PointC(cx - 0.2, cy + 0.05), 0.02, what: "far behind");
    }

    [Fact]
    public void Energy_DepositedEqualsStoredPlusLost()
    {
        // Conservation of energy over a run with changing powers and a moving craft: the heat stored is summed from the
        // real-space field (a separate path from the mode books), the loss is the exact integral of H (T - T_a).
        var sheet = Sheet(24);
        var sources = new[] { AnnularSource.Uniform(0.45, 0, 0.06, 0.13), AnnularSource.Uniform(-0.45, 0, 0.06, 0.13) };
        var solver = PlateHeatSolver.Create(sheet, sources, (-0.5, 0.5, -0.2, 0.2), 600, 2, null, 256, 22);
        var random = new Random(11);
        for (int i = 0; i < 50; i++)
        {
            solver.Advance([200 + 300 * random.NextDouble(), 400 * random.NextDouble()], 1 + 20 * random.NextDouble(), 0.02 * (random.NextDouble() - 0.5), 0.01 * (random.NextDouble() - 0.5));
        }
        var map = solver.Field();
        double stored = sheet.HeatCapacityJPerM2K * map.SpacingM * map.SpacingM * map.TemperaturesC.Sum(t => t - 22);
        RelAssert.Close(solver.DepositedJ, stored + solver.LostJ, 1e-6, what: "deposited = stored + lost, J");
        Assert.True(solver.LostJ > 0.05 * solver.DepositedJ, "the faces lost a noticeable share");
    }

    [Fact]
    public void AnnulusMean_TendsToTheLumpedPatch_AtShortTimes()
    {
        // The lumped patch (PlatePatchThermalNode: Incropera, "Fundamentals of Heat and Mass Transfer", 5.2) keeps the
        // heat in the annulus; the sheet loses it sideways across the annulus edges. At short times each edge acts as
        // the edge of a half-plane heated uniformly: the heat that has crossed it is q sqrt(alpha / pi) (2/3) t^(3/2)
        // per unit length (integral of the erfc solution, Carslaw & Jaeger 1959, ch. 2), so the annulus mean falls
        // short of the lumped patch by the fraction (2/3) (perimeter / area) sqrt(alpha t / pi): the lumped patch is the
        // short-time limit, and the gap grows as the square root of time until the heat has spread.
        var material = new PlateMaterial("al", 35e6, 0.004, 2700, 900);
        var plate = new Plate(material, 0.012);
        var rotor = new RotorDesign("r", 16, 4, 0.06, 0.13, 0.003, 1.25, -0.0012, 7500, 2.0, 0.02, 500, 0, 0, 0.004, 500e6);
        var patch = PlatePatchThermalNode.UnderRotor(rotor, plate, 12);
        var sheet = new PlateSheet(0.012, 200, 2700, 900, 24);
        double Ratio(double t)
        {
            var solver = new PlateHeatSolver(sheet, [AnnularSource.Uniform(0, 0, 0.06, 0.13)], -0.5, -0.5, 1, 256, 22);
            solver.Advance([1000.0], t, 0, 0);
            Span<double> mean = stackalloc double[1];
            solver.Means(mean);
            return (mean[0] - 22) / (patch.TemperatureAfterC(22, 1000, 22, t) - 22);
        }
        double perimeterPerArea = 2 * Math.PI * (0.06 + 0.13) / (Math.PI * (0.13 * 0.13 - 0.06 * 0.06));
        double Deficit(double t) => 2.0 / 3.0 * perimeterPerArea * Math.Sqrt(sheet.DiffusivityM2PerS * t / Math.PI);
        RelAssert.Close(Deficit(0.5), 1 - Ratio(0.5), 0.1, what: "shortfall at 0.5 s");
        RelAssert.Close(Deficit(2), 1 - Ratio(2), 0.1, what: "shortfall at 2 s");
        double late = Ratio(100);
        Assert.True(late < 0.7, $"at 100 s the lumped patch overstates the rise: ratio {late}");
    }

    [Fact]
    public void AnnulusMean_ConvergesWithTheGrid()
    {
        // Grid convergence on one domain: the error against a 512-point grid falls at least fourfold per doubling.
        var sheet = Sheet(24);
        double Mean(int n)
        {
            var solver = new PlateHeatSolver(sheet, [AnnularSource.Uniform(0, 0, 0.06, 0.13), AnnularSource.Uniform(0.3, 0.2, 0.06, 0.13)], -1, -1, 2, n, 22);
            solver.Advance([800.0, 500.0], 60, 0, 0);
            Span<double> mean = stackalloc double[2];
            solver.Means(mean);
            return mean[0];
        }
        double reference = Mean(512);
        double e32 = Math.Abs(Mean(32) - reference), e64 = Math.Abs(Mean(64) - reference), e128 = Math.Abs(Mean(128) - reference);
        Assert.True(e64 < e32 / 4 && e128 < e64 / 4, $"errors {e32}, {e64}, {e128} K");
        Assert.True(e128 < 0.01, $"128 points are within 0.01 K: {e128}");
    }
}
