using RotorDrive.Files.Catalogs;
using Xunit;

namespace RotorDrive.Files.Tests.Catalogs;

/// <summary>The physical-range rules of each catalog, each asserted with its exact message.</summary>
public class ValueRuleTests
{
    private const string MotorHeader = "id,kv_rpm_per_v,resistance_ohm,no_load_current_a,no_load_voltage_v,max_current_a,max_power_w,poles,mass_g,thermal_resistance_k_per_w,thermal_time_constant_s,max_winding_temp_c";
    private const string ControllerHeader = "id,continuous_current_a,burst_current_a,burst_duration_s,min_cells,max_cells,on_resistance_mohm,idle_current_a,max_erpm,mass_g,reversible";
    private const string PackHeader = "id,chemistry,cells_series,cells_parallel,cell_capacity_mah,continuous_c,burst_c,cell_resistance_mohm,mass_g";
    private const string RotorHeader = "id,segments,segments_per_wavelength,inner_radius_mm,outer_radius_mm,magnet_thickness_mm,remanence_t,remanence_temp_coeff_pct_per_k,magnet_density_kg_m3,rotor_mass_g,inertia_kg_m2,max_rpm,bearing_drag_nm,bearing_damping_nm_per_krpm,retainer_thickness_mm,retainer_allowable_mpa";

    private static IReadOnlyList<InputProblem> Motor(string row) => CatalogFormats.Motors.Read(MotorHeader + "\n" + row + "\n", "motors.csv").Problems;

    private static IReadOnlyList<InputProblem> Controller(string row) => CatalogFormats.Controllers.Read(ControllerHeader + "\n" + row + "\n", "controllers.csv").Problems;

    private static IReadOnlyList<InputProblem> Pack(string row) => CatalogFormats.Packs.Read(PackHeader + "\n" + row + "\n", "packs.csv").Problems;

    private static IReadOnlyList<InputProblem> Rotor(string row) => CatalogFormats.Rotors.Read(RotorHeader + "\n" + row + "\n", "rotors.csv").Problems;

    [Fact]
    public void Motor_ValidRowWithOptionalColumnsEmpty_HasNoProblem()
        => Assert.Empty(Motor("m,100,0.05,1.2,12,60,2000,14,500,,,"));

    [Theory]
    [InlineData("m,0,0.05,1.2,12,60,2000,14,500,,,", 2, "kv_rpm_per_v", 0.0)]
    [InlineData("m,100,0,1.2,12,60,2000,14,500,,,", 3, "resistance_ohm", 0.0)]
    [InlineData("m,100,0.05,1.2,-12,60,2000,14,500,,,", 5, "no_load_voltage_v", -12.0)]
    [InlineData("m,100,0.05,1.2,12,60,2000,14,0,,,", 9, "mass_g", 0.0)]
    [InlineData("m,100,0.05,1.2,12,60,2000,14,500,-0.5,,", 10, "thermal_resistance_k_per_w", -0.5)]
    public void Motor_RejectsNonPositiveValuesWherePhysicsForbidsThem(string row, int column, string field, double value)
        => Assert.Equal([new InputProblem("motors.csv", 2, column, field, Messages.MustBePositive(value))], Motor(row));

    // Absurd magnitudes pass a "> 0" rule but overflow the analyses (issue 14 item 5: Kv 1e308 ended in "got Infinity",
    // exit 3). Each column has a physical upper bound, far above any part of a levitation rig (common practice, no source:
    // hobby and industrial motors stay below a few thousand rpm/V, 1 kohm, 10 kA; rotors below 2 m radius and 200 000 rpm).
    [Theory]
    [InlineData("m,1e308,0.05,1.2,12,60,2000,14,500,,,", 2, "kv_rpm_per_v", 1e308, 10000.0)]
    [InlineData("m,100,5000,1.2,12,60,2000,14,500,,,", 3, "resistance_ohm", 5000.0, 1000.0)]
    [InlineData("m,100,0.05,1.2,12,1e9,2000,14,500,,,", 6, "max_current_a", 1e9, 10000.0)]
    [InlineData("m,100,0.05,1.2,12,60,2000,14,1e12,,,", 9, "mass_g", 1e12, 1e6)]
    [InlineData("m,100,0.05,1e4,12,60,2000,14,500,,,", 4, "no_load_current_a", 1e4, 1000.0)]
    public void Motor_RejectsAbsurdMagnitudes_WithTheirBound(string row, int column, string field, double value, double max)
        => Assert.Equal([new InputProblem("motors.csv", 2, column, field, Messages.MustBeAtMost(max, value))], Motor(row));

    [Fact]
    public void Motor_RejectsAPoleCountBeyondItsBound()
        => Assert.Equal([new InputProblem("motors.csv", 2, 8, "poles", Messages.MustBeAtMost(200, 400))], Motor("m,100,0.05,1.2,12,60,2000,400,500,,,"));

