using RotorDrive.Core.Craft;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Thermal;

namespace RotorDrive.Core.Simulation;

/// <summary>The plate field of one endurance run: its solver, set up from the rig, and how it was set up.</summary>
internal sealed class PlateField
{
    private readonly AnnularSource[] _sources;

    private PlateField(PlateHeatSolver solver, AnnularSource[] sources, PlateFieldSetup setup)
    {
        Solver = solver;
        _sources = sources;
        Setup = setup;
    }

    public PlateHeatSolver Solver { get; }

    public PlateFieldSetup Setup { get; }

    /// <summary>Builds the sheet, the rotors' sources and the solver for a run.</summary>
    /// <param name="rig">The prepared rig.</param>
    /// <param name="startHover">The trimmed hover at the start (its speeds shape the radial power profiles).</param>
    /// <param name="startPackCurrentA">Pack current at the start, A (sizes the horizon).</param>
    /// <param name="socFraction">State of charge at the start.</param>
    /// <param name="options">Run settings.</param>
    public static PlateField Create(SimulationRig rig, HoverResult startHover, double startPackCurrentA, double socFraction, EnduranceOptions options)
    {
        var r = rig.Rig;
        var plate = r.Plate;
        var material = plate.Material;
        int n = rig.StationCount;
        double startC = rig.Stations.Average(s => s.Conditions.PlateTempC);
        double k = material.ThermalConductivityAt(startC);
        // Radiation linearised half-way between ambient and the plate limit (Incropera 2007, eq. 1.9).
        double loss = r.EffectivePlateCooling.TotalWPerM2K(0.5 * (r.AmbientC + r.Limits.PlateTempC), r.AmbientC);
        var sheet = new PlateSheet(plate.ThicknessM, k, material.DensityKgM3, material.SpecificHeatJPerKgK, loss);

        var profiles = new Dictionary<RotorDesign, (double[] Radii, double[] Fractions)>(ReferenceEqualityComparer.Instance);
        var sources = new AnnularSource[n];
        for (int j = 0; j < n; j++)
        {
            var station = rig.Stations[j];
            var rotor = station.Rotor;
            if (!profiles.TryGetValue(rotor, out var profile))
            {
                double speed = startHover.Balanced ? startHover.Stations[j].SpeedRadPerS : 0.0;
                profile = RadialProfile(station, plate, speed, r.DesignGapM + station.Conditions.GapOffsetM, startC);
                profiles[rotor] = profile;
            }
            var placed = r.Stations[j];
            sources[j] = new AnnularSource(placed.XM, placed.YM, rotor.InnerRadiusM, rotor.OuterRadiusM, profile.Radii, profile.Fractions);
        }

        double horizon = options.PlateHorizonS ?? Horizon(rig, startPackCurrentA, socFraction, options.MaxDurationS);
        var box = r.Route?.Box() ?? (0, 0, 0, 0);
        var solver = PlateHeatSolver.Create(sheet, sources, box, horizon, options.PlateMarginLengths, options.PlateCellM, options.PlateMaxGrid, r.AmbientC);
        solver.SetUniformExcess(startC - r.AmbientC);
        var setup = new PlateFieldSetup(k, material.ThermalConductivityWPerMK is null, loss, sheet.DiffusivityM2PerS, solver.Count, solver.SpacingM, solver.LengthM, horizon);
        return new PlateField(solver, sources, setup);
    }

    /// <summary>The station whose axis is nearest a point of the plate, with the craft where the route has it.</summary>
    public int NearestStation(PlateHotspot hot, RouteCursor route)
    {
        int best = 0;
        double bestD = double.PositiveInfinity;
        for (int j = 0; j < _sources.Length; j++)
        {
            double dx = route.XM + _sources[j].XM - hot.XM, dy = route.YM + _sources[j].YM - hot.YM, d = dx * dx + dy * dy;
            if (d < bestD)
            {
                bestD = d;
                best = j;
            }
        }
        return best;
    }

    // Strip models that shape the loss of each ring model, kept as long as the ring model lives (models are immutable).
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<RotorEddyModel, RotorEddyModel> ShapeModels = new();

    // The share of eddy power in each radial strip of the load model (../DESIGN.md 4.3; the strip model's for the ring model): drag pressure x slip speed
    // omega r x strip area, at the start hover's speed, gap and plate temperature. Uniform per area when the rotor does not
    // turn (no trim at the start).
    private static (double[] Radii, double[] Fractions) RadialProfile(CraftStation station, Plate plate, double speedRadPerS, double gapM, double plateC)
    {
        var eddy = station.Load switch
        {
            TabulatedRotorLoad t => t.Direct.Eddy,
            PhysicsRotorLoad p => p.Eddy,
            _ => new RotorEddyModel(station.Rotor, plate.ThicknessM),
        };
        if (eddy.IsRingModel)
        {
            // The ring model's modes span the plate and carry no radius: the radial shape of the loss comes from the
            // three-dimensional strip model of the same rotor and plate (its total is scaled away below), built once
            // per ring model.
            var ring = eddy;
            eddy = ShapeModels.GetValue(ring, _ => RotorEddyModel.ThreeDimensionalStrips(ring.Rotor, plate with { ThicknessM = ring.PlateThicknessM }, harmonics: ring.Harmonics));
        }
        var radii = eddy.RadiusM.ToArray();
        var fractions = new double[radii.Length];
        double sigmaOmega = plate.Material.ConductivityAt(plateC) * Math.Abs(speedRadPerS);
        double total = 0;
        for (int s = 0; s < radii.Length; s++)
        {
            double im = PlateResponse.ReflectionUnchecked(eddy.EpsPerSigmaOmega[s] * sigmaOmega, eddy.ThicknessTimesWavenumber[s]).Imaginary;
            fractions[s] = eddy.LiftWeightN[s] * Math.Exp(-2 * eddy.WavenumberPerM[s] * gapM) * Math.Abs(im) * radii[s];
            total += fractions[s];
        }
        if (!(total > 0) || !double.IsFinite(total))
        {
            var uniform = AnnularSource.Uniform(0, 0, station.Rotor.InnerRadiusM, station.Rotor.OuterRadiusM, radii.Length);
            return (uniform.RingRadiiM, uniform.RingFractions);
        }
        for (int s = 0; s < radii.Length; s++)
        {
            fractions[s] /= total;
        }
        return (radii, fractions);
    }

    // 1.5 x the time the usable charge lasts at the starting pack current, within [60 s, the longest run].
    private static double Horizon(SimulationRig rig, double packCurrentA, double soc, double maxDurationS)
    {
        double usableAh = rig.Packs.CapacityAh * (soc - (1 - rig.Rig.Limits.UsableCapacityFraction));
        double estimate = packCurrentA > 0 && usableAh > 0 ? 1.5 * usableAh * 3600 / packCurrentA : maxDurationS;
        return Math.Clamp(estimate, Math.Min(60, maxDurationS), maxDurationS);
    }
}
