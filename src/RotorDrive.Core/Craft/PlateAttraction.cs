using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Craft;

/// <summary>The one rule for the steel-under-plate hazard: the pull of a steel-backed plate on a rig's stopped rotors.</summary>
public static class PlateAttraction
{
    /// <summary>The standstill pull on the rig resting on its gear (every station at the landed gap plus its gap offset, with
    /// its plate and magnet temperatures), or null when the plate has no steel under it.</summary>
    /// <param name="model">The rig model.</param>
    /// <exception cref="ArgumentNullException"><paramref name="model"/> is null.</exception>
    public static SteelAttraction? AtStandstill(RigModel model)
    {
        Preconditions.NotNull(model, nameof(model));
        if (!model.Rig.Plate.HasBackIron)
        {
            return null;
        }
        double landed = model.Rig.LandedGapM;
        double lift = model.Stations.Sum(s => s.LoadAt(0.0, landed).LiftN);
        return new SteelAttraction(-lift, landed, model.WeightN);
    }
}
