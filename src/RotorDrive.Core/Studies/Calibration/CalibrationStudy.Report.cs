using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Calibration;

/// <content>Intervals, flags, refusals and the result record.</content>
public static partial class CalibrationStudy
{
    private static CalibrationResult Assemble(CalibrationRequest request, CalibrationProblem problem, ParameterMap map, Vector<double> theta,
        double[] measured, string[] series, double[] scale, int iterations)
    {
        var options = request.Options;
        int n = measured.Length;
        double[] phys = map.Physical(theta);
        var model = new double[n];
        problem.Predict(phys, model);
        var (covTheta, noInformation) = InternalCovariance(problem, map, theta, measured, model, scale);
        double t = StudentT.InvCDF(0, 1, n - map.Free.Count, 0.5 + 0.5 * options.ConfidenceLevel);
        var (estimates, covariance) = Estimates(options, map, theta, phys, covTheta, noInformation, t);
        double peakSpeed = FittedPeakSpeed(request, problem, phys);
        if (request.Trace is { } trace && !estimates[0].Undetermined && estimates[0].Fitted && double.IsFinite(peakSpeed))
        {
            estimates[0] = UnlessTracePassesPeak(estimates[0], trace, peakSpeed);
        }

        var quality = Quality(request, map, measured, series, model, scale, iterations, phys, peakSpeed);
        var (refusal, detail) = Judge(request, problem, estimates, measured, series, model, phys, quality);
        return new CalibrationResult(request.Kind, request.Rotor.Id, estimates, covariance, Residuals(request, measured, series, model),
            quality, refusal, detail, options.ConfidenceLevel);
    }

    // Covariance of the internal parameters, s^2 (J^T J)^-1 (Bates & Watts 1988, §2.3); a singular J^T J (parameters the
    // data cannot separate) is inverted on its well-conditioned part only, and the parameters involved are flagged by
    // their correlation. NoInformation: the smallest singular value is negligible (a zero variance then means the data
    // say nothing on that parameter).
    private static (Matrix<double> CovTheta, bool NoInformation) InternalCovariance(CalibrationProblem problem, ParameterMap map,
        Vector<double> theta, double[] measured, double[] model, double[] scale)
    {
        int n = measured.Length, p = map.Free.Count, dof = n - p;
        double rss = 0;
        for (int i = 0; i < n; i++)
        {
            double r = (measured[i] - model[i]) / scale[i];
            rss += r * r;
        }
        double s2 = rss / dof;
        var jacobian = WeightedJacobian(problem, map, theta, scale);
        var jtj = jacobian.TransposeThisAndMultiply(jacobian);
        var svd = jtj.Svd(true);
        double sMax = svd.S[0];
        var inverseS = Matrix<double>.Build.Dense(p, p);
        bool singular = false;
        for (int j = 0; j < p; j++)
        {
            if (svd.S[j] > 1e-13 * sMax)
            {
                inverseS[j, j] = 1.0 / svd.S[j];
            }
            else
            {
                singular = true;
            }
        }
        var covTheta = svd.VT.TransposeThisAndMultiply(inverseS) * svd.U.Transpose() * s2;
        return (covTheta, singular && svd.S[p - 1] <= 1e-13 * sMax);
    }

    // Each quantity's estimate (held ones at their start, without interval) and the covariance of the physical quantities
    // by the delta method; t is Student's quantile for the confidence level at the fit's degrees of freedom.
    private static (CalibrationEstimate[] Estimates, double[][] Covariance) Estimates(CalibrationOptions options, ParameterMap map,
        Vector<double> theta, double[] phys, Matrix<double> covTheta, bool noInformation, double t)
    {
        var estimates = new CalibrationEstimate[Quantities];
        var covariance = new double[Quantities][];
        for (int a = 0; a < Quantities; a++)
        {
            covariance[a] = new double[Quantities];
        }
        for (int k = 0; k < Quantities; k++)
        {
            int j = IndexOf(map.Free, k);
            if (j < 0)
            {
                estimates[k] = new CalibrationEstimate((CalibrationParameter)k, phys[k], double.NaN, double.NaN, double.NaN, false, false, null);
                continue;
            }
            double se = Math.Sqrt(Math.Max(0, covTheta[j, j]));
            double lower = map.Forward(k, theta[j] - t * se);
            double upper = map.Forward(k, theta[j] + t * se);
            double seK = Math.Abs(map.Slope(k, theta[j])) * se;
            string? why = WhyUndetermined(options, map, k, j, phys[k], 0.5 * (upper - lower), covTheta, noInformation);
            estimates[k] = new CalibrationEstimate((CalibrationParameter)k, phys[k], seK, lower, upper, true, why is not null, why);
            for (int other = 0; other < Quantities; other++)
            {
                int jo = IndexOf(map.Free, other);
                if (jo >= 0)
                {
                    covariance[k][other] = map.Slope(k, theta[j]) * covTheta[j, jo] * map.Slope(other, theta[jo]);
                }
            }
        }
        return (estimates, covariance);
    }

