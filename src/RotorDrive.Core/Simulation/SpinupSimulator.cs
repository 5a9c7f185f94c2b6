using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Simulation;

/// <summary>Simulates a rig's spin-up from rest on its landing gear (or a stop from hover) in time: every rotor's speed,
/// the craft's heave, the pack's charge, winding and plate temperatures and yaw, with the pack/controller bus solved at
/// every evaluation.</summary>
/// <remarks>
/// <para>Model. Each rotor: J d(omega)/dt = Q_motor - Q_load(omega, gap, T_plate) with the motor and controller of
/// M. Drela, "First-Order DC Electric Motor Model", MIT, 2007 (averaged-switch controller, current limit lowering the
/// duty) and the bus of <see cref="DriveBus"/> (Thevenin pack, all controllers on one bus). Heave: m z'' = L - m g - c z'
/// while airborne; on the gear the gap is held at the landed gap until the total lift exceeds the weight (lift-off
/// event); a touch-down event clamps the gap and zeroes the sink speed. Yaw: I_z r' = -sum(s_j Q_motor_j) (the frame
/// takes the reaction of every motor torque, which equals load torque + J d(omega)/dt); on the gear a friction torque
/// holds the frame until the reaction exceeds it. Station j sees the rig gap plus its gap offset
/// (<see cref="Craft.StationConditions"/>), its own plate and rotor-magnet temperatures, and starts from its own winding
/// and plate temperatures. Winding and plate patch temperatures follow the lumped nodes
/// (<see cref="WindingThermalNode"/>, <see cref="PlatePatchThermalNode"/>), and the plate's conductivity follows its
/// temperature through the load tables (over sigma x omega). The pack's state of charge falls with the charge drawn.</para>
/// <para>Method. Adaptive Dormand-Prince 5(4) (<see cref="DormandPrince45"/>) with event location for lift-off and
/// touch-down; findings are read on a fixed output grid interpolated with the continuous extension, so they do not
/// depend on the step sizes.</para>
/// <para>Cost: about 1200 right-hand-side evaluations in 164 steps plus one algebra solve per output-grid point for a
/// 3 s spin-up of the six-station demo rig on its load tables (about 1.5 ms of CPU; see SpinupBenchmarks); the end of
/// each step is solved once for the integrator, the event check and the observer. Thread
/// safety: <see cref="Run"/> allocates its own state; many runs may share one <see cref="SimulationRig"/>.</para>
/// </remarks>
public static class SpinupSimulator
{
    private const int MaxEvents = 10_000;

    /// <summary>Runs a spin-up or stop.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="request">Throttle profile, duration, state of charge and start state.</param>
    /// <param name="options">Settings, or null for <see cref="SpinupOptions.Default"/>.</param>
    /// <returns>The findings (and the traces unless <see cref="SpinupOptions.RecordTrace"/> is false).</returns>
    /// <exception cref="ArgumentNullException">A reference is null.</exception>
    /// <exception cref="ArgumentException">The profile does not match the rig.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static SpinupResult Run(SimulationRig rig, SpinupRequest request, SpinupOptions? options = null)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(request, nameof(request));
        Preconditions.NotNull(request.Profile, nameof(request.Profile));
        options ??= SpinupOptions.Default;
        request.Profile.Validate(rig.StationCount);
        Preconditions.Positive(request.DurationS, nameof(request.DurationS));
        double soc = Preconditions.InRange(request.SocFraction ?? rig.SocFraction, 0, 1, nameof(request.SocFraction));
        Preconditions.Positive(options.OutputIntervalS, nameof(options.OutputIntervalS));

        var model = new SpinupModel(rig, request.Profile, options, soc, request.DurationS);
        var baseOptions = new DormandPrince45Options
        {
            RelativeTolerance = options.RelativeTolerance,
            AbsoluteTolerance = options.AbsoluteTolerance,
            MaxStepS = options.MaxStepS,
            OutputIntervalS = options.OutputIntervalS,
            MaxSteps = 1_000_000,
        };
        var integrator = new DormandPrince45(model.Dimension, baseOptions);
        var y = new double[model.Dimension];
        model.InitialState(y, request.StartHovering);
        double kineticStart = model.KineticEnergyJ(y);
        double end = request.DurationS, t = 0;
        double? liftoff = null, touchdown = null, touchdownSpeed = null;
        int accepted = 0, evaluations = 0, events = 0;
        OdeStatus status;
        while (true)
        {
            var r = integrator.Integrate(new SpinupSystem(model), t, y, end, model, model);
            accepted += r.StepsAccepted;
            evaluations += r.Evaluations;
            t = r.TimeS;
            if (r.Status != OdeStatus.EventHit)
            {
                status = r.Status;
                break;
            }
            if (++events > MaxEvents)
            {
                status = OdeStatus.MaxStepsExceeded;
                break;
            }
            if (r.EventIndex == 0)
            {
                model.Grounded = false;
                liftoff ??= t;
                if (options.StopAtLiftoff)
                {
                    status = OdeStatus.EventHit;
                    break;
                }
            }
            else
            {
                if (touchdown is null)
                {
                    touchdown = t;
                    touchdownSpeed = -y[model.Velocity] / 1000.0;
                }
                y[model.Gap] = rig.Rig.StartGapM * 1000.0;
                y[model.Velocity] = 0;
                model.Grounded = true;
                model.EvaluateAt(t, y);
                if (model.Lift > rig.WeightN)
                {
                    model.Grounded = false;
                }
            }
            // Restart with the step the controller proposed (saves the starting-step estimate).
            integrator = new DormandPrince45(model.Dimension, baseOptions with { InitialStepS = Math.Min(r.NextStepS, options.MaxStepS) });
        }

