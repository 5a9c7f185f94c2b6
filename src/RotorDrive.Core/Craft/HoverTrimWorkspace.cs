namespace RotorDrive.Core.Craft;

/// <summary>Working arrays of the trim's Newton iteration for a given station count: loads and their speed derivatives,
/// the KKT system and its right-hand side, the constraint scales and the multipliers. One per thread; reused across
/// solves so that a sweep of trims (a catalog ranking) allocates nothing per trim.</summary>
internal sealed class HoverTrimWorkspace
{
    public HoverTrimWorkspace(int stations)
    {
        Stations = stations;
        Lift = new double[stations];
        Torque = new double[stations];
        DLift = new double[stations];
        DTorque = new double[stations];
        D2Lift = new double[stations];
        D2Torque = new double[stations];
        Trial = new double[stations];
        int size = stations + 4;
        Kkt = new double[size * size];
        Rhs = new double[size];
        Pivots = new int[size];
    }

    public int Stations { get; }

    public double[] Lift { get; }

    public double[] Torque { get; }

    public double[] DLift { get; }

    public double[] DTorque { get; }

    public double[] D2Lift { get; }

    public double[] D2Torque { get; }

    public double[] Trial { get; }

    /// <summary>The (n + 4) x (n + 4) KKT matrix, row-major; overwritten by its LU factors.</summary>
    public double[] Kkt { get; }

    /// <summary>Right-hand side; overwritten by the solution.</summary>
    public double[] Rhs { get; }

    public int[] Pivots { get; }

    public double[] Multipliers { get; } = new double[4];

    public double[] Residuals { get; } = new double[4];

    public double[] Scale { get; } = new double[4];
}
