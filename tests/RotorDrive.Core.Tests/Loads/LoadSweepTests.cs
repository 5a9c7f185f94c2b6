using RotorDrive.Core.Loads;
using RotorDrive.Core.Tests.Magnetics;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Loads;

public class LoadSweepTests
{
    [Fact]
    public void Sweep_GivesOneRowPerSpeed_WithConsistentParts_AndTheDragPeak()
    {
        var range = new LoadTableRange(TestRigs.Rotor.MaxSpeedRadPerS, 0.0025, 0.03, -20, 120);
        TabulatedRotorLoad table = RotorLoadTable.Build(TestRigs.Rotor, TestRigs.AluminiumPlate, range);
        double[] speeds = SpeedGrid.ZeroTo(TestRigs.Rotor.MaxSpeedRadPerS, 25);
        LoadSweepResult result = LoadSweep.Run(table, "rep-120", true, 0.01, 20, 20, speeds, TestRigs.Rotor.MaxSpeedRadPerS);

        Assert.Equal(26, result.Rows.Count);
        Assert.Equal(speeds, result.Rows.Select(r => r.SpeedRadPerS));
        foreach (LoadSweepRow row in result.Rows)
        {
            Assert.Equal(row.EddyTorqueNm + row.WindageTorqueNm + row.BearingTorqueNm, row.TotalTorqueNm);
            // Conservation: plate loss = eddy torque x speed.
            RelAssert.Close(row.EddyTorqueNm * row.SpeedRadPerS, row.EddyPowerW, 1e-12, 1e-12, "eddy power");
        }
        Assert.Equal(6000.0, result.Rows[^1].SpeedRpm, 9);
        Assert.Equal(DragPeakFinder.Find(table, 0.01, 20, 20, TestRigs.Rotor.MaxSpeedRadPerS), result.DragPeak);
    }

    [Fact]
    public void SpeedGrid_Range_IncludesBothEnds_AndShortensTheLastStep()
    {
        Assert.Equal(new[] { 0.0, 300, 600, 900, 1000 }, SpeedGrid.Range(0, 1000, 300));
        Assert.Equal(25, SpeedGrid.Range(0, 6000, 250).Length);
        Assert.Equal(new[] { 500.0 }, SpeedGrid.Range(500, 500, 100));
    }

    [Fact]
    public void SpeedGrid_RejectsAStepThatMakesTooManyPoints()
        => Assert.Throws<ArgumentOutOfRangeException>(() => SpeedGrid.Range(0, 1e9, 1));
}
