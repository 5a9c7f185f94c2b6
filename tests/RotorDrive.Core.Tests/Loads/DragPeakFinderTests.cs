using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Magnetics;
using Xunit;
using RotorDrive.Core.Tests.Support;

namespace RotorDrive.Core.Tests.Loads;

public class DragPeakFinderTests
{
    // Reitz (1970): over a thin sheet the drag s/(1 + s^2) peaks at s = v/w = 1, i.e. at slip speed v = w = 2/(mu0 sigma d).
    // A narrow annulus at radius r (one k) over a 10 um copper foil (k d = 2e-4), no end correction: peak at omega = w / r.
    [Fact]
    public void Peak_OfANarrowRotorOverAThinSheet_IsAtReitzCharacteristicSpeed()
    {
        var rotor = TestRigs.Rotor with { Segments = 8, SegmentsPerWavelength = 4, InnerRadiusM = 0.1, OuterRadiusM = 0.1001 };
        var plate = new Plate(TestRigs.Copper, 1e-5);
        var load = new PhysicsRotorLoad(rotor, plate, new LoadModelOptions { Model = LoadModelKind.TwoDimensional, EndEffectCorrection = false });
        double w = 2 / (Units.Mu0 * TestRigs.Copper.ConductivitySPerM * plate.ThicknessM);
        double expected = w / 0.10005;
        DragPeak peak = DragPeakFinder.Find(load, 0.01, 20, 20, 100 * expected);
        Assert.Equal(DragPeakStatus.Converged, peak.Status);
        RelAssert.Close(expected, peak.SpeedRadPerS, 1e-3, "peak speed");
    }

    // The refined peak must beat every point of a dense brute-force scan (MathNet Brent on the slope; solver residual:
    // the slope there is zero to the tolerance).
    [Fact]
    public void Peak_IsTheMaximumOfADenseScan_AndTheSlopeVanishesThere()
    {
        var load = new PhysicsRotorLoad(TestRigs.Rotor, TestRigs.AluminiumPlate);
        DragPeak peak = DragPeakFinder.Find(load, 0.01, 20, 20, TestRigs.Rotor.MaxSpeedRadPerS);
        Assert.Equal(DragPeakStatus.Converged, peak.Status);
        double best = Enumerable.Range(1, 4000).Select(i => load.Evaluate(i * TestRigs.Rotor.MaxSpeedRadPerS / 4000, 0.01, 20, 20).EddyTorqueNm).Max();
        Assert.True(peak.TorqueNm >= best * (1 - 1e-9), $"peak {peak.TorqueNm} below scanned {best}");
        double Torque(double w) => load.Evaluate(w, 0.01, 20, 20).EddyTorqueNm;
        double slope = (Torque(peak.SpeedRadPerS * 1.001) - Torque(peak.SpeedRadPerS / 1.001)) / 0.002;
        Assert.True(Math.Abs(slope) <= 1e-5 * peak.TorqueNm, $"slope {slope} at the peak");
    }

    // The table finds the same peak as the direct model (to its interpolation accuracy).
    [Fact]
    public void Peak_FromTheTable_MatchesThePeakFromTheDirectModel()
    {
        var range = new LoadTableRange(TestRigs.Rotor.MaxSpeedRadPerS, 0.0025, 0.03, -20, 120);
        TabulatedRotorLoad table = RotorLoadTable.Build(TestRigs.Rotor, TestRigs.AluminiumPlate, range);
        DragPeak fromTable = DragPeakFinder.Find(table, 0.006, 60, 20, TestRigs.Rotor.MaxSpeedRadPerS);
        DragPeak direct = DragPeakFinder.Find(table.Direct, 0.006, 60, 20, TestRigs.Rotor.MaxSpeedRadPerS);
        RelAssert.Close(direct.TorqueNm, fromTable.TorqueNm, 1e-4, "peak torque");
        RelAssert.Close(direct.SpeedRadPerS, fromTable.SpeedRadPerS, 1e-2, "peak speed");
    }

    // A thick copper plate's drag keeps rising at low top speeds: the peak lies above the search range and is reported as such.
    [Fact]
    public void Peak_AboveTheSearchedRange_IsReportedAtTheTopSpeed()
    {
        var load = new PhysicsRotorLoad(TestRigs.Rotor, TestRigs.AluminiumPlate);
        DragPeak peak = DragPeakFinder.Find(load, 0.01, 20, 20, 30.0);
        Assert.Equal(DragPeakStatus.AboveSearchRange, peak.Status);
        Assert.Equal(30.0, peak.SpeedRadPerS);
        Assert.Equal(load.Evaluate(30.0, 0.01, 20, 20).EddyTorqueNm, peak.TorqueNm);
    }

    [Fact]
    public void Peak_OfARotorWithoutField_IsNoDrag()
    {
        var load = new PhysicsRotorLoad(TestRigs.Rotor with { RemanenceT = 0 }, TestRigs.AluminiumPlate);
        Assert.Equal(DragPeakStatus.NoDrag, DragPeakFinder.Find(load, 0.01, 20, 20, 600).Status);
    }

    // A hotter plate conducts less, so its peak moves to a higher speed in proportion sigma(T1)/sigma(T2) (sigma omega law).
    [Fact]
    public void Peak_OfAHotterPlate_MovesUpInSpeedByTheConductivityRatio()
    {
        var load = new PhysicsRotorLoad(TestRigs.Rotor, TestRigs.AluminiumPlate);
        DragPeak cold = DragPeakFinder.Find(load, 0.01, 20, 20, 2000);
        DragPeak hot = DragPeakFinder.Find(load, 0.01, 120, 20, 2000);
        double ratio = TestRigs.Aluminium6061.ConductivityAt(20) / TestRigs.Aluminium6061.ConductivityAt(120);
        RelAssert.Close(cold.SpeedRadPerS * ratio, hot.SpeedRadPerS, 1e-5, "peak speed");
        RelAssert.Close(cold.TorqueNm, hot.TorqueNm, 1e-9, "peak torque");
    }
}
