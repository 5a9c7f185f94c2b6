using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Draws the parts of one stress sample from its own random stream.</summary>
/// <remarks>Sample k draws from <see cref="SampleStreams.ForSample"/>(seed, k) in a fixed order: station by station the
/// per-station quantities in <see cref="StressQuantity"/> order, then the rig-wide ones. Every quantity consumes exactly
/// one draw whether it varies or not (<see cref="Tolerance.Apply"/>), so a sample's parts depend only on (seed, k) and the
/// tolerances, never on threads or on other samples, and changing one tolerance leaves the other draws unchanged.
/// Clamps: the no-load current and payload are held at 0 or more, the state of charge within 0..1 (nominal 1, a charged
/// pack).</remarks>
public static class StressSampler
{
    /// <summary>Draws sample <paramref name="sampleIndex"/>'s parts around the rig's nominal values.</summary>
    /// <param name="rig">The nominal rig; every station needs a motor and a controller, and the rig a pack.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <param name="seed">The study's seed.</param>
    /// <param name="sampleIndex">The sample index, 0 or more.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A station has no motor or controller, or the rig has no pack.</exception>
    public static StressParts Draw(Rig rig, StressTolerances tolerances, int seed, int sampleIndex)
    {
        Preconditions.NotNull(rig, nameof(rig));
        Preconditions.NotNull(tolerances, nameof(tolerances));
        var packs = RequireParts(rig);
        var random = SampleStreams.ForSample(seed, sampleIndex);
        var stations = new StationParts[rig.Stations.Count];
        for (int s = 0; s < stations.Length; s++)
        {
            var st = rig.Stations[s];
            var motor = st.Motor!;
            double kv = tolerances.Of(StressQuantity.MotorKv).Apply(motor.KvRadPerSPerV, random);
            double r = tolerances.Of(StressQuantity.MotorResistance).Apply(motor.ResistanceOhm, random);
            double i0 = Math.Max(0, tolerances.Of(StressQuantity.MotorNoLoadCurrent).Apply(motor.NoLoadCurrentA, random));
            double limit = tolerances.Of(StressQuantity.ControllerCurrentLimit).Apply(st.Controller!.BurstCurrentA, random);
            double br = tolerances.Of(StressQuantity.MagnetRemanence).Apply(st.Rotor.RemanenceT, random);
            double gap = tolerances.Of(StressQuantity.GapOffset).Apply(0, random);
            stations[s] = new StationParts(kv, r, i0, limit, br, gap);
        }
        double thickness = tolerances.Of(StressQuantity.PlateThickness).Apply(rig.Plate.ThicknessM, random);
        double sigma = tolerances.Of(StressQuantity.PlateConductivity).Apply(rig.Plate.Material.ConductivitySPerM, random);
        double ambient = tolerances.Of(StressQuantity.AmbientTemperature).Apply(rig.AmbientC, random);
        double plateTemp = tolerances.Of(StressQuantity.PlateTemperature).Apply(rig.PlateTemperatureC, random);
        double soc = Math.Clamp(tolerances.Of(StressQuantity.PackStateOfCharge).Apply(1.0, random), 0, 1);
        double packR = tolerances.Of(StressQuantity.PackResistance).Apply(packs.ResistanceOhm, random);
        double payload = Math.Max(0, tolerances.Of(StressQuantity.Payload).Apply(rig.Body.PayloadKg, random));
        double cgx = tolerances.Of(StressQuantity.CgOffsetX).Apply(0, random);
        double cgy = tolerances.Of(StressQuantity.CgOffsetY).Apply(0, random);
        // Bench calibrations are drawn last, so a rig without them keeps exactly the streams it had. The rig's own spread of
        // plate conductivity or remanence overrides the drawn conductivity or field factor.
        var held = new[]
        {
            tolerances.Of(StressQuantity.PlateConductivity).Shape != ToleranceShape.None,
            tolerances.Of(StressQuantity.MagnetRemanence).Shape != ToleranceShape.None,
            false,
            false,
        };
        var calibrations = new Dictionary<string, LoadCalibration>(StringComparer.Ordinal);
        foreach (var (rotor, calibration) in rig.Calibrations.OrderBy(c => c.Key, StringComparer.Ordinal))
        {
            calibrations[rotor] = CalibrationDraw.Draw(calibration, held, random);
        }
        return new StressParts(sampleIndex, stations, thickness, sigma, ambient, plateTemp, soc, packR, payload, cgx, cgy)
        {
            Calibrations = calibrations.Count == 0 ? StressParts.NoCalibrations : calibrations,
        };
    }

    /// <summary>The nominal parts (no spread): what every sample draws with <see cref="StressTolerances.None"/>.</summary>
    /// <param name="rig">The nominal rig.</param>
    /// <exception cref="ArgumentException">A station has no motor or controller, or the rig has no pack.</exception>
    public static StressParts Nominal(Rig rig) => Draw(rig, StressTolerances.None, 0, 0);

    /// <summary>The rig's pack bank, after checking that every station has its drivetrain.</summary>
    /// <exception cref="ArgumentException">A part is missing.</exception>
    internal static PackBank RequireParts(Rig rig)
    {
        for (int s = 0; s < rig.Stations.Count; s++)
        {
            if (rig.Stations[s].Motor is null || rig.Stations[s].Controller is null)
            {
                throw new ArgumentException($"station {s} has no motor or no controller; the stress test needs every station's drivetrain.", nameof(rig));
            }
        }
        return rig.Packs ?? throw new ArgumentException("the rig has no pack; the stress test needs one.", nameof(rig));
    }
}
