using MathNet.Numerics.Distributions;
using MathNet.Numerics.Random;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Studies.Calibration;
using Xunit;

namespace RotorDrive.Core.Tests.Studies.Calibration;

public class CalibrationValidityTests
{
    private static readonly LoadCalibration SteadyTruth = new(0.8, 0.9, null, null);

    // Coverage of the 95 % intervals over 200 seeded repeats must lie in 90..99 %: for exact linear least squares it is
    // 95 % by construction (Student t), and a well-posed nonlinear fit with small noise is close to linear (Bates & Watts,
    // Nonlinear Regression Analysis and Its Applications, 1988, ch. 2 and 7). A binomial count with p = 0.95 and n = 200
    // lies in 180..198 with probability above 0.999, so the check fails only if the intervals are wrong.
    [Fact]
    public void Intervals_CoverTheTruth_In90To99PercentOf200SeededRepeats()
    {
        int coveredCf = 0, coveredFf = 0;
        const int repeats = 200;
        for (int seed = 0; seed < repeats; seed++)
        {
            var points = BenchSynthesis.Sweep(SteadyTruth, 1000 + seed, 0.02, 2.0, speeds: 8);
            var r = CalibrationStudy.Run(BenchSynthesis.Steady(points));
            Assert.True(r.Accepted, r.RefusalDetail);
            var cf = r[CalibrationParameter.ConductivityFactor];
            var ff = r[CalibrationParameter.FieldFactor];
            coveredCf += cf.Lower <= 0.8 && 0.8 <= cf.Upper ? 1 : 0;
            coveredFf += ff.Lower <= 0.9 && 0.9 <= ff.Upper ? 1 : 0;
        }
        Assert.InRange(coveredCf, 180, 198);
        Assert.InRange(coveredFf, 180, 198);
    }

    // A rotor without magnets (remanence 0) coasting in near-vacuum (air density 1e-9 kg/m^3) has only bearing drag,
    // J dw/dt = -(c + b w), whose solution is w(t) = (w0 + c/b) e^(-b t / J) - c/b until it stops (first-order linear
    // ODE, closed form; e.g. W. E. Boyce and R. C. DiPrima, Elementary Differential Equations, §2.1).
    [Theory]
    [InlineData(0.02, 2e-4, 300.0)]
    [InlineData(0.005, 1e-3, 600.0)]
    public void SpinDownIntegrator_MatchesClosedFormCoulombViscousDecay(double c, double b, double w0)
    {
        double j = 0.0193;
        var times = Enumerable.Range(0, 101).Select(i => i * 0.5).ToArray();
        var steps = Enumerable.Repeat(4, 100).ToArray();
        var speeds = new double[times.Length];
        SpinDownIntegrator.Integrate(j, (w, _, _) => c + b * w, w0, times, steps, speeds);
        double stop = j / b * Math.Log((w0 + c / b) / (c / b));
        for (int i = 0; i < times.Length; i++)
        {
            double exact = times[i] < stop ? (w0 + c / b) * Math.Exp(-b * times[i] / j) - c / b : 0.0;
            Assert.True(Math.Abs(speeds[i] - exact) <= 1e-7 * w0 + (Math.Abs(times[i] - stop) < 0.5 ? 1e-3 * w0 : 0),
                $"t = {times[i]} s: {speeds[i]} vs {exact}");
        }
    }

    [Fact]
    public void SpinDownFit_OfCoulombAndViscousDecay_RecoversBothTermsFromTheClosedForm()
    {
        var rotor = BenchSynthesis.Rotor with { RemanenceT = 0.0 };
        double c = 0.02, b = 2e-4, w0 = 300, j = rotor.InertiaKgM2;
        var random = new Xoshiro256StarStar(7);
        var trace = Enumerable.Range(0, 150).Select(i =>
        {
            double t = i * 0.5;
            double w = Math.Max(0, (w0 + c / b) * Math.Exp(-b * t / j) - c / b);
            return new SpinDownSample(t, w > 0 ? w + Normal.Sample(random, 0, 0.2) : 0.0, 0.01);
        }).ToList();
        var request = BenchSynthesis.Trace(trace, rotor) with
        {
            Load = LoadModelOptions.Default with { Air = new AirProperties(1e-9, 1.5e-5) },
            Options = CalibrationOptions.Default with
            {
                Fixed = new HashSet<CalibrationParameter> { CalibrationParameter.ConductivityFactor, CalibrationParameter.FieldFactor },
            },
        };
        var r = CalibrationStudy.Run(request);
        Assert.True(r.Accepted, r.RefusalDetail);
        var drag = r[CalibrationParameter.BearingDrag];
        var damping = r[CalibrationParameter.BearingDamping];
        Assert.InRange(c, drag.Lower, drag.Upper);
        Assert.InRange(b, damping.Lower, damping.Upper);
        Assert.InRange(drag.Value, 0.9 * c, 1.1 * c);
        Assert.InRange(damping.Value, 0.9 * b, 1.1 * b);
    }