    // Why a fitted quantity (physical index k, internal index j) is undetermined, or null: no information in the data, an
    // interval wider than the limit (relative to the value, or for the bearing terms to 1 % of the data's scale), or a
    // correlation with another free quantity beyond the limit.
    private static string? WhyUndetermined(CalibrationOptions options, ParameterMap map, int k, int j, double value, double halfWidth,
        Matrix<double> covTheta, bool noInformation)
    {
        double floor = k switch
        {
            2 => 0.01 * map.TorqueRef,
            3 => 0.01 * map.TorqueRef / map.SpeedRef,
            _ => 0.0,
        };
        if (noInformation && covTheta[j, j] == 0)
        {
            return "the data carry no information on it";
        }
        if (halfWidth > options.RelativeHalfWidthLimit * Math.Max(Math.Abs(value), floor))
        {
            return $"its {Pct(options.ConfidenceLevel)} interval is wider than {Pct(options.RelativeHalfWidthLimit)} of its value either side";
        }
        for (int other = 0; other < Quantities; other++)
        {
            int jo = IndexOf(map.Free, other);
            if (other == k || jo < 0)
            {
                continue;
            }
            double denominator = Math.Sqrt(covTheta[j, j] * covTheta[jo, jo]);
            double rho = denominator > 0 ? covTheta[j, jo] / denominator : 0;
            if (Math.Abs(rho) > options.CorrelationLimit)
            {
                return $"the data cannot tell it apart from {KeyOf((CalibrationParameter)other)} (correlation {rho:F3})";
            }
        }
        return null;
    }

    // Drag peak of the fitted model at the data's median gap: the table's peak in sigma omega does not depend on the
    // conductivity factor, so the fitted peak speed is the uncorrected one divided by it. NaN when no peak was found.
    private static double FittedPeakSpeed(CalibrationRequest request, CalibrationProblem problem, double[] phys)
    {
        double medianGap = Median(request.Trace?.Select(s => s.GapM) ?? request.Points!.Select(q => q.GapM));
        var peak = DragPeakFinder.Find(problem.Table, medianGap, request.PlateTempC, request.MagnetTempC, problem.Table.Range.MaxSpeedRadPerS);
        return peak.Status is DragPeakStatus.Converged or DragPeakStatus.ScanOnly ? peak.SpeedRadPerS / phys[0] : double.NaN;
    }

    // A spin-down fixes the conductivity factor only if it passes the drag peak; otherwise the estimate is undetermined.
    private static CalibrationEstimate UnlessTracePassesPeak(CalibrationEstimate conductivity, IReadOnlyList<SpinDownSample> trace, double peakSpeed)
    {
        double top = trace.Max(s => s.SpeedRadPerS), bottom = trace.Min(s => s.SpeedRadPerS);
        if (top > peakSpeed && bottom < peakSpeed)
        {
            return conductivity;
        }
        return conductivity with
        {
            Undetermined = true,
            Why = $"the trace ({Units.RadPerSToRpm(bottom):F0}..{Units.RadPerSToRpm(top):F0} rpm) never passes the drag peak (about {Units.RadPerSToRpm(peakSpeed):F0} rpm at this gap); start the spin-down above it",
        };
    }

