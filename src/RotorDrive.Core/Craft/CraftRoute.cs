namespace RotorDrive.Core.Craft;

/// <summary>The path a craft follows over the plate during an endurance run: legs taken in order from the rig origin
/// (0, 0), and repeated until the run ends.</summary>
/// <remarks>The craft translates without turning: every rotor keeps its offset from the craft origin. After the last leg
/// the first follows, from wherever the last one ended.</remarks>
/// <param name="Legs">The legs, at least one.</param>
public sealed record CraftRoute(IReadOnlyList<RouteLeg> Legs)
{
    /// <summary>The box the craft origin stays in: the start (0, 0) and every move's target, m.</summary>
    public (double MinX, double MaxX, double MinY, double MaxY) Box()
    {
        double x0 = 0, x1 = 0, y0 = 0, y1 = 0;
        foreach (var leg in Legs)
        {
            if (leg.Kind == RouteLegKind.Move)
            {
                x0 = Math.Min(x0, leg.XM);
                x1 = Math.Max(x1, leg.XM);
                y0 = Math.Min(y0, leg.YM);
                y1 = Math.Max(y1, leg.YM);
            }
        }
        return (x0, x1, y0, y1);
    }
}