    [Fact]
    public void Motor_RejectsANegativeNoLoadCurrent()
        => Assert.Equal([new InputProblem("motors.csv", 2, 4, "no_load_current_a", Messages.MustBeNonNegative(-1.2))], Motor("m,100,0.05,-1.2,12,60,2000,14,500,,,"));

    [Fact]
    public void Motor_RejectsAWindingTemperatureOutsideItsRange()
        => Assert.Equal([new InputProblem("motors.csv", 2, 12, "max_winding_temp_c", Messages.MustBeBetween(40, 250, 400))], Motor("m,100,0.05,1.2,12,60,2000,14,500,1,100,400"));

    [Theory]
    [InlineData("13")]
    [InlineData("1")]
    public void Motor_RejectsAPoleCountThatIsNotAnEvenNumberOfAtLeastTwo(string poles)
    {
        var problems = Motor($"m,100,0.05,1.2,12,60,2000,{poles},500,,,");
        int p = int.Parse(poles, System.Globalization.CultureInfo.InvariantCulture);
        string message = p < 2 ? Messages.MustBeAtLeast(2, p) : Messages.PolesMustBeEven(p);
        Assert.Equal([new InputProblem("motors.csv", 2, 8, "poles", message)], problems);
    }

    [Fact]
    public void Motor_RejectsAFractionalPoleCount()
        => Assert.Equal([new InputProblem("motors.csv", 2, 8, "poles", Messages.NotAnInteger("14.0"))], Motor("m,100,0.05,1.2,12,60,2000,14.0,500,,,"));

    [Fact]
    public void Controller_ValidRow_HasNoProblem()
        => Assert.Empty(Controller("c,60,80,10,3,6,2.5,0.06,200000,55,yes"));

    [Fact]
    public void Controller_RejectsABurstCurrentBelowTheContinuousCurrent()
        => Assert.Equal([new InputProblem("controllers.csv", 2, 3, "burst_current_a", Messages.BurstBelowContinuous("continuous_current_a", 50, 60))],
            Controller("c,60,50,10,3,6,2.5,0.06,200000,55,true"));

    [Fact]
    public void Controller_RejectsMaxCellsBelowMinCells()
        => Assert.Equal([new InputProblem("controllers.csv", 2, 6, "max_cells", Messages.MaxCellsBelowMin(4, 6))],
            Controller("c,60,80,10,6,4,2.5,0.06,200000,55,true"));

    [Fact]
    public void Controller_RejectsZeroMinCells()
        => Assert.Equal([new InputProblem("controllers.csv", 2, 5, "min_cells", Messages.MustBeAtLeast(1, 0))],
            Controller("c,60,80,10,0,4,2.5,0.06,200000,55,true"));

    [Fact]
    public void Controller_RejectsAReversibleValueThatIsNotABoolean()
        => Assert.Equal([new InputProblem("controllers.csv", 2, 11, "reversible", Messages.NotABoolean("maybe"))],
            Controller("c,60,80,10,3,6,2.5,0.06,200000,55,maybe"));

    [Fact]
    public void Controller_ReadsBooleansInTheirAcceptedSpellings()
    {
        string text = ControllerHeader + "\na,60,80,10,3,6,2.5,0.06,200000,55,No\nb,60,80,10,3,6,2.5,0.06,200000,55,1\nc,60,80,10,3,6,2.5,0.06,200000,55,FALSE\n";
        var result = CatalogFormats.Controllers.Read(text, "controllers.csv");
        Assert.Empty(result.Problems);
        Assert.Equal([false, true, false], result.Rows.Select(r => r.Reversible));
    }

    [Fact]
    public void Pack_RejectsABurstRatingBelowTheContinuousRating()
        => Assert.Equal([new InputProblem("packs.csv", 2, 7, "burst_c", Messages.BurstBelowContinuous("continuous_c", 20, 25))],
            Pack("p,lipo,12,1,8000,25,20,2.2,2400"));

    [Fact]
    public void Pack_RejectsAnEmptyChemistryAndZeroParallelCells()
        => Assert.Equal(
            [
                new InputProblem("packs.csv", 2, 2, "chemistry", Messages.ValueRequired()),
                new InputProblem("packs.csv", 2, 4, "cells_parallel", Messages.MustBeAtLeast(1, 0)),
            ],
            Pack("p,,12,0,8000,25,50,2.2,2400"));

    [Fact]
    public void Rotor_ValidRow_HasNoProblem()
        => Assert.Empty(Rotor("r,24,4,80,140,2.5,1.25,-0.12,7500,2095,0.0209,6500,0.03,0.004,3,300"));

