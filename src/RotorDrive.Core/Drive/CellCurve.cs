namespace RotorDrive.Core.Drive;

/// <summary>Open-circuit voltage of one cell versus state of charge for a chemistry.</summary>
/// <param name="Chemistry">Chemistry name as used by the pack catalog (e.g. "lipo").</param>
/// <param name="SocFraction">States of charge, 0..1, strictly increasing.</param>
/// <param name="OcvV">Open-circuit voltage per cell at each state of charge, V, non-decreasing.</param>
public sealed record CellCurve(string Chemistry, IReadOnlyList<double> SocFraction, IReadOnlyList<double> OcvV)
{
    /// <summary>Open-circuit cell voltage at a state of charge by linear interpolation; clamped to the curve's ends.</summary>
    public double OcvAt(double socFraction)
    {
        var s = SocFraction;
        if (socFraction <= s[0])
        {
            return OcvV[0];
        }
        if (socFraction >= s[^1])
        {
            return OcvV[^1];
        }
        int hi = 1;
        while (s[hi] < socFraction)
        {
            hi++;
        }
        double t = (socFraction - s[hi - 1]) / (s[hi] - s[hi - 1]);
        return OcvV[hi - 1] + t * (OcvV[hi] - OcvV[hi - 1]);
    }
}
