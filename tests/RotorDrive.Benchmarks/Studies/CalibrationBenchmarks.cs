using BenchmarkDotNet.Attributes;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.OdeSolvers;
using MathNet.Numerics.Random;
using RotorDrive.Core;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Studies.Calibration;
using RotorDrive.Files;

namespace RotorDrive.Benchmarks.Studies;

/// <summary>Calibrating the demo rotor from 200 points: a load-cell sweep (torque and lift at 200 speed-gap points) and a
/// spin-down of 200 samples, both made by the calibrated model with noise. Target (issue 18): fitting 200 points takes
/// under 1 s.</summary>
[MemoryDiagnoser]
public class CalibrationBenchmarks
{
    private CalibrationRequest _steady = null!;
    private CalibrationRequest _spinDown = null!;

    [GlobalSetup]
    public void Setup()
    {
        var loaded = RigLoader.Load(BenchmarkPaths.DemoRig);
        var rig = loaded.Rig!;
        var rotor = loaded.Catalog!.Rotors.First(r => r.Id == "hx130-p4");
        var load = new PhysicsRotorLoad(rotor, rig.Plate, LoadModelOptions.Default with { Calibration = new LoadCalibration(0.88, 0.97, 0.035, 6e-5) });
        var random = new Xoshiro256StarStar(18);
        var points = new List<BenchPoint>();
        for (int i = 0; i < 200; i++)
        {
            double w = Units.RpmToRadPerS(200 + 5300.0 * (i % 40) / 39);
            double gap = 0.008 + 0.001 * (i / 40);
            var p = load.Evaluate(w, gap, 22, 22);
            points.Add(new BenchPoint(w, gap, p.TotalTorqueNm + Normal.Sample(random, 0, 0.02), p.LiftN + Normal.Sample(random, 0, 2), null));
        }
        _steady = new CalibrationRequest(rotor, rig.Plate, 22, 22, points, null);
        var trace = new List<SpinDownSample>();
        double speed = Units.RpmToRadPerS(5000);
        for (int i = 0; i < 200; i++)
        {
            double measured = speed > 0 ? Math.Max(0, speed + Units.RpmToRadPerS(Normal.Sample(random, 0, 3))) : 0;
            trace.Add(new SpinDownSample(i * 0.01, measured, rig.DesignGapM));
            var path = RungeKutta.FourthOrder(speed, 0, 0.01, 21, (_, s) => s <= 0 ? 0 : -load.Evaluate(s, rig.DesignGapM, 22, 22).TotalTorqueNm / rotor.InertiaKgM2);
            speed = Math.Max(0, path[^1]);
        }
        _spinDown = new CalibrationRequest(rotor, rig.Plate, 22, 22, null, trace);
    }

    /// <summary>Steady points: 200 torque and 200 lift values, two factors, two weighted passes.</summary>
    [Benchmark]
    public CalibrationResult SteadyPoints200() => CalibrationStudy.Run(_steady);

    /// <summary>Spin-down: 200 samples, five parameters, the trajectory integrated for every residual and Jacobian column.</summary>
    [Benchmark]
    public CalibrationResult SpinDown200() => CalibrationStudy.Run(_spinDown);
}
