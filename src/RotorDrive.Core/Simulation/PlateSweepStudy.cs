using RotorDrive.Core.Craft;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Simulation;

/// <summary>Which floor keeps the plate under its limit: the endurance run in place (no route) repeated over every plate
/// material and thickness asked for, each with its own load tables and trim.</summary>
/// <remarks>Each floor runs <see cref="EnduranceSimulator"/> with the plate limit set aside
/// (<see cref="EnduranceOptions.StopAtPlateLimit"/> false), so one run gives both the time the plate's hottest point
/// reaches the limit and the time the pack (or another limit) ends the hover. Floors run in parallel; each result depends
/// only on its floor, so the rows are the same whatever the thread count.</remarks>
public static class PlateSweepStudy
{
    /// <summary>The default thicknesses, m: 3 to 25 mm.</summary>
    public static IReadOnlyList<double> DefaultThicknessesM { get; } = [0.003, 0.004, 0.005, 0.006, 0.008, 0.010, 0.012, 0.015, 0.020, 0.025];

    /// <summary>Runs the sweep.</summary>
    /// <param name="model">The rig model (its load model options, state of charge and parts are kept; its plate and
    /// route are replaced).</param>
    /// <param name="materials">Plate materials to try.</param>
    /// <param name="thicknessesM">Thicknesses, m, or null for <see cref="DefaultThicknessesM"/>.</param>
    /// <param name="options">Endurance settings, or null for the defaults (traces are never recorded).</param>
    /// <param name="progress">Receives the number of floors done.</param>
    /// <param name="cancellationToken">Stops the sweep.</param>
    /// <returns>One row per material and thickness, materials in the order given, thinnest first.</returns>
    /// <exception cref="ArgumentNullException">A reference is null.</exception>
    /// <exception cref="OperationCanceledException">The sweep was cancelled.</exception>
    public static IReadOnlyList<PlateSweepRow> Run(RigModel model, IReadOnlyList<PlateMaterial> materials, IReadOnlyList<double>? thicknessesM = null,
        EnduranceOptions? options = null, IProgress<int>? progress = null, CancellationToken cancellationToken = default)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(materials, nameof(materials));
        var thicknesses = thicknessesM ?? DefaultThicknessesM;
        foreach (double t in thicknesses)
        {
            Preconditions.Positive(t, "plate thickness");
        }
        var run = (options ?? EnduranceOptions.Default) with { StopAtPlateLimit = false, RecordTrace = false };
        var floors = materials.SelectMany(m => thicknesses.Select(t => (Material: m, ThicknessM: t))).ToArray();
        var rows = new PlateSweepRow[floors.Length];
        int done = 0;
        Parallel.For(0, floors.Length, new ParallelOptions { CancellationToken = cancellationToken }, i =>
        {
            var (material, thickness) = floors[i];
            var rig = model.Rig with { Plate = new Plate(material, thickness), Route = null };
            var variant = RigModel.Build(rig, model.Options).WithSoc(model.SocFraction);
            var result = EnduranceSimulator.Run(SimulationRig.FromModel(variant), null, run);
            bool hover = result.StartHover.Balanced;
            rows[i] = new PlateSweepRow(material.Id, thickness, hover, hover ? result.StartHover.ElectricalPowerW : 0.0,
                hover ? result.StartHover.PlatePowerW : 0.0, result.PlateLimitTimeS, result.RuntimeS, result.FirstLimit, result.PeakPlateTempC);
            progress?.Report(Interlocked.Increment(ref done));
        });
        return rows;
    }
}