    private static CalibrationResult Refused(CalibrationRequest request, CalibrationProblem problem, ParameterMap map, double[] phys,
        double[] measured, string[] series, double[] scale, CalibrationRefusal refusal, string detail)
    {
        var model = new double[measured.Length];
        problem.Predict(phys, model);
        var estimates = Enumerable.Range(0, Quantities)
            .Select(k => new CalibrationEstimate((CalibrationParameter)k, phys[k], double.NaN, double.NaN, double.NaN, map.Free.Contains(k), false, null))
            .ToArray();
        var covariance = Enumerable.Range(0, Quantities).Select(_ => new double[Quantities]).ToArray();
        var quality = Quality(request, map, measured, series, model, scale, 0, phys, double.NaN);
        return new CalibrationResult(request.Kind, request.Rotor.Id, estimates, covariance, Residuals(request, measured, series, model),
            quality, refusal, detail, request.Options.ConfidenceLevel);
    }

    private static (CalibrationRefusal, string?) Judge(CalibrationRequest request, CalibrationProblem problem, CalibrationEstimate[] estimates,
        double[] measured, string[] series, double[] model, double[] phys, CalibrationQuality quality)
    {
        var options = request.Options;
        double cf = phys[0], ff = phys[1];
        bool ffOut = estimates[1].Fitted && (ff < options.FieldFactorRange.Min || ff > options.FieldFactorRange.Max);
        bool cfOut = estimates[0].Fitted && (cf < options.ConductivityFactorRange.Min || cf > options.ConductivityFactorRange.Max);
        var forces = request.Trace is not null
            ? (ffOut ? InertiaRefusal(request, ff) : null)
            : ForceScaleRefusal(request, problem, series, phys, ffOut);
        if (forces is { } refused)
        {
            return refused;
        }
        if (cfOut)
        {
            return (CalibrationRefusal.ImplausibleFactor,
                $"the drag peak needs a conductivity factor of {cf:G3}, outside the plausible {options.ConductivityFactorRange.Min:G3}..{options.ConductivityFactorRange.Max:G3}: "
                + "the peak sits far from where the model puts it. Likely cause: a speed column in another unit (speed_rpm is rev/min), a wrong plate material or thickness, or a gap in another unit.");
        }
        for (int k = 2; k <= 3; k++)
        {
            if (estimates[k].Fitted && estimates[k].Upper < 0)
            {
                return (CalibrationRefusal.NegativeBearing,
                    $"{KeyOf((CalibrationParameter)k)} came out negative ({estimates[k].Value:G3}, interval up to {estimates[k].Upper:G3}): the model's drag exceeds what the trace shows. "
                    + "Likely cause: the catalog inertia is too small, or the gap in the data is larger than stated.");
            }
        }
        if (quality.RunsZ < options.RunsZLimit)
        {
            return (CalibrationRefusal.SystematicMisfit,
                $"the residuals are systematic, not noise (runs test z = {quality.RunsZ:F1}, limit {options.RunsZLimit:F1}): the model's shape does not follow the data. "
                + "Likely cause: speed or gap in another unit, torque logged before the speed settled, or a rotor or plate other than the rig's.");
        }
        return (CalibrationRefusal.None, null);
    }

    // A spin-down whose field factor is out of range: the trace slows as if the rotor's inertia were another.
    private static (CalibrationRefusal, string?) InertiaRefusal(CalibrationRequest request, double ff)
    {
        var options = request.Options;
        double j = request.Rotor.InertiaKgM2;
        double implied = j / (ff * ff);
        string hint = Math.Abs(Math.Log10(ff * ff) - 4) < 0.5 ? " (a factor of about 10^4: kg cm^2 entered as kg m^2?)"
            : Math.Abs(Math.Log10(ff * ff) - 7) < 0.5 ? " (a factor of about 10^7: g cm^2 entered as kg m^2?)" : "";
        return (CalibrationRefusal.Inertia,
            $"the trace slows as if the rotor's inertia were {implied:G3} kg m^2, not the catalog's {j:G3} kg m^2{hint}: the model would need a field factor of {ff:G3}, "
            + $"outside the plausible {options.FieldFactorRange.Min:G3}..{options.FieldFactorRange.Max:G3}. Likely cause: a wrong inertia_kg_m2 in the rotor row (check its unit, kg m^2); "
            + "if the inertia is right, check the rotor row's remanence and radii and the gap.");
    }

