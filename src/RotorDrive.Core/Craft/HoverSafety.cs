using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Craft;

/// <summary>Rotor safety checks and cautions for a hover state.</summary>
/// <remarks>Uses <see cref="RotorSafety"/>: thin-ring hoop stress rho omega^2 r^2 of the retaining ring plus the magnets'
/// centrifugal load (S. P. Timoshenko &amp; J. N. Goodier, Theory of Elasticity, 1970; W. C. Young &amp; R. G. Budynas,
/// Roark's Formulas for Stress and Strain, 7th ed., 2002), and <see cref="Cautions"/>.</remarks>
public static class HoverSafety
{
    /// <summary>The note shown with every retainer check.</summary>
    public const string NdFeBNote =
        "Sintered NdFeB is brittle and weak in tension (see the magnet maker's data for its tensile strength): the magnets "
        + "must not carry their own centrifugal load, the retaining ring must.";

    /// <summary>Assesses every station's rotor at its hover speed and every distinct rotor design at its rated speed,
    /// and chooses the cautions.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="hover">A hover state of that model (stations may be empty when it has no balance).</param>
    /// <param name="thresholds">Caution thresholds; defaults when null.</param>
    public static HoverSafetyReport Assess(RigModel model, HoverResult hover, CautionThresholds? thresholds = null)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(hover, nameof(hover));
        var safety = model.Options.Safety;
        var atHover = new List<RotorSafetyResult>();
        foreach (var s in hover.Stations)
        {
            if (s.SpeedRadPerS > 0)
            {
                atHover.Add(RotorSafety.Assess(model.Stations[s.Index].Rotor, s.SpeedRadPerS, safety));
            }
        }
        var atMax = AtRatedSpeed(model.Stations.Select(s => s.Rotor), safety);
        double plate = model.Stations.Max(s => s.Conditions.PlateTempC);
        var cautions = Cautions.For(new CautionFindings(true, [.. atHover, .. atMax], plate, SteelUnderPlate: PlateAttraction.AtStandstill(model)), thresholds);
        return new HoverSafetyReport(atHover, atMax, NdFeBNote, cautions);
    }

    /// <summary>Each distinct rotor design at its rated speed, in the order first met: the burst check a rig gets before
    /// any hover is solved (the rig editor) and the one <see cref="Assess"/> reports as
    /// <see cref="HoverSafetyReport.AtMaxRpm"/>.</summary>
    /// <param name="rotors">The rig's rotors, one per station (repeats are assessed once).</param>
    /// <param name="options">Material assumptions; null for <see cref="RotorSafetyOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException"><paramref name="rotors"/> is null.</exception>
    public static IReadOnlyList<RotorSafetyResult> AtRatedSpeed(IEnumerable<RotorDesign> rotors, RotorSafetyOptions? options = null)
        => Preconditions.NotNull(rotors, nameof(rotors)).Distinct().Select(r => RotorSafety.AtRatedSpeed(r, options)).ToList();
}