    [Fact]
    public void TorqueInNewtonCentimetres_IsRefused_NamingTheUnit()
    {
        var points = BenchSynthesis.Sweep(SteadyTruth, 3, 0.01, null, torqueUnit: 100.0);
        var r = CalibrationStudy.Run(BenchSynthesis.Steady(points));
        Assert.False(r.Accepted);
        Assert.Equal(CalibrationRefusal.TorqueUnits, r.Refusal);
        Assert.Contains("N cm", r.RefusalDetail);
    }

    [Fact]
    public void TorqueInNewtonCentimetres_WithLiftInNewtons_IsRefused_NamingTheTorqueUnit()
    {
        var points = BenchSynthesis.Sweep(SteadyTruth, 4, 0.01, 1.0, torqueUnit: 100.0);
        var r = CalibrationStudy.Run(BenchSynthesis.Steady(points));
        Assert.Equal(CalibrationRefusal.TorqueUnits, r.Refusal);
        Assert.Contains("N cm", r.RefusalDetail);
    }

    [Theory]
    [InlineData(10.0)]
    [InlineData(0.1)]
    public void SpinDown_WithWrongInertia_IsRefused_NamingTheInertia(double inertiaError)
    {
        var truth = new LoadCalibration(0.8, 0.9, 0.012, 2e-5);
        var trace = BenchSynthesis.SpinDown(truth, 5, 6000, 0.015, 120, 0.05, 5);
        var wrong = BenchSynthesis.Rotor with { InertiaKgM2 = BenchSynthesis.Rotor.InertiaKgM2 * inertiaError };
        var r = CalibrationStudy.Run(BenchSynthesis.Trace(trace, wrong));
        Assert.False(r.Accepted);
        Assert.Equal(CalibrationRefusal.Inertia, r.Refusal);
        Assert.Contains("inertia", r.RefusalDetail);
    }

    [Fact]
    public void SpinDown_StayingBelowTheDragPeak_FlagsTheConductivityFactorUndetermined()
    {
        var truth = new LoadCalibration(0.8, 0.9, 0.012, 2e-5);
        // The fitted peak is near 2150 rpm at 15 mm; start the trace at 1200 rpm.
        var trace = BenchSynthesis.SpinDown(truth, 6, 1200, 0.015, 150, 0.05, 2);
        var r = CalibrationStudy.Run(BenchSynthesis.Trace(trace));
        Assert.True(r[CalibrationParameter.ConductivityFactor].Undetermined);
        Assert.NotNull(r[CalibrationParameter.ConductivityFactor].Why);
    }

    // The calibrated load every analysis uses and the fit's model are one function: the table path and the direct path
    // with the same calibration agree to the table's interpolation accuracy.
    [Fact]
    public void CalibratedTable_AgreesWithCalibratedDirectModel()
    {
        var calibration = new LoadCalibration(0.7, 0.85, 0.02, 1e-4);
        var options = LoadModelOptions.Default with { Calibration = calibration };
        var direct = new PhysicsRotorLoad(BenchSynthesis.Rotor, BenchSynthesis.Plate, options);
        var range = new LoadTableRange(BenchSynthesis.Rotor.MaxSpeedRadPerS, 0.004, 0.03, -20, 150);
        var table = RotorLoadTable.Build(direct, range);
        var plain = new PhysicsRotorLoad(BenchSynthesis.Rotor, BenchSynthesis.Plate);
        foreach (double rpm in new[] { 300.0, 1500.0, 4000.0 })
        {
            double w = Units.RpmToRadPerS(rpm);
            var a = direct.Evaluate(w, 0.012, 60, 20);
            var t = table.Evaluate(w, 0.012, 60, 20);
            Assert.Equal(a.EddyTorqueNm, t.EddyTorqueNm, 1e-3 * Math.Abs(a.EddyTorqueNm));
            Assert.Equal(a.LiftN, t.LiftN, 1e-3 * Math.Abs(a.LiftN));
            Assert.Equal(0.02 + 1e-4 * w, a.BearingTorqueNm, 1e-12);
            // Factor semantics: eddy forces at (cf sigma omega) times ff^2.
            var reference = plain.Eddy.Evaluate(0.7 * plain.Plate.Material.ConductivityAt(60), w, 0.012);
            Assert.Equal(0.85 * 0.85 * reference.TorqueNm, a.EddyTorqueNm, 1e-9 * Math.Abs(a.EddyTorqueNm));
        }
    }
}