    // Steady points: each series' own scale over the uncorrected eddy part at the fitted conductivity factor. A column in
    // another unit shows as one series (or both) far outside the plausible force scale; null when both are plausible and
    // the field factor is in range.
    private static (CalibrationRefusal, string?)? ForceScaleRefusal(CalibrationRequest request, CalibrationProblem problem, string[] series,
        double[] phys, bool ffOut)
    {
        var options = request.Options;
        double ff = phys[1];
        double torqueScale = ForceScale(request, problem, phys, "torque");
        double liftScale = series.Contains("lift") ? ForceScale(request, problem, phys, "lift") : double.NaN;
        bool Plausible(double forceScale) => forceScale > 0 && Math.Sqrt(forceScale) >= options.FieldFactorRange.Min && Math.Sqrt(forceScale) <= options.FieldFactorRange.Max;
        bool torqueBad = !Plausible(torqueScale);
        bool liftBad = !double.IsNaN(liftScale) && !Plausible(liftScale);
        if (torqueBad && TorqueUnit(torqueScale) is { } unit)
        {
            return (CalibrationRefusal.TorqueUnits,
                $"the torques are about {torqueScale:G3} times what the model gives: the torque_nm column looks like {unit}, not N m. Convert it to N m and run again.");
        }
        if (liftBad && !torqueBad && LiftUnit(liftScale) is { } liftUnit)
        {
            return (CalibrationRefusal.LiftUnits,
                $"the lifts are about {liftScale:G3} times what the model gives while the torques agree: the lift_n column looks like {liftUnit}, not N. Convert it to N and run again.");
        }
        if (ffOut || torqueBad || liftBad)
        {
            return (CalibrationRefusal.ImplausibleFactor,
                $"the forces need a field factor of {ff:G3} (torque {torqueScale:G3} times the model{(double.IsNaN(liftScale) ? "" : $", lift {liftScale:G3} times")}), outside the plausible "
                + $"{options.FieldFactorRange.Min:G3}..{options.FieldFactorRange.Max:G3}. Likely cause: the data belong to another rotor, plate or gap, or a column is in another unit; "
                + "check the rotor row (remanence_t, radii, magnet_thickness_mm) and gap_mm.");
        }
        return null;
    }

    // The least-squares scale of one measured series ("torque" net of windage and bearing drag, or "lift") over the
    // uncorrected eddy part at the fitted conductivity factor; NaN without data.
    private static double ForceScale(CalibrationRequest request, CalibrationProblem problem, double[] phys, string name)
    {
        double sxy = 0, sxx = 0;
        foreach (var pt in request.Points!)
        {
            var (lift, torque) = problem.Eddy(phys[0], 1.0, pt.SpeedRadPerS, pt.GapM, pt.PlateTempC ?? request.PlateTempC);
            if (name == "torque")
            {
                double y = pt.TorqueNm - problem.Windage(pt.SpeedRadPerS) - BearingDrag.TorqueUnchecked(pt.SpeedRadPerS, phys[2], phys[3]);
                sxy += torque * y;
                sxx += torque * torque;
            }
            else if (pt.LiftN is { } l)
            {
                sxy += lift * l;
                sxx += lift * lift;
            }
        }
        return sxx > 0 ? sxy / sxx : double.NaN;
    }

    // Torque in N cm is 100 times the N m value, in N mm 1000 times, in kgf cm 1/0.0980665 = 10.2 times.
    private static string? TorqueUnit(double scale) => scale switch
    {
        >= 60 and <= 160 => "N cm (values 100 times too large)",
        >= 600 and <= 1600 => "N mm (values 1000 times too large)",
        >= 7 and <= 14 => "kgf cm (values about 10.2 times too large)",
        _ => null,
    };

    // Lift in kgf is 1/9.80665 of the N value, in gram-force 102 times, in mN 1000 times.
    private static string? LiftUnit(double scale) => scale switch
    {
        >= 0.07 and <= 0.14 => "kgf (values about 9.8 times too small)",
        >= 60 and <= 160 => "gram-force (values about 102 times too large)",
        >= 600 and <= 1600 => "mN (values 1000 times too large)",
        _ => null,
    };

