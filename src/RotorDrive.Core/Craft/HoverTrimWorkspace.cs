namespace RotorDrive.Core.Craft;

/// <summary>Working arrays of the trim's Newton iteration for a given station count: loads and their speed derivatives,
/// the KKT system and its right-hand side, the constraint scales and the multipliers. One per thread; reused across
/// solves so that a sweep of trims (a catalog ranking) allocates nothing per trim, and remembering the last trim for the
/// next one's warm start.</summary>
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
        LastKkt = new double[size * size];
        SolvedSpeeds = new double[stations];
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

    /// <summary>The last KKT matrix built (before elimination): the predictor's system.</summary>
    public double[] LastKkt { get; }

    /// <summary>Whether the fields below describe a converged trim.</summary>
    public bool Solved;

    public double[] SolvedSpeeds { get; }

    public double SolvedW0;

    public double SolvedWeightN;

    public double SolvedCgXM;

    public double SolvedCgYM;

    public double SolvedYawNm;

    public double[] SolvedScale { get; } = new double[4];

    /// <summary>Scale-free multipliers: lambda x constraint scale x w0^2.</summary>
    public double[] Mu { get; } = new double[4];

    public double[] Multipliers { get; } = new double[4];

    public double[] Residuals { get; } = new double[4];

    public double[] Scale { get; } = new double[4];
}
