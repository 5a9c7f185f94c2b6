namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Working arrays of one trim (and its warm start for the next): speeds, lifts, torques, eddy powers and the
/// last Jacobian. One per worker; not thread-safe.</summary>
internal sealed class RankTrimState(int stations)
{
    public double[] Speeds { get; } = new double[stations];

    public double[] Lifts { get; } = new double[stations];

    public double[] Torques { get; } = new double[stations];

    public double[] EddyPowers { get; } = new double[stations];

    public double[] Jacobian { get; } = new double[4 * stations];

    public bool HasSolution { get; set; }

    public bool HasJacobian { get; set; }

    public int Iterations { get; set; }

    public double Weight { get; set; }

    public void Reset()
    {
        HasSolution = false;
        HasJacobian = false;
    }
}