    private static CalibrationQuality Quality(CalibrationRequest request, ParameterMap map, double[] measured, string[] series, double[] model,
        double[] scale, int iterations, double[] phys, double peakSpeed)
    {
        int n = measured.Length;
        double Rms(string name)
        {
            var index = Enumerable.Range(0, n).Where(i => series[i] == name).ToArray();
            return index.Length == 0 ? double.NaN : Math.Sqrt(index.Average(i => (measured[i] - model[i]) * (measured[i] - model[i])));
        }
        double rss = 0, tss = 0;
        double runsZ = double.PositiveInfinity;
        foreach (string name in series.Distinct())
        {
            var index = Enumerable.Range(0, n).Where(i => series[i] == name).ToArray();
            double mean = index.Average(i => measured[i] / scale[i]);
            foreach (int i in index)
            {
                double r = (measured[i] - model[i]) / scale[i];
                double d = measured[i] / scale[i] - mean;
                rss += r * r;
                tss += d * d;
            }
            // Steady points in order of gap then speed, spin-down samples in time order.
            var ordered = request.Points is { } points && name != "speed"
                ? index.OrderBy(i => points[Source(points, name, i)].GapM).ThenBy(i => points[Source(points, name, i)].SpeedRadPerS).ToArray()
                : index;
            runsZ = Math.Min(runsZ, RunsZ(ordered.Select(i => measured[i] - model[i]).ToArray()));
        }
        return new CalibrationQuality(n, map.Free.Count, n - map.Free.Count, Rms("torque"), Rms("lift"), Rms("speed"),
            tss > 0 ? Math.Clamp(1 - rss / tss, 0, 1) : double.NaN, double.IsPositiveInfinity(runsZ) ? double.NaN : runsZ, iterations,
            request.Trace is null ? double.NaN : phys[CalibrationProblem.StartSpeed], peakSpeed);
    }

    // Index of the bench point a measured value belongs to: torque values are in point order, lift values follow them in
    // the order of the points that have lift.
    private static int Source(IReadOnlyList<BenchPoint> points, string series, int valueIndex)
    {
        if (series == "torque")
        {
            return valueIndex;
        }
        int k = valueIndex - points.Count;
        for (int i = 0; i < points.Count; i++)
        {
            if (points[i].LiftN is not null && k-- == 0)
            {
                return i;
            }
        }
        return points.Count - 1;
    }

    private static IReadOnlyList<CalibrationResidual> Residuals(CalibrationRequest request, double[] measured, string[] series, double[] model)
    {
        var list = new List<CalibrationResidual>(measured.Length);
        for (int i = 0; i < measured.Length; i++)
        {
            if (request.Trace is { } trace)
            {
                list.Add(new CalibrationResidual(i, series[i], trace[i].SpeedRadPerS, trace[i].GapM, trace[i].TimeS, measured[i], model[i]));
            }
            else
            {
                int source = Source(request.Points!, series[i], i);
                var pt = request.Points![source];
                list.Add(new CalibrationResidual(source, series[i], pt.SpeedRadPerS, pt.GapM, double.NaN, measured[i], model[i]));
            }
        }
        return list;
    }

    // Wald-Wolfowitz runs test on residual signs (Wald & Wolfowitz 1940): with n1 positive and n2 negative residuals and
    // R runs, mu = 2 n1 n2 / n + 1 and sigma^2 = 2 n1 n2 (2 n1 n2 - n) / (n^2 (n - 1)); z = (R - mu) / sigma. Too few
    // runs (z strongly negative) means the residuals follow a pattern the model misses.
    internal static double RunsZ(double[] residuals)
    {
        var signs = residuals.Where(r => r != 0).Select(r => r > 0).ToArray();
        int n = signs.Length;
        if (n < 10)
        {
            return double.NaN;
        }
        int n1 = signs.Count(s => s), n2 = n - n1;
        if (n1 == 0 || n2 == 0)
        {
            return double.NegativeInfinity;
        }
        int runs = 1;
        for (int i = 1; i < n; i++)
        {
            if (signs[i] != signs[i - 1])
            {
                runs++;
            }
        }
        double product = 2.0 * n1 * n2;
        double mu = product / n + 1;
        double variance = product * (product - n) / ((double)n * n * (n - 1));
        return (runs - mu) / Math.Sqrt(variance);
    }

    private static int IndexOf(IReadOnlyList<int> free, int k)
    {
        for (int j = 0; j < free.Count; j++)
        {
            if (free[j] == k)
            {
                return j;
            }
        }
        return -1;
    }

    private static double Median(IEnumerable<double> values)
    {
        var sorted = values.OrderBy(v => v).ToArray();
        return sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : 0.5 * (sorted[sorted.Length / 2 - 1] + sorted[sorted.Length / 2]);
    }

    private static string Pct(double fraction) => $"{fraction * 100:G3} %";
}