        model.EvaluateAt(t, y);
        var recorder = model.Recorder;
        var stations = new StationSpinup[rig.StationCount];
        var points = model.Points;
        for (int j = 0; j < stations.Length; j++)
        {
            var drive = rig.Drivetrains[j];
            var peak = rig.LandedDragPeaks[j];
            double tw = y[model.Winding + j];
            double passing = drive.Motor.CurrentForTorqueA(peak.TorqueNm, drive.FluxFactorAt(model.MotorMagnetC(j, tw)));
            bool stalled = y[j] < peak.SpeedRadPerS && points[j].Regime == DriveRegime.CurrentLimit;
            stations[j] = new StationSpinup(
                j,
                Math.Max(y[j], 0.0),
                new CurrentExposure("motor", recorder.PeakMotorA(j), drive.Motor.MaxCurrentA, null, recorder.MotorAboveS(j), null),
                new CurrentExposure("controller", recorder.PeakMotorA(j), drive.Controller.ContinuousCurrentA, drive.Controller.BurstCurrentA,
                    recorder.ControllerAboveS(j), drive.Controller.BurstDurationS),
                drive.CurrentLimitA,
                peak.SpeedRadPerS,
                peak.TorqueNm,
                stalled,
                passing,
                passing * (1 + options.StallCurrentMargin),
                recorder.PeakWindingC(j),
                recorder.PeakPlateC(j));
        }
        var bank = rig.Packs;
        var pack = new CurrentExposure("pack", recorder.PeakPackA, bank.ContinuousCurrentA, bank.BurstCurrentA, recorder.PackAboveS, null);
        int e = model.EnergyStart;
        var energy = new EnergyLedger(y[e], y[e + 1], y[e + 2], y[e + 3], y[e + 4], y[e + 5], y[e + 6], model.KineticEnergyJ(y) - kineticStart);
        // A bench's rotors never leave their stands: they settle at their duty on the ground.
        double? hover = model.Grounded && rig.Rig.Mount != MountKind.Bench ? null : HoverTime(recorder, rig.StationCount, options);
        return new SpinupResult(
            status,
            t,
            liftoff,
            hover,
            touchdown,
            touchdownSpeed,
            stations,
            pack,
            recorder.MinVoltageV,
            recorder.MaxVoltageV,
            bank.CellsSeries * rig.Rig.Limits.CellCutoffV,
            recorder.PeakRegenA,
            recorder.PeakYawTorqueNm,
            recorder.PeakYawRate,
            y[model.YawAngle],
            model.SocAt(y),
            recorder.Collapsed,
            energy,
            options.RecordTrace ? recorder.ToTrace() : null,
            accepted,
            evaluations);
    }

    // The earliest sample from which every speed and the gap stay within the settle tolerances of their final values,
    // provided that lasts at least the settle window; null otherwise.
    private static double? HoverTime(SpinupRecorder recorder, int stations, SpinupOptions options)
    {
        var times = recorder.Times;
        int last = times.Count - 1;
        if (last < 1)
        {
            return null;
        }
        var gaps = recorder.Gaps;
        double gapEnd = gaps[last];
        int k = last;
        while (k > 0)
        {
            int i = k - 1;
            bool settled = Math.Abs(gaps[i] - gapEnd) <= options.GapSettleM;
            for (int j = 0; j < stations && settled; j++)
            {
                var speeds = recorder.Speeds(j);
                settled = Math.Abs(speeds[i] - speeds[last]) <= options.SpeedSettleFraction * Math.Abs(speeds[last]);
            }
            if (!settled)
            {
                break;
            }
            k = i;
        }
        return times[last] - times[k] >= options.SettleWindowS ? times[k] : null;
    }
}
