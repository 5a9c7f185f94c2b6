namespace RotorDrive.Core.Numerics;

// Event location on the continuous extension of the accepted step.
public sealed partial class DormandPrince45
{
    /// <summary>Checks the event functions between the start of the accepted step (values in _gPrev) and its end
    /// (values in _gNew). If one crossed, bisects on the continuous extension to a bracket no wider than the event
    /// tolerance, leaves the state at the bracket's right end in _yInterp and returns the index of the first function
    /// that crossed there; otherwise moves _gNew into _gPrev and returns -1.</summary>
    private int LocateEvent(IOdeEvents events, int count, double t, double tNew, out double tHit)
    {
        var gPrev = _gPrev.AsSpan(0, count);
        var gNew = _gNew.AsSpan(0, count);
        tHit = tNew;
        if (FirstCrossing(events, gPrev, gNew) < 0)
        {
            gNew.CopyTo(gPrev);
            return -1;
        }

        var gMid = _gMid.AsSpan(0, count);
        double lo = t, hi = tNew;
        double tolerance = Math.Max(Options.EventToleranceS, 4 * DoubleRoundingUnit * Math.Abs(tNew));
        while (hi - lo > tolerance)
        {
            double mid = lo + 0.5 * (hi - lo);
            if (mid <= lo || mid >= hi)
            {
                break;
            }
            Interpolate(mid, _yInterp);
            events.Evaluate(mid, _yInterp, gMid);
            if (FirstCrossing(events, gPrev, gMid) >= 0)
            {
                hi = mid;
                gMid.CopyTo(gNew);
            }
            else
            {
                lo = mid;
            }
        }

        tHit = hi;
        if (hi == tNew)
        {
            _y1.CopyTo(_yInterp, 0);
        }
        else
        {
            Interpolate(hi, _yInterp);
        }
        return FirstCrossing(events, gPrev, gNew);
    }

    private static int FirstCrossing(IOdeEvents events, ReadOnlySpan<double> before, ReadOnlySpan<double> after)
    {
        for (int i = 0; i < before.Length; i++)
        {
            if (Crossed(before[i], after[i], events.Direction(i)))
            {
                return i;
            }
        }
        return -1;
    }

    private static bool Crossed(double before, double after, EventDirection direction)
    {
        bool rising = before < 0 && after >= 0;
        bool falling = before > 0 && after <= 0;
        return direction switch
        {
            EventDirection.Rising => rising,
            EventDirection.Falling => falling,
            _ => rising || falling,
        };
    }
}
