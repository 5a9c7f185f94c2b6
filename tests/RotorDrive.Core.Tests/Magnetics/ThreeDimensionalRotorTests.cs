using MathNet.Numerics.Integration;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Loads;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Magnetics;

public class ThreeDimensionalRotorTests
{
    private const double Sigma = 25e6;

    // The strip model (which gives the plate loss its radial shape; RingModelTests shows the truncation of the default
    // three-dimensional model) against its definition computed independently: the strip integral of the bands' mean pressures
    // (plain series, no lumping) over 24 Gauss-Legendre radii (MathNet), summed over the first four harmonics.
    [Fact]
    public void RotorModel_EqualsTheStripIntegralOfBandPressures()
    {
        RotorDesign rotor = TestRigs.Rotor;
        Plate plate = TestRigs.AluminiumPlate;
        const double gap = 0.008, speed = 250;
        SourceHarmonic[] harmonics = ArraySource.Harmonics(rotor, 4);
        double Pressure(double r, bool lift)
        {
            double sum = 0;
            foreach (SourceHarmonic h in harmonics)
            {
                double q = Math.Abs(h.Order) * rotor.PolePairs / r;
                EddyPressure p = FiniteWidthBand.MeanPressure(h, q, rotor.ActiveWidthM, rotor.MagnetThicknessM, false, gap, plate, Sigma, speed * r,
                    FiniteWidthBand.DefaultPeriodM(rotor.PolePairs / r, rotor.ActiveWidthM), 1e-9);
                sum += lift ? p.LiftPa : p.DragPa * r;
            }
            return sum * rotor.RemanenceT * rotor.RemanenceT * 2 * Math.PI * r;
        }
        double expectedLift = GaussLegendreRule.Integrate(r => Pressure(r, true), rotor.InnerRadiusM, rotor.OuterRadiusM, 24);
        double expectedTorque = GaussLegendreRule.Integrate(r => Pressure(r, false), rotor.InnerRadiusM, rotor.OuterRadiusM, 24);
        EddyForces f = RotorEddyModel.ThreeDimensionalStrips(rotor, plate).Evaluate(Sigma, speed, gap);
        RelAssert.Close(expectedLift, f.LiftN, 1e-3, "lift");
        RelAssert.Close(expectedTorque, f.TorqueNm, 1e-3, "torque");
        RelAssert.Close(f.TorqueNm * speed, f.PowerW, 1e-12, "power = torque x speed");
    }

    // The table with steel on both sides (coupled gap dependence, standstill attraction) against the direct model: within
    // 0.1 % of the value or 1e-6 of the largest, as for the plain table (issue 3 target).
    [Fact]
    public void Table_WithSteelOnBothSides_MatchesTheDirectModel()
    {
        RotorDesign rotor = TestRigs.Rotor with { Segments = 16, SegmentsPerWavelength = 2, Array = RotorArray.Alternating, MagnetArcFraction = 0.8, BackIronM = 0.006 };
        Plate plate = TestRigs.AluminiumPlate with { BackIronM = 0.01 };
        var range = new LoadTableRange(rotor.MaxSpeedRadPerS, 0.003, 0.03, -20, 120);
        TabulatedRotorLoad table = RotorLoadTable.Build(rotor, plate, range);
        var random = new Random(17);
        double largest = Math.Max(table.LargestLiftN, table.LargestTorqueNm);
        for (int i = 0; i < 300; i++)
        {
            double x = table.SigmaOmegaMax * Math.Pow(10, -7 * random.NextDouble());
            double g = range.MinGapM + (range.MaxGapM - range.MinGapM) * random.NextDouble();
            (double lift, double torque) = table.EddyAtSigmaOmega(x, g);
            (double directLift, double directTorque) = table.Direct.EddyAtSigmaOmega(x, g);
            RelAssert.Close(directLift, lift, 1e-3, 1e-6 * largest, $"lift at x = {x:G3}, g = {g:G3}");
            RelAssert.Close(directTorque, torque, 1e-3, 1e-6 * largest, $"torque at x = {x:G3}, g = {g:G3}");
        }
        LoadPoint still = table.Evaluate(0, 0.01, 20, 20);
        Assert.True(still.LiftN < 0, $"standstill lift over a steel-backed plate is {still.LiftN} N; the steel must pull the rotor down");
        RelAssert.Close(table.Direct.Eddy.Evaluate(Sigma, 0, 0.01).LiftN, still.LiftN, 1e-4, "standstill lift");
    }
}
