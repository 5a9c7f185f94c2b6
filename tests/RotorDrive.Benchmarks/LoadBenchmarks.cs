using BenchmarkDotNet.Attributes;
using RotorDrive.Core;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Benchmarks;

/// <summary>Speed of the rotor load model: one direct evaluation, one table build and one table lookup.</summary>
/// <remarks>Targets (issue 3): direct (speed, gap) evaluation with 24 radial points &lt;= 5 us; a 96-speed x 48-gap table
/// &lt;= 1 ms on one core; one lookup (lift + torque) &lt;= 50 ns. The rotor is the representative one of the closing
/// note (invented): 24 segments, M = 4, radii 70-120 mm, 4 mm magnets of 1.3 T, over 6 mm of 25 MS/m aluminium.</remarks>
[MemoryDiagnoser]
public class LoadBenchmarks
{
    private PhysicsRotorLoad _direct = null!;
    private TabulatedRotorLoad _table = null!;
    private LoadTableRange _range = null!;
    private RotorDesign _rotor = null!;
    private Plate _plate = null!;
    private double _sigma;
    private double _speed;

    /// <summary>Builds the models once.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var rotor = new RotorDesign("bench", 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 2.0, 0.02,
            Units.RpmToRadPerS(6000), 0.01, 1e-5, 0.003, 2e8);
        var plate = new Plate(new PlateMaterial("al6061", 25e6, 0.0039, 2700, 896), 0.006);
        _direct = new PhysicsRotorLoad(rotor, plate);
        (_rotor, _plate) = (rotor, plate);
        _range = new LoadTableRange(rotor.MaxSpeedRadPerS, 0.0025, 0.030, -20, 120, SpeedPoints: 96, GapPoints: 48);
        _table = RotorLoadTable.Build(_direct, _range);
        _sigma = plate.Material.ConductivityAt(20);
        _speed = Units.RpmToRadPerS(3000);
    }

    /// <summary>One direct evaluation of the whole load point (24 radial points, windage, bearing).</summary>
    [Benchmark]
    public LoadPoint DirectEvaluate() => _direct.Evaluate(_speed, 0.0101, 20, 20);

    /// <summary>Building the 96 x 48 table from an existing direct model.</summary>
    [Benchmark]
    public TabulatedRotorLoad TableBuild() => RotorLoadTable.Build(_direct, _range);

    /// <summary>Building the 96 x 48 table from the rotor and plate: the 3-D ring model's spectrum, then the table (issue 17
    /// target: at most 50 ms on one core).</summary>
    [Benchmark]
    public TabulatedRotorLoad TableBuildFromRotor() => RotorLoadTable.Build(_rotor, _plate, _range);

    /// <summary>One table lookup of eddy lift and torque at a sigma omega and gap.</summary>
    [Benchmark]
    public double TableLookupLiftAndTorque()
    {
        (double lift, double torque) = _table.EddyAtSigmaOmega(_sigma * _speed, 0.0101);
        return lift + torque;
    }

    /// <summary>One full load point from the table (temperatures, windage and bearing included).</summary>
    [Benchmark]
    public LoadPoint TableEvaluate() => _table.Evaluate(_speed, 0.0101, 20, 20);
}