    [Theory]
    [InlineData("140")]
    [InlineData("150")]
    public void Rotor_RejectsAnInnerRadiusNotBelowTheOuterRadius(string inner)
    {
        double ri = double.Parse(inner, System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal([new InputProblem("rotors.csv", 2, 4, "inner_radius_mm", Messages.InnerRadiusNotBelowOuter(ri, 140))],
            Rotor($"r,24,4,{inner},140,2.5,1.25,-0.12,7500,2095,0.0209,6500,,,,"));
    }

    [Fact]
    public void Rotor_RejectsSegmentsThatAreNotAWholeNumberOfWavelengths()
        => Assert.Equal([new InputProblem("rotors.csv", 2, 2, "segments", Messages.SegmentsNotMultiple(26, 4))],
            Rotor("r,26,4,80,140,2.5,1.25,-0.12,,2095,0.0209,6500,,,,"));

    [Fact]
    public void Rotor_RejectsARemanenceNoMagnetReaches()
        => Assert.Equal([new InputProblem("rotors.csv", 2, 7, "remanence_t", Messages.MustBeBetween(0.05, 1.6, 2.1))],
            Rotor("r,24,4,80,140,2.5,2.1,-0.12,,2095,0.0209,6500,,,,"));

    [Theory]
    [InlineData("3,", "retainer_allowable_mpa", 16)]
    [InlineData(",300", "retainer_thickness_mm", 15)]
    public void Rotor_RequiresBothRetainerColumnsOrNeither(string retainer, string missing, int column)
        => Assert.Equal([new InputProblem("rotors.csv", 2, column, missing, Messages.RetainerPairIncomplete(missing))],
            Rotor("r,24,4,80,140,2.5,1.25,-0.12,,2095,0.0209,6500,,," + retainer));

    [Fact]
    public void Rotor_ConvertsCatalogUnitsToSi()
    {
        var result = CatalogFormats.Rotors.Read(RotorHeader + "\nr,24,4,80,140,2.5,1.25,-0.12,7500,2095,0.0209,6000,0.03,2,3,300\n", "rotors.csv");
        var rotor = Assert.Single(result.Rows).ToRotor();
        Assert.Equal(6, rotor.PolePairs);
        Assert.Equal(0.080, rotor.InnerRadiusM, 15);
        Assert.Equal(0.0025, rotor.MagnetThicknessM, 15);
        Assert.Equal(-0.0012, rotor.RemanenceTempCoeffPerK, 15);
        Assert.Equal(2.095, rotor.RotorMassKg, 15);
        // 6000 rpm = 6000 * 2 pi / 60 rad/s (definition of the rpm).
        Assert.Equal(200 * Math.PI, rotor.MaxSpeedRadPerS, 9);
        // 2 N m per 1000 rpm: at 1000 rpm (104.72 rad/s) the viscous torque is 2 N m.
        Assert.Equal(2.0, rotor.BearingDampingNmPerRadPerS * (1000 * 2 * Math.PI / 60), 12);
        Assert.Equal(300e6, rotor.RetainerAllowablePa!.Value, 3);
        Assert.Equal(0.003, rotor.RetainerThicknessM!.Value, 15);
    }

    [Fact]
    public void Rotor_LeavesAbsentBearingTermsAtZeroAndRetainerUnknown()
    {
        var result = CatalogFormats.Rotors.Read(RotorHeader.Split(",bearing_drag_nm")[0] + "\nr,24,4,80,140,2.5,1.25,-0.12,7500,2095,0.0209,6000\n", "rotors.csv");
        Assert.Empty(result.Problems);
        var rotor = Assert.Single(result.Rows).ToRotor();
        Assert.Equal(0, rotor.BearingDragNm);
        Assert.Equal(0, rotor.BearingDampingNmPerRadPerS);
        Assert.Null(rotor.RetainerThicknessM);
    }

    [Fact]
    public void Plate_ConvertsMegasiemensPerMetre()
    {
        var result = CatalogFormats.Plates.Read("id,conductivity_ms_per_m,temp_coeff_per_k,density_kg_m3,specific_heat_j_per_kg_k\ncu,58,0.00393,8890,385\n", "plates.csv");
        // 100 % IACS = 58.0 MS/m (IEC 60028).
        Assert.Equal(58.0e6, Assert.Single(result.Rows).ToMaterial().ConductivitySPerM, 3);
    }

    [Fact]
    public void Pack_And_Controller_ConvertMilliunits()
    {
        var pack = CatalogFormats.Packs.Read(PackHeader + "\np,lipo,12,2,8000,25,50,2.2,4695\n", "packs.csv").Rows.Single().ToPack();
        Assert.Equal(16.0, pack.CapacityAh, 12);
        Assert.Equal(12 * 0.0022 / 2, pack.ResistanceOhm, 12);
        Assert.Equal(400, pack.ContinuousCurrentA, 9);
        var controller = CatalogFormats.Controllers.Read(ControllerHeader + "\nc,60,80,10,3,6,2.5,0.06,200000,55,true\n", "controllers.csv").Rows.Single().ToController();
        Assert.Equal(0.0025, controller.OnResistanceOhm, 15);
        Assert.Equal(0.055, controller.MassKg, 15);
    }
}
