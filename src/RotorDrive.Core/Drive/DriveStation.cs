namespace RotorDrive.Core.Drive;

/// <summary>Everything the bus solver needs from one station, computed once per solve (or once per operating-point
/// search, with only the speed changing between evaluations).</summary>
internal struct DriveStation
{
    public double E;
    public double Rt;
    public double R;
    public double Ron;
    public double Idle;
    public double Limit;
    public double MaxDuty;
    public double Duty;
    public double Current;
    public double Flux;
    public double Kv;
    public double I0;
    public double Speed;
    public double CPlus;
    public bool IsCurrent;
    public bool Braking;
    public bool Clamped;

    public static DriveStation Prepare(in DriveInput input)
    {
        var drive = input.Drivetrain ?? throw new ArgumentException("Every drive input needs a drivetrain.", nameof(input));
        var motor = drive.Motor;
        // The drivetrain's own values were checked when it was built; only the per-call state is checked here.
        double speed = input.SpeedRadPerS;
        if (!(speed >= 0) || double.IsPositiveInfinity(speed))
        {
            Preconditions.NonNegative(speed, "speed");
        }
        double windingTemp = input.WindingTempC, magnetTemp = input.MagnetTempC;
        if (!double.IsFinite(windingTemp) || !double.IsFinite(magnetTemp))
        {
            Preconditions.Finite(windingTemp, "winding temperature");
            Preconditions.Finite(magnetTemp, "magnet temperature");
        }
        // Motor.FluxFactorAt without its argument checks (done above).
        double flux = 1 + drive.Options.MagnetFluxTempCoeffPerK * (magnetTemp - 20.0);
        double r = motor.ResistanceAt(windingTemp);
        var t = new DriveStation
        {
            Speed = speed,
            Flux = flux > 0 ? flux : Preconditions.Positive(flux, "flux factor 1 + beta (T - 20)"),
            R = r,
            Ron = drive.Controller.OnResistanceOhm,
            Idle = drive.Controller.IdleCurrentA,
            Limit = drive.CurrentLimitA,
            MaxDuty = drive.MaxDuty,
            Kv = motor.KvRadPerSPerV,
            I0 = motor.NoLoadCurrentA,
            Braking = input.Braking,
        };
        t.Rt = t.R + t.Ron;
        if (!(t.Rt > 0))
        {
            Preconditions.Positive(t.Rt, "loop resistance at the winding temperature");
        }
        double value = input.Command.Value;
        if (input.Command.Kind == DriveCommandKind.Duty)
        {
            if (!(value >= 0 && value <= 1))
            {
                Preconditions.InRange(value, 0, 1, "duty");
            }
            t.Clamped = value > t.MaxDuty;
            t.Duty = Math.Min(value, t.MaxDuty);
        }
        else
        {
            if (!double.IsFinite(value))
            {
                Preconditions.Finite(value, "motor current command");
            }
            double low = t.Braking ? -t.Limit : 0.0;
            t.IsCurrent = true;
            t.Clamped = value > t.Limit || value < -t.Limit;
            t.Current = Math.Clamp(value, low, t.Limit);
        }
        t.SetSpeed(t.Speed);
        return t;
    }

    /// <summary>Moves the station to another shaft speed (rad/s, at least 0, checked by the caller): back-EMF and the
    /// largest constant-power coefficient follow.</summary>
    public void SetSpeed(double speed)
    {
        Speed = speed;
        E = Flux * speed / Kv;
        if (IsCurrent)
        {
            CPlus = Math.Max(0, ConstantPower(Current));
        }
        else
        {
            CPlus = Math.Max(0, ConstantPower(Limit));
            if (Braking)
            {
                CPlus = Math.Max(CPlus, ConstantPower(-Limit));
            }
        }
    }

    // C in I_bus = ... + C / V for a constant motor current: (I R_t + E) I.
    private readonly double ConstantPower(double current) => (current * Rt + E) * current;

    // The rule in force at bus voltage v: duty-driven (value = duty delta) or constant current (value = alpha).
    public readonly DriveRegime RuleAt(double v, out double value, out bool driven)
    {
        if (!Braking && v < E)
        {
            driven = true;
            value = 1.0;
            return DriveRegime.Rectifying;
        }
        if (IsCurrent)
        {
            double saturated = (MaxDuty * v - E) / Rt;
            if (Current > saturated)
            {
                if (!Braking && saturated < 0)
                {
                    driven = false;
                    value = 0.0;
                    return DriveRegime.Freewheel;
                }
                driven = true;
                value = MaxDuty;
                return DriveRegime.MaxDuty;
            }
            if (Braking && Current * Rt + E < 0)
            {
                driven = true;
                value = 0.0;
                return DriveRegime.ZeroDuty;
            }
            driven = false;
            value = Current;
            if (Clamped)
            {
                return Current > 0 ? DriveRegime.CurrentLimit : DriveRegime.BrakeCurrentLimit;
            }
            return Current == 0 && !Braking ? DriveRegime.Freewheel : DriveRegime.Regulating;
        }
        double drive = Duty * v - E;
        double limitVolts = Limit * Rt;
        if (drive > limitVolts)
        {
            driven = false;
            value = Limit;
            return DriveRegime.CurrentLimit;
        }
        if (Braking)
        {
            if (drive < -limitVolts)
            {
                if (v < E - limitVolts)
                {
                    driven = true;
                    value = 1.0;
                    return DriveRegime.Rectifying;
                }
                driven = false;
                value = -Limit;
                return DriveRegime.BrakeCurrentLimit;
            }
        }
        else if (drive < 0)
        {
            driven = false;
            value = 0.0;
            return DriveRegime.Freewheel;
        }
        driven = true;
        value = Duty;
        return Clamped ? DriveRegime.MaxDuty : DriveRegime.Regulating;
    }

    // Voltages where RuleAt can change its answer (a superset is harmless); returns how many were written.
    public readonly int Breakpoints(Span<double> into)
    {
        int k = 0;
        if (!Braking)
        {
            Add(into, ref k, E);
        }
        if (IsCurrent)
        {
            Add(into, ref k, (Current * Rt + E) / MaxDuty);
            Add(into, ref k, E / MaxDuty);
            return k;
        }
        if (Duty > 0)
        {
            Add(into, ref k, (Limit * Rt + E) / Duty);
            Add(into, ref k, Braking ? (E - Limit * Rt) / Duty : E / Duty);
        }
        if (Braking)
        {
            Add(into, ref k, E - Limit * Rt);
        }
        return k;
    }

    private static void Add(Span<double> into, ref int k, double v)
    {
        if (v > 0 && double.IsFinite(v))
        {
            into[k++] = v;
        }
    }

    public readonly DrivePoint PointAt(double v)
    {
        var regime = RuleAt(v, out double value, out bool driven);
        double current = driven ? (value * v - E) / Rt : value;
        double duty = driven ? value : (value * Rt + E) / v;
        double motorVoltage = current * R + E;
        double busCurrent = duty * current + Idle;
        double torque = Flux * (current - I0) / Kv;
        return new DrivePoint(
            regime,
            Speed,
            v,
            duty,
            motorVoltage,
            current,
            E,
            torque,
            busCurrent,
            current * current * R,
            I0 * E,
            current * current * Ron + v * Idle);
    }
}
