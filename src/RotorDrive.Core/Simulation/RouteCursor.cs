using RotorDrive.Core.Craft;

namespace RotorDrive.Core.Simulation;

/// <summary>Where a craft is along its route: the leg it is on, its velocity and the time left on that leg.</summary>
/// <remarks>Legs are taken in order from (0, 0) and repeated; a move whose target is where the craft already is takes no
/// time and is skipped. Without a route, or when no leg ever takes time, the craft stays put for ever.</remarks>
internal sealed class RouteCursor
{
    private readonly CraftRoute? _route;
    private int _leg = -1;
    private double _targetX, _targetY;
    private bool _moving;

    public RouteCursor(CraftRoute? route)
    {
        _route = route is { Legs.Count: > 0 } ? route : null;
        NextLeg();
    }

    public double XM { get; private set; }

    public double YM { get; private set; }

    public double VxMPerS { get; private set; }

    public double VyMPerS { get; private set; }

    /// <summary>Time until the velocity changes, s (infinite when it never does).</summary>
    public double TimeLeftS { get; private set; } = double.PositiveInfinity;

    public void Advance(double dtS)
    {
        XM += VxMPerS * dtS;
        YM += VyMPerS * dtS;
        TimeLeftS -= dtS;
        if (double.IsFinite(TimeLeftS) && TimeLeftS <= 1e-9 * Math.Max(1, dtS))
        {
            if (_moving)
            {
                XM = _targetX;
                YM = _targetY;
            }
            NextLeg();
        }
    }

    private void NextLeg()
    {
        VxMPerS = VyMPerS = 0;
        TimeLeftS = double.PositiveInfinity;
        _moving = false;
        if (_route is null)
        {
            return;
        }
        var legs = _route.Legs;
        for (int tries = 0; tries <= legs.Count; tries++)
        {
            _leg = (_leg + 1) % legs.Count;
            var leg = legs[_leg];
            if (leg.Kind == RouteLegKind.Dwell && leg.DurationS > 0)
            {
                TimeLeftS = leg.DurationS;
                return;
            }
            double dx = leg.XM - XM, dy = leg.YM - YM, distance = Math.Sqrt(dx * dx + dy * dy);
            if (leg.Kind == RouteLegKind.Move && distance > 1e-9 && leg.SpeedMPerS > 0)
            {
                TimeLeftS = distance / leg.SpeedMPerS;
                VxMPerS = dx / TimeLeftS;
                VyMPerS = dy / TimeLeftS;
                _targetX = leg.XM;
                _targetY = leg.YM;
                _moving = true;
                return;
            }
        }
        TimeLeftS = double.PositiveInfinity;
    }
}
