using RotorDrive.Files.Catalogs;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

public class MotorFormatTests
{
    private const string Header = "id,kv_rpm_per_v,resistance_ohm,no_load_current_a,no_load_voltage_v,max_current_a,max_power_w,poles,mass_g";

    [Fact]
    public void Read_ConvertsAValidRowToSiUnits()
    {
        var result = CatalogFormats.Motors.Read(Header + "\nm1,100,0.05,1.2,12,60,2000,14,500\n", "motors.csv");
        Assert.Empty(result.Problems);
        var motor = Assert.Single(result.Rows).ToMotor();
        // Kv(SI) = Kv[rpm/V] * 2 pi / 60 (definition of the rpm).
        Assert.Equal(100 * 2 * Math.PI / 60, motor.KvRadPerSPerV, 12);
        Assert.Equal(0.5, motor.MassKg, 12);
        Assert.Null(motor.ThermalResistanceKPerW);
    }

    [Fact]
    public void Read_ReportsAHeaderTypoWithItsColumnAndASuggestion()
    {
        string text = Header.Replace("resistance_ohm", "resistnce_ohm") + "\nm1,100,0.05,1.2,12,60,2000,14,500\n";
        var result = CatalogFormats.Motors.Read(text, "motors.csv");
        Assert.Contains(new InputProblem("motors.csv", 1, 3, "resistnce_ohm", Messages.UnknownColumn("resistnce_ohm", "resistance_ohm")), result.Problems);
        Assert.Contains(new InputProblem("motors.csv", 1, 0, "resistance_ohm", Messages.MissingColumn("resistance_ohm")), result.Problems);
        Assert.Empty(result.Rows);
    }

    [Fact]
    public void Read_ReportsEveryBadValueOfTheFileInOneRun()
    {
        string text = Header + "\nm1,abc,0.05,1.2,12,60,2000,14,500\nm2,100,-0.05,1.2,12,60,2000,14,500\n";
        var result = CatalogFormats.Motors.Read(text, "motors.csv");
        Assert.Equal(
            [
                new InputProblem("motors.csv", 2, 2, "kv_rpm_per_v", Messages.NotANumber("abc")),
                new InputProblem("motors.csv", 3, 3, "resistance_ohm", Messages.MustBePositive(-0.05)),
            ],
            result.Problems);
        Assert.Equal(new[] { "m1", "m2" }.ToHashSet(), result.RejectedIds.ToHashSet());
    }
}
