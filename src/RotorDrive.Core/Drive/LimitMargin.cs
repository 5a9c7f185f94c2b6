namespace RotorDrive.Core.Drive;

/// <summary>How far one operating value is from one limit.</summary>
/// <param name="Limit">Which limit.</param>
/// <param name="Value">The operating value, in the limit's unit (<see cref="DriveLimits.Unit"/>).</param>
/// <param name="Allowed">The limit, same unit.</param>
/// <param name="IsLowerBound">True when the value must stay above the limit (cutoff voltage); false when below.</param>
public readonly record struct LimitMargin(DriveLimit Limit, double Value, double Allowed, bool IsLowerBound = false)
{
    /// <summary>Relative margin: (allowed - value) / allowed for upper limits, (value - allowed) / allowed for lower ones;
    /// negative when exceeded. 0 when the limit is 0 and not exceeded, -1 when it is 0 and exceeded.</summary>
    public double Margin
    {
        get
        {
            double room = IsLowerBound ? Value - Allowed : Allowed - Value;
            if (Allowed == 0)
            {
                return room >= 0 ? 0.0 : -1.0;
            }
            return room / Math.Abs(Allowed);
        }
    }

    /// <summary>True when the value is past the limit.</summary>
    public bool Exceeded => IsLowerBound ? Value < Allowed : Value > Allowed;
}
