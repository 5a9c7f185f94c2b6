namespace RotorDrive.Core.Craft;

/// <summary>What the rails of a guided sled carry in a hover state: the rotors' lift moments about the centre of gravity
/// and their net yaw reaction (reported, not judged: the rails are the team's to size).</summary>
/// <param name="PitchMomentNm">Sum of lift x (x - cg x), the moment about the y axis through the centre of gravity, N m.</param>
/// <param name="RollMomentNm">Sum of lift x (y - cg y), the moment about the x axis through the centre of gravity, N m.</param>
/// <param name="YawTorqueNm">Net yaw torque of the rotor reactions (shaft torque x spin sign), N m.</param>
/// <remarks>Statics of a rigid body (moment of each station's lift about the centre of gravity); the rails react the
/// opposite moments.</remarks>
public sealed record RailLoads(double PitchMomentNm, double RollMomentNm, double YawTorqueNm)
{
    /// <summary>The rail loads of a balanced hover state, or null when it holds no state.</summary>
    /// <param name="model">The rig model the state was solved for.</param>
    /// <param name="hover">The hover state.</param>
    public static RailLoads? Of(RigModel model, HoverResult hover)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(hover, nameof(hover));
        if (hover.Stations.Count == 0)
        {
            return null;
        }
        double pitch = 0, roll = 0, yaw = 0;
        foreach (var s in hover.Stations)
        {
            var station = model.Stations[s.Index];
            pitch += s.LiftN * (station.XM - model.CgXM);
            roll += s.LiftN * (station.YM - model.CgYM);
            yaw += s.ReactionTorqueNm;
        }
        return new RailLoads(pitch, roll, yaw);
    }
}
