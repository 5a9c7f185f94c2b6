using RotorDrive.Core.Drive;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Per-thread scratch of a ranking sweep: the trim's warm start, its exact-mass cache, the drivetrain of the
/// current motor and controller, and the bus solver's buffers. Reset at the start of every chunk so that results do not
/// depend on which thread ran which chunk.</summary>
internal sealed class RankWorker
{
    public RankWorker(int stations)
    {
        Trim = new RankTrimState(stations);
        Outcome = new RankOutcome(stations);
        Inputs = new DriveInput[stations];
        Points = new DrivePoint[stations];
    }

    public RankTrimState Trim { get; }

    public RankOutcome Outcome { get; }

    public DriveInput[] Inputs { get; }

    public DrivePoint[] Points { get; }

    public bool TrimCached;

    public bool TrimOk;

    public double LastDrivetrainKg;

    public double LastPacksKg;

    public int DrivetrainMotor = -1;

    public int DrivetrainController = -1;

    public Drivetrain? Drivetrain;

    public void Reset()
    {
        Trim.Reset();
        TrimCached = false;
        DrivetrainMotor = -1;
        DrivetrainController = -1;
        Drivetrain = null;
    }
}
