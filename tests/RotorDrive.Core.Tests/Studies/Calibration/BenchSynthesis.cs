using MathNet.Numerics.Distributions;
using MathNet.Numerics.OdeSolvers;
using MathNet.Numerics.Random;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Studies.Calibration;
using RotorDrive.Core.Tests.Loads;

namespace RotorDrive.Core.Tests.Studies.Calibration;

/// <summary>Synthetic bench data made by the tool's own calibrated load model (the public <see cref="IRotorLoad"/> path,
/// not the fit's internal one) plus seeded Gaussian noise.</summary>
internal static class BenchSynthesis
{
    public const double PlateTempC = 20.0;
    public const double MagnetTempC = 20.0;

    public static RotorDesign Rotor => TestRigs.Rotor;

    public static Plate Plate => TestRigs.AluminiumPlate;

    public static IRotorLoad Load(LoadCalibration truth, RotorDesign? rotor = null, LoadModelOptions? options = null)
        => new PhysicsRotorLoad(rotor ?? Rotor, Plate, (options ?? LoadModelOptions.Default) with { Calibration = truth });

    /// <summary>A load-cell sweep: speeds 150..6000 rpm at gaps 8, 12 and 16 mm; torque noise sd = torqueNoiseNm, lift
    /// noise sd = liftNoiseN (no lift when null).</summary>
    public static List<BenchPoint> Sweep(LoadCalibration truth, int seed, double torqueNoiseNm, double? liftNoiseN, int speeds = 12,
        double torqueUnit = 1.0)
    {
        var load = Load(truth);
        var random = new Xoshiro256StarStar(seed);
        var points = new List<BenchPoint>();
        foreach (double gapMm in new[] { 8.0, 12.0, 16.0 })
        {
            for (int i = 0; i < speeds; i++)
            {
                double rpm = 150 * Math.Pow(6000 / 150.0, i / (speeds - 1.0));
                double w = Units.RpmToRadPerS(rpm);
                var lp = load.Evaluate(w, gapMm / 1000, PlateTempC, MagnetTempC);
                double torque = lp.EddyTorqueNm + lp.WindageTorqueNm + lp.BearingTorqueNm + Normal.Sample(random, 0, torqueNoiseNm);
                double? lift = liftNoiseN is { } sl ? lp.LiftN + Normal.Sample(random, 0, sl) : null;
                points.Add(new BenchPoint(w, gapMm / 1000, torque * torqueUnit, lift, null));
            }
        }
        return points;
    }

    /// <summary>A spin-down from startRpm at a fixed gap, integrated independently of the fit (MathNet's fixed-step RK4 with
    /// 40 steps per sample), samples every dt s, speed noise sd = noiseRpm.</summary>
    public static List<SpinDownSample> SpinDown(LoadCalibration truth, int seed, double startRpm, double gapM, int samples, double dtS,
        double noiseRpm, RotorDesign? rotor = null, LoadModelOptions? options = null)
    {
        rotor ??= Rotor;
        var load = Load(truth, rotor, options);
        var random = new Xoshiro256StarStar(seed);
        var trace = new List<SpinDownSample>();
        double w = Units.RpmToRadPerS(startRpm);
        for (int i = 0; i < samples; i++)
        {
            // A tachometer reads a rotor at rest as 0; a moving one with noise.
            double measured = w > 0 ? Math.Max(0, Units.RadPerSToRpm(w) + Normal.Sample(random, 0, noiseRpm)) : 0.0;
            trace.Add(new SpinDownSample(i * dtS, Units.RpmToRadPerS(measured), gapM));
            if (w > 0)
            {
                var path = RungeKutta.FourthOrder(w, 0, dtS, 41, (_, speed) =>
                {
                    if (speed <= 0)
                    {
                        return 0;
                    }
                    var lp = load.Evaluate(speed, gapM, PlateTempC, MagnetTempC);
                    return -(lp.EddyTorqueNm + lp.WindageTorqueNm + lp.BearingTorqueNm) / rotor.InertiaKgM2;
                });
                w = Math.Max(0, path[^1]);
            }
        }
        return trace;
    }

    public static CalibrationRequest Steady(IReadOnlyList<BenchPoint> points, RotorDesign? rotor = null)
        => new(rotor ?? Rotor, Plate, PlateTempC, MagnetTempC, points, null);

    public static CalibrationRequest Trace(IReadOnlyList<SpinDownSample> trace, RotorDesign? rotor = null)
        => new(rotor ?? Rotor, Plate, PlateTempC, MagnetTempC, null, trace);
}
