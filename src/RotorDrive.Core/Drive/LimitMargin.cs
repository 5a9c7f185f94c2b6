namespace RotorDrive.Core.Drive;

/// <summary>How far one operating value is from one limit.</summary>
/// <param name="Limit">Which limit.</param>
/// <param name="ValueSi">The operating value, in the limit's unit (<see cref="DriveLimits.Unit"/>).</param>
/// <param name="AllowedSi">The limit, same unit.</param>
/// <param name="IsLowerBound">True when the value must stay above the limit (cutoff voltage); false when below.</param>
public readonly record struct LimitMargin(DriveLimit Limit, double ValueSi, double AllowedSi, bool IsLowerBound = false)
{
    /// <summary>Relative margin: (allowed - value) / allowed for upper limits, (value - allowed) / allowed for lower ones;
    /// negative when exceeded. 0 when the limit is 0 and not exceeded, -1 when it is 0 and exceeded.</summary>
    public double MarginFraction
    {
        get
        {
            double room = IsLowerBound ? ValueSi - AllowedSi : AllowedSi - ValueSi;
            if (AllowedSi == 0)
            {
                return room >= 0 ? 0.0 : -1.0;
            }
            return room / Math.Abs(AllowedSi);
        }
    }

    /// <summary>True when the value is past the limit.</summary>
    public bool Exceeded => IsLowerBound ? ValueSi < AllowedSi : ValueSi > AllowedSi;
}
