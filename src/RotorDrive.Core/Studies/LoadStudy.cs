using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Studies;

/// <summary>The rotor-load study, shared by the <c>load</c> command and the workbench's lift and drag sheet: one rotor's
/// lift, eddy, windage and bearing torque and plate loss over speed at one gap and plate temperature, and its drag
/// peak.</summary>
/// <remarks>Values come from the precomputed load table every analysis uses (<see cref="RotorLoadTable"/>), built over
/// the rig's range widened to what was asked (<see cref="LoadTableRange.Covering"/>); magnets at the rig's ambient
/// temperature; the drag peak is searched up to the larger of the rated speed and the top listed speed. A few ms for the
/// 2-D model, tens of ms for the 3-D one (the table build dominates); cancellable between the build and the sweep.</remarks>
public static class LoadStudy
{
    /// <summary>Why the request cannot be run on this rig (the plate has no conductivity at the temperature asked), or
    /// null when it can.</summary>
    /// <param name="rig">The rig.</param>
    /// <param name="request">The request.</param>
    public static string? Refusal(Rig rig, LoadStudyRequest request)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(request, nameof(request));
        double plateTempC = request.PlateTempC ?? rig.PlateTemperatureC;
        return rig.Plate.Material.ConductivityAt(plateTempC) > 0 ? null : $"plate '{rig.Plate.Material.Id}' would have no conductivity at {plateTempC.ToString(System.Globalization.CultureInfo.InvariantCulture)} C";
    }

    /// <summary>Runs the study.</summary>
    /// <param name="rig">The rig (plate, temperatures, load model, calibrations, mass).</param>
    /// <param name="request">What to run.</param>
    /// <param name="cancel">Cancels between the table build and the sweep.</param>
    /// <param name="progress">Progress 0..1, or null.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The plate has no conductivity at the temperature asked (<see cref="Refusal"/>).</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LoadStudyResult Run(Rig rig, LoadStudyRequest request, CancellationToken cancel = default, IProgress<double>? progress = null)
    {
        if (Refusal(rig, request) is { } why)
        {
            throw new ArgumentException(why + ".", nameof(request));
        }
        var design = Preconditions.NotNull(request.Rotor, nameof(request.Rotor));
        double gapM = Preconditions.Positive(request.GapM ?? rig.DesignGapM, nameof(request.GapM));
        double plateTempC = request.PlateTempC ?? rig.PlateTemperatureC;
        double[] speeds = request.SpeedsRadPerS?.ToArray()
            ?? SpeedGrid.ZeroTo(Units.RadPerSToRpm(design.MaxSpeedRadPerS), request.Steps).Select(Units.RpmToRadPerS).ToArray();
        Preconditions.AtLeast(speeds.Length, 1, nameof(request.SpeedsRadPerS));
        double topSpeed = Math.Max(design.MaxSpeedRadPerS, speeds.Max());
        var kind = request.Model ?? rig.LoadModel;
        bool endCorrection = kind == LoadModelKind.TwoDimensional && request.EndCorrection;
        var options = rig.LoadOptionsFor(design, new LoadModelOptions { EndEffectCorrection = request.EndCorrection }) with { Model = kind };
        progress?.Report(0.1);
        var table = RotorLoadTable.Build(design, rig.Plate, rig.LoadTableRangeFor(design).Covering(topSpeed, gapM, plateTempC), options);
        cancel.ThrowIfCancellationRequested();
        progress?.Report(0.8);
        var sweep = LoadSweep.Run(table, design.Id, endCorrection, gapM, plateTempC, rig.AmbientC, speeds, topSpeed);
        progress?.Report(1.0);

        double share = rig.Stations.Count > 0 ? rig.WeightN / rig.Stations.Count : 0;
        double? reached = sweep.Rows.FirstOrDefault(r => r.LiftN >= share)?.SpeedRpm;
        bool above = speeds.Max() > design.MaxSpeedRadPerS * (1 + 1e-9);
        var rotors = new[] { RotorSafety.AtRatedSpeed(design) };
        var cautions = Cautions.For(new CautionFindings(false, rotors, plateTempC));
        double? pull = rig.Plate.HasBackIron ? -table.Evaluate(0.0, gapM, plateTempC, rig.AmbientC).LiftN : null;
        return new LoadStudyResult(request, sweep, kind, pull, share, reached, above, cautions);
    }
}
