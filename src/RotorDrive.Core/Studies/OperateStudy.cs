using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Studies;

/// <summary>The operating-point study of one station, shared by the <c>operate</c> command and the workbench's running
/// points: every equilibrium of the rotor on its motor, controller and pack at one throttle (or the point reached from
/// rest over the duty range), with stability, the margin to each limit, the verdict and the limiting constraint.</summary>
/// <remarks>The drivetrain is capped at the rig's <c>limits.max_duty</c> (as every whole-craft analysis builds it, see
/// <see cref="RigModel.Build(Rig, RigModelOptions?)"/>), so a throttle above it runs at the cap. The load is the rig's
/// precomputed table widened (<see cref="LoadTableRange.Covering"/>) to the full-charge free speed with margin and to the
/// gap asked for. Windings and magnets sit at ambient, the plate at the rig's plate temperature, braking off. Verdict:
/// the parts are compatible, a speed hold is met, a stable point is reached from rest, a throttle that asks the rotor to
/// turn turns it, and that point exceeds no limit. Fast (a few ms; the table build dominates); thread-safe.</remarks>
public static class OperateStudy
{
    // The table covers speeds to this multiple of the full-charge free speed, so the search never leaves it.
    private const double FreeSpeedMargin = 1.1;

    /// <summary>Runs the study.</summary>
    /// <param name="rig">The rig.</param>
    /// <param name="request">What to run.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The station has no motor or controller and none is given, or the rig has no
    /// pack and none is given.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A request value is out of range.</exception>
    public static OperateStudyResult Run(Rig rig, OperateStudyRequest request)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(request, nameof(request));
        if (request.Station < 0 || request.Station >= rig.Stations.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(request), request.Station, $"station must lie in [0, {rig.Stations.Count - 1}]; got {request.Station}.");
        }
        double soc = Preconditions.InRange(request.SocFraction, 0, 1, nameof(request.SocFraction));
        double gapM = Preconditions.Positive(request.GapM ?? rig.DesignGapM, nameof(request.GapM));
        var station = rig.Stations[request.Station];
        var drive = DriveFor(rig, station, request, gapM);
        var conditions = new OperatingConditions(gapM, rig.PlateTemperatureC, rig.AmbientC, rig.AmbientC, rig.AmbientC, soc);

        IReadOnlyList<OperatingPointResult>? sweep = null;
        OperatingPointResult point;
        if (request.SweepSteps is { } steps)
        {
            Preconditions.AtLeast(steps, 2, nameof(request.SweepSteps));
            double top = drive.Drivetrain.MaxDuty;
            sweep = Enumerable.Range(0, steps).Select(i => OperatingPointFinder.Find(drive, ThrottleCommand.Duty(top * i / (steps - 1)), conditions)).ToList();
            point = sweep[^1];
        }
        else
        {
            point = OperatingPointFinder.Find(drive, request.Throttle ?? ThrottleCommand.Duty(station.Duty ?? drive.Drivetrain.MaxDuty), conditions);
        }
        var map = request.MapDuties is { } duties ? TorqueSpeedMap.Compute(drive, conditions, duties) : null;
        // A sweep is a table over the duty range: only the parts' compatibility is its verdict.
        IReadOnlyList<string> failed = sweep is null ? FailedCriteria(point) : point.Compatible ? [] : ["incompatible_parts"];
        var reached = point.ReachedFromRest;
        var rotors = reached is { SpeedRadPerS: > 0 } ? new[] { RotorSafety.Assess(station.Rotor, reached.SpeedRadPerS) } : [RotorSafety.AtRatedSpeed(station.Rotor)];
        var cautions = Cautions.For(new CautionFindings(true, rotors, rig.PlateTemperatureC));
        return new OperateStudyResult(request, station, drive, conditions, point, sweep, map, failed, LimitingConstraint(point), cautions);
    }

    // The station's drive as the study analyses it: the drivetrain capped at the rig's max duty and the load table widened
    // to the full-charge free speed and the gap.
    private static StationDrive DriveFor(Rig rig, Station station, OperateStudyRequest request, double gapM)
    {
        var motor = request.Motor ?? station.Motor ?? throw new ArgumentException("the station has no motor assigned and none was given.", nameof(request));
        var controller = request.Controller ?? station.Controller ?? throw new ArgumentException("the station has no controller assigned and none was given.", nameof(request));
        var packs = request.Packs ?? rig.Packs ?? throw new ArgumentException("the rig has no pack assigned and none was given.", nameof(request));
        var drivetrain = new Drivetrain(motor, controller, DriveOptions.Default with { MaxDuty = rig.Limits.MaxDuty });
        double freeSpeed = drivetrain.FreeSpeedRadPerS(packs.OpenCircuitVoltageAt(1.0), drivetrain.MaxDuty, rig.AmbientC);
        var range = rig.LoadTableRangeFor(station.Rotor).Covering(FreeSpeedMargin * freeSpeed, gapM);
        var load = RotorLoadTable.Build(station.Rotor, rig.Plate, range, rig.LoadOptionsFor(station.Rotor));
        return new StationDrive(drivetrain, packs, station.Rotor, load, rig.Limits.Station);
    }

    /// <summary>Every failed criterion of one throttle's result, as keys (see <see cref="OperateStudyResult.FailedCriteria"/>).</summary>
    /// <param name="result">The equilibria at one throttle.</param>
    public static IReadOnlyList<string> FailedCriteria(OperatingPointResult result)
    {
        Preconditions.NotNull(result, nameof(result));
        var failed = new List<string>();
        if (!result.Compatible)
        {
            failed.Add("incompatible_parts");
        }
        if (result.HoldMet == false)
        {
            failed.Add("hold_not_met");
        }
        var reached = result.ReachedFromRest;
        // A rotor that stays at rest under a throttle that asks it to turn fails, like an exceeded limit.
        bool asksToTurn = result.Throttle.Kind == ThrottleKind.HoldSpeed || result.Throttle.Value > 0;
        if (reached is null)
        {
            failed.Add("no_stable_point");
        }
        else
        {
            if (reached.Kind == EquilibriumKind.AtRest && asksToTurn)
            {
                failed.Add("stays_at_rest");
            }
            failed.AddRange(reached.ExceededLimits.Select(m => m.Limit.Key()));
        }
        return failed;
    }

    /// <summary>The limit closest to binding: the rule that stops an unmet speed hold, else the smallest margin at the
    /// point reached from rest, else null.</summary>
    /// <param name="result">The equilibria at one throttle.</param>
    public static string? LimitingConstraint(OperatingPointResult result)
    {
        Preconditions.NotNull(result, nameof(result));
        if (result.HoldMet == false && result.HoldStoppedBy is { } by)
        {
            return by == DriveRegime.CurrentLimit ? "controller_current_limit" : "max_duty";
        }
        return result.ReachedFromRest is { Margins.Count: > 0 } p ? p.Margins.MinBy(m => m.MarginFraction)!.Limit.Key() : null;
    }
}
